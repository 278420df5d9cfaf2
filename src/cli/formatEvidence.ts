// The evidence block of the terminal summary: unit-root tests, their reading, residual checks.
import type { AnalysisRecord } from '../analysis/record.js';
import { formatPValue } from '../evidence/messages.js';
import type { AdfResult, KpssResult } from '../evidence/types.js';

export function formatEvidence(record: AnalysisRecord): string[] {
  const { evidence } = record;
  const lines = ['Evidence on the kind of trend (model scale):'];
  lines.push(`  KPSS, null: stationary around a level   ${kpss(evidence.kpss.level)}`);
  lines.push(`  KPSS, null: stationary around a line    ${kpss(evidence.kpss.trend)}`);
  lines.push(`  ADF, null: unit root (constant)         ${adf(evidence.adf.constant)}`);
  lines.push(`  ADF, null: unit root (constant + trend) ${adf(evidence.adf.trend)}`);
  lines.push(`  Reading (${evidence.reading.verdict}): ${evidence.reading.text}`);
  for (const problem of evidence.unavailable) lines.push(`  Not available: ${problem.test} (${problem.reason})`);
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
  return lines;
}

function kpss(result: KpssResult | null): string {
  if (result === null) return 'not available';
  return `stat ${result.stat.toFixed(4)}, ${result.lags} lags, ${formatPValue(result)}`;
}

function adf(result: AdfResult | null): string {
  if (result === null) return 'not available';
  return `stat ${result.stat.toFixed(3)}, ${result.lags} lags, ${formatPValue(result)} (5% critical ${result.critical['5'].toFixed(2)})`;
}
