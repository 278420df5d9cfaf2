// A syntax error in a consultancy's own template is bad input (exit 2 with the file and line),
// not an internal failure (our spec).
import { mkdtempSync, mkdirSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/base/problem.js';
import { loadTemplates } from '../../src/memo/loadTemplates.js';

describe('own templates', () => {
  it('reports a template that does not parse with its file and line', () => {
    const dir = mkdtempSync(join(tmpdir(), 'tb-templates-'));
    mkdirSync(join(dir, 'partials'));
    writeFileSync(join(dir, 'partials', 'header.hbs'), '<h1>{{title}}</h1>\n{{#if client}}\n<p>unclosed</p>\n');
    try {
      loadTemplates(dir);
      throw new Error('expected an InputError');
    } catch (error) {
      if (!(error instanceof InputError)) throw error;
      expect(error.problems[0].code).toBe('template.syntax');
      expect(error.problems[0].file).toBe(join(dir, 'partials', 'header.hbs'));
      expect(error.problems[0].line).toBe(4);
    }
  });

  it('takes the built-in file for anything the folder does not provide', () => {
    const dir = mkdtempSync(join(tmpdir(), 'tb-templates-'));
    writeFileSync(join(dir, 'memo.css'), 'body { color: black; }');
    const templates = loadTemplates(dir);
    expect(templates.css).toBe('body { color: black; }');
    expect(templates.main).toContain('{{');
  });
});
