// One series → one AnalysisRecord, at settings resolved beforehand (src/config/resolveSettings.ts):
//
//   Series ─transform─▶ w ─fitTrendModel × 2 (order search each)─▶ fits ─┬─ forecasts (back-transformed), the next full year's figure
//                                                                        ├─ collectEvidence
//                                                                        ├─ runBacktest (when asked)
//                                                                        └─ recommendModel
//   ─▶ the record, built once as a new value
import { addPeriods } from '../base/period.js';
import { InputError } from '../base/problem.js';
import { backtestUnavailableReason } from '../backtest/messages.js';
import type { Series } from '../base/series.js';
import { TREND_MODELS, type AnalysisSettings, type TrendModelKind } from '../base/settings.js';
import { backTransformForecast, transformValue } from '../base/transform.js';
import { toolVersion } from '../base/toolVersion.js';
import type { BacktestRecord } from '../backtest/backtestRecord.js';
import type { BacktestRun } from '../backtest/runBacktest.js';
import { collectEvidence, type EvidenceOptions, type FittedResiduals } from '../evidence/collectEvidence.js';
import { planSeasonal, type SeasonalPlan } from './seasonalPlan.js';
import { nextYear } from './nextYear.js';
import { smallestMaRootModulus, smallestRootModulus } from '../linalg/rootModulus.js';
import { fitBothModels, type ModelFit, type ModelTask } from './fitModelTask.js';
import { forecastTrendModel, minimumObservations, type FixedSeasonalPart, type SeasonalSearchSpec, type TrendModelFit } from '../models/trendModels.js';
import { describeEquation } from './describeEquation.js';
import { RECORD_SCHEMA, type AnalysisRecord, type DeterministicCoefficients, type ForecastRow, type JsonNumber, type ModelRecord, type StochasticCoefficients } from './record.js';
import { recommendationInput, recommendModel } from './recommendModel.js';

/** Who the series is, as the record names it. */
export interface SeriesIdentity {
  id: string;
  title: string;
  /** The data file as the user named it (a config's path as written), never a path on this machine. */
  file: string;
}

export interface AnalysisRun {
  /** Run the rolling-origin backtest and apply the recommendation rule (true), or fit and forecast only. */
  backtest: boolean;
  /** Threads for the two models' searches and the backtest, and a pool for the backtest; the record does not depend on them. */
  threads?: BacktestRun['threads'];
  pool?: BacktestRun['pool'];
  /** Hears the backtest's progress, origins done of all (a progress display only). */
  onBacktestProgress?: BacktestRun['onProgress'];
  /** KPSS lag truncation (reference checks only). */
  kpssLagRule?: EvidenceOptions['kpssLagRule'];
}

/** Fewest observations an analysis with these order limits needs. */
export function requiredObservations(maxP: number, maxQ: number): number {
  return Math.max(...TREND_MODELS.map((kind) => minimumObservations(kind, maxP, maxQ)));
}

