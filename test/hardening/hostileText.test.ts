// Text that looks like markup, template syntax, links or scripts is legal in every text field
// and in the series file's column names: the run accepts it, the memo shows it as text and
// never as markup, and the record keeps it exactly (our spec; DESIGN.md "Output and safety").
import { cpSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { runCli } from '../support/runCli.js';
import { pinRunDate } from './earlierMemo.js';
import { HARDENING_FIXTURES } from './refusedCases.js';

const TITLE = '<img src=x onerror=alert(1)> {{handlebars}} {{{triple}}} </style><script>alert(2)</script>';
const VALUE_COLUMN = '<img src=x onerror=alert(1)>';
let root = '';
let html = '';
let exitCode = -1;
let problems = '';

pinRunDate();

beforeAll(async () => {
  root = mkdtempSync(join(tmpdir(), 'tb-hostile-'));
  cpSync(join(HARDENING_FIXTURES, 'accepted/hostile-text'), root, { recursive: true });
  const run = await runCli(['run', join(root, 'memo.yaml'), '--quiet']);
  exitCode = run.code;
  problems = run.stderr;
  html = readFileSync(join(root, 'out/tarnwick-cargo/memo.html'), 'utf8');
});

afterAll(() => {
  rmSync(root, { recursive: true, force: true });
});

describe('hostile but legal text', () => {
  it('is accepted', () => {
    expect(problems).toBe('');
    expect(exitCode).toBe(0);
  });

  it('never reaches the memo as markup', () => {
    expect(html).not.toMatch(/<(img|script|iframe|object|embed|base|form)\b/i);
    // A raw `<` only ever opens the template's own tags, and none of them carries an event handler.
    expect(html).not.toMatch(/<[a-z][^<>]*\son[a-z]+\s*=/i);
    expect(html).not.toMatch(/\b(href|src|action|data|formaction|xlink:href)\s*=\s*["']?\s*javascript:/i);
    expect(html.match(/<a\s[^>]*>/g)?.every((tag) => /^<a href="#[\w-]+">$/.test(tag))).toBe(true);
    expect(html.match(/<style\b/g)).toHaveLength(1);
    expect(html.match(/<\/style>/g)).toHaveLength(1);
    expect(html.match(/<title>/g)).toHaveLength(1);
    // A web address or stylesheet import in the units reaches the charts' axis titles too, neutralised there as everywhere.
    expect(html).not.toMatch(/https?:\/\/|@import/i);
    expect(html).toContain('@\u2060import url(x.css) https:\u2060//tarnwick.invalid/u');
  });

  it('shows it as text, template syntax included', () => {
    expect(html).toContain('&lt;img src');
    expect(html).toContain('&lt;/style&gt;&lt;script&gt;alert(2)&lt;/script&gt;');
    expect(html).toContain('{{handlebars}} {{{triple}}}');
    expect(html).toContain(`${'Tarnwick Harbour Authority \u{1F6A2} '.repeat(6)}Tarnwick Harbour Authority`);
  });

  it('keeps it exactly in the record', () => {
    const document = JSON.parse(readFileSync(join(root, 'out/tarnwick-cargo/record.json'), 'utf8')) as {
      memo: { title: string; client: string };
      records: { series: { title: string; source: { column: string } } }[];
    };
    expect(document.memo.title).toBe(TITLE);
    // 200 code points, the longest one-line text a config may hold (the ship counts as one).
    expect([...document.memo.client]).toHaveLength(200);
    expect(document.records[0].series.source.column).toBe(VALUE_COLUMN);
    expect(document.records[0].series.title).toBe('<svg/onload=alert(9)> Cargo </text></svg><script>alert(10)</script>');
  });
});
