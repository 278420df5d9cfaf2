// The backtest block of the terminal summary: what was run, the notes, accuracy per horizon
// for each method and the comparison tests. Plain text, fixed-width columns.
import type { BacktestMethod, BacktestRecord, ComparisonRow, JsonNumber } from '../analysis/record.js';
import { backtestMethods, scoresOf } from '../memo/backtestMethods.js';
import { levelKey, type RefitPolicy } from '../base/settings.js';

const METHOD_NAMES: Record<BacktestMethod, string> = { deterministic: 'deterministic', stochastic: 'stochastic', naive: 'no change', seasonal_naive: 'seasonal naive' };
function lossName(loss: ComparisonRow['loss']): string {
  return loss === 'squared_error' ? 'squared error' : `${loss.slice('interval_score_'.length)}% interval score`;
}

export function formatBacktest(record: BacktestRecord): string[] {
  const { settings, origins } = record;
  const first = origins[0];
  const last = origins[origins.length - 1];
  const span = first.period === null || last.period === null ? `observations ${first.length} to ${last.length}` : `${first.period} to ${last.period}`;
  const lines = [
    `Backtest: ${settings.origins} origins (${span}), horizons 1 to ${settings.horizon}, ${settings.window} window, step ${settings.step}`,
    `  ${describeRefit(settings.refit)}; training windows of at least ${settings.min_training_length} observations`,
  ];
  for (const note of record.notes) lines.push(`  Note: ${note}`);
  lines.push('');
  lines.push('Accuracy by horizon (data scale, CRPS on the model scale; lower is better, coverage should match its level):');
  const levels = settings.levels.map(levelKey);
  const header = ['h', 'method', 'MAE', 'RMSE', 'MASE', 'MAPE %', ...levels.map((l) => `cover ${l}%`), ...levels.map((l) => `IS ${l}%`), 'CRPS'];
  const rows: string[][] = [header];
  for (let h = 1; h <= settings.horizon; h++) {
    for (const method of backtestMethods(record)) {
      const s = scoresOf(record, method)[h - 1];
      rows.push([
        String(h),
        METHOD_NAMES[method],
        ...[s.mae, s.rmse, s.mase, s.mape].map((v) => formatNumber(v)),
        ...levels.map((l) => formatNumber(s.coverage[l], 2)),
        ...levels.map((l) => formatNumber(s.interval_score[l])),
        formatNumber(s.crps),
      ]);
    }
  }
  lines.push(...alignColumns(rows, 2).map((line) => `  ${line}`));
  lines.push('');
  lines.push(`Deterministic vs stochastic trend, Diebold-Mariano test with the small-sample correction (p-values; ${settings.significance * 100}% level):`);
  const losses = [...new Set(record.comparison.map((row) => row.loss))];
  const table: string[][] = [['h', ...losses.map((loss) => lossName(loss))]];
  for (let h = 1; h <= settings.horizon; h++) {
    table.push([String(h), ...losses.map((loss) => describeComparison(record.comparison.find((row) => row.h === h && row.loss === loss), settings.significance))]);
  }
  lines.push(...alignColumns(table, table[0].length).map((line) => `  ${line}`));
  for (const row of record.comparison.filter((c) => !c.available)) lines.push(`  Not available at h = ${row.h} (${lossName(row.loss)}): ${row.reason ?? ''}`);
  return lines;
}

function describeComparison(row: ComparisonRow | undefined, significance: number): string {
  if (row === undefined || !row.available || row.p_value === null) return 'not available';
  const lower = row.better === null ? 'equal means' : `${row.better} lower`;
  return `p = ${row.p_value.toFixed(3)}, ${lower}${row.p_value < significance ? ' (significant)' : ''}`;
}

function formatNumber(value: JsonNumber | undefined, digits = 4): string {
  if (value === null || value === undefined) return 'n/a';
  const size = Math.abs(value);
  if (size !== 0 && (size >= 1e7 || size < 1e-4)) return value.toExponential(digits - 1);
  return Number(value.toPrecision(digits)).toString();
}

/** Pads every column to its widest cell: the first `textColumns` to the left, the rest (numbers) to the right. */
function alignColumns(rows: readonly string[][], textColumns: number): string[] {
  const widths = rows[0].map((_, column) => Math.max(...rows.map((row) => row[column].length)));
  return rows.map((row) =>
    row
      .map((cell, column) => (column < textColumns ? cell.padEnd(widths[column]) : cell.padStart(widths[column])))
      .join('  ')
      .trimEnd(),
  );
}

/** One line on how each origin refits the models, for the summary. */
export function describeRefit(refit: RefitPolicy): string {
  if (refit === 'reselect') return 'orders re-selected by AICc and parameters re-estimated at every origin';
  if (refit === 'reestimate') return 'orders fixed from the full sample, parameters re-estimated at every origin';
  return 'orders and parameters fixed from the full sample';
}
