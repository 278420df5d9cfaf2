// Recent history and each model's forecast with its 80% and 95% bands, one panel per model on
// a shared vertical scale so the band widths compare at a glance. Each band starts from the
// last observation so the fan visibly opens from where the data end.
import type { TopLevelSpec } from 'vega-lite';
import type { ForecastRow } from '../../analysis/record.js';
import { chartWording } from '../chartWording.js';
import { formatNumber, withUnits } from '../format/formatNumber.js';
import type { HistoryPoint } from '../memoInput.js';
import type { AnalysisRecord } from '../../analysis/record.js';
import type { TrendModelKind } from '../../base/settings.js';
import { CHART_CONFIG, PANEL_WIDTH } from './chartConfig.js';
import type { PanelSpec } from './chartTypes.js';
import { BAND_OPACITY, INK, MODEL_COLOUR, MODEL_DASH, RULE } from './palette.js';
import { periodPosition, timeAxis } from './periodPosition.js';

export interface ForecastChartInput {
  series: string;
  units?: string;
  decimals: number;
  record: AnalysisRecord;
  history?: HistoryPoint[];
}

/** Observations shown before the forecasts: four horizons' worth, at least 24, at most all. */
export function recentLength(horizon: number, n: number): number {
  return Math.min(n, Math.max(24, 4 * horizon));
}

export interface ForecastChartRow {
  t: number;
  period: string;
  h: number;
  point: number;
  lo80: number;
  hi80: number;
  lo95: number;
  hi95: number;
}

function forecastRow(row: ForecastRow): ForecastChartRow {
  const [lo80, hi80] = row.intervals['80'];
  const [lo95, hi95] = row.intervals['95'];
  return { t: periodPosition(row.period), period: row.period, h: row.h, point: row.point, lo80, hi80, lo95, hi95 };
}

function panel(model: TrendModelKind, rows: ForecastChartRow[], recent: { t: number; period: string; value: number | null }[], units: string | undefined): PanelSpec {
  const x = timeAxis();
  const colour = MODEL_COLOUR[model];
  const y = (field: string) => ({ field, type: 'quantitative' as const, title: units ?? null, scale: { zero: false } });
  const lastObserved = recent.at(-1);
  return {
    title: { text: chartWording.forecast.panel(model), fontSize: 11 },
    width: PANEL_WIDTH,
    height: 210,
    layer: [
      { data: { values: rows }, mark: { type: 'area', color: colour, opacity: BAND_OPACITY.outer }, encoding: { x, y: y('lo95'), y2: { field: 'hi95' } } },
      { data: { values: rows }, mark: { type: 'area', color: colour, opacity: BAND_OPACITY.inner }, encoding: { x, y: y('lo80'), y2: { field: 'hi80' } } },
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
  const rowsOf = (model: TrendModelKind): ForecastChartRow[] => {
    const rows = record.forecasts[model].map(forecastRow);
    // The anchor (h = 0) joins the fan to the last observation; it is not a forecast.
    return lastObserved === undefined || lastObserved.value === null
      ? rows
      : [{ t: lastObserved.t, period: lastObserved.period, h: 0, point: lastObserved.value, lo80: lastObserved.value, hi80: lastObserved.value, lo95: lastObserved.value, hi95: lastObserved.value }, ...rows];
  };
  const end = record.forecasts.deterministic.at(-1)?.period ?? record.series.last;
  const format = (v: number) => withUnits(formatNumber(v, decimals), units);
  return {
    title: { text: chartWording.forecast.title(series, end), subtitle: [...chartWording.forecast.subtitle] },
    description: chartWording.forecast.description({
      series,
      recent: recent.length,
      end,
      models: models.flatMap((model) => {
        const last = record.forecasts[model].at(-1);
        return last === undefined ? [] : [{ model, point: format(last.point), low: format(last.intervals['95'][0]), high: format(last.intervals['95'][1]) }];
      }),
    }),
    config: CHART_CONFIG,
    resolve: { scale: { y: 'shared' } },
    spacing: 24,
    hconcat: models.map((model) => panel(model, rowsOf(model), recent, units)),
  };
}
