// ARMA(p,q) in state-space form, Harvey (1989) §3.2 / Durbin & Koopman (2012) §3.4:
//   η_t = Z α_t,  α_{t+1} = T α_t + R ε_{t+1},  ε ~ N(0, σ²)
// with state dimension r = max(p, q + 1), Z = e₁, T = [φ | I_{r−1} ; 0], R = (1, θ₁, …, θ_{r−1})'.
// The filter works with σ² = 1 (σ² is concentrated out), so P here is P/σ².

/** The pieces of the ARMA state-space form the filter needs (T is implied by `phi`). */
export interface ArmaStateSpace {
  /** State dimension max(p, q + 1). */
  readonly r: number;
  /** AR coefficients padded with zeros to length r. */
  readonly phi: Float64Array;
  /** (1, θ₁, …) padded with zeros to length r. */
  readonly rvec: Float64Array;
  /** Stationary initial covariance (r×r, row-major), scaled by 1/σ². */
  readonly p0: Float64Array;
}

export function stateDimension(p: number, q: number): number {
  return Math.max(p, q + 1);
}

/**
 * Builds the state-space form for AR coefficients `ar` and MA coefficients `ma`
 * (sign convention: η_t = Σ φ_i η_{t−i} + ε_t + Σ θ_j ε_{t−j}).
 */
export function toStateSpace(ar: ArrayLike<number>, ma: ArrayLike<number>): ArmaStateSpace {
  const r = stateDimension(ar.length, ma.length);
  const phi = new Float64Array(r);
  const rvec = new Float64Array(r);
  for (let i = 0; i < ar.length; i++) phi[i] = ar[i];
  rvec[0] = 1;
  for (let j = 0; j < ma.length; j++) rvec[j + 1] = ma[j];
  const p0 = new Float64Array(r * r);
  const scratch = new Float64Array(lyapunovScratchSize(r));
  stationaryCovariance(phi, rvec, r, p0, scratch);
  return { r, phi, rvec, p0 };
}

/** Scratch size `stationaryCovariance` needs for state dimension r. */
export function lyapunovScratchSize(r: number): number {
  const m = (r * (r + 1)) / 2;
  return m * (m + 1);
}

/**
 * Solves the discrete Lyapunov equation P = T P T' + R R' for the companion-form T by
 * Gaussian elimination over the r(r+1)/2 distinct entries of the symmetric P
 * (Gardner, Harvey & Phillips 1980, AS 154; Durbin & Koopman 2012, §5.6.2).
 * `scratch` must hold `lyapunovScratchSize(r)` numbers; nothing is allocated, so the
 * likelihood loop can call it. Returns false when the system is singular (a unit root).
 */
export function stationaryCovariance(
  phi: Float64Array,
  rvec: Float64Array,
  r: number,
  out: Float64Array,
  scratch: Float64Array,
): boolean {
  const m = (r * (r + 1)) / 2;
  const w = m + 1; // augmented row width
  // Row (i,j), i ≤ j: P_ij − Σ_{k,l} T_ik T_jl P_kl = R_i R_j, with T_ik = φ_i·[k = 0] + [k = i + 1].
  for (let i = 0; i < r; i++) {
    for (let j = i; j < r; j++) {
      const base = packedIndex(i, j, r) * w;
      for (let c = 0; c < w; c++) scratch[base + c] = 0;
      scratch[base + packedIndex(i, j, r)] = 1;
      addTerm(scratch, base, r, phi[i] * phi[j], 0, 0);
      if (j + 1 < r) addTerm(scratch, base, r, phi[i], 0, j + 1);
      if (i + 1 < r) addTerm(scratch, base, r, phi[j], i + 1, 0);
      if (i + 1 < r && j + 1 < r) addTerm(scratch, base, r, 1, i + 1, j + 1);
      scratch[base + m] = rvec[i] * rvec[j];
    }
  }
  for (let col = 0; col < m; col++) {
    let pivot = col;
    let best = Math.abs(scratch[col * w + col]);
    for (let row = col + 1; row < m; row++) {
      const value = Math.abs(scratch[row * w + col]);
      if (value > best) {
        best = value;
        pivot = row;
      }
    }
    if (best < 1e-12) return false;
    if (pivot !== col) {
      for (let c = col; c < w; c++) {
        const tmp = scratch[col * w + c];
        scratch[col * w + c] = scratch[pivot * w + c];
        scratch[pivot * w + c] = tmp;
      }
    }
    const diag = scratch[col * w + col];
    for (let row = col + 1; row < m; row++) {
      const factor = scratch[row * w + col] / diag;
      if (factor === 0) continue;
      for (let c = col; c < w; c++) scratch[row * w + c] -= factor * scratch[col * w + c];
    }
  }
  // Back-substitution, writing the solution into the augmented column.
  for (let row = m - 1; row >= 0; row--) {
    let sum = scratch[row * w + m];
    for (let c = row + 1; c < m; c++) sum -= scratch[row * w + c] * scratch[c * w + m];
    scratch[row * w + m] = sum / scratch[row * w + row];
  }
  for (let i = 0; i < r; i++) {
    for (let j = i; j < r; j++) {
      const value = scratch[packedIndex(i, j, r) * w + m];
      out[i * r + j] = value;
      out[j * r + i] = value;
    }
  }
  return true;
}

