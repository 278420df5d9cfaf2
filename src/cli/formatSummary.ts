// The readable terminal summary of an AnalysisRecord, in the memo's words (src/memo/wording.ts
// and the memo's sentences) laid out for a terminal of 80 to 100 columns: the two models side
// by side, the evidence, the backtest and the recommendation, then the forecasts and, for a
// monthly or quarterly series, the next full calendar year. Plain text without colour.
import type { AnalysisRecord, ModelRecord, NextYearRecord } from '../analysis/record.js';
import { levelKey, TREND_MODELS, type TrendModelKind } from '../base/settings.js';
import { evidenceWording } from '../memo/evidenceWording.js';
import { decimalsForScale } from '../memo/format/formatNumber.js';
import { seriesDecimals } from '../memo/format/seriesDecimals.js';
import { modelView } from '../memo/view/modelsView.js';
import { COEFFICIENT_NAME, FIT_FIGURE_NAME, LABELS, MODEL_NAME, scaleName } from '../memo/wording.js';
import { formatBacktest } from './formatBacktest.js';
import { formatEvidence } from './formatEvidence.js';
import { columnWidths, fixed, levelText, NO_VALUE, renderTable, significant, spanWidth, TARGET_WIDTH, wrap, type Column } from './textTable.js';

/** Below this distance from 1 an AR or MA root is taken to sit on the edge of the admissible region. */
const ROOT_EDGE = 1e-3;

export function formatSummary(record: AnalysisRecord): string {
  const { series } = record;
  const lines: string[] = [];
  lines.push(`${series.title}: ${series.frequency}, ${series.first} to ${series.last}, ${series.n} observations; modelling scale: ${scaleName(series.transform)}`);
  lines.push(`  from ${series.source.file}, column ${series.source.column}`);
  lines.push('', ...modelSection(record));
  lines.push('', ...formatEvidence(record));
  if (record.backtest !== undefined && record.backtest !== null) lines.push('', ...formatBacktest(record.backtest, record.settings.recommendation.scored_level));
  if (record.backtest === null) lines.push('', 'Backtest', ...wrap(`Not run: ${record.backtest_unavailable ?? 'the series is too short for one'}`));
  if (record.recommendation !== undefined) lines.push('', ...recommendationSection(record));
  lines.push('', ...forecastSection(record));
  if (record.next_year !== null && record.next_year !== undefined) lines.push('', ...yearSection(record, record.next_year));
  return `${lines.join('\n')}\n`;
}

interface CoefficientCells {
  name: string;
  estimate: string;
  stderr: string;
}

/** An estimate to the decimals that show its standard error to about three significant digits; four significant digits without one. */
function coefficient(name: string, value: number | undefined, se: number | null | undefined): CoefficientCells {
  if (value === undefined) return { name, estimate: '', stderr: '' };
  if (se === null || se === undefined || !Number.isFinite(se) || se <= 0) return { name, estimate: significant(value, 4), stderr: NO_VALUE };
  const decimals = decimalsForScale(se);
  return { name, estimate: fixed(value, decimals), stderr: fixed(se, decimals) };
}

function coefficientRows(model: ModelRecord, kind: TrendModelKind): CoefficientCells[] {
  const regression =
    kind === 'deterministic' && 'intercept' in model.coefficients && 'intercept' in model.stderr
      ? [coefficient(COEFFICIENT_NAME.intercept, model.coefficients.intercept, model.stderr.intercept), coefficient(COEFFICIENT_NAME.slope, model.coefficients.slope, model.stderr.slope)]
      : 'drift' in model.coefficients && 'drift' in model.stderr
        ? [coefficient(COEFFICIENT_NAME.drift, model.coefficients.drift, model.stderr.drift)]
        : [];
  const seasonal = model.seasonal;
  return [
    ...regression,
    ...model.coefficients.ar.map((v, i) => coefficient(COEFFICIENT_NAME.ar(i + 1), v, model.stderr.ar[i])),
    ...model.coefficients.ma.map((v, i) => coefficient(COEFFICIENT_NAME.ma(i + 1), v, model.stderr.ma[i])),
    ...(seasonal === null
      ? []
      : [
          ...seasonal.seasonal_ar.map((v, i) => coefficient(COEFFICIENT_NAME.seasonalAr(seasonal.period), v, seasonal.stderr.seasonal_ar[i])),
          ...seasonal.seasonal_ma.map((v, i) => coefficient(COEFFICIENT_NAME.seasonalMa(seasonal.period), v, seasonal.stderr.seasonal_ma[i])),
        ]),
  ];
}

