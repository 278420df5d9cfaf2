// A realistic MemoInput for the memo tests: three open datasets from test/fixtures/ analysed
// by analyseSeries (provenance in test/fixtures/README.md), evidence and trend stability
// included, each with hand-made backtest and recommendation parts, for an invented
// consultancy and client.
import { analyseSeries } from '../../src/analysis/analyseSeries.js';
import type { WrittenSettings } from '../../src/config/resolveSettings.js';
import { readSeriesCsv } from '../../src/data/readSeriesCsv.js';
import type { MemoInput, MemoSeries } from '../../src/memo/memoInput.js';
import type { AnalysisRecord } from '../../src/analysis/record.js';
import { settingsFor } from '../support/settings.js';
import { handMadeBacktest, handMadeRecommendation } from './handMadeParts.js';

interface FixtureSpec {
  file: string;
  id: string;
  title: string;
  settings: WrittenSettings;
  units: string;
}

const FIXTURES = {
  lakeHuron: { file: 'test/fixtures/lake-huron.csv', id: 'lake-huron', title: 'Lake Huron mean level', settings: {}, units: 'ft' },
  nile: { file: 'test/fixtures/nile.csv', id: 'nile', title: 'Nile flow at Aswan', settings: {}, units: '10⁸ m³' },
  gdp: { file: 'test/fixtures/us-real-gdp.csv', id: 'us-real-gdp', title: 'US real GDP', settings: { transform: 'log', horizon: 12, seasonal: 'none' }, units: 'bn USD (2005)' },
} satisfies Record<string, FixtureSpec>;

export type FixtureName = keyof typeof FIXTURES;

/** Each fixture analysed once per test file, without a backtest. */
const analysed = new Map(
  await Promise.all(
    (Object.entries(FIXTURES) as [FixtureName, FixtureSpec][]).map(async ([name, spec]) => {
      const series = readSeriesCsv(spec.file, { missing: 'error' });
      const record = await analyseSeries(series, settingsFor(spec.settings, series.frequency, series.n), { id: spec.id, title: spec.title, file: spec.file }, { backtest: false });
      const history = series.periods.map((period, i) => ({ period, value: series.values[i] }));
      return [name, { record, history }] as const;
    }),
  ),
);

/** A copy of the fixture's record and history, free to change. */
function analysedFixture(name: FixtureName): { record: AnalysisRecord; history: MemoSeries['history'] } {
  const found = analysed.get(name);
  if (found === undefined) throw new Error(`no fixture ${name}`);
  return structuredClone(found);
}

/** The fixture's record as analyseSeries writes it, without the backtest and recommendation parts. */
export function bareRecord(name: FixtureName): AnalysisRecord {
  return analysedFixture(name).record;
}

/** The fixture's record with the backtest and recommendation attached. */
export function fullRecord(name: FixtureName): AnalysisRecord {
  const record = bareRecord(name);
  record.backtest = handMadeBacktest(record);
  record.recommendation = handMadeRecommendation(name === 'lakeHuron' ? 'deterministic' : 'stochastic');
  return record;
}

export function sampleSeries(name: FixtureName): MemoSeries {
  const { history } = analysedFixture(name);
  return {
    record: fullRecord(name),
    history,
    units: FIXTURES[name].units,
    notes: name === 'nile' ? 'Flow volumes as published; the first Aswan dam (completed 1902) is part of the history.' : undefined,
    assumptions: [
      { choice: 'Forecast horizon', value: String(analysedFixture(name).record.settings.horizon), basis: 'Planning cycle agreed with the client', set_by: name === 'gdp' ? 'config' : 'default' },
      { choice: 'Interval levels', value: '80%, 95%', basis: 'Tool default', set_by: 'default' },
      { choice: 'Transform', value: name === 'gdp' ? 'natural log' : 'none', basis: name === 'gdp' ? 'Growth is roughly proportional to the level' : 'Tool default', set_by: name === 'gdp' ? 'config' : 'default' },
    ],
  };
}

export function sampleInput(names: readonly FixtureName[] = ['lakeHuron', 'nile', 'gdp']): MemoInput {
  return {
    memo: {
      id: 'TM-2026-014',
      title: 'Long-range outlook for basin inflows and demand drivers',
      client: 'Vessamor Basin Water Cooperative',
      prepared_by: 'Tallowmere Planning Analytics',
      reference: 'VBWC/PLAN/2026/07',
      as_of: '2026-11-30',
      author: 'Ines Marrow',
      reviewers: [
        { name: 'Oskar Pellin', role: 'Engagement reviewer' },
        { name: 'Ruth Anselm', role: 'Quality reviewer' },
      ],
      sign_off: [{ reviewer: 'Oskar Pellin', date: '2026-12-01', decision: 'approved-with-changes', comment: 'Widen the discussion of the Nile break.' }],
    },
    paper: 'A4',
    series: names.map(sampleSeries),
    reproducibility: {
      tool: 'trendbrief',
      version: '0.1.0',
      command: 'trendbrief run configs/basin-outlook.yaml',
      run_date: '2026-11-30',
      config: { file: 'configs/basin-outlook.yaml', sha256: '3f1c9a0e5b7d2468ace13579bdf02468ace13579bdf02468ace13579bdf0246a' },
      data: names.map((name) => ({ file: FIXTURES[name].file, sha256: analysedFixture(name).record.series.source.sha256 })),
    },
  };
}
