// KPSS test, Kwiatkowski, Phillips, Schmidt & Shin (1992): the null is stationarity around a
// level (regression on a constant) or around a linear trend (constant + trend). The statistic
// is η = n⁻² Σ S_t² / s²(l), with S_t the partial sums of the regression residuals and s²(l)
// the Bartlett-weighted long-run variance of §2, w(j, l) = 1 − j/(l + 1).
import { ols } from '../linalg/ols.js';
import { autocovariances, demean } from '../linalg/autocovariances.js';
import { finiteSeries } from './finiteSeries.js';
import { hobijnLags } from './kpssLags.js';
import { kpssCritical, kpssPValue } from './kpssTable.js';
import { schwertLags } from './schwertLags.js';
import type { KpssLagRule, KpssResult } from './types.js';

export interface KpssOptions {
  /** 'level' (constant only) or 'trend' (constant + linear trend); default 'trend'. */
  regression?: KpssResult['regression'];
  /** 'auto' (Hobijn et al. 2004, default) or 'fixed' (ceil(12(n/100)^{1/4})). */
  lagRule?: KpssLagRule;
  /** An explicit lag truncation; overrides `lagRule` and is reported as 'fixed'. */
  lags?: number;
}

/** KPSS statistic, lag truncation and Table 1 p-value for the series `y`. */
export function kpssTest(y: ArrayLike<number>, options: KpssOptions = {}): KpssResult {
  const regression = options.regression ?? 'trend';
  const series = finiteSeries(y, 'kpssTest');
  const n = series.length;
  if (n < 4) throw new Error('kpssTest needs at least 4 observations');

  const residuals = regression === 'level' ? demean(series) : trendResiduals(series);
  const lagRule: KpssLagRule = options.lags !== undefined ? 'fixed' : (options.lagRule ?? 'auto');
  const lags = chooseLags(residuals, lagRule, options.lags);

  const gamma = autocovariances(residuals, lags);
  let longRunVariance = gamma[0];
  for (let j = 1; j <= lags; j++) longRunVariance += 2 * (1 - j / (lags + 1)) * gamma[j];
  if (!(longRunVariance > 0)) {
    throw new Error('kpssTest needs a series that varies around its fitted level or trend');
  }

  let partialSum = 0;
  let sumOfSquares = 0;
  for (let t = 0; t < n; t++) {
    partialSum += residuals[t];
    sumOfSquares += partialSum * partialSum;
  }
  const stat = sumOfSquares / (n * n) / longRunVariance;
  return {
    stat,
    lags,
    ...kpssPValue(stat, regression),
    critical: kpssCritical(regression),
    regression,
    lag_rule: lagRule,
  };
}

function trendResiduals(series: Float64Array): Float64Array {
  const ones = new Float64Array(series.length).fill(1);
  const time = Float64Array.from({ length: series.length }, (_, t) => t + 1);
  return ols(series, [ones, time]).residuals;
}

function chooseLags(residuals: Float64Array, rule: KpssLagRule, given: number | undefined): number {
  const n = residuals.length;
  if (given !== undefined) {
    if (!Number.isInteger(given) || given < 0) throw new Error('kpssTest needs whole, non-negative lags');
    if (given >= n) throw new Error('kpssTest needs more observations than lags');
    return given;
  }
  return rule === 'auto' ? hobijnLags(residuals) : Math.min(schwertLags(n), n - 1);
}
