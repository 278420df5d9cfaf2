// The last build step: the compiled command line bundled by esbuild into dist/bundle/, so a
// command opens a handful of files instead of some 1,300 (the @stdlib distributions alone are
// about 450 small modules). Code splitting keeps every command's dynamic import() a chunk of
// its own, loaded only when the command runs, and each shared module in one chunk (one
// InputError class, one settings module). The entries and chunks lie directly in dist/bundle/,
// two levels below the package root like dist/<stage>/*.js, so the paths the code builds from
// import.meta.url hold in both: ../../package.json (toolVersion), ../../templates/
// (loadTemplates) and ./<worker>.js (workerModule). The library (dist/index.js) is not bundled.
//
// Usage: node scripts/bundleCli.mjs [DIST]   (default dist/; a private test build passes its own)
import { build } from 'esbuild';
import { rmSync } from 'node:fs';
import { resolve } from 'node:path';
import { fileURLToPath } from 'node:url';

const root = fileURLToPath(new URL('..', import.meta.url));
const dist = resolve(root, process.argv[2] ?? 'dist');
// Chunk names carry content hashes: old chunks would otherwise pile up.
rmSync(resolve(dist, 'bundle'), { recursive: true, force: true });
await build({
  absWorkingDir: root,
  // The command line, and the three modules worker threads load by file name.
  entryPoints: ['cli.js', 'backtest/forecastAtOrigin.js', 'run/analysePlannedSeries.js', 'analysis/fitModelTask.js'].map((entry) => resolve(dist, entry)),
  outdir: resolve(dist, 'bundle'),
  entryNames: '[name]',
  chunkNames: 'chunk-[hash]',
  bundle: true,
  splitting: true,
  platform: 'node',
  format: 'esm',
  target: 'node20',
  // puppeteer-core loads only to print a PDF and exceljs only to read a workbook (each a large
  // package of its own, found in node_modules when needed); tinypool starts its workers from
  // its own entry file, found beside its module.
  external: ['puppeteer-core', 'exceljs', 'tinypool'],
  legalComments: 'none',
  logLevel: 'warning',
  // The CommonJS packages inside an ESM bundle call require() for Node's own modules.
  banner: { js: "import { createRequire as createRequireForBundle } from 'node:module'; const require = createRequireForBundle(import.meta.url);" },
});
