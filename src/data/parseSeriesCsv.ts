// CSV text to a checked Series. Every problem the file has is collected in one pass and
// thrown as one InputError; only problems that leave no row readable (no header, an unknown
// column) stop the pass early.

import { createHash } from 'node:crypto';
import { InputError, type InputLocation, type InputProblem } from '../base/problem.js';
import { cellField } from '../base/quotedCell.js';
import { dataMessages } from './messages.js';
import { checkPeriods, type DatedLine } from './checkPeriods.js';
import { checkSeries, exactPatternProblem } from './checkSeries.js';
import { limitProblems } from '../base/limitProblems.js';
import { formatPeriod, parsePeriod, periodFromIndex, periodIndex, periodsPerYear, type Frequency } from '../base/period.js';
import { describeTransform, transformValue } from '../base/transform.js';
import { parseValue } from './parseValue.js';
import { readCsvTable, type CsvRow } from './readCsvTable.js';
import { selectColumns, type ColumnChoice } from './selectColumns.js';
import type { Series } from '../base/series.js';
import type { MissingPolicy, Transform } from '../base/settings.js';

interface Observation extends DatedLine {
  value: number | undefined;
}

function cellProblem(text: string, at: InputLocation, allowMissing: boolean): { value?: number; problem?: InputProblem } {
  const parsed = parseValue(text);
  switch (parsed.kind) {
    case 'number':
      return { value: parsed.value };
    case 'empty':
      return allowMissing ? { value: Number.NaN } : { problem: dataMessages.emptyValue(at) };
    case 'missing-marker':
      return allowMissing ? { value: Number.NaN } : { problem: dataMessages.missingMarker(at, text) };
    case 'non-finite':
      return { problem: dataMessages.nonFinite(at, text) };
    case 'invalid':
      return { problem: dataMessages.badValue(at, text) };
  }
}

function readRow(row: CsvRow, width: number, choice: ColumnChoice, file: string, problems: InputProblem[], allowMissing: boolean): Observation | undefined {
  const { line, cells } = row;
  if (cells.length !== width) problems.push(dataMessages.rowWidth({ file, line }, cells.length, width));
  const label = cells[choice.periodPosition] ?? '';
  const periodAt = { file, line, column: choice.periodPosition + 1, field: cellField(choice.periodColumn) };
  const period = label === '' ? null : parsePeriod(label);
  if (label === '') problems.push(dataMessages.emptyPeriod(periodAt));
  else if (period === null) problems.push(dataMessages.badPeriod(periodAt, label));
  const valueAt = { file, line, column: choice.valuePosition + 1, field: cellField(choice.column) };
  const { value, problem } = cellProblem(cells[choice.valuePosition] ?? '', valueAt, allowMissing);
  if (problem !== undefined) problems.push(problem);
  return period === null ? undefined : { line, label, period, value };
}

/**
 * The work of `readSeriesCsv` on text already read; `file` names the source in messages and in
 * the result, and `sha256` is taken over the text encoded as UTF-8.
 */
/** What the caller wants from the file and what the later use of the series requires. */
export interface SeriesOptions {
  /** Value column; default: the first column that is not the period column. */
  column?: string;
  /** Period column; default: the first column. */
  periodColumn?: string;
  /** Expected frequency; default: inferred from the first period label. */
  frequency?: Frequency;
  /** Fewest observations the caller's use of the series needs. */
  minObservations?: number;
  /** The transform the models will apply: the values must allow it. */
  transform?: Transform;
  /**
   * 'allow': empty cells, missing-value markers and missing periods become NaN observations
   * (the first and last must still be present); 'error': each is a problem.
   */
  missing: MissingPolicy;
}

export function parseSeriesCsv(text: string, file: string, options: SeriesOptions): Series {
  const { header, rows } = readCsvTable(text, file);
  const choice = selectColumns(header, file, options);
  if (rows.length === 0) throw new InputError(dataMessages.noData({ file, line: header.line }));

  const allowMissing = options.missing === 'allow';
  const problems: InputProblem[] = [];
  const observations: Observation[] = [];
  for (const row of rows) {
    const observation = readRow(row, header.cells.length, choice, file, problems, allowMissing);
    if (observation !== undefined) observations.push(observation);
  }
  const periodColumn = { file, column: choice.periodPosition + 1, field: cellField(choice.periodColumn) };
  const periods = checkPeriods(observations, periodColumn, options.frequency, allowMissing);
  problems.push(...periods.problems);

  const valued = observations.filter((entry) => entry.value !== undefined && !Number.isNaN(entry.value));
  const observed = Float64Array.from(valued, (entry) => entry.value ?? NaN);
  const lines = valued.map((entry) => entry.line);
  problems.push(...checkSeries({ file, column: cellField(choice.column), values: observed, lines }, options));
  const ends = [observations[0], observations[observations.length - 1]];
  if (allowMissing && ends.every((entry) => entry !== undefined)) {
    ends.forEach((entry, i) => {
      if (Number.isNaN(entry.value)) problems.push(dataMessages.missingEnd({ file, line: entry.line, field: cellField(choice.column) }, i === 0 ? 'first' : 'last', entry.label));
    });
  }

  if (problems.length > 0 || periods.frequency === undefined) throw new InputError(limitProblems(problems));
  const { labels, values } = allowMissing ? fillGaps(observations, periods.frequency) : { labels: observations.map((entry) => formatPeriod(entry.period)), values: observed };
  // A series with no random variation on the scale the models see is refused here, with the file's name.
  const transform = options.transform !== undefined && options.transform.kind !== 'none' ? options.transform : undefined;
  const modelScale = transform === undefined ? values : values.map((value) => (Number.isNaN(value) ? value : transformValue(transform, value)));
  const exact = exactPatternProblem(modelScale, periodsPerYear(periods.frequency), { file, field: cellField(choice.column) }, transform === undefined ? null : describeTransform(transform));
  if (exact !== undefined) throw new InputError([exact]);
  return {
    file,
    column: choice.column,
    periodColumn: choice.periodColumn,
    frequency: periods.frequency,
    periods: labels,
    values,
    first: labels[0],
    last: labels[labels.length - 1],
    n: values.length,
    missing: values.filter(Number.isNaN).length,
    sha256: createHash('sha256').update(text, 'utf8').digest('hex'),
  };
}

/** Every period from the first to the last, NaN where the file has no value (rows already in order). */
function fillGaps(observations: readonly Observation[], frequency: Frequency): { labels: string[]; values: Float64Array } {
  const start = periodIndex(observations[0].period);
  const end = periodIndex(observations[observations.length - 1].period);
  const values = new Float64Array(end - start + 1).fill(Number.NaN);
  for (const entry of observations) values[periodIndex(entry.period) - start] = entry.value ?? Number.NaN;
  const labels = Array.from(values, (_, i) => formatPeriod(periodFromIndex(frequency, start + i)));
  return { labels, values };
}
