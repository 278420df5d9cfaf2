// The backtest block of the terminal summary: what was run and its notes, then by horizon the
// three methods' RMSE and interval score at the scored level and the models' coverage at every
// level, and the comparison tests. The other scores (MAE, MASE, MAPE, widths, CRPS) are in the
// record (`fit --json`), as in the memo's record.json.
import type { BacktestMethod, BacktestRecord, ComparisonRow } from '../analysis/record.js';
import { levelKey, type RefitPolicy } from '../base/settings.js';
import { backtestMethods, scoresOf } from '../memo/backtestMethods.js';
import { decimalsForScale } from '../memo/format/formatNumber.js';
import { MODEL_IN_TEXT, TEMPLATE_TEXT } from '../memo/wording.js';
import { fixed, levelText, NO_VALUE, pCell, percent, renderTable, wrap, type Column } from './textTable.js';

const SHORT: Record<BacktestMethod, string> = TEMPLATE_TEXT.methodShort;

function lossName(loss: ComparisonRow['loss']): string {
  return loss === 'squared_error' ? TEMPLATE_TEXT.squaredErrorLoss : TEMPLATE_TEXT.intervalScoreLoss(Number(loss.slice('interval_score_'.length)));
}

/** Decimals that show the smallest positive value of a column group to about three significant digits. */
function decimalsOf(values: readonly (number | null | undefined)[]): number {
  const positive = values.filter((v): v is number => typeof v === 'number' && Number.isFinite(v) && v > 0);
  return positive.length === 0 ? 2 : decimalsForScale(Math.min(...positive));
}

/** `scoredLevel`: the level whose interval score the recommendation compares (by default the widest). */
export function formatBacktest(record: BacktestRecord, scoredLevel = Math.max(...record.settings.levels)): string[] {
  const { settings, origins } = record;
  const first = origins[0];
  const last = origins[origins.length - 1];
  const span = first.period === null || last.period === null ? `observations ${first.length} to ${last.length}` : `${first.period} to ${last.period}`;
  const lines = [`Backtest: ${settings.origins} origins (${span}), ${settings.horizon === 1 ? '1 step' : `1 to ${settings.horizon} steps`} ahead, ${settings.window} window`];
  lines.push(...wrap(`${describeRefit(settings.refit)}; training windows of at least ${settings.min_training_length} observations.`));
  for (const note of record.notes) lines.push(...wrap(`Note: ${note}`, '    ', undefined, '  '));

  const methods = backtestMethods(record);
  const models = methods.filter((m) => m === 'deterministic' || m === 'stochastic');
  const scored = levelKey(scoredLevel);
  const all = methods.flatMap((method) => scoresOf(record, method));
  const rmseDecimals = decimalsOf(all.map((s) => s.rmse));
  const scoreDecimals = decimalsOf(all.map((s) => s.interval_score[scored]));
  const isHead = `${levelText(scoredLevel)} interval score`;
  const columns: Column[] = [
    { head: 'h', align: 'right' },
    ...methods.map((m) => ({ head: SHORT[m], align: 'right' as const, group: 'RMSE' })),
    ...methods.map((m) => ({ head: SHORT[m], align: 'right' as const, group: isHead })),
    ...settings.levels.flatMap((level) => models.map((m) => ({ head: SHORT[m], align: 'right' as const, group: `${levelText(level)} cover` }))),
  ];
  const rows: string[][] = [];
  for (let h = 1; h <= settings.horizon; h++) {
    const at = (method: BacktestMethod) => scoresOf(record, method)[h - 1];
    rows.push([
      String(h),
      ...methods.map((m) => fixed(at(m).rmse, rmseDecimals)),
      ...methods.map((m) => fixed(at(m).interval_score[scored], scoreDecimals)),
      ...settings.levels.flatMap((level) => models.map((m) => percent(at(m).coverage[levelKey(level)]))),
    ]);
  }
  lines.push('', ...wrap('Accuracy by horizon (in the series\u2019 units; lower RMSE and interval score are better; cover should be near its level)', '  ', undefined, ''));
  lines.push(...renderTable(columns, rows, '  '));
  const benchmark = methods.find((m) => m !== 'deterministic' && m !== 'stochastic');
  lines.push(
    ...wrap(
      `Det.: deterministic trend. Stoch.: stochastic trend.${benchmark === undefined ? '' : ` Bench.: the ${MODEL_IN_TEXT[benchmark]}.`} Cover: the share of outcomes inside the interval. The interval score is the interval's width plus a penalty for each outcome outside it. MAE, MASE, MAPE, widths, CRPS and the other levels' scores: fit --json.`,
    ),
  );

  lines.push('', ...wrap(`${TEMPLATE_TEXT.comparisonCaption}: Diebold-Mariano test of equal accuracy, deterministic against stochastic trend`, '  ', undefined, ''));
  const losses = [...new Set(record.comparison.map((row) => row.loss))];
  const table: string[][] = [];
  for (let h = 1; h <= settings.horizon; h++) {
    table.push([String(h), ...losses.flatMap((loss) => comparisonCells(record.comparison.find((row) => row.h === h && row.loss === loss), settings.significance))]);
  }
  const comparisonColumns: Column[] = [
    { head: 'h', align: 'right' },
    ...losses.flatMap((loss) => [
      { head: 'p-value', align: 'right' as const, group: lossName(loss) },
      { head: 'lower for', align: 'left' as const, group: lossName(loss) },
    ]),
  ];
  lines.push(...renderTable(comparisonColumns, table, '  '));
  lines.push(...wrap(`* significant at the ${fixed(settings.significance * 100, 0)}% level. A small p-value means the difference in average loss is unlikely to be chance.`));
  // One line per reason a test is missing, with the horizons it applies to.
  const missing = new Map<string, string[]>();
  for (const row of record.comparison.filter((c) => !c.available)) {
    const key = `${lossName(row.loss)}: ${row.reason ?? 'not available'}`;
    missing.set(key, [...(missing.get(key) ?? []), String(row.h)]);
  }
  for (const [reason, hs] of missing) lines.push(...wrap(`${NO_VALUE} no test at h = ${hs.join(', ')} (${reason}).`));
  return lines;
}

function comparisonCells(row: ComparisonRow | undefined, significance: number): [string, string] {
  if (row === undefined || !row.available || row.p_value === null) return [NO_VALUE, ''];
  const lower = row.better === null ? 'neither' : row.better;
  return [pCell(row.p_value), `${lower}${row.p_value < significance ? ' *' : ''}`];
}

/** One line on how each origin refits the models, for the summary. */
export function describeRefit(refit: RefitPolicy): string {
  if (refit === 'reselect') return 'Orders re-selected by AICc and parameters re-estimated at every origin';
  if (refit === 'reestimate') return 'Orders fixed from the full sample, parameters re-estimated at every origin';
  return 'Orders and parameters fixed from the full sample';
}
