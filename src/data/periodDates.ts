// Full dates as period labels: `1949-01-31` stands for the month, quarter or year it falls in.
// Days are those of the Gregorian calendar (ISO 8601 uses it for every year, before 1582 too).
import type { Frequency, Period } from '../base/period.js';

export interface CalendarDate {
  readonly year: number;
  readonly month: number;
  readonly day: number;
}

const ISO_DATE = /^(\d{4})-(\d{2})-(\d{2})$/;

/** Gregorian leap years: every fourth year, except centuries not divisible by 400. */
export function daysInMonth(year: number, month: number): number {
  if (month === 2) return year % 4 === 0 && (year % 100 !== 0 || year % 400 === 0) ? 29 : 28;
  return [4, 6, 9, 11].includes(month) ? 30 : 31;
}

/**
 * `YYYY-MM-DD` → the date; 'no-such-day' when the text has the form but the calendar has no such
 * day (2023-02-30, 2023-13-01); null when the text is not of the form.
 */
export function parseIsoDate(text: string): CalendarDate | 'no-such-day' | null {
  const match = ISO_DATE.exec(text);
  if (match === null) return null;
  const [year, month, day] = [Number(match[1]), Number(match[2]), Number(match[3])];
  if (month < 1 || month > 12 || day < 1 || day > daysInMonth(year, month)) return 'no-such-day';
  return { year, month, day };
}

/** The calendar day of a date-time in UTC: workbooks store a date cell as a day count, which exceljs hands over as midnight UTC. */
export function utcCalendarDate(date: Date): CalendarDate {
  return { year: date.getUTCFullYear(), month: date.getUTCMonth() + 1, day: date.getUTCDate() };
}

export function formatIsoDate(date: CalendarDate): string {
  return `${String(date.year).padStart(4, '0')}-${String(date.month).padStart(2, '0')}-${String(date.day).padStart(2, '0')}`;
}

/** The period of the given frequency the date falls in: its month, its quarter (months 1-3 are Q1) or its year. */
export function periodOfDate(date: CalendarDate, frequency: Frequency): Period {
  switch (frequency) {
    case 'annual':
      return { frequency, year: date.year, sub: 1 };
    case 'quarterly':
      return { frequency, year: date.year, sub: Math.ceil(date.month / 3) };
    case 'monthly':
      return { frequency, year: date.year, sub: date.month };
  }
}

const FREQUENCY_OF_SPACING: Readonly<Record<number, Frequency>> = { 1: 'monthly', 3: 'quarterly', 12: 'annual' };

export type DateSpacing =
  | { kind: 'frequency'; frequency: Frequency; months: number }
  /** The most common spacing is not 1, 3 or 12 months (0: several dates in a month, daily or weekly data). */
  | { kind: 'other'; months: number }
  | { kind: 'single' };

/**
 * The frequency of dated rows, from the months between consecutive dates: the most common
 * spacing (the smaller on a tie) decides, so a missing period or one duplicated row does not
 * change it; 1 month apart is monthly, 3 quarterly, 12 annual. The day within the month plays no
 * part, so first, last and mid-period days all read alike.
 */
export function dateSpacing(dates: readonly CalendarDate[]): DateSpacing {
  const counts = new Map<number, number>();
  for (let i = 1; i < dates.length; i++) {
    const months = Math.abs(dates[i].year * 12 + dates[i].month - (dates[i - 1].year * 12 + dates[i - 1].month));
    counts.set(months, (counts.get(months) ?? 0) + 1);
  }
  let best: number | undefined;
  for (const [months, count] of counts) {
    const bestCount = best === undefined ? 0 : (counts.get(best) ?? 0);
    if (best === undefined || count > bestCount || (count === bestCount && months < best)) best = months;
  }
  if (best === undefined) return { kind: 'single' };
  const frequency = FREQUENCY_OF_SPACING[best];
  return frequency === undefined ? { kind: 'other', months: best } : { kind: 'frequency', frequency, months: best };
}
