// Every word of the revisions section: this memo against the previous as-of memo. Kept apart
// from wording.ts so the section can be read (and reworded) in one place.
import type { TrendModelKind } from '../base/settings.js';
import type { ArmaOrder } from './revisionsPart.js';
import { MODEL_IN_TEXT, MODEL_NAME } from './wording.js';

const order = ({ p, q }: ArmaOrder) => `ARMA(${p}, ${q})`;

export const revisionsWording = {
  heading: 'Changes since the previous memo',
  intro: (asOf: string, earlier: string, runDate: string) =>
    `This memo, as of ${asOf}, set against the memo as of ${earlier} (run on ${runDate}): forecasts for the same target periods, model orders, the recommendation and revised observations.`,
  dropped: (titles: string[]) => `No longer in this memo: ${titles.join('; ')}.`,
  newSeries: 'New in this memo: the previous memo has no such series.',
  lastObserved: (earlier: string, now: string) => (earlier === now ? `Latest observation: ${now}, as before.` : `Latest observation: ${now} (previously ${earlier}).`),
  orderChanged: (model: TrendModelKind, earlier: ArmaOrder, now: ArmaOrder) => `${MODEL_NAME[model]}: order now ${order(now)}, previously ${order(earlier)}.`,
  ordersSame: 'Model orders: unchanged for both models.',
  recommendationChanged: (earlier: TrendModelKind | null, now: TrendModelKind | null) =>
    `Recommendation: ${now === null ? 'none' : `the ${MODEL_IN_TEXT[now]}`} now, previously ${earlier === null ? 'none' : `the ${MODEL_IN_TEXT[earlier]}`}.`,
  recommendationSame: (model: TrendModelKind | null) => (model === null ? 'Recommendation: none in either memo.' : `Recommendation: the ${MODEL_IN_TEXT[model]}, as before.`),
  rowsShown: (shown: number, all: number) => `${shown} of the ${all} periods both memos forecast are shown; both memos\u2019 record.json files hold every one.`,
  noCommonPeriods: 'The two memos forecast no common period.',
  forecastCaption: (units: string) => `Point forecasts for the periods both memos forecast${units === '' ? '' : ` (${units})`}: previous memo, this memo and the change.`,
  dataCaption: (units: string) => `Revised observations${units === '' ? '' : ` (${units})`}: periods both memos hold with different values.`,
  dataNone: 'Revised observations: none; every period both memos hold has the same value.',
  dataUnknown: 'Revised observations: the previous memo’s record does not carry its observed values, so they cannot be compared.',
  dataMore: (shown: number, all: number) => `The first ${shown} of ${all} revised observations are listed; both memos’ record.json files hold every value.`,
  columns: {
    period: 'Period',
    steps: 'Steps ahead, then → now',
    earlier: 'Previous',
    now: 'Now',
    change: 'Change',
    percent: 'Change %',
    observed: 'Observed, previous',
    revised: 'Observed, now',
  },
  chart: {
    // The section's heading names the series; a title that repeats it can run past the chart's width.
    title: (_series: string) => 'This memo’s forecasts against the previous memo’s',
    subtitle: (asOf: string, earlier: string) => [`Solid line, filled markers: this memo (as of ${asOf}).`, `Dashed grey line, open markers: the memo as of ${earlier}.`],
    panel: (model: TrendModelKind) => MODEL_NAME[model],
    description: (a: { series: string; asOf: string; earlier: string; largest: { model: TrendModelKind; period: string; change: string }[] }) =>
      `Two panels, one per model, of the point forecasts of ${a.series} in this memo (as of ${a.asOf}) and in the memo as of ${a.earlier}. ` +
      (a.largest.length === 0
        ? 'The two memos forecast no common period.'
        : a.largest.map((l) => `The ${MODEL_IN_TEXT[l.model]} forecast moved most at ${l.period}, by ${l.change}.`).join(' ')),
  },
} as const;
