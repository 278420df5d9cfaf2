// A valid config → RunPlan: each series' settings merged key by key (the series' own value,
// else the one under defaults) with the position that set each, and every path resolved
// against the config's folder. Built-in values are applied later, by resolveSettings.
import { isAbsolute, resolve } from 'node:path';
import { DEFAULT_OUTPUT_FOLDER, DEFAULT_OUTPUT_FORMATS, type ConfigDocument, type SeriesEntry, type SettingsEntry } from './configSpec.js';
import type { Position } from './readYamlTree.js';
import type { WrittenSettings } from './resolveSettings.js';
import type { ConfigPlace, OutputPlan, RunPlan, SeriesPlan } from './runPlan.js';
import { SETTING_KEYS } from './settingsSpec.js';

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
      asOfAt: memo.as_of === undefined ? undefined : placeOf('memo.as_of'),
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
    formats: output.formats ?? [...DEFAULT_OUTPUT_FORMATS],
    paper: output.paper ?? 'A4',
    templates:
      output.templates === undefined
        ? undefined
        : { folder: resolvePath(baseDir, output.templates), folderAsWritten: output.templates, at: placeOf('output.templates') },
  };
}

function seriesPlan(
  entry: SeriesEntry,
  index: number,
  defaults: SettingsEntry,
  baseDir: string,
  placeOf: (field: string) => ConfigPlace,
): SeriesPlan {
  const settingPlaces = new Map<string, ConfigPlace>();
  // The series' own value first, then the one under defaults; groups merge key by key.
  const pick = <T>(key: string, own: T | undefined, shared: T | undefined): T | undefined => {
    if (own !== undefined) settingPlaces.set(key, placeOf(`series[${index}].${key}`));
    else if (shared !== undefined) settingPlaces.set(key, placeOf(`defaults.${key}`));
    return own ?? shared;
  };
  const merged: Record<string, unknown> = {};
  for (const key of SETTING_KEYS) {
    const [group, inner] = key.split('.');
    const own = (entry as Record<string, unknown>)[group];
    const shared = (defaults as Record<string, unknown>)[group];
    if (inner === undefined) {
      const value = pick(key, own, shared);
      if (value !== undefined) merged[key] = value;
      continue;
    }
    const value = pick(key, (own as Record<string, unknown> | undefined)?.[inner], (shared as Record<string, unknown> | undefined)?.[inner]);
    if (value !== undefined) merged[group] = { ...(merged[group] as object | undefined), [inner]: value };
  }
  // How far to forecast is one choice written two ways: a series' own horizon or through
  // replaces either under defaults (the config rules refuse both at one level).
  const reach = { horizon: entry.horizon, through: entry.through };
  for (const [key, other] of [['horizon', 'through'], ['through', 'horizon']] as const) {
    if (reach[key] !== undefined && reach[other] === undefined) {
      delete merged[other];
      settingPlaces.delete(other);
    }
  }
  return {
    id: entry.id,
    title: entry.title ?? entry.id,
    units: entry.units,
    notes: entry.notes,
    source: entry.source,
    vintage: entry.vintage,
    file: resolvePath(baseDir, entry.file),
    fileAsWritten: entry.file,
    fileAt: placeOf(`series[${index}].file`),
    periodColumn: entry.period_column,
    column: entry.column,
    frequency: entry.frequency,
    sheet: entry.sheet,
    delimiter: entry.delimiter,
    decimalMark: entry.decimal_mark,
    at: placeOf(`series[${index}]`),
    // The spec validated every value; the merge keeps each under its own key.
    settings: merged as WrittenSettings,
    settingPlaces,
  };
}
