// Titles, panel names and text descriptions of the charts. Descriptions say in words what the
// chart shows, with its key numbers, for readers who cannot see it.
import type { TrendModelKind } from '../base/settings.js';
import { levelPercent, MODEL_NAME, predictionIntervals } from './wording.js';

export const chartWording = {
  history: {
    title: (series: string) => `${series}: observed history`,
    subtitle: (first: string, last: string, n: number) => `${first} to ${last}, ${n} observations`,
    description: (a: { series: string; first: string; last: string; n: number; low: string; high: string }) =>
      `Line chart of ${a.series} from ${a.first} to ${a.last} (${a.n} observations), ranging from ${a.low} to ${a.high}.`,
  },
  forecast: {
    title: (series: string, end: string) => `${series}: forecasts to ${end}`,
    /** Levels ascending; the narrowest band is the darkest. */
    subtitle: (levels: readonly number[]) => ['Solid line: observed. Dashed line: point forecast.', bandKey(levels)],
    panel: (model: TrendModelKind) => MODEL_NAME[model],
    description: (a: { series: string; recent: number; end: string; levels: readonly number[]; level: number; models: { model: TrendModelKind; point: string; low: string; high: string }[] }) =>
      `Two panels on one vertical scale, one per model. Each shows the last ${a.recent} observations of ${a.series}, then the model's point forecast to ${a.end} with its ${predictionIntervals(a.levels)}. ` +
      a.models.map((m) => `At ${a.end} the ${MODEL_NAME[m.model].toLowerCase()} model gives ${m.point} (${levelPercent(a.level)} interval ${m.low} to ${m.high}).`).join(' '),
  },
  widthRatio: {
    title: (series: string, level: number) => `${series}: deterministic \u00f7 stochastic ${levelPercent(level)} interval width`,
    subtitle: 'Below 1: the deterministic interval is narrower. The line marks equal widths.',
    description: (a: { first: string; last: string; horizon: number; level: number }) =>
      `Bar chart of the ratio of the deterministic to the stochastic ${levelPercent(a.level)} interval width at each of ${a.horizon} horizons, from ${a.first} at the first step to ${a.last} at the last.`,
  },
  backtest: {
    title: (series: string) => `${series}: backtest accuracy by horizon`,
    subtitle: (origins: number) => `Forecasts made from ${origins} past origins and compared with what happened.`,
    errorPanel: 'Root mean squared error',
    coveragePanel: (level: number) => `Outcomes inside the ${levelPercent(level)} interval`,
    description: (a: { origins: number; horizon: number; endErrors: string; endCoverage: string; level: number; benchmark: string }) =>
      `Two panels by forecast horizon 1 to ${a.horizon}, from ${a.origins} backtest origins. Left: root mean squared error of the deterministic and stochastic forecasts and the ${a.benchmark}; at the last horizon ${a.endErrors}. ` +
      `Right: share of outcomes inside each model's ${levelPercent(a.level)} interval, against the ${levelPercent(a.level)} target; at the last horizon ${a.endCoverage}.`,
  },
  residualAcf: {
    title: (series: string) => `${series}: autocorrelation of one-step forecast errors`,
    subtitle: 'Dashed lines: \u00b11.96/\u221an. Bars beyond them suggest a pattern the model has missed.',
    panel: (model: TrendModelKind) => MODEL_NAME[model],
    description: (a: { lags: number; outside: { model: TrendModelKind; lags: number[] }[] }) =>
      `Two panels of error autocorrelations at lags 1 to ${a.lags} with the \u00b11.96/\u221an bounds. ` +
      a.outside
        .map((o) => `${MODEL_NAME[o.model]}: ${o.lags.length === 0 ? 'every lag inside the bounds' : `outside at lag${o.lags.length === 1 ? '' : 's'} ${o.lags.join(', ')}`}.`)
        .join(' '),
  },
  stability: {
    title: (series: string) => `${series}: trend estimated on growing stretches of history`,
    subtitle: ['Line: estimate from the first observation to each date; shading: \u00b12 standard errors.', 'Dashed line: the estimate from the full history.'],
    panel: { deterministic: 'Slope of the trend line, per period', stochastic: 'Drift, average change per period' } as Record<TrendModelKind, string>,
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
