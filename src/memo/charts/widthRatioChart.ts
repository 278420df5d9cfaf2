// The width of the deterministic model's interval divided by that of the stochastic model at
// the widest level, at every horizon, against a line at 1 (equal widths).
import type { TopLevelSpec } from 'vega-lite';
import { chartWording } from '../chartWording.js';
import { formatNumber } from '../format/formatNumber.js';
import { atLevel, widestLevel } from '../intervalLevels.js';
import type { AnalysisRecord } from '../../analysis/record.js';
import { CHART_CONFIG, FIT_WIDTH, FULL_WIDTH } from './chartConfig.js';
import { INK, MODEL_COLOUR } from './palette.js';

export interface WidthRatioRow {
  h: number;
  period: string;
  ratio: number;
}

/** Deterministic ÷ stochastic interval width at the widest level per horizon, for the rows both models have. */
export function widthRatios(record: Pick<AnalysisRecord, 'forecasts' | 'settings'>): WidthRatioRow[] {
  const level = widestLevel(record.settings);
  return record.forecasts.deterministic.flatMap((row, i) => {
    const interval = atLevel(row.intervals, level);
    const other = atLevel(record.forecasts.stochastic[i]?.intervals, level);
    if (interval === undefined || other === undefined) return [];
    return [{ h: row.h, period: row.period, ratio: (interval[1] - interval[0]) / (other[1] - other[0]) }];
  });
}

/** Above this many horizons the bars are too thin to carry their value as a label. */
export const MAX_LABELLED_BARS = 12;

export function widthRatioChart({ series, record }: { series: string; record: AnalysisRecord }): TopLevelSpec {
  const rows = widthRatios(record).map((r) => ({ ...r, label: formatNumber(r.ratio, 2) }));
  const top = Math.max(1.1, ...rows.map((r) => r.ratio * 1.12));
  const level = widestLevel(record.settings);
  return {
    title: { text: chartWording.widthRatio.title(series, level), subtitle: chartWording.widthRatio.subtitle },
    description: chartWording.widthRatio.description({
      level,
      horizon: rows.length,
      first: rows[0]?.label ?? '',
      last: rows.at(-1)?.label ?? '',
    }),
    config: CHART_CONFIG,
    width: FULL_WIDTH,
    autosize: FIT_WIDTH,
    height: 140,
    layer: [
      {
        data: { values: rows },
        mark: { type: 'bar', color: MODEL_COLOUR.deterministic, opacity: 0.85, width: { band: 0.62 } },
        encoding: {
          x: { field: 'period', type: 'ordinal', sort: null, title: null, axis: { labelAngle: 0, labelOverlap: true } },
          y: { field: 'ratio', type: 'quantitative', title: 'ratio', scale: { domain: [0, top] } },
        },
      },
      ...(rows.length > MAX_LABELLED_BARS
        ? []
        : [
            {
              data: { values: rows },
              mark: { type: 'text' as const, baseline: 'top' as const, dy: 4, fontSize: 9, color: '#ffffff' },
              encoding: {
                x: { field: 'period', type: 'ordinal' as const, sort: null },
                y: { field: 'ratio', type: 'quantitative' as const },
                text: { field: 'label', type: 'nominal' as const },
              },
            },
          ]),
      { data: { values: [{ ratio: 1 }] }, mark: { type: 'rule', color: INK, strokeDash: [4, 2], strokeWidth: 1 }, encoding: { y: { field: 'ratio', type: 'quantitative' } } },
    ],
  };
}
