// Which horizons a table prints when the horizon is long: the first three steps, where most
// decisions start, then evenly spaced steps to the last, so a table stays within a few
// centimetres whatever the horizon. Every horizon stays in record.json and forecasts.csv; the
// table's note says which rows are shown. Our own layout rule.

/** The spacing of the later rows: a whole number of quarters for monthly data, so rows fall on the same months each year. */
function spacing(horizon: number, maxRows: number, period: number): number {
  const raw = Math.ceil((horizon - 3) / Math.max(1, maxRows - 3));
  const unit = period === 12 ? 3 : 1;
  return Math.max(unit, Math.ceil(raw / unit) * unit);
}

/** Horizons 1..`horizon` when they fit in `maxRows`; otherwise 1, 2, 3, multiples of a step, and the last. */
export function shownHorizons(horizon: number, maxRows: number, period = 1): number[] {
  if (horizon <= maxRows) return Array.from({ length: horizon }, (_, i) => i + 1);
  const step = spacing(horizon, maxRows, period);
  const shown = new Set([1, 2, 3]);
  for (let h = step; h < horizon; h += step) shown.add(h);
  shown.add(horizon);
  return [...shown].sort((a, b) => a - b);
}
