// Fires when, at the end of the horizon, the deterministic 95% interval is less than three
// quarters as wide as the stochastic one (our threshold: a quarter narrower changes the
// stated risk enough to matter to a decision); high below half.
import { formatNumber, formatPercent, withUnits } from '../format/formatNumber.js';
import { seriesDecimals } from '../format/seriesDecimals.js';
import type { Caveat, CaveatRule } from './caveat.js';
import { caveatWording } from './caveatWording.js';

export const WIDTH_RATIO_CAUTION = 0.75;
export const WIDTH_RATIO_HIGH = 0.5;

const ID = 'narrow-line-intervals';

export const narrowLineIntervals: CaveatRule = {
  id: ID,
  fires: `deterministic 95% width below ${WIDTH_RATIO_CAUTION} of the stochastic width at the horizon end`,
  evaluate({ record, units }): Caveat | null {
    const deterministic = record.forecasts.deterministic.at(-1)?.intervals['95'];
    const stochastic = record.forecasts.stochastic.at(-1)?.intervals['95'];
    const last = record.forecasts.deterministic.at(-1);
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
        period: last.period,
        narrower: formatPercent(1 - ratio),
        deterministic: withUnits(formatNumber(widthDeterministic, decimals), units),
        stochastic: withUnits(formatNumber(widthStochastic, decimals), units),
        ratio: formatNumber(ratio, 2),
      }),
      numbers: { period: last.period, width_deterministic: widthDeterministic, width_stochastic: widthStochastic, ratio },
    };
  },
};
