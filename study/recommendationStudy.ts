// `npm run study`: a seeded simulation study of the recommendation rule's operating
// characteristics. For each process of test/support/trendProcesses.ts and each length n, R
// replicates are simulated n + H long, the first n analysed as a memo with horizon H would
// analyse them (both rules the project offers), and the 95% intervals at h = H checked
// against the held-out value: which model each rule picks, and the coverage and interval
// score of its pick, of always the deterministic and of always the stochastic trend.
//
// Every series is a pure task on a pool of worker threads and results are collected in task
// order, so the tables do not depend on the thread count. The tables go to stdout and, with
// the settings, seeds, replicate count, Node version and date, to out/study/.
//
//   npm run study                      100 replicates per cell
//   npm run study -- --quick           10 replicates, to check the harness
//   npm run study -- --replicates 40 --threads 1
import { execFileSync } from 'node:child_process';
import { mkdirSync, writeFileSync } from 'node:fs';
import { availableParallelism } from 'node:os';
import { parseArgs } from 'node:util';
import Tinypool from 'tinypool';
import { workerModule } from '../src/base/workerModule.js';
import { RECOMMENDATION_RULES, type AnalysisSettings } from '../src/base/settings.js';
import { TREND_PROCESSES } from '../test/support/trendProcesses.js';
import { STUDY_LEVEL, type SeriesOutcome, type StudyTask } from './studyTask.js';
import { markdownTable, outcomeOf, summariseCell } from './summariseStudy.js';

/** The memo's forecast horizon, and so the held-out step: the annual default. */
const HORIZON = 10;
const LENGTHS = [40, 100] as const;
const DEFAULT_REPLICATES = 100;
const QUICK_REPLICATES = 10;
/** processSeed spaces the lengths 1000 seeds apart, so more replicates would share seeds across cells. */
const MAX_REPLICATES = 1000;

const USAGE = 'usage: npm run study -- [--quick | --replicates N (1 to 1000)] [--threads N]';

function wholeOption(text: string | undefined, fallback: number, max: number): number {
  if (text === undefined) return fallback;
  const value = Number(text);
  if (!(Number.isInteger(value) && value >= 1 && value <= max)) throw new Error(`not a whole number from 1 to ${max}: ${text}\n${USAGE}`);
  return value;
}

function readOptions(argv: string[]): { replicates: number; threads: number } {
  const { values } = parseArgs({ args: argv, options: { quick: { type: 'boolean' }, replicates: { type: 'string' }, threads: { type: 'string' } } });
  if (values.quick === true && values.replicates !== undefined) throw new Error(`--quick and --replicates exclude each other\n${USAGE}`);
  return {
    replicates: values.quick === true ? QUICK_REPLICATES : wholeOption(values.replicates, DEFAULT_REPLICATES, MAX_REPLICATES),
    threads: wholeOption(values.threads, availableParallelism(), 64),
  };
}

/** Cells in table order (process, then length), replicates in seed order within each. */
function studyTasks(replicates: number): StudyTask[] {
  return TREND_PROCESSES.flatMap((process) =>
    LENGTHS.flatMap((n) => Array.from({ length: replicates }, (_, rep) => ({ process, n, rep, horizon: HORIZON, rules: RECOMMENDATION_RULES }))),
  );
}

async function runTasks(tasks: readonly StudyTask[], threads: number): Promise<SeriesOutcome[]> {
  const pool = new Tinypool({ filename: workerModule(import.meta.url, 'studyTask', 'studyTask'), name: 'studyTask', minThreads: threads, maxThreads: threads });
  let done = 0;
  const step = Math.max(1, Math.round(tasks.length / 20));
  try {
    // Promise.all keeps task order whatever order the workers finish in.
    return await Promise.all(
      tasks.map(async (task) => {
        const outcome = (await pool.run(task)) as SeriesOutcome;
        done += 1;
        if (done % step === 0 || done === tasks.length) process.stderr.write(`study: ${done}/${tasks.length} series\n`);
        return outcome;
      }),
    );
  } finally {
    await pool.destroy();
  }
}

