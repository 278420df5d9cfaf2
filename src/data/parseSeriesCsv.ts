// CSV text to a checked Series: the table (delimiter set or detected), the two columns, the
// decimal mark, then assembleSeries. Every problem the file has is collected in one pass and
// thrown as one InputError; only problems that leave no row readable (no header, an unknown
// column, an ambiguous delimiter or decimal mark) stop the pass early.

import { createHash } from 'node:crypto';
import { InputError, type InputProblem } from '../base/problem.js';
import { cellField } from '../base/quotedCell.js';
import type { Series } from '../base/series.js';
import { assembleSeries, type SeriesRow } from './assembleSeries.js';
import { detectDecimalMark } from './detectDialect.js';
import { dataMessages } from './messages.js';
import { parseValue } from './parseValue.js';
import { readCsvTable } from './readCsvTable.js';
import { selectColumns } from './selectColumns.js';
import type { SeriesOptions } from './seriesOptions.js';

export type { SeriesOptions } from './seriesOptions.js';

/**
 * The work of `readSeriesCsv` on text already read; `file` names the source in messages and in
 * the result, and `sha256` is taken over the text encoded as UTF-8.
 */
export function parseSeriesCsv(text: string, file: string, options: SeriesOptions): Series {
  if (options.sheet !== undefined) throw new InputError(dataMessages.sheetForText(file, options.sheet));
  const { header, rows, delimiter } = readCsvTable(text, file, options.delimiter);
  const choice = selectColumns(header, file, options);
  if (rows.length === 0) throw new InputError(dataMessages.noData({ file, line: header.line }));

  const periodColumnAt = { file, column: choice.periodPosition + 1, field: cellField(choice.periodColumn) };
  const valueColumnAt = { file, column: choice.valuePosition + 1, field: cellField(choice.column) };
  const valueCells = rows.map((row) => ({ text: row.cells[choice.valuePosition] ?? '', at: { ...valueColumnAt, line: row.line } }));
  const decimalMark = detectDecimalMark(valueCells, delimiter, options.decimalMark);
  const width = header.cells.length;
  const rowProblems: InputProblem[] = [];
  const seriesRows = rows.map((row, i): SeriesRow => {
    if (row.cells.length !== width) rowProblems.push(dataMessages.rowWidth({ file, line: row.line }, row.cells.length, width, delimiter));
    const value = valueCells[i];
    return {
      line: row.line,
      period: { text: row.cells[choice.periodPosition] ?? '' },
      periodAt: { ...periodColumnAt, line: row.line },
      value: { text: value.text, parsed: parseValue(value.text, decimalMark) },
      valueAt: value.at,
    };
  });
  const sha256 = createHash('sha256').update(text, 'utf8').digest('hex');
  return assembleSeries(seriesRows, { file, periodColumn: choice.periodColumn, column: choice.column, periodColumnAt, valueColumnAt, decimalMark, rowProblems, sha256 }, options);
}
