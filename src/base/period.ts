// Period labels for regularly spaced series: annual `2003`, quarterly `2003-Q1`, monthly `2003-01`.
// Each period maps to one integer (its index) so that order, duplicates and gaps reduce to
// integer comparisons, and h steps ahead is index + h.

export type Frequency = 'annual' | 'quarterly' | 'monthly';

export const FREQUENCIES: readonly Frequency[] = ['annual', 'quarterly', 'monthly'];

/** A parsed period label. `sub` is the quarter (1-4), the month (1-12), or 1 for a year. */
export interface Period {
  readonly frequency: Frequency;
  readonly year: number;
  readonly sub: number;
}

const PERIODS_PER_YEAR: Readonly<Record<Frequency, number>> = { annual: 1, quarterly: 4, monthly: 12 };

/** Observations per year: 1, 4 or 12. */
export function periodsPerYear(frequency: Frequency): number {
  return PERIODS_PER_YEAR[frequency];
}

const ANNUAL = /^(\d{4})$/;
const QUARTERLY = /^(\d{4})-Q([1-4])$/;
const MONTHLY = /^(\d{4})-(0[1-9]|1[0-2])$/;

/** Parses a trimmed label; null when it is none of the three forms. */
export function parsePeriod(label: string): Period | null {
  const annual = ANNUAL.exec(label);
  if (annual !== null) return { frequency: 'annual', year: Number(annual[1]), sub: 1 };
  const quarterly = QUARTERLY.exec(label);
  if (quarterly !== null) return { frequency: 'quarterly', year: Number(quarterly[1]), sub: Number(quarterly[2]) };
  const monthly = MONTHLY.exec(label);
  if (monthly !== null) return { frequency: 'monthly', year: Number(monthly[1]), sub: Number(monthly[2]) };
  return null;
}

/** Consecutive integers for consecutive periods of one frequency (monthly: year * 12 + month - 1). */
export function periodIndex(period: Period): number {
  return period.year * periodsPerYear(period.frequency) + period.sub - 1;
}

/** Inverse of `periodIndex`. */
export function periodFromIndex(frequency: Frequency, index: number): Period {
  if (!Number.isInteger(index)) throw new RangeError(`periodFromIndex needs an integer index, got ${index}`);
  const perYear = periodsPerYear(frequency);
  const year = Math.floor(index / perYear);
  return { frequency, year, sub: index - year * perYear + 1 };
}

/** The canonical label; the inverse of `parsePeriod`. */
export function formatPeriod(period: Period): string {
  if (!Number.isInteger(period.year) || period.year < 0 || period.year > 9999) {
    throw new RangeError(`formatPeriod needs a year in 0..9999, got ${period.year}`);
  }
  const year = String(period.year).padStart(4, '0');
  switch (period.frequency) {
    case 'annual':
      return year;
    case 'quarterly':
      return `${year}-Q${period.sub}`;
    case 'monthly':
      return `${year}-${String(period.sub).padStart(2, '0')}`;
  }
}

/** The label k periods after `label` (k may be negative), e.g. the forecast period h steps after the last observation. */
export function addPeriods(label: string, k: number): string {
  const period = parsePeriod(label);
  if (period === null) throw new RangeError(`addPeriods needs a period label, got '${label}'`);
  if (!Number.isInteger(k)) throw new RangeError(`addPeriods needs an integer step, got ${k}`);
  return formatPeriod(periodFromIndex(period.frequency, periodIndex(period) + k));
}

/** Columns of K harmonic pairs for period s: 2K, less the zero sine at k = s/2. */
export function harmonicColumnCount(period: number, harmonics: number): number {
  return 2 * harmonics - (2 * harmonics === period ? 1 : 0);
}

/** The first day of the period at 00:00 UTC (2025-Q3 → 2025-07-01), for spreadsheets, which sort and chart real dates. */
export function periodStartDate(label: string): Date {
  const period = parsePeriod(label);
  if (period === null) throw new RangeError(`periodStartDate needs a period label, got '${label}'`);
  const date = new Date(Date.UTC(2000, (period.sub - 1) * (12 / periodsPerYear(period.frequency)), 1));
  date.setUTCFullYear(period.year);
  return date;
}

/** The first day of the period as YYYY-MM-DD. */
export function periodStart(label: string): string {
  return periodStartDate(label).toISOString().slice(0, 10);
}
