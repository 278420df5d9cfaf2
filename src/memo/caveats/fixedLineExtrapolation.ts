// Always fires: extending a fitted line to the end of the horizon is an assumption the data
// cannot check, so every memo says so in plain words whatever the numbers. High when the
// deterministic model is recommended (the memo leans on the assumption), medium when nothing
// is recommended, low when the stochastic model is (its forecasts do not rest on the line).
import { countPeriods } from '../wording.js';
import type { TrendModelKind } from '../../base/settings.js';
import type { Caveat, CaveatRule, CaveatSeverity } from './caveat.js';
import { caveatWording } from './caveatWording.js';

const ID = 'fixed-line-extrapolation';

function severityFor(recommended: TrendModelKind | undefined): CaveatSeverity {
  if (recommended === 'deterministic') return 'high';
  return recommended === undefined ? 'medium' : 'low';
}

export const fixedLineExtrapolation: CaveatRule = {
  id: ID,
  fires: 'always',
  evaluate({ record }): Caveat | null {
    const { first, last, frequency } = record.series;
    const end = record.forecasts.deterministic.at(-1)?.period ?? last;
    const horizon = record.settings.horizon;
    return {
      id: ID,
      severity: severityFor(record.recommendation?.model),
      text: caveatWording.fixedLineExtrapolation({ first, last, end, horizon: countPeriods(horizon, frequency) }),
      numbers: { first, last, end, horizon },
    };
  },
};
