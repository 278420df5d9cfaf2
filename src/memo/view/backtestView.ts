// The backtest section: what was done in words, point and interval accuracy by horizon, and
// the comparison tests. Null when the backtest was not run (the template shows the note).
import type { Frequency } from '../../base/period.js';
import { evidenceWording } from '../evidenceWording.js';
import { formatNumber, formatPCell, formatPercent, formatPercentPoints, formatSignificant, MISSING } from '../format/formatNumber.js';
import type { BacktestRecord, ComparisonRow, ForecastMethod, HorizonScores } from '../../analysis/record.js';
import { noLinks } from '../format/noLinks.js';

export interface PointAccuracyCells {
  rmse: string;
  mape: string;
  mase: string;
}

export interface IntervalAccuracyCells {
  coverage80: string;
  coverage95: string;
  width95: string;
  score95: string;
  crps: string;
}

export interface ComparisonCells {
  statistic: string;
  p: string;
  outcome: string;
  decided: boolean;
}

const LOSSES: readonly ComparisonRow['loss'][] = ['squared_error', 'interval_score_95'];

function comparisonCells(c: ComparisonRow | undefined, significance: number): ComparisonCells {
  if (c === undefined) return { statistic: MISSING, p: MISSING, outcome: MISSING, decided: false };
  return {
    statistic: formatSignificant(c.statistic, 3),
    p: formatPCell(c.p_value),
    outcome: noLinks(evidenceWording.comparisonOutcome(c.better, c.available, c.reason)),
    decided: c.available && c.better !== null && c.p_value !== null && c.p_value < significance,
  };
}

export interface BacktestView {
  settings: string;
  point: { h: number; n: number; methods: PointAccuracyCells[] }[];
  interval: { h: number; methods: IntervalAccuracyCells[] }[];
  comparisonIntro: string;
  comparison: { h: number; tests: ComparisonCells[] }[];
  notes: string[];
}

const POINT_METHODS: readonly ForecastMethod[] = ['deterministic', 'stochastic', 'naive'];
const INTERVAL_METHODS: readonly ForecastMethod[] = ['deterministic', 'stochastic'];

function rowAt(backtest: BacktestRecord, method: ForecastMethod, h: number): HorizonScores | undefined {
  return backtest.per_horizon[method].find((r) => r.h === h);
}

export function backtestView(backtest: BacktestRecord, frequency: Frequency, decimals: number): BacktestView {
  const first = backtest.origins[0];
  const last = backtest.origins.at(-1);
  const horizons = backtest.per_horizon.deterministic.map((r) => r.h);
  return {
    settings: evidenceWording.backtestSettings({
      origins: backtest.origins.length,
      firstLength: first?.length ?? 0,
      firstPeriod: first?.period ?? `observation ${first?.length ?? 0}`,
      lastLength: last?.length ?? 0,
      lastPeriod: last?.period ?? `observation ${last?.length ?? 0}`,
      horizon: backtest.settings.horizon,
      frequency,
      refit: backtest.settings.refit,
      window: backtest.settings.window,
      step: backtest.settings.step,
      minTraining: backtest.settings.min_training_length,
    }),
    point: horizons.map((h) => ({
      h,
      n: rowAt(backtest, 'deterministic', h)?.n ?? 0,
      methods: POINT_METHODS.map((m) => {
        const row = rowAt(backtest, m, h);
        return { rmse: formatNumber(row?.rmse, decimals), mape: formatPercentPoints(row?.mape), mase: formatNumber(row?.mase, 2) };
      }),
    })),
    interval: horizons.map((h) => ({
      h,
      methods: INTERVAL_METHODS.map((m) => {
        const row = rowAt(backtest, m, h);
        return {
          coverage80: formatPercent(row?.coverage?.['80']),
          coverage95: formatPercent(row?.coverage?.['95']),
          width95: formatNumber(row?.width?.['95'], decimals),
          score95: formatNumber(row?.interval_score?.['95'], decimals),
          // CRPS is on the modelling scale, which the series' decimals do not fit after a transform.
          crps: formatSignificant(row?.crps, 3),
        };
      }),
    })),
    comparisonIntro: evidenceWording.comparisonIntro,
    // The p-value alone decides significance; the outcome only names the lower mean loss.
    comparison: [...new Set(backtest.comparison.map((c) => c.h))]
      .sort((a, b) => a - b)
      .map((h) => ({ h, tests: LOSSES.map((loss) => comparisonCells(backtest.comparison.find((c) => c.h === h && c.loss === loss), backtest.settings.significance)) })),
    notes: backtest.notes.map(noLinks),
  };
}
