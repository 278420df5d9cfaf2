// The HTML memo: every section for every series, self-contained (no script, no web address),
// user text escaped in text and in chart SVG, "not run" notes for missing parts, templates
// overridable file by file. Expected structure and wording are our spec (templates/,
// src/memo/wording.ts); numbers come from the fixture records (sampleInput.ts).
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import Handlebars from 'handlebars';
import { beforeAll, describe, expect, it } from 'vitest';
import { assertSelfContained, renderMemoHtml } from '../../src/memo/renderMemoHtml.js';
import type { MemoInput } from '../../src/memo/memoInput.js';
import { fitRecord, QUICK_BACKTEST } from '../support/runCli.js';
import { bareRecord, sampleInput } from './sampleInput.js';

const HOSTILE = '<img src=x onerror=alert(1)>';

/** The HTML of one series section, from its opening tag to the next section. */
function sectionOf(html: string, anchor: string): string {
  const start = html.indexOf(`<section class="series" id="${anchor}"`);
  if (start < 0) throw new Error(`no section ${anchor}`);
  const end = html.indexOf('<section', start + 10);
  return html.slice(start, end < 0 ? undefined : end);
}

/** A series' part of the technical appendix. */
function detailOf(html: string, anchor: string): string {
  const start = html.indexOf(`<section class="series-detail" id="${anchor}-detail"`);
  if (start < 0) throw new Error(`no detail for ${anchor}`);
  const end = html.indexOf('<section', start + 10);
  return html.slice(start, end < 0 ? undefined : end);
}

