// A valid config → RunPlan: each series' settings merged key by key (the series' own value,
// else the one under defaults, else the built-in one), each with its source and position, and
// every path resolved against the config's folder.
import { isAbsolute, resolve } from 'node:path';
import type { TransformSpec } from '../data/series.js';
import { BUILT_IN_SETTINGS as BUILT_IN } from './builtInSettings.js';
import { DEFAULT_OUTPUT_FOLDER, OUTPUT_FORMATS, type ConfigDocument, type SeriesEntry, type SettingsEntry } from './configSpec.js';
import type { Position } from './readYamlTree.js';
import type { ConfigPlace, OutputPlan, RunPlan, SeriesPlan, SeriesSettings, Setting } from './runPlan.js';

export interface PlanSource {
  configFile: string;
  configSha256: string;
  /** Absolute. */
  baseDir: string;
  positions: ReadonlyMap<string, Position>;
}

export function buildRunPlan(doc: ConfigDocument, source: PlanSource): RunPlan {
  const placeOf = (field: string): ConfigPlace => {
    const at = source.positions.get(field);
    if (at === undefined) throw new Error(`buildRunPlan: no position recorded for ${field}`);
    return { field, ...at };
  };
  const { memo } = doc;
  return {
    configFile: source.configFile,
    configSha256: source.configSha256,
    baseDir: source.baseDir,
    memo: {
      id: memo.id,
      title: memo.title,
      client: memo.client,
      preparedBy: memo.prepared_by,
      reference: memo.reference,
      asOf: memo.as_of,
      author: memo.author,
      reviewers: memo.reviewers ?? [],
      signOff: memo.sign_off ?? [],
    },
    output: outputPlan(doc, source.baseDir, placeOf),
    series: doc.series.map((entry, index) => seriesPlan(entry, index, doc.defaults ?? {}, source.baseDir, placeOf)),
  };
}

function resolvePath(baseDir: string, written: string): string {
  return isAbsolute(written) ? resolve(written) : resolve(baseDir, written);
}

function outputPlan(doc: ConfigDocument, baseDir: string, placeOf: (field: string) => ConfigPlace): OutputPlan {
  const output = doc.output ?? {};
  const folderAsWritten = output.folder ?? DEFAULT_OUTPUT_FOLDER;
  const folder = resolvePath(baseDir, folderAsWritten);
  return {
    folder,
    folderAsWritten,
    folderAt: output.folder === undefined ? undefined : placeOf('output.folder'),
    memoFolder: resolve(folder, doc.memo.id),
    formats: output.formats ?? [...OUTPUT_FORMATS],
    paper: output.paper ?? 'A4',
    templates:
      output.templates === undefined
        ? undefined
        : { folder: resolvePath(baseDir, output.templates), folderAsWritten: output.templates, at: placeOf('output.templates') },
  };
}

function toTransform(written: 'none' | 'log' | { box_cox: number }): TransformSpec {
  return typeof written === 'string' ? { kind: written } : { kind: 'box-cox', lambda: written.box_cox };
}

function seriesPlan(
  entry: SeriesEntry,
  index: number,
  defaults: SettingsEntry,
  baseDir: string,
  placeOf: (field: string) => ConfigPlace,
): SeriesPlan {
  const pick = <T>(key: string, own: T | undefined, shared: T | undefined, fallback: T): Setting<T> => {
    if (own !== undefined) return { key, value: own, source: 'config', at: placeOf(`series[${index}].${key}`) };
    if (shared !== undefined) return { key, value: shared, source: 'config', at: placeOf(`defaults.${key}`) };
    return { key, value: fallback, source: 'default' };
  };
  const transform = pick('transform', entry.transform, defaults.transform, BUILT_IN.transform);
  const levels = pick<readonly number[]>('levels', entry.levels, defaults.levels, BUILT_IN.levels);
  const backtest = { own: entry.backtest ?? {}, shared: defaults.backtest ?? {} };
  const recommendation = { own: entry.recommendation ?? {}, shared: defaults.recommendation ?? {} };
  const settings: SeriesSettings = {
    horizon: pick<number | undefined>('horizon', entry.horizon, defaults.horizon, undefined),
    transform: { ...transform, value: toTransform(transform.value) },
    levels: { ...levels, value: [...levels.value].sort((a, b) => a - b) },
    coefficientUncertainty: pick('coefficient_uncertainty', entry.coefficient_uncertainty, defaults.coefficient_uncertainty, BUILT_IN.coefficient_uncertainty),
    point: pick('point', entry.point, defaults.point, BUILT_IN.point),
    maxP: pick('max_p', entry.max_p, defaults.max_p, BUILT_IN.max_p),
    maxQ: pick('max_q', entry.max_q, defaults.max_q, BUILT_IN.max_q),
    significance: pick('significance', entry.significance, defaults.significance, BUILT_IN.significance),
    backtest: {
      origins: pick('backtest.origins', backtest.own.origins, backtest.shared.origins, BUILT_IN.backtest.origins),
      horizon: pick<number | undefined>('backtest.horizon', backtest.own.horizon, backtest.shared.horizon, undefined),
      refit: pick('backtest.refit', backtest.own.refit, backtest.shared.refit, BUILT_IN.backtest.refit),
      window: pick('backtest.window', backtest.own.window, backtest.shared.window, BUILT_IN.backtest.window),
      minTrain: pick<number | undefined>('backtest.min_train', backtest.own.min_train, backtest.shared.min_train, undefined),
    },
    recommendation: {
      rule: pick('recommendation.rule', recommendation.own.rule, recommendation.shared.rule, BUILT_IN.recommendation.rule),
      significance: pick(
        'recommendation.significance',
        recommendation.own.significance,
        recommendation.shared.significance,
        BUILT_IN.recommendation.significance,
      ),
      model: pick<'deterministic' | 'stochastic' | undefined>('recommendation.model', recommendation.own.model, recommendation.shared.model, undefined),
      justification: pick<string | undefined>(
        'recommendation.justification',
        recommendation.own.justification,
        recommendation.shared.justification,
        undefined,
      ),
    },
    missing: pick('missing', entry.missing, defaults.missing, BUILT_IN.missing),
  };
  return {
    id: entry.id,
    title: entry.title ?? entry.id,
    units: entry.units,
    notes: entry.notes,
    file: resolvePath(baseDir, entry.file),
    fileAsWritten: entry.file,
    periodColumn: entry.period_column,
    column: entry.column,
    frequency: entry.frequency,
    at: placeOf(`series[${index}]`),
    settings,
  };
}
