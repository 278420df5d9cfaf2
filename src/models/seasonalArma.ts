// Multiplicative seasonal ARMA (Box & Jenkins 1970, ch. 9; Box, Jenkins & Reinsel 2008, §9.1):
//   φ(B) Φ(B^s) η_t = θ(B) Θ(B^s) ε_t,
// φ, θ of orders p, q in the lag B and Φ, Θ of orders P, Q in the seasonal lag B^s. Multiplied
// out it is an ARMA(p + sP, q + sQ) whose coefficients are tied to p + q + P + Q parameters;
// the filter runs that expanded ARMA unchanged (its general path carries the larger state).
// The optimiser works on the factors: each is mapped from the reals to a stationary (or
// invertible) polynomial by constraints.ts, so the product is stationary and invertible too,
// its roots being the union of the factors' roots.
import { constrainAr, constrainMa } from './constraints.js';

/** An ARMA order in multiplicative form. P = Q = 0 is an ordinary ARMA(p, q) (period then unused). */
export interface SeasonalArmaOrder {
  readonly p: number;
  readonly q: number;
  readonly P: number;
  readonly Q: number;
  /** Observations per seasonal cycle s (12 monthly, 4 quarterly). */
  readonly period: number;
}

/** The factors' coefficients, in the sign conventions of the ARMA form (AR subtracted, MA added). */
export interface ArmaFactors {
  readonly ar: Float64Array;
  readonly ma: Float64Array;
  /** Φ₁..Φ_P: (1 − Φ₁B^s − …). */
  readonly seasonalAr: Float64Array;
  /** Θ₁..Θ_Q: (1 + Θ₁B^s + …). */
  readonly seasonalMa: Float64Array;
}

/** An order without a seasonal part. */
export function plainOrder(p: number, q: number): SeasonalArmaOrder {
  return { p, q, P: 0, Q: 0, period: 1 };
}

export function hasSeasonalPart(order: SeasonalArmaOrder): boolean {
  return order.P > 0 || order.Q > 0;
}

/** Orders of the expanded ARMA the filter runs: p + sP and q + sQ. */
export function processOrders(order: SeasonalArmaOrder): { p: number; q: number } {
  return { p: order.p + order.period * order.P, q: order.q + order.period * order.Q };
}

/** Free parameters of the ARMA part: p + q + P + Q. */
export function parameterCount(order: SeasonalArmaOrder): number {
  return order.p + order.q + order.P + order.Q;
}

/** Checks an order before any work is done with it (a defect in the caller otherwise). */
export function checkSeasonalOrder(order: SeasonalArmaOrder): void {
  const whole = [order.p, order.q, order.P, order.Q].every((v) => Number.isInteger(v) && v >= 0);
  if (!whole) throw new RangeError(`seasonal ARMA orders must be whole numbers ≥ 0, got (${order.p},${order.q})(${order.P},${order.Q})`);
  if (hasSeasonalPart(order) && !(Number.isInteger(order.period) && order.period >= 2)) {
    throw new RangeError(`a seasonal ARMA part needs a period of at least 2, got ${order.period}`);
  }
}

/** Zeroed factor arrays for an order. */
export function emptyFactors(order: SeasonalArmaOrder): ArmaFactors {
  return { ar: new Float64Array(order.p), ma: new Float64Array(order.q), seasonalAr: new Float64Array(order.P), seasonalMa: new Float64Array(order.Q) };
}

/**
 * Writes the expanded AR and MA coefficients of the product into `ar` (length p + sP) and
 * `ma` (length q + sQ), allocating nothing:
 *   1 − Σ a_k B^k = (1 − Σ φ_i B^i)(1 − Σ Φ_j B^{sj}),   1 + Σ m_k B^k = (1 + Σ θ_i B^i)(1 + Σ Θ_j B^{sj}).
 */
export function expandFactors(factors: ArmaFactors, period: number, ar: Float64Array, ma: Float64Array): void {
  expandPair(factors.ar, factors.seasonalAr, period, -1, ar);
  expandPair(factors.ma, factors.seasonalMa, period, 1, ma);
}

/**
 * Coefficients c_k of (1 + σΣ a_i B^i)(1 + σΣ b_j B^{sj}) = 1 + σΣ c_k B^k, where σ = −1 for AR
 * polynomials (written 1 − Σ) and +1 for MA polynomials (1 + Σ).
 */
function expandPair(plain: Float64Array, seasonal: Float64Array, period: number, sign: number, out: Float64Array): void {
  out.fill(0);
  for (let i = 0; i < plain.length; i++) out[i] += plain[i];
  for (let j = 0; j < seasonal.length; j++) {
    const lag = period * (j + 1);
    out[lag - 1] += seasonal[j];
    // The cross term σ a_i · σ b_j = a_i b_j sits at B^{lag + i + 1}; as a coefficient of σΣ it is σ a_i b_j.
    for (let i = 0; i < plain.length; i++) out[lag + i] += sign * plain[i] * seasonal[j];
  }
}

/** The expanded coefficients as new arrays. */
export function expandedCoefficients(factors: ArmaFactors, order: SeasonalArmaOrder): { ar: Float64Array; ma: Float64Array } {
  const orders = processOrders(order);
  const ar = new Float64Array(orders.p);
  const ma = new Float64Array(orders.q);
  expandFactors(factors, order.period, ar, ma);
  return { ar, ma };
}

/**
 * Maps unconstrained x = (AR p, MA q, seasonal AR P, seasonal MA Q) to the factors, each
 * stationary or invertible. `work` needs max(p, q, P, Q) slots; nothing is allocated.
 */
export function constrainFactors(x: ArrayLike<number>, order: SeasonalArmaOrder, out: ArmaFactors, work: Float64Array): void {
  const { p, q, P, Q } = order;
  constrainAr(x, 0, p, out.ar, work);
  constrainMa(x, p, q, out.ma, work);
  constrainAr(x, p + q, P, out.seasonalAr, work);
  constrainMa(x, p + q + P, Q, out.seasonalMa, work);
}

/** The factors packed as (AR, MA, seasonal AR, seasonal MA), the layout of the parameter vector. */
export function packFactors(factors: ArmaFactors): Float64Array {
  const { ar, ma, seasonalAr, seasonalMa } = factors;
  const out = new Float64Array(ar.length + ma.length + seasonalAr.length + seasonalMa.length);
  out.set(ar, 0);
  out.set(ma, ar.length);
  out.set(seasonalAr, ar.length + ma.length);
  out.set(seasonalMa, ar.length + ma.length + seasonalAr.length);
  return out;
}

/** Inverse of `packFactors` for an order (views into `theta`). */
export function unpackFactors(theta: Float64Array, order: SeasonalArmaOrder): ArmaFactors {
  const { p, q, P, Q } = order;
  return {
    ar: theta.subarray(0, p),
    ma: theta.subarray(p, p + q),
    seasonalAr: theta.subarray(p + q, p + q + P),
    seasonalMa: theta.subarray(p + q + P, p + q + P + Q),
  };
}
