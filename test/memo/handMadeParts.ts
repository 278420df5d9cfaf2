// Hand-made backtest, stability and recommendation parts for test records, shaped like the
// record contract. Their numbers are invented but scaled from the record they are attached to
// (our spec: plausible magnitudes, not computed statistics), so the memo has realistic input.
import { addPeriods } from '../../src/data/period.js';
import type {
  BacktestComparison,
  BacktestHorizonRow,
  BacktestPart,
  BreakTestPart,
  MemoRecord,
  ModelKind,
  RecommendationPart,
  StabilityPart,
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

function breakTest(kind: ModelKind, breakIndex: number, rejects: boolean): BreakTestPart {
  const critical = kind === 'deterministic' ? { '10': 10.2, '5': 11.9, '1': 15.6 } : { '10': 7.1, '5': 8.7, '1': 12.2 };
  const stat = rejects ? critical['5'] * 1.35 : critical['10'] * 0.6;
  return {
    method: `sup-Wald for a break in the ${kind === 'deterministic' ? 'level and slope' : 'drift'}, 15% trimming`,
    source: 'hand-made for tests',
    stat,
    restrictions: kind === 'deterministic' ? 2 : 1,
    trimming: 0.15,
    break_index: breakIndex,
    critical,
    reject: { '10': stat > critical['10'], '5': stat > critical['5'], '1': stat > critical['1'] },
    p_bound: rejects ? '0.01 < p < 0.05' : 'p > 0.10',
  };
}

export function handMadeStability(record: MemoRecord, breaks: { deterministic: boolean; stochastic: boolean }): StabilityPart {
  const n = record.series.n;
  const minWindow = Math.max(12, Math.round(n * 0.3));
  const step = Math.max(1, Math.round(n / 20));
  const ends: number[] = [];
  for (let end = minWindow; end < n; end += step) ends.push(end);
  ends.push(n);
  const slope = record.models.deterministic.coefficients.slope;
  const drift = record.models.stochastic.coefficients.drift;
  const slopeSe = record.models.deterministic.stderr.slope;
  const driftSe = record.models.stochastic.stderr.drift;
  if (typeof slope !== 'number' || typeof drift !== 'number' || typeof slopeSe !== 'number' || typeof driftSe !== 'number') {
    throw new Error('handMadeStability needs a record with slope and drift estimates');
  }
  const wobble = (end: number) => Math.sin(end / 7) * (n / end);
  return {
    windows: {
      deterministic: ends.map((end) => ({ end, slope: slope + slopeSe * wobble(end), se: slopeSe * Math.pow(n / end, 1.5) })),
      stochastic: ends.map((end) => ({ end, drift: drift + driftSe * 0.8 * wobble(end), se: driftSe * Math.sqrt(n / end) })),
      min_window: minWindow,
      step,
    },
    break_test: {
      deterministic: breakTest('deterministic', Math.round(n * 0.6), breaks.deterministic),
      stochastic: breakTest('stochastic', Math.round(n * 0.45), breaks.stochastic),
    },
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
