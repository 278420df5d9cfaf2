// Hand-made backtest and recommendation parts for test records, shaped exactly like the
// record's BacktestRecord and RecommendationRecord. Their numbers are invented but scaled
// from the record they are attached to (our spec: plausible magnitudes, not computed
// statistics), so the memo has realistic input without the seconds a real backtest takes.
import { addPeriods } from '../../src/base/period.js';
import type { AnalysisRecord, BacktestRecord, ComparisonRow, HorizonScores, RecommendationRecord } from '../../src/analysis/record.js';
import type { TrendModelKind } from '../../src/base/settings.js';

/** z for a 95% interval, 1.959964 (scipy 1.10.1 norm.ppf(0.975)). */
const Z95 = 1.959963984540054;
const BACKTEST_HORIZON = 5;

/** One-step forecast standard deviation in the series' units, read off the stochastic interval. */
function unitScale(record: AnalysisRecord): number {
  const [lo, hi] = record.forecasts.stochastic[0].intervals['95'];
  return (hi - lo) / (2 * Z95);
}

function horizonRow(h: number, n: number, scale: number, level: number, factor: number, coverage95: number | null): HorizonScores {
  const rmse = scale * Math.sqrt(h) * factor;
  const intervals = coverage95 !== null;
  return {
    h,
    n,
    mae: rmse * 0.8,
    rmse,
    mape: (100 * rmse * 0.8) / Math.abs(level),
    mase: (rmse * 0.8) / (scale * 1.3 * 0.8),
    coverage: intervals ? { '80': coverage95 - 0.14, '95': coverage95 } : { '80': null, '95': null },
    width: intervals ? { '80': 2.56 * rmse * 0.95, '95': 3.92 * rmse * 0.95 } : { '80': null, '95': null },
    interval_score: intervals ? { '80': 3.1 * rmse, '95': 4.4 * rmse } : { '80': null, '95': null },
    crps: intervals ? 0.58 * rmse : null,
  };
}

function comparisonRow(h: number, loss: ComparisonRow['loss'], origins: number): ComparisonRow {
  if (h === BACKTEST_HORIZON) {
    return { h, loss, n: origins, mean_difference: null, statistic: null, p_value: null, better: null, available: false, reason: 'the long-run variance estimate of the loss differences is not positive' };
  }
  return { h, loss, n: origins - h + 1, mean_difference: 0.1 * h, statistic: 0.4 + 0.5 * h, p_value: Math.max(0.004, 0.6 - 0.16 * h), better: h > 2 ? 'stochastic' : 'deterministic', available: true, reason: null };
}

export function handMadeBacktest(record: AnalysisRecord, origins = 14): BacktestRecord {
  const scale = unitScale(record);
  const level = record.forecasts.stochastic[0].point;
  const n = record.series.n;
  const firstLength = n - BACKTEST_HORIZON - origins + 1;
  const hs = Array.from({ length: BACKTEST_HORIZON }, (_, i) => i + 1);
  const model = (kind: TrendModelKind) => ({ p: record.models[kind].p, q: record.models[kind].q, loglik: record.models[kind].loglik, converged: true });
  return {
    settings: {
      origins,
      requested_origins: origins,
      horizon: BACKTEST_HORIZON,
      window: 'expanding',
      step: 1,
      refit: 'reselect',
      min_training_length: firstLength,
      levels: [80, 95],
      transform: record.series.transform,
      coefficient_uncertainty: true,
      point: 'median',
      max_p: 3,
      max_q: 3,
      orders: null,
      significance: 0.05,
      period: 1,
      benchmark: 'naive',
      mase_scaling: 'naive',
      seasons_covered: 1,
    },
    notes: ['The last origin is five periods before the end of the history, so every origin is scored at every horizon.'],
    origins: Array.from({ length: origins }, (_, i) => ({
      length: firstLength + i,
      period: addPeriods(record.series.first, firstLength + i - 1),
      training_length: firstLength + i,
      mase_scale: scale * 1.3 * 0.8,
      models: { deterministic: model('deterministic'), stochastic: model('stochastic') },
    })),
    per_horizon: {
      deterministic: hs.map((h) => horizonRow(h, origins, scale, level, 1.0 + 0.08 * h, 0.93 - 0.05 * h)),
      stochastic: hs.map((h) => horizonRow(h, origins, scale, level, 0.95 + 0.02 * h, 0.95 - 0.008 * h)),
      naive: hs.map((h) => horizonRow(h, origins, scale, level, 1.3, null)),
    },
    comparison: hs.flatMap((h) => [comparisonRow(h, 'squared_error', origins), comparisonRow(h, 'interval_score_95', origins)]),
    forecasts: [],
  };
}

export function handMadeRecommendation(model: TrendModelKind): RecommendationRecord {
  return {
    model,
    rule: 'prefer-stochastic',
    rule_text: 'Recommend the stochastic trend unless the deterministic trend scores better on the backtest at the longer horizons and the unit-root evidence allows it.',
    fixed_by_config: false,
    significance: 0.05,
    scored_level: 95,
    decided_by: model === 'stochastic' ? 'policy' : 'evidence',
    evidence:
      model === 'stochastic'
        ? [{ check: 'backtest-scores', finding: 'Lower backtest interval scores at horizons 3 to 5 for the stochastic trend.', favours: 'stochastic' }]
        : [
            { check: 'backtest-scores', finding: 'Lower backtest interval scores at every horizon for the deterministic trend.', favours: 'deterministic' },
            { check: 'unit-root', finding: 'The unit-root checks point to a fixed trend line.', favours: 'deterministic' },
          ],
    reasons:
      model === 'stochastic'
        ? ['Lower backtest interval scores at horizons 3 to 5.', 'Its wider intervals cover the backtest outcomes at close to the stated rate.']
        : ['Lower backtest interval scores at every horizon.', 'The unit-root checks favour a steady trend line.'],
  };
}
