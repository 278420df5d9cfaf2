// The user's data quoted in a message, cut short: a file that is not a series (a key file, a
// password list named by mistake) must not have its content copied to the terminal or a log
// beyond a few dozen characters of the one cell that is wrong (our spec).
import { quoted } from './problem.js';

/** Longest piece of a data file's content quoted in a message, in code points. */
export const CELL_QUOTE_LIMIT = 40;

/** `'first 37 characters...' (N characters)` for a longer text, the whole text quoted otherwise. */
export function quotedCell(text: string): string {
  const characters = [...text];
  if (characters.length <= CELL_QUOTE_LIMIT) return quoted(text);
  return `'${characters.slice(0, CELL_QUOTE_LIMIT - 3).join('')}...' (${characters.length} characters)`;
}
