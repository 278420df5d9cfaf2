// The study's per-cell summaries (process × length, one per rule) and their Markdown tables.
// Coverage is the share of held-out values inside the 95% interval; the interval score
// (Gneiting & Raftery 2007, eq. 43) is averaged over the replicates, with its Monte Carlo
// standard error, sd / √R, beside it.
import type { RecommendationRule, TrendModelKind } from '../src/index.js';
import { processTrend, type TrendProcess } from '../test/support/trendProcesses.js';
import { STUDY_LEVEL, type HeldOutScore, type RuleOutcome, type SeriesOutcome } from './studyTask.js';

/** Coverage and mean interval score of one way of choosing the model over a cell's replicates. */
export interface ChoiceSummary {
  coverage: number;
  meanScore: number;
  scoreStandardError: number;
}

export interface CellSummary {
  process: TrendProcess;
  n: number;
  rule: RecommendationRule;
  replicates: number;
  /** Share of the replicates for which the rule picked each model. */
  picks: Record<TrendModelKind, number>;
  backtestUnavailable: number;
  /** Share of the replicates by unit-root reading, which the default rule consults. */
  verdicts: Record<string, number>;
  /** The rule's picks, always the deterministic trend, always the stochastic trend. */
  rulePicks: ChoiceSummary;
  alwaysDeterministic: ChoiceSummary;
  alwaysStochastic: ChoiceSummary;
  /** Backtest horizons the cell's records were analysed at (one, unless the defaults depend on the data). */
  backtestHorizons: number[];
}

export function summariseCell(series: readonly SeriesOutcome[], rule: RecommendationRule): CellSummary {
  const first = series[0];
  if (first === undefined) throw new Error('a cell of the study has no replicates');
  const outcomes = series.map((entry) => outcomeOf(entry, rule));
  const share = (test: (outcome: RuleOutcome) => boolean): number => outcomes.filter(test).length / outcomes.length;
  const choice = (pick: (outcome: RuleOutcome) => TrendModelKind): ChoiceSummary => summariseChoice(outcomes.map((outcome) => outcome.heldOut[pick(outcome)]));
  return {
    process: first.process,
    n: first.n,
    rule,
    replicates: outcomes.length,
    picks: { deterministic: share((o) => o.recommended === 'deterministic'), stochastic: share((o) => o.recommended === 'stochastic') },
    backtestUnavailable: share((o) => !o.backtestAvailable),
    verdicts: Object.fromEntries([...new Set(outcomes.map((o) => o.verdict))].sort().map((verdict) => [verdict, share((o) => o.verdict === verdict)])),
    rulePicks: choice((o) => o.recommended),
    alwaysDeterministic: choice(() => 'deterministic'),
    alwaysStochastic: choice(() => 'stochastic'),
    backtestHorizons: [...new Set(outcomes.map((o) => o.settings.backtest.horizon))].sort((a, b) => a - b),
  };
}

export function outcomeOf(entry: SeriesOutcome, rule: RecommendationRule): RuleOutcome {
  const outcome = entry.outcomes.find((o) => o.rule === rule);
  if (outcome === undefined) throw new Error(`${entry.process} n = ${entry.n} replicate ${entry.rep} has no outcome for the rule ${rule}`);
  return outcome;
}

function summariseChoice(scores: readonly HeldOutScore[]): ChoiceSummary {
  const values = scores.map((s) => s.score);
  const meanScore = mean(values);
  const variance = values.length > 1 ? values.reduce((sum, v) => sum + (v - meanScore) ** 2, 0) / (values.length - 1) : Number.NaN;
  return {
    coverage: scores.filter((s) => s.covered).length / scores.length,
    meanScore,
    scoreStandardError: Math.sqrt(variance / values.length),
  };
}

function mean(values: readonly number[]): number {
  return values.reduce((sum, v) => sum + v, 0) / values.length;
}

const percent = (share: number): string => `${(100 * share).toFixed(0)}%`;
const score = (summary: ChoiceSummary): string => `${summary.meanScore.toFixed(1)} (${summary.scoreStandardError.toFixed(1)})`;

/** One Markdown table per rule, a row per cell, in the order the cells are given. */
export function markdownTable(rule: RecommendationRule, cells: readonly CellSummary[], horizon: number): string {
  const replicates = cells[0]?.replicates ?? 0;
  const header = [
    'process',
    'trend',
    'n',
    'B',
    'picks det.',
    'picks stoch.',
    'no backtest',
    'cover: rule',
    'cover: det.',
    'cover: stoch.',
    'IS: rule',
    'IS: det.',
    'IS: stoch.',
  ];
  const rows = cells.map((cell) => [
    cell.process,
    processTrend(cell.process) === 'deterministic' ? 'trend-stationary' : 'difference-stationary',
    String(cell.n),
    cell.backtestHorizons.join('/'),
    percent(cell.picks.deterministic),
    percent(cell.picks.stochastic),
    percent(cell.backtestUnavailable),
    percent(cell.rulePicks.coverage),
    percent(cell.alwaysDeterministic.coverage),
    percent(cell.alwaysStochastic.coverage),
    score(cell.rulePicks),
    score(cell.alwaysDeterministic),
    score(cell.alwaysStochastic),
  ]);
  const line = (cells: readonly string[]): string => `| ${cells.join(' | ')} |`;
  // Binomial standard error of a coverage share near the nominal level.
  const coverageSe = Math.sqrt(((STUDY_LEVEL / 100) * (1 - STUDY_LEVEL / 100)) / Math.max(replicates, 1));
  return [
    `### Rule \`${rule}\`: ${replicates} replicates per cell, held-out ${STUDY_LEVEL}% interval at h = ${horizon}`,
    '',
    line(header),
    line(header.map((_, i) => (i < 4 ? '---' : '---:'))),
    ...rows.map(line),
    '',
    `B: backtest horizon the settings resolved to. cover: share of held-out values inside the ${STUDY_LEVEL}% interval (Monte Carlo s.e. near ${STUDY_LEVEL}%: ${(100 * coverageSe).toFixed(1)}%). ` +
      `IS: mean ${STUDY_LEVEL}% interval score (Gneiting & Raftery 2007), lower is better, its s.e. in parentheses. ` +
      'rule: the recommended model; det./stoch.: always that model.',
  ].join('\n');
}
