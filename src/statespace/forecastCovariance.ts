// The joint distribution of the forecast errors across a window of horizons, for figures that
// add forecasts up (a year's total): the errors of neighbouring horizons share every shock
// since the origin, so their covariances are far from zero, most of all for a trend that
// wanders. Same state, same parameters and same treatment of the estimated regression
// coefficients as forecast.ts, so the diagonal is exactly the forecast variances there
// (test/statespace/forecastCovariance.test.ts checks it); written in the dense augmented form
// rather than forecast.ts's structured recursions, so the two also check each other.
//
// The state x_h = (α_{n+h}, S^0 … S^{s−1}) holds the ARMA state and, for a model of
// differences, one running sum of forecast changes per season (one for first differences, s
// for seasonal differences; none for a model of levels). The level's error at h is Z_h x_h
// with Z_h picking α's first element and the sum of h's season c = (h − 1) mod s; the step
// to h + 1 adds Z α_{n+h} to S^c and moves α by T, x_{h+1} = A_h x_h + (R ε, 0), started at
// P_{n+1|n} with the sums' covariances from the gap filter when some seasons' last levels are
// missing (zero otherwise). The process covariance of two horizons i ≤ j is then
//   Cov(e_i, e_j) = σ² Z_j A_{j−1} ⋯ A_i P_i Z_i'
// (Durbin & Koopman 2012, §4.11: forecasting is filtering with the future missing, and the
// state error at j is A_{j−1} ⋯ A_i times that at i plus shocks after i, which are independent
// of it). For a model of levels this is σ² Z T^{j−i} P_{n+i} Z'. The coefficient part is
// g_i' Var(β̂) g_j with the gradients g_h of forecast.ts (the regressors carried through the
// same filter; Harvey 1989, §3.4.3), the same first-order treatment as the variances.
import type { ForecastInput, Integration } from './forecast.js';

export interface CovarianceWindow {
  /** First and last horizon of the window, 1-based, first ≤ last. */
  first: number;
  last: number;
}

export interface ForecastCovariance extends CovarianceWindow {
  /** Cov(e_i, e_j) of the ARMA process alone (σ² included), window × window, row-major. */
  process: Float64Array;
  /** The same with the coefficient part g_i' Var(β̂) g_j added. */
  total: Float64Array;
}

export interface CovarianceOptions {
  /** Levels forecast from differences, as for forecastRegressionArma. */
  integrate?: { lastLevel: number } | Integration;
  /**
   * Cov(sum_c, sum_d) / σ² of the seasons' pending changes, period × period, row-major, by
   * forecast season. Needed when two or more seasons have pending changes: the variances in
   * `Integration.pending` leave out how the seasons' unseen changes move together.
   */
  pendingCovariance?: Float64Array;
}

/** The forecast-error covariance of the levels at horizons window.first..window.last, given the regressor rows for h = 1..window.last. */
export function forecastCovariance(input: ForecastInput, futureRows: readonly ArrayLike<number>[], window: CovarianceWindow, options: CovarianceOptions = {}): ForecastCovariance {
  const { first, last } = window;
  if (!(Number.isInteger(first) && Number.isInteger(last) && first >= 1 && last >= first)) throw new RangeError(`forecastCovariance: a window of horizons 1 ≤ first ≤ last, got ${first}..${last}`);
  if (futureRows.length < last) throw new RangeError(`forecastCovariance: ${last} regressor rows needed, got ${futureRows.length}`);
  const r = Math.round(Math.sqrt(input.finalCovariance.length));
  const k = input.beta.length;
  const integration = integrationOf(options.integrate);
  const period = integration?.period ?? 1;
  const sums = integration === undefined ? 0 : period;
  const d = r + sums;
  const phi = new Float64Array(r);
  const rvec = new Float64Array(r);
  for (let i = 0; i < input.ar.length; i++) phi[i] = input.ar[i];
  rvec[0] = 1;
  for (let j = 0; j < input.ma.length; j++) rvec[j + 1] = input.ma[j];

  const cov = startingCovariance(input.finalCovariance, r, d, integration, options.pendingCovariance);
  const regressorStates = input.finalState.slice(1).map((state) => state.slice());
  // Per season, the gradient of the level in β so far (forecast.ts's g): the pending changes' own first.
  const seasonGradient = new Float64Array(period * k);
  const pending = integration?.pending;
  if (pending !== undefined) {
    for (let c = 0; c < period * k; c++) seasonGradient[c] = pending.regressorTotals[c] - pending.sums[(c % k) + 1][Math.floor(c / k)];
  }

  const size = last - first + 1;
  const process = new Float64Array(size * size);
  const gradients: Float64Array[] = [];
  // For each horizon i of the window reached so far: A_{h−1} ⋯ A_i P_i Z_i', carried to the current h.
  const carried: Float64Array[] = [];
  const line = new Float64Array(d);
  for (let h = 1; h <= last; h++) {
    const season = (h - 1) % period;
    const sumAt = integration === undefined ? -1 : r + season;
    const row = futureRows[h - 1];
    const gradient = new Float64Array(k);
    for (let c = 0; c < k; c++) {
      const step = row[c] - regressorStates[c][0];
      if (integration === undefined) gradient[c] = step;
      else gradient[c] = seasonGradient[season * k + c] += step;
    }
    if (h >= first) {
      const v = new Float64Array(d);
      for (let i = 0; i < d; i++) v[i] = cov[i * d] + (sumAt < 0 ? 0 : cov[i * d + sumAt]);
      carried.push(v);
      gradients.push(gradient);
      const j = h - first;
      carried.forEach((vi, i) => {
        const value = input.sigma2 * (vi[0] + (sumAt < 0 ? 0 : vi[sumAt]));
        process[i * size + j] = value;
        process[j * size + i] = value;
      });
    }
    for (const v of carried) step(v, phi, r, sumAt);
    propagate(cov, line, phi, rvec, r, d, sumAt);
    for (const state of regressorStates) step(state, phi, r, -1);
  }

  const total = process.slice();
  for (let i = 0; i < size; i++) {
    for (let j = 0; j < size; j++) {
      let part = 0;
      for (let a = 0; a < k; a++) for (let b = 0; b < k; b++) part += gradients[i][a] * input.covBeta[a * k + b] * gradients[j][b];
      total[i * size + j] += part;
    }
  }
  return { first, last, process, total };
}

