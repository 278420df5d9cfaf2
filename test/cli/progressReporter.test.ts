// Batch progress (our spec): a bar redrawn in place on a terminal, a line per memo elsewhere.
import { describe, expect, it } from 'vitest';
import { progressReporter } from '../../src/cli/progressReporter.js';

describe('progressReporter', () => {
  it('draws counts and the time left on a terminal, and ends the line once', () => {
    let out = '';
    let clock = 0;
    const progress = progressReporter(4, 2, { write: (text) => (out += text), isTTY: true }, () => clock);
    clock = 2000;
    progress.seriesDone('a', 's1');
    expect(out).toContain('1/4 series, 0/2 memos, about 6 s left');
    progress.finish();
    progress.finish();
    expect(out.endsWith('\n')).toBe(true);
    expect(out.split('\n')).toHaveLength(2);
  });

  it('prints one plain line per memo when not on a terminal', () => {
    let out = '';
    const progress = progressReporter(3, 2, { write: (text) => (out += text), isTTY: false });
    progress.seriesDone('a', 's1');
    progress.memoDone('a', true);
    progress.memoDone('b', false);
    progress.finish();
    expect(out).toBe('done: memo a (1/2 memos, 1/3 series)\nfailed: memo b (2/2 memos, 1/3 series)\n');
  });
});
