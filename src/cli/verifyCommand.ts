// `trendbrief verify MEMO_FOLDER`: checks an issued memo against its inputs. Exit 0 when
// everything matches, 3 with the differences listed, 2 when an input is missing or changed
// (or the folder is not a memo folder), with each problem on stderr.
import { InputError } from '../base/problem.js';
import { verifyMessages, verifyReport } from '../run/messages.js';
import { TOLERANCE_TEXT } from '../run/compareJson.js';
import { verifyMemoFolder } from '../run/verifyMemoFolder.js';
import { splitOptions } from './splitOptions.js';
import { EXIT } from './exitCodes.js';

export const VERIFY_HELP = `Usage: trendbrief verify MEMO_FOLDER

Checks a memo folder written by trendbrief run: every input named in its manifest.json must
still have its recorded SHA-256 (found relative to the folder), every output its recorded
SHA-256; then the analysis is run again from the same config, data and settings, with the
recorded run date, and record.json and forecasts.csv are compared number by number within
${TOLERANCE_TEXT}, memo.html byte for byte. Nothing is written.

Exit codes: 0 everything matches, 3 differences (listed), 2 an input missing or changed.

Options:
  -h, --help   this text
`;

/** Differences listed before the rest are counted. */
export const DIFFERENCES_SHOWN = 50;

interface Io {
  stdout(text: string): void;
  stderr(text: string): void;
}

export async function runVerify(args: readonly string[], io: Io): Promise<number> {
  const { values, positionals, problems } = splitOptions(args, { help: { type: 'boolean', short: 'h' } }, 'verify');
  if (values.get('help') === true) {
    io.stdout(VERIFY_HELP);
    return EXIT.ok;
  }
  if (positionals.length === 0) problems.push(verifyMessages.noFolderGiven());
  if (positionals.length > 1) problems.push(verifyMessages.extraArguments(positionals.slice(1)));
  if (problems.length > 0) throw new InputError(problems);
  const { lines, differences } = await verifyMemoFolder(positionals[0]);
  const report = [...lines];
  if (differences.length > 0) {
    report.push(verifyReport.differencesHeading(differences.length), ...differences.slice(0, DIFFERENCES_SHOWN).map((line) => `  ${line}`));
    if (differences.length > DIFFERENCES_SHOWN) report.push(verifyReport.more(differences.length - DIFFERENCES_SHOWN));
    report.push(verifyReport.mismatch(positionals[0], differences.length));
  } else {
    report.push(verifyReport.match(positionals[0]));
  }
  io.stdout(`${report.join('\n')}\n`);
  return differences.length > 0 ? EXIT.mismatch : EXIT.ok;
}
