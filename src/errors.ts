// One error type for everything the user got wrong (config, CSV, options), and the
// single place where user-facing problem text lives. Each problem renders as one line:
//   file:line:column: field: what is wrong; what to do
// Internal failures are ordinary Errors and map to exit code 1.

/** Where in the user's input a problem sits; every part is optional. */
export interface InputLocation {
  file?: string;
  line?: number;
  column?: number;
  field?: string;
}

/** One problem with the user's input. */
export interface InputProblem extends InputLocation {
  /** Stable machine-readable code, e.g. `csv.gap`. */
  code: string;
  /** What is wrong. */
  message: string;
  /** What to do about it. */
  hint: string;
}

/** Thrown when input is bad; carries every problem found in one pass. */
export class InputError extends Error {
  readonly problems: readonly InputProblem[];

  constructor(problems: InputProblem | readonly InputProblem[]) {
    const list = Array.isArray(problems) ? [...problems] : [problems as InputProblem];
    super(list.map(formatProblem).join('\n'));
    this.name = 'InputError';
    this.problems = list;
  }
}

/** Renders a problem as `file:line:column: field: message; hint`, omitting absent parts. */
export function formatProblem(problem: InputProblem): string {
  const place: string[] = [];
  if (problem.file !== undefined) {
    place.push(problem.file);
    if (problem.line !== undefined) {
      place.push(String(problem.line));
      if (problem.column !== undefined) place.push(String(problem.column));
    }
  }
  const parts: string[] = [];
  if (place.length > 0) parts.push(place.join(':'));
  if (problem.field !== undefined) parts.push(problem.field);
  parts.push(`${problem.message}; ${problem.hint}`);
  return parts.join(': ');
}

/** Builds a problem; the one constructor callers use so wording stays in this module's style. */
export function problem(code: string, message: string, hint: string, at: InputLocation = {}): InputProblem {
  return { code, message, hint, ...at };
}
