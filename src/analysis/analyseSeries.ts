// One series → one AnalysisRecord: transform, fit both trend models (order search each),
// forecast both, back-transform the intervals.
import { BUILT_IN_SETTINGS } from '../config/builtInSettings.js';
import { addPeriods } from '../data/period.js';
import type { Series } from '../data/series.js';
import { normalInv } from '../linalg/distributions.js';
import { biasAdjustedMean, inverseTransform, transformValue, type TransformSpec } from '../models/transform.js';
import { fitTrendModel, forecastTrendModel, minimumObservations, type TrendModelFit, type TrendModelKind } from '../models/trendModels.js';
import { collectEvidence, type EvidenceOptions } from '../evidence/collectEvidence.js';
import { describeEquation } from './describeEquation.js';
import { smallestMaRootModulus, smallestRootModulus } from '../models/rootModulus.js';
import { jsonNumber, RECORD_SCHEMA, type AnalysisRecord, type ForecastRow, type ModelRecord } from './record.js';
import { toolVersion } from './toolVersion.js';

export interface AnalysisOptions {
  id?: string;
  title?: string;
  horizon?: number;
  /** Interval levels in percent, e.g. [80, 95]. */
  levels?: number[];
  maxP?: number;
  maxQ?: number;
  transform?: TransformSpec;
  /** Add the coefficient term to the interval variance (default true). */
  coefficientUncertainty?: boolean;
  /** Point forecast: back-transformed median (default) or bias-adjusted mean. */
  point?: 'median' | 'mean';
  /** Significance level of the evidence tests (default 0.05). */
  significance?: number;
  kpssLagRule?: EvidenceOptions['kpssLagRule'];
}


/** Default horizon by frequency: ten years, three years of quarters, two years of months. */
export function defaultHorizon(frequency: Series['frequency']): number {
  return frequency === 'annual' ? 10 : frequency === 'quarterly' ? 12 : 24;
}

/** Fewest observations an analysis with these order limits needs. */
export function requiredObservations(maxP: number, maxQ: number): number {
  return Math.max(minimumObservations('deterministic', maxP, maxQ), minimumObservations('stochastic', maxP, maxQ));
}

export function analyseSeries(series: Series, options: AnalysisOptions = {}): AnalysisRecord {
  const transform = options.transform ?? { kind: 'none' };
  const horizon = options.horizon ?? defaultHorizon(series.frequency);
  const levels = options.levels ?? [...BUILT_IN_SETTINGS.levels];
  const maxP = options.maxP ?? BUILT_IN_SETTINGS.max_p;
  const maxQ = options.maxQ ?? BUILT_IN_SETTINGS.max_q;
  const coefficientUncertainty = options.coefficientUncertainty ?? true;
  const point = options.point ?? 'median';
  const w = series.values.map((y) => transformValue(transform, y));

  const fitted = {
    deterministic: fitTrendModel('deterministic', w, maxP, maxQ),
    stochastic: fitTrendModel('stochastic', w, maxP, maxQ),
  };
  const models = {} as AnalysisRecord['models'];
  const forecasts = {} as AnalysisRecord['forecasts'];
  for (const kind of ['deterministic', 'stochastic'] as const) {
    models[kind] = modelRecord(kind, fitted[kind]);
    forecasts[kind] = forecastRows(fitted[kind], horizon, series.last, levels, transform, coefficientUncertainty, point);
  }
  const evidence = collectEvidence(
    w,
    { deterministic: fitted.deterministic.fit, stochastic: fitted.stochastic.fit },
    { significance: options.significance, kpssLagRule: options.kpssLagRule, periodOf: (index) => series.periods[index] ?? addPeriods(series.first, index) },
  );
  return {
    schema: RECORD_SCHEMA,
    tool: toolVersion(),
    series: {
      id: options.id ?? series.column,
      title: options.title ?? series.column,
      frequency: series.frequency,
      first: series.first,
      last: series.last,
      n: series.n,
      transform: transform.kind === 'box-cox' ? { kind: 'box-cox', lambda: transform.lambda } : { kind: transform.kind },
      source: { file: series.file, sha256: series.sha256, column: series.column },
    },
    settings: {
      horizon,
      levels,
      max_p: maxP,
      max_q: maxQ,
      coefficient_uncertainty: coefficientUncertainty,
      point,
      significance: evidence.reading.level,
    },
    models,
    forecasts,
    evidence,
  };
}

function modelRecord(kind: TrendModelKind, model: TrendModelFit): ModelRecord {
  const { fit } = model;
  const coefficients: ModelRecord['coefficients'] = { ...model.coefficients, ar: Array.from(fit.ar), ma: Array.from(fit.ma) };
  const stderr: ModelRecord['stderr'] = {};
  for (const [name, value] of Object.entries(model.stderr.regression)) stderr[name] = jsonNumber(value);
  stderr.ar = model.stderr.ar.map(jsonNumber);
  stderr.ma = model.stderr.ma.map(jsonNumber);
  return {
    p: fit.p,
    q: fit.q,
    nobs: fit.nobs,
    loglik: fit.loglik,
    aicc: jsonNumber(model.aicc),
    sigma2: fit.sigma2,
    converged: fit.converged,
    coefficients,
    stderr,
    candidates: model.candidates.map((c) => ({ p: c.p, q: c.q, loglik: jsonNumber(c.loglik), aicc: jsonNumber(c.aicc), converged: c.converged })),
    equation: describeEquation(kind, model),
    roots: {
      ar_min_modulus: jsonNumber(smallestRootModulus(fit.ar) ?? Number.NaN),
      ma_min_modulus: jsonNumber(smallestMaRootModulus(fit.ma) ?? Number.NaN),
    },
  };
}

function forecastRows(
  model: TrendModelFit,
  horizon: number,
  last: string,
  levels: readonly number[],
  transform: TransformSpec,
  coefficientUncertainty: boolean,
  point: 'median' | 'mean',
): ForecastRow[] {
  const moments = forecastTrendModel(model, horizon);
  const rows: ForecastRow[] = [];
  for (let h = 0; h < horizon; h++) {
    const mean = moments.mean[h];
    const se = coefficientUncertainty ? moments.seTotal[h] : moments.seProcess[h];
    const intervals: ForecastRow['intervals'] = {};
    for (const level of levels) {
      const z = normalInv(0.5 + level / 200);
      intervals[String(level)] = [inverseTransform(transform, mean - z * se), inverseTransform(transform, mean + z * se)];
    }
    rows.push({
      h: h + 1,
      period: addPeriods(last, h + 1),
      point: point === 'mean' ? biasAdjustedMean(transform, mean, se) : inverseTransform(transform, mean),
      intervals,
      model_scale: { mean, se_process: moments.seProcess[h], se_total: moments.seTotal[h] },
    });
  }
  return rows;
}
