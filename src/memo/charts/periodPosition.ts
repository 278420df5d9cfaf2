// Places a period label on a continuous time axis: the year plus the fraction of the year
// before the period starts (2003-Q3 → 2003.5, 2003-04 → 2003.25), so series of any frequency
// share one axis labelled in years.
import { parsePeriod, periodsPerYear } from '../../base/period.js';

export function periodPosition(label: string): number {
  const period = parsePeriod(label);
  if (period === null) throw new RangeError(`periodPosition needs a period label, got '${label}'`);
  return period.year + (period.sub - 1) / periodsPerYear(period.frequency);
}

const TIME_AXIS = {
  field: 't',
  type: 'quantitative',
  title: null,
  scale: { zero: false, nice: false },
  axis: { format: 'd', tickMinStep: 1, labelOverlap: true },
} as const;

/** The x encoding for a `t` field made by periodPosition, labelled in whole years. */
export function timeAxis(): typeof TIME_AXIS {
  return TIME_AXIS;
}
