import { describe, expect, it } from 'vitest';
import { intervalScore } from '../../src/backtest/intervalScore.js';
import { expectRelative } from '../evidence/expectRelative.js';

// Hand-worked from Gneiting & Raftery (2007), eq. 43: S = (u − l) + (2/α)(l − y)1{y < l} + (2/α)(y − u)1{y > u}.
describe('intervalScore', () => {
  it('is the width when the outcome falls inside, limits included', () => {
    expect(intervalScore(1, 3, 80, 2)).toBe(2);
    expect(intervalScore(1, 3, 80, 3)).toBe(2);
  });

  it('adds 2/α times the miss below and above', () => {
    // 80%: α = 0.2, 2/α = 10. Above: 2 + 10·(4 − 3) = 12. Below: 2 + 10·(1 − 0.5) = 7.
    expectRelative(intervalScore(1, 3, 80, 4), 12, 1e-12);
    expectRelative(intervalScore(1, 3, 80, 0.5), 7, 1e-12);
    // 95%: α = 0.05, 2/α = 40. 4 + 40·(10.5 − 10) = 24.
    expectRelative(intervalScore(6, 10, 95, 10.5), 24, 1e-12);
  });

  it('rejects a level outside (0, 100)', () => {
    expect(() => intervalScore(1, 3, 100, 2)).toThrow(/strictly between 0 and 100/);
  });
});
