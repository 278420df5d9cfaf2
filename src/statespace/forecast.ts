// h-step forecasts of y = Xβ + η, η ~ ARMA, from the filter's last predicted state
// (Durbin & Koopman 2012, §4.11; Harvey 1989, §3.5). The mean squared error has two parts:
// the process part σ² Z P_{n+h} Z' and the coefficient part g_h' Var(β̂) g_h, where
// g_h = x_{n+h} − (Z T^{h−1} A_{n+1})' carries the regressors through the same filter, so the
// dependence of the predicted noise on β̂ is counted (Harvey 1989, §3.4.3).
// With `integrate`, the model is for first differences and levels are forecast: the mean
// cumulates the difference forecasts and the process variance is σ² Σ_{j<h} (Σ_{i≤j} ψ_i)²
// from the integrated ψ-weights (Box, Jenkins & Reinsel 2008, §5.1.1). That is the
// steady-state value; it ignores the small extra uncertainty of the state at the origin,
// which matters only when an MA root sits near the unit circle.

export interface ForecastInput {
  ar: ArrayLike<number>;
  ma: ArrayLike<number>;
  beta: ArrayLike<number>;
  /** Var(β̂), k×k row-major. */
  covBeta: ArrayLike<number>;
  sigma2: number;
  /** Predicted states a_{n+1|n}: y first, then each regressor column. */
  finalState: readonly Float64Array[];
  /** P_{n+1|n} / σ², r×r row-major. */
  finalCovariance: Float64Array;
}

export interface ForecastMoments {
  mean: Float64Array;
  /** Standard error from the ARMA process alone. */
  seProcess: Float64Array;
  /** Standard error with the coefficient uncertainty added. */
  seTotal: Float64Array;
}

/**
 * Forecasts for h = 1..H given the regressor rows `futureRows[h − 1]` (each of length k).
 * With `integrate.lastLevel`, moments are for the level y_n + Σ_{j ≤ h} Δy_{n+j}.
 */
export function forecastRegressionArma(
  input: ForecastInput,
  futureRows: readonly ArrayLike<number>[],
  integrate?: { lastLevel: number },
): ForecastMoments {
  const horizon = futureRows.length;
  const r = input.finalCovariance.length === 0 ? 1 : Math.round(Math.sqrt(input.finalCovariance.length));
  const k = input.beta.length;
  const phi = new Float64Array(r);
  const rvec = new Float64Array(r);
  for (let i = 0; i < input.ar.length; i++) phi[i] = input.ar[i];
  rvec[0] = 1;
  for (let j = 0; j < input.ma.length; j++) rvec[j + 1] = input.ma[j];

  // Noise state a_η = a_y − Σ β_c a_{x_c}; the regressor states travel alongside for g_h.
  const noise = input.finalState[0].slice();
  const regressorStates = input.finalState.slice(1).map((s) => s.slice());
  for (let c = 0; c < k; c++) for (let i = 0; i < r; i++) noise[i] -= input.beta[c] * regressorStates[c][i];

  const transition = new Float64Array(r * r);
  for (let i = 0; i < r; i++) {
    transition[i * r] = phi[i];
    if (i + 1 < r) transition[i * r + i + 1] = 1;
  }
  let cov: Float64Array = input.finalCovariance.slice();
  const integratedPsi = integrate ? cumulativeSums(psiWeights(input.ar, input.ma, horizon)) : undefined;
  let integratedVariance = 0;

  const mean = new Float64Array(horizon);
  const seProcess = new Float64Array(horizon);
  const seTotal = new Float64Array(horizon);
  const g = new Float64Array(k);
  let level = integrate?.lastLevel ?? 0;
  for (let h = 0; h < horizon; h++) {
    const row = futureRows[h];
    let step = noise[0];
    for (let c = 0; c < k; c++) {
      step += row[c] * input.beta[c];
      const gc = row[c] - regressorStates[c][0];
      g[c] = integrate ? g[c] + gc : gc;
    }
    level = integrate ? level + step : step;
    mean[h] = level;
    let processVariance = input.sigma2 * cov[0];
    if (integratedPsi !== undefined) {
      integratedVariance += integratedPsi[h] * integratedPsi[h];
      processVariance = input.sigma2 * integratedVariance;
    }
    let coefficientVariance = 0;
    for (let a = 0; a < k; a++) for (let b = 0; b < k; b++) coefficientVariance += g[a] * input.covBeta[a * k + b] * g[b];
    seProcess[h] = Math.sqrt(processVariance);
    seTotal[h] = Math.sqrt(processVariance + coefficientVariance);
    advance(noise, phi, r);
    for (const state of regressorStates) advance(state, phi, r);
    if (integratedPsi === undefined) cov = propagate(cov, transition, rvec, r);
  }
  return { mean, seProcess, seTotal };
}

/** ψ-weights of the MA(∞) form: ψ₀ = 1, ψ_j = θ_j + Σ_{i=1}^{min(j,p)} φ_i ψ_{j−i}. */
export function psiWeights(ar: ArrayLike<number>, ma: ArrayLike<number>, count: number): Float64Array {
  const psi = new Float64Array(count);
  for (let j = 0; j < count; j++) {
    let value = j === 0 ? 1 : j <= ma.length ? ma[j - 1] : 0;
    for (let i = 1; i <= Math.min(j, ar.length); i++) value += ar[i - 1] * psi[j - i];
    psi[j] = value;
  }
  return psi;
}

function cumulativeSums(values: Float64Array): Float64Array {
  let sum = 0;
  return values.map((v) => (sum += v));
}

/** s ← T s for the companion-form T. */
function advance(state: Float64Array, phi: Float64Array, r: number): void {
  const s0 = state[0];
  for (let i = 0; i < r; i++) state[i] = phi[i] * s0 + (i + 1 < r ? state[i + 1] : 0);
}

/** A P A' + b b', dense. */
function propagate(cov: Float64Array, a: Float64Array, b: Float64Array, dim: number): Float64Array {
  const ap = new Float64Array(dim * dim);
  for (let i = 0; i < dim; i++) {
    for (let j = 0; j < dim; j++) {
      let sum = 0;
      for (let m = 0; m < dim; m++) sum += a[i * dim + m] * cov[m * dim + j];
      ap[i * dim + j] = sum;
    }
  }
  const out = new Float64Array(dim * dim);
  for (let i = 0; i < dim; i++) {
    for (let j = 0; j < dim; j++) {
      let sum = b[i] * b[j];
      for (let m = 0; m < dim; m++) sum += ap[i * dim + m] * a[j * dim + m];
      out[i * dim + j] = sum;
    }
  }
  return out;
}
