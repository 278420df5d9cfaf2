// The model-scale forecasts of every origin turned into the record's rows: each method's
// predictive on the data's scale beside the actual, and, per method and horizon, the list
// of forecasts the scores are computed from (in origin order, so the comparison pairs them).
// The yardsticks are computed here from the window itself: no change, and for a seasonal
// period s > 1 the seasonal naive forecast, whose in-sample error is then the MASE scale.
import { TREND_MODELS, type AnalysisSettings } from '../base/settings.js';
import { backTransformForecast } from '../base/transform.js';
import {
  finiteOrNull,
  FORECAST_METHODS,
  type BacktestForecast,
  type BacktestMethod,
  type OriginRecord,
} from './backtestRecord.js';
import type { OriginForecast } from './forecastAtOrigin.js';
import { inSampleNaiveMae, naiveForecast } from './naiveForecast.js';
import type { PlannedOrigin } from './planOrigins.js';
import type { BacktestData } from './readBacktestInput.js';
import type { ScoredForecast } from './scoreHorizon.js';

export interface CollectedForecasts {
  origins: OriginRecord[];
  forecasts: BacktestForecast[];
  /** The methods scored, in record order: FORECAST_METHODS, then `seasonal_naive` when the period is above 1. */
  methods: BacktestMethod[];
  /** scored[method][h − 1]: one forecast per origin (no rows for a method not in `methods`). */
  scored: Record<BacktestMethod, ScoredForecast[][]>;
}

/** `results[i · 2 + j]` is origin i's forecast by TREND_MODELS[j]; `period` is the seasonal period s (1: not seasonal). */
export function collectForecasts(
  data: BacktestData,
  planned: readonly PlannedOrigin[],
  results: readonly OriginForecast[],
  settings: AnalysisSettings,
  period: number,
): CollectedForecasts {
  const { transform, point, levels } = settings;
  const { horizon } = settings.backtest;
  const label = (index: number): string | null => (data.periods === null ? null : data.periods[index]);
  const methods: BacktestMethod[] = period > 1 ? [...FORECAST_METHODS, 'seasonal_naive'] : [...FORECAST_METHODS];
  const byHorizon = (): ScoredForecast[][] => Array.from({ length: horizon }, () => []);
  const scored: Record<BacktestMethod, ScoredForecast[][]> = { deterministic: byHorizon(), stochastic: byHorizon(), naive: byHorizon(), seasonal_naive: byHorizon() };
  const origins: OriginRecord[] = [];
  const forecasts: BacktestForecast[] = [];
  planned.forEach(({ start, end }, i) => {
    // Every method's MASE at this origin shares one scale: the lag-s seasonal naive error (lag 1 when not seasonal).
    const maseScale = inSampleNaiveMae(data.y.subarray(start, end), period);
    const window = data.w.subarray(start, end);
    const models = {} as OriginRecord['models'];
    const predictives: { method: BacktestMethod; mean: number[]; se: number[] }[] = TREND_MODELS.map((kind, j) => {
      const result = results[i * TREND_MODELS.length + j];
      models[kind] = { p: result.p, q: result.q, loglik: result.loglik === null ? null : finiteOrNull(result.loglik), converged: result.converged };
      return { method: kind, mean: result.mean, se: settings.coefficient_uncertainty ? result.seTotal : result.seProcess };
    });
    predictives.push({ method: 'naive', ...naiveForecast(window, horizon) });
    if (period > 1) predictives.push({ method: 'seasonal_naive', ...naiveForecast(window, horizon, period) });
    origins.push({ length: end, period: label(end - 1), training_length: end - start, mase_scale: finiteOrNull(maseScale), models });
    for (const { method, mean: means, se: ses } of predictives) {
      for (let h = 1; h <= horizon; h++) {
        const target = end + h - 1;
        const mean = means[h - 1];
        const se = ses[h - 1];
        const onDataScale = backTransformForecast(transform, point, levels, mean, se);
        const actual = data.y[target];
        forecasts.push({ origin: end, origin_period: label(end - 1), model: method, h, period: label(target), actual, ...onDataScale, model_scale: { mean, se } });
        // A missing actual cannot be scored; every method skips it alike, so pairs stay aligned.
        if (!Number.isNaN(actual)) scored[method][h - 1].push({ actual, ...onDataScale, mean, se, modelActual: data.w[target], maseScale });
      }
    }
  });
  return { origins, forecasts, methods, scored };
}
