// The package as a user gets it: packed by `npm pack`, installed from the tarball into an empty
// project and imported by its name. The packed library must give the same record as the
// sources for the same series and settings (both are our own code; the check is that the
// package's entry points, exports and files are complete), and its types must check.
import { spawnSync } from 'node:child_process';
import { cpSync, mkdirSync, readdirSync, readFileSync, realpathSync, writeFileSync } from 'node:fs';
import { delimiter, join, resolve } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { analyseSeries } from '../../src/analysis/analyseSeries.js';
import type { AnalysisRecord } from '../../src/analysis/record.js';
import { parseSeriesCsv } from '../../src/data/parseSeriesCsv.js';
import { buildPrivateCopy } from '../hardening/privateBuild.js';
import { settingsFor } from '../support/settings.js';

const REPOSITORY = resolve('.');

/** An invented annual series: a drifting level with a small cycle. */
const SERIES_CSV = ['year,boardings', ...Array.from({ length: 30 }, (_, i) => `${1995 + i},${(120 + 2.5 * i + 4 * Math.sin(i / 2)).toFixed(2)}`)].join('\n');
const SETTINGS = { horizon: 5, max_p: 1, max_q: 1, levels: [50, 90] };

const USE_SCRIPT = `
import { analyseSeries, parseSeriesCsv, resolveSettings, levelKey } from 'trendbrief';
import { readFileSync } from 'node:fs';
const series = parseSeriesCsv(readFileSync('series.csv', 'utf8'), 'series.csv', { missing: 'error' });
const settings = resolveSettings(${JSON.stringify(SETTINGS)}, series);
const record = await analyseSeries(series, settings, { id: 'boardings', title: 'Boardings', file: 'series.csv' }, { backtest: false });
process.stdout.write(JSON.stringify({ record, key: levelKey(90) }));
`;

const USE_TYPES = `
import { analyseSeries, parseSeriesCsv, resolveSettings, type AnalysisRecord, type AnalysisSettings } from 'trendbrief';
const series = parseSeriesCsv('year,v\\n2000,1\\n2001,2', 'x.csv', { missing: 'error' });
const settings: AnalysisSettings = resolveSettings({ horizon: 3 }, series);
const record: Promise<AnalysisRecord> = analyseSeries(series, settings, { id: 'x', title: 'X', file: 'x.csv' }, { backtest: false });
export { record };
`;

function run(command: string, args: string[], cwd: string): string {
  const result = spawnSync(command, args, { cwd, encoding: 'utf8' });
  if (result.status !== 0) throw new Error(`${command} ${args.join(' ')} failed (${result.status}):\n${result.stdout}\n${result.stderr}`);
  return result.stdout;
}

describe('the packed package', () => {
  let app: string;
  let packed: { record: AnalysisRecord; key: string };
  beforeAll(() => {
    const copy = buildPrivateCopy();
    cpSync(join(REPOSITORY, 'schema'), join(copy, 'schema'), { recursive: true });
    // The copy is built already; packing it must not build again.
    run('npm', ['pack', '--ignore-scripts', '--silent', '--pack-destination', copy], copy);
    const tarball = readdirSync(copy).find((name) => name.endsWith('.tgz'));
    if (tarball === undefined) throw new Error('npm pack wrote no tarball');
    app = join(copy, 'app');
    mkdirSync(app);
    writeFileSync(join(app, 'package.json'), JSON.stringify({ name: 'library-user', private: true, type: 'module' }));
    // The dependencies come from the cache that npm ci filled; nothing runs at install.
    run('npm', ['install', join(copy, tarball), '--prefer-offline', '--ignore-scripts', '--no-audit', '--no-fund', '--silent'], app);
    writeFileSync(join(app, 'series.csv'), SERIES_CSV);
    writeFileSync(join(app, 'use.mjs'), USE_SCRIPT);
    packed = JSON.parse(run('node', ['use.mjs'], app)) as { record: AnalysisRecord; key: string };
  }, 180_000);

  it('is imported by its name and analyses a series exactly as the sources do', async () => {
    const series = parseSeriesCsv(SERIES_CSV, 'series.csv', { missing: 'error' });
    const expected = await analyseSeries(series, settingsFor(SETTINGS, series.frequency, series.n), { id: 'boardings', title: 'Boardings', file: 'series.csv' }, { backtest: false });
    const { tool, ...rest } = packed.record;
    const { tool: expectedTool, ...expectedRest } = JSON.parse(JSON.stringify(expected)) as AnalysisRecord;
    expect(tool).toEqual(expectedTool);
    expect(rest).toEqual(expectedRest);
    expect(packed.record.forecasts.stochastic.map((row) => Object.keys(row.intervals))).toEqual(Array.from({ length: 5 }, () => ['50', '90']));
    expect(packed.key).toBe('90');
  });

  it('ships types a TypeScript user can check against', () => {
    writeFileSync(join(app, 'use.ts'), USE_TYPES);
    writeFileSync(
      join(app, 'tsconfig.json'),
      JSON.stringify({ compilerOptions: { module: 'NodeNext', moduleResolution: 'NodeNext', target: 'ES2022', strict: true, noEmit: true, skipLibCheck: true, types: ['node'], typeRoots: [join(REPOSITORY, 'node_modules/@types')] }, files: ['use.ts'] }),
    );
    expect(run(join(REPOSITORY, 'node_modules/.bin/tsc'), ['-p', 'tsconfig.json'], app)).toBe('');
  });

  it('puts the command on the PATH by its name (npm links the package\'s bin), which runs from the packed bundle', () => {
    const version = (JSON.parse(readFileSync(join(REPOSITORY, 'package.json'), 'utf8')) as { version: string }).version;
    const bin = join(app, 'node_modules/.bin');
    const result = spawnSync('trendbrief', ['--version'], { cwd: app, encoding: 'utf8', env: { ...process.env, PATH: `${bin}${delimiter}${process.env.PATH ?? ''}` } });
    expect(result.stderr).toBe('');
    expect(result.status).toBe(0);
    expect(result.stdout).toBe(`${version}\n`);
    expect(realpathSync(join(bin, 'trendbrief'))).toBe(join(realpathSync(app), 'node_modules/trendbrief/bin/trendbrief.js'));
  });
});
