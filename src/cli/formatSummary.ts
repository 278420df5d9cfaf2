// The readable terminal summary of an AnalysisRecord: both models side by side, then the
// forecast table and, for a monthly or quarterly series, the next full calendar year. Plain
// text, fixed-width columns.
import type { AnalysisRecord, ModelRecord, NextYearRecord } from '../analysis/record.js';
import { levelKey } from '../base/settings.js';
import { formatEvidence } from './formatEvidence.js';
import { formatBacktest } from './formatBacktest.js';

const MODEL_TITLES = { deterministic: 'Deterministic trend', stochastic: 'Stochastic trend' } as const;

export function formatSummary(record: AnalysisRecord): string {
  const { series } = record;
  const lines: string[] = [];
  const transform = series.transform.kind === 'box-cox' ? `Box-Cox ${series.transform.lambda}` : series.transform.kind;
  lines.push(`${series.title}: ${series.frequency} ${series.first} to ${series.last}, n = ${series.n}, transform ${transform}`);
  lines.push('');
  lines.push(...modelTable(record.models.deterministic, record.models.stochastic));
  lines.push('');
  lines.push('AICc ranks orders within a model only; the two models describe different data.');
  lines.push('');
  lines.push(...formatEvidence(record));
  lines.push('');
  lines.push(...forecastTable(record));
  if (record.next_year !== null && record.next_year !== undefined) lines.push('', ...yearTable(record, record.next_year));
  if (record.backtest !== undefined && record.backtest !== null) lines.push('', ...formatBacktest(record.backtest));
  if (record.backtest === null) lines.push('', `Backtest not run: ${record.backtest_unavailable ?? 'the series is too short'}`);
  if (record.recommendation !== undefined) {
    lines.push('', `Recommended: the ${record.recommendation.model} trend (rule: ${record.recommendation.rule}).`);
    for (const reason of record.recommendation.reasons) lines.push(`  - ${reason}`);
  }
  return `${lines.join('\n')}\n`;
}

function modelTable(det: AnalysisRecord['models']['deterministic'], sto: AnalysisRecord['models']['stochastic']): string[] {
  const rows: [string, string, string][] = [['', MODEL_TITLES.deterministic, MODEL_TITLES.stochastic]];
  rows.push(['order (p, q)', `(${det.p}, ${det.q})`, `(${sto.p}, ${sto.q})`]);
  rows.push(['intercept', estimate(det.coefficients.intercept, det.stderr.intercept), '']);
  rows.push(['slope', estimate(det.coefficients.slope, det.stderr.slope), '']);
  rows.push(['drift', '', estimate(sto.coefficients.drift, sto.stderr.drift)]);
  const arOrder = Math.max(det.p, sto.p);
  for (let i = 0; i < arOrder; i++) rows.push([`ar${i + 1}`, lagged(det, 'ar', i), lagged(sto, 'ar', i)]);
  const maOrder = Math.max(det.q, sto.q);
  for (let j = 0; j < maOrder; j++) rows.push([`ma${j + 1}`, lagged(det, 'ma', j), lagged(sto, 'ma', j)]);
  if (det.seasonal !== null || sto.seasonal !== null) {
    const part = (model: ModelRecord): string => {
      const seasonal = model.seasonal;
      if (seasonal === null) return 'none';
      return `${seasonal.harmonics} pair${seasonal.harmonics === 1 ? '' : 's'}, (${seasonal.P}, ${seasonal.Q}) at lag ${seasonal.period}${seasonal.seasonal_differences ? ', seasonal diff.' : ''}`;
    };
    const factor = (model: ModelRecord, which: 'seasonal_ar' | 'seasonal_ma'): string => {
      const seasonal = model.seasonal;
      if (seasonal === null || seasonal[which].length === 0) return '';
      return estimate(seasonal[which][0], seasonal.stderr[which][0]);
    };
    rows.push(['seasonal part', part(det), part(sto)]);
    rows.push(['seasonal AR', factor(det, 'seasonal_ar'), factor(sto, 'seasonal_ar')]);
    rows.push(['seasonal MA', factor(det, 'seasonal_ma'), factor(sto, 'seasonal_ma')]);
  }
  const method = (model: typeof det | typeof sto): string => (model.estimation === 'reml' ? 'REML' : 'exact ML') + (model.restricted_fallback === null ? '' : ' (REML not usable)');
  rows.push(['estimated by', method(det), method(sto)]);
  rows.push(['sigma2', num(det.sigma2), num(sto.sigma2)]);
  // The exact log-likelihood and AICc the order was chosen by.
  rows.push(['loglik', num(det.loglik, 7), num(sto.loglik, 7)]);
  rows.push(['AICc', num(det.aicc, 7), num(sto.aicc, 7)]);
  rows.push(['observations', String(det.nobs), String(sto.nobs)]);
  rows.push(['converged', det.converged ? 'yes' : 'NO', sto.converged ? 'yes' : 'NO']);
  return alignRows(rows.filter(([, a, b]) => a !== '' || b !== ''));
}

