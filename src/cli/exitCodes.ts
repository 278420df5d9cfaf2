// The command line's exit codes: 0 success, 1 a defect in our code (the only case with a stack
// trace), 2 bad input or usage, 3 a memo that verify finds different from what its inputs give.
export const EXIT = { ok: 0, internal: 1, input: 2, mismatch: 3 } as const;
