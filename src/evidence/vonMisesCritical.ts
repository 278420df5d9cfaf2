// Asymptotic critical values of the Canova-Hansen statistic: upper quantiles of the generalised
// von Mises distribution VM(p) with p restrictions, computed by inverting its characteristic
// function (vonMisesDistribution.ts, `vonMisesQuantile`) and rounded to 5 decimals. Canova &
// Hansen (1995), Table 1, give the same quantiles from simulation to 3 significant figures;
// test/evidence/vonMisesDistribution.test.ts holds these against that table, against Anderson &
// Darling (1952) for p = 1 and against an independent computation in R.
import type { SeasonalCritical } from './types.js';

/** [10%, 5%, 1%] for p = 1..11. */
const CRITICAL: readonly (readonly [number, number, number])[] = [
  [0.3473, 0.46136, 0.74346],
  [0.60704, 0.74752, 1.07366],
  [0.84116, 1.00018, 1.3586],
  [1.06311, 1.2373, 1.62263],
  [1.27769, 1.46506, 1.874],
  [1.4872, 1.68639, 2.11667],
  [1.69298, 1.90299, 2.35287],
  [1.89585, 2.11588, 2.58403],
  [2.09637, 2.32581, 2.81111],
  [2.29495, 2.53326, 3.0348],
  [2.49189, 2.73862, 3.25561],
];

/** The largest number of restrictions tabulated: s − 1 for monthly data. */
export const MAX_TABULATED_RESTRICTIONS = CRITICAL.length;

/** Critical values of VM(p) at 10%, 5% and 1%, keyed by size in percent. */
export function vonMisesCritical(p: number): SeasonalCritical {
  if (!Number.isInteger(p) || p < 1 || p > CRITICAL.length) {
    throw new Error(`vonMisesCritical needs a whole number of restrictions from 1 to ${CRITICAL.length}`);
  }
  const [ten, five, one] = CRITICAL[p - 1];
  return { '10': ten, '5': five, '1': one };
}
