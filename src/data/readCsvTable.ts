// CSV text to a header and rows that remember their line in the file.

import { CsvError, parse } from 'csv-parse/sync';
import { InputError } from '../base/problem.js';
import { dataMessages } from './messages.js';
import { DELIMITER_CHARACTER, detectDelimiter, type Delimiter, type DelimiterSetting } from './detectDialect.js';

export interface CsvRow {
  /** 1-based line in the file where the row starts; the header is line 1 unless blank lines precede it. */
  line: number;
  /** Trimmed cells. */
  cells: string[];
}

export interface CsvTable {
  header: CsvRow;
  rows: CsvRow[];
  /** The delimiter set, or the one detected (detectDelimiter). */
  delimiter: Delimiter;
}

function countNewlines(cells: readonly string[]): number {
  let count = 0;
  for (const cell of cells) for (const char of cell) if (char === '\n') count++;
  return count;
}

function firstNonBlankLine(text: string, from: number): number {
  const lines = text.split('\n');
  let line = from;
  while (line < lines.length && lines[line - 1].trim() === '') line++;
  return line;
}

/**
 * Accepts a UTF-8 BOM, CRLF or CR line endings, whitespace around cells, and blank lines
 * (including rows whose cells are all empty, as spreadsheets append). Rows may differ in
 * width from the header: the caller reports that with the row's line.
 */
export function readCsvTable(text: string, file: string, delimiterSetting: DelimiterSetting = 'auto'): CsvTable {
  // Line endings are unified first: csv-parse counts a CRLF inside a quoted cell as two lines.
  const normalized = text.replace(/^\uFEFF/, '').replace(/\r\n?/g, '\n');
  const delimiter = detectDelimiter(normalized, file, delimiterSetting);
  const rows: CsvRow[] = [];
  let lastRecordEnd = 0;
  try {
    parse(normalized, {
      delimiter: DELIMITER_CHARACTER[delimiter],
      relax_column_count: true,
      skip_empty_lines: true,
      trim: true,
      // Rows are collected here rather than returned, so each keeps its line number.
      on_record: (record, context) => {
        lastRecordEnd = context.lines;
        const cells = record.map((cell) => cell.trim());
        // context.lines is the line where the record ends; quoted cells may span lines.
        if (cells.some((cell) => cell !== '')) rows.push({ line: context.lines - countNewlines(record), cells });
        return null;
      },
    });
  } catch (error) {
    if (error instanceof CsvError) {
      // An unclosed quote is only detected at the end of the input; point at the row it opens instead.
      const line =
        error.code === 'CSV_QUOTE_NOT_CLOSED'
          ? firstNonBlankLine(normalized, lastRecordEnd + 1)
          : typeof error.lines === 'number'
            ? error.lines
            : undefined;
      throw new InputError(dataMessages.csvSyntax(file, line, error.code));
    }
    throw error;
  }
  const header = rows.shift();
  if (header === undefined) throw new InputError(dataMessages.emptyFile(file));
  return { header, rows, delimiter };
}
