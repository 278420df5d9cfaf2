// The full analysis behind a memo: both models with their evidence (analyseSeries), the
// rolling-origin backtest at the same settings, and the recommendation rule on top.
//   Series ─analyseSeries─▶ record ─runBacktest─▶ record.backtest ─recommendModel─▶ record.recommendation
import { InputError, formatProblem } from '../errors.js';
import type { Series } from '../data/series.js';
import { runBacktest, type BacktestOptions } from '../backtest/index.js';
import { analyseSeries, type AnalysisOptions } from './analyseSeries.js';
import type { AnalysisRecord } from './record.js';
import { recommendModel, type RecommendationOptions } from './recommendModel.js';

export interface CompleteAnalysisOptions extends AnalysisOptions {
  /** Backtest settings; false skips the backtest. Levels, transform and orders follow the analysis. */
  backtest?: Omit<BacktestOptions, 'levels' | 'transform' | 'coefficientUncertainty' | 'point' | 'maxP' | 'maxQ' | 'orders'> | false;
  recommendation?: RecommendationOptions;
}

export async function completeAnalysis(series: Series, options: CompleteAnalysisOptions = {}): Promise<AnalysisRecord> {
  const record = analyseSeries(series, options);
  if (options.backtest !== false) {
    const backtestOptions = options.backtest ?? {};
    const refit = backtestOptions.refit ?? 'reselect';
    try {
      record.backtest = await runBacktest(
        { values: series.values, periods: series.periods },
        {
          ...backtestOptions,
          levels: record.settings.levels,
          transform: options.transform,
          coefficientUncertainty: record.settings.coefficient_uncertainty,
          point: record.settings.point,
          maxP: record.settings.max_p,
          maxQ: record.settings.max_q,
          significance: record.settings.significance,
          // Orders chosen on the full sample, for the policies that keep them (a look-ahead the record notes).
          orders:
            refit === 'reselect'
              ? undefined
              : {
                  deterministic: { p: record.models.deterministic.p, q: record.models.deterministic.q },
                  stochastic: { p: record.models.stochastic.p, q: record.models.stochastic.q },
                },
        },
      );
    } catch (error) {
      // A series too short to backtest still gets a memo; the reason is recorded and shown.
      if (!(error instanceof InputError)) throw error;
      record.backtest = null;
      record.backtest_unavailable = error.problems.map((problem) => formatProblem({ ...problem, file: undefined })).join(' ');
    }
  }
  record.recommendation = recommendModel(
    { verdict: record.evidence.reading.verdict, backtest: record.backtest ?? undefined },
    { significance: record.settings.significance, ...options.recommendation },
  );
  return record;
}
