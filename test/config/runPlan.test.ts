// The plan a valid config becomes: settings merged key by key with their source and position,
// paths resolved against the config's folder, and the options handed to the analysis.
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { loadConfig } from '../../src/config/loadConfig.js';
import { listSettings } from '../../src/config/runPlan.js';
import { toAnalysisOptions } from '../../src/config/toAnalysisOptions.js';
import { BASE, BASE_DIR, planOf } from './configText.js';

const FIXTURES = resolve('test/fixtures/config');
const FULL = join(FIXTURES, 'plans/full.yaml');

describe('merging defaults and overrides', () => {
  const plan = loadConfig(FULL);
  const [inflow, reads] = plan.series;

  it('takes the series value first, then defaults, then the built-in value, each with its source', () => {
    // test/fixtures/config/plans/full.yaml: horizon 8 under defaults (line 25), 12 on reservoir-inflow (line 52).
    expect(inflow.settings.horizon).toEqual({ key: 'horizon', value: 12, source: 'config', at: { field: 'series[0].horizon', line: 52, column: 14 } });
    expect(reads.settings.horizon).toEqual({ key: 'horizon', value: 8, source: 'config', at: { field: 'defaults.horizon', line: 25, column: 12 } });
    expect(reads.settings.maxP).toMatchObject({ value: 1, source: 'config', at: { field: 'series[1].max_p', line: 61 } });
    expect(inflow.settings.maxP).toMatchObject({ value: 2, at: { field: 'defaults.max_p', line: 30 } });
  });

  it('merges settings groups key by key', () => {
    expect(inflow.settings.backtest.origins).toMatchObject({ value: 4, at: { field: 'series[0].backtest.origins', line: 55 } });
    expect(inflow.settings.backtest.window).toMatchObject({ value: 'sliding', at: { field: 'defaults.backtest.window', line: 37 } });
    expect(reads.settings.recommendation.model).toEqual({ key: 'recommendation.model', value: undefined, source: 'default' });
    expect(inflow.settings.recommendation.justification.value).toBe('The board plans on a drifting demand path.');
  });

  it('turns the transform into the form the models take and sorts the levels', () => {
    expect(inflow.settings.transform.value).toEqual({ kind: 'box-cox', lambda: 0.5 });
    expect(reads.settings.transform.value).toEqual({ kind: 'log' });
    expect(reads.settings.levels).toMatchObject({ value: [80, 95], at: { field: 'defaults.levels' } });
  });

  it('uses the built-in value with source default when nothing sets a key', () => {
    const bare = planOf(BASE).series[0].settings;
    // Built-in values from our spec (src/config/builtInSettings.ts).
    expect(listSettings(bare).map((s) => [s.key, s.value, s.source])).toEqual([
      ['horizon', undefined, 'default'],
      ['transform', { kind: 'none' }, 'default'],
      ['levels', [80, 95], 'default'],
      ['coefficient_uncertainty', true, 'default'],
      ['point', 'median', 'default'],
      ['max_p', 3, 'default'],
      ['max_q', 3, 'default'],
      ['significance', 0.05, 'default'],
      ['backtest.origins', 20, 'default'],
      ['backtest.horizon', undefined, 'default'],
      ['backtest.refit', 'reselect', 'default'],
      ['backtest.window', 'expanding', 'default'],
      ['backtest.min_train', undefined, 'default'],
      ['recommendation.rule', 'prefer-stochastic', 'default'],
      ['recommendation.significance', 0.05, 'default'],
      ['recommendation.model', undefined, 'default'],
      ['recommendation.justification', undefined, 'default'],
      ['missing', 'error', 'default'],
    ]);
  });
});

describe('paths', () => {
  it('resolves series files, the output folder and templates against the folder of the config file, keeping them as written', () => {
    const plan = loadConfig(FULL);
    expect(plan.baseDir).toBe(join(FIXTURES, 'plans'));
    expect(plan.series[0].file).toBe(join(FIXTURES, 'data/reservoir-inflow.csv'));
    expect(plan.series[0].fileAsWritten).toBe('../data/reservoir-inflow.csv');
    expect(plan.output).toEqual({
      folder: join(FIXTURES, 'build'),
      folderAsWritten: '../build',
      folderAt: { field: 'output.folder', line: 63, column: 11 },
      memoFolder: join(FIXTURES, 'build/brackenfold-water-2026'),
      formats: ['html', 'json'],
      paper: 'Letter',
      templates: { folder: join(FIXTURES, 'house-style'), folderAsWritten: '../house-style', at: { field: 'output.templates', line: 66, column: 14 } },
    });
  });

  it('defaults the output to out/ beside the config, in every format', () => {
    expect(planOf(BASE).output).toEqual({
      folder: '/plans/out',
      folderAsWritten: 'out',
      memoFolder: '/plans/out/water-outlook',
      formats: ['html', 'pdf', 'json', 'csv'],
      paper: 'A4',
      templates: undefined,
    });
    expect(planOf(BASE).series[0].file).toBe(join(BASE_DIR, 'data/inflow.csv'));
  });

  it('keeps an absolute series path as it is', () => {
    expect(planOf([...BASE.slice(0, 5), '    file: /data/inflow.csv']).series[0].file).toBe('/data/inflow.csv');
  });
});

describe('memo details and analysis options', () => {
  it('carries the memo details over with the reviewers and sign-offs', () => {
    const { memo } = loadConfig(FULL);
    expect(memo).toMatchObject({ id: 'brackenfold-water-2026', asOf: '2026-Q3', preparedBy: 'Forecasting desk', reference: 'BWB-2026-07' });
    expect(memo.title).toBe('Brackenfold Water Board – supply outlook <draft> & notes');
    expect(memo.reviewers).toEqual([{ name: 'Ada Quill', role: 'engagement lead' }, { name: 'Ben Moss' }]);
    expect(memo.signOff.map((s) => [s.reviewer, s.date, s.decision])).toEqual([
      ['Ada Quill', '2026-10-05', 'approved-with-changes'],
      ['Ben Moss', '2026-10-07', 'approved'],
    ]);
    expect(memo.signOff[0].comment).toBe('Widen the discussion of the 95% intervals.\nKeep the stochastic model as the headline.\n');
  });

  it('passes every effective setting to the analysis', () => {
    const [inflow, reads] = loadConfig(FULL).series;
    expect(toAnalysisOptions(inflow)).toEqual({
      id: 'reservoir-inflow',
      title: 'Reservoir inflow',
      horizon: 12,
      levels: [80, 95],
      maxP: 2,
      maxQ: 2,
      transform: { kind: 'box-cox', lambda: 0.5 },
      coefficientUncertainty: false,
      point: 'mean',
      significance: 0.1,
    });
    expect(toAnalysisOptions(reads)).toMatchObject({ title: 'meter-reads', horizon: 8, maxP: 1, transform: { kind: 'log' } });
  });
});
