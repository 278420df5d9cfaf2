// Rolling-origin backtest of the whole method: at every origin each trend model is refitted
// on the data up to that origin alone (order search included under `reselect`), forecast
// B steps, and scored against what happened, beside the no-change yardstick and, for a
// seasonal period s > 1, the seasonal naive one, which is then also the benchmark and whose
// in-sample error scales MASE. Everything it does is set by the analysis settings and the
// series' seasonal period; how many threads run it is the caller's choice.
//
//   values ─readBacktestInput─▶ y, w ─planOrigins─▶ origins ─runOriginTasks (threads)─▶
//   model-scale forecasts ─backTransformForecast─▶ forecasts ─scoreHorizon / compareModels─▶ record
import { availableParallelism } from 'node:os';
import { ORIGIN_STEP } from '../base/backtestOrigins.js';
import { InputError, type InputProblem } from '../base/problem.js';
import { TREND_MODELS, type AnalysisSettings, type TrendModelKind } from '../base/settings.js';
import { regressorsIdentified } from '../models/fitRegressionArma.js';
import { fixedPartDesign } from '../models/seasonalSearch.js';
import { minimumObservations, type FixedSeasonalPart, type SeasonalOrderSize, type SeasonalSearchSpec } from '../models/trendModels.js';
import type { ArmaOrder, BacktestRecord } from './backtestRecord.js';
import { collectForecasts } from './collectForecasts.js';
import { compareModels } from './compareModels.js';
import type { OriginTask } from './forecastAtOrigin.js';
import { fullSampleModels, parametersForWindow } from './fullSampleModels.js';
import { backtestMessages, backtestNotes } from './messages.js';
import { originSeasons, planOrigins } from './planOrigins.js';
import { readBacktestInput, type BacktestInput } from './readBacktestInput.js';
import { runOriginTasks, type OriginPool } from './runOriginTasks.js';
import { scoreHorizon } from './scoreHorizon.js';

/**
 * Longest chain of origins whose seasonal searches run warm, each from the one before: the
 * first of a chain searches cold. Each model's origins are cut into two chains (the two
 * cores of a small machine each get one of each model), of at most this many, so that a
 * candidate that a warm start keeps at a lesser optimum is searched afresh within ten origins.
 * The chains depend on the plan alone, never on the thread count.
 */
const MAX_CHAIN = 10;
/**
 * A plain backtest with at most this many observations times origins runs on the calling
 * thread unless told otherwise: two fresh workers take longer to start and compile than its
 * origins take. `fit --backtest` on Lake Huron (98 × 20) took 8% less time inline; at 200 × 20
 * the two were level, at 300 × 20 the threads 4% ahead. The record is the same either way.
 */
const INLINE_WORK = 3000;

export interface BacktestRun {
  /** Orders chosen on the full sample, kept by the `reestimate` and `fixed` policies; searched on the full sample when absent. */
  orders?: Record<TrendModelKind, ArmaOrder>;
  /** Worker threads; without a pool, min(available cores, origins), or 1 for a small plain backtest (`INLINE_WORK`). The record does not depend on it. */
  threads?: number;
  /** An open pool to run on instead of starting threads for this backtest alone. */
  pool?: OriginPool;
  /**
   * Seasonal period s of the series: 1 (the default) for none, 4 quarterly, 12 monthly. Above 1
   * the seasonal naive forecast is scored and is the benchmark, MASE is scaled by its in-sample
   * error, and at least s origins are planned so that every season is forecast from.
   */
  period?: number;
  /**
   * The models' seasonal part, with the first season that of the whole series: what the search
   * may try (`reselect`), or the full-series choice kept (`reestimate`, a look-ahead the record
   * notes). Absent: no seasonal part.
   */
  seasonal?: Record<TrendModelKind, SeasonalSearchSpec | FixedSeasonalPart>;
  /** Hears how many origins have both models' forecasts, of how many, as they finish (for a progress display; the record does not depend on it). */
  onProgress?: (originsDone: number, originsTotal: number) => void;
}

