// The naive yardsticks at seasonal period s: every future value equals the last observed
// value of the same season, ŷ_{T+h} = y_{T+h−s·⌈h/s⌉} (Hyndman & Athanasopoulos, Forecasting:
// Principles and Practice, 3rd ed., §5.2, from memory). s = 1 is the no-change forecast,
// s = 4 or 12 the seasonal naive one of quarterly or monthly data.
//
// Its predictive is the seasonal random walk without drift on the model scale,
// w_t = w_{t−s} + ε_t: the s seasons are s independent random walks, so h steps ahead lie
// ⌈h/s⌉ steps of their own season's walk away, N(w_{T+h−s⌈h/s⌉}, ⌈h/s⌉·σ²), σ² the mean
// squared lag-s change in the window (same book, §5.5, the benchmark standard deviations
// σ√h and σ√(k + 1), k = ⌊(h − 1)/s⌋, from memory). A season whose last value is missing is
// forecast from its latest observed value, one more step of its walk per cycle back.
//
// Its in-sample mean absolute lag-s error is the MASE scale (Hyndman & Koehler 2006, Int. J.
// Forecasting 22, §3.4, for s = 1; with the seasonal naive error for seasonal data as in
// Hyndman & Athanasopoulos, Forecasting: Principles and Practice, 2nd ed., §3.4, from memory).

export interface NaiveMoments {
  mean: number[];
  se: number[];
}

/** h = 1..horizon moments of the naive forecast at seasonal period `period` (1: no change) from the window w. */
export function naiveForecast(w: ArrayLike<number>, horizon: number, period = 1): NaiveMoments {
  checkPeriod('naiveForecast', w.length, period);
  // Observed pairs one period apart only: a missing value breaks the changes around it.
  let squares = 0;
  let pairs = 0;
  for (let t = period; t < w.length; t++) {
    const change = w[t] - w[t - period];
    if (Number.isNaN(change)) continue;
    squares += change * change;
    pairs++;
  }
  const sigma = Math.sqrt(squares / pairs);
  const mean: number[] = [];
  const se: number[] = [];
  for (let h = 1; h <= horizon; h++) {
    let cycles = Math.ceil(h / period);
    let index = w.length - 1 + h - period * cycles;
    while (index >= period && Number.isNaN(w[index])) {
      index -= period;
      cycles++;
    }
    mean.push(w[index]);
    se.push(sigma * Math.sqrt(cycles));
  }
  return { mean, se };
}

/** Mean of |y_t − y_{t−s}| over observed pairs: the in-sample naive MAE at seasonal period s (1: one-step no change). */
export function inSampleNaiveMae(y: ArrayLike<number>, period = 1): number {
  checkPeriod('inSampleNaiveMae', y.length, period);
  let sum = 0;
  let pairs = 0;
  for (let t = period; t < y.length; t++) {
    const change = Math.abs(y[t] - y[t - period]);
    if (Number.isNaN(change)) continue;
    sum += change;
    pairs++;
  }
  return sum / pairs;
}

function checkPeriod(name: string, length: number, period: number): void {
  if (!(Number.isInteger(period) && period >= 1)) throw new RangeError(`${name} needs a whole seasonal period of at least 1`);
  if (length < period + 1) throw new RangeError(`${name} needs at least one observation more than the seasonal period`);
}
