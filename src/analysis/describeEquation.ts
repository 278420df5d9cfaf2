// A fitted trend model written out as algebra with its estimates, for the terminal summary
// and the memo (plain text; the memo escapes it).
import type { TrendModelFit } from '../models/trendModels.js';
import { type TrendModelKind } from '../base/settings.js';

export function describeEquation(kind: TrendModelKind, model: TrendModelFit): string {
  const { fit } = model;
  const lhs = kind === 'deterministic' ? 'w_t' : '(1 - B) w_t';
  const regression =
    kind === 'deterministic'
      ? `${format(model.coefficients.intercept)} ${signed(model.coefficients.slope)}·t`
      : format(model.coefficients.drift);
  const ar = Array.from(fit.ar, (v, i) => `${signed(-v)}B${power(i + 1)}`).join(' ');
  const ma = Array.from(fit.ma, (v, j) => `${signed(v)}B${power(j + 1)}`).join(' ');
  const noise = `${fit.ar.length > 0 ? `(1 ${ar}) ` : ''}η_t = ${fit.ma.length > 0 ? `(1 ${ma}) ` : ''}ε_t`;
  return `${lhs} = ${regression} + η_t,  ${noise},  ε_t ~ N(0, ${format(fit.sigma2)})`;
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
