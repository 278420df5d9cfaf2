// Progress of a batch on stderr: on a terminal one line redrawn in place (a bar, counts and
// the time left at the pace so far); elsewhere one plain line per finished memo; nothing
// with --quiet. Only for people watching: nothing here reaches an output file.
export interface ProgressReporter {
  seriesDone(memoId: string, seriesId: string): void;
  memoDone(memoId: string, ok: boolean): void;
  finish(): void;
}

export interface ProgressTarget {
  write(text: string): void;
  isTTY: boolean;
}

const BAR_WIDTH = 24;

export function progressReporter(totalSeries: number, totalMemos: number, target: ProgressTarget | undefined, now: () => number = Date.now): ProgressReporter {
  if (target === undefined) return { seriesDone: () => undefined, memoDone: () => undefined, finish: () => undefined };
  const started = now();
  let series = 0;
  let memos = 0;
  let drawn = false;
  const draw = (): void => {
    drawn = true;
    const share = totalSeries === 0 ? 1 : series / totalSeries;
    const filled = Math.round(share * BAR_WIDTH);
    const elapsed = (now() - started) / 1000;
    const left = series === 0 ? '' : `, about ${Math.ceil((elapsed / series) * (totalSeries - series))} s left`;
    target.write(`\r[${'#'.repeat(filled)}${'.'.repeat(BAR_WIDTH - filled)}] ${series}/${totalSeries} series, ${memos}/${totalMemos} memos${left}   `);
  };
  return {
    seriesDone() {
      series++;
      if (target.isTTY) draw();
    },
    memoDone(memoId, ok) {
      memos++;
      if (target.isTTY) draw();
      else target.write(`${ok ? 'done' : 'failed'}: memo ${memoId} (${memos}/${totalMemos} memos, ${series}/${totalSeries} series)\n`);
    },
    finish() {
      // End the redrawn line, once, so whatever is printed next starts on a fresh line.
      if (drawn) target.write('\n');
      drawn = false;
    },
  };
}