/** Each cell's distinct settings per rule: one value, unless the defaults come to depend on the data. */
function cellSettings(series: readonly SeriesOutcome[]): Record<string, AnalysisSettings[]> {
  return Object.fromEntries(
    RECOMMENDATION_RULES.map((rule) => {
      const distinct = new Map(series.map((entry) => outcomeOf(entry, rule).settings).map((settings) => [JSON.stringify(settings), settings]));
      return [rule, [...distinct.values()]];
    }),
  );
}

/**
 * The checkout the study ran on: other work on src/ may be uncommitted while it runs, and the
 * figures measure the sources as they were, so the report names the commit and what differed.
 */
function sourceState(): { commit: string; uncommitted: string[] } {
  const git = (...args: string[]): string => execFileSync('git', args, { encoding: 'utf8' });
  return { commit: git('rev-parse', 'HEAD').trim(), uncommitted: git('status', '--porcelain', '--', 'src', 'test/support', 'study').split('\n').filter((line) => line !== '') };
}

const { replicates, threads } = readOptions(process.argv.slice(2));
const started = performance.now();
const source = sourceState();
const tasks = studyTasks(replicates);
process.stderr.write(`study: ${tasks.length} series (${TREND_PROCESSES.length} processes × ${LENGTHS.length} lengths × ${replicates} replicates), ${RECOMMENDATION_RULES.length} rules, ${threads} threads\n`);
const results = await runTasks(tasks, threads);
// The seed scheme is checked rather than trusted: two series with one seed would be one series counted twice.
if (new Set(results.map((entry) => entry.seed)).size !== results.length) throw new Error('two series of the study share a seed');
const cells = TREND_PROCESSES.flatMap((process) => LENGTHS.map((n) => results.filter((entry) => entry.process === process && entry.n === n)));
const summaries = RECOMMENDATION_RULES.map((rule) => ({ rule, cells: cells.map((cell) => summariseCell(cell, rule)) }));
const tables = summaries.map(({ rule, cells: summary }) => markdownTable(rule, summary, HORIZON)).join('\n\n');
const elapsedSeconds = (performance.now() - started) / 1000;

const file = `out/study/recommendation-study-${replicates}.json`;
const report = {
  study: 'recommendation rule: held-out coverage and interval score of each rule, always-deterministic and always-stochastic',
  date: new Date().toISOString(),
  node: process.version,
  source,
  threads,
  elapsed_seconds: elapsedSeconds,
  replicates,
  horizon: HORIZON,
  level: STUDY_LEVEL,
  lengths: LENGTHS,
  processes: TREND_PROCESSES,
  rules: RECOMMENDATION_RULES,
  written_settings: 'horizon and recommendation.rule only; everything else resolved by resolveSettings for the simulated series',
  seeds: {
    scheme: 'processSeed(process, n, rep), rep = 0 … R − 1 (test/support/trendProcesses.ts)',
    cells: cells.map((cell) => ({ process: cell[0]?.process, n: cell[0]?.n, first: cell[0]?.seed, last: cell[cell.length - 1]?.seed })),
  },
  settings: cells.map((cell) => ({ process: cell[0]?.process, n: cell[0]?.n, by_rule: cellSettings(cell) })),
  summaries,
  tables,
  series: results.map(({ outcomes, ...entry }) => ({ ...entry, outcomes: outcomes.map(({ settings, ...outcome }) => ({ ...outcome, backtest_horizon: settings.backtest.horizon })) })),
};
mkdirSync('out/study', { recursive: true });
writeFileSync(file, `${JSON.stringify(report, null, 2)}\n`);
console.log(tables);
process.stderr.write(`\nstudy: ${elapsedSeconds.toFixed(0)} s; written: ${file}\n`);
