// The config written once as data: each node says what a key accepts, what it means and its
// default. The validator (validateNode.ts) and the JSON Schema (toJsonSchema.ts) are both
// derived from these nodes, so the two cannot drift apart. The builders carry the TypeScript
// type of the validated value, so the shape of a checked config is inferred from the spec
// rather than written a second time.
import type { TextForm } from '../base/textPatterns.js';


interface Described {
  /** One or two sentences for the JSON Schema description and the contributor guide. */
  readonly doc: string;
  /** Built-in value when the key is absent, shown in the JSON Schema. */
  readonly default?: unknown;
  /** The default in words when it depends on the data, e.g. on the frequency. */
  readonly defaultText?: string;
}

export interface TextSpec extends Described {
  readonly kind: 'text';
  readonly form: TextForm;
  readonly maxLength: number;
}

export interface NumericSpec extends Described {
  readonly kind: 'whole' | 'number';
  readonly min: number;
  readonly max: number;
  /** Both bounds excluded: the value lies strictly between min and max. */
  readonly exclusive: boolean;
}

export interface BooleanSpec extends Described {
  readonly kind: 'boolean';
}

export interface ChoiceSpec extends Described {
  readonly kind: 'choice';
  readonly values: readonly string[];
}

/** A period label; a bare year may be written as a number (YAML reads `2026` as one). */
export interface PeriodSpec extends Described {
  readonly kind: 'period';
}

export interface ListSpec extends Described {
  readonly kind: 'list';
  readonly items: KeySpec;
  readonly minItems: number;
  readonly maxItems: number;
  readonly unique: boolean;
  /** A short example of the list in YAML flow form, for messages. */
  readonly example: string;
}

export interface ObjectSpec extends Described {
  readonly kind: 'object';
  readonly fields: Readonly<Record<string, KeySpec>>;
  readonly required: readonly string[];
  /** A key that, when present, needs the listed keys beside it. */
  readonly dependentRequired: Readonly<Record<string, readonly string[]>>;
  readonly example: string;
}

/** A key written either as a plain value or as a mapping, e.g. `log` or `{box_cox: 0.5}`. */
export interface ShapesSpec extends Described {
  readonly kind: 'shapes';
  readonly scalar: ChoiceSpec;
  readonly mapping: ObjectSpec;
  /** The accepted shapes in words, for messages. */
  readonly description: string;
}

export type KeySpec = TextSpec | NumericSpec | BooleanSpec | ChoiceSpec | PeriodSpec | ListSpec | ObjectSpec | ShapesSpec;

declare const valueType: unique symbol;

/** A spec node tagged with the type of the value it validates to (the tag exists only for the compiler). */
export type Spec<Node extends KeySpec, T> = Node & { readonly [valueType]?: T };

/** The validated value of a spec node. */
export type ValueOf<S> = S extends { readonly [valueType]?: infer T } ? Exclude<T, undefined> : never;

type Simplify<T> = { [K in keyof T]: T[K] };

type ObjectValue<F extends Readonly<Record<string, KeySpec>>, R extends keyof F> = Simplify<
  { [K in R]: ValueOf<F[K]> } & { [K in Exclude<keyof F, R>]?: ValueOf<F[K]> }
>;

interface DefaultOptions<T> {
  default?: T;
  defaultText?: string;
}

export function text(doc: string, options: { form?: TextForm; maxLength?: number } & DefaultOptions<string> = {}): Spec<TextSpec, string> {
  const form = options.form ?? 'line';
  const maxLength = options.maxLength ?? (form === 'block' ? 4000 : 200);
  return { kind: 'text', doc, form, maxLength, default: options.default, defaultText: options.defaultText };
}

export function whole(doc: string, min: number, max: number, options: DefaultOptions<number> = {}): Spec<NumericSpec, number> {
  return { kind: 'whole', doc, min, max, exclusive: false, ...options };
}

export function decimal(doc: string, min: number, max: number, options: DefaultOptions<number> & { exclusive?: boolean } = {}): Spec<NumericSpec, number> {
  const { exclusive = false, ...rest } = options;
  return { kind: 'number', doc, min, max, exclusive, ...rest };
}

/** Why a number breaks a numeric spec, or undefined when it fits; shared by the config and the command line. */
export function numberFault(spec: NumericSpec, value: number): 'not-finite' | 'not-whole' | 'out-of-range' | undefined {
  if (!Number.isFinite(value)) return 'not-finite';
  if (spec.kind === 'whole' && !Number.isInteger(value)) return 'not-whole';
  const inside = spec.exclusive ? value > spec.min && value < spec.max : value >= spec.min && value <= spec.max;
  return inside ? undefined : 'out-of-range';
}

export function flag(doc: string, options: DefaultOptions<boolean> = {}): Spec<BooleanSpec, boolean> {
  return { kind: 'boolean', doc, ...options };
}

export function choice<const V extends readonly string[]>(doc: string, values: V, options: DefaultOptions<V[number]> = {}): Spec<ChoiceSpec, V[number]> {
  return { kind: 'choice', doc, values, ...options };
}

export function period(doc: string, options: { defaultText?: string } = {}): Spec<PeriodSpec, string> {
  return { kind: 'period', doc, ...options };
}

export function list<T>(
  doc: string,
  items: Spec<KeySpec, T>,
  options: { minItems?: number; maxItems: number; unique?: boolean; example: string } & DefaultOptions<readonly T[]>,
): Spec<ListSpec, T[]> {
  const { minItems = 0, unique = false, ...rest } = options;
  return { kind: 'list', doc, items, minItems, unique, ...rest };
}

export function object<F extends Readonly<Record<string, KeySpec>>, R extends keyof F & string = never>(
  doc: string,
  fields: F,
  options: { required?: readonly R[]; dependentRequired?: Readonly<Record<string, readonly string[]>>; example: string },
): Spec<ObjectSpec, ObjectValue<F, R>> {
  return { kind: 'object', doc, fields, required: options.required ?? [], dependentRequired: options.dependentRequired ?? {}, example: options.example };
}

export function shapes<A, B>(
  doc: string,
  scalar: Spec<ChoiceSpec, A>,
  mapping: Spec<ObjectSpec, B>,
  options: { description: string } & DefaultOptions<A | B>,
): Spec<ShapesSpec, A | B> {
  return { kind: 'shapes', doc, scalar, mapping, ...options };
}
