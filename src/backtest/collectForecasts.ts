// The model-scale forecasts of every origin turned into the record's rows: each method's
// predictive on the data's scale beside the actual, and, per method and horizon, the list
// of forecasts the scores are computed from (in origin order, so the comparison pairs them).
import { TREND_MODELS, type AnalysisSettings } from '../base/settings.js';
import { backTransformForecast } from '../base/transform.js';
import {
  finiteOrNull,
  FORECAST_METHODS,
  type BacktestForecast,
  type ForecastMethod,
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
  /** scored[method][h − 1]: one forecast per origin. */
  scored: Record<ForecastMethod, ScoredForecast[][]>;
}

/** `results[i · 2 + j]` is origin i's forecast by TREND_MODELS[j]. */
export function collectForecasts(
  data: BacktestData,
  planned: readonly PlannedOrigin[],
  results: readonly OriginForecast[],
  settings: AnalysisSettings,
): CollectedForecasts {
  const { transform, point, levels } = settings;
  const { horizon } = settings.backtest;
  const label = (index: number): string | null => (data.periods === null ? null : data.periods[index]);
  const scored = {} as CollectedForecasts['scored'];
  for (const method of FORECAST_METHODS) scored[method] = Array.from({ length: horizon }, () => []);
  const origins: OriginRecord[] = [];
  const forecasts: BacktestForecast[] = [];
  planned.forEach(({ start, end }, i) => {
    const maseScale = inSampleNaiveMae(data.y.subarray(start, end));
    const models = {} as OriginRecord['models'];
    const moments = {} as Record<ForecastMethod, { mean: number[]; se: number[] }>;
    TREND_MODELS.forEach((kind, j) => {
      const result = results[i * TREND_MODELS.length + j];
      models[kind] = { p: result.p, q: result.q, loglik: result.loglik === null ? null : finiteOrNull(result.loglik), converged: result.converged };
      moments[kind] = { mean: result.mean, se: settings.coefficient_uncertainty ? result.seTotal : result.seProcess };
    });
    moments.naive = naiveForecast(data.w.subarray(start, end), horizon);
    origins.push({ length: end, period: label(end - 1), training_length: end - start, mase_scale: finiteOrNull(maseScale), models });
    for (const method of FORECAST_METHODS) {
      for (let h = 1; h <= horizon; h++) {
        const target = end + h - 1;
        const mean = moments[method].mean[h - 1];
        const se = moments[method].se[h - 1];
        const onDataScale = backTransformForecast(transform, point, levels, mean, se);
        const actual = data.y[target];
        forecasts.push({ origin: end, origin_period: label(end - 1), model: method, h, period: label(target), actual, ...onDataScale, model_scale: { mean, se } });
        // A missing actual cannot be scored; every method skips it alike, so pairs stay aligned.
        if (!Number.isNaN(actual)) scored[method][h - 1].push({ actual, ...onDataScale, mean, se, modelActual: data.w[target], maseScale });
      }
    }
  });
  return { origins, forecasts, scored };
}
