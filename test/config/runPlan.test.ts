// The plan a valid config becomes: settings merged key by key with their source and position,
// paths resolved against the config's folder, and the options handed to the analysis.
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { loadConfig } from '../../src/config/loadConfig.js';
import { resolveSettings } from '../../src/config/resolveSettings.js';
import { SETTING_KEYS } from '../../src/config/settingsSpec.js';
import { BASE, BASE_DIR, onlyProblem, planOf } from './configText.js';

const FIXTURES = resolve('test/fixtures/config');
const FULL = join(FIXTURES, 'plans/full.yaml');

describe('merging defaults and overrides', () => {
  const plan = loadConfig(FULL);
  const [inflow, reads] = plan.series;
  const resolved = (series: typeof inflow) => resolveSettings(series.settings, { frequency: 'annual', n: 100 });

  it('takes the series value first, then defaults, each with the place that set it', () => {
    // test/fixtures/config/plans/full.yaml: horizon 8 under defaults (line 25), 12 on reservoir-inflow (line 52).
    expect(inflow.settings.horizon).toBe(12);
    expect(inflow.settingPlaces.get('horizon')).toEqual({ field: 'series[0].horizon', line: 52, column: 14 });
    expect(reads.settings.horizon).toBe(8);
    expect(reads.settingPlaces.get('horizon')).toEqual({ field: 'defaults.horizon', line: 25, column: 12 });
    expect(reads.settings.max_p).toBe(1);
    expect(reads.settingPlaces.get('max_p')).toMatchObject({ field: 'series[1].max_p', line: 61 });
    expect(inflow.settings.max_p).toBe(2);
    expect(inflow.settingPlaces.get('max_p')).toMatchObject({ field: 'defaults.max_p', line: 30 });
  });

  it("lets a series' own horizon or through replace either under defaults, and refuses both at one level", () => {
    // Lines 1-6 are BASE; the defaults say through, the series horizon (and the other way round).
    const throughDefault = ['defaults:', '  through: 2030', ...BASE.slice(0, 6), '    horizon: 4'];
    const [own] = planOf(throughDefault).series;
    expect(own.settings).toEqual({ horizon: 4 });
    expect([...own.settingPlaces.keys()]).toEqual(['horizon']);
    const [shared] = planOf(['defaults:', '  horizon: 12', ...BASE, '    through: 2026-12']).series;
    expect(shared.settings).toEqual({ through: '2026-12' });
    expect(shared.settingPlaces.get('through')).toMatchObject({ field: 'series[0].through', line: 9 });
    expect(onlyProblem([...BASE, '    horizon: 4', '    through: 2030'])).toMatchObject({
      where: '8:14 series[0].through',
      code: 'config.horizon-and-through',
    });
  });

  it('merges settings groups key by key', () => {
    expect(inflow.settings.backtest?.origins).toBe(4);
    expect(inflow.settingPlaces.get('backtest.origins')).toMatchObject({ field: 'series[0].backtest.origins', line: 55 });
    expect(inflow.settings.backtest?.window).toBe('sliding');
    expect(inflow.settingPlaces.get('backtest.window')).toMatchObject({ field: 'defaults.backtest.window', line: 37 });
    expect(reads.settings.recommendation?.model).toBeUndefined();
    expect(reads.settingPlaces.has('recommendation.model')).toBe(false);
    expect(inflow.settings.recommendation?.justification).toBe('The board plans on a drifting demand path.');
  });

  it('resolves the transform into the form the models take and sorts the levels', () => {
    expect(resolved(inflow).transform).toEqual({ kind: 'box-cox', lambda: 0.5 });
    expect(resolved(reads).transform).toEqual({ kind: 'log' });
    expect(resolved(reads).levels).toEqual([80, 95]);
    expect(reads.settingPlaces.get('levels')).toMatchObject({ field: 'defaults.levels' });
  });

  it('leaves out what nothing sets: resolveSettings gives the built-in value', () => {
    const bare = planOf(BASE).series[0];
    expect(bare.settings).toEqual({});
    expect(bare.settingPlaces.size).toBe(0);
    // Every setting, in the order of the spec (src/config/settingsSpec.ts), the order of the memo's register.
    expect(SETTING_KEYS).toEqual([
      'horizon',
      'through',
      'transform',
      'levels',
      'coefficient_uncertainty',
      'point',
      'year_figure',
      'estimation',
      'seasonal',
      'max_p',
      'max_q',
      'significance',
      'backtest.origins',
      'backtest.horizon',
      'backtest.refit',
      'backtest.window',
      'backtest.min_train',
      'recommendation.rule',
      'recommendation.significance',
      'recommendation.scored_level',
      'recommendation.model',
      'recommendation.justification',
      'missing',
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
    expect(memo).toMatchObject({ id: 'brackenfold-water-2026', asOf: '2025-Q1', preparedBy: 'Forecasting desk', reference: 'BWB-2026-07' });
    expect(memo.title).toBe('Brackenfold Water Board – supply outlook <draft> & notes');
    expect(memo.reviewers).toEqual([{ name: 'Ada Quill', role: 'engagement lead' }, { name: 'Ben Moss' }]);
    expect(memo.signOff.map((s) => [s.reviewer, s.date, s.decision])).toEqual([
      ['Ada Quill', '2026-10-05', 'approved-with-changes'],
      ['Ben Moss', '2026-10-07', 'approved'],
    ]);
    expect(memo.signOff[0].comment).toBe('Widen the discussion of the 95% intervals.\nKeep the stochastic model as the headline.\n');
  });

  it('resolves every effective setting for the analysis', () => {
    const [inflow, reads] = loadConfig(FULL).series;
    expect(resolveSettings(inflow.settings, { frequency: 'annual', n: 100 })).toMatchObject({
      horizon: 12,
      levels: [80, 95],
      max_p: 2,
      max_q: 2,
      transform: { kind: 'box-cox', lambda: 0.5 },
      coefficient_uncertainty: false,
      point: 'mean',
      significance: 0.1,
    });
    expect(resolveSettings(reads.settings, { frequency: 'annual', n: 100 })).toMatchObject({ horizon: 8, max_p: 1, transform: { kind: 'log' } });
    expect(reads.title).toBe('meter-reads');
  });
});
