// Hand-made backtest and recommendation parts for test records, shaped like the record
// contract. Their numbers are invented but scaled from the record they are attached to
// (our spec: plausible magnitudes, not computed statistics), so the memo has realistic input.
import { addPeriods } from '../../src/data/period.js';
import type {
  BacktestComparison,
  BacktestHorizonRow,
  BacktestPart,
  MemoRecord,
  ModelKind,
  RecommendationPart,
} from '../../src/memo/recordParts.js';

/** z for a 95% interval, 1.959964 (scipy 1.10.1 norm.ppf(0.975)). */
const Z95 = 1.959963984540054;

/** One-step forecast standard deviation in the series' units, read off the stochastic interval. */
function unitScale(record: MemoRecord): number {
  const [lo, hi] = record.forecasts.stochastic[0].intervals['95'];
  return (hi - lo) / (2 * Z95);
}

function horizonRow(h: number, scale: number, level: number, factor: number, coverage95: number | null): BacktestHorizonRow {
  const rmse = scale * Math.sqrt(h) * factor;
  return {
    h,
    n: 14 - Math.max(0, h - 5),
    mae: rmse * 0.8,
    rmse,
    mape: (100 * rmse * 0.8) / Math.abs(level),
    mase: (rmse * 0.8) / (scale * 1.3 * 0.8),
    coverage: coverage95 === null ? undefined : { '80': coverage95 - 0.14, '95': coverage95 },
    width: coverage95 === null ? undefined : { '80': 2.56 * rmse * 0.95, '95': 3.92 * rmse * 0.95 },
    interval_score: coverage95 === null ? undefined : { '80': 3.1 * rmse, '95': 4.4 * rmse },
    crps: coverage95 === null ? undefined : 0.58 * rmse,
  };
}

export function handMadeBacktest(record: MemoRecord, origins = 14): BacktestPart {
  const horizon = record.settings.horizon;
  const scale = unitScale(record);
  const level = record.forecasts.stochastic[0].point;
  const firstLength = record.series.n - horizon - origins + 1;
  const hs = Array.from({ length: horizon }, (_, i) => i + 1);
  const comparison: BacktestComparison[] = hs.flatMap((h) =>
    (['squared_error', 'interval_score_95'] as const).map((loss) =>
      h <= horizon - 2
        ? { h, loss, statistic: 0.4 + 0.21 * h, p_value: Math.max(0.004, 0.6 - 0.09 * h), better: h > 4 ? ('stochastic' as const) : null, available: true }
        : { h, loss, statistic: null, p_value: null, better: null, available: false, reason: 'fewer than 5 forecast errors at this horizon' },
    ),
  );
  return {
    settings: { origins, horizon, refit: true, window: 'expanding', min_train: firstLength, levels: [80, 95] },
    origins: Array.from({ length: origins }, (_, i) => ({
      length: firstLength + i,
      period: addPeriods(record.series.first, firstLength + i - 1),
    })),
    per_horizon: {
      deterministic: hs.map((h) => horizonRow(h, scale, level, 1.0 + 0.04 * h, 0.93 - 0.025 * h)),
      stochastic: hs.map((h) => horizonRow(h, scale, level, 0.95 + 0.01 * h, 0.95 - 0.004 * h)),
      naive: hs.map((h) => horizonRow(h, scale, level, 1.3, null)),
    },
    comparison,
    notes: ['Horizons 9 and 10 have too few forecast errors for a comparison test.'],
  };
}

export function handMadeRecommendation(model: ModelKind): RecommendationPart {
  return {
    model,
    rule: 'Prefer the model with the lower backtest RMSE at the horizon end unless the unit-root reading contradicts it.',
    fixed_by_config: false,
    reasons:
      model === 'stochastic'
        ? ['Lower backtest error at horizons 5 and beyond.', 'Its wider intervals cover the backtest outcomes at close to the stated rate.']
        : ['Lower backtest error at every horizon.', 'The unit-root checks favour a steady trend line.'],
  };
}
