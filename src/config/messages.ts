// What the config stage says about a config file: YAML syntax, keys and values against the
// spec, and the rules across keys. Field names are dotted paths such as `series[2].horizon`,
// positions the YAML node's line and column.
import { codePointName, MEBIBYTE, plural, problem, quoted, type InputLocation, type InputProblem } from '../base/problem.js';

/** What a config key accepts, as the validator knows it; rendered by `describeExpected`. */
export type ExpectedValue =
  | { kind: 'text' }
  | { kind: 'whole'; min: number; max: number }
  | { kind: 'number'; min: number; max: number; exclusive: boolean }
  | { kind: 'boolean' }
  | { kind: 'choice'; values: readonly string[] }
  | { kind: 'period' }
  | { kind: 'list'; example: string }
  | { kind: 'mapping'; example: string }
  | { kind: 'shapes'; description: string };

/** What the config holds where a value was expected. */
export type FoundValue =
  | { kind: 'text'; text: string }
  | { kind: 'number'; value: number }
  | { kind: 'boolean'; value: boolean }
  | { kind: 'empty' }
  | { kind: 'list' }
  | { kind: 'mapping' };

const PERIOD_EXAMPLES = 'a period such as 2026, 2026-Q3 or 2026-10';

export function describeExpected(expected: ExpectedValue): string {
  switch (expected.kind) {
    case 'text':
      return 'text';
    case 'whole':
      return `a whole number from ${expected.min} to ${expected.max}`;
    case 'number':
      return expected.exclusive ? `a number above ${expected.min} and below ${expected.max}` : `a number from ${expected.min} to ${expected.max}`;
    case 'boolean':
      return 'true or false';
    case 'choice':
      return `one of ${expected.values.join(', ')}`;
    case 'period':
      return PERIOD_EXAMPLES;
    case 'list':
      return `a list such as ${expected.example}`;
    case 'mapping':
      return `a mapping of keys such as ${expected.example}`;
    case 'shapes':
      return expected.description;
  }
}

function describeFound(found: FoundValue): string {
  switch (found.kind) {
    case 'text':
      return `text ${quoted(found.text)}`;
    case 'number':
      return `the number ${found.value}`;
    case 'boolean':
      return String(found.value);
    case 'empty':
      return 'no value';
    case 'list':
      return 'a list';
    case 'mapping':
      return 'a mapping';
  }
}

function wrongTypeHint(expected: ExpectedValue, found: FoundValue): string {
  const numeric = expected.kind === 'whole' || expected.kind === 'number';
  if (numeric && found.kind === 'text' && Number.isFinite(Number(found.text)) && found.text.trim() !== '') {
    return 'write the number without quotes';
  }
  if ((expected.kind === 'text' || expected.kind === 'choice') && (found.kind === 'number' || found.kind === 'boolean')) {
    return `put the value in quotes if it is meant as text, or write ${describeExpected(expected)}`;
  }
  if (found.kind === 'empty') return `give it ${describeExpected(expected)}, or remove it`;
  return `write ${describeExpected(expected)}`;
}

/** The YAML parser's error codes in our words: what is wrong, what to do. */
const YAML_SYNTAX_DETAILS: Readonly<Record<string, readonly [string, string]>> = {
  BAD_INDENT: ['the indentation does not fit the lines around it', 'line the key up with the keys beside it, using spaces'],
  TAB_AS_INDENT: ['a tab is used for indentation', 'indent with spaces'],
  MISSING_CHAR: ['a quote or bracket is still open here', 'close the quote or bracket opened above this point'],
  // Ours, not the parser's: MISSING_CHAR moved to the quote that opens the value.
  UNCLOSED_QUOTE: ['a quote opened here is never closed', 'end the value with the same quote mark, or remove this one'],
  MULTIPLE_DOCS: ['the file holds more than one document', 'remove the second --- line: a config is one document'],
  BLOCK_AS_IMPLICIT_KEY: ['a key runs over more than one line', 'write each key on one line, followed by a colon'],
  MULTILINE_IMPLICIT_KEY: ['a key runs over more than one line', 'write each key on one line, followed by a colon'],
  TAG_RESOLVE_FAILED: ['a tag (a word starting with !) that this config does not use', 'remove the tag and write the plain value'],
  BAD_ALIAS: ['an alias (*name) refers to no anchor (&name) above it', 'define the anchor before the alias, or write the value out'],
  UNEXPECTED_TOKEN: ['text appears where YAML does not allow it', 'check the punctuation on this line'],
  KEY_OVER_1024_CHARS: ['a key is longer than 1024 characters', 'shorten the key'],
  RESOURCE_EXHAUSTION: ['the values nest too deeply', 'write a flatter config'],
};

