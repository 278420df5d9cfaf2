// The next full calendar year in the memo: the summary card's rows and sentence, the method
// note under the forecast table, the assumptions register, and the consistency check that
// reads them back. Data: US accidental deaths, monthly 1973-01 to 1978-12 (R datasets::USAccDeaths),
// and the memo sample's series (Lake Huron annual, US real GDP quarterly on the log scale;
// provenance in test/fixtures/README.md). The expected sentences are our wording's
// (src/memo/yearWording.ts); the numbers are the record's.
import { beforeAll, describe, expect, it } from 'vitest';
import type { AnalysisRecord } from '../../src/analysis/record.js';
import { memoContradictions } from '../../src/memo/consistency/memoContradictions.js';
import { renderMemoHtml } from '../../src/memo/renderMemoHtml.js';
import { summaryYear } from '../../src/memo/view/yearView.js';
import { yearNote } from '../../src/memo/view/yearView.js';
import { assumptionsRegister } from '../../src/run/assumptionsRegister.js';
import { fitRecord, runCli } from '../support/runCli.js';
import { handMadeRecommendation } from './handMadeParts.js';
import { sampleInput } from './sampleInput.js';

const DEATHS = 'test/fixtures/seasonal/us-accidental-deaths.csv';

/** The year's part of page 1, in plain words, for the sentences. */
function cardOf(record: AnalysisRecord, decimals = 0) {
  return { year: summaryYear(record, decimals) };
}

describe('a monthly flow, its total', () => {
  let record: AnalysisRecord;
  beforeAll(async () => {
    record = await fitRecord(DEATHS, ['--year-figure', 'total', '--max-p', '1', '--max-q', '1']);
    record.recommendation = handMadeRecommendation('stochastic');
  }, 60_000);

  it('gives the year after the data, its total under both models, and the recommended one in words', () => {
    const year = record.next_year;
    // The data end in December 1978, so 1979 is h = 1..12 of the 24-month horizon.
    expect(year).toMatchObject({ year: '1979', figure: 'total', periods: 12, first_h: 1, last_h: 12, available: true, method: 'normal' });
    const card = cardOf(record);
    expect(card.year?.head).toBe('1979 total');
    expect(card.year?.models.map((row) => [row.name, row.recommended])).toEqual([
      ['Deterministic', false],
      ['Stochastic', true],
    ]);
    const stochastic = year?.stochastic;
    const fmt = (value: number | undefined) => Math.round(value ?? Number.NaN).toLocaleString('en-GB');
    expect(card.year?.sentence).toBe(
      `1979 as a whole (the total of its 12 months): ${fmt(stochastic?.point)} under the stochastic-trend model, 95% interval ${fmt(stochastic?.intervals['95'][0])} to ${fmt(stochastic?.intervals['95'][1])}.`,
    );
    expect(card.year?.models[1].point).toBe(fmt(stochastic?.point));
  });

  it('states the method in the note: the joint distribution, and what independence would have given', () => {
    const note = yearNote(record, 0);
    expect(note.startsWith('The figure for 1979 on the first page is the total of its 12 months:')).toBe(true);
    expect(note).toContain('joint distribution of the months\u2019 forecast errors');
    // No transform: nothing is simulated.
    expect(note).not.toContain('simulated');
    const share = Math.round((100 * (record.next_year?.stochastic?.sd_if_independent ?? 0)) / (record.next_year?.stochastic?.sd ?? 1));
    expect(note).toContain(`under the deterministic trend and ${share}% under the stochastic trend`);
    expect(share).toBeLessThan(100);
  });

  it('records the choice in the assumptions register, set by the option as a config would', () => {
    const plan = { id: 'deaths', title: 'Accidental deaths', file: DEATHS, fileAsWritten: DEATHS, at: { field: 'series[0]', line: 12, column: 5 }, settings: {}, settingPlaces: new Map([['year_figure', { field: 'series[0].year_figure', line: 17, column: 18 }]]) };
    const row = assumptionsRegister(plan, record, 'memo.yaml').find((entry) => entry.choice === 'Figure for a whole year');
    expect(row).toEqual({ choice: 'Figure for a whole year', value: 'total of the 12 months', basis: 'memo.yaml, line 17 (series[0].year_figure)', set_by: 'config' });
  });

  it("is in fit's terminal summary too", async () => {
    const run = await runCli(['fit', DEATHS, '--year-figure', 'total', '--max-p', '1', '--max-q', '1']);
    expect(run.code).toBe(0);
    const lines = run.stdout.split('\n');
    const at = lines.indexOf('Next full year 1979: the total of 1979-01 to 1979-12 (exact, from the joint forecast errors)');
    expect(at).toBeGreaterThan(0);
    expect(lines[at + 1].trim().split(/\s{2,}/)).toEqual(['Point', '80% interval', '95% interval']);
    expect(lines[at + 3].trim().startsWith('Stochastic trend')).toBe(true);
  }, 60_000);

  it('says plainly when the horizon stops inside the year, and gives no partial year', async () => {
    const short = await fitRecord(DEATHS, ['--year-figure', 'total', '--max-p', '1', '--max-q', '1', '--horizon', '11']);
    short.recommendation = handMadeRecommendation('stochastic');
    expect(short.next_year).toMatchObject({ available: false, horizon_end: '1979-11', deterministic: null, stochastic: null });
    const card = cardOf(short);
    expect(card.year).toEqual({
      head: '',
      models: [],
      sentence: 'The forecast horizon ends at 1979-11, before 1979 is complete, so the memo gives no figure for 1979 as a whole; a horizon reaching 1979-12 would.',
    });
    expect(yearNote(short, 0)).toBe('');
  }, 60_000);
});

