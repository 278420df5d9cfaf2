// The demo memo as a reviewer receives it: its length on A4, what page 1 carries, and no
// sentence that contradicts its records. Our own layout targets (the memo's length budget and
// the reviewer's page-1 list), not an outside reference.
import { mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import type { AnalysisRecord } from '../../src/analysis/record.js';
import { memoContradictions } from '../../src/memo/consistency/memoContradictions.js';
import { runCli } from '../support/runCli.js';

function pageCount(pdf: Buffer): number {
  return (pdf.toString('latin1').match(/\/Type\s*\/Page(?![s\w])/g) ?? []).length;
}

/** The budget for the demo: 16 A4 pages (DEVELOPERS.md, the memo's layout). */
const DEMO_PAGES_AT_MOST = 16;

describe('the demo memo', () => {
  let folder = '';
  beforeAll(async () => {
    const out = mkdtempSync(join(tmpdir(), 'tb-demo-'));
    const run = await runCli(['run', 'configs/demo.yaml', '--out', out, '--formats', 'html,pdf,json', '--quiet']);
    expect(run.code, run.stderr).toBe(0);
    folder = join(out, 'vessamor-supply-outlook', '2024-12');
  }, 180_000);

  it(`prints on at most ${DEMO_PAGES_AT_MOST} A4 pages for its five series`, () => {
    const pages = pageCount(readFileSync(join(folder, 'memo.pdf')));
    expect(pages).toBeGreaterThanOrEqual(12);
    expect(pages).toBeLessThanOrEqual(DEMO_PAGES_AT_MOST);
  });

  it('gives a reviewer every page-1 item before the first series', () => {
    const html = readFileSync(join(folder, 'memo.html'), 'utf8');
    const page1 = html.slice(0, html.indexOf('<section class="series"'));
    expect(page1).toContain('Status: Draft');
    expect(page1).toMatch(/<dt>Issued<\/dt><dd>\d{4}-\d{2}-\d{2}<\/dd>/);
    expect(page1).toContain('Content digest <code>');
    expect(page1.match(/<tbody class="summary-card"/g)).toHaveLength(5);
    // Data period and last observation, source and vintage, per series.
    expect(page1).toContain('Annual, 1955 to 2024, 70 observations; last observation 2024.');
    expect(page1).toContain('Source: Vessamor billing register, connections at 31 December; vintage: extract of 2025-01-10.');
    // Next period, next full year and end of horizon under both models.
    expect(page1).toContain('<th scope="colgroup" colspan="2" class="num">Next period</th><th scope="colgroup" colspan="2" class="num">Next full year</th><th scope="colgroup" colspan="2" class="num">End of horizon</th>');
    expect(page1).toContain('<td colspan="2" class="num">2025-01</td><td colspan="2" class="num">2025 total</td><td colspan="2" class="num">2026-12</td>');
    expect(page1.match(/<tr class="(is-recommended)?"><th scope="row">(Deterministic|Stochastic)/g)).toHaveLength(10);
    // What changed since the last memo, the recommendation and its reason, the legend.
    expect(page1).toContain('Since the last memo: no earlier memo (as of a period before 2024-12) was found beside this one.');
    expect(page1.match(/Recommended: (stochastic|deterministic) trend\. The (policy|evidence) decided it/g)).toHaveLength(5);
    // The desalination backtest reached 3 of the 10 steps the memo forecasts.
    expect(page1).toContain('The backtest checked forecasts only up to 3 steps ahead, against 10 in this memo');
    expect(page1).toContain('\u25C6 marks the recommended model');
    expect(page1).toContain('A forecast is an estimate, not a guarantee.');
  });

  it('never contradicts its records', () => {
    const document = JSON.parse(readFileSync(join(folder, 'record.json'), 'utf8')) as { records: AnalysisRecord[] };
    expect(memoContradictions(document.records, readFileSync(join(folder, 'memo.html'), 'utf8'))).toEqual([]);
  });
});
