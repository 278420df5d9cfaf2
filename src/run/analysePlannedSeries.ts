// One series of a config → its AnalysisRecord at the config's settings: both models, the
// evidence, the backtest and the recommendation. Runs in the main thread or in a worker.
import { completeAnalysis } from '../analysis/completeAnalysis.js';
import type { AnalysisRecord } from '../analysis/record.js';
import { toAnalysisOptions } from '../config/toAnalysisOptions.js';
import type { SeriesPlan } from '../config/runPlan.js';
import type { Series } from '../data/series.js';

export interface SeriesTask {
  plan: SeriesPlan;
  series: Series;
  /** Threads for the backtest; 1 inside a worker, where the series itself is the unit of work. */
  threads?: number;
}

export async function analysePlannedSeries({ plan, series, threads }: SeriesTask): Promise<AnalysisRecord> {
  const { settings } = plan;
  const record = await completeAnalysis(series, {
    ...toAnalysisOptions(plan),
    backtest: {
      origins: settings.backtest.origins.value,
      horizon: settings.backtest.horizon.value,
      refit: settings.backtest.refit.value,
      window: settings.backtest.window.value,
      minTrainingLength: settings.backtest.minTrain.value,
      threads,
    },
    recommendation: {
      rule: settings.recommendation.rule.value,
      significance: settings.recommendation.significance.value,
      model: settings.recommendation.model.value,
      justification: settings.recommendation.justification.value,
    },
  });
  // The record names the data file as the config wrote it, never a path on this machine.
  record.series.source.file = plan.fileAsWritten;
  return record;
}
