// Checks that the period labels form one unbroken, ordered run of a single frequency.

import { type InputLocation, type InputProblem } from '../base/problem.js';
import { dataMessages } from './messages.js';
import { formatPeriod, periodFromIndex, periodIndex, type Frequency, type Period } from '../base/period.js';

export interface DatedLine {
  line: number;
  /** The cell as written: a period label, or a date (then `fromDate`). */
  label: string;
  period: Period;
  /** The label is a date mapped into its period. */
  fromDate?: boolean;
}

export interface PeriodCheck {
  /** The given frequency, else the first label's; undefined only when there are no labels. */
  frequency: Frequency | undefined;
  problems: InputProblem[];
}

function frequencyProblems(dated: readonly DatedLine[], frequency: Frequency, given: boolean, column: InputLocation): InputProblem[] {
  const odd = dated.filter((entry) => entry.period.frequency !== frequency);
  if (odd.length === 0) return [];
  const [head] = odd;
  const at = { ...column, line: head.line };
  const lines = odd.map((entry) => entry.line);
  if (given) return [dataMessages.frequencyMismatch(at, head.label, head.period.frequency, frequency, lines)];
  const first = dated[0];
  return [dataMessages.mixedFrequency(at, head.label, head.period.frequency, { ...first, frequency }, lines)];
}

function orderProblems(dated: readonly DatedLine[], column: InputLocation): InputProblem[] {
  const problems: InputProblem[] = [];
  const firstLineOf = new Map<number, DatedLine>();
  let latest: DatedLine | undefined;
  let descending = dated.length > 1;
  for (let i = 0; i < dated.length; i++) {
    const entry = dated[i];
    const index = periodIndex(entry.period);
    if (i > 0 && index >= periodIndex(dated[i - 1].period)) descending = false;
    const seen = firstLineOf.get(index);
    if (seen !== undefined) {
      const at = { ...column, line: entry.line };
      problems.push(
        entry.fromDate === true ? dataMessages.dateInSamePeriod(at, entry.label, formatPeriod(entry.period), { label: seen.label, line: seen.line }) : dataMessages.duplicatePeriod(at, entry.label, seen.line),
      );
      continue;
    }
    firstLineOf.set(index, entry);
    if (latest !== undefined && index < periodIndex(latest.period)) {
      problems.push(dataMessages.unsorted({ ...column, line: entry.line }, entry.label, latest));
    } else {
      latest = entry;
    }
  }
  if (descending) {
    const at = { ...column, line: dated[1].line };
    return [dataMessages.descending(at, dated[0].label, dated[dated.length - 1].label)];
  }
  return problems;
}

/** `unreadable`: lines whose period could not be read; a gap with one of them between its two sides is theirs, not reported again. */
function gapProblems(dated: readonly DatedLine[], frequency: Frequency, column: InputLocation, unreadable: readonly number[]): InputProblem[] {
  const byIndex = new Map<number, DatedLine>();
  for (const entry of dated) if (!byIndex.has(periodIndex(entry.period))) byIndex.set(periodIndex(entry.period), entry);
  const indices = [...byIndex.keys()].sort((a, b) => a - b);
  const problems: InputProblem[] = [];
  for (let i = 1; i < indices.length; i++) {
    if (indices[i] - indices[i - 1] === 1) continue;
    const missing: string[] = [];
    for (let index = indices[i - 1] + 1; index < indices[i]; index++) missing.push(formatPeriod(periodFromIndex(frequency, index)));
    const next = byIndex.get(indices[i]);
    const previous = byIndex.get(indices[i - 1]);
    if (previous !== undefined && next !== undefined && unreadable.some((line) => line > Math.min(previous.line, next.line) && line < Math.max(previous.line, next.line))) continue;
    if (next !== undefined) problems.push(dataMessages.gap({ ...column, line: next.line }, missing, next.label));
  }
  return problems;
}

/**
 * Frequency (mixed, or not the one given), duplicates, order and gaps. Order and gaps are
 * judged only among labels of the series' frequency, so one stray label yields one problem.
 * `column` locates the period column (file, field, column number); each problem adds its line.
 */
export function checkPeriods(dated: readonly DatedLine[], column: InputLocation, given?: Frequency, allowGaps = false, unreadable: readonly number[] = []): PeriodCheck {
  const frequency = given ?? dated[0]?.period.frequency;
  if (frequency === undefined) return { frequency, problems: [] };
  const regular = dated.filter((entry) => entry.period.frequency === frequency);
  return {
    frequency,
    problems: [
      ...frequencyProblems(dated, frequency, given !== undefined, column),
      ...orderProblems(regular, column),
      ...(allowGaps ? [] : gapProblems(regular, frequency, column, unreadable)),
    ],
  };
}
