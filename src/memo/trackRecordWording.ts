// Every word of the track record section: how the earlier as-of memos' forecasts fared against
// what has since been observed. Kept apart from wording.ts so the section reads (and can be
// reworded) in one place. Numbers arrive formatted.
import { plural } from '../base/problem.js';
import type { TrendModelKind } from '../base/settings.js';
import { MODEL_NAME } from './wording.js';

/**
 * Below this many outcomes a coverage share is not printed: one outcome more or less inside
 * moves it by over 5 points, and at a true 80% coverage its binomial standard error is above
 * 9 points (√(0.8 × 0.2 / 20) ≈ 0.089), too coarse to tell a well-calibrated interval from a
 * poor one.
 */
export const MIN_OUTCOMES_TO_JUDGE = 20;

/** How each model looks in the chart (palette.ts: colour, MODEL_SHAPE, MODEL_DASH). */
const CHART_KEY: Record<TrendModelKind, string> = { deterministic: 'green circles for the deterministic trend', stochastic: 'amber squares for the stochastic trend' };

const memos = (count: number) => plural(count, 'earlier memo');
const forecasts = (count: number) => plural(count, 'forecast');

export const trackRecordWording = {
  heading: 'How earlier forecasts fared',
  /** One sentence over every series, for page 1. */
  summary: (a: { memos: number; outcomes: number; levels: { level: string; held: string }[]; judged: boolean }) => {
    const start = `Track record: ${memos(a.memos)}; `;
    if (a.outcomes === 0) return `${start}none of ${a.memos === 1 ? 'its' : 'their'} forecasts has been observed yet.`;
    const held = a.levels.map((l, i) => (i === 0 ? `the recommended model's ${l.level}% intervals held ${l.held}` : `its ${l.level}% intervals ${l.held}`)).join(' and ');
    const observed = `${a.outcomes} of ${a.memos === 1 ? 'its' : 'their'} forecasts ${a.outcomes === 1 ? 'is' : 'are'} now observed`;
    return `${start}${observed}${held === '' ? '' : `: ${held}`}${a.judged ? '.' : `; ${a.outcomes === 1 ? 'one outcome is' : `${a.outcomes} outcomes are`} too few to judge coverage.`}`;
  },
  intro: (asOf: string, earlier: string[]) =>
    `The forecasts of the ${earlier.length === 1 ? `memo as of ${earlier[0]}` : `${earlier.length} memos as of ${earlier.length === 2 ? `${earlier[0]} and ${earlier[1]}` : `${earlier[0]} to ${earlier[earlier.length - 1]}`}`}, set against the values this memo's data (as of ${asOf}) now hold for the periods they forecast. ` +
    'Outcomes are the values as they stand now, revisions included; periods not yet observed are left out.',
  dependence:
    'The outcomes are not independent: one memo\u2019s forecasts at successive steps share their errors, and successive memos forecast the same periods. The counts therefore say less about the intervals than their number suggests, and how earlier intervals fared is no guarantee for the forecasts in this memo.',
  tooFew: (outcomes: number) => `${outcomes === 1 ? '1 outcome' : `${outcomes} outcomes`}: too few to judge coverage; the counts are shown without shares.`,
  /** `held` e.g. "8 of 10 at 80% and 10 of 10 at 95%". */
  seriesSummary: (a: { title: string; memos: number; outcomes: number; pending: number; held: string; mae: string }) =>
    a.outcomes === 0
      ? `${a.title}: ${memos(a.memos)}; none of ${a.memos === 1 ? 'its' : 'their'} ${forecasts(a.pending)} has been observed yet.`
      : `${a.title}: ${a.outcomes} of ${forecasts(a.outcomes + a.pending)} from ${memos(a.memos)} observed so far; the recommended model's intervals held ${a.held}, with a mean absolute error of ${a.mae}.`,
  heldAt: (held: string, level: string) => `${held} at ${level}%`,
  /** Hits of total, with the share once the outcomes are enough to judge. */
  held: (hits: number, total: number, share: string | null) => `${hits} of ${total}${share === null ? '' : ` (${share})`}`,
  notInEarlier: (title: string) => `${title}: no earlier memo forecast this series.`,
  scoreCaption: (units: string) => `Accuracy so far${units === '' ? '' : ` (errors in ${units})`}: outcomes inside each interval and the mean absolute error, for each model and for the model each memo recommended.`,
  mapeLeftOut: 'The mean absolute percentage error is left out: not every outcome is positive.',
  detailCaption: (units: string) => `Each forecast now observed${units === '' ? '' : ` (${units})`}: the outcome, each model's point forecast and whether the outcome fell inside its intervals; \u2605 marks the model the memo recommended.`,
  detailMore: (shown: number, all: number) => `The latest ${shown} of ${all} observed forecasts are listed; record.json holds all of them (track_record).`,
  choice: { recommended: 'Recommended model', deterministic: MODEL_NAME.deterministic, stochastic: MODEL_NAME.stochastic } as Record<TrendModelKind | 'recommended', string>,
  inside: { true: 'in', false: 'out', null: 'n/a' },
  recommendedMark: '\u2605',
  columns: {
    choice: 'Forecasts from',
    outcomes: 'Outcomes',
    held: (level: string) => `Inside ${level}%`,
    mae: 'Mean abs. error',
    mape: 'Mean abs. % error',
    memo: 'Memo as of',
    period: 'Period',
    steps: 'Steps',
    actual: 'Outcome',
    point: 'Point',
    level: (level: string) => `${level}%`,
  },
  chart: {
    // The section's heading names the series; a title that repeats it can run past the chart's width.
    title: (_series: string) => "Earlier memos' forecasts against the outcomes",
    /** One short line per mark, naming only the models drawn. */
    subtitle: (level: string, models: readonly TrendModelKind[]) => [
      'Solid dark line with dots: observed values.',
      ...(models.length === 0
        ? []
        : ["Dashed lines, open markers: each earlier memo's point forecasts from the model it recommended", `(${models.map((m) => CHART_KEY[m]).join('; ')}).`]),
      `Bars: the ${level}% intervals of those forecasts.`,
    ],
    description: (a: { series: string; memos: number; level: string; held: number; total: number }) =>
      `Line chart of the observed values of ${a.series} with the point forecasts and ${a.level}% intervals of ${memos(a.memos)} for the periods observed since. ` +
      `${a.held} of the ${a.total} outcomes fell inside those intervals.`,
  },
} as const;
