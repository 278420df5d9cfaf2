// Batch progress and fit progress (our spec): a line redrawn in place on a terminal, plain lines elsewhere.
import { describe, expect, it } from 'vitest';
import { fitProgress, progressReporter } from '../../src/cli/progressReporter.js';

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

describe('fitProgress', () => {
  it('redraws the stage and the origins done with the time elapsed on a terminal, and wipes the line at the end', () => {
    let out = '';
    let clock = 0;
    const progress = fitProgress({ write: (text) => (out += text), isTTY: true }, () => clock);
    progress.stage('backtest');
    clock = 1500;
    progress.origins(3, 20);
    expect(out).toBe('\rbacktest, 0.0 s\rbacktest: 3/20 origins, 1.5 s');
    progress.finish();
    // The last line drawn was 29 characters: wiped with as many spaces, the cursor back at the start.
    expect(out.endsWith(`\r${' '.repeat(29)}\r`)).toBe(true);
    expect(out).not.toContain('\n');
  });

  it('prints one line per stage and no counts when not on a terminal, and nothing without a target', () => {
    let out = '';
    const progress = fitProgress({ write: (text) => (out += text), isTTY: false });
    progress.stage('fitting both models');
    progress.stage('backtest');
    progress.origins(5, 20);
    progress.finish();
    expect(out).toBe('fitting both models\nbacktest\n');
    const silent = fitProgress(undefined);
    expect(() => {
      silent.stage('backtest');
      silent.origins(1, 2);
      silent.finish();
    }).not.toThrow();
  });
});
