// The recommendation's sentences print numbers as the memo does: four significant figures with
// thousands grouped (memo/format/formatNumber.ts; common practice in English prose). The scores
// below are the demo's bulk deliveries' average 95% interval scores at h = 8 to 15.
import { describe, expect, it } from 'vitest';
import { recommendationWording } from '../../src/analysis/recommendationWording.js';

describe('the backtest sentence of the recommendation', () => {
  it('groups thousands in the scores it quotes', () => {
    expect(recommendationWording.scores(95, [8, 9, 10, 11, 12, 13, 14, 15], 5591.27, 12340.4, true)).toBe(
      'Backtest: at h = 8 to 15 the average 95% interval score was 5,591 for the deterministic trend and 12,340 for the stochastic trend (lower is better): the deterministic trend scored lower, at every one of them.',
    );
  });

  it('leaves scores below a thousand as they were', () => {
    expect(recommendationWording.scores(80, [4, 5], 40.2163, 34.0612, false)).toBe(
      'Backtest: at h = 4, 5 the average 80% interval score was 40.22 for the deterministic trend and 34.06 for the stochastic trend (lower is better): the stochastic trend scored lower.',
    );
  });
});
