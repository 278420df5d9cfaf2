// A path as the user would type it in messages: relative to the working folder when it lies
// under it, absolute otherwise.
import { isAbsolute, relative } from 'node:path';

export function shownPath(file: string): string {
  const shown = relative(process.cwd(), file);
  return shown === '' || shown.startsWith('..') || isAbsolute(shown) ? file : shown;
}