/** The coefficient table of both models, the figures of each fit, and the notes that explain them. */
function modelSection(record: AnalysisRecord): string[] {
  const det = coefficientRows(record.models.deterministic, 'deterministic');
  const sto = coefficientRows(record.models.stochastic, 'stochastic');
  // Trend coefficients first, then AR, MA and seasonal terms, each model's in its own columns.
  const { deterministic: dm, stochastic: sm } = record.models;
  const names = [
    COEFFICIENT_NAME.intercept,
    COEFFICIENT_NAME.slope,
    COEFFICIENT_NAME.drift,
    ...Array.from({ length: Math.max(dm.p, sm.p) }, (_, i) => COEFFICIENT_NAME.ar(i + 1)),
    ...Array.from({ length: Math.max(dm.q, sm.q) }, (_, i) => COEFFICIENT_NAME.ma(i + 1)),
    ...[...det, ...sto].map((c) => c.name),
  ].filter((name, i, all) => all.indexOf(name) === i && [...det, ...sto].some((c) => c.name === name));
  const cells = (list: CoefficientCells[], name: string): [string, string] => {
    const found = list.find((c) => c.name === name);
    return found === undefined ? ['', ''] : [found.estimate, found.stderr];
  };
  const rows: string[][] = names.map((name) => [name, ...cells(det, name), ...cells(sto, name)]);
  const figure = (label: string, of: (model: ModelRecord) => string): string[] => [label, of(dm), of(sm)];
  const fitDecimals = 2;
  const figures = [
    figure(FIT_FIGURE_NAME.order, (m) => `(${m.p}, ${m.q})`),
    ...(dm.seasonal !== null || sm.seasonal !== null ? [figure(FIT_FIGURE_NAME.seasonalPart, seasonalPart)] : []),
    figure(FIT_FIGURE_NAME.sigma2, (m) => significant(m.sigma2, 4)),
    figure(FIT_FIGURE_NAME.loglik, (m) => fixed(m.loglik, fitDecimals)),
    figure(FIT_FIGURE_NAME.aicc, (m) => fixed(m.aicc, fitDecimals)),
    figure(FIT_FIGURE_NAME.nobs, (m) => String(m.nobs)),
    figure(FIT_FIGURE_NAME.estimation, (m) => (m.estimation === 'reml' ? 'REML' : 'exact ML')),
    figure(FIT_FIGURE_NAME.converged, (m) => (m.converged ? 'yes' : 'NO')),
  ];
  const columns: Column[] = [
    { head: '', align: 'left' },
    { head: LABELS.estimate, align: 'point', group: MODEL_NAME.deterministic },
    { head: LABELS.stderr, align: 'point', group: MODEL_NAME.deterministic },
    { head: LABELS.estimate, align: 'point', group: MODEL_NAME.stochastic },
    { head: LABELS.stderr, align: 'point', group: MODEL_NAME.stochastic },
  ];
  // The figures of each fit sit below, right-aligned under their model's two columns.
  const figureColumns: Column[] = [{ head: '', align: 'left' }, { head: '', align: 'right' }, { head: '', align: 'right' }];
  const figureWidths = columnWidths(figureColumns, figures);
  const least = [figureWidths[0], 0, 0, 0, 0];
  const widths = columnWidths(columns, rows, least);
  for (const [model, last] of [[1, 2], [2, 4]] as const) {
    const short = figureWidths[model] - spanWidth(widths, last - 1, last);
    if (short > 0) least[last] = widths[last] + short;
  }
  const coefficients = renderTable(columns, rows, '  ', least);
  const final = columnWidths(columns, rows, least);
  const lines = ['The two models', ...coefficients, '', ...renderTable(figureColumns, figures, '  ', [final[0], spanWidth(final, 1, 2), spanWidth(final, 3, 4)]).slice(1)];
  const notes = [
    evidenceWording.scaleNote(record.series.transform.kind === 'none' ? null : scaleName(record.series.transform)),
    `${FIT_FIGURE_NAME.loglik} and ${FIT_FIGURE_NAME.aicc} are those of the exact likelihood, by which each model's order was chosen; they compare orders within one model only, as the deterministic trend describes the levels and the stochastic trend their changes.`,
    ...missingStandardErrors(record),
    ...TREND_MODELS.flatMap((kind) => {
      const unexplained = evidenceWording.stderrMethod(null, true);
      return modelView(record, kind)
        .notes.filter((note) => note !== unexplained)
        .map((note) => `${MODEL_NAME[kind]}: ${note}`);
    }),
  ];
  for (const note of notes) lines.push(...wrap(note));
  return lines;
}

