// Checks a YAML tree against a spec node, collecting every problem instead of stopping at the
// first: a value that fails is left out of the result and its siblings are still checked.
// Everything checked here is also stated in the JSON Schema derived from the same spec; the
// rules that span several keys live in checkConfigRules.ts.
import { closestName } from '../base/closestName.js';
import { type InputLocation, type InputProblem } from '../base/problem.js';
import { configMessages, type ExpectedValue, type FoundValue } from './messages.js';
import { numberFault, type ChoiceSpec, type KeySpec, type ListSpec, type NumericSpec, type ObjectSpec, type ShapesSpec, type TextSpec } from './keySpec.js';
import type { Position, YamlNode } from './readYamlTree.js';
import { firstRefusedCharacter, isCalendarDay, PERIOD_PATTERN, PERIOD_YEAR_RANGE, textPattern } from '../base/textPatterns.js';

export interface Validation {
  file: string;
  problems: InputProblem[];
  /** Where each value sits, by field path (`series[1].horizon`); filled for every node visited. */
  positions: Map<string, Position>;
}

type Checked = unknown;

/**
 * The validated value, or undefined when the node breaks the spec (the problems say why).
 * Mappings keep their valid keys and lists their items by index even when some fail, so the
 * result of a config with problems is a partial document (see `Loose`).
 */
export function validateNode(spec: KeySpec, node: YamlNode, field: string, v: Validation): Checked {
  v.positions.set(field, node.at);
  switch (spec.kind) {
    case 'text':
      return validateText(spec, node, field, v);
    case 'whole':
    case 'number':
      return validateNumber(spec, node, field, v);
    case 'boolean':
      if (node.kind === 'scalar' && typeof node.value === 'boolean') return node.value;
      return wrongType(v, node, field, { kind: 'boolean' });
    case 'choice':
      return validateChoice(spec, node, field, v);
    case 'period':
      return validatePeriod(node, field, v);
    case 'list':
      return validateList(spec, node, field, v);
    case 'object':
      return validateObject(spec, node, field, v);
    case 'shapes':
      return validateShapes(spec, node, field, v);
  }
}

/** The spec's expectation in the terms messages use. */
function expectedOf(spec: KeySpec): ExpectedValue {
  switch (spec.kind) {
    case 'text':
      return { kind: 'text' };
    case 'whole':
      return { kind: 'whole', min: spec.min, max: spec.max };
    case 'number':
      return { kind: 'number', min: spec.min, max: spec.max, exclusive: spec.exclusive };
    case 'boolean':
    case 'period':
      return { kind: spec.kind };
    case 'choice':
      return { kind: 'choice', values: spec.values };
    case 'list':
    case 'object':
      return { kind: spec.kind === 'list' ? 'list' : 'mapping', example: spec.example };
    case 'shapes':
      return { kind: 'shapes', description: spec.description };
  }
}

function place(v: Validation, at: Position, field: string): InputLocation {
  return { file: v.file, line: at.line, column: at.column, field: field === '' ? undefined : field };
}

function foundOf(node: YamlNode): FoundValue {
  if (node.kind === 'mapping') return { kind: 'mapping' };
  if (node.kind === 'list') return { kind: 'list' };
  if (node.value === null) return { kind: 'empty' };
  if (typeof node.value === 'string') return { kind: 'text', text: node.value };
  if (typeof node.value === 'number') return { kind: 'number', value: node.value };
  return { kind: 'boolean', value: node.value };
}

function wrongType(v: Validation, node: YamlNode, field: string, expected: ExpectedValue): undefined {
  v.problems.push(configMessages.wrongType(place(v, node.at, field), expected, foundOf(node)));
  return undefined;
}

function reject(v: Validation, problem: InputProblem): undefined {
  v.problems.push(problem);
  return undefined;
}

function validateText(spec: TextSpec, node: YamlNode, field: string, v: Validation): Checked {
  if (node.kind !== 'scalar' || typeof node.value !== 'string') return wrongType(v, node, field, { kind: 'text' });
  const value = node.value;
  const at = place(v, node.at, field);
  // JSON Schema counts length in code points, so this does too.
  const length = [...value].length;
  if (length === 0) return reject(v, configMessages.emptyText(at));
  if (length > spec.maxLength) return reject(v, configMessages.tooLong(at, length, spec.maxLength));
  // Free text is printed as a title, a name or a note: blank space alone says nothing.
  if (value.trim() === '') return reject(v, configMessages.blankText(at));
  if (new RegExp(textPattern(spec.form), 'u').test(value)) {
    if (spec.form === 'date' && !isCalendarDay(value)) return reject(v, configMessages.noSuchDay(at, value));
    return value;
  }
  if (spec.form === 'slug') return reject(v, configMessages.badSlug(at, value));
  if (spec.form === 'date') return reject(v, configMessages.badDate(at, value));
  const refused = firstRefusedCharacter(value, spec.form);
  if (refused === undefined) throw new Error(`validateText: ${field} fails its pattern without a refused character`);
  return reject(v, configMessages.controlCharacter(at, refused.codePoint, refused.position, spec.form === 'block'));
}

