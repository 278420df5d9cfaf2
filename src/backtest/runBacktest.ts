// Rolling-origin backtest of the whole method: at every origin each trend model is refitted
// on the data up to that origin alone (order search included under `reselect`), forecast
// B steps, and scored against what happened, beside the no-change yardstick.
//
//   values ─readBacktestInput─▶ y, w ─planOrigins─▶ origins ─runOriginTasks (threads)─▶
//   model-scale forecasts ─backTransformForecast─▶ forecasts ─scoreHorizon / compareModels─▶ record
import { availableParallelism } from 'node:os';
import { backtestMessages, InputError } from '../errors.js';
import { minimumObservations, TREND_MODELS, type TrendModelKind } from '../models/trendModels.js';
import { FORECAST_METHODS, type ArmaOrder, type BacktestRecord } from './backtestRecord.js';
import { collectForecasts } from './collectForecasts.js';
import { compareModels } from './compareModels.js';
import type { OriginTask } from './forecastAtOrigin.js';
import { fullSampleModels, parametersForWindow } from './fullSampleModels.js';
import { backtestNotes } from './messages.js';
import { defaultMinimumTraining, MINIMUM_TRAINING_FLOOR, planOrigins } from './planOrigins.js';
import { readBacktestInput, type BacktestInput } from './readBacktestInput.js';
import { resolveBacktestOptions, type BacktestOptions } from './resolveBacktestOptions.js';
import { runOriginTasks } from './runOriginTasks.js';
import { scoreHorizon } from './scoreHorizon.js';

export async function runBacktest(input: BacktestInput, options: BacktestOptions = {}): Promise<BacktestRecord> {
  const settings = resolveBacktestOptions(options);
  const { horizon, refit, maxP, maxQ } = settings;
  const data = readBacktestInput(input, settings.transform);
  const n = data.y.length;
  const floor = settings.minTrainingLength ?? MINIMUM_TRAINING_FLOOR;
  if (n - horizon < floor) throw new InputError(backtestMessages.seriesTooShort(n, horizon, floor));

  const full = refit === 'reselect' ? undefined : fullSampleModels(data.w, refit, maxP, maxQ, settings.orders);
  // The largest order each model is fitted at: the fixed one, or the top of the search grid.
  const largestOrder = (kind: TrendModelKind): ArmaOrder => full?.orders[kind] ?? { p: maxP, q: maxQ };
  // Parameters: p + q, the regression coefficients (2 or 1) and σ².
  const parameterCount = Math.max(...TREND_MODELS.map((kind) => largestOrder(kind).p + largestOrder(kind).q + (kind === 'deterministic' ? 3 : 2)));
  const needed = Math.max(...TREND_MODELS.map((kind) => minimumObservations(kind, largestOrder(kind).p, largestOrder(kind).q)));
  const minTrainingLength = settings.minTrainingLength ?? defaultMinimumTraining(parameterCount);
  if (minTrainingLength < needed) throw new InputError(backtestMessages.trainingTooShort(minTrainingLength, needed));
  const planned = planOrigins(n, { horizon, origins: settings.origins, step: settings.step, window: settings.window, minTrainingLength });
  // A forecast starts from an observed value: origins whose last training value is missing are left out.
  const observedOrigins = planned.origins.filter(({ end }) => !Number.isNaN(data.w[end - 1]));
  const skippedOrigins = planned.origins.length - observedOrigins.length;
  const plan = { ...planned, origins: observedOrigins };
  if (plan.origins.length === 0) throw new InputError(backtestMessages.seriesTooShort(n, horizon, minTrainingLength));

  const tasks: OriginTask[] = plan.origins.flatMap(({ start, end }) =>
    TREND_MODELS.map((kind) => ({
      kind,
      w: data.w.slice(start, end),
      horizon,
      refit,
      maxP,
      maxQ,
      order: full?.orders[kind],
      parameters: full?.parameters === undefined ? undefined : parametersForWindow(kind, full.parameters[kind], start),
    })),
  );
  const threads = settings.threads ?? Math.min(availableParallelism(), plan.origins.length);
  const results = await runOriginTasks(tasks, threads, options.pool);
  const collected = collectForecasts(data, plan.origins, results, settings);

  const perHorizon = {} as BacktestRecord['per_horizon'];
  for (const method of FORECAST_METHODS) {
    perHorizon[method] = collected.scored[method].map((rows, i) => scoreHorizon(i + 1, rows, settings.levels));
  }
  const comparison = collected.scored.deterministic.flatMap((rows, i) => compareModels(i + 1, rows, collected.scored.stochastic[i], settings.transform));
  const notes: string[] = [];
  if (plan.available < plan.requested) notes.push(backtestNotes.originsCut(plan.requested, plan.origins.length, minTrainingLength));
  if (full !== undefined) notes.push(backtestNotes.lookAhead(refit));
  if (skippedOrigins > 0) notes.push(backtestNotes.missingOrigins(skippedOrigins));
  const unconverged = results.filter((result) => !result.converged).length;
  if (unconverged > 0) notes.push(backtestNotes.unconverged(unconverged, results.length));
  if (collected.forecasts.some((row) => !Number.isNaN(row.actual) && !(row.actual > 0))) notes.push(backtestNotes.mapeUnavailable);
  return {
    settings: {
      origins: plan.origins.length,
      requested_origins: plan.requested,
      horizon,
      window: settings.window,
      step: settings.step,
      refit,
      min_training_length: minTrainingLength,
      levels: settings.levels,
      transform: settings.transform.kind === 'box-cox' ? { kind: 'box-cox', lambda: settings.transform.lambda } : { kind: settings.transform.kind },
      coefficient_uncertainty: settings.coefficientUncertainty,
      point: settings.point,
      max_p: maxP,
      max_q: maxQ,
      orders: full?.orders ?? null,
      significance: settings.significance,
    },
    notes,
    origins: collected.origins,
    per_horizon: perHorizon,
    comparison,
    forecasts: collected.forecasts,
  };
}
