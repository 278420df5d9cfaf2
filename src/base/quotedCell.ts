// The user's data quoted in a message, cut short: a file that is not a series (a key file, a
// password list named by mistake) must not have its content copied to the terminal or a log
// beyond a few dozen characters of the one cell that is wrong (our spec).
import { quoted } from './problem.js';

/** Longest piece of a data file's content quoted in a message, in code points. */
export const CELL_QUOTE_LIMIT = 40;

/** A column name from a data file as the field of a message: the first 37 characters and `...` when longer. */
export function cellField(text: string): string {
  const characters = [...text];
  return characters.length <= CELL_QUOTE_LIMIT ? text : `${characters.slice(0, CELL_QUOTE_LIMIT - 3).join('')}...`;
}

/** `'first 37 characters...' (N characters)` for a longer text, the whole text quoted otherwise. */
export function quotedCell(text: string): string {
  const short = cellField(text);
  return short === text ? quoted(text) : `'${short}' (${[...text].length} characters)`;
}
