// Backtest accuracy by horizon: root mean squared error of the two models and the benchmark
// (no change, or the seasonal naive for a seasonal series), half the text's width beside the
// backtest's description. Coverage is in the table under it: as a line it is mostly one number
// repeated (100%, 100%, ...), which a table column says better.
import type { TopLevelSpec } from 'vega-lite';
import { chartWording } from '../chartWording.js';
import { formatNumber, withUnits } from '../format/formatNumber.js';
import { atLevel, widestLevel } from '../intervalLevels.js';
import type { BacktestMethod, BacktestRecord } from '../../analysis/record.js';
import { backtestMethods, scoresOf } from '../backtestMethods.js';
import { METHOD_NAME, MODEL_IN_TEXT } from '../wording.js';
import { CHART_CONFIG, PANEL_WIDTH } from './chartConfig.js';
import type { LayerPart, PanelSpec } from './chartTypes.js';
import { MODEL_COLOUR, MODEL_DASH, MODEL_SHAPE } from './palette.js';

export interface BacktestChartRow {
  method: string;
  h: number;
  rmse: number | null;
  /** Share of outcomes inside the interval at the widest level. */
  coverage: number | null;
}

export function backtestRows(backtest: BacktestRecord): BacktestChartRow[] {
  const level = widestLevel(backtest.settings);
  return backtestMethods(backtest).flatMap((method) =>
    scoresOf(backtest, method).map((row) => ({ method: METHOD_NAME[method], h: row.h, rmse: row.rmse, coverage: atLevel(row.coverage, level) ?? null })),
  );
}

// One colour and dash scale over all three methods, shared by both panels (one legend).
function styleScales(methods: readonly BacktestMethod[]) {
  const domain = methods.map((m) => METHOD_NAME[m]);
  return {
    color: { field: 'method', type: 'nominal' as const, title: null, legend: { symbolType: 'stroke', symbolSize: 320, symbolStrokeWidth: 2 }, scale: { domain, range: methods.map((m) => MODEL_COLOUR[m]) } },
    strokeDash: { field: 'method', type: 'nominal' as const, title: null, scale: { domain, range: methods.map((m) => MODEL_DASH[m]) } },
  };
}

/** The chart sits in half the text's width, beside the backtest's description. */
const HALF_WIDTH = 250;

function linePanel(title: string, field: 'rmse' | 'coverage', rows: BacktestChartRow[], all: readonly BacktestMethod[], methods: readonly BacktestMethod[], yTitle: string | null, extra: LayerPart[]): PanelSpec {
  const { color, strokeDash } = styleScales(all);
  const x = { field: 'h', type: 'quantitative' as const, title: 'horizon (steps ahead)', axis: { tickMinStep: 1, format: 'd' } };
  const y = { field, type: 'quantitative' as const, title: yTitle, ...(field === 'coverage' ? { axis: { format: '.0%' }, scale: { domain: [0, 1] } } : {}) };
  const shown = rows.filter((r) => r[field] !== null && methods.some((m) => METHOD_NAME[m] === r.method));
  return {
    title: { text: title, fontSize: 11 },
    width: PANEL_WIDTH,
    height: 110,
    layer: [
      ...extra,
      { data: { values: shown }, mark: { type: 'line', strokeWidth: 1.6 }, encoding: { x, y, color, strokeDash } },
      // Markers per method with a fixed shape, so a greyscale print still tells the lines apart.
      ...methods.map(
        (method): LayerPart => ({
          data: { values: shown.filter((r) => r.method === METHOD_NAME[method]) },
          mark: { type: 'point', filled: true, size: 26, shape: MODEL_SHAPE[method], color: MODEL_COLOUR[method], opacity: 1 },
          encoding: { x, y },
        }),
      ),
    ],
  };
}

/** Relative difference below which two RMSE lines print as one. */
const COINCIDE = 0.005;

/** Whether the two models' RMSE lines lie on top of each other at every horizon, so the chart must say so. */
export function linesCoincide(backtest: BacktestRecord): boolean {
  const stochastic = backtest.per_horizon.stochastic;
  return backtest.per_horizon.deterministic.every((row, i) => {
    const a = row.rmse;
    const b = stochastic[i]?.rmse;
    return a !== null && b !== null && b !== undefined && Math.abs(a - b) <= COINCIDE * Math.max(Math.abs(a), Math.abs(b));
  });
}

export function backtestChart({ series, units, decimals, backtest }: { series: string; units?: string; decimals: number; backtest: BacktestRecord }): TopLevelSpec {
  const rows = backtestRows(backtest);
  const methods = backtestMethods(backtest);
  const origins = backtest.origins.length;
  const endErrors = methods.map((m) => `${METHOD_NAME[m].toLowerCase()} ${withUnits(formatNumber(scoresOf(backtest, m).at(-1)?.rmse, decimals), units)}`).join(', ');
  const panel = linePanel(chartWording.backtest.errorPanel, 'rmse', rows, methods, methods, units ?? null, []);
  return {
    title: { text: chartWording.backtest.title(series), subtitle: chartWording.backtest.subtitle(origins, linesCoincide(backtest)) },
    description: chartWording.backtest.description({ origins, horizon: backtest.settings.horizon, endErrors, benchmark: MODEL_IN_TEXT[methods[2]] }),
    config: CHART_CONFIG,
    width: HALF_WIDTH,
    height: panel.height,
    layer: panel.layer,
  };
}
