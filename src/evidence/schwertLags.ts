// Schwert (1989) lag rule l = ceil(12 (n/100)^{1/4}): the fixed KPSS truncation and the
// ceiling of the ADF lag search (the "l12" rule of Schwert's Monte Carlo study).

/** ceil(12 (n/100)^{1/4}) for a series of n observations. */
export function schwertLags(n: number): number {
  if (!Number.isInteger(n) || n < 1) throw new Error('schwertLags needs a positive whole n');
  return Math.ceil(12 * Math.pow(n / 100, 1 / 4));
}
