// One trend model's search and estimates, as a task a worker thread can run: a seasonal
// series' two searches are the analysis's largest cost and independent of each other, so
// `fitBothModels` runs one in a worker while the main thread runs the other. A task is a pure
// function of its input and both paths go through `fitModel`, so the record does not depend on
// the thread count. The design holds a function (its future rows) and cannot cross threads; the
// worker's is built again from the data and the chosen seasonal part, exactly as the search built it.
import { availableParallelism } from 'node:os';
import { isMainThread, parentPort, Worker, workerData } from 'node:worker_threads';
import type { TrendModelKind } from '../base/settings.js';
import { workerModule } from '../base/workerModule.js';
import { seasonalModelWindows, type ModelWindows } from '../evidence/trendStability.js';
import { fitTrendModel, trendDesign, type TrendModelFit, type TrendModelOptions } from '../models/trendModels.js';

export interface ModelTask {
  kind: TrendModelKind;
  w: Float64Array;
  maxP: number;
  maxQ: number;
  options: TrendModelOptions;
}

/** A model fit without its design, which the caller builds again (`withDesign`), and its stability windows if computed. */
export type ModelTaskResult = Omit<ModelFit, 'design'>;

/** A model's fit and, for a complete seasonal series, its trend-stability windows computed beside the search. */
export interface ModelFit extends TrendModelFit {
  windows?: ModelWindows;
}

/** The model and, for a complete seasonal series, its stability windows. */
function fitModel(task: ModelTask): ModelFit {
  const model = fitTrendModel(task.kind, task.w, task.maxP, task.maxQ, task.options);
  // The windows are the costliest evidence of a seasonal model: fitted here, they run side by
  // side with the other model's (collectEvidence takes them when the joint schedule agrees).
  if (model.seasonal === null || task.w.some(Number.isNaN)) return model;
  return { ...model, windows: seasonalModelWindows(task.kind, task.w, model) };
}

/** `fitModel` for a worker thread: the result without its design, which cannot cross threads. */
export function fitModelTask(task: ModelTask): ModelTaskResult {
  const { design: _design, ...model } = fitModel(task);
  return model;
}

/** The model with the design its search fitted: the plain one, or the one of its seasonal part. */
function withDesign(task: ModelTask, model: ModelTaskResult): ModelFit {
  const part = model.seasonal;
  const firstSeason = task.options.seasonal?.firstSeason;
  if (part === null || firstSeason === undefined) return { ...model, design: trendDesign(task.kind, task.w) };
  const design = trendDesign(task.kind, task.w, { period: part.period, firstSeason, harmonics: part.harmonics, seasonalDifferencing: part.seasonalDifferencing });
  return { ...model, design };
}

/**
 * Both models, the stochastic one in a worker thread when there are threads to spare and the
 * searches are seasonal (a plain search takes milliseconds, less than a worker's start).
 */
export async function fitBothModels(tasks: Record<TrendModelKind, ModelTask>, threads: number | undefined): Promise<Record<TrendModelKind, ModelFit>> {
  const seasonal = tasks.deterministic.options.seasonal !== undefined;
  if (!seasonal || (threads ?? availableParallelism()) < 2) {
    return { deterministic: fitModel(tasks.deterministic), stochastic: fitModel(tasks.stochastic) };
  }
  // A thread of its own rather than a pool: it gets the task with its start, so it works while
  // this thread runs the other search without yielding to the event loop.
  const worker = new Worker(new URL(workerModule(import.meta.url, 'fitModelTask', 'fitModelTask')), { workerData: { [TASK_KEY]: tasks.stochastic } });
  const elsewhere = new Promise<ModelTaskResult>((resolve, reject) => {
    worker.once('message', resolve);
    worker.once('error', reject);
    worker.once('exit', (code) => reject(new Error(`fitModelTask: the worker stopped (exit code ${code}) before its result`)));
  });
  // A failure in this thread must not leave the worker's promise unobserved.
  elsewhere.catch(() => undefined);
  try {
    const deterministic = fitModel(tasks.deterministic);
    return { deterministic, stochastic: withDesign(tasks.stochastic, await elsewhere) };
  } finally {
    await worker.terminate();
  }
}

/** The key of `workerData` that marks a thread started by `fitBothModels` (a pool's threads carry other data). */
const TASK_KEY = 'trendbriefModelTask';

if (!isMainThread && parentPort !== null && typeof workerData === 'object' && workerData !== null && TASK_KEY in workerData) {
  parentPort.postMessage(fitModelTask((workerData as Record<typeof TASK_KEY, ModelTask>)[TASK_KEY]));
}
