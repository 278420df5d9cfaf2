// One replicate of the recommendation study, a pure function of its task: simulate n + H
// values of a process from its seed, analyse the first n as a memo would (the record's
// settings resolved from nothing but the forecast horizon and the rule), once per rule, and
// score both models' intervals at h = H against the held-out value. Runs in a worker thread
// (recommendationStudy.ts loads it through src/base/workerModule.ts) or inline.
import { analyseSeries, levelKey, parseSeriesCsv, readingSettings, requiredObservations, resolveSettings, TREND_MODELS } from '../src/index.js';
import type { AnalysisRecord, AnalysisSettings, RecommendationRule, Series, TrendModelKind, WrittenSettings } from '../src/index.js';
import { intervalScore } from '../src/backtest/intervalScore.js';
import { processSeed, simulateProcess, type TrendProcess } from '../test/support/trendProcesses.js';

/** The interval level whose held-out coverage and score the study reports, in percent. */
export const STUDY_LEVEL = 95;

export interface StudyTask {
  process: TrendProcess;
  /** Observations analysed. */
  n: number;
  rep: number;
  /** The memo's forecast horizon; the value at n + horizon is held out. */
  horizon: number;
  rules: readonly RecommendationRule[];
}

/** A model's held-out interval at h = H: did it cover the value, and its interval score. */
export interface HeldOutScore {
  covered: boolean;
  score: number;
}

export interface RuleOutcome {
  rule: RecommendationRule;
  /** The settings the record was analysed at, as resolveSettings gave them. */
  settings: AnalysisSettings;
  backtestAvailable: boolean;
  /** The unit-root reading, which the default rule consults. */
  verdict: string;
  recommended: TrendModelKind;
  heldOut: Record<TrendModelKind, HeldOutScore>;
}

export interface SeriesOutcome {
  process: TrendProcess;
  n: number;
  rep: number;
  seed: number;
  outcomes: RuleOutcome[];
}

export async function studyTask(task: StudyTask): Promise<SeriesOutcome> {
  const seed = processSeed(task.process, task.n, task.rep);
  const values = simulateProcess(task.process, task.n + task.horizon, seed);
  const actual = values[task.n + task.horizon - 1];
  const series = simulatedSeries(values.subarray(0, task.n), task.horizon);
  const identity = { id: `${task.process}-n${task.n}-r${task.rep}`, title: task.process, file: SERIES_FILE };
  const outcomes: RuleOutcome[] = [];
  for (const rule of task.rules) {
    const settings = resolveSettings(writtenSettings(task.horizon, rule), series);
    // One thread: the series is the unit of work, so the backtest's origins run inline.
    const record = await analyseSeries(series, settings, identity, { backtest: true, threads: 1 });
    outcomes.push(ruleOutcome(rule, record, task.horizon, actual));
  }
  return { process: task.process, n: task.n, rep: task.rep, seed, outcomes };
}

const SERIES_FILE = 'simulated.csv';
/** Annual periods from this year on; the label only names the periods. */
const FIRST_YEAR = 2001;

/** What a memo's config would write: the horizon and the rule, everything else left to the defaults. */
function writtenSettings(horizon: number, rule: RecommendationRule): WrittenSettings {
  return { horizon, recommendation: { rule } };
}

/**
 * The series through the data stage's public entry, a CSV text, so it gets the checks and the
 * fields a series file would. String(x) is the shortest text that reads back as the same
 * double (ECMAScript Number::toString), so no digit is lost on the way.
 */
function simulatedSeries(values: Float64Array, horizon: number): Series {
  const lines = Array.from(values, (value, i) => `${FIRST_YEAR + i},${String(value)}`);
  const reading = readingSettings({ horizon });
  return parseSeriesCsv(['year,value', ...lines].join('\n'), SERIES_FILE, {
    frequency: 'annual',
    minObservations: requiredObservations(reading.max_p, reading.max_q),
    transform: reading.transform,
    missing: reading.missing,
  });
}

function ruleOutcome(rule: RecommendationRule, record: AnalysisRecord, horizon: number, actual: number): RuleOutcome {
  if (record.recommendation === undefined) throw new Error(`${record.series.id}: the record has no recommendation although a backtest was asked for`);
  const heldOut = Object.fromEntries(TREND_MODELS.map((kind) => [kind, heldOutScore(record, kind, horizon, actual)])) as Record<TrendModelKind, HeldOutScore>;
  return {
    rule,
    settings: record.settings,
    backtestAvailable: record.backtest !== null && record.backtest !== undefined,
    verdict: record.evidence.reading.verdict,
    recommended: record.recommendation.model,
    heldOut,
  };
}

/** Coverage and interval score (Gneiting & Raftery 2007, eq. 43) of the record's interval at h = H. */
function heldOutScore(record: AnalysisRecord, kind: TrendModelKind, horizon: number, actual: number): HeldOutScore {
  const interval = record.forecasts[kind].find((row) => row.h === horizon)?.intervals[levelKey(STUDY_LEVEL)];
  if (interval === undefined) throw new Error(`${record.series.id}: no ${STUDY_LEVEL}% ${kind} interval at h = ${horizon}; the settings' levels are ${record.settings.levels.join(', ')}`);
  const [lower, upper] = interval;
  return { covered: lower <= actual && actual <= upper, score: intervalScore(lower, upper, STUDY_LEVEL, actual) };
}
