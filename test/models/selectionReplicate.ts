// One replicate of the model-selection check (admissibleSelection.test.ts), a pure function of
// its task so it runs the same on a worker thread: both trend models searched over (3, 3) on
// the first n values of a seeded process, and what the check reads from the selections.
import { smallestMaRootModulus, smallestRootModulus } from '../../src/linalg/rootModulus.js';
import { fitTrendModel, forecastTrendModel } from '../../src/models/trendModels.js';
import { normalInv } from '../../src/linalg/distributions.js';
import { simulateProcess, processSeed, type TrendProcess } from '../support/trendProcesses.js';

/** The held-out step the coverage is read at. */
export const HELD_OUT = 10;

export interface SelectionTask {
  process: TrendProcess;
  n: number;
  rep: number;
}

export interface SelectionOutcome {
  /** Smallest AR or MA root modulus of each selected fit (Infinity without ARMA terms). */
  minRoot: { deterministic: number; stochastic: number };
  /** The deterministic trend's slope estimate and its standard error. */
  slope: number;
  slopeSe: number;
  /** Whether each model's 95% interval at h = HELD_OUT holds the held-out value. */
  covered: { deterministic: boolean; stochastic: boolean };
  order: { deterministic: number; stochastic: number };
}

export function selectionReplicate({ process, n, rep }: SelectionTask): SelectionOutcome {
  const y = simulateProcess(process, n + HELD_OUT, processSeed(process, n, rep));
  const w = y.slice(0, n);
  const actual = y[n + HELD_OUT - 1];
  const z = normalInv(0.975);
  const fits = { deterministic: fitTrendModel('deterministic', w, 3, 3), stochastic: fitTrendModel('stochastic', w, 3, 3) };
  const covered = (model: (typeof fits)['deterministic']): boolean => {
    const moments = forecastTrendModel(model, HELD_OUT);
    const mean = moments.mean[HELD_OUT - 1];
    const se = moments.seTotal[HELD_OUT - 1];
    return actual >= mean - z * se && actual <= mean + z * se;
  };
  const minRoot = (model: (typeof fits)['deterministic']): number => Math.min(smallestRootModulus(model.fit.ar) ?? Infinity, smallestMaRootModulus(model.fit.ma) ?? Infinity);
  return {
    minRoot: { deterministic: minRoot(fits.deterministic), stochastic: minRoot(fits.stochastic) },
    slope: fits.deterministic.coefficients.slope,
    slopeSe: fits.deterministic.stderr.regression.slope,
    covered: { deterministic: covered(fits.deterministic), stochastic: covered(fits.stochastic) },
    order: { deterministic: fits.deterministic.fit.p + fits.deterministic.fit.q, stochastic: fits.stochastic.fit.p + fits.stochastic.fit.q },
  };
}
