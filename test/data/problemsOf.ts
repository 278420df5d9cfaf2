// Test helper: the problems an InputError carries, failing the test when nothing is thrown.

import { InputError, type InputProblem } from '../../src/base/problem.js';

export function problemsOf(run: () => unknown): readonly InputProblem[] {
  try {
    run();
  } catch (error) {
    if (error instanceof InputError) return error.problems;
    throw error;
  }
  throw new Error('expected an InputError, but the input was accepted');
}

/** The problems as `code@line` strings, a compact form for comparing whole lists. */
export function codesAndLines(problems: readonly InputProblem[]): string[] {
  return problems.map((item) => `${item.code}@${item.line ?? '-'}`);
}
