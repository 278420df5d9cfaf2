// The earlier as-of memos' forecasts against the outcomes, one view: the observed values as a
// solid dark line with dots; each earlier memo's point forecasts from the model it recommended
// as open markers joined by a dashed line in that model's colour, dash and shape; and each
// forecast's interval as a bar, so a single observed step reads as well as a run of them.
// Only periods observed since are drawn: the chart shows how the forecasts fared, not where
// they lead.
import type { TopLevelSpec } from 'vega-lite';
import type { TrendModelKind } from '../../base/settings.js';
import type { HistoryPoint } from '../memoInput.js';
import type { TrackedRow } from '../trackRecordPart.js';
import { trackRecordWording } from '../trackRecordWording.js';
import { CHART_CONFIG, FIT_WIDTH, FULL_WIDTH } from './chartConfig.js';
import { INK, MODEL_COLOUR, MODEL_DASH, MODEL_SHAPE } from './palette.js';
import { periodPosition, timeAxis } from './periodPosition.js';

export interface TrackRecordChartInput {
  series: string;
  units?: string;
  /** The level whose intervals are drawn (a key such as "80"). */
  level: string;
  rows: TrackedRow[];
  /** This memo's observed values; the chart shows them from a few periods before the first target. */
  history: HistoryPoint[];
}

/** Observations shown before the first target period, so the forecasts' starting point is in view. */
export const LEAD_IN = 4;

const MODELS: readonly TrendModelKind[] = ['deterministic', 'stochastic'];

interface ForecastPoint {
  t: number;
  period: string;
  memo: string;
  model: TrendModelKind;
  point: number;
  lo: number | null;
  hi: number | null;
  /** The outcome inside the interval, as the run judged it. */
  inside: boolean | null;
}

/** The recommended model's forecasts, one row per observed target of each earlier memo. */
export function recommendedForecasts(rows: readonly TrackedRow[], level: string): ForecastPoint[] {
  return rows.flatMap((row) => {
    const model = row.recommended;
    const forecast = model === null ? null : row.models[model];
    if (model === null || forecast === null || forecast.point === null) return [];
    const [lo, hi] = forecast.intervals[level] ?? [null, null];
    return [{ t: periodPosition(row.period), period: row.period, memo: row.as_of, model, point: forecast.point, lo, hi, inside: forecast.inside[level] ?? null }];
  });
}

export function trackRecordChart({ series, units, level, rows, history }: TrackRecordChartInput): TopLevelSpec {
  const forecasts = recommendedForecasts(rows, level);
  const first = Math.min(...forecasts.map((row) => row.t));
  const firstIndex = history.findIndex(({ period }) => periodPosition(period) >= first);
  const shown = history.slice(Math.max(0, (firstIndex < 0 ? history.length : firstIndex) - LEAD_IN));
  const observed = shown.flatMap(({ period, value }) => (value === null ? [] : [{ t: periodPosition(period), period, value }]));
  const models = MODELS.filter((model) => forecasts.some((row) => row.model === model));
  const x = timeAxis([...observed.map((point) => point.period), ...forecasts.map((row) => row.period)]);
  const y = (field: string) => ({ field, type: 'quantitative' as const, title: units ?? null, scale: { zero: false } });
  const byModel = {
    color: { field: 'model', type: 'nominal' as const, legend: null, scale: { domain: [...MODELS], range: MODELS.map((model) => MODEL_COLOUR[model]) } },
  };
  const bars = forecasts.filter((row) => row.lo !== null && row.hi !== null);
  const held = bars.filter((row) => row.inside === true).length;
  return {
    title: { text: trackRecordWording.chart.title(series), subtitle: trackRecordWording.chart.subtitle(level, models) },
    description: trackRecordWording.chart.description({ series, memos: new Set(forecasts.map((row) => row.memo)).size, level, held, total: bars.length }),
    config: CHART_CONFIG,
    width: FULL_WIDTH,
    autosize: FIT_WIDTH,
    height: 190,
    layer: [
      { data: { values: bars }, mark: { type: 'rule', strokeWidth: 5, opacity: 0.3, strokeCap: 'butt' }, encoding: { x, y: y('lo'), y2: { field: 'hi' }, ...byModel } },
      ...models.map((model) => ({
        data: { values: forecasts.filter((row) => row.model === model) },
        mark: { type: 'line' as const, strokeWidth: 1.3, strokeDash: MODEL_DASH[model], color: MODEL_COLOUR[model] },
        encoding: { x, y: y('point'), detail: { field: 'memo', type: 'nominal' as const } },
      })),
      ...models.map((model) => ({
        data: { values: forecasts.filter((row) => row.model === model) },
        mark: { type: 'point' as const, shape: MODEL_SHAPE[model], filled: false, color: MODEL_COLOUR[model], size: 26 },
        encoding: { x, y: y('point') },
      })),
      { data: { values: observed }, mark: { type: 'line', color: INK, strokeWidth: 1.4 }, encoding: { x, y: y('value') } },
      { data: { values: observed }, mark: { type: 'point', filled: true, color: INK, size: 14 }, encoding: { x, y: y('value') } },
    ],
  };
}
