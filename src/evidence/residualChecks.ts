// Residual checks for one fitted model: are the one-step prediction errors white (Ljung-Box
// on df = lags − p − q − P − Q, residual ACF against ±1.96/√n) and roughly normal (Jarque-Bera)?
// A failed check becomes a finding with plain-language text, never a silent number. Seasonal
// series (period s > 1) are tested over at least two cycles of lags (defaultAcfLags.ts).
import { defaultAcfLags } from './defaultAcfLags.js';
import { jarqueBera } from './jarqueBera.js';
import { ljungBox } from './ljungBox.js';
import { residualFindingText } from './residualFindingText.js';
import { residualAcf } from './residualAcf.js';
import type { AcfResult, JarqueBeraResult, LjungBoxResult } from './types.js';

export type ResidualCheckName = 'ljung_box' | 'acf' | 'normality';

export interface ResidualFinding {
  check: ResidualCheckName;
  /** True when the check failed at the significance level. */
  flagged: boolean;
  text: string;
}

export interface ResidualChecks {
  /** Residuals used (missing periods left out). */
  n: number;
  /** Observations per year when the lags were chosen for a seasonal series; absent for period 1. */
  period?: number;
  /** null when the series is too short for any degrees of freedom after p + q. */
  ljung_box: LjungBoxResult | null;
  acf: AcfResult;
  /** Lags whose autocorrelation lies outside the ±1.96/√n bounds. */
  acf_outside: number[];
  jarque_bera: JarqueBeraResult;
  findings: ResidualFinding[];
}

/** The seasonal side of a fit: observations per year and the seasonal ARMA orders. */
export interface SeasonalOrders {
  period: number;
  P?: number;
  Q?: number;
}

/**
 * Checks the one-step prediction errors of an ARMA(p, q) fit, with a seasonal ARMA(P, Q)
 * factor when `seasonal` says so. Ljung-Box uses `defaultAcfLags(n, period)` lags
 * (min(10, n/5) for period 1), raised to p + q + P + Q + 1 where that is fewer (so df ≥ 1)
 * if n allows.
 */
export function residualChecks(
  residuals: ArrayLike<number>,
  p: number,
  q: number,
  significance: number,
  seasonal: SeasonalOrders = { period: 1 },
): ResidualChecks {
  const observed = Array.from(residuals).filter((v) => Number.isFinite(v));
  const n = observed.length;
  const { period } = seasonal;
  const P = seasonal.P ?? 0;
  const Q = seasonal.Q ?? 0;
  const orders = p + q + P + Q;
  const lags = Math.max(defaultAcfLags(n, period), Math.min(orders + 1, n - 1));
  const ljung = lags - orders >= 1 && lags < n ? ljungBox(observed, { lags, p, q, P, Q }) : null;
  const acf = residualAcf(observed, { lags: Math.max(1, Math.min(lags, n - 1)) });
  const outside = acf.acf.flatMap((value, i) => (Math.abs(value) > acf.bound ? [acf.lag[i]] : []));
  const normality = jarqueBera(observed);
  const findings: ResidualFinding[] = [
    {
      check: 'ljung_box',
      flagged: ljung !== null && ljung.p_value < significance,
      text: residualFindingText.ljungBox(ljung, significance),
    },
    { check: 'acf', flagged: outside.length > Math.max(1, Math.floor(0.05 * acf.lag.length)), text: residualFindingText.acf(outside, acf.lag.length) },
    {
      check: 'normality',
      flagged: normality.p_value < significance,
      text: residualFindingText.normality(normality, significance),
    },
  ];
  return { n, ...(period > 1 ? { period } : {}), ljung_box: ljung, acf, acf_outside: outside, jarque_bera: normality, findings };
}