function integrationOf(integrate: CovarianceOptions['integrate']): Integration | undefined {
  if (integrate === undefined) return undefined;
  return 'lastLevel' in integrate ? { period: 1, lastLevels: [integrate.lastLevel] } : integrate;
}

/** P_{n+1|n} / σ² with the sums' block: zero, or the pending changes' covariances. */
function startingCovariance(finalCovariance: Float64Array, r: number, d: number, integration: Integration | undefined, pendingCovariance: Float64Array | undefined): Float64Array {
  const cov = new Float64Array(d * d);
  for (let i = 0; i < r; i++) for (let j = 0; j < r; j++) cov[i * d + j] = finalCovariance[i * r + j];
  const pending = integration?.pending;
  if (integration === undefined || pending === undefined) return cov;
  const { period } = integration;
  const open = Array.from(pending.variance).filter((variance) => variance !== 0).length;
  if (open > 1 && pendingCovariance === undefined) throw new Error('forecastCovariance: several seasons have pending changes, so their covariances are needed');
  for (let c = 0; c < period; c++) {
    for (let i = 0; i < r; i++) {
      cov[i * d + r + c] = pending.cross[c * r + i];
      cov[(r + c) * d + i] = pending.cross[c * r + i];
    }
    for (let e = 0; e < period; e++) {
      cov[(r + c) * d + r + e] = pendingCovariance === undefined ? (c === e ? pending.variance[c] : 0) : pendingCovariance[c * period + e];
    }
  }
  return cov;
}

/** x ← A x without noise: α by the companion-form T, and the season's sum (index `sumAt`, if any) gains the old α₀. */
function step(x: Float64Array, phi: Float64Array, r: number, sumAt: number): void {
  const a0 = x[0];
  for (let i = 0; i < r; i++) x[i] = phi[i] * a0 + (i + 1 < r ? x[i + 1] : 0);
  if (sumAt >= 0) x[sumAt] += a0;
}

/** P ← A P A' + (R R' in the α block), rows then columns, in place; `line` holds one old row or column. */
function propagate(cov: Float64Array, line: Float64Array, phi: Float64Array, rvec: Float64Array, r: number, d: number, sumAt: number): void {
  // Rows: (A P)_i = φ_i P_0 + P_{i+1} for α rows; the sum row gains P_0.
  line.set(cov.subarray(0, d));
  for (let i = 0; i < r; i++) for (let j = 0; j < d; j++) cov[i * d + j] = phi[i] * line[j] + (i + 1 < r ? cov[(i + 1) * d + j] : 0);
  if (sumAt >= 0) for (let j = 0; j < d; j++) cov[sumAt * d + j] += line[j];
  // Columns likewise, from the old first column of A P.
  for (let i = 0; i < d; i++) line[i] = cov[i * d];
  for (let i = 0; i < d; i++) for (let j = 0; j < r; j++) cov[i * d + j] = line[i] * phi[j] + (j + 1 < r ? cov[i * d + j + 1] : 0);
  if (sumAt >= 0) for (let i = 0; i < d; i++) cov[i * d + sumAt] += line[i];
  for (let i = 0; i < r; i++) for (let j = 0; j < r; j++) cov[i * d + j] += rvec[i] * rvec[j];
}
