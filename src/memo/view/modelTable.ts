// A table of both trend models by horizon. When a row of both fits the page the models stand
// side by side, each a group of columns; otherwise (more interval levels, or wide numbers) the
// models are stacked, each a group of rows under one set of columns.
import { TREND_MODELS, type TrendModelKind } from '../../base/settings.js';
import { rowsFit, SHEET_WIDTH } from './tableWidth.js';

/** Most interval levels whose columns are ever set side by side. */
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
  /** Every cell of a row as printed, leading ones included, to measure its width. */
  cellsOf: (row: Row) => readonly string[];
}): ModelTable<Row> {
  const sideBySide = (): boolean => {
    // The heads are set smaller than the cells (templates/memo.css), which offsets their weight.
    const heads = { cells: [...Array.from({ length: a.leading }, () => ''), ...TREND_MODELS.flatMap(() => a.modelHeads), ...a.trailingHeads] };
    return rowsFit([heads, ...a.rows(TREND_MODELS).map((row) => ({ cells: a.cellsOf(row) }))], SHEET_WIDTH);
  };
  const byModel = a.levels.length > SIDE_BY_SIDE_LEVELS || !sideBySide();
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