describe('in the rendered memo', () => {
  const input = sampleInput();
  let html = '';
  beforeAll(async () => {
    html = await renderMemoHtml(input);
  }, 60_000);
  const gdp = (): AnalysisRecord => {
    const found = input.series.find((entry) => entry.record.series.id === 'us-real-gdp')?.record;
    if (found === undefined) throw new Error('no GDP series in the sample');
    return found;
  };
  const records = (): AnalysisRecord[] => input.series.map((entry) => entry.record);

  it('gives a quarterly series on the log scale its simulated average, with the median convention said', () => {
    // US real GDP ends 2009-Q3, so the next full year is 2010, h = 2..5 of 12; the built-in figure is the average.
    expect(gdp().next_year).toMatchObject({ year: '2010', figure: 'average', first_h: 2, last_h: 5, method: 'simulation', draws: 20_000 });
    expect(html).toContain('2010 as a whole (the average of its 4 quarters): ');
    expect(html).toContain('(the median of the simulated averages, as the quarterly figures are medians)');
    expect(html).toContain('it is simulated: 20,000 draws of the 4 quarters together from each fitted model');
    const error = 100 * Math.max(gdp().next_year?.deterministic?.simulation_error ?? 0, gdp().next_year?.stochastic?.simulation_error ?? 0);
    expect(html).toContain(`another seed would move the interval\u2019s ends by up to ${error.toFixed(1)}% of its half-width (95% bounds)`);
    // Page 1 gives the year's column under both models; Lake Huron and the Nile are annual, so their next period is their next year.
    expect(html).toContain('<td colspan="2" class="num">2010 average</td>');
    expect(html.split('next full year: as next period')).toHaveLength(3);
  });

  it('passes the consistency check as rendered, and fails it when the record says otherwise', () => {
    expect(memoContradictions(records(), html)).toEqual([]);
    const year = gdp().next_year;
    const figure = year?.stochastic;
    if (year === null || year === undefined || figure === null || figure === undefined) throw new Error('no year figure');
    const altered = (change: (record: AnalysisRecord) => void): string[] => {
      const changed = records().map((record) => structuredClone(record));
      const target = changed.find((record) => record.series.id === 'us-real-gdp');
      if (target !== undefined) change(target);
      return memoContradictions(changed, html);
    };
    expect(altered((record) => record.next_year?.stochastic && (record.next_year.stochastic.point *= 1.01))).toEqual([
      expect.stringContaining('series us-real-gdp: the memo gives'),
      expect.stringContaining('series us-real-gdp: the note on the figure for 2010'),
    ]);
    expect(altered((record) => record.next_year?.deterministic && (record.next_year.deterministic.sd_if_independent *= 1.2))).toEqual([
      'series us-real-gdp: the note on the figure for 2010 does not agree with the record\'s figures',
    ]);
    expect(altered((record) => record.next_year?.stochastic && (record.next_year.stochastic.simulation_error = 0.5))).toEqual([expect.stringContaining("the memo puts the simulation's error at")]);
    expect(altered((record) => record.next_year && (record.next_year.year = '2011'))).toContainEqual('series us-real-gdp: the record has a figure for 2011 and the summary does not give the recommended model\'s');
  });
});
