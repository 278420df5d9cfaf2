// What a run says about its output folders, the monthly as-of folders and `verify` (problems
// exit with 2), and the lines of verify's report.
import type { Frequency } from '../base/period.js';
import { abbreviateList, plural, problem, type InputLocation, type InputProblem } from '../base/problem.js';
import type { DataEnd } from '../memo/memoInput.js';

const OUTPUT_FOLDER_HINT = 'choose a folder, or a path where one can be created';
const TEMPLATES_HINT = 'correct the path, or remove output.templates to use the built-in templates';

export const runMessages = {
  sameMemoFolder(at: InputLocation, earlierConfig: string): InputProblem {
    return problem('run.same-memo-folder', `writes the same memo folder as ${earlierConfig} earlier in this run`, 'give one of them another memo.id, as_of or output.folder', at);
  },
  badSourceDateEpoch(value: string): InputProblem {
    return problem('env.source-date-epoch', `SOURCE_DATE_EPOCH '${value}' is not a whole number of seconds`, 'set it to seconds since 1970-01-01 UTC, or unset it', {
      field: 'SOURCE_DATE_EPOCH',
    });
  },
  /** `at` is where the folder was chosen: the config's output.folder or the --out option; `kind` e.g. 'a regular file'. */
  outputNotAFolder(at: InputLocation, folder: string, kind: string): InputProblem {
    return problem('run.output-not-a-folder', `the output folder '${folder}' is ${kind}, not a folder`, OUTPUT_FOLDER_HINT, at);
  },
  outputUnderNonFolder(at: InputLocation, folder: string, blocker: string, kind: string): InputProblem {
    return problem('run.output-not-a-folder', `the output folder '${folder}' lies under '${blocker}', which is ${kind}, not a folder`, OUTPUT_FOLDER_HINT, at);
  },
  memoFolderTaken(at: InputLocation, folder: string, kind: string): InputProblem {
    return problem(
      'run.memo-folder-taken',
      `the memo's folder '${folder}' is ${kind}, and a run replaces only a folder`,
      'move it away, or choose another output folder or memo id',
      at,
    );
  },
  outputUnwritable(at: InputLocation, folder: string, reason: string): InputProblem {
    return problem('run.output-unwritable', `the memo cannot be written into '${folder}' (${reason})`, 'check that you may write there and that the disk has room; the earlier memo is kept', at);
  },
  templatesMissing(at: InputLocation, folder: string): InputProblem {
    return problem('run.templates-missing', `the templates folder '${folder}' does not exist`, TEMPLATES_HINT, at);
  },
  templatesNotAFolder(at: InputLocation, folder: string, kind: string): InputProblem {
    return problem('run.templates-missing', `the templates folder '${folder}' is ${kind}, not a folder`, TEMPLATES_HINT, at);
  },
};


/** Period words for counts in messages: 1 month, 14 quarters. */
const PERIOD_NOUN: Record<Frequency, string> = { annual: 'year', quarterly: 'quarter', monthly: 'month' };

/** A series' data against memo.as_of (src/run/checkAsOf.ts); `at` is where memo.as_of is written. */
export const asOfMessages = {
  dataPastAsOf(at: InputLocation, seriesId: string, file: string, last: string, asOf: string, reachable: string): InputProblem {
    return problem(
      'run.data-past-as-of',
      `series '${seriesId}' (${file}) has observations up to ${last}, after the as-of period ${asOf}`,
      `set memo.as_of to ${last} or later, or leave the observations after ${reachable} out of ${file}`,
      at,
    );
  },
  dataEndEarly(at: InputLocation, seriesId: string, file: string, end: DataEnd, frequency: Frequency): InputProblem {
    return problem(
      'run.data-end-early',
      `warning: series '${seriesId}' (${file}) ends in ${end.last}, ${plural(end.missing, PERIOD_NOUN[frequency])} before ${end.reachable}, the last period the as-of period ${end.as_of} can include`,
      `check that ${file} holds the latest observations, or set memo.as_of to the period the data speak for; the run goes on and the memo notes the gap`,
      at,
    );
  },
};

const VERIFY_HELP = 'see trendbrief verify --help';

export const monthlyMessages = {
  asOfFoldersWouldBeReplaced(at: InputLocation, folder: string, labels: readonly string[]): InputProblem {
    return problem(
      'run.as-of-folders',
      `the memo's folder '${folder}' holds as-of memos (${abbreviateList(labels)}), which a run without an as-of period would replace`,
      'set memo.as_of to the period this memo speaks for, or write elsewhere with --out',
      at,
    );
  },
};

