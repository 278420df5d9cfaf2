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

/** The most ticks a short axis labels one by one. */
const MAX_PERIOD_TICKS = 6;

/**
 * The x encoding for a `t` field made by periodPosition, labelled in whole years. Given the
 * period labels a chart plots, an axis spanning less than two years (where whole years would
 * leave one tick, or none) is labelled by period instead: evenly chosen periods, at most six,
 * named as the data name them ("2025-03", "2025-Q2").
 */
export function timeAxis(labels: readonly string[] = []) {
  const positions = labels.map(periodPosition);
  if (positions.length === 0 || Math.max(...positions) - Math.min(...positions) >= 2) return TIME_AXIS;
  const distinct = [...new Map(labels.map((label, i) => [positions[i], label])).entries()].sort((a, b) => a[0] - b[0]);
  const every = Math.ceil(distinct.length / MAX_PERIOD_TICKS);
  const shown = distinct.filter((_, i) => i % every === 0);
  // Vega-Lite's label expression maps each tick's value back to its period label.
  const names = shown.map(([t, label]) => `datum.value === ${t} ? '${label}'`).join(' : ');
  return { ...TIME_AXIS, axis: { values: shown.map(([t]) => t), labelExpr: `${names} : ''`, labelOverlap: true } };
}
