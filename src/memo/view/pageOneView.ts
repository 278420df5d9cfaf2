// Page 1 as a reviewer reads it: per series the data behind it (period, last observation,
// source and vintage), the recommendation with its one-line reason, and both models' figures for
// the next period, the next full calendar year and the end of the horizon, each with the
// interval at the series' widest level; then what changed since the previous memo.
import type { AnalysisRecord } from '../../analysis/record.js';
import { TREND_MODELS, type TrendModelKind } from '../../base/settings.js';
import { evidenceWording } from '../evidenceWording.js';
import { formatNumber } from '../format/formatNumber.js';
import { noLinks } from '../format/noLinks.js';
import { atLevel, widestLevel } from '../intervalLevels.js';
import type { MemoSeries } from '../memoInput.js';
import type { Revisions } from '../revisionsPart.js';
import { LABELS, METHOD_NAME, PAGE_ONE, TEMPLATE_TEXT } from '../wording.js';
import { intervalText } from './forecastTableView.js';
import { agreement } from './agreement.js';
import type { SeriesView } from './seriesView.js';

export interface FigureCell {
  point: string;
  interval: string;
}

export interface PageOneSeries {
  anchor: string;
  title: string;
  units: string;
  /** "Annual, 1955–2024, 70 observations; last observation 2024". */
  data: string;
  /** "Source: …; vintage: …", or empty. */
  source: string;
  /** The period labels over the three figure columns. */
  labels: { next: string; year: string; end: string };
  rows: { name: string; recommended: boolean; next: FigureCell; year: FigureCell | null; end: FigureCell }[];
  /** The recommendation and its one-line reason; or why there is none. */
  recommendation: string;
  /** How many caveats the series page carries and how many weigh on the decision. */
  caveats: string;
  /** The recommended model's next full year in words, or why the horizon gives none; empty for annual series. */
  yearSentence: string;
}

function cell(point: number | undefined, interval: [number, number] | undefined, decimals: number): FigureCell {
  return { point: formatNumber(point, decimals), interval: interval === undefined ? '' : intervalText(interval, decimals) };
}

/** The sentence on page 1 when the backtest did not reach the memo's horizon (none when it did, or did not run). */
function backtestReach(record: AnalysisRecord): string[] {
  const reach = record.backtest?.settings.horizon;
  return reach === undefined || reach >= record.settings.horizon ? [] : [evidenceWording.shortBacktest(reach, record.settings.horizon)];
}

/**
 * The recommendation in one line: the model, who settled it, and the rule's conclusion (the
 * first reason that is not one of the findings, which may point either way).
 */
function recommendationLine(record: AnalysisRecord): string {
  const { recommendation } = record;
  if (recommendation === undefined) return PAGE_ONE.noRecommendation;
  const findings = new Set(recommendation.evidence.map((item) => item.finding));
  const reason = recommendation.reasons.find((r) => !findings.has(r)) ?? '';
  // The backtest's reach, when it stopped short of the horizon, belongs beside the choice it informed.
  return PAGE_ONE.recommendation(METHOD_NAME[recommendation.model], evidenceWording.decidedBy[recommendation.decided_by], noLinks(reason), [...agreement(record), ...backtestReach(record)].join(' '));
}

export function pageOneSeries(entry: MemoSeries, view: SeriesView, decimals: number): PageOneSeries {
  const { record } = entry;
  const level = widestLevel(record.settings);
  const model: TrendModelKind | undefined = record.recommendation?.model;
  const last = record.forecasts.deterministic.length - 1;
  const year = record.next_year ?? null;
  const high = view.caveats.filter((c) => c.severity === 'high').length;
  return {
    anchor: view.anchor,
    title: view.title,
    units: view.units,
    data: PAGE_ONE.data(view.span, record.series.last),
    source: PAGE_ONE.source(noLinks(entry.source ?? ''), noLinks(entry.vintage ?? '')),
    labels: {
      next: record.forecasts.deterministic[0]?.period ?? '',
      year: year === null ? PAGE_ONE.annual : year.available ? (view.year?.head ?? '') : PAGE_ONE.yearBeyond(year.year),
      end: record.forecasts.deterministic[last]?.period ?? '',
    },
    rows: TREND_MODELS.map((kind) => {
      const rows = record.forecasts[kind];
      // The year's rows as the year view formats them (one interval per level of settings.levels), at the widest level.
      const figure = view.year?.models.find((row) => row.name === METHOD_NAME[kind]);
      return {
        name: METHOD_NAME[kind],
        recommended: kind === model,
        next: cell(rows[0]?.point, atLevel(rows[0]?.intervals, level), decimals),
        year: figure === undefined ? null : { point: figure.point, interval: figure.intervals[record.settings.levels.indexOf(level)] ?? '' },
        end: cell(rows[last]?.point, atLevel(rows[last]?.intervals, level), decimals),
      };
    }),
    recommendation: recommendationLine(record),
    caveats: PAGE_ONE.caveats(view.caveats.length, high, LABELS.severity.high),
    yearSentence: view.year?.sentence ?? '',
  };
}

/** What changed since the previous memo, in one or two sentences; empty for a memo without an as-of period. */
export function changesLine(revisions: Revisions | undefined): string {
  if (revisions === undefined) return '';
  if (revisions.earlier === null) return PAGE_ONE.noEarlier(revisions.as_of);
  const changed = (pick: (s: Revisions['series'][number]) => boolean) => revisions.series.filter(pick).map((s) => noLinks(s.title));
  const recommendation = changed((s) => s.recommendation !== null && s.recommendation.now !== s.recommendation.earlier);
  const orders = changed((s) => s.orders.some((o) => o.now.p !== o.earlier.p || o.now.q !== o.earlier.q));
  const data = changed((s) => (s.data ?? []).length > 0);
  const added = changed((s) => !s.in_earlier);
  return PAGE_ONE.changes({ earlier: revisions.earlier.as_of, recommendation, orders, data, added, dropped: revisions.dropped.map((d) => noLinks(d.title)) });
}

/** The interval column's head: one level for every series, or "widest level" when they differ. */
export function intervalHead(records: readonly AnalysisRecord[]): string {
  const levels = [...new Set(records.map((r) => widestLevel(r.settings)))];
  return levels.length === 1 ? TEMPLATE_TEXT.intervalHead(levels[0]) : PAGE_ONE.widestInterval;
}
