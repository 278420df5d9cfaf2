// Autocorrelations of each model's one-step forecast errors by lag, as thin bars from zero,
// with the ±1.96/√n bounds: bars beyond them point to structure the model left behind.
import type { TopLevelSpec } from 'vega-lite';
import { chartWording } from '../chartWording.js';
import type { AnalysisRecord } from '../../analysis/record.js';
import type { TrendModelKind } from '../../base/settings.js';
import { CHART_CONFIG, PANEL_WIDTH } from './chartConfig.js';
import type { PanelSpec } from './chartTypes.js';
import { INK, MODEL_COLOUR } from './palette.js';

const MODELS: readonly TrendModelKind[] = ['deterministic', 'stochastic'];

export interface AcfRow {
  lag: number;
  acf: number;
}

/** A symmetric vertical range that holds every bar and both bounds, in steps of 0.1. */
function acfLimit(record: AnalysisRecord): number {
  const values = MODELS.flatMap((m) => [...record.evidence.residuals[m].acf.acf.map(Math.abs), record.evidence.residuals[m].acf.bound]);
  return Math.max(0.3, Math.ceil(Math.max(...values) * 11) / 10);
}

function panel(model: TrendModelKind, record: AnalysisRecord, limit: number): PanelSpec {
  const { lag, acf, bound } = record.evidence.residuals[model].acf;
  const rows: AcfRow[] = lag.map((l, i) => ({ lag: l, acf: acf[i] }));
  const y = { field: 'acf', type: 'quantitative' as const, title: 'autocorrelation', scale: { domain: [-limit, limit] } };
  return {
    title: { text: chartWording.residualAcf.panel(model), fontSize: 11 },
    width: PANEL_WIDTH,
    height: 150,
    layer: [
      {
        data: { values: rows },
        mark: { type: 'bar', color: MODEL_COLOUR[model], width: 5 },
        encoding: { x: { field: 'lag', type: 'quantitative', title: 'lag', axis: { tickMinStep: 1, format: 'd' }, scale: { domain: [0, lag.length + 1], nice: false } }, y },
      },
      { data: { values: [{ acf: 0 }] }, mark: { type: 'rule', color: INK, strokeWidth: 0.8 }, encoding: { y: { field: 'acf', type: 'quantitative' } } },
      {
        data: { values: [{ acf: bound }, { acf: -bound }] },
        mark: { type: 'rule', color: INK, strokeDash: [4, 2], strokeWidth: 0.9 },
        encoding: { y: { field: 'acf', type: 'quantitative' } },
      },
    ],
  };
}

export function residualAcfChart({ series, record }: { series: string; record: AnalysisRecord }): TopLevelSpec {
  const limit = acfLimit(record);
  return {
    title: { text: chartWording.residualAcf.title(series), subtitle: chartWording.residualAcf.subtitle },
    description: chartWording.residualAcf.description({
      lags: record.evidence.residuals.deterministic.acf.lag.length,
      outside: MODELS.map((model) => ({ model, lags: record.evidence.residuals[model].acf_outside })),
    }),
    config: CHART_CONFIG,
    spacing: 24,
    resolve: { scale: { y: 'shared' } },
    hconcat: MODELS.map((model) => panel(model, record, limit)),
  };
}
