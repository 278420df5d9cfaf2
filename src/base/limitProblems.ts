// Orders problems by line and folds long runs of one kind into a summary, so a file with a
// thousand bad lines still reads as a short list that names every line.

import { abbreviateList, plural, problem, type InputProblem } from './problem.js';

/** Problems of one code listed in full before the rest are summarised. */
export const MAX_PROBLEMS_PER_CODE = 20;

function byLine(a: InputProblem, b: InputProblem): number {
  if (a.line === b.line) return 0;
  if (a.line === undefined) return 1;
  if (b.line === undefined) return -1;
  return a.line - b.line;
}

/** Sorted by line (problems about the whole file last); beyond `max` per code, one summary lists the remaining lines. */
export function limitProblems(problems: readonly InputProblem[], max = MAX_PROBLEMS_PER_CODE): InputProblem[] {
  const sorted = [...problems].sort(byLine);
  const kept: InputProblem[] = [];
  const extraLines = new Map<string, { like: InputProblem; lines: number[] }>();
  const counts = new Map<string, number>();
  for (const item of sorted) {
    const count = (counts.get(item.code) ?? 0) + 1;
    counts.set(item.code, count);
    if (count <= max || item.line === undefined) {
      kept.push(item);
      continue;
    }
    const extra = extraLines.get(item.code);
    if (extra === undefined) extraLines.set(item.code, { like: item, lines: [item.line] });
    else extra.lines.push(item.line);
  }
  const summaries = [...extraLines.values()].map(({ like, lines }) => moreOfTheSame(like, lines));
  return [...kept, ...summaries].sort(byLine);
}

/** The summary that stands for the problems of one kind beyond the limit. */
function moreOfTheSame(like: InputProblem, lines: readonly number[]): InputProblem {
  return problem(like.code, `and ${plural(lines.length, 'more line')} with this kind of problem: ${abbreviateList(lines.map(String))}`, like.hint, {
    file: like.file,
    line: lines[0],
    field: like.field,
    sheet: like.sheet,
  });
}
