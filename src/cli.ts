// The command line as a function: cli(argv, io) → exit code (cli/exitCodes.ts), so it is
// tested without spawning processes. Each command's module is loaded only when that command
// runs, so `--version` loads next to nothing and `fit` never loads the memo renderer or the
// browser driver.
import { closestName } from './base/closestName.js';
import { EnvironmentError } from './base/environmentError.js';
import { formatProblem, InputError } from './base/problem.js';
import { toolVersion } from './base/toolVersion.js';
import { EXIT } from './cli/exitCodes.js';
import { cliMessages } from './cli/messages.js';

export interface CliIo {
  stdout(text: string): void;
  stderr(text: string): void;
  /** True when stderr is a terminal. */
  isTTY?: boolean;
}

type Command = (args: readonly string[], io: CliIo) => Promise<number>;

const COMMANDS: Readonly<Record<string, () => Promise<Command>>> = {
  run: async () => (await import('./cli/runCommand.js')).runRun,
  check: async () => (await import('./cli/checkCommand.js')).runCheck,
  fit: async () => (await import('./cli/fitCommand.js')).runFit,
  verify: async () => (await import('./cli/verifyCommand.js')).runVerify,
  review: async () => (await import('./cli/reviewCommand.js')).runReview,
  init: async () => (await import('./cli/initCommand.js')).runInit,
};
const GLOBAL_OPTIONS = ['--help', '--version'] as const;

const MAIN_HELP = `trendbrief: compare deterministic and stochastic trend extrapolation for forecast memos

Usage:
  trendbrief run CONFIG.yaml...       write the forecast memo of each config
  trendbrief fit FILE [options]       fit both trend models to one series (.csv or .xlsx) and forecast
  trendbrief check CONFIG.yaml...     check configs and their series files without fitting
  trendbrief verify MEMO_FOLDER       check an issued memo against its inputs and a rerun
  trendbrief review MEMO_FOLDER --reviewer NAME --decision approve|approve-with-changes|return
                                      record a reviewer's decision, bound to the memo's content
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
    const load = Object.hasOwn(COMMANDS, command) ? COMMANDS[command] : undefined;
    if (load !== undefined) return await (await load())(rest, io);
    if (command.startsWith('-')) throw new InputError(cliMessages.unknownOption(command, closestName(command, GLOBAL_OPTIONS), ''));
    throw new InputError(cliMessages.unknownCommand(command, closestName(command, Object.keys(COMMANDS))));
  } catch (error) {
    if (error instanceof InputError) {
      for (const problem of error.problems) io.stderr(`${formatProblem(problem)}\n`);
      return error instanceof EnvironmentError ? EXIT.environment : EXIT.input;
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
