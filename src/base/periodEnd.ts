// How far to forecast, as an end period: the last period of a series' own frequency that an
// end period written at any frequency covers ("through 2030" is 2030-12 for monthly data,
// 2030-Q4 for quarterly), and the default end period, a calendar-year end (plans and budgets
// run to one).
import { parsePeriod, periodFromIndex, periodIndex, periodsPerYear, formatPeriod, type Frequency, type Period } from './period.js';

/** Months since year 0 of the last month a period spans. */
function lastMonth(period: Period): number {
  const months = 12 / periodsPerYear(period.frequency);
  return (periodIndex(period) + 1) * months - 1;
}

/**
 * The period of `frequency` that ends where `label` ends; undefined when `label` ends inside
 * such a period (2026-06 for annual data), or is no period label.
 */
export function periodThrough(label: string, frequency: Frequency): string | undefined {
  const period = parsePeriod(label);
  if (period === null) return undefined;
  const months = 12 / periodsPerYear(frequency);
  const month = lastMonth(period);
  if ((month + 1) % months !== 0) return undefined;
  return formatPeriod(periodFromIndex(frequency, (month + 1) / months - 1));
}

/** Steps from `last` (a label of the series' frequency) to `through` (one of the same frequency). */
export function stepsBetween(last: string, through: string): number {
  const from = parsePeriod(last);
  const to = parsePeriod(through);
  if (from === null || to === null || from.frequency !== to.frequency) throw new RangeError(`stepsBetween needs two labels of one frequency, got '${last}' and '${through}'`);
  return periodIndex(to) - periodIndex(from);
}

/**
 * Calendar years past the last observation's year that the default forecast reaches: the
 * rest of that year and two full years for monthly and quarterly data (24 to 35 months), five
 * years for annual data. Why these, in DEVELOPERS.md ("The default horizon").
 */
export const DEFAULT_YEARS_AHEAD: Readonly<Record<Frequency, number>> = { annual: 5, quarterly: 2, monthly: 2 };

/** The default end period for a series whose last observation is `last`: the end of a calendar year. */
export function defaultThrough(last: string, frequency: Frequency): string {
  const period = parsePeriod(last);
  if (period === null) throw new RangeError(`defaultThrough needs a period label, got '${last}'`);
  const year = period.year + DEFAULT_YEARS_AHEAD[frequency];
  return formatPeriod({ frequency, year, sub: periodsPerYear(frequency) });
}
