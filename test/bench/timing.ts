// Small timing helpers for `npm run bench` (wall-clock medians after a warm-up run).
export interface BenchRow {
  name: string;
  ms: number;
  /** Target in milliseconds, where the issue sets one. */
  target?: number;
  /** Extra figures, e.g. peak memory in MB. */
  extra?: Record<string, number>;
}

export function timeRuns(run: () => unknown, repeats: number): number[] {
  run();
  const times: number[] = [];
  for (let i = 0; i < repeats; i++) {
    const start = performance.now();
    run();
    times.push(performance.now() - start);
  }
  return times;
}

export function median(values: readonly number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = Math.floor(sorted.length / 2);
  return sorted.length % 2 === 1 ? sorted[mid] : 0.5 * (sorted[mid - 1] + sorted[mid]);
}