describe('the full memo', () => {
  let input: MemoInput;
  let html: string;
  beforeAll(async () => {
    input = sampleInput();
    html = await renderMemoHtml(input);
  });

  it('holds no script and no web address', () => {
    expect(html).not.toMatch(/<script/i);
    expect(html).not.toContain('http://');
    expect(html).not.toContain('https://');
    expect(html).not.toMatch(/<link|@import|src="/i);
  });

  it('has a header with the memo details and the draft status', () => {
    expect(html).toContain('<h1 class="memo-title">Long-range outlook for basin inflows and demand drivers</h1>');
    expect(html).toContain('Vessamor Basin Water Cooperative');
    expect(html).toContain('Status: Draft');
    expect(html).toContain('Awaiting a recorded sign-off from Oskar Pellin and Ruth Anselm.');
    expect(html).toContain('@page { size: A4; margin: 17mm 17mm 19mm 17mm; }');
  });

  it('gives every series on page 1: next period, next full year and end of horizon under both models', () => {
    const summary = html.slice(html.indexOf('<section class="summary"'), html.indexOf('<section class="series"'));
    expect(summary.match(/<tbody class="summary-card"/g)).toHaveLength(3);
    const lake = input.series[0].record;
    // 577.89 and 575.23 – 580.56: the Lake Huron deterministic forecast for 1982 (REML estimates) to two decimals, at the widest level.
    expect(lake.forecasts.deterministic[9].point.toFixed(2)).toBe('577.89');
    for (const text of [
      '<td class="num">577.89</td><td class="num interval">575.23\u2009\u2013\u2009580.56</td></tr>',
      '<tr class="is-recommended"><th scope="row">Deterministic <span class="marker"',
      'Recommended: deterministic trend.',
      'last observation 1972',
      'Source and vintage: not given in the config.',
      '\u25C6 marks the recommended model',
      // The standing cautions.
      'A forecast is an estimate, not a guarantee.',
      'Prediction intervals assume the fitted model holds over the whole horizon.',
      'remain with qualified professionals and the rules that apply to them.',
    ]) {
      expect(summary).toContain(text);
    }
  });

  it('has every section for each series, the detail in the appendix', () => {
    input.series.forEach((entry, i) => {
      const anchor = `series-${i + 1}`;
      const section = sectionOf(html, anchor);
      // One chart on the series' pages, the forecast; the backtest's numbers are in its table.
      expect(section).toMatch(new RegExp(`<figure class="chart" id="${anchor}-forecast">\\s*<svg role="img"`));
      expect(section.match(/<figcaption>/g)).toHaveLength(1);
      expect(section).toContain('<table class="numbers forecast-table">');
      // Lake Huron's ten steps: the table prints 1, 2, 3, 4, 6, 8 and 10 (shownHorizons, our layout rule); every step is in forecasts.csv.
      if (i === 0) {
        expect(entry.record.settings.horizon).toBe(10);
        const steps = [...(section.match(/<table class="numbers forecast-table">[\s\S]*?<tbody>([\s\S]*?)<\/tbody>/)?.[1].matchAll(/<tr><td class="num">(\d+)<\/td>/g) ?? [])].map((m) => Number(m[1]));
        expect(steps).toEqual([1, 2, 3, 4, 6, 8, 10]);
        expect(section).toContain('Rows shown: steps 1, 2, 3, 4, 6, 8 and 10; every step is in forecasts.csv and record.json.');
      }
      expect(section).toContain('<table class="numbers backtest-summary">');
      expect(section).toContain('<table class="numbers unit-root">');
      expect(section).toContain('data-caveat="fixed-line-extrapolation"');
      expect(section).toContain('<p class="residual-summary">Checks of the one-step forecast errors');
      expect(section).toContain('<p class="stability-summary">Trend stability:');
      expect(section).not.toContain('class="not-run"');
      const detail = detailOf(html, anchor);
      expect(detail).toMatch(new RegExp(`<figure class="chart" id="${anchor}-stability">`));
      expect(detail).toContain('<table class="numbers comparison">');
      expect(detail.match(/<p class="equation"><code>/g)).toHaveLength(2);
      expect(detail.match(/<table class="numbers coefficients">/g)).toHaveLength(2);
      expect(detail).toMatch(/<li class="(is-flagged)?">(Deterministic trend: |Stochastic trend: )/);
    });
  });

  it('writes both model equations and their standard errors', () => {
    const section = detailOf(html, 'series-1');
    // Handlebars' own escaping, which the template applies to every {{ }} value.
    const equation = Handlebars.Utils.escapeExpression(input.series[0].record.models.stochastic.equation);
    expect(equation).toContain('(1 - B) w_t &#x3D; ');
    expect(section).toContain(equation);
    // Lake Huron slope −0.02061 (s.e. 0.009997), analyseSeries on lake-huron.csv with REML
    // (exact ML: −0.02111, s.e. 0.008838).
    expect(section).toContain('<th scope="row">Slope per period</th><td class="num">\u22120.02061</td><td class="num">0.009997</td>');
  });

  it('has the assumptions register, the sign-off block with blank lines, and the appendix', () => {
    expect(html).toContain('<th scope="row">Transform</th><td>natural log</td><td>Growth is roughly proportional to the level</td><td>Config</td>');
    // The config's sign-off is shown as declared only, so both reviewers keep their blank lines.
    expect(html).toContain('<tr><td>Oskar Pellin</td><td>Approved with changes</td><td>2026-12-01</td><td>Widen the discussion of the Nile break.</td></tr>');
    expect(html.match(/<dd class="line"><\/dd>/g)).toHaveLength(6);
    expect(html).toContain('<code>trendbrief run configs/basin-outlook.yaml</code>');
    expect(html).toContain(input.series[1].record.series.source.sha256);
    // Each data file's digest once, with the column and series it feeds.
    expect(html.split(input.series[1].record.series.source.sha256)).toHaveLength(2);
    expect(html).toContain(`column \u201c${input.series[1].record.series.source.column}\u201d for ${input.series[1].record.series.title}`);
  });

  it('is the same, byte for byte, when rendered again', async () => {
    expect(await renderMemoHtml(input)).toBe(html);
  });
});

describe('escaping and link-free text', () => {
  it('escapes a hostile series title in the text and in the chart SVG', async () => {
    const input = sampleInput(['lakeHuron']);
    input.series[0].record.series.title = HOSTILE;
    input.memo.title = `${HOSTILE} memo`;
    input.series[0].notes = 'See https://example.org/notes and http://example.org for details.';
    const html = await renderMemoHtml(input);
    expect(html).not.toContain('<img');
    expect(html).toContain('<h2 id="series-1-heading" class="series-title">&lt;img src&#x3D;x onerror&#x3D;alert(1)&gt;</h2>');
    expect(html).not.toMatch(/https?:\/\//);
    expect(html).toContain('See https:\u2060//example.org/notes');
  });

  it('renders a web address or a stylesheet import in a title or units as text, never stopping the render (our spec)', async () => {
    const input = sampleInput(['lakeHuron']);
    input.series[0].record.series.title = 'Levels https://evil.example/x @import url(a.css)';
    input.series[0].units = '@import url(b.css) http://x.y';
    const html = await renderMemoHtml(input);
    expect(html).not.toMatch(/https?:\/\/|@import/i);
    expect(html).toContain('Levels https:\u2060//evil.example/x @\u2060import url(a.css)');
    expect(html).toContain('@\u2060import url(b.css) http:\u2060//x.y');
  });

  it('rejects templates that would load anything', () => {
    expect(() => assertSelfContained('<style>@import url(x.css);</style>')).toThrow(/not be self-contained/);
    expect(() => assertSelfContained('<p>ok</p><script>1</script>')).toThrow(/<script/);
    expect(() => assertSelfContained('<p>plain</p>')).not.toThrow();
  });
});

describe('a record without the later parts', () => {
  it('says the backtest, stability and recommendation were not run', async () => {
    const input = sampleInput(['nile']);
    const record = bareRecord('nile');
    record.evidence.stability = null;
    input.series[0] = { record, assumptions: [] };
    const html = await renderMemoHtml(input);
    const section = sectionOf(html, 'series-1');
    expect(section).toContain('The backtest was not run for this series');
    expect(detailOf(html, 'series-1')).toContain('The trend-stability checks were not run for this series.');
    expect(section).toContain('No recommendation was recorded for this series');
    expect(section).toContain('data-caveat="backtest-thin"');
    // The forecast chart alone, with no observed history to draw before the forecasts; no stability windows in the appendix.
    expect(section.match(/<figure class="chart"/g)).toHaveLength(1);
    expect(detailOf(html, 'series-1')).not.toContain('<figure class="chart"');
    expect(html).toContain('No assumptions were recorded for this series.');
  });
});

describe('series at other interval levels', () => {
  it('stacks the two models when a row of both would be wider than the page, and names no one set of levels for series that differ', async () => {
    const input = sampleInput(['nile']);
    const record = await fitRecord('test/fixtures/lake-huron.csv', [...QUICK_BACKTEST, '--levels', '68,95,99']);
    input.series.push({ record, assumptions: [] });
    const html = await renderMemoHtml(input);
    expect(html).toContain('<th scope="colgroup" colspan="2" class="num">Next period</th>');
    expect(html).toContain('with its widest prediction interval beside it');
    // Built-in levels: the models side by side, as before.
    expect(sectionOf(html, 'series-1')).toContain('<table class="numbers forecast-table">');
    const section = sectionOf(html, 'series-2');
    // Three levels: each model its own forecast rows under one set of columns, the row head
    // spanning them all (h, period, point, three intervals, ratio).
    expect(section).toContain('<table class="numbers forecast-table by-model">');
    expect(section.match(/<th scope="rowgroup" colspan="7" class="model-(deterministic|stochastic)">/g)).toHaveLength(2);
    // The backtest table: coverage at each of the three levels, both models.
    expect(section).toContain('<th scope="colgroup" colspan="2">68% cover</th><th scope="colgroup" colspan="2">95% cover</th><th scope="colgroup" colspan="2">99% cover</th>');
  });
});

describe('templates', () => {
  it('takes files from a consultancy directory and the rest from the built-in set', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'trendbrief-templates-'));
    writeFileSync(join(dir, 'memo.css'), 'body { font-family: serif; } /* house style */');
    const input = sampleInput(['lakeHuron']);
    input.paper = 'Letter';
    const html = await renderMemoHtml(input, { templatesDir: dir });
    expect(html).toContain('/* house style */');
    expect(html).not.toContain('--spruce');
    expect(html).toContain('@page { size: letter;');
    expect(html).toContain('<h2 id="summary-heading">At a glance</h2>');
  });
  it('stays a draft on sign-offs typed into the config, and signs off when every reviewer\u2019s decision is recorded', async () => {
    const input = sampleInput(['lakeHuron']);
    input.memo.sign_off.push({ reviewer: 'Ruth Anselm', date: '2026-12-02', decision: 'approved' });
    const declared = await renderMemoHtml(input);
    expect(declared).toContain('Status: Draft');
    expect(declared).toContain('<h3>Declared in the config, not recorded</h3>');
    const recorded = { role: '', comment: '', resolves: [], signed: false, void_reason: null };
    input.digest = 'a'.repeat(64);
    input.sign_offs = [
      { ...recorded, number: 1, reviewer: 'Oskar Pellin', decision: 'approve', date: '2026-12-01' },
      { ...recorded, number: 2, reviewer: 'Ruth Anselm', decision: 'approve', date: '2026-12-02' },
    ];
    const html = await renderMemoHtml(input);
    expect(html).toContain(`<code class="hash">${'a'.repeat(64)}</code>`);
    expect(html).toContain('<body class="is-signed-off">');
    expect(html).toContain('Status: Signed off');
    expect(html).not.toContain('<dd class="line">');
  });
});
