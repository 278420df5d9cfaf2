// A test for one break at an unknown date in either trend model, valid under its ARMA
// errors: the sup-Wald statistic of Andrews (1993) over 15%-trimmed dates, on the regression
// GLS-whitened by the full-sample (no-break) fit's Kalman filter.
//   deterministic: w on [1, t, D_τ, D_τ·(t − τ)], D_τ = 1{t > τ}: a shift in level and slope;
//   stochastic:    Δw on [1, D_τ]: a shift in drift.
// A model with a seasonal part keeps it: its harmonic columns stay in the regression without a
// break (nuisance regressors), the whitening runs its expanded seasonal ARMA, and on seasonal
// differences Δ_s w on [s, D_τ] tests a shift in the same drift c (Δ_s w = s·c + η: the mean
// year-on-year change is s times the change per period).
//
// The critical values are those for a break in the trend terms alone. Andrews' limit covers
// partial structural change, where some coefficients are held constant across the break: it
// depends only on the number of coefficients that break (Andrews 1993, Econometrica 61(4), the
// "partial structural change" case; Bai & Perron 1998, Econometrica 66(1), the partial
// structural change model; both from memory). The stochastic model's differenced harmonics are
// bounded periodic regressors that satisfy his conditions. In the deterministic model, whose
// trend terms are not stationary, the harmonics are asymptotically orthogonal to them: a
// harmonic column sums to zero over every year, so its cross-products with 1, t and the break
// columns over any stretch are O(1) and O(T), against scalings T^{1/2}·T^{1/2} and
// T^{1/2}·T^{3/2}; the scaled moment matrix is block-diagonal in the limit and the trend block's
// Wald statistic has the limit without them (our argument; the simulated sizes in
// DEVELOPERS.md, "Trend stability", agree).
import type { RegressionArmaFit } from '../models/fitRegressionArma.js';
import type { TrendDesign } from '../models/trendModels.js';
import { ANDREWS_SOURCE, andrewsCritical } from './andrewsCritical.js';
import { breakDates, TRIMMING_PERCENT } from './breakDates.js';
import { breakTestSummary } from './messages.js';
import { TREND_BREAK_SOURCE, trendBreakCritical } from './trendBreakCritical.js';
import type { BreakTestResult, SupWaldCritical, SupWaldPBound, SupWaldRejects } from './types.js';
import { whitenedBreakScan, type BreakScan } from './whitenedBreakScan.js';
import { type TrendModelKind } from '../base/settings.js';

/**
 * The Wald statistic at every candidate date for the model `kind`, given its design and its
 * full-sample fit; a date is the number of observations of the response before the break.
 */
export function trendBreakScan(kind: TrendModelKind, design: TrendDesign, fit: RegressionArmaFit): BreakScan {
  const deterministic = kind === 'deterministic';
  const response = design.response;
  if (fit.beta.length !== design.regressors.length || fit.residuals.length !== response.length) {
    throw new Error('trendBreakScan needs the fit of the design it is given');
  }
  const restrictions = restrictionsOf(kind);
  // Each regime needs as many observations as it has coefficients.
  const { first, last } = breakDates(response.length, restrictions);
  return whitenedBreakScan({
    response,
    base: design.regressors,
    ar: fit.ar,
    ma: fit.ma,
    restrictions,
    first,
    last,
    fillBreak: deterministic ? fillLevelAndSlopeBreak : fillDriftBreak,
  });
}

/** Sup-Wald break test for the model `kind`, given its design and its full-sample fit. */
export function trendBreakTest(kind: TrendModelKind, design: TrendDesign, fit: RegressionArmaFit): BreakTestResult {
  const deterministic = kind === 'deterministic';
  const scan = trendBreakScan(kind, design, fit);
  const critical: SupWaldCritical = deterministic ? trendBreakCritical() : andrewsCritical(1);
  const reject: SupWaldRejects = { '10': scan.stat > critical['10'], '5': scan.stat > critical['5'], '1': scan.stat > critical['1'] };
  const pBound = boundPValue(reject);
  // A regime of τ levels (deterministic) starts the new line at position τ; a regime of τ
  // differences reaches w up to position τ, so the new drift first shows at τ + 1.
  // On seasonal differences a regime of τ differences reaches w up to position τ + s − 1.
  const breakIndex = scan.date + conditionedLevels(kind, design);
  return {
    method: methodOf(kind, design),
    source: deterministic ? TREND_BREAK_SOURCE : ANDREWS_SOURCE,
    stat: scan.stat,
    restrictions: restrictionsOf(kind),
    trimming: TRIMMING_PERCENT / 100,
    break_index: breakIndex,
    critical,
    reject,
    p_bound: pBound,
    summary: breakTestSummary(kind, pBound, `observation ${breakIndex + 1}`),
  };
}

/** Levels of w before the first observation of the response: 0 (levels), 1 (first differences) or s (seasonal differences). */
function conditionedLevels(kind: TrendModelKind, design: TrendDesign): number {
  if (kind === 'deterministic') return 0;
  const seasonality = design.seasonality;
  return seasonality?.seasonalDifferencing === true ? seasonality.period : 1;
}

/** How the test was run, with what the seasonal part of the model added to it. */
function methodOf(kind: TrendModelKind, design: TrendDesign): string {
  const what = kind === 'deterministic' ? 'level and slope' : 'drift';
  return `sup-Wald for a break in the ${what}${seasonalClause(kind, design)}, GLS-whitened, ${TRIMMING_PERCENT}% trimming`;
}

function seasonalClause(kind: TrendModelKind, design: TrendDesign): string {
  const seasonality = design.seasonality;
  if (seasonality === undefined) return '';
  if (kind === 'stochastic' && seasonality.seasonalDifferencing) return ' on the differences over a year';
  const columns = design.regressors.length - (kind === 'deterministic' ? 2 : 1);
  return columns === 0 ? '' : ` with the seasonal pattern's ${columns} harmonic terms held constant across it`;
}

/** Level and slope (deterministic), or drift (stochastic). */
function restrictionsOf(kind: TrendModelKind): number {
  return kind === 'deterministic' ? 2 : 1;
}

/** D_τ = 1{t > τ} and D_τ·(t − τ) for t = 1..m, i.e. position i ≥ τ. */
function fillLevelAndSlopeBreak(tau: number, columns: readonly Float64Array[]): void {
  const [level, slope] = columns;
  for (let i = 0; i < level.length; i++) {
    const after = i >= tau;
    level[i] = after ? 1 : 0;
    slope[i] = after ? i + 1 - tau : 0;
  }
}

/** D_τ = 1 for the differences after the first τ. */
function fillDriftBreak(tau: number, columns: readonly Float64Array[]): void {
  const [drift] = columns;
  for (let j = 0; j < drift.length; j++) drift[j] = j >= tau ? 1 : 0;
}

function boundPValue(reject: SupWaldRejects): SupWaldPBound {
  if (reject['1']) return 'p < 0.01';
  if (reject['5']) return '0.01 < p < 0.05';
  if (reject['10']) return '0.05 < p < 0.10';
  return 'p > 0.10';
}
