// The whole observed history as one line.
import type { TopLevelSpec } from 'vega-lite';
import { chartWording } from '../chartWording.js';
import { formatNumber, withUnits } from '../format/formatNumber.js';
import type { HistoryPoint } from '../memoInput.js';
import { CHART_CONFIG, FIT_WIDTH, FULL_WIDTH } from './chartConfig.js';
import { INK } from './palette.js';
import { periodPosition, timeAxis } from './periodPosition.js';

export interface HistoryChartInput {
  series: string;
  units?: string;
  decimals: number;
  history: HistoryPoint[];
}

export function historyChart({ series, units, decimals, history }: HistoryChartInput): TopLevelSpec {
  const rows = history.map(({ period, value }) => ({ t: periodPosition(period), period, value }));
  const observed = history.flatMap(({ value }) => (value === null ? [] : [value]));
  const first = history[0]?.period ?? '';
  const last = history.at(-1)?.period ?? '';
  const format = (v: number) => withUnits(formatNumber(v, decimals), units);
  return {
    title: { text: chartWording.history.title(series), subtitle: chartWording.history.subtitle(first, last, history.length) },
    description: chartWording.history.description({
      series,
      first,
      last,
      n: history.length,
      low: format(Math.min(...observed)),
      high: format(Math.max(...observed)),
    }),
    config: CHART_CONFIG,
    width: FULL_WIDTH,
    autosize: FIT_WIDTH,
    height: 170,
    data: { values: rows },
    mark: { type: 'line', color: INK, strokeWidth: 1.3 },
    encoding: {
      x: timeAxis(),
      y: { field: 'value', type: 'quantitative', title: units ?? null, scale: { zero: false } },
    },
  };
}