export async function analyseSeries(series: Series, settings: AnalysisSettings, identity: SeriesIdentity, run: AnalysisRun): Promise<AnalysisRecord> {
  const w = series.values.map((y) => transformValue(settings.transform, y));
  const seasonal = planSeasonal(series, w, settings);
  const task = (kind: TrendModelKind): ModelTask => ({
    kind,
    w,
    maxP: settings.max_p,
    maxQ: settings.max_q,
    options: { estimation: settings.estimation, ...(seasonal.specs === undefined ? {} : { seasonal: seasonal.specs[kind] }) },
  });
  const fitted = await fitBothModels({ deterministic: task('deterministic'), stochastic: task('stochastic') }, run.threads);
  const fittedResiduals = (model: ModelFit): FittedResiduals => ({
    residuals: model.fit.residuals,
    p: model.fit.order.p,
    q: model.fit.order.q,
    P: model.fit.order.P,
    Q: model.fit.order.Q,
    estimation: model.fit.estimation,
    ...(model.seasonal === null ? { fit: model.fit } : { seasonal: { design: model.design, fit: model.fit }, windows: model.windows }),
  });
  const evidence = collectEvidence(
    w,
    { deterministic: fittedResiduals(fitted.deterministic), stochastic: fittedResiduals(fitted.stochastic) },
    {
      significance: settings.significance,
      kpssLagRule: run.kpssLagRule,
      periodOf: (index) => series.periods[index] ?? addPeriods(series.first, index),
      ...(seasonal.evidence === undefined ? {} : { period: seasonal.record.period, seasonal: seasonal.evidence, seasonStart: seasonal.start }),
    },
  );
  const backtest = run.backtest ? await backtestOrReason(series, settings, fitted, run, seasonal) : undefined;
  const deterministic = modelRecord('deterministic', fitted.deterministic) as ModelRecord<DeterministicCoefficients>;
  const stochastic = modelRecord('stochastic', fitted.stochastic) as ModelRecord<StochasticCoefficients>;
  const forecasts = { deterministic: forecastRows(fitted.deterministic, series.last, settings), stochastic: forecastRows(fitted.stochastic, series.last, settings) };
  return {
    schema: RECORD_SCHEMA,
    tool: toolVersion(),
    series: {
      id: identity.id,
      title: identity.title,
      frequency: series.frequency,
      first: series.first,
      last: series.last,
      n: series.n,
      transform: settings.transform,
      source: { file: identity.file, sha256: series.sha256, column: series.column },
    },
    settings,
    models: { deterministic, stochastic },
    forecasts,
    next_year: nextYear(series, settings, fitted, forecasts),
    evidence,
    seasonal: seasonal.record,
    ...(backtest === undefined
      ? {}
      : {
          backtest: backtest.record,
          ...(backtest.reason === undefined ? {} : { backtest_unavailable: backtest.reason }),
          recommendation: recommendModel(recommendationInput({ evidence, backtest: backtest.record, stochastic }), settings),
        }),
  };
}

/** The backtest, or why the series cannot have one: a short series still gets its memo, with the reason shown. */
async function backtestOrReason(
  series: Series,
  settings: AnalysisSettings,
  fitted: Record<TrendModelKind, TrendModelFit>,
  run: AnalysisRun,
  seasonal: SeasonalPlan,
): Promise<{ record: BacktestRecord | null; reason?: string }> {
  // Orders chosen on the full sample, for the policies that keep them (a look-ahead the record notes).
  const reselect = settings.backtest.refit === 'reselect';
  const orders = reselect ? undefined : { deterministic: orderOf(fitted.deterministic), stochastic: orderOf(fitted.stochastic) };
  // The seasonal part: searched again at each origin, or the full-series choice kept with the orders.
  const keptPart = (kind: TrendModelKind): FixedSeasonalPart | SeasonalSearchSpec | undefined => {
    const spec = seasonal.specs?.[kind];
    const part = fitted[kind].seasonal;
    if (spec === undefined || reselect || part === null) return spec;
    return { period: part.period, firstSeason: spec.firstSeason, seasonalDifferencing: part.seasonalDifferencing, harmonics: part.harmonics, P: part.P, Q: part.Q };
  };
  const det = keptPart('deterministic');
  const sto = keptPart('stochastic');
  const seasonalRun = det === undefined || sto === undefined ? {} : { seasonal: { deterministic: det, stochastic: sto }, period: seasonal.record.period };
  // The backtest (and its thread pool) loads only for an analysis that runs one.
  const { runBacktest } = await import('../backtest/runBacktest.js');
  try {
    return { record: await runBacktest({ values: series.values, periods: series.periods }, settings, { orders, threads: run.threads, pool: run.pool, onProgress: run.onBacktestProgress, ...seasonalRun }) };
  } catch (error) {
    if (!(error instanceof InputError)) throw error;
    // For the memo's reader: what is wrong, without the config keys and the fixes, which `check` gives the analyst.
    return { record: null, reason: backtestUnavailableReason(error.problems) };
  }
}

function orderOf(model: TrendModelFit): { p: number; q: number } {
  return { p: model.fit.order.p, q: model.fit.order.q };
}

function jsonNumber(value: number): JsonNumber {
  return Number.isFinite(value) ? value : null;
}