/** Position of P_ij (i ≤ j) among the packed upper-triangle unknowns. */
function packedIndex(i: number, j: number, r: number): number {
  return i * r - (i * (i - 1)) / 2 + (j - i);
}

function addTerm(scratch: Float64Array, base: number, r: number, coef: number, k: number, l: number): void {
  if (coef !== 0) scratch[base + packedIndex(Math.min(k, l), Math.max(k, l), r)] -= coef;
}

/** Scratch size `stationaryFirstColumn` needs. */
export function firstColumnScratchSize(p: number, r: number): number {
  return (p + 1) * (p + 2) + 2 * (r + 1);
}

/** Scratch size `stationaryCovarianceFromMoments` needs: the moments and a list of r positions. */
export function momentsScratchSize(p: number, r: number): number {
  return firstColumnScratchSize(p, r) + r;
}

/**
 * γ(0..r), the ARMA autocovariances for σ² = 1, and ψ_0..ψ_r, the MA(∞) weights, into
 * `scratch` at `momentsAt(p, r)`: γ from the (p+1)-equation system of Brockwell & Davis (1991),
 * §3.3, eq. (3.3.8), run forward beyond lag p. Returns false when the AR part has a unit root.
 */
function armaMoments(phi: Float64Array, rvec: Float64Array, p: number, r: number, scratch: Float64Array): boolean {
  const w = p + 2;
  const { psiAt, gammaAt } = momentsAt(p, r);
  // ψ_0..ψ_r: ψ_j = θ_j + Σ_{i=1}^{min(j,p)} φ_i ψ_{j−i}; rvec holds (1, θ₁, …) padded to r.
  for (let j = 0; j <= r; j++) {
    let value = j < r ? rvec[j] : 0;
    for (let i = 1; i <= Math.min(j, p); i++) value += phi[i - 1] * scratch[psiAt + j - i];
    scratch[psiAt + j] = value;
  }
  // γ(k) − Σ_j φ_j γ(|k − j|) = Σ_{j≥k} θ_j ψ_{j−k}, k = 0..p, unknowns γ(0..p).
  for (let k = 0; k <= p; k++) {
    const base = k * w;
    for (let c = 0; c < w; c++) scratch[base + c] = 0;
    scratch[base + k] += 1;
    for (let j = 1; j <= p; j++) scratch[base + Math.abs(k - j)] -= phi[j - 1];
    let rhs = 0;
    for (let j = k; j < r; j++) rhs += rvec[j] * scratch[psiAt + j - k];
    scratch[base + p + 1] = rhs;
  }
  for (let col = 0; col <= p; col++) {
    let pivot = col;
    for (let row = col + 1; row <= p; row++) if (Math.abs(scratch[row * w + col]) > Math.abs(scratch[pivot * w + col])) pivot = row;
    if (Math.abs(scratch[pivot * w + col]) < 1e-12) return false;
    if (pivot !== col) {
      for (let c = col; c < w; c++) {
        const tmp = scratch[col * w + c];
        scratch[col * w + c] = scratch[pivot * w + c];
        scratch[pivot * w + c] = tmp;
      }
    }
    for (let row = col + 1; row <= p; row++) {
      const factor = scratch[row * w + col] / scratch[col * w + col];
      for (let c = col; c < w; c++) scratch[row * w + c] -= factor * scratch[col * w + c];
    }
  }
  for (let row = p; row >= 0; row--) {
    let sum = scratch[row * w + p + 1];
    for (let c = row + 1; c <= p; c++) sum -= scratch[row * w + c] * scratch[gammaAt + c];
    scratch[gammaAt + row] = sum / scratch[row * w + row];
  }
  // γ(k) for p < k ≤ r by the recursion.
  for (let k = p + 1; k <= r; k++) {
    let value = 0;
    for (let j = 1; j <= p; j++) value += phi[j - 1] * scratch[gammaAt + k - j];
    for (let j = k; j < r; j++) value += rvec[j] * scratch[psiAt + j - k];
    scratch[gammaAt + k] = value;
  }
  return true;
}

