// Titles, panel names and text descriptions of the charts. Descriptions say in words what the
// chart shows, with its key numbers, for readers who cannot see it.
import type { TrendModelKind } from '../base/settings.js';
import { levelPercent, MODEL_NAME, predictionIntervals } from './wording.js';

export const chartWording = {
  forecast: {
    title: (_series: string, end: string) => `Forecasts to ${end}`,
    /** Levels ascending; the narrowest band is the darkest. */
    subtitle: (levels: readonly number[]) => ['Solid line: observed. Dashed line: point forecast.', bandKey(levels)],
    panel: (model: TrendModelKind) => MODEL_NAME[model],
    description: (a: { series: string; recent: number; end: string; levels: readonly number[]; level: number; models: { model: TrendModelKind; point: string; low: string; high: string }[] }) =>
      `Two panels on one vertical scale, one per model. Each shows the last ${a.recent} observations of ${a.series}, then the model's point forecast to ${a.end} with its ${predictionIntervals(a.levels)}. ` +
      a.models.map((m) => `At ${a.end} the ${MODEL_NAME[m.model].toLowerCase()} model gives ${m.point} (${levelPercent(a.level)} interval ${m.low} to ${m.high}).`).join(' '),
  },
  stability: {
    title: (_series: string) => 'Trend on growing histories',
    subtitle: ['Line: estimate on the history to each date, \u00b12 s.e. shaded.', 'Dashed: the full-history estimate.'],
    panel: { deterministic: 'Slope of the line, per period', stochastic: 'Drift, per period' } as Record<TrendModelKind, string>,
    description: (a: { first: string; last: string; windows: number; slope: string; drift: string }) =>
      `Two panels of estimates on ${a.windows} expanding windows ending from ${a.first} to ${a.last}, each with a band of two standard errors. ` +
      `Full-history slope ${a.slope}; full-history drift ${a.drift}.`,
  },
} as const;

/** Which shading is which level: one band, two (the narrower darker), or darkest to lightest. */
function bandKey(levels: readonly number[]): string {
  if (levels.length === 1) return `Shading: ${predictionIntervals(levels)}.`;
  if (levels.length === 2) return `Shading: ${levelPercent(levels[0])} (darker) and ${levelPercent(levels[1])} prediction intervals.`;
  return `Shading, darkest to lightest: ${predictionIntervals(levels)}.`;
}
