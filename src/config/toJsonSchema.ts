// The JSON Schema (draft 2020-12) of the config, derived from the same spec the validator walks.
// Editors use it to complete and check keys as the config is typed; `trendbrief check` remains
// the authority, as it also applies the rules that span several keys (checkConfigRules.ts).
import { CONFIG_SPEC } from './configSpec.js';
import type { KeySpec } from './keySpec.js';
import { PERIOD_PATTERN, PERIOD_YEAR_RANGE, textPattern } from '../base/textPatterns.js';

export type JsonSchema = { [keyword: string]: unknown };

const DIALECT = 'https://json-schema.org/draft/2020-12/schema';

function describe(spec: KeySpec): JsonSchema {
  const description = spec.defaultText === undefined ? spec.doc : `${spec.doc} Default: ${spec.defaultText}.`;
  return spec.default === undefined ? { description } : { description, default: spec.default };
}

function shape(spec: KeySpec): JsonSchema {
  switch (spec.kind) {
    case 'text':
      return { type: 'string', minLength: 1, maxLength: spec.maxLength, pattern: textPattern(spec.form) };
    case 'whole':
    case 'number':
      return spec.exclusive
        ? { type: 'number', exclusiveMinimum: spec.min, exclusiveMaximum: spec.max }
        : { type: spec.kind === 'whole' ? 'integer' : 'number', minimum: spec.min, maximum: spec.max };
    case 'boolean':
      return { type: 'boolean' };
    case 'choice':
      return { type: 'string', enum: [...spec.values] };
    case 'period':
      return {
        anyOf: [
          { type: 'string', pattern: PERIOD_PATTERN },
          { type: 'integer', minimum: PERIOD_YEAR_RANGE.min, maximum: PERIOD_YEAR_RANGE.max },
        ],
      };
    case 'list':
      return {
        type: 'array',
        items: toJsonSchema(spec.items),
        ...(spec.minItems > 0 ? { minItems: spec.minItems } : {}),
        maxItems: spec.maxItems,
        ...(spec.unique ? { uniqueItems: true } : {}),
      };
    case 'object':
      return {
        type: 'object',
        properties: Object.fromEntries(Object.entries(spec.fields).map(([key, field]) => [key, toJsonSchema(field)])),
        ...(spec.required.length > 0 ? { required: [...spec.required] } : {}),
        ...(Object.keys(spec.dependentRequired).length > 0 ? { dependentRequired: spec.dependentRequired } : {}),
        additionalProperties: false,
      };
    case 'shapes':
      return { oneOf: [toJsonSchema(spec.scalar), toJsonSchema(spec.mapping)] };
  }
}

export function toJsonSchema(spec: KeySpec): JsonSchema {
  return { ...describe(spec), ...shape(spec) };
}

/** The config's schema as written to schema/config.schema.json, ending in a newline. */
export function configSchemaText(): string {
  const schema = {
    $schema: DIALECT,
    title: 'trendbrief config',
    ...toJsonSchema(CONFIG_SPEC),
    $comment:
      'Generated from src/config/configSpec.ts by npm run schema. trendbrief check also requires unique series ids, reviewers listed once, sign-offs by listed reviewers, dates that exist in the calendar, public keys of reviewers that read as Ed25519 keys and a recommendation.scored_level among the levels.',
  };
  return `${JSON.stringify(schema, null, 2)}\n`;
}
