// The program as users start it, `node bin/trendbrief.js`, built from the current sources into
// a private copy of the package. Other tests rebuild dist/ while the suite runs, and a child
// process that loaded a half-written module would fail for reasons that have nothing to do
// with what is being tested.
import { spawnSync } from 'node:child_process';
import { cpSync, existsSync, mkdtempSync, symlinkSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';

const REPOSITORY = resolve('.');

/** Builds the package into a temporary folder and returns it; its program is `bin/trendbrief.js` there. */
export function buildPrivateCopy(): string {
  const folder = mkdtempSync(join(tmpdir(), 'tb-build-'));
  for (const entry of ['package.json', 'bin', 'templates']) cpSync(join(REPOSITORY, entry), join(folder, entry), { recursive: true });
  symlinkSync(join(REPOSITORY, 'node_modules'), join(folder, 'node_modules'));
  // Type errors are the type check's business (npm test runs it first); the compiler still
  // writes the JavaScript, and that is what the child processes run.
  const build = spawnSync('npx', ['tsc', '-p', 'tsconfig.build.json', '--outDir', join(folder, 'dist')], { cwd: REPOSITORY, encoding: 'utf8' });
  if (!existsSync(join(folder, 'dist/cli.js'))) throw new Error(`the build wrote no dist/cli.js (exit ${build.status}): ${build.stdout}${build.stderr}`);
  // bin/trendbrief.js runs the bundle of dist/, as npm run build makes it.
  const bundle = spawnSync(process.execPath, [join(REPOSITORY, 'scripts/bundleCli.mjs'), join(folder, 'dist')], { cwd: REPOSITORY, encoding: 'utf8' });
  if (!existsSync(join(folder, 'dist/bundle/cli.js'))) throw new Error(`the bundle step wrote no dist/bundle/cli.js (exit ${bundle.status}): ${bundle.stdout}${bundle.stderr}`);
  return folder;
}
