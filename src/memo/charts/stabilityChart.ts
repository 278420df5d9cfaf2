// Expanding-window estimates of the slope (deterministic) and the drift (stochastic) with
// ±2 standard-error bands, plotted at the period each window ends, against the full-history
// estimate: a trend that holds keeps its estimate inside the band as the window grows.
import type { TopLevelSpec } from 'vega-lite';
import { addPeriods } from '../../base/period.js';
import { chartWording } from '../chartWording.js';
import { formatSignificant } from '../format/formatNumber.js';
import type { AnalysisRecord, StabilityRecord } from '../../analysis/record.js';
import type { TrendModelKind } from '../../base/settings.js';
import { CHART_CONFIG } from './chartConfig.js';

/** The appendix sets this chart in one of its two text columns: about half the page's width. */
const COLUMN_WIDTH = 270;
import type { PanelSpec } from './chartTypes.js';
import { BAND_OPACITY, INK, MODEL_COLOUR } from './palette.js';
import { periodPosition, timeAxis } from './periodPosition.js';

export interface StabilityRow {
  end: number;
  period: string;
  t: number;
  estimate: number;
  low: number;
  high: number;
}

/** Window rows with an estimate and a standard error; the period is the window's last observation. */
export function stabilityRows(first: string, stability: StabilityRecord, model: TrendModelKind): StabilityRow[] {
  const windows =
    model === 'deterministic'
      ? stability.windows.deterministic.map((w) => ({ end: w.end, estimate: w.slope, se: w.se }))
      : stability.windows.stochastic.map((w) => ({ end: w.end, estimate: w.drift, se: w.se }));
  return windows.flatMap(({ end, estimate, se }) => {
    if (estimate === null || se === null) return [];
    const period = addPeriods(first, end - 1);
    return [{ end, period, t: periodPosition(period), estimate, low: estimate - 2 * se, high: estimate + 2 * se }];
  });
}

function panel(model: TrendModelKind, rows: StabilityRow[], full: number | undefined): PanelSpec {
  const x = timeAxis(rows.map((row) => row.period));
  const y = { field: 'estimate', type: 'quantitative' as const, title: null, scale: { zero: false } };
  const colour = MODEL_COLOUR[model];
  return {
    title: { text: chartWording.stability.panel[model], fontSize: 11 },
    width: COLUMN_WIDTH,
    height: 48,
    layer: [
      { data: { values: rows }, mark: { type: 'area', color: colour, opacity: BAND_OPACITY.outer + 0.06 }, encoding: { x, y: { ...y, field: 'low' }, y2: { field: 'high' } } },
      { data: { values: rows }, mark: { type: 'line', color: colour, strokeWidth: 1.6 }, encoding: { x, y } },
      ...(full === undefined
        ? []
        : [{ data: { values: [{ estimate: full }] }, mark: { type: 'rule' as const, color: INK, strokeDash: [4, 2], strokeWidth: 0.9 }, encoding: { y: { field: 'estimate', type: 'quantitative' as const } } }]),
    ],
  };
}

export function stabilityChart({ series, record, stability }: { series: string; record: AnalysisRecord; stability: StabilityRecord }): TopLevelSpec {
  const first = record.series.first;
  const rows = { deterministic: stabilityRows(first, stability, 'deterministic'), stochastic: stabilityRows(first, stability, 'stochastic') };
  const slope = record.models.deterministic.coefficients.slope;
  const drift = record.models.stochastic.coefficients.drift;
  const full = { deterministic: typeof slope === 'number' ? slope : undefined, stochastic: typeof drift === 'number' ? drift : undefined };
  return {
    title: { text: chartWording.stability.title(series), subtitle: [...chartWording.stability.subtitle] },
    description: chartWording.stability.description({
      windows: rows.deterministic.length,
      first: rows.deterministic[0]?.period ?? '',
      last: rows.deterministic.at(-1)?.period ?? '',
      slope: formatSignificant(full.deterministic, 3),
      drift: formatSignificant(full.stochastic, 3),
    }),
    config: CHART_CONFIG,
    spacing: 14,
    resolve: { scale: { y: 'independent' } },
    // One panel above the other, to the width of the appendix's text column.
    vconcat: (['deterministic', 'stochastic'] as const).map((model) => panel(model, rows[model], full[model])),
  };
}
