// Rows of period and value cells (from a CSV file or a workbook sheet) to a checked Series.
// Every independent problem is collected in one pass and thrown as one InputError; a period
// column unreadable throughout is one problem at its first bad cell, since every later finding
// (order, gaps, the count of observations) would only repeat it.
import { InputError, type InputLocation, type InputProblem } from '../base/problem.js';
import { limitProblems } from '../base/limitProblems.js';
import { formatPeriod, parsePeriod, periodFromIndex, periodIndex, periodsPerYear, type Frequency, type Period } from '../base/period.js';
import type { Series } from '../base/series.js';
import { describeTransform, transformValue } from '../base/transform.js';
import { checkPeriods, type DatedLine } from './checkPeriods.js';
import { checkSeries, exactPatternProblem } from './checkSeries.js';
import { dataMessages } from './messages.js';
import { dateSpacing, parseIsoDate, periodOfDate, type CalendarDate } from './periodDates.js';
import type { DecimalMark, ParsedValue } from './parseValue.js';
import type { SeriesOptions } from './seriesOptions.js';

export interface SeriesRow {
  /** Line of a CSV file, row of a sheet. */
  line: number;
  /** The period cell as text; `date` when a workbook stores it as a date; `problem` when the cell cannot be read at all (a formula without its result). */
  period: { text: string; date?: CalendarDate; problem?: InputProblem };
  periodAt: InputLocation;
  value: { text: string; parsed: ParsedValue; problem?: InputProblem };
  valueAt: InputLocation;
}

export interface SeriesSource {
  file: string;
  periodColumn: string;
  column: string;
  /** The period column's place without a line: file, column number, field, sheet. */
  periodColumnAt: InputLocation;
  /** The value column's place without a line. */
  valueColumnAt: InputLocation;
  decimalMark: DecimalMark;
  /** Problems the reader found in the rows' shape (CSV rows wider or narrower than the header). */
  rowProblems: readonly InputProblem[];
  sha256: string;
}

type PeriodReading = { kind: 'unreadable'; problem: InputProblem } | { kind: 'empty' } | { kind: 'label'; period: Period } | { kind: 'date'; date: CalendarDate } | { kind: 'no-such-day' } | { kind: 'bad' };

function readPeriodCell(cell: SeriesRow['period']): PeriodReading {
  if (cell.problem !== undefined) return { kind: 'unreadable', problem: cell.problem };
  if (cell.date !== undefined) return { kind: 'date', date: cell.date };
  if (cell.text === '') return { kind: 'empty' };
  const period = parsePeriod(cell.text);
  if (period !== null) return { kind: 'label', period };
  const date = parseIsoDate(cell.text);
  if (date === 'no-such-day') return { kind: 'no-such-day' };
  return date === null ? { kind: 'bad' } : { kind: 'date', date };
}

/** A period column counts as unreadable throughout when its first label is bad, or when at least this many and more than half are. */
const REPEATED_BAD_LABELS = 3;

function valueOf(cell: SeriesRow['value'], at: InputLocation, allowMissing: boolean, mark: DecimalMark): { value?: number; problem?: InputProblem } {
  const { parsed, text } = cell;
  if (cell.problem !== undefined) return { problem: cell.problem };
  switch (parsed.kind) {
    case 'number':
      return { value: parsed.value };
    case 'empty':
      return allowMissing ? { value: Number.NaN } : { problem: dataMessages.emptyValue(at) };
    case 'missing-marker':
      return allowMissing ? { value: Number.NaN } : { problem: dataMessages.missingMarker(at, text) };
    case 'non-finite':
      return { problem: dataMessages.nonFinite(at, text) };
    case 'other-mark':
      return { problem: dataMessages.otherMark(at, text, mark) };
    case 'grouped':
      return { problem: dataMessages.groupedDigits(at, text) };
    case 'invalid':
      return { problem: dataMessages.badValue(at, text) };
  }
}

interface Observation extends DatedLine {
  value: number | undefined;
}

/**
 * The frequency of a column of dates: the one set (refused when the dates are closer together
 * than its periods, which would make every later date of a period a duplicate), else their spacing.
 */
function dateFrequency(rows: readonly { row: SeriesRow; date: CalendarDate }[], given: Frequency | undefined): { frequency?: Frequency; problem?: InputProblem } {
  const spacing = dateSpacing(rows.map((entry) => entry.date));
  if (given !== undefined) {
    if (spacing.kind === 'single' || spacing.months >= 12 / periodsPerYear(given)) return { frequency: given };
    for (let i = 1; i < rows.length; i++) {
      const [a, b] = [periodOfDate(rows[i - 1].date, given), periodOfDate(rows[i].date, given)];
      if (periodIndex(a) !== periodIndex(b)) continue;
      const spaced = spacing.kind === 'frequency' ? spacing.frequency : undefined;
      return { problem: dataMessages.datesFiner(rows[i].row.periodAt, rows[i - 1].row.period.text, rows[i].row.period.text, spaced, given) };
    }
    return { frequency: given };
  }
  if (spacing.kind === 'frequency') return { frequency: spacing.frequency };
  return { problem: dataMessages.dateSpacing(rows[spacing.kind === 'single' ? 0 : 1].row.periodAt, spacing.kind === 'single' ? undefined : spacing.months) };
}

