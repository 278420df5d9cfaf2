import { expect } from 'vitest';

/** Asserts |actual − expected| ≤ tolerance·|expected| (exact equality when expected is 0). */
export function expectRelative(actual: number, expected: number, tolerance: number): void {
  const allowed = tolerance * Math.abs(expected);
  expect(Math.abs(actual - expected), `${actual} vs ${expected}`).toBeLessThanOrEqual(allowed);
}