/** Where `armaMoments` leaves ψ and γ in the scratch. */
function momentsAt(p: number, r: number): { psiAt: number; gammaAt: number } {
  const psiAt = (p + 1) * (p + 2);
  return { psiAt, gammaAt: psiAt + r + 1 };
}

/**
 * The first column of the stationary P, P_{i1} = Cov(α_i, η), without solving the whole
 * Lyapunov equation (all the Chandrasekhar recursions need). With α_{i,t} =
 * Σ_{k≥i} φ_k η_{t−1−k+i} + Σ_{k≥i} θ_{k−1} ε_{t−k+i} (θ₀ = 1),
 *   Cov(α_i, η) = Σ_{k=i}^{r} φ_k γ(k−i+1) + Σ_{k=i}^{r} θ_{k−1} ψ_{k−i},
 * where γ are the ARMA autocovariances for σ² = 1, from the (p+1)-equation system of
 * Brockwell & Davis (1991), §3.3, eq. (3.3.8), and ψ the MA(∞) weights. Writes P_{i1} into
 * `out[i·r]`. Returns false when the AR part has a unit root.
 */
export function stationaryFirstColumn(
  phi: Float64Array,
  rvec: Float64Array,
  p: number,
  r: number,
  out: Float64Array,
  scratch: Float64Array,
): boolean {
  if (!armaMoments(phi, rvec, p, r, scratch)) return false;
  const { psiAt, gammaAt } = momentsAt(p, r);
  // P_{i1} with 1-based i in the formula, 0-based here: k runs over i..r−1 (0-based).
  for (let i = 0; i < r; i++) {
    let value = 0;
    for (let k = i; k < r; k++) value += phi[k] * scratch[gammaAt + k - i + 1] + rvec[k] * scratch[psiAt + k - i];
    out[i * r] = value;
  }
  return true;
}

/**
 * The whole stationary P from the same moments, for a large state whose expanded polynomials
 * are mostly zeros (a seasonal ARMA): with α_a = Σ_{u≥0} (φ_{a+u} η_{t−1−u} + ϑ_{a+u} ε_{t−u})
 * (0-based, ϑ = (1, θ₁, …)), Cov(η_x, ε_y) = ψ_{x−y} for x ≥ y and 0 otherwise, so
 *   P_ab = Σ_u Σ_v [φ_{a+u} φ_{b+v} γ(|u − v|) + φ_{a+u} ϑ_{b+v} ψ_{v−u−1} + ϑ_{a+u} φ_{b+v} ψ_{u−v−1} + ϑ_{a+u} ϑ_{b+v} [u = v]]
 * with ψ of a negative lag zero. Only the nonzero coefficients enter the sums, so a monthly
 * model with one seasonal factor costs a few thousand operations where the Lyapunov system of
 * `stationaryCovariance`, r(r+1)/2 unknowns, costs hundreds of thousands. `scratch` needs
 * `momentsScratchSize(p, r)` numbers. Returns false when the AR part has a unit root.
 */
export function stationaryCovarianceFromMoments(
  phi: Float64Array,
  rvec: Float64Array,
  p: number,
  r: number,
  out: Float64Array,
  scratch: Float64Array,
): boolean {
  if (!armaMoments(phi, rvec, p, r, scratch)) return false;
  const { psiAt, gammaAt } = momentsAt(p, r);
  // The positions k where φ_k or ϑ_k is not zero, ascending, after the moments.
  const listAt = gammaAt + r + 1;
  let count = 0;
  for (let k = 0; k < r; k++) if (phi[k] !== 0 || rvec[k] !== 0) scratch[listAt + count++] = k;
  for (let a = 0; a < r; a++) {
    let fromA = 0;
    while (fromA < count && scratch[listAt + fromA] < a) fromA++;
    for (let b = a; b < r; b++) {
      let fromB = fromA;
      while (fromB < count && scratch[listAt + fromB] < b) fromB++;
      let value = 0;
      for (let ia = fromA; ia < count; ia++) {
        const ka = scratch[listAt + ia];
        const fa = phi[ka];
        const ta = rvec[ka];
        const u = ka - a;
        for (let ib = fromB; ib < count; ib++) {
          const kb = scratch[listAt + ib];
          const fb = phi[kb];
          const tb = rvec[kb];
          const v = kb - b;
          value += fa * fb * scratch[gammaAt + Math.abs(u - v)];
          if (v > u) value += fa * tb * scratch[psiAt + v - u - 1];
          else if (u > v) value += ta * fb * scratch[psiAt + u - v - 1];
          else value += ta * tb;
        }
      }
      out[a * r + b] = value;
      out[b * r + a] = value;
    }
  }
  return true;
}
