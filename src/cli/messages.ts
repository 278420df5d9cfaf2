// What the command line says about arguments and options, and about the configs and folders
// the check, init and run commands are given.
import { problem, type InputProblem } from '../base/problem.js';

function helpCommand(command: string): string {
  return command === '' ? 'trendbrief --help' : `trendbrief ${command} --help`;
}

export const cliMessages = {
  unknownCommand(name: string, suggestion: string | undefined): InputProblem {
    const hint = suggestion !== undefined ? `did you mean '${suggestion}'? See trendbrief --help` : 'see trendbrief --help for the commands';
    return problem('cli.unknown-command', `unknown command '${name}'`, hint);
  },
  noCommand(): InputProblem {
    return problem('cli.no-command', 'no command given', 'run trendbrief --help to see the commands');
  },
  /** `command` names the command whose options were given; '' for the options before any command. */
  unknownOption(written: string, suggestion: string | undefined, command: string): InputProblem {
    const hint = suggestion !== undefined ? `did you mean ${suggestion}? See ${helpCommand(command)}` : `see ${helpCommand(command)} for the options`;
    return problem('cli.unknown-option', 'unknown option', hint, { field: written });
  },
  missingValue(option: string, command: string): InputProblem {
    return problem('cli.missing-value', 'needs a value', `write the value after the option, e.g. ${option} VALUE, or see ${helpCommand(command)}`, {
      field: option,
    });
  },
  flagWithValue(option: string, command: string): InputProblem {
    return problem('cli.flag-with-value', 'is a switch and takes no value', `write ${option} alone, or see ${helpCommand(command)}`, {
      field: option,
    });
  },
  missingFile(command: string): InputProblem {
    return problem('cli.missing-file', `${command} needs a CSV file`, `give one, e.g. trendbrief ${command} series.csv`);
  },
  extraArguments(extra: readonly string[]): InputProblem {
    return problem('cli.extra-arguments', `unexpected argument${extra.length > 1 ? 's' : ''} ${extra.join(' ')}`, 'give one CSV file');
  },
  horizonAndThrough(): InputProblem {
    return problem('cli.horizon-and-through', '--horizon and --through both say how far to forecast', 'give one of them: --horizon in steps, or --through as an end period', { field: '--through' });
  },
  badThrough(value: string): InputProblem {
    return problem('cli.bad-option-value', `'${value}' is not a period`, 'give the last period to forecast, e.g. 2030, 2030-Q4 or 2030-12', { field: '--through' });
  },
  notAnInteger(option: string, value: string, min: number, max: number): InputProblem {
    return problem('cli.bad-value', `'${value}' is not a whole number from ${min} to ${max}`, `give --${option} a whole number from ${min} to ${max}`, {
      field: `--${option}`,
    });
  },
  badChoice(option: string, value: string, choices: readonly string[]): InputProblem {
    return problem('cli.bad-value', `'${value}' is not one of ${choices.join(', ')}`, `give --${option} one of ${choices.join(', ')}`, {
      field: `--${option}`,
    });
  },
  badTransform(value: string): InputProblem {
    return problem('cli.bad-value', `'${value}' is not a transform`, 'use none, log, or box-cox:LAMBDA with LAMBDA a number such as 0.5', {
      field: '--transform',
    });
  },
  badLevels(value: string, most: number): InputProblem {
    return problem(
      'cli.bad-value',
      `'${value}' is not a list of interval levels`,
      `give one to ${most} different percentages above 0 and below 100, separated by commas, e.g. 80,95`,
      { field: '--levels' },
    );
  },
  badLevel(option: string, value: string): InputProblem {
    return problem('cli.bad-value', `'${value}' is not an interval level`, `give --${option} a percentage above 0 and below 100 that is one of the levels, e.g. 95`, {
      field: `--${option}`,
    });
  },

};

/** The check, init and run commands. */
export const configCommandMessages = {
  noConfigsToRun(): InputProblem {
    return problem('cli.missing-config', 'run needs at least one config file', 'give one or more, e.g. trendbrief run configs/demo.yaml');
  },

  noConfigs(): InputProblem {
    return problem('cli.missing-config', 'check needs at least one config file', 'give one or more, e.g. trendbrief check memo.yaml');
  },
  extraFolders(extra: readonly string[]): InputProblem {
    return problem('cli.extra-arguments', `unexpected argument${extra.length > 1 ? 's' : ''} ${extra.join(' ')}`, 'give one folder, e.g. trendbrief init forecasts');
  },
  fileExists(file: string): InputProblem {
    return problem('init.file-exists', 'already exists, and init never overwrites a file', 'choose another folder, or move this file away first', { file });
  },
  notAFolder(folder: string): InputProblem {
    return problem('init.not-a-folder', 'exists but is not a folder', 'give the path of a folder, or of one to create', { file: folder });
  },
  cannotWrite(file: string, reason: string): InputProblem {
    return problem('init.unwritable', `cannot be written (${reason})`, 'check that the folder exists and that you may write in it', { file });
  },
};
