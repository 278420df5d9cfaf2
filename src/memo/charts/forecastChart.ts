// Recent history and each model's forecast with one band per interval level, nested and darker
// towards the point forecast, one panel per model on a shared vertical scale so the band
// widths compare at a glance. Each band starts from the last observation so the fan visibly
// opens from where the data end.
import type { TopLevelSpec } from 'vega-lite';
import { chartWording } from '../chartWording.js';
import { formatNumber, withUnits } from '../format/formatNumber.js';
import { atLevel, widestLevel } from '../intervalLevels.js';
import type { HistoryPoint } from '../memoInput.js';
import type { AnalysisRecord } from '../../analysis/record.js';
import { levelKey, type TrendModelKind } from '../../base/settings.js';
import { CHART_CONFIG, PANEL_WIDTH } from './chartConfig.js';
import type { LayerPart, PanelSpec } from './chartTypes.js';
import { bandOpacity, INK, MODEL_COLOUR, MODEL_DASH, RULE } from './palette.js';
import { periodPosition, timeAxis } from './periodPosition.js';

export interface ForecastChartInput {
  series: string;
  units?: string;
  decimals: number;
  record: AnalysisRecord;
  history?: HistoryPoint[];
}

/** Observations shown before the forecasts: six horizons' worth, at least 40, at most all (the section has no separate history chart). */
export function recentLength(horizon: number, n: number): number {
  return Math.min(n, Math.max(40, 6 * horizon));
}

/** A forecast row with the ends of each level's interval in fields of its own (`bandFields`). */
export type ForecastChartRow = { t: number; period: string; h: number; point: number } & Record<string, number | string>;

/**
 * The row fields of a level's band ends: 80 → lo80 and hi80. A point in a field name would
 * read as a nested field in Vega-Lite, so 99.5 → lo99_5.
 */
export function bandFields(level: number): { lo: string; hi: string } {
  const name = levelKey(level).replace('.', '_');
  return { lo: `lo${name}`, hi: `hi${name}` };
}

/** A chart row: `base` with the ends of each level's interval, `interval(level)`. */
function chartRow(base: { t: number; period: string; h: number; point: number }, levels: readonly number[], interval: (level: number) => [number, number]): ForecastChartRow {
  const row: ForecastChartRow = { ...base };
  for (const level of levels) {
    const { lo, hi } = bandFields(level);
    [row[lo], row[hi]] = interval(level);
  }
  return row;
}

function panel(model: TrendModelKind, levels: readonly number[], rows: ForecastChartRow[], recent: { t: number; period: string; value: number | null }[], units: string | undefined): PanelSpec {
  const x = timeAxis();
  const colour = MODEL_COLOUR[model];
  const y = (field: string) => ({ field, type: 'quantitative' as const, title: units ?? null, scale: { zero: false } });
  const lastObserved = recent.at(-1);
  return {
    title: { text: chartWording.forecast.panel(model), fontSize: 11 },
    width: PANEL_WIDTH,
    height: 92,
    layer: [
      // Widest first, so each narrower band is drawn over the wider ones.
      ...[...levels].reverse().map((level): LayerPart => {
        const { lo, hi } = bandFields(level);
        return { data: { values: rows }, mark: { type: 'area', color: colour, opacity: bandOpacity(levels.indexOf(level), levels.length) }, encoding: { x, y: y(lo), y2: { field: hi } } };
      }),
      { data: { values: recent }, mark: { type: 'line', color: INK, strokeWidth: 1.3 }, encoding: { x, y: y('value') } },
      { data: { values: rows }, mark: { type: 'line', color: colour, strokeWidth: 1.8, strokeDash: MODEL_DASH[model] }, encoding: { x, y: y('point') } },
      ...(lastObserved === undefined
        ? []
        : [{ data: { values: [{ t: lastObserved.t }] }, mark: { type: 'rule' as const, color: RULE, strokeDash: [2, 3], strokeWidth: 0.8 }, encoding: { x } }]),
    ],
  };
}

export function forecastChart({ series, units, decimals, record, history }: ForecastChartInput): TopLevelSpec {
  const observed = history ?? [];
  const recent = observed
    .slice(observed.length - recentLength(record.settings.horizon, observed.length))
    .map(({ period, value }) => ({ t: periodPosition(period), period, value }));
  const lastObserved = recent.at(-1);
  const models = ['deterministic', 'stochastic'] as const;
  const { levels } = record.settings;
  const rowsOf = (model: TrendModelKind): ForecastChartRow[] => {
    const rows = record.forecasts[model].map((row) =>
      chartRow({ t: periodPosition(row.period), period: row.period, h: row.h, point: row.point }, levels, (level) => atLevel(row.intervals, level) ?? [Number.NaN, Number.NaN]),
    );
    const value = lastObserved?.value;
    // The anchor (h = 0) joins the fan to the last observation; it is not a forecast.
    return lastObserved === undefined || value === null || value === undefined ? rows : [chartRow({ t: lastObserved.t, period: lastObserved.period, h: 0, point: value }, levels, () => [value, value]), ...rows];
  };
  const end = record.forecasts.deterministic.at(-1)?.period ?? record.series.last;
  const format = (v: number) => withUnits(formatNumber(v, decimals), units);
  const widest = widestLevel(record.settings);
  return {
    title: { text: chartWording.forecast.title(series, end), subtitle: chartWording.forecast.subtitle(levels) },
    description: chartWording.forecast.description({
      series,
      recent: recent.length,
      end,
      levels,
      level: widest,
      models: models.flatMap((model) => {
        const last = record.forecasts[model].at(-1);
        const interval = atLevel(last?.intervals, widest);
        return last === undefined || interval === undefined ? [] : [{ model, point: format(last.point), low: format(interval[0]), high: format(interval[1]) }];
      }),
    }),
    config: CHART_CONFIG,
    resolve: { scale: { y: 'shared' } },
    spacing: 24,
    hconcat: models.map((model) => panel(model, levels, rowsOf(model), recent, units)),
  };
}
