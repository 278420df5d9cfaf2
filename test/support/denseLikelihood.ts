// The exact Gaussian likelihood of a regression with ARMA errors computed directly from the
// covariance matrix of the observations: another route to the numbers the Kalman filter
// gives (common practice), for checking it.
import { CholeskyDecomposition, Matrix, solve } from 'ml-matrix';

/**
 * Autocovariances γ(0..maxLag) of η_t = Σ φ_i η_{t−i} + ε_t + Σ θ_j ε_{t−j} with σ² = 1,
 * exactly: the third method of Brockwell & Davis (1991), Time Series: Theory and Methods,
 * §3.3, eqs. (3.3.8)–(3.3.9). With θ₀ = 1 and ψ the MA(∞) weights,
 *   γ(k) − Σ_i φ_i γ(|k − i|) = Σ_{j=k}^{q} θ_j ψ_{j−k},
 * solved as a linear system for γ(0..p), then run forward for the higher lags.
 */
export function armaAutocovariance(ar: readonly number[], ma: readonly number[], maxLag: number): number[] {
  const p = ar.length;
  const q = ma.length;
  const theta = [1, ...ma];
  const psi: number[] = [];
  for (let j = 0; j <= q; j++) {
    let value = theta[j];
    for (let i = 1; i <= Math.min(j, p); i++) value += ar[i - 1] * psi[j - i];
    psi.push(value);
  }
  const movingAverageSide = (k: number): number => {
    let sum = 0;
    for (let j = k; j <= q; j++) sum += theta[j] * psi[j - k];
    return sum;
  };
  const system = Matrix.eye(p + 1);
  for (let k = 0; k <= p; k++) {
    for (let i = 1; i <= p; i++) system.set(k, Math.abs(k - i), system.get(k, Math.abs(k - i)) - ar[i - 1]);
  }
  const rhs = Matrix.columnVector(Array.from({ length: p + 1 }, (_, k) => movingAverageSide(k)));
  const gamma = solve(system, rhs).getColumn(0);
  for (let k = p + 1; k <= maxLag; k++) {
    let value = movingAverageSide(k);
    for (let i = 1; i <= p; i++) value += ar[i - 1] * gamma[k - i];
    gamma.push(value);
  }
  return gamma.slice(0, maxLag + 1);
}

/** Covariance matrix of a stationary series observed at `times`, from its autocovariances. */
export function covarianceAtTimes(gamma: readonly number[], times: readonly number[]): Matrix {
  const sigma = new Matrix(times.length, times.length);
  times.forEach((s, i) => times.forEach((t, j) => sigma.set(i, j, gamma[Math.abs(s - t)])));
  return sigma;
}

/** Profile log-likelihood of z ~ N(Gβ, σ²Σ), β by GLS and σ² by ML, computed densely. */
export function denseProfileLoglik(z: number[], design: number[][], sigma: Matrix): number {
  const m = z.length;
  const chol = new CholeskyDecomposition(sigma);
  const x = new Matrix(design);
  const y = Matrix.columnVector(z);
  const sx = chol.solve(x);
  const beta = solve(x.transpose().mmul(sx), x.transpose().mmul(chol.solve(y)));
  const resid = y.sub(x.mmul(beta));
  const quad = resid.transpose().mmul(chol.solve(resid)).get(0, 0);
  let logDet = 0;
  const lower = chol.lowerTriangularMatrix;
  for (let i = 0; i < m; i++) logDet += 2 * Math.log(lower.get(i, i));
  return -0.5 * m * (Math.log((2 * Math.PI * quad) / m) + 1) - 0.5 * logDet;
}
