// Both fitted models: the equation the analysis wrote, a coefficient table with standard
// errors, and the facts of the fit.
import { evidenceWording } from '../evidenceWording.js';
import { formatSignificant } from '../format/formatNumber.js';
import type { AnalysisRecord } from '../../analysis/record.js';
import type { TrendModelKind } from '../../base/settings.js';
import { COEFFICIENT_NAME, MODEL_GLOSS, MODEL_NAME, scaleName } from '../wording.js';

export interface CoefficientRow {
  name: string;
  estimate: string;
  stderr: string;
  ratio: string;
}

export interface ModelView {
  kind: TrendModelKind;
  name: string;
  gloss: string;
  equation: string;
  coefficients: CoefficientRow[];
  facts: string;
  /** Sentences on a fit set aside and on how the standard errors were had; empty when there is nothing to say. */
  notes: string[];
}

function coefficientRow(name: string, estimate: number | undefined, stderr: number | null | undefined): CoefficientRow {
  const ratio = estimate !== undefined && typeof stderr === 'number' && stderr > 0 ? estimate / stderr : null;
  return { name, estimate: formatSignificant(estimate), stderr: formatSignificant(stderr), ratio: formatSignificant(ratio, 3) };
}

export function modelView(record: AnalysisRecord, kind: TrendModelKind): ModelView {
  const model = record.models[kind];
  const { deterministic, stochastic } = record.models;
  const regression =
    kind === 'deterministic'
      ? [
          coefficientRow(COEFFICIENT_NAME.intercept, deterministic.coefficients.intercept, deterministic.stderr.intercept),
          coefficientRow(COEFFICIENT_NAME.slope, deterministic.coefficients.slope, deterministic.stderr.slope),
        ]
      : [coefficientRow(COEFFICIENT_NAME.drift, stochastic.coefficients.drift, stochastic.stderr.drift)];
  const ar = model.coefficients.ar.map((v, i) => coefficientRow(COEFFICIENT_NAME.ar(i + 1), v, model.stderr.ar[i]));
  const ma = model.coefficients.ma.map((v, i) => coefficientRow(COEFFICIENT_NAME.ma(i + 1), v, model.stderr.ma[i]));
  const seasonal = model.seasonal;
  const seasonalRows =
    seasonal === null
      ? []
      : [
          ...seasonal.seasonal_ar.map((v, i) => coefficientRow(COEFFICIENT_NAME.seasonalAr(seasonal.period), v, seasonal.stderr.seasonal_ar[i])),
          ...seasonal.seasonal_ma.map((v, i) => coefficientRow(COEFFICIENT_NAME.seasonalMa(seasonal.period), v, seasonal.stderr.seasonal_ma[i])),
        ];
  return {
    kind,
    name: MODEL_NAME[kind],
    gloss: MODEL_GLOSS[kind],
    equation: model.equation,
    coefficients: [...regression, ...ar, ...ma, ...seasonalRows],
    notes: [
      ...(model.set_aside === null ? [] : [evidenceWording.setAside({ model: kind, order: armaOrder(kind, model.set_aside), reason: model.set_aside.reason })]),
      seasonal === null ? '' : evidenceWording.seasonalPart(kind, seasonal, record.seasonal.setting === 'fixed'),
      model.restricted_fallback === null ? '' : evidenceWording.restrictedFallback(model.restricted_fallback),
      evidenceWording.stderrMethod(model.stderr_method, model.p + model.q > 0),
    ].filter((note) => note !== ''),
    facts: evidenceWording.fitFacts({
      p: model.p,
      q: model.q,
      nobs: model.nobs,
      loglik: formatSignificant(model.loglik, 6),
      aicc: formatSignificant(model.aicc, 6),
      sigma2: formatSignificant(model.sigma2, 4),
      converged: evidenceWording.convergence(model.converged),
      estimation: model.estimation,
    }),
  };
}

/** "ARMA(2, 3) errors" for the deterministic trend, "ARIMA(1, 1, 1)" for the stochastic. */
function armaOrder(kind: TrendModelKind, order: { p: number; q: number; harmonics?: number; P?: number; Q?: number }): string {
  const base = kind === 'deterministic' ? `the trend line with ARMA(${order.p}, ${order.q}) errors` : `ARIMA(${order.p}, 1, ${order.q})`;
  const seasonal = [
    (order.harmonics ?? 0) > 0 ? `a fixed seasonal pattern of ${order.harmonics} harmonic pair${order.harmonics === 1 ? '' : 's'}` : '',
    (order.P ?? 0) + (order.Q ?? 0) > 0 ? `seasonal ARMA(${order.P ?? 0}, ${order.Q ?? 0})` : '',
  ].filter((part) => part !== '');
  return seasonal.length === 0 ? base : `${base} with ${seasonal.join(' and ')}`;
}

/** "Estimates are on the natural log scale of the series", or in its original units. */
export function scaleNote(record: AnalysisRecord): string {
  const { transform } = record.series;
  return evidenceWording.scaleNote(transform.kind === 'none' ? null : scaleName(transform));
}