export async function runBacktest(input: BacktestInput, settings: AnalysisSettings, run: BacktestRun = {}): Promise<BacktestRecord> {
  const { max_p: maxP, max_q: maxQ } = settings;
  const { horizon, refit, origins, window, min_train: minTrainingLength } = settings.backtest;
  checkRun(run, refit);
  const period = run.period ?? 1;
  const data = readBacktestInput(input, settings.transform);
  const n = data.y.length;
  if (n - horizon < minTrainingLength) throw new InputError(backtestMessages.seriesTooShort(n, horizon, minTrainingLength));
  // The seasonal naive forecast and its error variance need one change a full cycle long in the shortest window.
  if (minTrainingLength < period + 1) throw new InputError(backtestMessages.trainingShorterThanCycle(minTrainingLength, period));

  const full = refit === 'reselect' ? undefined : fullSampleModels(data.w, refit, maxP, maxQ, settings.estimation, run.orders);
  // The largest order each model is fitted at: the fixed one, or the top of the search grid.
  const largestOrder = (kind: TrendModelKind): ArmaOrder => full?.orders[kind] ?? { p: maxP, q: maxQ };
  // With a seasonal part: the part kept (`reestimate`), or the smallest the search can fall back on.
  const seasonalSize = (kind: TrendModelKind): SeasonalOrderSize | undefined => {
    const part = run.seasonal?.[kind];
    if (part === undefined) return undefined;
    return 'harmonics' in part ? part : { period: part.period, P: 0, Q: 0, harmonics: 0, seasonalDifferencing: part.seasonalDifferencing };
  };
  const needed = Math.max(...TREND_MODELS.map((kind) => minimumObservations(kind, largestOrder(kind).p, largestOrder(kind).q, seasonalSize(kind))));
  if (minTrainingLength < needed) throw new InputError(backtestMessages.trainingTooShort(minTrainingLength, needed));
  const planned = planOrigins(n, { horizon, origins, step: ORIGIN_STEP, window, minTrainingLength, period });
  // A forecast starts from an observed value: origins whose last training value is missing are left out.
  const observedOrigins = planned.origins.filter(({ end }) => !Number.isNaN(data.w[end - 1]));
  const skippedOrigins = planned.origins.length - observedOrigins.length;
  const plan = { ...planned, origins: observedOrigins };
  if (plan.origins.length === 0) throw new InputError(backtestMessages.seriesTooShort(n, horizon, minTrainingLength));

  // A reselecting seasonal search at each origin starts warm from the previous origin's (forecastAtOrigin.ts).
  const chainLength = refit === 'reselect' && run.seasonal !== undefined ? Math.min(MAX_CHAIN, Math.ceil(plan.origins.length / 2)) : 0;
  const tasks: OriginTask[] = plan.origins.flatMap(({ start, end }, o) =>
    TREND_MODELS.map((kind, m) => ({
      kind,
      w: data.w.slice(start, end),
      horizon,
      refit,
      maxP,
      maxQ,
      estimation: settings.estimation,
      ...(run.seasonal === undefined ? {} : { seasonal: { ...run.seasonal[kind], firstSeason: (run.seasonal[kind].firstSeason + start) % run.seasonal[kind].period } }),
      order: full?.orders[kind],
      parameters: full?.parameters === undefined ? undefined : parametersForWindow(kind, full.parameters[kind], start),
      ...(chainLength === 0 ? {} : { chain: m * plan.origins.length + Math.floor(o / chainLength) }),
    })),
  );
  // A fixed seasonal part needs each window to identify its pattern (a season always missing in a
  // short window does not); the auto search leaves out the harmonic counts a window cannot carry.
  tasks.forEach((task, index) => {
    const part = task.seasonal;
    if (part === undefined || !('harmonics' in part) || part.harmonics === 0) return;
    const { design } = fixedPartDesign(task.kind, task.w, part);
    if (regressorsIdentified(design.response, design.regressors)) return;
    const { end } = plan.origins[Math.floor(index / TREND_MODELS.length)];
    throw new InputError(backtestMessages.seasonUnseen(data.periods?.[end - 1] ?? `at observation ${end}`));
  });
  const small = run.seasonal === undefined && n * plan.origins.length <= INLINE_WORK;
  const threads = run.threads ?? (small ? 1 : Math.min(availableParallelism(), plan.origins.length));
  const results = await runOriginTasks(tasks, threads, run.pool, originProgress(plan.origins.length, run.onProgress));
  const collected = collectForecasts(data, plan.origins, results, settings, period);

  const perHorizon = {} as BacktestRecord['per_horizon'];
  for (const method of collected.methods) {
    perHorizon[method] = collected.scored[method].map((rows, i) => scoreHorizon(i + 1, rows, settings.levels));
  }
  const seasonsCovered = originSeasons(plan.origins, period);
  const comparison = collected.scored.deterministic.flatMap((rows, i) => compareModels(i + 1, rows, collected.scored.stochastic[i], settings.recommendation.scored_level));
  const notes: string[] = [];
  if (plan.available < plan.requested) notes.push(backtestNotes.originsCut(plan.requested, plan.origins.length, minTrainingLength));
  if (plan.planned > plan.requested) notes.push(backtestNotes.originsRaised(plan.requested, plan.planned, period));
  if (full !== undefined) notes.push(backtestNotes.lookAhead(refit));
  if (chainLength > 1) notes.push(backtestNotes.warmSearches(chainLength));
  if (skippedOrigins > 0) notes.push(backtestNotes.missingOrigins(skippedOrigins));
  if (seasonsCovered < period) notes.push(backtestNotes.seasonsMissed(seasonsCovered, period));
  const unconverged = results.filter((result) => !result.converged).length;
  if (unconverged > 0) notes.push(backtestNotes.unconverged(unconverged, results.length));
  if (collected.forecasts.some((row) => !Number.isNaN(row.actual) && !(row.actual > 0))) notes.push(backtestNotes.mapeUnavailable);
  return {
    settings: {
      origins: plan.origins.length,
      requested_origins: plan.requested,
      horizon,
      window,
      step: ORIGIN_STEP,
      refit,
      min_training_length: minTrainingLength,
      levels: [...settings.levels],
      transform: settings.transform,
      coefficient_uncertainty: settings.coefficient_uncertainty,
      point: settings.point,
      max_p: maxP,
      max_q: maxQ,
      orders: full?.orders ?? null,
      significance: settings.significance,
      period,
      benchmark: period > 1 ? 'seasonal_naive' : 'naive',
      mase_scaling: period > 1 ? 'seasonal_naive' : 'naive',
      seasons_covered: seasonsCovered,
    },
    notes,
    origins: collected.origins,
    per_horizon: perHorizon,
    comparison,
    forecasts: collected.forecasts,
  };
}

