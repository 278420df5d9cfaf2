// Progress of a batch: on a terminal one line on stderr redrawn in place (a bar, what is done
// out of how many, the time left at the pace so far); elsewhere (a log, a CI job) a line on
// stdout when the run starts and one per finished series and memo, each with the time since
// the start, before the summary;
// nothing with --quiet. Only for people watching: nothing here reaches an output file.
import { plural } from '../base/problem.js';

export interface ProgressReporter {
  /** Outside a terminal, the opening line: how much the run will do. */
  start(): void;
  seriesDone(memoId: string, seriesId: string): void;
  /** `name`: the memo id when it ran, the config's path when it failed before one was known; `outcome`: written, kept, revised or failed. */
  memoDone(name: string, outcome: string): void;
  finish(): void;
}

export interface ProgressTarget {
  write(text: string): void;
  isTTY: boolean;
}

const BAR_WIDTH = 24;

export function progressReporter(totalSeries: number, totalMemos: number, target: ProgressTarget | undefined, now: () => number = Date.now): ProgressReporter {
  if (target === undefined) return { start: () => undefined, seriesDone: () => undefined, memoDone: () => undefined, finish: () => undefined };
  const started = now();
  let series = 0;
  let memos = 0;
  let drawn = false;
  const seconds = (): string => `${((now() - started) / 1000).toFixed(1)} s`;
  const draw = (): void => {
    drawn = true;
    const share = totalSeries === 0 ? 1 : series / totalSeries;
    const filled = Math.round(share * BAR_WIDTH);
    const elapsed = (now() - started) / 1000;
    const left = series === 0 || series === totalSeries ? '' : `, about ${Math.ceil((elapsed / series) * (totalSeries - series))} s left`;
    target.write(`\r[${'#'.repeat(filled)}${'.'.repeat(BAR_WIDTH - filled)}] ${series} of ${totalSeries} series analysed, ${memos} of ${plural(totalMemos, 'memo')} finished${left}   `);
  };
  return {
    start() {
      if (!target.isTTY) target.write(`run: ${plural(totalMemos, 'memo')}, ${totalSeries} series to analyse\n`);
    },
    seriesDone(memoId, seriesId) {
      series++;
      if (target.isTTY) draw();
      else target.write(`series ${series} of ${totalSeries} analysed: ${seriesId} (memo ${memoId}), ${seconds()}\n`);
    },
    memoDone(name, outcome) {
      memos++;
      if (target.isTTY) draw();
      else target.write(`memo ${memos} of ${totalMemos} ${outcome}: ${outcome === 'failed' ? `config ${name} (see the problems above)` : name}, ${seconds()}\n`);
    },
    finish() {
      // End the redrawn line, once, so whatever is printed next starts on a fresh line.
      if (drawn) target.write('\n');
      drawn = false;
    },
  };
}

/** Progress of one `fit`: the stage it is at and, during a backtest, the origins done. */
export interface FitProgress {
  stage(name: string): void;
  origins(done: number, total: number): void;
  finish(): void;
}

/**
 * On a terminal one line redrawn in place (the stage, origins done of all, the time elapsed)
 * and wiped at the end, so what stays on the screen is the summary; elsewhere one line per
 * stage. Only ever written to stderr: stdout holds the summary or the record alone.
 */
export function fitProgress(target: ProgressTarget | undefined, now: () => number = Date.now): FitProgress {
  if (target === undefined) return { stage: () => undefined, origins: () => undefined, finish: () => undefined };
  const started = now();
  let shown = 0;
  let current = '';
  const elapsed = (): string => `${((now() - started) / 1000).toFixed(1)} s`;
  const draw = (text: string): void => {
    const line = `${text}, ${elapsed()}`;
    target.write(`\r${line.padEnd(shown)}`);
    shown = line.length;
  };
  return {
    stage(name) {
      current = name;
      if (target.isTTY) draw(name);
      else target.write(`${name}\n`);
    },
    origins(done, total) {
      if (target.isTTY) draw(`${current}: ${done}/${total} origins`);
    },
    finish() {
      if (target.isTTY && shown > 0) target.write(`\r${' '.repeat(shown)}\r`);
      shown = 0;
    },
  };
}
