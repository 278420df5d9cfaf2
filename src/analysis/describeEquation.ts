// A fitted trend model written out as algebra with its estimates, for the terminal summary
// and the memo (plain text; the memo escapes it).
import type { TrendModelFit } from '../models/trendModels.js';
import { type TrendModelKind } from '../base/settings.js';

export function describeEquation(kind: TrendModelKind, model: TrendModelFit): string {
  const { fit, seasonal } = model;
  const { factors } = fit;
  const s = seasonal?.period ?? 1;
  const lhs = kind === 'deterministic' ? 'w_t' : seasonal?.seasonalDifferencing === true ? `(1 - B^${s}) w_t` : '(1 - B) w_t';
  const regression =
    (kind === 'deterministic'
      ? `${format(model.coefficients.intercept)} ${signed(model.coefficients.slope)}·t`
      : format(model.coefficients.drift)) + ((seasonal?.harmonics ?? 0) > 0 ? ' + S(t)' : '');
  const polynomial = (coefficients: ArrayLike<number>, sign: number, step: number): string =>
    coefficients.length === 0 ? '' : `(1 ${Array.from(coefficients, (v, i) => `${signed(sign * v)}B${power((i + 1) * step)}`).join(' ')}) `;
  const arSide = polynomial(factors.ar, -1, 1) + polynomial(factors.seasonalAr, -1, s);
  const maSide = polynomial(factors.ma, 1, 1) + polynomial(factors.seasonalMa, 1, s);
  const noise = `${arSide}η_t = ${maSide}ε_t`;
  const pattern = (seasonal?.harmonics ?? 0) > 0 ? `,  S(t): the fixed seasonal pattern (${seasonal?.harmonics} harmonic pair${seasonal?.harmonics === 1 ? '' : 's'})` : '';
  return `${lhs} = ${regression} + η_t,  ${noise},  ε_t ~ N(0, ${format(fit.sigma2)})${pattern}`;
}

function format(value: number): string {
  return Number.isFinite(value) ? value.toPrecision(4) : 'n/a';
}

function signed(value: number): string {
  return value < 0 ? `- ${format(-value)}` : `+ ${format(value)}`;
}

function power(k: number): string {
  return k === 1 ? '' : `^${k}`;
}
