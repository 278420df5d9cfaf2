// The evidence block of the terminal summary, in the memo's words: the unit-root checks as a
// table with their plain outcomes and the combined reading, the seasonal checks, each model's
// one-step forecast errors with findings in plain words, and trend stability.
import type { AdfResult, AnalysisRecord, KpssResult, ResidualChecks, SupWaldPBound } from '../analysis/record.js';
import { addPeriods } from '../base/period.js';
import { TREND_MODELS } from '../base/settings.js';
import { evidenceWording, UNIT_ROOT_ROWS } from '../memo/evidenceWording.js';
import { formatP } from '../memo/format/formatNumber.js';
import { seasonalReadings } from '../memo/view/evidenceView.js';
import { HEADINGS, LABELS, MODEL_NAME } from '../memo/wording.js';
import { fixed, pCell, renderTable, significant, wrap, type Column } from './textTable.js';

/** A sup-Wald p-value known only between critical values, as a cell. */
const P_BOUND_CELL: Record<SupWaldPBound, string> = {
  'p < 0.01': '< 0.01',
  '0.01 < p < 0.05': '0.01 to 0.05',
  '0.05 < p < 0.10': '0.05 to 0.10',
  'p > 0.10': '> 0.10',
};

export function formatEvidence(record: AnalysisRecord): string[] {
  return [...unitRootSection(record), '', ...residualSection(record), '', ...stabilitySection(record)];
}

function kpssRejects(result: KpssResult, level: number): boolean {
  if (result.p_bound === 'below') return true;
  if (result.p_bound === 'above') return false;
  return result.p_value < level;
}

function unitRootSection(record: AnalysisRecord): string[] {
  const { kpss, adf, reading, unavailable } = record.evidence;
  const level = reading.level;
  const rows: string[][] = [];
  // The outcome in a few words, of the row's name: a steady level or line ("it"), lasting shocks ("them").
  const row = (name: string, result: KpssResult | AdfResult | null, rejects: boolean, words: [string, string]): void => {
    if (result === null) return;
    rows.push([name, fixed(result.stat, 3), String(result.lags), pCell(result.p_value, 'p_bound' in result ? result.p_bound : undefined), rejects ? words[0] : words[1]]);
  };
  const steady: [string, string] = ['rules it out', 'no evidence against it'];
  const shocks: [string, string] = ['rules them out', 'cannot rule them out'];
  row(UNIT_ROOT_ROWS.kpssLevel.name, kpss.level, kpss.level !== null && kpssRejects(kpss.level, level), steady);
  row(UNIT_ROOT_ROWS.kpssTrend.name, kpss.trend, kpss.trend !== null && kpssRejects(kpss.trend, level), steady);
  row(UNIT_ROOT_ROWS.adfConstant.name, adf.constant, adf.constant !== null && adf.constant.p_value < level, shocks);
  row(UNIT_ROOT_ROWS.adfTrend.name, adf.trend, adf.trend !== null && adf.trend.p_value < level, shocks);
  const columns: Column[] = [
    { head: LABELS.test, align: 'left' },
    { head: LABELS.statistic, align: 'right' },
    { head: LABELS.lags, align: 'right' },
    { head: LABELS.pValue, align: 'right' },
    { head: `${LABELS.outcome} at ${fixed(level * 100, 0)}%`, align: 'left' },
  ];
  const lines = [`${HEADINGS.evidence} (on the modelling scale)`, ...renderTable(columns, rows, '  ')];
  lines.push(...wrap(`KPSS starts from a steady level or line and looks for evidence against it; ADF starts from shocks that never fade (a unit root) and looks for evidence against them.`));
  lines.push(...wrap(`Reading: ${reading.text}`));
  for (const problem of unavailable) lines.push(...wrap(evidenceWording.unavailable(problem.test, problem.reason)));
  const seasonal = seasonalReadings(record);
  if (seasonal.length > 0) lines.push(`  ${evidenceWording.seasonalHeading}:`, ...seasonal.flatMap((sentence) => wrap(sentence, '    ')));
  return lines;
}

/** What a flagged check found, in plain words with its p-value. */
function findingWords(checks: ResidualChecks): string[] {
  return checks.findings
    .filter((finding) => finding.flagged)
    .map((finding) => {
      if (finding.check === 'ljung_box' && checks.ljung_box !== null)
        return `autocorrelation remains in the one-step errors (Ljung-Box over ${checks.ljung_box.lags} lags, ${formatP(checks.ljung_box.p_value)}): the model has not caught all of the series' memory`;
      if (finding.check === 'acf')
        return `${checks.acf_outside.length} of ${checks.acf.lag.length} error autocorrelations lie outside their 95% bounds (lag ${checks.acf_outside.join(', ')}), more than chance would put there`;
      if (finding.check === 'normality')
        return `the errors are not bell-shaped (Jarque-Bera ${formatP(checks.jarque_bera.p_value)}), so the normal-based intervals may misstate the chance of large surprises`;
      return finding.text;
    });
}

