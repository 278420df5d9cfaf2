// Writes the demo series: invented figures for the Vessamor Basin Water Cooperative, a fictional
// regional water utility (configs/data/README.md tells the story). Every series has its own seed,
// so each run writes the same bytes:
//   npx tsx configs/generateDemoData.ts [OUTDIR]      (default: configs/data)
import { mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { addPeriods } from '../src/base/period.js';
import { demoRandom, type DemoRandom } from './demoRandom.js';

export interface DemoSeries {
  /** File name without `.csv`. */
  name: string;
  /** First period label; its form sets the frequency. */
  first: string;
  n: number;
  /** Decimals written for each value. */
  decimals: number;
  seed: number;
  /** The value at t = 1..n. */
  generate(random: DemoRandom, n: number): number[];
}

/** u_t = φ·u_{t−1} + σ·e_t, started from its stationary law so the first values are not special. */
function ar1(random: DemoRandom, n: number, phi: number, sigma: number): number[] {
  const u: number[] = [];
  let previous = (sigma / Math.sqrt(1 - phi * phi)) * random.normal();
  for (let t = 0; t < n; t++) {
    previous = t === 0 ? previous : phi * previous + sigma * random.normal();
    u.push(previous);
  }
  return u;
}

export const DEMO_SERIES: readonly DemoSeries[] = [
  {
    // Household connections growing about 3% a year: a straight line with AR(1) noise on the log scale.
    name: 'metered-connections',
    first: '1955',
    n: 70,
    decimals: 0,
    seed: 19550101,
    generate: (random, n) => ar1(random, n, 0.55, 0.018).map((u, i) => 8200 * Math.exp(0.031 * (i + 1) + u)),
  },
  {
    // A cost index that wanders: a random walk with drift whose steps are AR(1).
    name: 'treatment-cost-index',
    first: '2002-Q1',
    n: 92,
    decimals: 2,
    seed: 20020102,
    generate: (random, n) => {
      let level = 100;
      return ar1(random, n, 0.3, 1.1).map((step, i) => {
        if (i > 0) level += 0.35 + step;
        return level;
      });
    },
  },
  {
    // A young plant with twenty years of records: a trend with AR(1) noise, too short for long horizons.
    name: 'desalination-output',
    first: '2005',
    n: 20,
    decimals: 0,
    seed: 20050103,
    generate: (random, n) => ar1(random, n, 0.4, 45).map((u, i) => 1450 + 38 * (i + 1) + u),
  },
  {
    // Seasonally adjusted demand: a gentle trend with persistent AR(1) deviations around it.
    name: 'daily-demand',
    first: '2015-01',
    n: 120,
    decimals: 1,
    seed: 20150103,
    generate: (random, n) => ar1(random, n, 0.7, 2.4).map((u, i) => 212 + 0.09 * (i + 1) + u),
  },
  {
    // Bulk deliveries to irrigation districts, as delivered (not adjusted): a summer peak of two
    // harmonics on a rising line, with AR(1) deviations.
    name: 'bulk-deliveries',
    first: '2015-01',
    n: 120,
    decimals: 0,
    seed: 20150110,
    generate: (random, n) =>
      ar1(random, n, 0.5, 120).map((u, i) => {
        // Month m = 0 (January) .. 11; the peak is in July (m = 6).
        const angle = (2 * Math.PI * ((i % 12) - 6)) / 12;
        return 3200 + 6 * (i + 1) + 900 * Math.cos(angle) + 250 * Math.cos(2 * angle) + u;
      }),
  },
];

/** The series as CSV text: a `period,value` header and one line per period, LF endings. */
export function demoCsv(series: DemoSeries): string {
  const values = series.generate(demoRandom(series.seed), series.n);
  const lines = values.map((value, i) => `${addPeriods(series.first, i)},${value.toFixed(series.decimals)}`);
  return ['period,value', ...lines, ''].join('\n');
}

/** Writes every demo series into `dir`; returns the file names written. */
export function writeDemoData(dir: string): string[] {
  mkdirSync(dir, { recursive: true });
  return DEMO_SERIES.map((series) => {
    const file = `${series.name}.csv`;
    writeFileSync(join(dir, file), demoCsv(series));
    return file;
  });
}

const invokedDirectly = process.argv[1] !== undefined && import.meta.url === pathToFileURL(process.argv[1]).href;
if (invokedDirectly) {
  const dir = process.argv[2] ?? fileURLToPath(new URL('./data/', import.meta.url));
  for (const file of writeDemoData(dir)) process.stdout.write(`wrote ${join(dir, file)}\n`);
}
