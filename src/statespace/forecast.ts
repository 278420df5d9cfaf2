// h-step forecasts of y = Xβ + η, η ~ ARMA, from the filter's state at the forecast origin:
// a_{n+1|n} and P_{n+1|n}, the last prediction of the filter (Durbin & Koopman 2012, §4.11,
// forecasting as filtering with the future observations missing; Harvey 1989, §3.5). From
// there the state moves on by a_{n+j+1} = T a_{n+j} and P_{n+j+1} = T P_{n+j} T' + R R', so
// the variances are exact given the data and the parameters at every horizon. The mean
// squared error has two parts: the process part and the coefficient part g_h' Var(β̂) g_h,
// where g_h = x_{n+h} − (Z T^{h−1} A_{n+1})' carries the regressors through the same filter,
// so the dependence of the predicted noise on β̂ is counted (Harvey 1989, §3.4.3). Without
// `integrate` the process part is σ² Z P_{n+h} Z'.
// With `integrate`, the model is for first differences and levels are forecast: the mean
// cumulates the difference forecasts, and the process variance is that of the sum
// S_h = Σ_{j≤h} Z α_{n+j}, carried as one more state element (the level in the state of an
// ARIMA model, Durbin & Koopman 2012, §3.4): x_j = (α_{n+j}, S_{j−1}) with transition
// [[T, 0], [Z, 1]], started at (a_{n+1}, 0) with covariance blockdiag(P_{n+1|n}, 0). Its
// covariance is kept as three blocks, P_{n+j}, c_j = Cov(α_{n+j}, S_{j−1}) and
// s_j = Var(S_{j−1}), which step as
//   s_{j+1} = s_j + 2 Z c_j + Z P_{n+j} Z',   c_{j+1} = T (c_j + P_{n+j} Z'),
// so Var(S_h | data) = σ² s_{h+1}, the origin's uncertainty included. The same state serves a
// series with missing levels: the gap filter leaves the α part of its last prediction, and the
// last level is observed, so the running sum starts afresh at the origin (gapFilter.ts).
// A model for seasonal differences (1 − B^s)w builds each level on the one a year before,
// w_{n+h} = w_{n+h−s} + Δ_s w_{n+h}, so the sums run per season: season c = (h − 1) mod s
// collects the forecast changes at h ≡ c + 1 (mod s) on top of the last level of its season.
// Each sum is one more state element like the one above, with its own c_j and s_j; only
// changes of one season are ever added up, so the sums' covariances with each other are never
// needed. With one season this is exactly the first-difference case. Where the last level of
// a season is missing, its sum starts from the filtered sum of the changes since that season's
// last observed level (`pending`, from the gap filter), with its covariance with the state.

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

/** Levels forecast from differences: first (period 1) or seasonal (period s). */
export interface Integration {
  /** 1 for first differences, s for seasonal differences. */
  period: number;
  /** The last observed level of each season, oldest season first: for period 1 the last level, for s the levels at n − s + 1..n when all are observed. */
  lastLevels: ArrayLike<number>;
  /** Where a season's last level is missing: the filtered sums of its unobserved changes since its last observed level. */
  pending?: PendingChanges;
}

