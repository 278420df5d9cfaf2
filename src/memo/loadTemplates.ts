// The memo's templates: memo.hbs, memo.css and partials/*.hbs. A consultancy may point at its
// own directory; any file it does not provide is taken from the built-in set, so a copy can
// override only the CSS, say.
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { basename, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import Handlebars from 'handlebars';
import { InputError } from '../base/problem.js';
import { templateMessages } from './messages.js';
import { checkHouseTemplate } from './checkHouseTemplate.js';
import { readRegularFile } from '../base/readRegularFile.js';

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

/** Throws an InputError naming the file and line when Handlebars cannot parse `source`. */
function checkTemplateSyntax(path: string, source: string): void {
  try {
    Handlebars.parse(source);
  } catch (error) {
    const detail = error instanceof Error ? error.message : String(error);
    const line = /line (\d+)/.exec(detail);
    const lines = detail.split('\n');
    throw new InputError(templateMessages.badSyntax(path, line === null ? undefined : Number(line[1]), lines[lines.length - 1]));
  }
}

/** A template or stylesheet is a few kilobytes; a megabyte is far beyond any real one. */
const TEMPLATE_LIMIT_BYTES = 1024 * 1024;

/** A consultancy's file, read only as a regular file within the bound (a FIFO would block the run). */
function houseFile(path: string): string {
  const read = readRegularFile(path, TEMPLATE_LIMIT_BYTES);
  if (read.fault !== undefined) throw new InputError(templateMessages.unreadable(path, read.fault.kind === 'too-large' ? `larger than ${TEMPLATE_LIMIT_BYTES} bytes` : read.fault.kind === 'unreadable' ? read.fault.reason : read.fault.kind.replace('-', ' ')));
  return read.bytes.toString('utf8');
}

export function loadTemplates(dir?: string): MemoTemplates {
  const builtIn = builtInTemplatesDir();
  const dirs = dir === undefined ? [builtIn] : [dir, builtIn];
  const names = [...new Set(dirs.flatMap(partialNames))].sort();
  const read = (relative: string): string => {
    for (const d of dirs) {
      const path = join(d, relative);
      if (!existsSync(path)) continue;
      const source = d === builtIn ? readFileSync(path, 'utf8') : houseFile(path);
      // A consultancy's own template is user input: its faults are their mistake to fix, at their line.
      if (d !== builtIn) {
        if (relative.endsWith('.hbs')) checkTemplateSyntax(path, source);
        checkHouseTemplate(path, source, names);
      }
      return source;
    }
    throw new Error(`memo template ${relative} is missing from ${dirs.join(' and ')}`);
  };
  const partials: Record<string, string> = {};
  for (const name of names) partials[name] = read(join('partials', `${name}.hbs`));
  return { main: read('memo.hbs'), css: read('memo.css'), partials };
}
