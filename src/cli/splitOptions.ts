// Command-line words → option values and positional arguments, with every problem collected
// in one pass (a typo in one option must not hide a bad value in another). Node's
// util.parseArgs stops at the first unknown option and words its own messages, so the
// split is done here: `--name value`, `--name=value`, `-h`, and `--` ending the options.
import { closestName } from '../base/closestName.js';
import { type InputProblem } from '../base/problem.js';
import { cliMessages } from './messages.js';

export interface OptionSpec {
  type: 'string' | 'boolean';
  /** One-letter alias, written `-x`. */
  short?: string;
}

export interface SplitOptions {
  /** Option name (without dashes) → its text, or true for a flag; the last occurrence wins. */
  values: Map<string, string | true>;
  positionals: string[];
  problems: InputProblem[];
}

/** A word that is a number, such as -3 or -0.5, is a value even though it starts with a dash. */
const NUMBER = /^-?\d+(\.\d*)?$/;

function looksLikeOption(word: string): boolean {
  return word.startsWith('-') && word !== '-' && !NUMBER.test(word);
}

export function splitOptions(args: readonly string[], specs: Readonly<Record<string, OptionSpec>>, command: string): SplitOptions {
  const values = new Map<string, string | true>();
  const positionals: string[] = [];
  const problems: InputProblem[] = [];
  const longNames = Object.keys(specs).map((name) => `--${name}`);
  for (let i = 0; i < args.length; i++) {
    const word = args[i];
    if (word === '--') {
      positionals.push(...args.slice(i + 1));
      break;
    }
    if (!looksLikeOption(word)) {
      positionals.push(word);
      continue;
    }
    const equals = word.indexOf('=');
    const written = equals >= 0 ? word.slice(0, equals) : word;
    const inline = equals >= 0 ? word.slice(equals + 1) : undefined;
    const name = written.startsWith('--')
      ? written.slice(2)
      : Object.keys(specs).find((key) => specs[key].short !== undefined && `-${specs[key].short}` === written);
    const spec = name === undefined ? undefined : specs[name];
    if (name === undefined || spec === undefined) {
      const suggestion = closestName(written, longNames);
      problems.push(cliMessages.unknownOption(written, suggestion, command));
      // A misspelt option that takes a value keeps its value, so the value is not reported again as a stray argument.
      const next = args[i + 1];
      const takesValue = suggestion !== undefined && specs[suggestion.slice(2)].type === 'string';
      if (takesValue && inline === undefined && next !== undefined && !looksLikeOption(next)) i++;
      continue;
    }
    if (spec.type === 'boolean') {
      if (inline !== undefined) problems.push(cliMessages.flagWithValue(`--${name}`, command));
      else values.set(name, true);
      continue;
    }
    const next = args[i + 1];
    const value = inline ?? (next !== undefined && !looksLikeOption(next) ? next : undefined);
    if (inline === undefined && value !== undefined) i++;
    if (value === undefined) problems.push(cliMessages.missingValue(`--${name}`, command));
    else values.set(name, value);
  }
  return { values, positionals, problems };
}