const CONFIG_SIZE_HINT = 'a config describes a memo; keep data in the series CSV files it names';

export const configMessages = {
  fileMissing(file: string): InputProblem {
    return problem('config.file-missing', 'config file not found', 'check the path and its spelling', { file });
  },
  notAFile(file: string, kind: 'directory' | 'special file'): InputProblem {
    return problem('config.not-a-file', `is a ${kind}, not a regular file`, 'give the path of a .yaml config file', { file });
  },
  badLink(file: string, kind: 'dangling' | 'loop'): InputProblem {
    const what = kind === 'dangling' ? 'is a symbolic link to a file that does not exist' : 'is a symbolic link that leads back to itself';
    return problem('config.bad-link', what, 'point the link at the .yaml config file, or name the file itself', { file });
  },
  nameTooLong(file: string): InputProblem {
    return problem('config.name-too-long', 'is a path too long for the file system', 'move the config to a shorter path', { file });
  },
  unreadable(file: string, reason: string): InputProblem {
    return problem('config.unreadable', `cannot be read (${reason})`, 'check that the file exists and that you may read it', { file });
  },
  tooLarge(file: string, bytes: number, limitBytes: number): InputProblem {
    return problem('config.too-large', `is ${bytes} bytes, above the ${limitBytes / MEBIBYTE} MB limit for a config file`, CONFIG_SIZE_HINT, { file });
  },
  notUtf8(file: string, at: { line: number; column: number }): InputProblem {
    return problem('config.not-utf8', 'is not UTF-8 text from here on', 'save the file with UTF-8 encoding', { file, ...at });
  },
  empty(file: string): InputProblem {
    return problem('config.empty', 'holds no settings', 'write the memo and series sections; trendbrief init writes a starter config', {
      file,
    });
  },
  /** `yamlCode` and `yamlMessage` are the YAML parser's; known codes get our own wording. */
  syntax(at: InputLocation, yamlCode: string, yamlMessage: string): InputProblem {
    const known = YAML_SYNTAX_DETAILS[yamlCode];
    const detail = known?.[0] ?? yamlMessage.charAt(0).toLowerCase() + yamlMessage.slice(1).replace(/\.$/, '');
    return problem('config.syntax', `not valid YAML: ${detail}`, known?.[1] ?? 'fix the YAML at this position', at);
  },
  tooManyAliases(at: InputLocation, limit: number): InputProblem {
    return problem('config.too-many-aliases', `aliases expand to more than ${limit} copies`, 'write the repeated settings once under defaults instead of copying them with aliases', at);
  },
  keyNotText(at: InputLocation): InputProblem {
    return problem('config.key-type', 'a key here is not a plain name', 'write keys as plain names such as horizon', at);
  },
  duplicateKey(at: InputLocation, firstLine: number): InputProblem {
    return problem('config.duplicate-key', `key already given on line ${firstLine}`, 'keep one of the two', at);
  },
  unknownKey(at: InputLocation, key: string, suggestion: string | undefined, allowed: readonly string[]): InputProblem {
    const hint = suggestion !== undefined ? `did you mean ${quoted(suggestion)}?` : `the keys allowed here are ${allowed.join(', ')}`;
    return problem('config.unknown-key', `unknown key ${quoted(key)}`, hint, at);
  },
  /** `key` is the missing key's own name and `purpose` its description from the spec. */
  missing(at: InputLocation, key: string, purpose: string): InputProblem {
    return problem('config.missing', 'is required but missing', `add ${key}: (${purpose.replace(/\.$/, '')})`, at);
  },
  wrongType(at: InputLocation, expected: ExpectedValue, found: FoundValue): InputProblem {
    const what = found.kind === 'empty' ? 'has no value' : `expected ${describeExpected(expected)}, found ${describeFound(found)}`;
    return problem('config.wrong-type', what, wrongTypeHint(expected, found), at);
  },
  notFinite(at: InputLocation, value: number, expected: ExpectedValue): InputProblem {
    return problem('config.not-finite', `${value} is not a finite number`, `write ${describeExpected(expected)}`, at);
  },
  notWhole(at: InputLocation, value: number, expected: ExpectedValue): InputProblem {
    return problem('config.not-whole', `${value} is not a whole number`, `write ${describeExpected(expected)}`, at);
  },
  outOfRange(at: InputLocation, value: number, expected: ExpectedValue & { min: number; max: number }): InputProblem {
    const exclusive = expected.kind === 'number' && expected.exclusive;
    const low = exclusive ? value <= expected.min : value < expected.min;
    const side = exclusive
      ? low ? `not above ${expected.min}` : `not below ${expected.max}`
      : low ? `below the smallest allowed, ${expected.min}` : `above the largest allowed, ${expected.max}`;
    return problem('config.out-of-range', `${value} is ${side}`, `write ${describeExpected(expected)}`, at);
  },
  badChoice(at: InputLocation, value: string, choices: readonly string[], suggestion: string | undefined): InputProblem {
    const hint = suggestion !== undefined ? `did you mean ${quoted(suggestion)}?` : `write one of ${choices.join(', ')}`;
    return problem('config.bad-choice', `${quoted(value)} is not one of ${choices.join(', ')}`, hint, at);
  },
  emptyText(at: InputLocation): InputProblem {
    return problem('config.empty-text', 'is empty text', 'write a value, or remove the key', at);
  },
  blankText(at: InputLocation): InputProblem {
    return problem('config.blank-text', 'holds only blank space', 'write the text it should say, or remove the key', at);
  },
  tooLong(at: InputLocation, length: number, max: number): InputProblem {
    return problem('config.too-long', `is ${length} characters long; at most ${max} are allowed`, 'shorten it', at);
  },
  controlCharacter(at: InputLocation, codePoint: number, position: number, lineBreaksAllowed: boolean): InputProblem {
    const code = codePointName(codePoint);
    const kind = codePoint === 0x0a ? 'a line break' : `the invisible control character ${code}`;
    const hint = lineBreaksAllowed ? 'remove it; only visible characters and line breaks are allowed' : 'remove it; write this value on one line with visible characters only';
    return problem('config.control-character', `holds ${kind} at character ${position}`, hint, at);
  },
  badSlug(at: InputLocation, value: string): InputProblem {
    return problem(
      'config.bad-slug',
      `${quoted(value)} is not an id of lowercase letters, digits and single hyphens`,
      'write an id such as water-demand-2026 (it becomes a folder name, so no spaces, capitals or other signs)',
      at,
    );
  },
  badDate(at: InputLocation, value: string): InputProblem {
    return problem('config.bad-date', `${quoted(value)} is not a date`, 'write the date as YYYY-MM-DD, e.g. 2026-10-05', at);
  },
  noSuchDay(at: InputLocation, value: string): InputProblem {
    return problem('config.bad-date', `${quoted(value)} is not a day of the calendar`, 'check the day and the month', at);
  },
  badPeriod(at: InputLocation, value: string): InputProblem {
    return problem('config.bad-period', `${quoted(value)} is not a period`, `write ${PERIOD_EXAMPLES}`, at);
  },
  tooFewItems(at: InputLocation, count: number, min: number): InputProblem {
    return problem('config.list-length', `has ${plural(count, 'item')}; at least ${min} ${min === 1 ? 'is' : 'are'} needed`, 'add items to the list', at);
  },
  tooManyItems(at: InputLocation, count: number, max: number): InputProblem {
    return problem('config.list-length', `has ${plural(count, 'item')}; at most ${max} are allowed`, 'shorten the list, or split the memo into several configs', at);
  },
  duplicateItem(at: InputLocation, value: string, firstField: string): InputProblem {
    return problem('config.duplicate-item', `${value} is already listed at ${firstField}`, 'list each value once', at);
  },
  duplicateSeriesId(at: InputLocation, id: string, firstField: string, firstLine: number): InputProblem {
    return problem('config.duplicate-id', `series id ${quoted(id)} is already used by ${firstField} (line ${firstLine})`, 'give every series its own id', at);
  },
  duplicateReviewer(at: InputLocation, name: string, firstLine: number): InputProblem {
    return problem('config.duplicate-reviewer', `reviewer ${quoted(name)} is already listed on line ${firstLine}`, 'list each reviewer once', at);
  },
  unknownReviewer(at: InputLocation, name: string, reviewers: readonly string[], suggestion: string | undefined): InputProblem {
    const listed = reviewers.length === 0 ? 'memo.reviewers lists nobody' : `the reviewers are ${reviewers.map(quoted).join(', ')}`;
    const hint = suggestion !== undefined ? `did you mean ${quoted(suggestion)}?` : 'add this person to memo.reviewers, or correct the name';
    return problem('config.unknown-reviewer', `${quoted(name)} signs off but is not a listed reviewer; ${listed}`, hint, at);
  },
  badPublicKey(at: InputLocation): InputProblem {
    return problem(
      'config.bad-public-key',
      'is not an Ed25519 public key in PEM form',
      "paste the whole public key file (-----BEGIN PUBLIC KEY----- to -----END PUBLIC KEY-----) that trendbrief review --new-key wrote, as a block (public_key: |)",
      at,
    );
  },
  seasonalFormAnnual(at: InputLocation): InputProblem {
    return problem('config.seasonal-annual', 'a seasonal form is set for an annual series, which has no seasons', 'leave seasonal out (or write none) for annual data', at);
  },
  tooManyHarmonics(at: InputLocation, harmonics: number, most: number, frequency: string): InputProblem {
    return problem('config.seasonal-harmonics', `${harmonics} harmonic pairs are more than a ${frequency} series has (at most ${most})`, `give harmonics from 0 to ${most}`, at);
  },
  harmonicsUnseen(at: InputLocation, harmonics: number, seen: number, period: number, needed: number): InputProblem {
    return problem(
      'config.seasonal-unseen',
      `${harmonics} harmonic pairs need at least ${needed} of the ${period} seasons observed, and the series has values in only ${seen}`,
      `give at most ${Math.max(0, Math.floor((seen - 1) / 2))} harmonic pairs, or supply the missing seasons`,
      at,
    );
  },
  throughNotAhead(at: InputLocation, through: string, last: string): InputProblem {
    return problem('config.through-not-ahead', `the forecast would end at ${through}, but the data already run to ${last}`, `give a period after ${last}, or leave through out for the default`, at);
  },
  throughInsidePeriod(at: InputLocation, through: string, frequency: string): InputProblem {
    return problem('config.through-inside-period', `${quoted(through)} ends inside a period of this ${frequency} series`, `give the period the forecast ends with at the series' own frequency or coarser, e.g. ${frequency === 'annual' ? '2030' : frequency === 'quarterly' ? '2030-Q4 or 2030' : '2030-12 or 2030'}`, at);
  },
  horizonTooLong(at: InputLocation, steps: number, max: number, through: string): InputProblem {
    return problem('config.horizon-too-long', `forecasting through ${through} takes ${steps} steps; at most ${max} are allowed`, 'give an earlier end period', at);
  },
  horizonAndThrough(at: InputLocation, otherField: string, otherLine: number): InputProblem {
    return problem('config.horizon-and-through', `says how far to forecast twice: ${otherField} (line ${otherLine}) says it too`, 'keep one of horizon (steps) and through (an end period)', at);
  },
  scoredLevelNotListed(at: InputLocation, level: number, levels: readonly number[]): InputProblem {
    return problem(
      'config.scored-level',
      `${level} is not one of the interval levels (${levels.join(', ')})`,
      `give one of ${levels.join(', ')}, or add ${level} to levels`,
      at,
    );
  },
  /** `key` holds `value`, which needs the `absent` keys beside it. */
  dependentMissing(at: InputLocation, key: string, value: string, absent: readonly string[]): InputProblem {
    return problem(
      'config.needs-key',
      `${key} is set to ${value}, which needs ${absent.join(' and ')} beside it`,
      `add ${absent.map((name) => `${name}:`).join(' and ')} beside ${key}:, or remove ${key}:`,
      at,
    );
  },
};