function residualSection(record: AnalysisRecord): string[] {
  const { residuals } = record.evidence;
  const columns: Column[] = [
    { head: '', align: 'left' },
    { head: 'Q', align: 'right', group: 'Ljung-Box' },
    { head: 'df', align: 'right', group: 'Ljung-Box' },
    { head: LABELS.pValue, align: 'right', group: 'Ljung-Box' },
    { head: 'outside', align: 'right', group: 'Autocorrelations' },
    { head: 'skewness', align: 'right', group: 'Jarque-Bera' },
    { head: 'kurtosis', align: 'right', group: 'Jarque-Bera' },
    { head: LABELS.pValue, align: 'right', group: 'Jarque-Bera' },
  ];
  const rows = TREND_MODELS.map((kind) => {
    const checks = residuals[kind];
    const lb = checks.ljung_box;
    const jb = checks.jarque_bera;
    return [
      MODEL_NAME[kind],
      lb === null ? '' : fixed(lb.stat, 2),
      lb === null ? '' : String(lb.df),
      lb === null ? 'too few' : pCell(lb.p_value),
      `${checks.acf_outside.length} of ${checks.acf.lag.length}`,
      fixed(jb.skewness, 2),
      fixed(jb.kurtosis, 2),
      pCell(jb.p_value),
    ];
  });
  const lines = [HEADINGS.residualChecks, ...renderTable(columns, rows, '  ')];
  const findings = TREND_MODELS.flatMap((kind) => findingWords(residuals[kind]).map((words) => `${MODEL_NAME[kind]}: ${words}.`));
  if (findings.length === 0) lines.push('  No finding against either model\u2019s errors.');
  for (const finding of findings) lines.push(...wrap(finding));
  lines.push(...wrap(`Autocorrelations: of lags 1 to ${residuals.deterministic.acf.lag.length}, those outside \u00b11.96/\u221an; kurtosis is 3 for a bell shape.`));
  return lines;
}

function stabilitySection(record: AnalysisRecord): string[] {
  const stability = record.evidence.stability;
  if (stability === null) return [HEADINGS.stability, '  Not available for this series (see the reasons above).'];
  const yearSteps = record.models.stochastic.seasonal?.seasonal_differences === true ? record.models.stochastic.seasonal.period : undefined;
  const columns: Column[] = [
    { head: '', align: 'left' },
    { head: 'Break test', align: 'right' },
    { head: 'Allowed to change', align: 'left' },
    { head: LABELS.pValue, align: 'right' },
    { head: 'Most likely break from', align: 'left' },
  ];
  const rows = TREND_MODELS.map((kind) => {
    const test = stability.break_test[kind];
    const changes = kind === 'deterministic' ? 'level and slope' : yearSteps === undefined ? 'drift' : 'drift (changes over a year)';
    return [MODEL_NAME[kind], fixed(test.stat, 2), changes, P_BOUND_CELL[test.p_bound], addPeriods(record.series.first, test.break_index)];
  });
  const lines = [HEADINGS.stability, ...renderTable(columns, rows, '  ')];
  const summary = evidenceWording.stabilitySummary(
    TREND_MODELS.filter((model) => stability.break_test[model].reject['5']),
    TREND_MODELS.filter((model) => stability.break_test[model].reject['10'] && !stability.break_test[model].reject['5']),
  );
  // The memo's sentence points to its appendix; here the table is above.
  lines.push(...wrap(`${summary.replace(/ \(chart and tests in the technical appendix\)/, '')} Break test: the largest Wald statistic over the possible break dates (sup-Wald).`));
  const slope = stability.windows.deterministic.map((w) => w.slope);
  const drift = stability.windows.stochastic.map((w) => w.drift);
  if (slope.length <= 1) lines.push(...wrap(`Expanding windows: none, as the series is no longer than the shortest window (${stability.windows.min_window} observations).`));
  else {
    const range = (values: number[]): string => `${significant(Math.min(...values), 3)} to ${significant(Math.max(...values), 3)}`;
    const unit = yearSteps === undefined ? '' : ` per period (the change over a year / ${yearSteps})`;
    const seasonal = record.models.deterministic.seasonal !== null || record.models.stochastic.seasonal !== null;
    lines.push(...wrap(`Expanding windows (${slope.length}, from ${stability.windows.min_window} observations${seasonal ? ', seasonal parts kept' : ''}): slope ${range(slope)}, drift ${range(drift)}${unit}.`));
  }
  return lines;
}
