// The JSON Schema: the committed file is the generated one, and a general-purpose JSON Schema
// validator (ajv 8, draft 2020-12) accepts and refuses the same configs as our validator.
import { readFileSync } from 'node:fs';
import { Ajv2020 } from 'ajv/dist/2020.js';
import { describe, expect, it } from 'vitest';
import { parse } from 'yaml';
import { parseConfig } from '../../src/config/parseConfig.js';
import { configSchemaText } from '../../src/config/toJsonSchema.js';
import { InputError } from '../../src/base/problem.js';
import { BASE, yaml } from './configText.js';

const SCHEMA_FILE = 'schema/config.schema.json';
const schema: unknown = JSON.parse(readFileSync(SCHEMA_FILE, 'utf8'));
const ajv = new Ajv2020({ allErrors: true, strict: true });
const schemaAccepts = ajv.compile(typeof schema === 'object' && schema !== null ? schema : {});

function validatorAccepts(text: string): boolean {
  try {
    parseConfig(text, 'memo.yaml', '/plans');
    return true;
  } catch (error) {
    if (error instanceof InputError) return false;
    throw error;
  }
}

const withSeries = (...lines: string[]) => yaml([...BASE, ...lines.map((line) => `    ${line}`)]);
const withMemo = (...lines: string[]) => yaml([...BASE.slice(0, 3), ...lines.map((line) => `  ${line}`), ...BASE.slice(3)]);
const fixture = (name: string) => readFileSync(`test/fixtures/config/${name}`, 'utf8');

const VALID: Record<string, string> = {
  'minimal fixture': fixture('minimal.yaml'),
  'full fixture': fixture('plans/full.yaml'),
  'base config': yaml(BASE),
  'as_of as a bare year': withMemo('as_of: 2026'),
  'as_of as a month': withMemo('as_of: 2026-10'),
  'box_cox transform': withSeries('transform: {box_cox: -0.5}'),
  'notes over several lines': withSeries('notes: |', '  one', '  two'),
  'punctuation in a title': withSeries('title: "Inflow <m3> & outflow"'),
  'levels at the limits': withSeries('levels: [50, 99.9]'),
  'fixed model with its justification': withSeries('recommendation: {model: deterministic, justification: Contract terms.}'),
};

const INVALID: Record<string, string> = {
  'unknown key': withSeries('horizn: 12'),
  'unknown top-level key': yaml([...BASE, 'extra: 1']),
  'text horizon': withSeries('horizon: twelve'),
  'quoted number': withSeries('horizon: "12"'),
  'fractional horizon': withSeries('horizon: 2.5'),
  'horizon above range': withSeries('horizon: 1001'),
  'order above range': withSeries('max_p: 9'),
  'level below range': withSeries('levels: [0]'),
  'level at the top of the range': withSeries('levels: [80, 100]'),
  'five levels': withSeries('levels: [50, 60, 70, 80, 90]'),
  'significance above range': withSeries('significance: 0.11'),
  'lambda above range': withSeries('transform: {box_cox: 2.5}'),
  'origins above range': withSeries('backtest: {origins: 201}'),
  'backtest horizon above range': withSeries('backtest: {horizon: 101}'),
  'infinite significance': withSeries('significance: .inf'),
  'unknown transform': withSeries('transform: sqrt'),
  'transform as a list': withSeries('transform: [log]'),
  'unknown key in box_cox mapping': withSeries('transform: {box_cox: 1, shift: 2}'),
  'bad choice': withSeries('point: meen'),
  'yes for a switch': withSeries('coefficient_uncertainty: yes'),
  'empty value': withSeries('title:'),
  'empty text': withSeries('title: ""'),
  'over-long text': withSeries(`title: ${'x'.repeat(201)}`),
  'control character': withSeries('title: "a\\u0007b"'),
  'bidi override': withSeries('title: "a\\u202Eb"'),
  'line break in a title': withSeries('title: "a\\nb"'),
  'duplicate level': withSeries('levels: [80, 80]'),
  'empty levels': withSeries('levels: []'),
  'fixed model without justification': withSeries('recommendation: {model: stochastic}'),
  'missing memo id': yaml(['memo:', '  title: T', ...BASE.slice(3)]),
  'missing series file': yaml([...BASE.slice(0, 5)]),
  'missing series': yaml(BASE.slice(0, 3)),
  'empty series list': yaml([...BASE.slice(0, 3), 'series: []']),
  'bad memo slug': yaml(['memo:', '  id: Water Outlook', ...BASE.slice(2)]),
  'bad date form': withMemo('reviewers: [{name: A}]', 'sign_off: [{reviewer: A, date: 2026-1-5, decision: approved}]'),
  'bad period': withMemo('as_of: 2026-Q5'),
  'year out of range': withMemo('as_of: 99'),
  'sign-off without decision': withMemo('reviewers: [{name: A}]', 'sign_off: [{reviewer: A, date: 2026-01-05}]'),
  'duplicate format': yaml([...BASE, 'output: {formats: [html, html]}']),
  'unknown paper': yaml([...BASE, 'output: {paper: A5}']),
  'document is a list': yaml(['- memo']),
};

