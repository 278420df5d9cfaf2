// Residual checks for one fitted model: are the one-step prediction errors white (Ljung-Box
// on df = lags − p − q, residual ACF against ±1.96/√n) and roughly normal (Jarque-Bera)?
// A failed check becomes a finding with plain-language text, never a silent number.
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
  /** null when the series is too short for any degrees of freedom after p + q. */
  ljung_box: LjungBoxResult | null;
  acf: AcfResult;
  /** Lags whose autocorrelation lies outside the ±1.96/√n bounds. */
  acf_outside: number[];
  jarque_bera: JarqueBeraResult;
  findings: ResidualFinding[];
}

/**
 * Checks the one-step prediction errors of an ARMA(p, q) fit. Ljung-Box uses
 * min(10, n/5) lags, raised to p + q + 1 where that is fewer (so df ≥ 1) if n allows.
 */
export function residualChecks(residuals: ArrayLike<number>, p: number, q: number, significance: number): ResidualChecks {
  const observed = Array.from(residuals).filter((v) => Number.isFinite(v));
  const n = observed.length;
  const lags = Math.max(defaultAcfLags(n), Math.min(p + q + 1, n - 1));
  const ljung = lags - p - q >= 1 && lags < n ? ljungBox(observed, { lags, p, q }) : null;
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
  return { n, ljung_box: ljung, acf, acf_outside: outside, jarque_bera: normality, findings };
}
