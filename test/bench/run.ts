// `npm run bench`: runs every benchmark, prints a table and writes out/bench/results.json.
// Figures are wall-clock medians on the machine at hand; tests never assert on time.
import { mkdirSync, writeFileSync } from 'node:fs';
import { cpus } from 'node:os';
import { backtestBench } from './backtestBench.js';
import { batchBench } from './batchBench.js';
import { engineBench } from './engineBench.js';
import { peersBench } from './peersBench.js';
import { seasonalBench } from './seasonalBench.js';
import { startupBench } from './startupBench.js';
import type { BenchRow } from './timing.js';

const suites: [string, () => BenchRow[] | Promise<BenchRow[]>][] = [
  ['startup', startupBench],
  ['engine', engineBench],
  ['seasonal', seasonalBench],
  ['backtest', backtestBench],
  ['batch', batchBench],
  ['peers', peersBench],
];
// `npm run bench -- engine` runs the named suites only.
const only = process.argv.slice(2);

const results: Record<string, BenchRow[]> = {};
for (const [name, suite] of suites) {
  if (only.length > 0 && !only.includes(name)) continue;
  const rows = await suite();
  results[name] = rows;
  console.log(`\n${name}`);
  const width = Math.max(...rows.map((row) => row.name.length));
  for (const row of rows) {
    const verdict = row.target === undefined ? '' : row.ms <= row.target ? `  target ${row.target} ms: met` : `  target ${row.target} ms: MISSED`;
    const extra = row.extra === undefined ? '' : `  ${Object.entries(row.extra).map(([k, v]) => `${k} ${v.toFixed(1)}`).join(', ')}`;
    // NaN: a row for work that did not run (a peer library not installed).
    const time = Number.isNaN(row.ms) ? 'not run'.padStart(13) : `${row.ms.toFixed(3).padStart(10)} ms`;
    console.log(`  ${row.name.padEnd(width)}  ${time}${verdict}${extra}`);
  }
}
mkdirSync('out/bench', { recursive: true });
writeFileSync('out/bench/results.json', `${JSON.stringify({ node: process.version, cpus: cpus().length, results }, null, 2)}\n`);
console.log('\nwritten: out/bench/results.json');
