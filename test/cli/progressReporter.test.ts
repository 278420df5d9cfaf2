// Batch progress and fit progress (our spec): a line redrawn in place on a terminal, plain lines elsewhere.
import { describe, expect, it } from 'vitest';
import { fitProgress, progressReporter } from '../../src/cli/progressReporter.js';

describe('progressReporter', () => {
  it('draws what is done out of how many and the time left on a terminal, and ends the line once', () => {
    let out = '';
    let clock = 0;
    const progress = progressReporter(4, 2, { write: (text) => (out += text), isTTY: true }, () => clock);
    progress.start();
    clock = 2000;
    progress.seriesDone('a', 's1');
    // 2 s for the first of four series: about 6 s for the other three.
    expect(out).toContain('1 of 4 series analysed, 0 of 2 memos finished, about 6 s left');
    progress.finish();
    progress.finish();
    expect(out.endsWith('\n')).toBe(true);
    expect(out.split('\n')).toHaveLength(2);
  });

  it('prints a line when it starts and one per series and memo, each with the time since the start, when not on a terminal', () => {
    let out = '';
    let clock = 0;
    const progress = progressReporter(3, 2, { write: (text) => (out += text), isTTY: false }, () => clock);
    progress.start();
    clock = 1250;
    progress.seriesDone('harbour-outlook', 'cargo');
    clock = 2000;
    progress.memoDone('harbour-outlook', 'written');
    clock = 2100;
    progress.memoDone('configs/broken.yaml', 'failed');
    progress.finish();
    expect(out).toBe(
      [
        'run: 2 memos, 3 series to analyse',
        'series 1 of 3 analysed: cargo (memo harbour-outlook), 1.3 s',
        'memo 1 of 2 written: harbour-outlook, 2.0 s',
        'memo 2 of 2 failed: config configs/broken.yaml (see the problems above), 2.1 s',
        '',
      ].join('\n'),
    );
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