function seasonalPart(model: ModelRecord): string {
  const part = model.seasonal;
  if (part === null) return 'none';
  const pieces = [
    ...(part.harmonics > 0 ? [`${part.harmonics} harmonic pair${part.harmonics === 1 ? '' : 's'}`] : []),
    ...(part.P + part.Q > 0 ? [`ARMA(${part.P}, ${part.Q}) at lag ${part.period}`] : []),
    ...(part.seasonal_differences ? ['seasonal differences'] : []),
  ];
  return pieces.length === 0 ? 'none' : pieces.join(', ');
}

/** The legend of the dash in a standard-error column: for each model with one, why the record holds no standard error. */
function missingStandardErrors(record: AnalysisRecord): string[] {
  return TREND_MODELS.flatMap((kind) => {
    const model = record.models[kind];
    const regression = Object.entries(model.stderr).filter(([key, value]) => key !== 'ar' && key !== 'ma' && value === null);
    const arma = [...model.stderr.ar, ...model.stderr.ma, ...(model.seasonal?.stderr.seasonal_ar ?? []), ...(model.seasonal?.stderr.seasonal_ma ?? [])].some((se) => se === null);
    const reasons: string[] = [];
    if (regression.length > 0) reasons.push(`the trend coefficients' estimated covariance is not positive at this optimum`);
    if (arma) {
      const edge = (modulus: number | null): boolean => modulus !== null && modulus - 1 < ROOT_EDGE;
      const { ar_min_modulus: ar, ma_min_modulus: ma } = model.roots;
      if (edge(ma)) reasons.push(`the MA part sits on the edge of invertibility (smallest root modulus ${fixed(ma, 4)}), where the likelihood's curvature is not defined`);
      else if (edge(ar)) reasons.push(`the AR part sits on the edge of stationarity (smallest root modulus ${fixed(ar, 4)}), where the likelihood's curvature is not defined`);
      else reasons.push('the information matrix is singular at this optimum: neither the likelihood\'s curvature nor the outer product of the scores could be inverted');
    }
    return reasons.length === 0 ? [] : [`${NO_VALUE} ${MODEL_NAME[kind]}: no standard error, as ${reasons.join('; and ')}. The estimate itself stands.`];
  });
}

/** Decimals of the series' levels (the memo's rule: a hundredth of the narrower one-step interval). */
function levelDecimals(record: AnalysisRecord): number {
  return seriesDecimals(record);
}

function recommendationSection(record: AnalysisRecord): string[] {
  const recommendation = record.recommendation;
  if (recommendation === undefined) return [];
  const decided = { evidence: 'the evidence settled it', policy: 'the evidence did not settle it, so the rule\'s default applies', config: 'fixed by the config' }[recommendation.decided_by];
  const lines = [`Recommended: the ${MODEL_NAME[recommendation.model].toLowerCase()} (${decided})`];
  lines.push(...wrap(`Rule (${recommendation.rule}): ${recommendation.rule_text}`));
  if (recommendation.justification !== undefined) lines.push(...wrap(`Justification: ${recommendation.justification}`));
  for (const reason of recommendation.reasons) lines.push(...wrap(reason, '    ', TARGET_WIDTH, '  - '));
  return lines;
}

/** An interval as "low to high", each end padded to its column's width so the ends line up. */
function intervalCells(pairs: readonly [string, string][]): string[] {
  const low = Math.max(...pairs.map(([lo]) => lo.length));
  const high = Math.max(...pairs.map(([, hi]) => hi.length));
  return pairs.map(([lo, hi]) => `${lo.padStart(low)} to ${hi.padStart(high)}`);
}

