// The evidence block of the terminal summary: unit-root tests, their reading, residual checks.
import type { AnalysisRecord } from '../analysis/record.js';
import { addPeriods } from '../base/period.js';
import type { AdfResult, KpssResult } from '../analysis/record.js';
import { formatPValue } from '../base/pValueText.js';

export function formatEvidence(record: AnalysisRecord): string[] {
  const { evidence } = record;
  const lines = ['Evidence on the kind of trend (model scale):'];
  lines.push(`  KPSS, null: stationary around a level   ${kpss(evidence.kpss.level)}`);
  lines.push(`  KPSS, null: stationary around a line    ${kpss(evidence.kpss.trend)}`);
  lines.push(`  ADF, null: unit root (constant)         ${adf(evidence.adf.constant)}`);
  lines.push(`  ADF, null: unit root (constant + trend) ${adf(evidence.adf.trend)}`);
  lines.push(`  Reading (${evidence.reading.verdict}): ${evidence.reading.text}`);
  for (const problem of evidence.unavailable) lines.push(`  Not available: ${problem.test} (${problem.reason})`);
  const seasonal = evidence.seasonal;
  if (seasonal !== undefined) {
    if (seasonal.unit_root !== null) lines.push(`  Seasonal test: ${seasonal.unit_root.text}`);
    if (seasonal.strength !== null) lines.push(`  Seasonal strength: ${seasonal.strength.text}`);
    for (const problem of seasonal.unavailable) lines.push(`  Not available: ${problem.test} (${problem.reason})`);
  }
  lines.push('');
  lines.push('Residual checks (one-step forecast errors):');
  for (const kind of ['deterministic', 'stochastic'] as const) {
    const checks = evidence.residuals[kind];
    const lb = checks.ljung_box;
    const ljung = lb === null ? 'Ljung-Box n/a' : `Ljung-Box Q = ${lb.stat.toFixed(2)} on ${lb.df} df, ${formatPValue(lb)}`;
    const jb = `Jarque-Bera ${formatPValue(checks.jarque_bera)}`;
    const flags = checks.findings.filter((f) => f.flagged).map((f) => f.check);
    lines.push(`  ${kind.padEnd(13)} ${ljung}; ${jb}; ${flags.length === 0 ? 'no flags' : `FLAGGED: ${flags.join(', ')}`}`);
  }
  lines.push('');
  lines.push('Trend stability:');
  const stability = evidence.stability;
  if (stability === null) {
    lines.push('  not available');
  } else {
    // A model with a seasonal part keeps it in every window and in the break test; on seasonal
    // differences the drift is still per period, the mean change over a year divided by s.
    const seasonal = record.models.deterministic.seasonal !== null || record.models.stochastic.seasonal !== null;
    const yearSteps = record.models.stochastic.seasonal?.seasonal_differences === true ? record.models.stochastic.seasonal.period : undefined;
    for (const kind of ['deterministic', 'stochastic'] as const) {
      const test = stability.break_test[kind];
      const at = addPeriods(record.series.first, test.break_index);
      const over = kind === 'stochastic' && yearSteps !== undefined ? ', on the changes over a year' : '';
      lines.push(`  ${kind.padEnd(13)} sup-Wald ${test.stat.toFixed(2)} (${test.restrictions} restriction${test.restrictions > 1 ? 's' : ''}${over}), ${test.p_bound}, most likely break from ${at}`);
    }
    const slope = stability.windows.deterministic;
    const drift = stability.windows.stochastic;
    const driftUnit = yearSteps === undefined ? '' : ` per period (change over a year / ${yearSteps})`;
    if (slope.length <= 1) lines.push(`  expanding windows: none, the series is no longer than the shortest window (${stability.windows.min_window} observations)`);
    else lines.push(`  expanding windows (${slope.length}${seasonal ? ', seasonal parts kept' : ''}): slope ${range(slope.map((w) => w.slope))}, drift ${range(drift.map((w) => w.drift))}${driftUnit}`);
  }
  return lines;
}

function range(values: number[]): string {
  const finite = values.filter(Number.isFinite);
  if (finite.length === 0) return 'n/a';
  return `${Math.min(...finite).toPrecision(3)} to ${Math.max(...finite).toPrecision(3)}`;
}

function kpss(result: KpssResult | null): string {
  if (result === null) return 'not available';
  return `stat ${result.stat.toFixed(4)}, ${result.lags} lags, ${formatPValue(result)}`;
}

function adf(result: AdfResult | null): string {
  if (result === null) return 'not available';
  return `stat ${result.stat.toFixed(3)}, ${result.lags} lags, ${formatPValue(result)} (5% critical ${result.critical['5'].toFixed(2)})`;
}