export const verifyMessages = {
  noFolderGiven(): InputProblem {
    return problem('verify.no-folder', 'verify needs the memo folder to check', 'give one, e.g. trendbrief verify out/lake-outlook/2026-01');
  },
  extraArguments(extra: readonly string[]): InputProblem {
    return problem('verify.extra-arguments', `unexpected argument${extra.length > 1 ? 's' : ''} ${extra.join(' ')}`, `give one memo folder; ${VERIFY_HELP}`);
  },
  noManifest(folder: string, asOfFolders: readonly string[]): InputProblem {
    const hint = asOfFolders.length > 0 ? `it holds as-of memos: give one of them, e.g. ${folder}/${asOfFolders[0]}` : 'give the folder a run wrote, the one with manifest.json in it';
    return problem('verify.no-manifest', `'${folder}' has no manifest.json`, hint, { file: folder });
  },
  badManifest(file: string, field: string, expected: string): InputProblem {
    return problem('verify.bad-manifest', `is not ${expected}`, 'the manifest is not as a run writes it; rerun the memo to write a new one', { file, field });
  },
  noInputLocation(file: string, field: string): InputProblem {
    return problem(
      'verify.no-input-location',
      'does not say where the input lies relative to the memo folder (from_output)',
      'the memo was written by an earlier version; rerun it with this version, then verify',
      { file, field },
    );
  },
  inputMissing(file: string, field: string, role: string, path: string, expected: string): InputProblem {
    return problem('verify.input-missing', `the ${role} ${path} is missing (expected SHA-256 ${expected})`, 'put the file back where the manifest says, or rerun the memo', { file, field });
  },
  inputChanged(file: string, field: string, role: string, path: string, expected: string, actual: string): InputProblem {
    return problem(
      'verify.input-changed',
      `the ${role} ${path} has changed: SHA-256 ${actual}, the manifest records ${expected}`,
      'restore the file as it was when the memo was run, or rerun the memo to issue a new one',
      { file, field },
    );
  },
  earlierRecordUnreadable(file: string, field: string, path: string): InputProblem {
    return problem('verify.earlier-record', `the earlier record ${path} is not a record document`, 'restore the previous as-of memo folder as it was issued', { file, field });
  },
};

/** The lines of the verify report on stdout; numbers appear as JSON writes them. */
export const verifyReport = {
  header: (folder: string, runDate: string, tool: string, command: string) => `verify ${folder}: run on ${runDate} with ${tool}: ${command}`,
  otherVersion: (recorded: string, current: string) =>
    `note: recorded with ${recorded}, verified with ${current}; wording or numbers of another version may differ`,
  inputs: (count: number) => `inputs: ${count} file${count === 1 ? '' : 's'} with the SHA-256 the manifest records`,
  outputs: (count: number, changed: number) => `outputs: ${count - changed} of ${count} with the SHA-256 the manifest records`,
  records: (series: number, numbers: number, tolerance: string) => `records: ${series} series recomputed; ${numbers} numbers compared within ${tolerance}`,
  noRecord: 'records: the run wrote no record.json (its formats left it out); the numbers are compared through forecasts.csv',
  bytes: (parts: readonly string[]) => `rerun bytes: ${parts.join(', ')}`,
  identical: (file: string) => `${file} identical`,
  differs: (file: string) => `${file} differs`,
  notRebuilt: (file: string) => `${file} not rebuilt (verify prints no PDF; its recorded hash is checked above)`,
  differencesHeading: (count: number) => `differences (${count}), stored vs recomputed:`,
  more: (count: number) => `  ... and ${count} more`,
  outputChanged: (file: string, expected: string, actual: string) => `${file}: SHA-256 ${actual}, the manifest records ${expected}`,
  outputMissing: (file: string) => `${file}: listed in the manifest but missing`,
  bytesDiffer: (file: string, line: number) => `${file}: the rerun differs from the stored file from line ${line}`,
  numberDiffers: (path: string, stored: string, rerun: string) => `${path}: ${stored} vs ${rerun}`,
  match: (folder: string) => `ok: ${folder} is what its inputs give`,
  mismatch: (folder: string, count: number) => `mismatch: ${folder} differs from what its inputs give in ${count} place${count === 1 ? '' : 's'}`,
};