/** The forecast table: both models side by side when that fits the width, else one block per model. */
function forecastSection(record: AnalysisRecord): string[] {
  const levels = record.settings.levels;
  const decimals = levelDecimals(record);
  const periods = record.forecasts.deterministic.map((row) => [row.period, String(row.h)]);
  const modelCells = (kind: TrendModelKind): string[][] => {
    const rows = record.forecasts[kind];
    const byLevel = levels.map((level) => intervalCells(rows.map((row) => row.intervals[levelKey(level)].map((end) => fixed(end, decimals)) as [string, string])));
    return rows.map((row, i) => [fixed(row.point, decimals), ...byLevel.map((cells) => cells[i])]);
  };
  const modelColumns = (group: string | undefined): Column[] => [
    { head: LABELS.point, align: 'right', group },
    ...levels.map((level) => ({ head: `${levelText(level)} interval`, align: 'right' as const, group })),
  ];
  const lead: Column[] = [
    { head: LABELS.period, align: 'left' },
    { head: LABELS.horizon, align: 'right' },
  ];
  const how = `Forecasts (point: the ${record.settings.point === 'median' ? 'median' : 'mean'}${record.series.transform.kind === 'none' ? '' : ', back-transformed'}; intervals ${record.settings.coefficient_uncertainty ? 'with' : 'without'} coefficient uncertainty)`;
  const det = modelCells('deterministic');
  const sto = modelCells('stochastic');
  const side = renderTable(
    [...lead, ...modelColumns(MODEL_NAME.deterministic), ...modelColumns(MODEL_NAME.stochastic)],
    periods.map((lead, i) => [...lead, ...det[i], ...sto[i]]),
    '  ',
  );
  if (Math.max(...side.map((line) => line.length)) <= TARGET_WIDTH) return [how, ...side];
  return [
    how,
    ...TREND_MODELS.flatMap((kind, k) => [
      ...(k === 0 ? [] : ['']),
      `  ${MODEL_NAME[kind]}`,
      ...renderTable([...lead, ...modelColumns(undefined)], periods.map((lead, i) => [...lead, ...(kind === 'deterministic' ? det : sto)[i]]), '  '),
    ]),
  ];
}

/** The next full year's total or average under both models, or why the horizon gives none. */
function yearSection(record: AnalysisRecord, year: NextYearRecord): string[] {
  if (!year.available) return wrap(`Next full year ${year.year}: the horizon ends at ${year.horizon_end}, before the year is complete, so no figure is given.`, '  ', TARGET_WIDTH, '');
  const levels = record.settings.levels;
  const figures = TREND_MODELS.flatMap((kind) => (year[kind] === null ? [] : [{ kind, figure: year[kind] }]));
  const points = figures.map(({ figure }) => figure.point);
  // A year's figure is a sum or mean of periods: shown to the decimals of the levels, or finer for a narrower interval.
  const widths = figures.map(({ figure }) => figure.intervals[levelKey(Math.max(...levels))]).map(([lo, hi]) => hi - lo).filter((w) => w > 0);
  const decimals = widths.length === 0 ? levelDecimals(record) : decimalsForScale(Math.min(...widths));
  const byLevel = levels.map((level) => intervalCells(figures.map(({ figure }) => figure.intervals[levelKey(level)].map((end) => fixed(end, decimals)) as [string, string])));
  const rows = figures.map(({ kind }, i) => [MODEL_NAME[kind], fixed(points[i], decimals), ...byLevel.map((cells) => cells[i])]);
  const columns: Column[] = [{ head: '', align: 'left' }, { head: LABELS.point, align: 'right' }, ...levels.map((level) => ({ head: `${levelText(level)} interval`, align: 'right' as const }))];
  const how =
    year.method === 'simulation'
      ? `simulated from the joint forecasts on the modelling scale, ${year.draws ?? 0} draws; point: ${record.settings.point === 'median' ? 'the median of the draws' : 'the period means combined'}`
      : 'exact, from the joint forecast errors';
  return [...wrap(`Next full year ${year.year}: the ${year.figure} of ${year.first_period} to ${year.last_period} (${how})`, '  ', TARGET_WIDTH, ''), ...renderTable(columns, rows, '  ')];
}
