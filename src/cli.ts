// The command line as a function: cli(argv, io) → exit code (cli/exitCodes.ts), so it is
// tested without spawning processes.
import { closestName } from './base/closestName.js';
import { formatProblem, InputError } from './base/problem.js';
import { cliMessages } from './cli/messages.js';
import { runFit, FIT_HELP } from './cli/fitCommand.js';
import { runCheck } from './cli/checkCommand.js';
import { runInit } from './cli/initCommand.js';
import { runRun } from './cli/runCommand.js';
import { runVerify } from './cli/verifyCommand.js';
import { toolVersion } from './base/toolVersion.js';
import { EXIT } from './cli/exitCodes.js';

export interface CliIo {
  stdout(text: string): void;
  stderr(text: string): void;
  /** True when stderr is a terminal. */
  isTTY?: boolean;
}

const COMMANDS = ['run', 'check', 'fit', 'verify', 'init'] as const;
const GLOBAL_OPTIONS = ['--help', '--version'] as const;


const MAIN_HELP = `trendbrief: compare deterministic and stochastic trend extrapolation for forecast memos

Usage:
  trendbrief run CONFIG.yaml...       write the forecast memo of each config
  trendbrief fit FILE.csv [options]   fit both trend models to one series and forecast
  trendbrief check CONFIG.yaml...     check configs and their series files without fitting
  trendbrief verify MEMO_FOLDER       check an issued memo against its inputs and a rerun
  trendbrief init [DIR]               write a starter config and an example series
  trendbrief --help                   this text
  trendbrief --version                the tool's version

Run 'trendbrief COMMAND --help' for a command's options.
`;

export async function cli(argv: readonly string[], io: CliIo): Promise<number> {
  try {
    const [command, ...rest] = argv;
    if (command === undefined) {
      io.stderr(`${formatProblem(cliMessages.noCommand())}\n`);
      return EXIT.input;
    }
    if (command === '--help' || command === '-h' || command === 'help') {
      io.stdout(MAIN_HELP);
      return EXIT.ok;
    }
    if (command === '--version' || command === '-v') {
      io.stdout(`${toolVersion().version}\n`);
      return EXIT.ok;
    }
    if (command === 'fit') {
      if (rest.includes('--help') || rest.includes('-h')) {
        io.stdout(FIT_HELP);
        return EXIT.ok;
      }
      return await runFit(rest, io);
    }
    if (command === 'run') return await runRun(rest, io);
    if (command === 'check') return await runCheck(rest, io);
    if (command === 'verify') return await runVerify(rest, io);
    if (command === 'init') return await runInit(rest, io);
    if (command.startsWith('-')) throw new InputError(cliMessages.unknownOption(command, closestName(command, GLOBAL_OPTIONS), ''));
    throw new InputError(cliMessages.unknownCommand(command, closestName(command, COMMANDS)));
  } catch (error) {
    if (error instanceof InputError) {
      for (const problem of error.problems) io.stderr(`${formatProblem(problem)}\n`);
      return EXIT.input;
    }
    io.stderr(`trendbrief: internal error: ${error instanceof Error ? (error.stack ?? error.message) : String(error)}\n`);
    return EXIT.internal;
  }
}

/** Entry point for bin/trendbrief.js. */
export function runCli(argv: readonly string[]): Promise<number> {
  return cli(argv, {
    stdout: (text) => process.stdout.write(text),
    stderr: (text) => process.stderr.write(text),
    isTTY: process.stderr.isTTY,
  });
}
