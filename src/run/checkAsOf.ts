// A series' data against the memo's as-of period. Periods of different frequencies compare by
// the months they span (`monthSpan`): an observation belongs to the memo only when its period
// ends no later than the as-of period does, so an annual as-of 2024 takes monthly data up to
// 2024-12 and quarterly data up to 2024-Q4, while a monthly as-of 2024-06 takes annual data up
// to 2023 (the year 2024 is not over by then). Data running past the as-of period are refused.
// The period the data could reach is the latest of the series' own frequency ending by then; a
// series ending more than one period before it (one period is the usual publication lag) is
// reported as a warning and in the memo, and the run goes on.
import { formatPeriod, parsePeriod, periodFromIndex, periodIndex, periodsPerYear } from '../base/period.js';
import type { InputLocation, InputProblem } from '../base/problem.js';
import type { Series } from '../base/series.js';
import type { DataEnd } from '../memo/memoInput.js';
import { monthSpan } from './findEarlierRecord.js';
import { asOfMessages } from './messages.js';

/** More periods than this between the last observation and the as-of period are reported. */
export const AS_OF_LAG_ACCEPTED = 1;

export interface AsOfCheck {
  /** The data run past the as-of period: the run is refused. */
  refusal: InputProblem | null;
  /** The data end more than one period before the as-of period: a warning, and the memo says so. */
  gap: { dataEnd: DataEnd; warning: InputProblem } | null;
}

/**
 * The latest period of `series`' frequency that ends by the end of `asOf`; null when `asOf` is
 * no period label (the config stage has refused it already).
 */
export function lastPeriodBy(asOf: string, series: Pick<Series, 'frequency'>): string | null {
  const span = monthSpan(asOf);
  if (span === null) return null;
  const months = 12 / periodsPerYear(series.frequency);
  // Period k of this frequency covers months k·m … k·m + m − 1.
  return formatPeriod(periodFromIndex(series.frequency, Math.floor((span[1] + 1) / months) - 1));
}

/** `file` is the series file as the config writes it. */
export function checkAsOf(asOf: string, at: InputLocation, seriesId: string, file: string, series: Series): AsOfCheck {
  const own = monthSpan(asOf);
  const last = monthSpan(series.last);
  const reachable = lastPeriodBy(asOf, series);
  const lastPeriod = parsePeriod(series.last);
  if (own === null || last === null || reachable === null || lastPeriod === null) return { refusal: null, gap: null };
  if (last[1] > own[1]) return { refusal: asOfMessages.dataPastAsOf(at, seriesId, file, series.last, asOf, reachable), gap: null };
  const reachablePeriod = parsePeriod(reachable);
  if (reachablePeriod === null) return { refusal: null, gap: null };
  const missing = periodIndex(reachablePeriod) - periodIndex(lastPeriod);
  if (missing <= AS_OF_LAG_ACCEPTED) return { refusal: null, gap: null };
  const dataEnd: DataEnd = { last: series.last, as_of: asOf, reachable, missing };
  return { refusal: null, gap: { dataEnd, warning: asOfMessages.dataEndEarly(at, seriesId, file, dataEnd, series.frequency) } };
}
