// The two trend models compared at one horizon by the Diebold-Mariano test with the HLN
// correction, on two losses: the squared error of the point forecast and the interval score
// (Gneiting & Raftery 2007) at the level the recommendation rule scores, both on the data's
// scale.
import { levelKey } from '../base/settings.js';
import { finiteOrNull, intervalScoreLoss, type ComparisonLoss, type ComparisonRow } from './backtestRecord.js';
import { dieboldMariano } from './dieboldMariano.js';
import { intervalScore } from './intervalScore.js';
import type { ScoredForecast } from './scoreHorizon.js';

/** Rows for h: `deterministic[i]` and `stochastic[i]` are the same origin's forecasts, each with an interval at `scoredLevel`. */
export function compareModels(h: number, deterministic: readonly ScoredForecast[], stochastic: readonly ScoredForecast[], scoredLevel: number): ComparisonRow[] {
  const key = levelKey(scoredLevel);
  const losses: [ComparisonLoss, (row: ScoredForecast) => number][] = [
    ['squared_error', (row) => (row.actual - row.point) ** 2],
    [intervalScoreLoss(scoredLevel), (row) => intervalScore(row.intervals[key][0], row.intervals[key][1], scoredLevel, row.actual)],
  ];
  return losses.map(([loss, lossOf]) => {
    const differences = deterministic.map((row, i) => lossOf(row) - lossOf(stochastic[i]));
    const test = dieboldMariano(differences, h);
    return {
      h,
      loss,
      n: test.n,
      mean_difference: finiteOrNull(test.meanDifference),
      statistic: test.statistic,
      p_value: test.pValue,
      better: test.meanDifference < 0 ? 'deterministic' : test.meanDifference > 0 ? 'stochastic' : null,
      available: test.reason === null,
      reason: test.reason,
    };
  });
}
