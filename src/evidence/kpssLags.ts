// Data-dependent lag truncation for the Bartlett-kernel long-run variance of the KPSS test:
// Hobijn, Franses & Ooms (2004), §3, applying the Newey & West (1994) plug-in rule for the
// Bartlett kernel, with its pilot truncation n^{2/9} and constant 1.1447.
import { autocovariances } from '../linalg/autocovariances.js';

/**
 * Lag truncation floor(γ̂ n^{1/3}) with γ̂ = 1.1447 (ŝ⁽¹⁾/ŝ⁽⁰⁾)^{2/3}, where
 * ŝ⁽⁰⁾ = γ₀ + 2 Σ γ_j and ŝ⁽¹⁾ = 2 Σ j γ_j over j = 1..floor(n^{2/9}); capped at n − 1.
 */
export function hobijnLags(residuals: Float64Array): number {
  const n = residuals.length;
  const pilot = Math.floor(Math.pow(n, 2 / 9));
  if (pilot >= n) throw new Error('hobijnLags needs more observations than its pilot truncation');
  const gamma = autocovariances(residuals, pilot);
  let s0 = gamma[0];
  let s1 = 0;
  for (let j = 1; j <= pilot; j++) {
    s0 += 2 * gamma[j];
    s1 += 2 * j * gamma[j];
  }
  const ratio = s1 / s0;
  const scale = 1.1447 * Math.cbrt(ratio * ratio);
  return Math.min(Math.floor(scale * Math.cbrt(n)), n - 1);
}
