// The memo's templates: memo.hbs, memo.css and partials/*.hbs. A consultancy may point at its
// own directory; any file it does not provide is taken from the built-in set, so a copy can
// override only the CSS, say.
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { basename, join } from 'node:path';
import { fileURLToPath } from 'node:url';

export interface MemoTemplates {
  main: string;
  css: string;
  partials: Record<string, string>;
}

/** The repository's templates/ folder: two levels above this module, from src/memo/ or dist/memo/. */
export function builtInTemplatesDir(): string {
  return fileURLToPath(new URL('../../templates/', import.meta.url));
}

function partialNames(dir: string): string[] {
  const folder = join(dir, 'partials');
  if (!existsSync(folder)) return [];
  return readdirSync(folder)
    .filter((f) => f.endsWith('.hbs'))
    .map((f) => basename(f, '.hbs'));
}

export function loadTemplates(dir?: string): MemoTemplates {
  const builtIn = builtInTemplatesDir();
  const dirs = dir === undefined ? [builtIn] : [dir, builtIn];
  const read = (relative: string): string => {
    for (const d of dirs) {
      const path = join(d, relative);
      if (existsSync(path)) return readFileSync(path, 'utf8');
    }
    throw new Error(`memo template ${relative} is missing from ${dirs.join(' and ')}`);
  };
  const names = [...new Set(dirs.flatMap(partialNames))].sort();
  const partials: Record<string, string> = {};
  for (const name of names) partials[name] = read(join('partials', `${name}.hbs`));
  return { main: read('memo.hbs'), css: read('memo.css'), partials };
}