/** Rules across keys and calendar days: refused by our validator, beyond what the schema can state. */
const VALIDATOR_ONLY: Record<string, string> = {
  'duplicate series id': yaml([...BASE, '  - id: inflow', '    file: b.csv']),
  'sign-off by an unlisted reviewer': withMemo('reviewers: [{name: A}]', 'sign_off: [{reviewer: B, date: 2026-01-05, decision: approved}]'),
  'reviewer listed twice': withMemo('reviewers: [{name: A}, {name: A}]'),
  'day missing from the calendar': withMemo('reviewers: [{name: A}]', 'sign_off: [{reviewer: A, date: 2026-02-30, decision: approved}]'),
  'public key that is no Ed25519 key': withMemo('reviewers: [{name: A, public_key: "-----BEGIN PUBLIC KEY-----\\nAAAA\\n-----END PUBLIC KEY-----"}]'),
};

describe('the schema file', () => {
  it('is the one the spec generates (run npm run schema after changing the spec)', () => {
    expect(readFileSync(SCHEMA_FILE, 'utf8')).toBe(configSchemaText());
  });

  it('declares draft 2020-12 and closes every mapping', () => {
    const text = configSchemaText();
    expect(JSON.parse(text)).toMatchObject({ $schema: 'https://json-schema.org/draft/2020-12/schema', type: 'object', required: ['memo', 'series'] });
    expect(text.match(/"additionalProperties": false/g)?.length).toBe(text.match(/"type": "object"/g)?.length);
  });

  it('carries the defaults and the descriptions', () => {
    expect(JSON.parse(configSchemaText())).toMatchObject({
      properties: {
        defaults: {
          properties: {
            levels: { default: [80, 95], type: 'array', uniqueItems: true },
            max_p: { default: 3, minimum: 0, maximum: 8, type: 'integer' },
            horizon: { description: 'Forecast steps, instead of through. Default: the steps to through.' },
          },
        },
      },
    });
  });
});

describe('schema and validator agree', () => {
  it.each(Object.entries(VALID))('both accept: %s', (_name, text) => {
    expect([validatorAccepts(text), schemaAccepts(parse(text))]).toEqual([true, true]);
  });

  it.each(Object.entries(INVALID))('both refuse: %s', (_name, text) => {
    expect([validatorAccepts(text), schemaAccepts(parse(text))]).toEqual([false, false]);
  });

  it.each(Object.entries(VALIDATOR_ONLY))('only the validator refuses: %s', (_name, text) => {
    expect([validatorAccepts(text), schemaAccepts(parse(text))]).toEqual([false, true]);
  });
});
