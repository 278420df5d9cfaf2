// A period label as the calendar date it starts on (2025 → 2025-01-01, 2025-Q3 → 2025-07-01,
// 2025-11 → 2025-11-01), for spreadsheets, which sort and chart real dates.
import { parsePeriod, periodsPerYear } from '../base/period.js';

/** The first day of the period, as YYYY-MM-DD. */
export function periodStart(label: string): string {
  const date = periodStartDate(label);
  return date.toISOString().slice(0, 10);
}

/** The first day of the period at 00:00 UTC. */
export function periodStartDate(label: string): Date {
  const period = parsePeriod(label);
  if (period === null) throw new RangeError(`periodStart needs a period label, got '${label}'`);
  const month = (period.sub - 1) * (12 / periodsPerYear(period.frequency));
  const date = new Date(Date.UTC(2000, month, 1));
  date.setUTCFullYear(period.year);
  return date;
}
