// Fires when the models were fitted on a transformed scale: intervals turned back by their
// quantiles are asymmetric and the point is a median (or a bias-adjusted mean). Low severity:
// nothing is wrong, but a reader should not expect a symmetric range.
import { formatNumber, withUnits } from '../format/formatNumber.js';
import { seriesDecimals } from '../format/seriesDecimals.js';
import { atLevel, widestLevel } from '../intervalLevels.js';
import { scaleName } from '../wording.js';
import type { Caveat, CaveatRule } from './caveat.js';
import { caveatWording } from './caveatWording.js';

const ID = 'back-transformed';

export const backTransformed: CaveatRule = {
  id: ID,
  fires: 'transform is log or Box-Cox',
  evaluate({ record, units }): Caveat | null {
    const { transform } = record.series;
    if (transform.kind === 'none') return null;
    const model = record.recommendation?.model ?? 'stochastic';
    const last = record.forecasts[model].at(-1);
    const level = widestLevel(record.settings);
    const interval = atLevel(last?.intervals, level);
    if (last === undefined || interval === undefined) return null;
    const above = interval[1] - last.point;
    const below = last.point - interval[0];
    const decimals = seriesDecimals(record);
    return {
      id: ID,
      severity: 'low',
      text: caveatWording.backTransformed({
        scale: scaleName(transform),
        model,
        level,
        period: last.period,
        above: withUnits(formatNumber(above, decimals), units),
        below: withUnits(formatNumber(below, decimals), units),
        point: record.settings.point,
      }),
      numbers: { transform: transform.kind, level, period: last.period, above, below },
    };
  },
};
