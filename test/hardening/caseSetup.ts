// What a refused case needs besides the files in its folder: things git cannot hold (a FIFO,
// a link to nothing, a folder where a file is expected) and files too large to commit,
// generated at test time just past the limits the code states.
import { execFileSync } from 'node:child_process';
import { mkdirSync, readFileSync, rmSync, symlinkSync, writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { MAX_CONFIG_FILE_BYTES } from '../../src/config/loadConfig.js';
import { MAX_SERIES_FILE_BYTES } from '../../src/data/readSeriesCsv.js';

export type SetupStep =
  | { make: 'directory' | 'fifo' | 'file' | 'oversized-csv' | 'oversized-yaml' | 'deep-yaml'; path: string }
  | { make: 'symlink'; path: string; target: string };

/** Bytes past each limit: enough to be over it, little enough to write quickly. */
const PAST_CONFIG_LIMIT = 11;
const PAST_SERIES_LIMIT = 50_000;
/** Flow lists nested this deep stay under the config size limit and far beyond any real nesting. */
const NESTING = 300_000;

/** `text` followed by `filler` lines, cut to exactly `bytes` bytes (ASCII only). */
function paddedTo(text: string, filler: string, bytes: number): string {
  const lines = [text];
  let length = text.length;
  while (length < bytes) {
    lines.push(filler);
    length += filler.length;
  }
  return lines.join('').slice(0, bytes);
}

export function applySetup(root: string, step: SetupStep): void {
  const path = join(root, step.path);
  mkdirSync(dirname(path), { recursive: true });
  switch (step.make) {
    case 'directory':
      rmSync(path, { recursive: true, force: true });
      mkdirSync(path);
      return;
    case 'symlink':
      rmSync(path, { recursive: true, force: true });
      symlinkSync(step.target, path);
      return;
    case 'fifo':
      rmSync(path, { recursive: true, force: true });
      execFileSync('mkfifo', [path]);
      return;
    case 'file':
      writeFileSync(path, 'Quarterly report, kept by hand.\n');
      return;
    case 'oversized-yaml':
      writeFileSync(path, paddedTo(readFileSync(path, 'utf8'), '# padding to test the size limit\n', MAX_CONFIG_FILE_BYTES + PAST_CONFIG_LIMIT));
      return;
    case 'oversized-csv': {
      const rows = readFileSync(path, 'utf8').trimEnd().split('\n');
      const widened = rows.map((row, i) => `${row},${i === 0 ? 'comment' : 'checked'}\n`).join('');
      writeFileSync(path, paddedTo(widened, `2030,600,${'x'.repeat(1000)}\n`, MAX_SERIES_FILE_BYTES + PAST_SERIES_LIMIT));
      return;
    }
    case 'deep-yaml':
      writeFileSync(path, `memo: ${'['.repeat(NESTING)}${']'.repeat(NESTING)}\n`);
      return;
  }
}
