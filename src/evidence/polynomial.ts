// Response surfaces (MacKinnon 1994, 2010) are polynomials with the constant term first.

/** Σ c_i x^i for coefficients c_0, c_1, ... by Horner's rule. */
export function polynomial(coefficients: readonly number[], x: number): number {
  let value = 0;
  for (let i = coefficients.length - 1; i >= 0; i--) value = value * x + coefficients[i];
  return value;
}
