// Test helpers: config text built line by line, so each expected line number can be read off
// the list, and the problems parseConfig reports for it.
import { parseConfig } from '../../src/config/parseConfig.js';
import type { RunPlan } from '../../src/config/runPlan.js';
import { formatProblem, type InputProblem } from '../../src/base/problem.js';
import { problemsOf } from '../data/problemsOf.js';

/** The smallest valid config: lines 1-6. */
export const BASE = ['memo:', '  id: water-outlook', '  title: Water outlook', 'series:', '  - id: inflow', '    file: data/inflow.csv'];

export const BASE_DIR = '/plans';

export function yaml(lines: readonly string[]): string {
  return `${lines.join('\n')}\n`;
}

export function planOf(lines: readonly string[]): RunPlan {
  return parseConfig(yaml(lines), 'memo.yaml', BASE_DIR);
}

export function problemsIn(lines: readonly string[]): readonly InputProblem[] {
  return problemsOf(() => planOf(lines));
}

/** The only problem the config has, as `line:column field code` plus the rendered line. */
export function onlyProblem(lines: readonly string[]): { where: string; code: string; text: string } {
  const problems = problemsIn(lines);
  if (problems.length !== 1) throw new Error(`expected one problem, got ${problems.length}:\n${problems.map(formatProblem).join('\n')}`);
  const [problem] = problems;
  return { where: `${problem.line}:${problem.column} ${problem.field}`, code: problem.code, text: formatProblem(problem) };
}