export function assembleSeries(rows: readonly SeriesRow[], source: SeriesSource, options: SeriesOptions): Series {
  const { file } = source;
  const allowMissing = options.missing === 'allow';
  const readings = rows.map((row) => readPeriodCell(row.period));

  const bad = readings.flatMap((reading, i) => (reading.kind === 'bad' ? [i] : []));
  const labelled = readings.filter((reading) => reading.kind !== 'empty').length;
  if (bad.length > 0 && (bad[0] === 0 || (bad.length >= REPEATED_BAD_LABELS && 2 * bad.length > labelled))) {
    const first = rows[bad[0]];
    throw new InputError(dataMessages.unreadablePeriods(first.periodAt, first.period.text, bad.length - 1, labelled));
  }

  const problems: InputProblem[] = [...source.rowProblems];
  const values = rows.map((row) => {
    const { value, problem } = valueOf(row.value, row.valueAt, allowMissing, source.decimalMark);
    if (problem !== undefined) problems.push(problem);
    return value;
  });

  // The first readable label sets the column's form: period labels or dates.
  const firstReadable = readings.findIndex((reading) => reading.kind === 'label' || reading.kind === 'date');
  const form = readings[firstReadable]?.kind;
  const unreadable: number[] = [];
  const labels: { row: SeriesRow; period: Period; value: number | undefined }[] = [];
  const dates: { row: SeriesRow; date: CalendarDate; value: number | undefined }[] = [];
  readings.forEach((reading, i) => {
    const row = rows[i];
    if (reading.kind === 'label' && form === 'label') labels.push({ row, period: reading.period, value: values[i] });
    else if (reading.kind === 'date' && form === 'date') dates.push({ row, date: reading.date, value: values[i] });
    else {
      unreadable.push(row.line);
      if (reading.kind === 'unreadable') problems.push(reading.problem);
      else if (reading.kind === 'empty') problems.push(dataMessages.emptyPeriod(row.periodAt));
      else if (reading.kind === 'bad') problems.push(dataMessages.badPeriod(row.periodAt, row.period.text));
      else if (reading.kind === 'no-such-day') problems.push(dataMessages.noSuchDay(row.periodAt, row.period.text));
      else {
        const first = rows[firstReadable];
        problems.push(dataMessages.mixedPeriodForm(row.periodAt, row.period.text, { label: first.period.text, line: first.line }, reading.kind === 'date'));
      }
    }
  });

  let frequency: Frequency | undefined;
  let observations: Observation[] = [];
  if (form === 'label') {
    observations = labels.map(({ row, period, value }) => ({ line: row.line, label: row.period.text, period, value }));
    const periods = checkPeriods(observations, source.periodColumnAt, options.frequency, allowMissing, unreadable);
    problems.push(...periods.problems);
    frequency = periods.frequency;
  } else if (form === 'date') {
    const decided = dateFrequency(dates, options.frequency);
    if (decided.problem !== undefined) problems.push(decided.problem);
    if (decided.frequency !== undefined) {
      const given = decided.frequency;
      observations = dates.map(({ row, date, value }) => ({ line: row.line, label: row.period.text, period: periodOfDate(date, given), fromDate: true, value }));
      problems.push(...checkPeriods(observations, source.periodColumnAt, given, allowMissing, unreadable).problems);
      frequency = given;
    }
  }

  const valued = observations.filter((entry) => entry.value !== undefined && !Number.isNaN(entry.value));
  const observed = Float64Array.from(valued, (entry) => entry.value ?? Number.NaN);
  const { field, sheet } = source.valueColumnAt;
  const column = field ?? source.column;
  problems.push(...checkSeries({ file, column, values: observed, lines: valued.map((entry) => entry.line), sheet, pendingRows: unreadable.length + observations.filter((entry) => entry.value === undefined).length }, options));
  const ends = [observations[0], observations[observations.length - 1]];
  if (allowMissing && ends.every((entry) => entry !== undefined)) {
    ends.forEach((entry, i) => {
      if (Number.isNaN(entry.value)) problems.push(dataMessages.missingEnd({ file, line: entry.line, field: column, sheet }, i === 0 ? 'first' : 'last', formatPeriod(entry.period)));
    });
  }

  if (problems.length > 0 || frequency === undefined) throw new InputError(limitProblems(problems));
  const series = allowMissing ? fillGaps(observations, frequency) : { labels: observations.map((entry) => formatPeriod(entry.period)), values: observed };
  // A series with no random variation on the scale the models see is refused here, with the file's name.
  const transform = options.transform !== undefined && options.transform.kind !== 'none' ? options.transform : undefined;
  const modelScale = transform === undefined ? series.values : series.values.map((value) => (Number.isNaN(value) ? value : transformValue(transform, value)));
  const exact = exactPatternProblem(modelScale, periodsPerYear(frequency), { file, field: column, sheet }, transform === undefined ? null : describeTransform(transform));
  if (exact !== undefined) throw new InputError([exact]);
  return {
    file,
    column: source.column,
    periodColumn: source.periodColumn,
    frequency,
    periods: series.labels,
    values: series.values,
    first: series.labels[0],
    last: series.labels[series.labels.length - 1],
    n: series.values.length,
    missing: series.values.filter(Number.isNaN).length,
    sha256: source.sha256,
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
