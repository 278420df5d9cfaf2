// What a run says about its output folders, the monthly as-of folders and `verify` (problems
// exit with 2), and the lines of verify's report.
import type { Frequency } from '../base/period.js';
import { abbreviateList, plural, problem, type InputLocation, type InputProblem } from '../base/problem.js';
import type { DataEnd } from '../memo/memoInput.js';

const OUTPUT_FOLDER_HINT = 'choose a folder, or a path where one can be created';
/** What each file-system refusal means, and what to do about it (errno names as in errno(3)). */
const WRITE_REFUSALS: Readonly<Record<string, readonly [string, string]>> = {
  EROFS: ['a read-only file system', 'choose an output folder on a writable disk'],
  EACCES: ['permission denied', 'choose an output folder you may write to, or ask for write permission'],
  EPERM: ['operation not permitted', 'choose an output folder you may write to, or ask for write permission'],
  ENOSPC: ['no space left on the disk', 'free some space or choose an output folder on another disk'],
  EDQUOT: ['disk quota exceeded', 'free some space or choose an output folder on another disk'],
  ENOENT: ['a folder on the way is missing and cannot be created', 'create the output folder, or choose one whose parent exists'],
  ENOTDIR: ['a file stands where a folder is needed', 'move the file away, or choose another output folder'],
  EEXIST: ['something appeared where a folder is needed', 'move it away and run again'],
  EISDIR: ['a folder stands where a file is needed', 'move it away and run again'],
  ENAMETOOLONG: ['a path is too long', 'choose an output folder with a shorter path'],
  ELOOP: ['too many symbolic links on the way', 'choose an output folder without a loop of links'],
};

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
  outputUnwritable(at: InputLocation, folder: string, code: string): InputProblem {
    const [reason, hint] = WRITE_REFUSALS[code] ?? [code, 'check that you may write there and that the disk has room'];
    return problem('run.output-unwritable', `the memo cannot be written into '${folder}' (${code}: ${reason})`, `${hint}; the earlier memo is kept`, at);
  },
  outputOnPseudoFileSystem(at: InputLocation, folder: string, fileSystem: string): InputProblem {
    return problem('run.output-not-a-disk', `the output folder '${folder}' lies on the ${fileSystem} file system, which the kernel makes up and which holds no files`, 'choose a folder on a disk', at);
  },
  memoFolderLink(at: InputLocation, folder: string, target: string): InputProblem {
    return problem(
      'run.memo-folder-link',
      `'${folder}' is a symbolic link to '${target}', and a run writes only inside its output folder`,
      'remove the link, or give the folder it points at as the output folder (--out or output.folder)',
      at,
    );
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
  notFound(folder: string): InputProblem {
    return problem('verify.not-found', `'${folder}' is not found`, 'check the path and its spelling; give the memo folder a run wrote, e.g. out/lake-outlook/2026-01', { file: folder });
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
  inputNotAFile(file: string, field: string, role: string, path: string, expected: string): InputProblem {
    return problem('verify.input-not-a-file', `the ${role} ${path} is not a regular file (expected one with SHA-256 ${expected})`, 'put the file back where the manifest says, or rerun the memo', { file, field });
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
  header: (folder: string, runDate: string, tool: string, command: string) => `verify ${folder}: run on ${runDate} with ${tool}; reproduce in the config's folder with: ${command}`,
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
  workbookDiffers: (file: string) => `${file}: the rerun's workbook differs from the stored one`,
  bytesDiffer: (file: string, line: number) => `${file}: the rerun differs from the stored file from line ${line}`,
  numberDiffers: (path: string, stored: string, rerun: string) => `${path}: ${stored} vs ${rerun}`,
  originals: (found: number, missing: number) =>
    `originals: ${found} found unchanged at their places${missing > 0 ? `, ${missing} not found (the memo folder's copies were used)` : ''}`,
  digest: (digest: string) => `content digest: ${digest}`,
  signOffs: (count: number, valid: number) => `sign-offs: ${count} recorded, ${valid} valid on this content`,
  signOff: (where: string, number: number, reviewer: string, decision: string, date: string, verdict: string) => `  ${where}No. ${number} ${reviewer}, ${decision}, ${date}: ${verdict}`,
  revisionPrefix: (revision: number) => `revision ${revision}, `,
  unreadableSignOff: (where: string, line: number) => `  ${where}line ${line} of the sign-off log: void (not a sign-off entry)`,
  valid: 'valid',
  validSigned: "valid, signed with the reviewer's key",
  voidBecause: (reason: string) => `void (${reason})`,
  revisionMissing: (revision: number) => `revisions/${revision}: the revision this memo supersedes is missing`,
  revisionChanged: (revision: number, recorded: string, actual: string) =>
    `revisions/${revision}: content digest ${actual}, the supersession note records ${recorded}`,
  templatesMissing: (folder: string) => `memo.html not rebuilt: its templates folder ${folder} (output.templates) is missing; its recorded hash is checked above`,
  match: (folder: string) => `ok: ${folder} is what its inputs give`,
  mismatch: (folder: string, count: number) => `mismatch: ${folder} differs from what its inputs give in ${count} place${count === 1 ? '' : 's'}`,
};

/** The copies of a memo's inputs (src/run/inputCopies.ts) and the files that make it self-contained. */
export const copyMessages = {
  unreadable(file: string, role: string): InputProblem {
    return problem('run.input-copy', `the ${role} cannot be read to copy it into the memo folder`, 'check that the file is still there and readable, then run again', { file });
  },
  changed(file: string, role: string, expected: string): InputProblem {
    return problem(
      'run.input-copy',
      `the ${role} no longer has the SHA-256 the memo records (${expected}): it changed while the memo was made, or its copy was altered`,
      'run again, or restore the file; trendbrief verify names what changed',
      { file },
    );
  },
  badSupersedes(file: string): InputProblem {
    return problem('run.bad-supersedes', 'is not the supersession note a run writes', 'restore the memo folder from its archived copy; trendbrief verify names what changed', { file });
  },
};

const REVIEW_HELP = 'see trendbrief review --help';

/** `trendbrief review`: every refusal exits with 2 and changes nothing. */
export const reviewMessages = {
  noFolder(): InputProblem {
    return problem('review.no-folder', 'review needs the memo folder to sign off', 'give one, e.g. trendbrief review out/lake-outlook/2026-01 --reviewer NAME --decision approve');
  },
  extraArguments(extra: readonly string[]): InputProblem {
    return problem('review.extra-arguments', `unexpected argument${extra.length > 1 ? 's' : ''} ${extra.join(' ')}`, `give one memo folder; ${REVIEW_HELP}`);
  },
  notAMemo(folder: string): InputProblem {
    return problem('review.not-a-memo', `'${folder}' has no manifest.json, so it is not a memo folder`, 'give the folder a run wrote, the one with manifest.json in it', { file: folder });
  },
  superseded(folder: string, current: string): InputProblem {
    return problem('review.superseded', `'${folder}' is a revision kept by the memo in '${current}', which supersedes it`, `review the current memo, ${current}`, { file: folder });
  },
  notSelfContained(file: string): InputProblem {
    return problem(
      'review.no-input-copies',
      'lists inputs without copies in the memo folder (written by an earlier version)',
      'rerun the memo with this version so that it carries its inputs, then record the sign-off',
      { file, field: 'inputs' },
    );
  },
  outputChanged(file: string, expected: string, actual: string): InputProblem {
    return problem(
      'review.content-changed',
      `has changed since the run: SHA-256 ${actual}, the manifest records ${expected}`,
      'a sign-off must be given on the memo as issued: restore the folder, or rerun the memo; trendbrief verify lists the differences',
      { file },
    );
  },
  missingOption(option: string, example: string): InputProblem {
    return problem('review.missing-option', 'is needed', `give it, e.g. ${option} ${example}; ${REVIEW_HELP}`, { field: option });
  },
  unknownReviewer(name: string, listed: readonly string[], suggestion: string | undefined, config: string): InputProblem {
    const who = listed.length === 0 ? 'the config lists no reviewers' : `the reviewers are ${listed.map((n) => `'${n}'`).join(', ')}`;
    const hint = suggestion !== undefined ? `did you mean '${suggestion}'?` : `add the reviewer to memo.reviewers in ${config} and rerun the memo (a new revision), or correct the name`;
    return problem('review.unknown-reviewer', `'${name}' is not a reviewer of this memo; ${who}`, hint, { field: '--reviewer' });
  },
  badDecision(value: string, choices: readonly string[]): InputProblem {
    return problem('review.bad-decision', `'${value}' is not a decision`, `give one of ${choices.join(', ')}`, { field: '--decision' });
  },
  commentNeeded(decision: string): InputProblem {
    return problem('review.comment-needed', `a decision of ${decision} needs a comment`, 'say what must change, e.g. --comment "State the drought caveat on page 1."', { field: '--comment' });
  },
  commentTooLong(length: number, most: number): InputProblem {
    return problem('review.comment-too-long', `the comment is ${length} characters long, more than ${most}`, 'shorten it; a longer note belongs in a document the comment names', { field: '--comment' });
  },
  badDate(value: string): InputProblem {
    return problem('review.bad-date', `'${value}' is not a day of the calendar written YYYY-MM-DD`, 'give the date of the decision, e.g. --date 2026-01-15, or leave it out for today', { field: '--date' });
  },
  badResolves(value: string): InputProblem {
    return problem('review.bad-resolves', `'${value}' is not a list of sign-off numbers`, 'give the numbers of the comments resolved, separated by commas, e.g. --resolves 2,3', { field: '--resolves' });
  },
  notOpen(number: number, open: readonly number[]): InputProblem {
    const which = open.length === 0 ? 'no comment is open' : `the open comments are ${open.map((n) => `No. ${n}`).join(', ')}`;
    return problem('review.not-open', `No. ${number} is not an open comment of this memo; ${which}`, 'give only numbers of open comments, as the memo lists them', { field: '--resolves' });
  },
  keyNeeded(name: string): InputProblem {
    return problem('review.key-needed', `'${name}' has a public key in the config, so the sign-off must be signed`, `give --key with ${name}'s private key file`, { field: '--key' });
  },
  keyNotListed(name: string): InputProblem {
    return problem(
      'review.key-not-listed',
      `'${name}' has no public_key in the config, so a signature could not be checked`,
      'leave out --key, or add the public key to memo.reviewers and rerun the memo (a new revision)',
      { field: '--key' },
    );
  },
  badKey(file: string): InputProblem {
    return problem('review.bad-key', 'is not an Ed25519 private key in PEM form', 'give the private key file trendbrief review --new-key wrote', { file, field: '--key' });
  },
  keyMismatch(file: string, name: string): InputProblem {
    return problem('review.key-mismatch', `does not match the public key the config lists for '${name}'`, `give ${name}'s own private key file`, { file, field: '--key' });
  },
  keyFileExists(file: string): InputProblem {
    return problem('review.key-exists', 'already exists, and --new-key never overwrites a key', 'choose another folder, or move the old key away first', { file });
  },
  keyFolderUnwritable(folder: string, reason: string): InputProblem {
    return problem('review.key-unwritable', `the key pair cannot be written (${reason})`, 'choose a folder you may write in', { file: folder });
  },
  newKeyWithDecision(): InputProblem {
    return problem('review.new-key-alone', '--new-key makes a key pair and records nothing', `give --new-key DIR alone; ${REVIEW_HELP}`, { field: '--new-key' });
  },
  templatesMissing(folder: string): InputProblem {
    return problem(
      'review.templates-missing',
      `the memo's templates folder '${folder}' (output.templates) is missing, so the memo cannot be rendered in its house style`,
      'restore the templates folder where the config names it, then record the sign-off',
      { field: 'output.templates' },
    );
  },
  contentNotRebuilt(folder: string): InputProblem {
    return problem(
      'review.content-differs',
      `the memo in '${folder}' wrote no record.json, and analysing its copied inputs again does not give its forecasts.csv`,
      'run trendbrief verify on the folder to see the differences',
      { file: folder },
    );
  },
};

/** A rerun over an issued memo (src/run/issuedMemo.ts). */
export const issuedMessages = {
  noManifest(at: InputLocation, folder: string, signOffs: number): InputProblem {
    return problem(
      'run.issued-memo',
      `the memo in '${folder}' is issued (${plural(signOffs, 'sign-off')} recorded) but has no manifest.json, so what it said cannot be known`,
      'restore the folder from its archived copy, or move it away before running again',
      at,
    );
  },
  wouldReplace(at: InputLocation, folder: string, signOffs: number, before: string, after: string): InputProblem {
    return problem(
      'run.issued-memo',
      `the memo in '${folder}' is issued (${plural(signOffs, 'sign-off')} recorded) and this run would change its content (digest ${before.slice(0, 12)}… to ${after.slice(0, 12)}…)`,
      'run again with --new-revision to keep it as a numbered revision and issue a new draft, or write elsewhere with --out',
      at,
    );
  },
};

/** Two writers on one memo folder (src/run/memoLock.ts). */
export const containmentMessages = {
  leavesOutput(folder: string, real: string, within: string): InputProblem {
    return problem('run.leaves-output', `'${folder}' resolves to '${real}', outside the output folder '${within}'`, 'remove the symbolic link on the way; nothing was written', { file: folder });
  },
  hiddenVersion(folder: string, memo: string): InputProblem {
    return problem('run.hidden-version', `'${folder}' is a hidden version of the memo '${memo}'`, `name the memo '${memo}' instead; nothing was written`, { file: folder });
  },
  nameTaken(folder: string): InputProblem {
    return problem('run.memo-folder-taken', `'${folder}' is neither a memo folder written by this tool nor free`, 'move it away, or choose another output folder or memo id; nothing was written', { file: folder });
  },
};

export const lockMessages = {
  busy(folder: string): InputProblem {
    return problem('run.memo-busy', `another run or review is writing the memo in '${folder}'`, 'wait for it to finish, then try again; nothing was changed', { file: folder });
  },
};

/** `check`'s warnings about a config that runs but whose memo would be weaker than it looks (the run goes on; exit 0). */
export const preflightMessages = {
  noBacktest(at: InputLocation, seriesId: string, n: number, minTrain: number, steps: number, minTrainWritten: boolean): InputProblem {
    return problem(
      'check.no-backtest',
      `warning: series '${seriesId}' has ${plural(n, 'observation')}, too few for a backtest, which needs ${minTrain + steps} (${minTrain} to train on, ${steps} to score); the memo will say that neither model's accuracy has been checked`,
      minTrainWritten ? 'supply a longer history, or lower backtest.min_train' : 'supply a longer history, or lower max_p and max_q (the shortest training window is max(20, 3 × (max_p + max_q + 3)))',
      at,
    );
  },
  thinBacktest(at: InputLocation, seriesId: string, origins: number, needed: number, n: number, minTrain: number): InputProblem {
    return problem(
      'check.thin-backtest',
      `warning: series '${seriesId}' leaves room for ${plural(origins, 'backtest origin')} (${plural(n, 'observation')}, training windows of at least ${minTrain}), fewer than the ${needed} a comparison needs to count; the memo will call the backtest a rough guide`,
      'supply a longer history, or lower backtest.min_train or max_p and max_q',
      at,
    );
  },
  horizonBeyondBacktest(at: InputLocation, seriesId: string, horizon: number, scored: number): InputProblem {
    return problem(
      'check.horizon-beyond-backtest',
      `warning: series '${seriesId}' is forecast ${plural(horizon, 'step')} ahead, but its history lets the backtest score only ${scored}; beyond ${scored} neither model's accuracy is checked and the choice rests on the models' assumptions`,
      'supply a longer history, or shorten horizon; the memo says how far the backtest reached',
      at,
    );
  },
  horizonLong(at: InputLocation, seriesId: string, horizon: number, n: number): InputProblem {
    return problem(
      'check.horizon-long',
      `warning: series '${seriesId}' is forecast ${plural(horizon, 'step')} ahead from ${plural(n, 'observation')}, more than half its history; the trends are extrapolated further than the data reach back`,
      `consider a horizon of at most ${Math.floor(n / 2)}, and read the far end of the memo's intervals as the models' assumptions rather than evidence`,
      at,
    );
  },
  seasonalIgnored(at: InputLocation, seriesId: string, frequency: Frequency, strength: number): InputProblem {
    return problem(
      'check.seasonal-none',
      `warning: series '${seriesId}' is ${frequency} and shows a clear seasonal pattern (STL seasonal strength ${strength.toFixed(2)} on a scale from 0 to 1), but seasonal: none leaves it out of both models`,
      'seasonal: none is for seasonally adjusted data; if these data are not adjusted, remove the key or write seasonal: auto so that the models carry the pattern',
      at,
    );
  },
};
