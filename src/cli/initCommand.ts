// `trendbrief init [DIR]`: writes a starter config, its JSON Schema and an example series into
// DIR. Nothing is overwritten: when any of the files exists, none is written.
import { existsSync, mkdirSync, statSync, unlinkSync, writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { STARTER_CONFIG, STARTER_SCHEMA, STARTER_SERIES, starterFiles } from '../config/starterFiles.js';
import { InputError } from '../base/problem.js';
import { configCommandMessages } from './messages.js';
import { splitOptions } from './splitOptions.js';
import { EXIT } from './exitCodes.js';

export const INIT_HELP = `Usage: trendbrief init [DIR]

Writes into DIR (default: the current folder), creating it if needed:
  ${STARTER_CONFIG.padEnd(27)}a commented starter config
  ${STARTER_SCHEMA.padEnd(27)}the config's JSON Schema, for editors
  ${STARTER_SERIES.padEnd(27)}an invented example series the config uses
Refuses to overwrite any existing file.

Options:
  -h, --help                this text
`;

function errorCode(error: unknown): string {
  return error instanceof Error && 'code' in error ? String(error.code) : 'unknown error';
}

/** Writes every file or, when one fails, removes those already written and reports the failure. */
function writeAll(files: readonly { target: string; content: string }[]): void {
  const written: string[] = [];
  for (const { target, content } of files) {
    try {
      mkdirSync(dirname(target), { recursive: true });
      // 'wx' fails on an existing file, so a file created since the check is still not overwritten.
      writeFileSync(target, content, { flag: 'wx' });
      written.push(target);
    } catch (error) {
      for (const done of written) unlinkSync(done);
      const code = errorCode(error);
      throw new InputError(code === 'EEXIST' ? configCommandMessages.fileExists(target) : configCommandMessages.cannotWrite(target, code));
    }
  }
}

export async function runInit(args: readonly string[], io: { stdout(text: string): void }): Promise<number> {
  const { values, positionals, problems } = splitOptions(args, { help: { type: 'boolean', short: 'h' } }, 'init');
  if (values.get('help') === true) {
    io.stdout(INIT_HELP);
    return EXIT.ok;
  }
  if (positionals.length > 1) problems.push(configCommandMessages.extraFolders(positionals.slice(1)));
  if (problems.length > 0) throw new InputError(problems);
  const folder = positionals[0] ?? '.';
  if (existsSync(folder) && !statSync(folder).isDirectory()) throw new InputError(configCommandMessages.notAFolder(folder));
  const files = starterFiles().map((file) => ({ target: join(folder, file.path), content: file.content }));
  const existing = files.filter((file) => existsSync(file.target));
  if (existing.length > 0) throw new InputError(existing.map((file) => configCommandMessages.fileExists(file.target)));
  writeAll(files);
  const lines = files.map((file) => `wrote ${file.target}`);
  io.stdout(`${lines.join('\n')}\nnext: trendbrief check ${join(folder, STARTER_CONFIG)}\n`);
  return EXIT.ok;
}