function validateNumber(spec: NumericSpec, node: YamlNode, field: string, v: Validation): Checked {
  const expected = expectedOf(spec) as Extract<ExpectedValue, { min: number }>;
  if (node.kind !== 'scalar' || typeof node.value !== 'number') return wrongType(v, node, field, expected);
  const value = node.value;
  const at = place(v, node.at, field);
  switch (numberFault(spec, value)) {
    case 'not-finite':
      return reject(v, configMessages.notFinite(at, value, expected));
    case 'not-whole':
      return reject(v, configMessages.notWhole(at, value, expected));
    case 'out-of-range':
      return reject(v, configMessages.outOfRange(at, value, expected));
    case undefined:
      return value;
  }
}

function validateChoice(spec: ChoiceSpec, node: YamlNode, field: string, v: Validation): Checked {
  if (node.kind !== 'scalar' || typeof node.value !== 'string') return wrongType(v, node, field, expectedOf(spec));
  const value = node.value;
  if (spec.values.includes(value)) return value;
  return reject(v, configMessages.badChoice(place(v, node.at, field), value, spec.values, closestName(value, spec.values)));
}

function validatePeriod(node: YamlNode, field: string, v: Validation): Checked {
  if (node.kind === 'scalar' && typeof node.value === 'number' && Number.isInteger(node.value)) {
    if (node.value >= PERIOD_YEAR_RANGE.min && node.value <= PERIOD_YEAR_RANGE.max) return String(node.value);
    return reject(v, configMessages.badPeriod(place(v, node.at, field), String(node.value)));
  }
  if (node.kind !== 'scalar' || typeof node.value !== 'string') return wrongType(v, node, field, { kind: 'period' });
  if (new RegExp(PERIOD_PATTERN, 'u').test(node.value)) return node.value;
  return reject(v, configMessages.badPeriod(place(v, node.at, field), node.value));
}

function validateList(spec: ListSpec, node: YamlNode, field: string, v: Validation): Checked {
  if (node.kind !== 'list') return wrongType(v, node, field, expectedOf(spec));
  const at = place(v, node.at, field);
  if (node.items.length < spec.minItems) return reject(v, configMessages.tooFewItems(at, node.items.length, spec.minItems));
  if (node.items.length > spec.maxItems) return reject(v, configMessages.tooManyItems(at, node.items.length, spec.maxItems));
  const firstField = new Map<string, string>();
  // Items keep their index, a failed one left undefined, so rules across items can still
  // name `series[2]` when `series[1]` is broken.
  return node.items.map((item, index) => {
    const itemField = `${field}[${index}]`;
    const value = validateNode(spec.items, item, itemField, v);
    if (value === undefined || !spec.unique) return value;
    const key = JSON.stringify(value);
    const earlier = firstField.get(key);
    if (earlier !== undefined) return reject(v, configMessages.duplicateItem(place(v, item.at, itemField), key, earlier));
    firstField.set(key, itemField);
    return value;
  });
}

function validateObject(spec: ObjectSpec, node: YamlNode, field: string, v: Validation): Checked {
  if (node.kind !== 'mapping') return wrongType(v, node, field, expectedOf(spec));
  const keys = Object.keys(spec.fields);
  const child = (key: string) => (field === '' ? key : `${field}.${key}`);
  const result: Record<string, Checked> = {};
  const keyLine = new Map<string, number>();
  for (const entry of node.entries) {
    const at = place(v, entry.keyAt, child(entry.key));
    const earlier = keyLine.get(entry.key);
    if (earlier !== undefined) {
      v.problems.push(configMessages.duplicateKey(at, earlier));
      continue;
    }
    keyLine.set(entry.key, entry.keyAt.line);
    if (!Object.hasOwn(spec.fields, entry.key)) {
      v.problems.push(configMessages.unknownKey(at, entry.key, closestName(entry.key, keys), keys));
      continue;
    }
    const value = validateNode(spec.fields[entry.key], entry.value, child(entry.key), v);
    if (value !== undefined) result[entry.key] = value;
  }
  for (const key of spec.required) {
    if (!keyLine.has(key)) v.problems.push(configMessages.missing(place(v, node.at, child(key)), key, spec.fields[key].doc));
  }
  for (const [key, needed] of Object.entries(spec.dependentRequired)) {
    const at = v.positions.get(child(key));
    if (!keyLine.has(key) || at === undefined) continue;
    const absent = needed.filter((other) => !keyLine.has(other));
    if (absent.length > 0) v.problems.push(configMessages.dependentMissing(place(v, at, child(key)), key, String(result[key] ?? ''), absent));
  }
  return result;
}

function validateShapes(spec: ShapesSpec, node: YamlNode, field: string, v: Validation): Checked {
  if (node.kind === 'mapping') return validateObject(spec.mapping, node, field, v);
  if (node.kind === 'scalar' && typeof node.value === 'string') {
    if (spec.scalar.values.includes(node.value)) return node.value;
    const suggestion = closestName(node.value, spec.scalar.values);
    if (suggestion !== undefined) return reject(v, configMessages.badChoice(place(v, node.at, field), node.value, spec.scalar.values, suggestion));
  }
  return wrongType(v, node, field, expectedOf(spec));
}
