// Augmented Dickey-Fuller test (Dickey & Fuller 1979; Said & Dickey 1984): the null is a unit
// root. Test regression Δy_t = α [+ δ t] + ρ y_{t−1} + Σ_{j=1}^{k} φ_j Δy_{t−j} + e_t, and the
// statistic is the t-ratio of ρ. The lag order k is chosen by AIC over 0..k_max with every
// candidate fitted on the same rows (those the largest k leaves), so the criteria compare
// like with like; the chosen k is then refitted on all rows it allows.
import { ols, type OlsFit } from '../linalg/ols.js';
import { finiteSeries } from './finiteSeries.js';
import { mackinnonCritical } from './mackinnonCritical.js';
import { mackinnonPValue } from './mackinnonPValue.js';
import { schwertLags } from './schwertLags.js';
import type { AdfLagRule, AdfResult } from './types.js';

export interface AdfOptions {
  /** 'constant' or 'trend' (constant + linear trend) in the test regression; default 'trend'. */
  regression?: AdfResult['regression'];
  /** A fixed lag order; without it the order is chosen by AIC. */
  lags?: number;
  /** Largest order the AIC search tries; default min(ceil(12(n/100)^{1/4}), floor(n/2) − d − 1). */
  maxLags?: number;
}

/** ADF statistic, lag order, rows used, MacKinnon p-value and critical values for `y`. */
export function adfTest(y: ArrayLike<number>, options: AdfOptions = {}): AdfResult {
  const regression = options.regression ?? 'trend';
  const series = finiteSeries(y, 'adfTest');
  const n = series.length;
  const deterministic = regression === 'constant' ? 1 : 2;
  // Keeps at least half the sample as rows of the test regression (common practice).
  const ceiling = Math.floor(n / 2) - deterministic - 1;
  if (ceiling < 0) throw new Error(`adfTest needs at least ${2 * (deterministic + 1)} observations`);

  const differences = series.subarray(1).map((value, t) => value - series[t]);
  let lags: number;
  let lagRule: AdfLagRule;
  if (options.lags !== undefined) {
    lags = checkedLagCount(options.lags, ceiling, 'lags');
    lagRule = 'fixed';
  } else {
    const maxLags = checkedLagCount(options.maxLags ?? Math.min(schwertLags(n), ceiling), ceiling, 'maxLags');
    lags = aicLagOrder(series, differences, maxLags, regression);
    lagRule = 'aic';
  }

  const fit = adfRegression(series, differences, lags, lags, regression);
  const stat = fit.coefficients[0] / fit.standardErrors[0];
  return {
    stat,
    lags,
    nobs: fit.nobs,
    p_value: mackinnonPValue(stat, regression),
    critical: mackinnonCritical(regression, fit.nobs),
    regression,
    lag_rule: lagRule,
  };
}

function checkedLagCount(value: number, ceiling: number, name: string): number {
  if (!Number.isInteger(value) || value < 0) throw new Error(`adfTest needs whole, non-negative ${name}`);
  if (value > ceiling) throw new Error(`adfTest allows at most ${ceiling} ${name} for this many observations`);
  return value;
}

/** Order in 0..maxLags with the smallest AIC, all fitted on the rows that maxLags leaves. */
function aicLagOrder(
  series: Float64Array,
  differences: Float64Array,
  maxLags: number,
  regression: AdfResult['regression'],
): number {
  let best = 0;
  let bestAic = Infinity;
  for (let k = 0; k <= maxLags; k++) {
    const fit = adfRegression(series, differences, k, maxLags, regression);
    const regressors = k + (regression === 'constant' ? 2 : 3);
    // Akaike (1974) for a Gaussian regression, dropping terms common to every candidate.
    const aic = fit.nobs * Math.log(fit.ssr / fit.nobs) + 2 * regressors;
    if (aic < bestAic) {
      bestAic = aic;
      best = k;
    }
  }
  return best;
}

/**
 * The test regression with k lagged differences on rows t = firstRow..n−2 of the differences
 * d_t = y_{t+1} − y_t; the lagged level y_t is the first column, so its coefficient is ρ.
 */
function adfRegression(
  series: Float64Array,
  differences: Float64Array,
  k: number,
  firstRow: number,
  regression: AdfResult['regression'],
): OlsFit {
  const rows = differences.length - firstRow;
  const response = differences.slice(firstRow);
  const level = series.slice(firstRow, firstRow + rows);
  const laggedDifferences = Array.from({ length: k }, (_, j) =>
    differences.slice(firstRow - j - 1, firstRow - j - 1 + rows),
  );
  const columns = [level, ...laggedDifferences, new Float64Array(rows).fill(1)];
  if (regression === 'trend') columns.push(Float64Array.from({ length: rows }, (_, t) => t + 1));
  return ols(response, columns);
}
