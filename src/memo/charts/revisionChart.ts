// This memo's point forecasts against the previous as-of memo's, one panel per model on a
// shared vertical scale. The memo a reader must sign off is drawn solid in the model's colour
// with filled markers; the previous one dashed in grey with open markers, so the two read
// apart in greyscale print as well as in colour.
import type { TopLevelSpec } from 'vega-lite';
import { formatNumber, withUnits } from '../format/formatNumber.js';
import type { TrendModelKind } from '../../base/settings.js';
import type { ForecastRevision, ModelPaths, PathPoint } from '../revisionsPart.js';
import { revisionsWording } from '../revisionsWording.js';
import { CHART_CONFIG, PANEL_WIDTH } from './chartConfig.js';
import type { PanelSpec } from './chartTypes.js';
import { MODEL_COLOUR, MODEL_SHAPE, MUTED } from './palette.js';
import { periodPosition, timeAxis } from './periodPosition.js';

export interface RevisionChartInput {
  series: string;
  units?: string;
  decimals: number;
  asOf: string;
  earlierAsOf: string;
  paths: { now: ModelPaths; earlier: ModelPaths };
  forecasts: ForecastRevision[];
}

/** Dash arrays in pixels: solid for this memo, dashed for the previous one. */
export const REVISION_DASH = { now: [] as number[], earlier: [5, 3] };

function rows(path: PathPoint[]): { t: number; period: string; point: number }[] {
  return path.flatMap(({ period, point }) => (point === null ? [] : [{ t: periodPosition(period), period, point }]));
}

function panel(model: TrendModelKind, now: PathPoint[], earlier: PathPoint[], units: string | undefined): PanelSpec {
  const x = timeAxis([...now, ...earlier].map((point) => point.period));
  const y = { field: 'point', type: 'quantitative' as const, title: units ?? null, scale: { zero: false } };
  const colour = MODEL_COLOUR[model];
  return {
    title: { text: revisionsWording.chart.panel(model), fontSize: 11 },
    width: PANEL_WIDTH,
    height: 120,
    layer: [
      { data: { values: rows(earlier) }, mark: { type: 'line', color: MUTED, strokeWidth: 1.3, strokeDash: REVISION_DASH.earlier }, encoding: { x, y } },
      { data: { values: rows(earlier) }, mark: { type: 'point', shape: MODEL_SHAPE[model], filled: false, color: MUTED, size: 22 }, encoding: { x, y } },
      { data: { values: rows(now) }, mark: { type: 'line', color: colour, strokeWidth: 1.8, strokeDash: REVISION_DASH.now }, encoding: { x, y } },
      { data: { values: rows(now) }, mark: { type: 'point', shape: MODEL_SHAPE[model], filled: true, color: colour, size: 22 }, encoding: { x, y } },
    ],
  };
}

/** Each model's largest revision in absolute size; ties go to the earlier period. */
function largest(forecasts: ForecastRevision[], model: TrendModelKind): ForecastRevision | undefined {
  let best: ForecastRevision | undefined;
  for (const row of forecasts) {
    if (row.model !== model || row.change === null) continue;
    if (best === undefined || best.change === null || Math.abs(row.change) > Math.abs(best.change)) best = row;
  }
  return best;
}

export function revisionChart({ series, units, decimals, asOf, earlierAsOf, paths, forecasts }: RevisionChartInput): TopLevelSpec {
  const models = ['deterministic', 'stochastic'] as const;
  const signed = (v: number) => `${v > 0 ? '+' : ''}${withUnits(formatNumber(v, decimals), units)}`;
  return {
    title: { text: revisionsWording.chart.title(series), subtitle: revisionsWording.chart.subtitle(asOf, earlierAsOf) },
    description: revisionsWording.chart.description({
      series,
      asOf,
      earlier: earlierAsOf,
      largest: models.flatMap((model) => {
        const row = largest(forecasts, model);
        return row === undefined || row.change === null ? [] : [{ model, period: row.period, change: signed(row.change) }];
      }),
    }),
    config: CHART_CONFIG,
    resolve: { scale: { y: 'shared' } },
    spacing: 24,
    hconcat: models.map((model) => panel(model, paths.now[model], paths.earlier[model], units)),
  };
}