/** The origin's filtered sums of each season's changes not yet seen in a level (all zero when every season's last level is observed). */
export interface PendingChanges {
  /** Per filtered column (y first, then each regressor), the sums by season (length `period` each). */
  sums: readonly Float64Array[];
  /** Per season, the regressors summed over those changes, season c at [c·k, (c+1)·k). */
  regressorTotals: Float64Array;
  /** Cov(α_{n+1}, sum_c) / σ², season c at [c·r, (c+1)·r). */
  cross: Float64Array;
  /** Var(sum_c) / σ² by season. */
  variance: Float64Array;
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
 * With `integrate.lastLevel`, moments are for the level y_n + Σ_{j ≤ h} Δy_{n+j}; with an
 * `Integration` of period s, for the level w_{n+h} built from seasonal differences.
 */
export function forecastRegressionArma(
  input: ForecastInput,
  futureRows: readonly ArrayLike<number>[],
  integrate?: { lastLevel: number } | Integration,
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

  // P_{n+j} / σ², and for `integrate` per season c_j and s_j (also / σ²), updated in place.
  const cov = input.finalCovariance.slice();
  const product = new Float64Array(r * r);
  const sums = integrate === undefined ? undefined : startSums(integrate, input.beta, r, k);
  const period = sums?.period ?? 1;

  const mean = new Float64Array(horizon);
  const seProcess = new Float64Array(horizon);
  const seTotal = new Float64Array(horizon);
  let g: Float64Array = new Float64Array(k);
  for (let h = 0; h < horizon; h++) {
    const row = futureRows[h];
    const season = h % period;
    if (sums !== undefined) g = sums.g.subarray(season * k, (season + 1) * k);
    let step = noise[0];
    for (let c = 0; c < k; c++) {
      step += row[c] * input.beta[c];
      const gc = row[c] - regressorStates[c][0];
      g[c] = sums !== undefined ? g[c] + gc : gc;
    }
    let processVariance = cov[0];
    if (sums === undefined) {
      mean[h] = step;
    } else {
      sums.level[season] += step;
      mean[h] = sums.level[season];
      const sumCross = sums.cross.subarray(season * r, (season + 1) * r);
      sums.variance[season] += 2 * sumCross[0] + cov[0];
      processVariance = sums.variance[season];
      for (let i = 0; i < r; i++) sumCross[i] += cov[i * r];
      for (let c = 0; c < period; c++) advance(sums.cross.subarray(c * r, (c + 1) * r), phi, r);
    }
    processVariance *= input.sigma2;
    let coefficientVariance = 0;
    for (let a = 0; a < k; a++) for (let b = 0; b < k; b++) coefficientVariance += g[a] * input.covBeta[a * k + b] * g[b];
    seProcess[h] = Math.sqrt(processVariance);
    seTotal[h] = Math.sqrt(processVariance + coefficientVariance);
    advance(noise, phi, r);
    for (const state of regressorStates) advance(state, phi, r);
    propagate(cov, product, phi, rvec, r);
  }
  return { mean, seProcess, seTotal };
}

/** Per season: the level so far, the coefficient gradient g, c_j and s_j (/ σ²). */
interface SeasonSums {
  period: number;
  level: Float64Array;
  g: Float64Array;
  cross: Float64Array;
  variance: Float64Array;
}

/** The sums at the origin: each season's last level, plus what its pending changes add when some are missing. */
function startSums(integrate: { lastLevel: number } | Integration, beta: ArrayLike<number>, r: number, k: number): SeasonSums {
  const { period, lastLevels, pending } = 'lastLevel' in integrate ? { period: 1, lastLevels: [integrate.lastLevel], pending: undefined } : integrate;
  if (lastLevels.length !== period) throw new RangeError(`forecastRegressionArma: ${period} last levels needed, got ${lastLevels.length}`);
  const sums: SeasonSums = {
    period,
    level: Float64Array.from(lastLevels),
    g: new Float64Array(period * k),
    cross: new Float64Array(period * r),
    variance: new Float64Array(period),
  };
  if (pending === undefined) return sums;
  // The pending changes' mean: x̄'β + (ū_y − Σ β_c ū_{x_c}); their gradient in β: x̄ − ū_x.
  for (let season = 0; season < period; season++) {
    let add = pending.sums[0][season];
    for (let c = 0; c < k; c++) {
      const total = pending.regressorTotals[season * k + c];
      const filtered = pending.sums[c + 1][season];
      add += beta[c] * (total - filtered);
      sums.g[season * k + c] = total - filtered;
    }
    sums.level[season] += add;
  }
  sums.cross.set(pending.cross);
  sums.variance.set(pending.variance);
  return sums;
}

/** s ← T s for the companion-form T. */
function advance(state: Float64Array, phi: Float64Array, r: number): void {
  const s0 = state[0];
  for (let i = 0; i < r; i++) state[i] = phi[i] * s0 + (i + 1 < r ? state[i + 1] : 0);
}

/**
 * P ← T P T' + R R' in place for the companion-form T, O(r²): (T P)_{ij} = φ_i P_{1j} + P_{i+1,j}
 * and (M T')_{ij} = M_{i1} φ_j + M_{i,j+1}. `product` (r² numbers) holds M = T P.
 */
function propagate(cov: Float64Array, product: Float64Array, phi: Float64Array, rvec: Float64Array, r: number): void {
  for (let i = 0; i < r; i++) {
    for (let j = 0; j < r; j++) product[i * r + j] = phi[i] * cov[j] + (i + 1 < r ? cov[(i + 1) * r + j] : 0);
  }
  for (let i = 0; i < r; i++) {
    for (let j = 0; j < r; j++) {
      cov[i * r + j] = product[i * r] * phi[j] + (j + 1 < r ? product[i * r + j + 1] : 0) + rvec[i] * rvec[j];
    }
  }
}
