// A fitted trend model's joint forecast-error covariance over a window of horizons
// (statespace/forecastCovariance.ts), from the same state, integration and coefficient
// covariance its forecasts use (forecastTrendModel), so its diagonal is their variances.
import { forecastCovariance, type CovarianceWindow, type ForecastCovariance } from '../statespace/forecastCovariance.js';
import { createProfileLikelihood } from './profileLikelihood.js';
import type { ForecastInput } from '../statespace/forecast.js';
import type { GapSums } from '../statespace/filterWorkspace.js';
import { designIntegration, designWorkspace, type TrendDesign, type TrendModelFit } from './trendModels.js';

export type { CovarianceWindow, ForecastCovariance } from '../statespace/forecastCovariance.js';

/** Cov of the model-scale forecast errors at horizons window.first..window.last: process part and total. */
export function jointForecastCovariance(model: TrendModelFit, window: CovarianceWindow): ForecastCovariance {
  return designForecastCovariance(model.design, model.fit, window);
}

/** The same from a design and the filtered state at its end (as forecastDesign takes them). */
export function designForecastCovariance(design: TrendDesign, input: ForecastInput & { pending?: GapSums }, window: CovarianceWindow): ForecastCovariance {
  const integrate = designIntegration(design, input.pending);
  const pendingCovariance = integrate !== undefined && 'pending' in integrate && integrate.pending !== undefined ? pendingSeasonCovariance(design, input) : undefined;
  return forecastCovariance(input, design.futureRows(window.last), window, { integrate, ...(pendingCovariance === undefined ? {} : { pendingCovariance }) });
}

/**
 * How the pending changes of the seasons whose last levels are missing move together, by
 * forecast season (/ σ²): the gap filter keeps them in its augmented covariance (state, then
 * one running sum per filter season; gapFilter.ts), which the fit does not copy out, so the
 * design is filtered again at the fit's coefficients (the covariances do not depend on the data).
 */
function pendingSeasonCovariance(design: TrendDesign, fit: Pick<ForecastInput, 'ar' | 'ma'>): Float64Array | undefined {
  const levels = design.seasonalIntegration;
  if (levels === undefined) return undefined;
  const likelihood = createProfileLikelihood(design.response, design.regressors, fit.ar.length, fit.ma.length, designWorkspace(design));
  likelihood.atCoefficients(fit.ar, fit.ma, true);
  const { gaps, r } = likelihood.workspace;
  if (gaps === undefined) return undefined;
  const { period } = levels;
  const d = r + period;
  const from = (q: number): number => (levels.filterSeasonOffset + q) % period;
  return Float64Array.from({ length: period * period }, (_, index) => {
    const a = from(Math.floor(index / period));
    const b = from(index % period);
    return gaps.open[a] === 1 && gaps.open[b] === 1 ? gaps.cov[(r + a) * d + r + b] : 0;
  });
}
