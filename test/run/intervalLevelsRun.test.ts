// `trendbrief run` end to end at interval levels other than the built-in 80 and 95: one run of
// three configs (so one Chromium prints all three PDFs), each memo naming exactly its own
// levels in its tables and chart descriptions, forecasts.csv with a lower and upper column per
// level, and record.json with intervals at exactly those levels. Expected wording and columns
// are our spec (src/memo/wording.ts, chartWording.ts, src/run/forecastsCsv.ts); numbers are
// the record's own.
import { readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import type { RecordDocument } from '../../src/run/recordDocument.js';
import { runCli, type CliRun } from '../support/runCli.js';
import { fixRunDate, memoConfig, monthlyFolder } from './monthlySetup.js';

interface LevelCase {
  id: string;
  levels: number[];
  /** How the forecast chart's description names the intervals (our spec). */
  named: string;
  /** The forecast chart's key to its shading (our spec). */
  shading: string;
  /** The widest level, which the single-number places read (our spec). */
  widest: number;
}

const CASES: LevelCase[] = [
  { id: 'levels-50-90', levels: [50, 90], named: 'with its 50% and 90% prediction intervals.', shading: 'Shading: 50% (darker) and 90% prediction intervals.', widest: 90 },
  { id: 'levels-90', levels: [90], named: 'with its 90% prediction interval.', shading: 'Shading: 90% prediction interval.', widest: 90 },
  {
    id: 'levels-68-95-99',
    levels: [68, 95, 99],
    named: 'with its 68%, 95% and 99% prediction intervals.',
    shading: 'Shading, darkest to lightest: 68%, 95% and 99% prediction intervals.',
    widest: 99,
  },
];

/** The levels a fragment of the memo names before `what`, e.g. "90% interval", each once, ascending. */
function levelsNamed(fragment: string, what: string): number[] {
  const found = Array.from(fragment.matchAll(new RegExp(`(\\d+(?:\\.\\d+)?)% ${what}`, 'g')), (m) => Number(m[1]));
  return [...new Set(found)].sort((a, b) => a - b);
}

/** From the opening tag that starts with `start` to the end of its element `tag`. */
function elementOf(html: string, start: string, tag: string): string {
  const from = html.indexOf(start);
  if (from < 0) throw new Error(`no ${start}`);
  return html.slice(from, html.indexOf(`</${tag}>`, from));
}

let root = '';
let run: CliRun;
fixRunDate('all');

beforeAll(async () => {
  root = monthlyFolder(undefined);
  for (const c of CASES) writeFileSync(join(root, `${c.id}.yaml`), memoConfig(undefined, '[html, pdf, json, csv]', `Lake outlook at ${c.levels.join(', ')}`, c));
  run = await runCli(['run', ...CASES.map((c) => join(root, `${c.id}.yaml`)), '--quiet']);
});

describe('run at other interval levels', () => {
  it('exits 0 with nothing on stderr', () => {
    expect(run.stderr).toBe('');
    expect(run.code).toBe(0);
  });

  for (const c of CASES) {
    describe(`levels ${c.levels.join(', ')}`, () => {
      const read = (file: string): string => readFileSync(join(root, 'out', c.id, file), 'utf8');
      const keys = c.levels.map(String);

      it('records intervals at exactly those levels', () => {
        const { records } = JSON.parse(read('record.json')) as RecordDocument;
        expect(records[0].settings.levels).toEqual(c.levels);
        for (const row of [...records[0].forecasts.deterministic, ...records[0].forecasts.stochastic]) expect(Object.keys(row.intervals).sort()).toEqual(keys);
        for (const row of records[0].backtest?.per_horizon.stochastic ?? []) expect(Object.keys(row.coverage).sort()).toEqual(keys);
        // The scored level defaults to the widest (src/config/resolveSettings.ts).
        expect(records[0].recommendation?.scored_level).toBe(c.widest);
      });

      it('writes a lower and an upper column per level to forecasts.csv, with the record numbers', () => {
        const [header, first] = read('forecasts.csv').split('\r\n');
        const bounds = c.levels.flatMap((level) => [`lower_${level}`, `upper_${level}`]);
        expect(header).toBe(['series_id', 'units', 'model', 'recommended', 'h', 'period', 'period_start', 'point', ...bounds, 'model_scale_mean', 'se_process', 'se_total'].join(','));
        const { records } = JSON.parse(read('record.json')) as RecordDocument;
        const row = records[0].forecasts.deterministic[0];
        // forecasts.csv rounds to 6 significant digits (src/run/forecastsCsv.ts).
        expect(first.split(',').slice(8, 8 + bounds.length).map(Number)).toEqual(c.levels.flatMap((level) => row.intervals[String(level)].map((value) => Number(value.toPrecision(6)))));
      });

      it('names exactly those levels in the tables, the chart descriptions and the shading key', () => {
        const html = read('memo.html');
        // Page 1 gives each figure with the widest level's interval beside it, and says which.
        expect(html).toContain(`Each figure is a point forecast with its ${c.widest}% prediction interval beside it.`);
        expect(levelsNamed(elementOf(html, '<table class="numbers forecast-table', 'table'), 'interval')).toEqual(c.levels);
        expect(levelsNamed(elementOf(html, '<table class="numbers backtest-summary', 'table'), 'cover')).toEqual(c.levels);
        expect(levelsNamed(elementOf(html, '<table class="numbers backtest-summary', 'table'), 'interval score')).toEqual([c.widest]);
        expect(levelsNamed(elementOf(html, '<table class="numbers comparison', 'table'), 'interval score')).toEqual([c.widest]);
        const forecastCaption = elementOf(elementOf(html, '<figure class="chart" id="series-1-forecast">', 'figure'), '<figcaption>', 'figcaption');
        expect(forecastCaption).toContain(c.named);
        expect(levelsNamed(forecastCaption, 'interval ')).toEqual([c.widest]);
        expect(html).toContain(c.shading);
        expect(elementOf(html, '<p class="width-note">', 'p')).toContain(`the deterministic model&#x27;s ${c.widest}% interval`);
        expect(html).toContain(`the average ${c.widest}% interval score`);
        // Outside the charts' SVG, where 80% may be an axis tick.
        if (!c.levels.includes(80)) expect(html.replace(/<svg[\s\S]*?<\/svg>/g, '')).not.toMatch(/\b80%/);
      });

      it('prints the memo to PDF', () => {
        const pdf = readFileSync(join(root, 'out', c.id, 'memo.pdf'));
        expect(pdf.subarray(0, 5).toString('latin1')).toBe('%PDF-');
      });
    });
  }
});
