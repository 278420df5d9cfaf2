// YAML text → a plain tree of mappings, lists and scalars in which every node knows its line and
// column, so each later problem can point at the exact place. The yaml package parses with a
// LineCounter; this file turns its AST into our tree and resolves aliases within a fixed budget.
// Duplicate keys are kept, in order: the validator reports them, as it knows the field path.
import { isAlias, isMap, isScalar, isSeq, LineCounter, parseDocument, type Document, type Node as YamlAstNode } from 'yaml';
import { type InputProblem } from '../base/problem.js';
import { configMessages } from './messages.js';
import { unclosedQuoteOffset } from './unclosedQuote.js';

export interface Position {
  line: number;
  column: number;
}

export type YamlNode =
  | { kind: 'mapping'; at: Position; entries: YamlEntry[] }
  | { kind: 'list'; at: Position; items: YamlNode[] }
  | { kind: 'scalar'; at: Position; value: string | number | boolean | null };

export interface YamlEntry {
  key: string;
  keyAt: Position;
  value: YamlNode;
}

export interface YamlTree {
  /** Undefined when the text has no document, or when a problem left it unreadable. */
  root?: YamlNode;
  /** Problems found while reading; when `root` is set they concern single keys only (a key that is not a name). */
  problems: InputProblem[];
}

/**
 * Alias dereferences allowed in one config, counting those inside aliased content: a few
 * anchors for shared settings are fine, an exponential expansion ("billion laughs") is not.
 * The same bound as the yaml package's own `maxAliasCount` default.
 */
export const MAX_ALIAS_COUNT = 100;

class AliasBudgetExceeded extends Error {
  constructor(readonly at: Position) {
    super('alias budget exceeded');
  }
}

export function readYamlTree(text: string, file: string): YamlTree {
  const lines = new LineCounter();
  // The core schema even under a `%YAML 1.1` directive, so `yes` stays text and dates stay text;
  // duplicate keys are found below, where the full field path is known.
  const doc = parseDocument(text, { lineCounter: lines, prettyErrors: false, schema: 'core', resolveKnownTags: false, uniqueKeys: false });
  const positionOf = (offset: number): Position => {
    const { line, col } = lines.linePos(offset);
    return { line, column: col };
  };
  const faults = [...doc.errors, ...doc.warnings];
  if (faults.length > 0) {
    return {
      problems: faults.map((fault) => {
        const opened = fault.code === 'MISSING_CHAR' && /quote/i.test(fault.message) ? unclosedQuoteOffset(text) : undefined;
        if (opened !== undefined) return configMessages.syntax({ file, ...positionOf(opened) }, 'UNCLOSED_QUOTE', fault.message);
        return configMessages.syntax({ file, ...positionOf(fault.pos[0]) }, fault.code, fault.message);
      }),
    };
  }
  if (doc.contents === null) return { problems: [] };
  const problems: InputProblem[] = [];
  try {
    const root = convert(doc, doc.contents, { file, positionOf, problems, aliases: 0, aliasDepth: 0 });
    return { root, problems };
  } catch (error) {
    if (error instanceof AliasBudgetExceeded) return { problems: [configMessages.tooManyAliases({ file, ...error.at }, MAX_ALIAS_COUNT)] };
    throw error;
  }
}

interface Conversion {
  file: string;
  positionOf(offset: number): Position;
  problems: InputProblem[];
  aliases: number;
  /** Aliases being expanded around the current node. */
  aliasDepth: number;
}

function startOf(node: YamlAstNode, state: Conversion): Position {
  return state.positionOf(node.range?.[0] ?? 0);
}

function convert(doc: Document, node: YamlAstNode, state: Conversion): YamlNode {
  if (isAlias(node)) {
    const at = startOf(node, state);
    state.aliases += 1;
    if (state.aliases > MAX_ALIAS_COUNT) throw new AliasBudgetExceeded(at);
    const target = node.resolve(doc);
    // The parser has already reported an alias without its anchor.
    if (target === undefined) return { kind: 'scalar', at, value: null };
    state.aliasDepth += 1;
    try {
      return { ...convert(doc, target, state), at };
    } catch (error) {
      // Point at the alias written in the text, not at one inside the anchored content it copies.
      if (error instanceof AliasBudgetExceeded && state.aliasDepth === 1) throw new AliasBudgetExceeded(at);
      throw error;
    } finally {
      state.aliasDepth -= 1;
    }
  }
  if (isMap(node)) return convertMapping(doc, node.items, startOf(node, state), state);
  if (isSeq(node)) {
    const at = startOf(node, state);
    return { kind: 'list', at, items: node.items.map((item) => (isYamlNode(item) ? convert(doc, item, state) : { kind: 'scalar', at, value: null })) };
  }
  if (isScalar(node)) {
    const { value } = node;
    const at = startOf(node, state);
    if (value === null || typeof value === 'string' || typeof value === 'number' || typeof value === 'boolean') return { kind: 'scalar', at, value };
    return { kind: 'scalar', at, value: String(value) };
  }
  return { kind: 'scalar', at: startOf(node, state), value: null };
}

function isYamlNode(item: unknown): item is YamlAstNode {
  return isAlias(item) || isMap(item) || isSeq(item) || isScalar(item);
}

function convertMapping(doc: Document, pairs: readonly { key: unknown; value: unknown }[], at: Position, state: Conversion): YamlNode {
  const entries: YamlEntry[] = [];
  for (const pair of pairs) {
    const keyNode = isYamlNode(pair.key) ? pair.key : undefined;
    const keyAt = keyNode === undefined ? at : startOf(keyNode, state);
    const keyValue = keyNode !== undefined && isScalar(keyNode) ? keyNode.value : undefined;
    if (typeof keyValue !== 'string' && typeof keyValue !== 'number') {
      state.problems.push(configMessages.keyNotText({ file: state.file, ...keyAt }));
      continue;
    }
    entries.push({ key: String(keyValue), keyAt, value: entryValue(doc, pair.value, keyAt, state) });
  }
  return { kind: 'mapping', at, entries };
}

/** A key written with nothing after its colon is an empty value placed at the key. */
function entryValue(doc: Document, value: unknown, keyAt: Position, state: Conversion): YamlNode {
  if (!isYamlNode(value)) return { kind: 'scalar', at: keyAt, value: null };
  if (isScalar(value) && value.value === null && value.range != null && value.range[0] === value.range[1]) {
    return { kind: 'scalar', at: keyAt, value: null };
  }
  return convert(doc, value, state);
}
