// `verify`: a memo folder checked against what its inputs give today.
//   manifest.json ─readManifest─▶ inputs (from_output, SHA-256: changed or missing → exit 2)
//   ─▶ outputs still as the manifest records them ─▶ loadConfig + prepareMemo with the recorded
//   command, run date and earlier record ─▶ record.json and forecasts.csv compared number by
//   number (compareJson's tolerance), memo.html byte for byte.
// The rerun goes through prepareMemo, the code `run` uses, and writes nothing.
import { existsSync, readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { parse } from 'csv-parse/sync';
import { toolVersion } from '../base/toolVersion.js';
import { loadConfig } from '../config/loadConfig.js';
import { InputError, type InputProblem } from '../base/problem.js';
import { verifyMessages, verifyReport } from './messages.js';
import { readComparableDocument } from './comparableDocument.js';
import { compareJson, TOLERANCE_TEXT, type Difference } from './compareJson.js';
import { asOfFolders, type EarlierRecord } from './findEarlierRecord.js';
import { sha256, type Manifest, type ManifestInput } from './manifest.js';
import { prepareMemo } from './prepareMemo.js';
import { readManifest } from './readManifest.js';
import { shownPath } from '../base/shownPath.js';

export interface VerifyResult {
  /** The report without its differences. */
  lines: string[];
  /** One line each, in the report's wording. */
  differences: string[];
}

const ROLE_NAME: Record<ManifestInput['role'], string> = { config: 'config', data: 'data file', 'earlier-record': 'earlier record' };

/** The digest a run records: of the bytes, and for the config of its text, as the config stage hashes it. */
function inputDigest(input: ManifestInput, bytes: Buffer): string {
  if (input.role !== 'config') return sha256(bytes);
  try {
    return sha256(new TextDecoder('utf-8', { fatal: true }).decode(bytes));
  } catch {
    return sha256(bytes);
  }
}

function checkInputs(folder: string, manifest: Manifest, shown: string): void {
  const problems: InputProblem[] = [];
  manifest.inputs.forEach((input, i) => {
    const field = `inputs[${i}]`;
    const what = ROLE_NAME[input.role];
    const path = resolve(folder, input.from_output);
    let bytes: Buffer;
    try {
      bytes = readFileSync(path);
    } catch {
      problems.push(verifyMessages.inputMissing(shown, field, what, shownPath(path), input.sha256));
      return;
    }
    const actual = inputDigest(input, bytes);
    if (actual !== input.sha256) problems.push(verifyMessages.inputChanged(shown, field, what, shownPath(path), input.sha256, actual));
  });
  if (problems.length > 0) throw new InputError(problems);
}

function checkOutputs(folder: string, manifest: Manifest): { differences: string[]; stored: Map<string, Buffer> } {
  const differences: string[] = [];
  const stored = new Map<string, Buffer>();
  for (const output of manifest.outputs) {
    const path = join(folder, output.file);
    if (!existsSync(path)) {
      differences.push(verifyReport.outputMissing(output.file));
      continue;
    }
    const bytes = readFileSync(path);
    stored.set(output.file, bytes);
    const actual = sha256(bytes);
    if (actual !== output.sha256) differences.push(verifyReport.outputChanged(output.file, output.sha256, actual));
  }
  return { differences, stored };
}

function earlierRecord(folder: string, manifest: Manifest, shown: string): EarlierRecord | null {
  const index = manifest.inputs.findIndex((input) => input.role === 'earlier-record');
  if (index < 0) return null;
  const input = manifest.inputs[index];
  const file = resolve(folder, input.from_output);
  const read = readComparableDocument(file);
  if (read === null) throw new InputError(verifyMessages.earlierRecordUnreadable(shown, `inputs[${index}]`, input.from_output));
  return { asOf: read.document.memo.as_of, file, ...read };
}

const NUMBER = /^-?\d+(\.\d+)?(e[+-]?\d+)?$/i;

/** forecasts.csv as rows keyed by column, number cells as numbers, so compareJson can apply its tolerance. */
function csvRows(text: string): Record<string, unknown>[] {
  const rows: Record<string, string>[] = parse(text, { columns: true });
  return rows.map((row) => Object.fromEntries(Object.entries(row).map(([key, cell]) => [key, NUMBER.test(cell) ? Number(cell) : cell])));
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
  const manifestFile = join(folder, 'manifest.json');
  if (!existsSync(manifestFile)) throw new InputError(verifyMessages.noManifest(shown, asOfFolders(folder)));
  const manifest = readManifest(manifestFile, join(shown, 'manifest.json'));
  checkInputs(folder, manifest, join(shown, 'manifest.json'));
  const lines = [verifyReport.header(shown, manifest.run_date, `${manifest.tool.name} ${manifest.tool.version}`, manifest.command)];
  const current = toolVersion();
  if (current.version !== manifest.tool.version) lines.push(verifyReport.otherVersion(`${manifest.tool.name} ${manifest.tool.version}`, `${current.name} ${current.version}`));
  lines.push(verifyReport.inputs(manifest.inputs.length));
  const outputs = checkOutputs(folder, manifest);
  const differences = [...outputs.differences];
  lines.push(verifyReport.outputs(manifest.outputs.length, outputs.differences.length));

  const config = manifest.inputs.find((input) => input.role === 'config');
  if (config === undefined) throw new InputError(verifyMessages.badManifest(join(shown, 'manifest.json'), 'inputs', 'a list with one config'));
  const plan = loadConfig(shownPath(resolve(folder, config.from_output)));
  const rerun = await prepareMemo(plan, {
    folder,
    formats: ['html', 'json', 'csv'],
    command: manifest.command,
    runDate: manifest.run_date,
    earlier: earlierRecord(folder, manifest, join(shown, 'manifest.json')),
  });
  const rebuilt = new Map(rerun.files.map((file) => [file.name, Buffer.from(file.content)]));
  const numberDifferences: Difference[] = [];
  const storedRecord = outputs.stored.get('record.json');
  const rerunRecord = rebuilt.get('record.json');
  if (storedRecord !== undefined && rerunRecord !== undefined) {
    const comparison = compareJson(parsedJson(storedRecord), parsedJson(rerunRecord));
    numberDifferences.push(...comparison.differences);
    lines.push(verifyReport.records(rerun.records.length, comparison.numbers, TOLERANCE_TEXT));
  } else {
    lines.push(verifyReport.noRecord);
  }
  const storedCsv = outputs.stored.get('forecasts.csv');
  const rerunCsv = rebuilt.get('forecasts.csv');
  if (storedCsv !== undefined && rerunCsv !== undefined) {
    numberDifferences.push(...compareJson(csvRows(storedCsv.toString('utf8')), csvRows(rerunCsv.toString('utf8')), 'forecasts.csv').differences);
  }
  differences.push(...numberDifferences.map((d) => verifyReport.numberDiffers(d.path, d.stored, d.rerun)));
  const bytes: string[] = [];
  for (const file of ['memo.html', 'record.json', 'forecasts.csv']) {
    const stored = outputs.stored.get(file);
    const again = rebuilt.get(file);
    if (stored === undefined || again === undefined) continue;
    const same = stored.equals(again);
    bytes.push(same ? verifyReport.identical(file) : verifyReport.differs(file));
    // record.json and forecasts.csv are judged number by number above; the memo's text has no tolerance.
    if (!same && file === 'memo.html') differences.push(verifyReport.bytesDiffer(file, firstDifferentLine(stored.toString('utf8'), again.toString('utf8'))));
  }
  if (manifest.outputs.some((output) => output.file === 'memo.pdf')) bytes.push(verifyReport.notRebuilt('memo.pdf'));
  if (bytes.length > 0) lines.push(verifyReport.bytes(bytes));
  return { lines, differences };
}
