// Plain-language wording of the residual checks, for a reviewer rather than a statistician.
import type { JarqueBeraResult, LjungBoxResult } from './types.js';
import { formatPValue } from '../base/pValueText.js';

export const residualFindingText = {
  ljungBox(result: LjungBoxResult | null, significance: number): string {
    if (result === null) return 'Too few observations to test the forecast errors for leftover pattern.';
    const p = formatPValue(result);
    return result.p_value < significance
      ? `The one-step forecast errors still show a pattern over ${result.lags} lags (${p}): the model has not captured all of the series' memory, so its intervals may be too narrow or too wide.`
      : `No leftover pattern in the one-step forecast errors over ${result.lags} lags (${p}).`;
  },
  acf(outside: readonly number[], lags: number): string {
    if (outside.length === 0) return `All ${lags} error autocorrelations lie inside the ±1.96/√n bounds.`;
    const which = outside.join(', ');
    return `${outside.length} of ${lags} error autocorrelations lie outside the ±1.96/√n bounds (lag ${which}); about one in twenty is expected by chance.`;
  },
  normality(result: JarqueBeraResult, significance: number): string {
    const p = formatPValue(result);
    return result.p_value < significance
      ? `The forecast errors are not bell-shaped (${p}; skewness ${result.skewness.toFixed(2)}, kurtosis ${result.kurtosis.toFixed(2)}): the normal-based intervals may misstate the chance of large surprises.`
      : `The forecast errors are consistent with a bell shape (${p}).`;
  },
};
