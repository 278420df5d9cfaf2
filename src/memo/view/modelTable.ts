// A table of both trend models by horizon. With few interval levels the models stand side by
// side, each a group of columns; with more a row of both is wider than the page, so the
// models are stacked, each a group of rows under one set of columns.
import { TREND_MODELS, type TrendModelKind } from '../../base/settings.js';

/** Most interval levels whose columns fit both models side by side in the text column. */
export const SIDE_BY_SIDE_LEVELS = 2;

/** Columns under one head in the heading's first row: a model's, or (unnamed) one after them. */
export interface ColumnGroup {
  name: string;
  kind: string;
  span: number;
}

/** Rows under one head: a model's when the models are stacked, else unnamed. */
export interface RowGroup<Row> {
  name: string;
  kind: string;
  rows: Row[];
}

export interface ModelTable<Row> {
  /** True when the models are stacked as groups of rows. */
  byModel: boolean;
  /** Empty when the models are stacked. */
  columnGroups: ColumnGroup[];
  /** Heads of the columns after the leading ones (horizon, period). */
  heads: string[];
  /** Columns in all, for the head of a group of rows. */
  span: number;
  rowGroups: RowGroup<Row>[];
}

export function modelTable<Row>(a: {
  levels: readonly number[];
  names: Readonly<Record<TrendModelKind, string>>;
  /** Columns before the models' own. */
  leading: number;
  /** Heads of one model's columns. */
  modelHeads: readonly string[];
  /** Heads of the columns after the models', which compare them. */
  trailingHeads: readonly string[];
  /** The rows of one group, for the models it shows. */
  rows: (models: readonly TrendModelKind[]) => Row[];
}): ModelTable<Row> {
  const byModel = a.levels.length > SIDE_BY_SIDE_LEVELS;
  const groups: { name: string; kind: string; models: readonly TrendModelKind[] }[] = byModel
    ? TREND_MODELS.map((model) => ({ name: a.names[model], kind: model, models: [model] }))
    : [{ name: '', kind: '', models: TREND_MODELS }];
  const heads = [...groups[0].models.flatMap(() => a.modelHeads), ...a.trailingHeads];
  return {
    byModel,
    columnGroups: byModel
      ? []
      : [...TREND_MODELS.map((model) => ({ name: a.names[model], kind: model, span: a.modelHeads.length })), ...a.trailingHeads.map(() => ({ name: '', kind: '', span: 1 }))],
    heads,
    span: a.leading + heads.length,
    rowGroups: groups.map(({ name, kind, models }) => ({ name, kind, rows: a.rows(models) })),
  };
}
