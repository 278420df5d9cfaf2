// The order a batch runs its configs in (our spec: DEVELOPERS.md "Batches of as-of memos"):
// as given, except that the as-of memos of one memo id run in period order, each waiting for
// the earlier periods of its memo.
import { describe, expect, it } from 'vitest';
import { batchOrder } from '../../src/cli/batchOrder.js';

describe('batchOrder', () => {
  it('runs one memo id in period order in the places its configs hold, and leaves other ids where they are', () => {
    const { order, after } = batchOrder([
      { idFolder: 'out/a', asOf: '2025-12' },
      { idFolder: 'out/b', asOf: '2025-12' },
      { idFolder: 'out/a', asOf: '2025-10' },
      {},
      { idFolder: 'out/a', asOf: '2025-11' },
    ]);
    // Slots 0, 2 and 4 belong to memo a: filled with 2025-10 (index 2), 2025-11 (4), 2025-12 (0).
    expect(order).toEqual([2, 1, 4, 3, 0]);
    expect(after).toEqual([[2, 4], [], [], [], [2]]);
  });

  it('waits only for periods that end earlier: 2024-Q4 and 2024-12 end in the same month', () => {
    const { order, after } = batchOrder([
      { idFolder: 'out/a', asOf: '2024-12' },
      { idFolder: 'out/a', asOf: '2024-Q4' },
      { idFolder: 'out/a', asOf: '2024-11' },
      { idFolder: 'out/a' },
    ]);
    // findEarlierRecord's recency (2024-12 after 2024-Q4 after 2024-11); the memo without an as-of period keeps its place.
    expect(order).toEqual([2, 1, 0, 3]);
    expect(after).toEqual([[2], [2], [], []]);
  });
});
