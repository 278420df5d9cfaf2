// The no-change (naive) yardstick: every future value equals the last observed one. Its
// predictive is a random walk without drift on the model scale, N(w_T, h·σ²) with σ² the
// mean squared one-step change in the window (Hyndman & Athanasopoulos, Forecasting:
// Principles and Practice, §5.5, from memory). Its in-sample one-step mean absolute error
// is the MASE scale (Hyndman & Koehler 2006, §3.4).

export interface NaiveMoments {
  mean: number[];
  se: number[];
}

/** h = 1..horizon moments of the no-change forecast from the window w. */
export function naiveForecast(w: ArrayLike<number>, horizon: number): NaiveMoments {
  if (w.length < 2) throw new RangeError('naiveForecast needs at least two observations');
  // Consecutive observed pairs only: a missing value breaks the one-step changes around it.
  let squares = 0;
  let pairs = 0;
  for (let t = 1; t < w.length; t++) {
    const change = w[t] - w[t - 1];
    if (Number.isNaN(change)) continue;
    squares += change * change;
    pairs++;
  }
  const sigma = Math.sqrt(squares / pairs);
  const last = w[w.length - 1];
  return {
    mean: Array.from({ length: horizon }, () => last),
    se: Array.from({ length: horizon }, (_, h) => sigma * Math.sqrt(h + 1)),
  };
}

/** Mean of |y_t − y_{t−1}| over consecutive observed pairs: the in-sample one-step no-change MAE. */
export function inSampleNaiveMae(y: ArrayLike<number>): number {
  if (y.length < 2) throw new RangeError('inSampleNaiveMae needs at least two observations');
  let sum = 0;
  let pairs = 0;
  for (let t = 1; t < y.length; t++) {
    const change = Math.abs(y[t] - y[t - 1]);
    if (Number.isNaN(change)) continue;
    sum += change;
    pairs++;
  }
  return sum / pairs;
}