function forecastTable(record: AnalysisRecord): string[] {
  const levels = record.settings.levels.map(levelKey);
  const header = ['period', 'h'];
  for (const kind of ['deterministic', 'stochastic'] as const) {
    const short = kind === 'deterministic' ? 'det.' : 'stoch.';
    header.push(`${short} point`, ...levels.map((level) => `${short} ${level}%`));
  }
  const rows: string[][] = [header];
  record.forecasts.deterministic.forEach((det, index) => {
    const sto = record.forecasts.stochastic[index];
    const row = [det.period, String(det.h)];
    for (const item of [det, sto]) {
      row.push(num(item.point, 5), ...levels.map((level) => `${num(item.intervals[level][0], 5)} to ${num(item.intervals[level][1], 5)}`));
    }
    rows.push(row);
  });
  const scale = record.settings.coefficient_uncertainty ? 'with' : 'without';
  return [`Forecasts (intervals ${scale} coefficient uncertainty; point = ${record.settings.point}):`, ...alignRows(rows)];
}

/** The next full year's total or average under both models, or why the horizon gives none. */
function yearTable(record: AnalysisRecord, year: NextYearRecord): string[] {
  if (!year.available) return [`Next full year ${year.year}: the horizon ends at ${year.horizon_end}, before the year is complete, so no figure is given.`];
  const levels = record.settings.levels.map(levelKey);
  const rows: string[][] = [['', 'point', ...levels.map((level) => `${level}%`)]];
  for (const kind of ['deterministic', 'stochastic'] as const) {
    const figure = year[kind];
    if (figure !== null) rows.push([kind, num(figure.point, 6), ...levels.map((level) => `${num(figure.intervals[level][0], 6)} to ${num(figure.intervals[level][1], 6)}`)]);
  }
  const how =
    year.method === 'simulation'
      ? `simulated from the joint model-scale forecasts, ${year.draws ?? 0} draws; point = ${record.settings.point === 'median' ? 'median of the draws' : 'the period means combined'}`
      : 'exact, from the joint forecast errors';
  return [`Next full year ${year.year}, the ${year.figure} of ${year.first_period} to ${year.last_period} (${how}):`, ...alignRows(rows)];
}

function estimate(value: number, se: number | null): string {
  return `${num(value)} ± ${se === null ? 'n/a' : num(se, 3)}`;
}

function lagged(model: ModelRecord, part: 'ar' | 'ma', index: number): string {
  const values = model.coefficients[part];
  return index < values.length ? estimate(values[index], model.stderr[part][index]) : '';
}

function num(value: number | null, digits = 4): string {
  if (value === null || !Number.isFinite(value)) return 'n/a';
  const abs = Math.abs(value);
  if (abs !== 0 && (abs >= 1e7 || abs < 1e-4)) return value.toExponential(digits - 1);
  return Number(value.toPrecision(digits)).toString();
}

function alignRows(rows: readonly (readonly string[])[]): string[] {
  const widths: number[] = [];
  for (const row of rows) row.forEach((cell, i) => (widths[i] = Math.max(widths[i] ?? 0, cell.length)));
  return rows.map((row) =>
    row
      .map((cell, i) => (i === 0 ? cell.padEnd(widths[i]) : cell.padStart(widths[i])))
      .join('  ')
      .trimEnd(),
  );
}