/** Counts the origins whose every task has finished, for `onProgress`; tasks are laid out origin by origin, one per model. */
function originProgress(origins: number, onProgress: BacktestRun['onProgress']): ((taskIndices: readonly number[]) => void) | undefined {
  if (onProgress === undefined) return undefined;
  const finished = new Array<number>(origins).fill(0);
  let done = 0;
  onProgress(0, origins);
  return (taskIndices) => {
    for (const index of taskIndices) {
      const origin = Math.floor(index / TREND_MODELS.length);
      finished[origin]++;
      if (finished[origin] === TREND_MODELS.length) done++;
    }
    onProgress(done, origins);
  };
}

/** The caller's orders and thread count, checked together. */
function checkRun(run: BacktestRun, refit: AnalysisSettings['backtest']['refit']): void {
  const problems: InputProblem[] = [];
  if (run.orders !== undefined) {
    if (refit === 'reselect') problems.push(backtestMessages.ordersWithReselect());
    for (const kind of TREND_MODELS) {
      for (const part of ['p', 'q'] as const) {
        const value = run.orders[kind][part];
        if (!(Number.isInteger(value) && value >= 0)) problems.push(backtestMessages.badOrder(`${kind}.${part}`, value));
      }
    }
  }
  if (run.threads !== undefined && !(Number.isInteger(run.threads) && run.threads >= 1)) problems.push(backtestMessages.badThreads(run.threads));
  if (run.seasonal !== undefined && refit === 'fixed') problems.push(backtestMessages.fixedWithSeasonalPart());
  if (run.period !== undefined && !(Number.isInteger(run.period) && run.period >= 1)) problems.push(backtestMessages.badPeriod(run.period));
  if (problems.length > 0) throw new InputError(problems);
}
