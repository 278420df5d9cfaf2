// The command line's exit codes: 0 success, 1 a defect in our code (the only case with a stack
// trace), 2 bad input or usage, 3 a memo that verify finds different from what its inputs give,
// 4 the machine lacks something the tool needs (no Chromium for the PDF).
export const EXIT = { ok: 0, internal: 1, input: 2, mismatch: 3, environment: 4 } as const;

/** How bad each exit code is, for a batch that reports the worst: a defect, then the machine, then input. */
const SEVERITY: Readonly<Record<number, number>> = { 0: 0, 3: 1, 2: 2, 4: 3, 1: 4 };

/** The worse of two exit codes. */
export function worseExit(a: number, b: number): number {
  return (SEVERITY[b] ?? 0) > (SEVERITY[a] ?? 0) ? b : a;
}
