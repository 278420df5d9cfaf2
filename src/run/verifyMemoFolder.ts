// `verify`: a memo folder checked against what its inputs give today, from the copies of the
// inputs it carries, so an archived folder verifies wherever it lies.
//   manifest.json ─readManifest─▶ inputs: each copy must have its recorded SHA-256 (else exit 2);
//   an original still at its place must too (a changed one is exit 2, a missing one is fine)
//   ─▶ outputs still as the manifest records them ─▶ the copied config and data (planFromCopies)
//   ─prepareMemo + assembleMemo with the recorded command, run date, earlier record, sign-off
//   log and supersession─▶ record.json and forecasts.csv compared number by number
//   (compareJson's tolerance), memo.html byte for byte ─▶ every recorded sign-off, and those of
//   the revisions the folder keeps, reported valid or void on the stored content.
// The rerun goes through the code `run` uses, and writes nothing. Void sign-offs do not change
// the exit code: the rendered status is rebuilt from the valid ones, so a void one shown as
// counting is a memo.html difference (exit 3).
import { existsSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { parse } from 'csv-parse/sync';
import { toolVersion } from '../base/toolVersion.js';
import { InputError, type InputProblem } from '../base/problem.js';
import { MAX_RUN_DOCUMENT_BYTES, readRegularFile, type FileFault, type FileRead } from '../base/readRegularFile.js';
import { shownPath } from '../base/shownPath.js';
import { assembleMemo } from './assembleMemo.js';
import { compareJson, TOLERANCE_TEXT, type Difference } from './compareJson.js';
import { asOfFolders } from './findEarlierRecord.js';
import { REVISIONS_FOLDER } from './issuedMemo.js';
import { inputDigest, sha256, type Manifest, type ManifestInput } from './manifest.js';
import { verifyMessages, verifyReport } from './messages.js';
import { earlierFromCopies, planFromCopies } from './planFromCopies.js';
import { attachTrackRecord } from './trackRecord.js';
import { prepareMemo } from './prepareMemo.js';
import { signOffReport } from './signOffReport.js';
import { readStoredMemo, storedFormats } from './storedMemo.js';

export interface VerifyResult {
  /** The report without its differences. */
  lines: string[];
  /** One line each, in the report's wording. */
  differences: string[];
}

const ROLE_NAME: Record<ManifestInput['role'], string> = { config: 'config', data: 'data file', 'earlier-record': 'earlier record' };

/** A FIFO or a device in an input's place is never opened: it is read as a fault, like a missing file. */
function readBytes(path: string): FileRead {
  return readRegularFile(path, MAX_RUN_DOCUMENT_BYTES);
}

/** The copy a verify needs is missing, or something other than a regular file within the bound stands in its place. */
function unreadableInput(fault: FileFault, shown: string, field: string, role: string, path: string, sha: string): InputProblem {
  return fault.kind === 'missing' || fault.kind === 'dangling-link' ? verifyMessages.inputMissing(shown, field, role, path, sha) : verifyMessages.inputNotAFile(shown, field, role, path, sha);
}

/** Copies must be there with their digest; originals that are there must have it too. Returns the originals found and missing. */
function checkInputs(folder: string, manifest: Manifest, shown: string): { found: number; missing: number } {
  const problems: InputProblem[] = [];
  let found = 0;
  let missing = 0;
  manifest.inputs.forEach((input, i) => {
    const field = `inputs[${i}]`;
    const what = ROLE_NAME[input.role];
    const check = (path: string, role: string, bytes: Buffer) => {
      const actual = inputDigest(input.role, bytes);
      if (actual !== input.sha256) problems.push(verifyMessages.inputChanged(shown, field, role, shownPath(path), input.sha256, actual));
    };
    if (input.copy !== undefined) {
      const path = resolve(folder, input.copy);
      const read = readBytes(path);
      if (read.fault !== undefined) problems.push(unreadableInput(read.fault, shown, field, `copy of the ${what}`, shownPath(path), input.sha256));
      else check(path, `copy of the ${what}`, read.bytes);
    }
    const original = resolve(folder, input.from_output);
    const read = readBytes(original);
    if (read.fault === undefined) {
      found += 1;
      check(original, what, read.bytes);
    } else if (input.copy === undefined) {
      problems.push(unreadableInput(read.fault, shown, field, what, shownPath(original), input.sha256));
    } else {
      missing += 1;
    }
  });
  if (problems.length > 0) throw new InputError(problems);
  return { found, missing };
}

const NUMBER = /^-?\d+(\.\d+)?(e[+-]?\d+)?$/i;

/** forecasts.csv as rows keyed by column, number cells as numbers, so compareJson can apply its tolerance. */
function csvRows(text: string): Record<string, unknown>[] {
  const rows: Record<string, string>[] = parse(text, { columns: true });
  return rows.map((row) => Object.fromEntries(Object.entries(row).map(([key, cell]) => [key, NUMBER.test(cell) ? Number(cell) : cell])));
}

/**
 * forecasts.csv row by row, each difference named by its series, model and period
 * (`forecasts.csv metered-connections stochastic 2027: point`) rather than a row number.
 */
function compareCsvRows(stored: readonly Record<string, unknown>[], rerun: readonly Record<string, unknown>[]): Difference[] {
  const differences: Difference[] = [];
  for (let i = 0; i < Math.max(stored.length, rerun.length); i++) {
    const row = stored[i] ?? rerun[i];
    const name = ['series_id', 'model', 'period'].map((key) => String(row[key] ?? '')).join(' ');
    for (const difference of compareJson(stored[i], rerun[i]).differences) {
      differences.push({ ...difference, path: `forecasts.csv ${name}${difference.path === '' ? '' : `: ${difference.path}`}` });
    }
  }
  return differences;
}

/**
 * A path in record.json with the series' id for its index in `records` and the period for a
 * forecast row's index: `records[0].forecasts.stochastic[3].point` reads
 * `metered-connections: forecasts.stochastic 2028: point`.
 */
export function readableRecordPath(path: string, document: unknown): string {
  const records = (document as { records?: { series?: { id?: string }; forecasts?: Record<string, { period?: string }[]> }[] } | null)?.records;
  const match = /^records\[(\d+)\]\.?(.*)$/.exec(path);
  if (match === null || records === undefined) return path;
  const record = records[Number(match[1])];
  const rest = match[2].replace(/^forecasts\.(\w+)\[(\d+)\]\.?/, (whole, model: string, index: string) => {
    const period = record?.forecasts?.[model]?.[Number(index)]?.period;
    return period === undefined ? whole : `forecasts.${model} ${period}: `;
  });
  return `${record?.series?.id ?? `records[${match[1]}]`}: ${rest.replace(/: $/, '')}`;
}

function firstDifferentLine(a: string, b: string): number {
  const left = a.split('\n');
  const right = b.split('\n');
  let line = 0;
  while (line < left.length && line < right.length && left[line] === right[line]) line++;
  return line + 1;
}

function parsedJson(bytes: Buffer): unknown {
  try {
    return JSON.parse(bytes.toString('utf8'));
  } catch {
    return bytes.toString('utf8');
  }
}

export async function verifyMemoFolder(folderArgument: string): Promise<VerifyResult> {
  const folder = resolve(folderArgument);
  const shown = shownPath(folder);
  if (!existsSync(folder)) throw new InputError(verifyMessages.notFound(shown));
  const memo = readStoredMemo(folder);
  if (memo === null) throw new InputError(verifyMessages.noManifest(shown, asOfFolders(folder)));
  const { manifest, manifestFile } = memo;
  const originals = checkInputs(folder, manifest, manifestFile);
  const lines = [verifyReport.header(shown, manifest.run_date, `${manifest.tool.name} ${manifest.tool.version}`, manifest.command)];
  const current = toolVersion();
  if (current.version !== manifest.tool.version) lines.push(verifyReport.otherVersion(`${manifest.tool.name} ${manifest.tool.version}`, `${current.name} ${current.version}`));
  lines.push(verifyReport.inputs(manifest.inputs.length));
  if (manifest.inputs.some((input) => input.copy !== undefined)) lines.push(verifyReport.originals(originals.found, originals.missing));
  const differences: string[] = [];
  for (const output of manifest.outputs) {
    const bytes = memo.stored.get(output.file);
    if (bytes === undefined) differences.push(verifyReport.outputMissing(output.file));
    else if (sha256(bytes) !== output.sha256) differences.push(verifyReport.outputChanged(output.file, output.sha256, sha256(bytes)));
  }
  lines.push(verifyReport.outputs(manifest.outputs.length, differences.length));

  const plan = planFromCopies(folder, manifest, manifestFile);
  const templates = plan.output.templates;
  const templatesMissing = templates !== undefined && !existsSync(templates.folder);
  const prepared = await prepareMemo(plan, { runDate: manifest.run_date });
  const earlier = earlierFromCopies(folder, manifest, manifestFile);
  attachTrackRecord(prepared.document, earlier);
  const { files } = await assembleMemo(plan, prepared.loaded, prepared.document, {
    // The formats the run wrote, so the content digest is the one the sign-offs were given on; no PDF is printed.
    formats: storedFormats(manifest).filter((format) => format !== 'pdf' && !(format === 'html' && templatesMissing)),
    command: manifest.command,
    earlier: earlier[0]?.document ?? null,
    inputs: manifest.inputs,
    copies: [],
    signOffs: memo.log,
    supersedes: memo.supersedes,
  });
  const rebuilt = new Map(files.map((file) => [file.name, Buffer.from(file.content)]));
  const numberDifferences: Difference[] = [];
  const storedRecord = memo.stored.get('record.json');
  const rerunRecord = rebuilt.get('record.json');
  if (storedRecord !== undefined && rerunRecord !== undefined) {
    const storedDocument = parsedJson(storedRecord);
    const comparison = compareJson(storedDocument, parsedJson(rerunRecord));
    numberDifferences.push(...comparison.differences.map((difference) => ({ ...difference, path: `record.json ${readableRecordPath(difference.path, storedDocument)}` })));
    lines.push(verifyReport.records(prepared.records.length, comparison.numbers, TOLERANCE_TEXT));
  } else {
    lines.push(verifyReport.noRecord);
  }
  const storedCsv = memo.stored.get('forecasts.csv');
  const rerunCsv = rebuilt.get('forecasts.csv');
  if (storedCsv !== undefined && rerunCsv !== undefined) {
    numberDifferences.push(...compareCsvRows(csvRows(storedCsv.toString('utf8')), csvRows(rerunCsv.toString('utf8'))));
  }
  differences.push(...numberDifferences.map((d) => verifyReport.numberDiffers(d.path, d.stored, d.rerun)));
  const bytes: string[] = [];
  for (const file of ['memo.html', 'record.json', 'forecasts.csv', 'forecasts.xlsx']) {
    const stored = memo.stored.get(file);
    const again = rebuilt.get(file);
    if (stored === undefined || again === undefined) continue;
    const same = stored.equals(again);
    bytes.push(same ? verifyReport.identical(file) : verifyReport.differs(file));
    // record.json and forecasts.csv are judged number by number above; the memo's text has no tolerance.
    if (!same && file === 'forecasts.xlsx') differences.push(verifyReport.workbookDiffers(file));
    if (!same && file === 'memo.html') differences.push(verifyReport.bytesDiffer(file, firstDifferentLine(stored.toString('utf8'), again.toString('utf8'))));
  }
  if (templatesMissing && templates !== undefined) bytes.push(verifyReport.templatesMissing(shownPath(templates.folder)));
  if (manifest.outputs.some((output) => output.file === 'memo.pdf')) bytes.push(verifyReport.notRebuilt('memo.pdf'));
  if (bytes.length > 0) lines.push(verifyReport.bytes(bytes));
  lines.push(...signOffReport(memo, plan.memo.reviewers));
  // A revised memo keeps the revision it supersedes, whose content must still be the one the note names.
  if (memo.supersedes !== null) {
    const { revision, digest } = memo.supersedes;
    const kept = readStoredMemo(join(folder, REVISIONS_FOLDER, String(revision)));
    if (kept === null) differences.push(verifyReport.revisionMissing(revision));
    else if (kept.digest !== digest) differences.push(verifyReport.revisionChanged(revision, digest, kept.digest));
  }
  return { lines, differences };
}
