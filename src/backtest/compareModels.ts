// The two trend models compared at one horizon by the Diebold-Mariano test with the HLN
// correction, on two losses: the squared error of the point forecast and the 95% interval
// score (Gneiting & Raftery 2007), both on the data's scale. The 95% interval is formed from
// the model-scale predictive whether or not 95 is among the reported levels.
import type { TransformSpec } from '../models/transform.js';
import { finiteOrNull, type ComparisonLoss, type ComparisonRow } from './backtestRecord.js';
import { centralInterval } from './backTransformForecast.js';
import { dieboldMariano } from './dieboldMariano.js';
import { intervalScore } from './intervalScore.js';
import type { ScoredForecast } from './scoreHorizon.js';

const COMPARISON_LEVEL = 95;

/** Rows for h: `deterministic[i]` and `stochastic[i]` are the same origin's forecasts. */
export function compareModels(
  h: number,
  deterministic: readonly ScoredForecast[],
  stochastic: readonly ScoredForecast[],
  transform: TransformSpec,
): ComparisonRow[] {
  const losses: Record<ComparisonLoss, (row: ScoredForecast) => number> = {
    squared_error: (row) => (row.actual - row.point) ** 2,
    interval_score_95: (row) => {
      const [lower, upper] = centralInterval(transform, row.mean, row.se, COMPARISON_LEVEL);
      return intervalScore(lower, upper, COMPARISON_LEVEL, row.actual);
    },
  };
  return (Object.keys(losses) as ComparisonLoss[]).map((loss) => {
    const differences = deterministic.map((row, i) => losses[loss](row) - losses[loss](stochastic[i]));
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
