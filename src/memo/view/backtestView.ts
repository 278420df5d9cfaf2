// The backtest section: what was done in words, point and interval accuracy by horizon, and
// the comparison tests. Null when the backtest was not run (the template shows the note).
// Coverage is shown at every level; width, interval score and the comparison tests at the
// level the recommendation rule scores, the only one the comparison tests run at.
import type { Frequency } from '../../base/period.js';
import { evidenceWording } from '../evidenceWording.js';
import { formatNumber, formatPCell, formatPercent, formatSignificant, MISSING } from '../format/formatNumber.js';
import { intervalScoreLoss, type BacktestMethod, type BacktestRecord, type ComparisonRow, type HorizonScores } from '../../analysis/record.js';
import { backtestMethods, scoresOf } from '../backtestMethods.js';
import { atLevel } from '../intervalLevels.js';
import { METHOD_NAME, TEMPLATE_TEXT } from '../wording.js';
import { noLinks } from '../format/noLinks.js';
import { periodsPerYear } from '../../base/period.js';
import { shownHorizons } from './shownHorizons.js';

/** Longer backtest horizons print a selection of rows (shownHorizons); every row is in record.json. */
export const BACKTEST_TABLE_ROWS = 8;

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

function comparisonCells(c: ComparisonRow | undefined, significance: number, reasons: string[]): ComparisonCells {
  if (c === undefined) return { statistic: MISSING, p: MISSING, outcome: MISSING, decided: false };
  let outcome = evidenceWording.comparisonOutcome(c.better, c.available);
  if (!c.available) {
    const reason = noLinks(c.reason ?? evidenceWording.noReason);
    if (!reasons.includes(reason)) reasons.push(reason);
    outcome = `${outcome} (${reasons.indexOf(reason) + 1})`;
  }
  return {
    statistic: formatSignificant(c.statistic, 3),
    p: formatPCell(c.p_value),
    outcome,
    decided: c.available && c.better !== null && c.p_value !== null && c.p_value < significance,
  };
}

export interface BacktestView {
  settings: string;
  /** The benchmark's name, as the table's note gives it. */
  benchmarkName: string;
  /**
   * One table of the figures a reviewer weighs: RMSE and MASE of the two models and the
   * benchmark, each model's coverage at every level and its interval score at the scored level.
   * `groups` head the column groups, `heads` the columns under them.
   */
  summary: { groups: { name: string; span: number }[]; heads: string[]; rows: { h: number; n: number; cells: string[] }[]; note: string };
  comparisonIntro: string;
  /** Names of the losses compared, one column group each. */
  losses: string[];
  comparison: { h: number; tests: ComparisonCells[] }[];
  /** Why a comparison could not be run, once per distinct reason. */
  comparisonNotes: string[];
  notes: string[];
  /** Which horizons the tables leave out, or empty when they show every one. */
  rowsNote: string;
}

function rowAt(backtest: BacktestRecord, method: BacktestMethod, h: number): HorizonScores | undefined {
  return scoresOf(backtest, method).find((r) => r.h === h);
}

export function backtestView(backtest: BacktestRecord, frequency: Frequency, decimals: number, scoredLevel: number): BacktestView {
  const comparedLosses: readonly ComparisonRow['loss'][] = ['squared_error', intervalScoreLoss(scoredLevel)];
  const first = backtest.origins[0];
  const last = backtest.origins.at(-1);
  const every = backtest.per_horizon.deterministic.map((r) => r.h);
  const picked = new Set(shownHorizons(every.length, BACKTEST_TABLE_ROWS, periodsPerYear(frequency)));
  const horizons = every.filter((h) => picked.has(h));
  const reasons: string[] = [];
  const benchmark = METHOD_NAME[backtestMethods(backtest)[2]];
  return {
    benchmarkName: benchmark,
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
    summary: summaryTable(backtest, horizons, decimals, scoredLevel, benchmark),
    comparisonIntro: evidenceWording.comparisonIntro(scoredLevel),
    losses: [TEMPLATE_TEXT.squaredErrorLoss, TEMPLATE_TEXT.intervalScoreLoss(scoredLevel)],
    // The p-value alone decides significance; the outcome only names the lower mean loss.
    comparison: [...new Set(backtest.comparison.map((c) => c.h))]
      .filter((h) => picked.has(h))
      .sort((a, b) => a - b)
      .map((h) => ({ h, tests: comparedLosses.map((loss) => comparisonCells(backtest.comparison.find((c) => c.h === h && c.loss === loss), backtest.settings.significance, reasons)) })),
    comparisonNotes: reasons.map((reason, i) => `(${i + 1}) ${TEMPLATE_TEXT.notTested}: ${reason}.`),
    notes: backtest.notes.map(noLinks),
    rowsNote: horizons.length === every.length ? '' : TEMPLATE_TEXT.rowsShown(horizons, 'record.json'),
  };
}

/** The combined accuracy table: per horizon RMSE and MASE of all three methods, coverage and interval score of the two models. */
function summaryTable(backtest: BacktestRecord, horizons: readonly number[], decimals: number, scoredLevel: number, benchmark: string): BacktestView['summary'] {
  const methods = backtestMethods(backtest);
  const models = ['deterministic', 'stochastic'] as const;
  const { levels } = backtest.settings;
  const short = TEMPLATE_TEXT.methodShort;
  return {
    groups: [
      { name: 'RMSE', span: 3 },
      { name: 'MASE', span: 3 },
      ...levels.map((level) => ({ name: TEMPLATE_TEXT.coverHead(level), span: 2 })),
      { name: TEMPLATE_TEXT.intervalScoreLoss(scoredLevel), span: 2 },
    ],
    heads: [...[0, 1].flatMap(() => methods.map((m) => short[m])), ...[...levels, scoredLevel].flatMap(() => models.map((m) => short[m]))],
    rows: horizons.map((h) => {
      const at = (m: BacktestMethod) => rowAt(backtest, m, h);
      return {
        h,
        n: at('deterministic')?.n ?? 0,
        cells: [
          ...methods.map((m) => formatNumber(at(m)?.rmse, decimals)),
          ...methods.map((m) => formatNumber(at(m)?.mase, 2)),
          ...levels.flatMap((level) => models.map((m) => formatPercent(atLevel(at(m)?.coverage, level)))),
          ...models.map((m) => formatNumber(atLevel(at(m)?.interval_score, scoredLevel), decimals)),
        ],
      };
    }),
    note: TEMPLATE_TEXT.backtestTableNote(benchmark),
  };
}