function modelRecord(kind: TrendModelKind, model: TrendModelFit): ModelRecord {
  const { fit } = model;
  const { factors } = fit;
  // The trend's own coefficients; the harmonic pairs' go under `seasonal`.
  const trendNames = kind === 'deterministic' ? ['intercept', 'slope'] : ['drift'];
  const trendOnly = <T>(values: Record<string, T>): Record<string, T> => Object.fromEntries(Object.entries(values).filter(([name]) => trendNames.includes(name)));
  const harmonicsOnly = <T>(values: Record<string, T>): Record<string, T> => Object.fromEntries(Object.entries(values).filter(([name]) => !trendNames.includes(name)));
  const regressionSe = Object.fromEntries(Object.entries(trendOnly(model.stderr.regression)).map(([name, value]) => [name, jsonNumber(value)]));
  return {
    p: fit.order.p,
    q: fit.order.q,
    nobs: fit.nobs,
    loglik: model.loglik,
    aicc: jsonNumber(model.aicc),
    estimation: fit.estimation,
    restricted_loglik: fit.estimation === 'reml' ? jsonNumber(fit.loglik) : null,
    restricted_fallback: model.restrictedFallback ?? null,
    sigma2: fit.sigma2,
    converged: fit.converged,
    // The design names the regression coefficients (intercept and slope, or drift), so the shape follows the kind.
    coefficients: { ...trendOnly(model.coefficients), ar: Array.from(factors.ar), ma: Array.from(factors.ma) } as DeterministicCoefficients | StochasticCoefficients,
    stderr: { ...regressionSe, ar: model.stderr.ar.map(jsonNumber), ma: model.stderr.ma.map(jsonNumber) } as DeterministicCoefficients<JsonNumber> | StochasticCoefficients<JsonNumber>,
    stderr_method: model.stderr.method,
    set_aside: model.setAside === undefined ? null : { ...model.setAside, aicc: jsonNumber(model.setAside.aicc) },
    candidates: model.candidates.map((c) => ({
      p: c.p,
      q: c.q,
      ...(model.seasonal === null ? {} : { harmonics: c.harmonics, P: c.P, Q: c.Q }),
      loglik: jsonNumber(c.loglik),
      aicc: jsonNumber(c.aicc),
      converged: c.converged,
      admissible: c.admissible,
      reason: c.reason,
    })),
    equation: describeEquation(kind, model),
    roots: {
      ar_min_modulus: jsonNumber(smallestRootModulus(factors.ar) ?? Number.NaN),
      ma_min_modulus: jsonNumber(smallestMaRootModulus(factors.ma) ?? Number.NaN),
    },
    seasonal:
      model.seasonal === null
        ? null
        : {
            period: model.seasonal.period,
            harmonics: model.seasonal.harmonics,
            P: model.seasonal.P,
            Q: model.seasonal.Q,
            seasonal_differences: model.seasonal.seasonalDifferencing,
            pattern: model.seasonal.pattern,
            seasonal_ar: Array.from(factors.seasonalAr),
            seasonal_ma: Array.from(factors.seasonalMa),
            stderr: {
              seasonal_ar: model.stderr.seasonalAr.map(jsonNumber),
              seasonal_ma: model.stderr.seasonalMa.map(jsonNumber),
              harmonics: Object.fromEntries(Object.entries(harmonicsOnly(model.stderr.regression)).map(([name, value]) => [name, jsonNumber(value)])),
            },
            harmonic_coefficients: harmonicsOnly(model.coefficients),
          },
  };
}

function forecastRows(model: TrendModelFit, last: string, settings: AnalysisSettings): ForecastRow[] {
  const moments = forecastTrendModel(model, settings.horizon);
  return Array.from({ length: settings.horizon }, (_, h) => {
    const mean = moments.mean[h];
    const se = settings.coefficient_uncertainty ? moments.seTotal[h] : moments.seProcess[h];
    return {
      h: h + 1,
      period: addPeriods(last, h + 1),
      ...backTransformForecast(settings.transform, settings.point, settings.levels, mean, se),
      model_scale: { mean, se_process: moments.seProcess[h], se_total: moments.seTotal[h] },
    };
  });
}
