// The backtest section: what was done in words, point and interval accuracy by horizon, and
// the comparison tests. Null when the backtest was not run (the template shows the note).
// Coverage is shown at every level; width, interval score and the comparison tests at the
// level the recommendation rule scores, the only one the comparison tests run at.
import type { Frequency } from '../../base/period.js';
import { evidenceWording } from '../evidenceWording.js';
import { formatNumber, formatPCell, formatPercent, formatPercentPoints, formatSignificant, MISSING } from '../format/formatNumber.js';
import { intervalScoreLoss, type BacktestMethod, type BacktestRecord, type ComparisonRow, type HorizonScores } from '../../analysis/record.js';
import { backtestMethods, scoresOf } from '../backtestMethods.js';
import { atLevel } from '../intervalLevels.js';
import { METHOD_NAME, TEMPLATE_TEXT } from '../wording.js';
import { modelTable, type ModelTable } from './modelTable.js';
import { noLinks } from '../format/noLinks.js';

export interface PointAccuracyCells {
  rmse: string;
  mape: string;
  mase: string;
}

export interface ComparisonCells {
  statistic: string;
  p: string;
  outcome: string;
  decided: boolean;
}

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
  /** The benchmark's name over its columns: no change, or the seasonal naive. */
  benchmarkName: string;
  point: { h: number; n: number; methods: PointAccuracyCells[] }[];
  interval: ModelTable<{ h: number; cells: string[] }>;
  comparisonIntro: string;
  /** Names of the losses compared, one column group each. */
  losses: string[];
  comparison: { h: number; tests: ComparisonCells[] }[];
  notes: string[];
}

function rowAt(backtest: BacktestRecord, method: BacktestMethod, h: number): HorizonScores | undefined {
  return scoresOf(backtest, method).find((r) => r.h === h);
}

export function backtestView(backtest: BacktestRecord, frequency: Frequency, decimals: number, scoredLevel: number): BacktestView {
  const { levels } = backtest.settings;
  const comparedLosses: readonly ComparisonRow['loss'][] = ['squared_error', intervalScoreLoss(scoredLevel)];
  const first = backtest.origins[0];
  const last = backtest.origins.at(-1);
  const horizons = backtest.per_horizon.deterministic.map((r) => r.h);
  return {
    benchmarkName: METHOD_NAME[backtestMethods(backtest)[2]],
    settings: evidenceWording.backtestSettings({
      origins: backtest.origins.length,
      firstLength: first?.length ?? 0,
      firstPeriod: first?.period ?? `observation ${first?.length ?? 0}`,
      lastLength: last?.length ?? 0,
      lastPeriod: last?.period ?? `observation ${last?.length ?? 0}`,
      horizon: backtest.settings.horizon,
      frequency,
      refit: backtest.settings.refit,
      // A seasonal period in the backtest: the models carried a seasonal part, searched or kept by the policy.
      seasonal: (backtest.settings.period ?? 1) > 1,
      window: backtest.settings.window,
      step: backtest.settings.step,
      minTraining: backtest.settings.min_training_length,
      // Records written before the seasonal yardstick have no mase_scaling: theirs was the no-change forecast.
      maseScaling: backtest.settings.mase_scaling ?? 'naive',
    }),
    point: horizons.map((h) => ({
      h,
      n: rowAt(backtest, 'deterministic', h)?.n ?? 0,
      methods: backtestMethods(backtest).map((m) => {
        const row = rowAt(backtest, m, h);
        return { rmse: formatNumber(row?.rmse, decimals), mape: formatPercentPoints(row?.mape), mase: formatNumber(row?.mase, 2) };
      }),
    })),
    interval: modelTable({
      levels,
      names: METHOD_NAME,
      leading: 1,
      modelHeads: TEMPLATE_TEXT.intervalColumns(levels, scoredLevel),
      trailingHeads: [],
      rows: (models) =>
        horizons.map((h) => ({
          h,
          cells: models.flatMap((m) => {
            const row = rowAt(backtest, m, h);
            return [
              ...levels.map((level) => formatPercent(atLevel(row?.coverage, level))),
              formatNumber(atLevel(row?.width, scoredLevel), decimals),
              formatNumber(atLevel(row?.interval_score, scoredLevel), decimals),
              // CRPS is on the modelling scale, which the series' decimals do not fit after a transform.
              formatSignificant(row?.crps, 3),
            ];
          }),
        })),
      cellsOf: (row) => [String(row.h), ...row.cells],
    }),
    comparisonIntro: evidenceWording.comparisonIntro(scoredLevel),
    losses: [TEMPLATE_TEXT.squaredErrorLoss, TEMPLATE_TEXT.intervalScoreLoss(scoredLevel)],
    // The p-value alone decides significance; the outcome only names the lower mean loss.
    comparison: [...new Set(backtest.comparison.map((c) => c.h))]
      .sort((a, b) => a - b)
      .map((h) => ({ h, tests: comparedLosses.map((loss) => comparisonCells(backtest.comparison.find((c) => c.h === h && c.loss === loss), backtest.settings.significance)) })),
    notes: backtest.notes.map(noLinks),
  };
}
