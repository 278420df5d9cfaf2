// Fires when, at the end of the horizon, the deterministic interval at the widest level is
// less than three quarters as wide as the stochastic one at the same level (our threshold,
// set on 95% intervals: a quarter narrower changes the stated risk enough to matter to a
// decision); high below half. Both are ratios of widths at one level, so they apply at any.
import { formatNumber, formatPercent, withUnits } from '../format/formatNumber.js';
import { seriesDecimals } from '../format/seriesDecimals.js';
import { atLevel, widestLevel } from '../intervalLevels.js';
import type { Caveat, CaveatRule } from './caveat.js';
import { caveatWording } from './caveatWording.js';

export const WIDTH_RATIO_CAUTION = 0.75;
export const WIDTH_RATIO_HIGH = 0.5;

const ID = 'narrow-line-intervals';

export const narrowLineIntervals: CaveatRule = {
  id: ID,
  fires: `deterministic width below ${WIDTH_RATIO_CAUTION} of the stochastic width at the widest level and the horizon end`,
  evaluate({ record, units }): Caveat | null {
    const level = widestLevel(record.settings);
    const last = record.forecasts.deterministic.at(-1);
    const deterministic = atLevel(last?.intervals, level);
    const stochastic = atLevel(record.forecasts.stochastic.at(-1)?.intervals, level);
    if (deterministic === undefined || stochastic === undefined || last === undefined) return null;
    const widthDeterministic = deterministic[1] - deterministic[0];
    const widthStochastic = stochastic[1] - stochastic[0];
    const ratio = widthDeterministic / widthStochastic;
    if (!(ratio < WIDTH_RATIO_CAUTION)) return null;
    const decimals = seriesDecimals(record);
    return {
      id: ID,
      severity: ratio < WIDTH_RATIO_HIGH ? 'high' : 'medium',
      text: caveatWording.narrowLineIntervals({
        level,
        period: last.period,
        narrower: formatPercent(1 - ratio),
        deterministic: withUnits(formatNumber(widthDeterministic, decimals), units),
        stochastic: withUnits(formatNumber(widthStochastic, decimals), units),
        ratio: formatNumber(ratio, 2),
      }),
      numbers: { level, period: last.period, width_deterministic: widthDeterministic, width_stochastic: widthStochastic, ratio },
    };
  },
};
