// Finds the period column and the value column in the header.

import { InputError, type InputLocation, type InputProblem } from '../base/problem.js';
import { dataMessages } from './messages.js';
import type { CsvRow } from './readCsvTable.js';
import { firstRefusedCharacter } from '../base/textPatterns.js';
import { closestName } from '../base/closestName.js';
import { parsePeriod } from '../base/period.js';
import { parseValue } from './parseValue.js';
import { parseIsoDate } from './periodDates.js';

export interface ColumnChoice {
  periodColumn: string;
  column: string;
  /** 0-based positions of the two columns in each row. */
  periodPosition: number;
  valuePosition: number;
}

function findColumn(header: readonly string[], name: string, at: InputLocation, problems: InputProblem[]): number {
  const positions = header.flatMap((cell, position) => (cell === name ? [position] : []));
  if (positions.length === 0) {
    const named = header.filter((cell) => cell !== '');
    problems.push(dataMessages.unknownColumn(at, name, named, closestName(name, named)));
  } else if (positions.length > 1) {
    problems.push(dataMessages.duplicateColumn(at, name, positions.length));
  }
  return positions[0] ?? -1;
}

/** Longest column name, in code points: the limit of one-line text in a config. */
const MAX_COLUMN_NAME = 200;

/** The chosen columns' names reach the memo, so they follow the rules for one-line text in a config. */
function nameProblem(name: string, position: number, at: InputLocation): InputProblem | undefined {
  if (name === '') return dataMessages.unnamedColumn(at, position);
  const length = [...name].length;
  if (length > MAX_COLUMN_NAME) return dataMessages.columnNameTooLong(at, position, length, MAX_COLUMN_NAME);
  const refused = firstRefusedCharacter(name, 'line');
  return refused === undefined ? undefined : dataMessages.columnNameCharacter(at, position, refused.codePoint, refused.position);
}

/**
 * `sheet`: the workbook sheet the header row is in, for messages.
 * Default choice: the first column holds the periods and the first other column the values.
 * A first line that looks like data means the header is missing; that and every column
 * problem throw, since no row can be read without both columns.
 */
export function selectColumns(headerRow: CsvRow, file: string, wanted: { column?: string; periodColumn?: string }, sheet?: string): ColumnChoice {
  const header = headerRow.cells;
  const at: InputLocation = sheet === undefined ? { file, line: headerRow.line } : { file, line: headerRow.line, sheet };
  // Only the first cell is judged: a value column may be named like a year ("2019").
  const first = header[0];
  if (parsePeriod(first) !== null || parseIsoDate(first) !== null || parseValue(first).kind === 'number') throw new InputError(dataMessages.headerLooksLikeData(at, first));
  if (header.length === 1 && wanted.column === undefined) throw new InputError(dataMessages.oneColumn(at, header[0]));

  const problems: InputProblem[] = [];
  const periodPosition = wanted.periodColumn === undefined ? 0 : findColumn(header, wanted.periodColumn, at, problems);
  const valuePosition =
    wanted.column === undefined
      ? header.findIndex((_, position) => position !== periodPosition)
      : findColumn(header, wanted.column, at, problems);
  if (problems.length > 0) throw new InputError(problems);

  if (periodPosition === valuePosition) throw new InputError(dataMessages.sameColumn(at, header[periodPosition]));
  for (const position of [periodPosition, valuePosition]) {
    const problem = nameProblem(header[position], position + 1, at);
    if (problem !== undefined) problems.push(problem);
  }
  if (problems.length > 0) throw new InputError(problems);
  return { periodColumn: header[periodPosition], column: header[valuePosition], periodPosition, valuePosition };
}
