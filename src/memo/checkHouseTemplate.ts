// A consultancy's own template file checked when it loads, so that its faults are bad input at
// their file and line (exit 2), never an internal error while the memo renders: a script, web
// address or stylesheet import (the memo must stand alone), a partial that does not exist, or a
// helper Handlebars does not have (the memo registers none of its own).
import Handlebars from 'handlebars';
import { InputError, type InputProblem } from '../base/problem.js';
import { firstForbidden } from './format/selfContained.js';
import { templateMessages } from './messages.js';

/** The helpers Handlebars brings; the memo adds none. */
const KNOWN_HELPERS = new Set(['if', 'unless', 'each', 'with', 'lookup', 'log']);

interface Located {
  loc?: { start: { line: number } } | null;
}
interface PathLike {
  type: string;
  original?: unknown;
}
interface NodeLike extends Located {
  type: string;
  path?: PathLike;
  name?: PathLike;
  params?: NodeLike[];
  hash?: { pairs: { value: NodeLike }[] } | null;
  program?: { body: NodeLike[] } | null;
  inverse?: { body: NodeLike[] } | null;
  body?: NodeLike[];
}

function lineOf(node: Located): number {
  return node.loc?.start.line ?? 1;
}

/** Every fault in one template's syntax tree: unknown partials and unknown helpers, with their lines. */
function treeProblems(file: string, root: NodeLike, partials: readonly string[]): InputProblem[] {
  const problems: InputProblem[] = [];
  const visit = (node: NodeLike | null | undefined): void => {
    if (node === null || node === undefined) return;
    if (node.type === 'PartialStatement' || node.type === 'PartialBlockStatement') {
      const name = node.name?.type === 'PathExpression' ? String(node.name.original) : null;
      if (name !== null && !partials.includes(name)) problems.push(templateMessages.unknownPartial(file, lineOf(node), name, partials));
    }
    if (node.type === 'MustacheStatement' || node.type === 'BlockStatement' || node.type === 'SubExpression') {
      // A call with arguments is a helper call; a bare {{name}} reads a field.
      const called = (node.params?.length ?? 0) > 0 || (node.hash?.pairs.length ?? 0) > 0 || node.type === 'SubExpression';
      const name = node.path?.type === 'PathExpression' ? String(node.path.original) : null;
      if (called && name !== null && !KNOWN_HELPERS.has(name)) problems.push(templateMessages.unknownHelper(file, lineOf(node), name));
    }
    for (const child of [...(node.params ?? []), ...(node.hash?.pairs.map((pair) => pair.value) ?? [])]) visit(child);
    for (const child of [...(node.program?.body ?? []), ...(node.inverse?.body ?? []), ...(node.body ?? [])]) visit(child);
  };
  visit(root);
  return problems;
}

/** Throws an InputError naming the file and line of the first faults in a consultancy's template or stylesheet. */
export function checkHouseTemplate(file: string, source: string, partials: readonly string[]): void {
  const problems: InputProblem[] = [];
  const forbidden = firstForbidden(source);
  if (forbidden !== null) problems.push(templateMessages.forbidden(file, source.slice(0, forbidden.index).split('\n').length, forbidden.pattern.source.replace(/\\/g, '')));
  if (file.endsWith('.hbs')) problems.push(...treeProblems(file, Handlebars.parse(source) as unknown as NodeLike, partials));
  if (problems.length > 0) throw new InputError(problems);
}
