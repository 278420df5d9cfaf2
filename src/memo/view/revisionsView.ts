// The revisions section as the template places it: one block per series with its changed
// orders and recommendation, the chart of both memos' forecasts, the table of forecast
// revisions for the periods both memos forecast, and the revised observations.
import { revisionChart } from '../charts/revisionChart.js';
import { noLinks } from '../format/noLinks.js';
import { formatNumber, formatPercentPoints, MISSING } from '../format/formatNumber.js';
import { seriesDecimals } from '../format/seriesDecimals.js';
import type { MemoInput } from '../memoInput.js';
import type { TrendModelKind } from '../../base/settings.js';
import type { ForecastRevision, Revisions, SeriesRevisions } from '../revisionsPart.js';
import { revisionsWording } from '../revisionsWording.js';
import { figureView, type FigureView } from './figureView.js';
import { shownHorizons } from './shownHorizons.js';
import { parsePeriod, periodsPerYear } from '../../base/period.js';

/** Revised observations listed in the memo; the rest are counted. */
export const DATA_ROWS_SHOWN = 24;

interface Change {
  earlier: string;
  now: string;
  change: string;
  percent: string;
}

export interface RevisionSeriesView {
  anchor: string;
  title: string;
  notes: string[];
  figure: FigureView | null;
  forecastCaption: string;
  forecastRows: { period: string; steps: string; deterministic: Change; stochastic: Change }[];
  /** How many of the common periods the table shows, when not all. */
  forecastRowsNote: string;
  noCommonPeriods: string;
  dataCaption: string;
  dataRows: ({ period: string } & Change)[];
  dataNote: string;
}

export interface RevisionsView {
  heading: string;
  compared: boolean;
  intro: string;
  dropped: string;
  columns: typeof revisionsWording.columns;
  /** The four column heads under each model, repeated for both. */
  modelColumns: string[];
  series: RevisionSeriesView[];
}

function signed(text: string, value: number | null): string {
  return value !== null && value > 0 && text !== MISSING ? `+${text}` : text;
}

function change(earlier: number | null, now: number | null, difference: number | null, percent: number | null, decimals: number): Change {
  return {
    earlier: formatNumber(earlier, decimals),
    now: formatNumber(now, decimals),
    change: signed(formatNumber(difference, decimals), difference),
    percent: signed(formatPercentPoints(percent, 2), percent),
  };
}

const NO_ROW: Change = { earlier: MISSING, now: MISSING, change: MISSING, percent: MISSING };

/** Common periods beyond this many print a selection (shownHorizons: the first three, then evenly spaced to the last). */
export const REVISION_ROWS = 8;

function forecastRows(forecasts: ForecastRevision[], decimals: number): { rows: RevisionSeriesView['forecastRows']; all: number } {
  const every = [...new Set(forecasts.map((row) => row.period))];
  const first = every[0];
  const parsed = first === undefined ? null : parsePeriod(first);
  const perYear = parsed === null ? 1 : periodsPerYear(parsed.frequency);
  const picked = new Set(shownHorizons(every.length, REVISION_ROWS, perYear));
  const periods = every.filter((_, i) => picked.has(i + 1));
  const rows = periods.map((period) => {
    const of = (model: TrendModelKind) => forecasts.find((row) => row.model === model && row.period === period);
    const cells = (model: TrendModelKind) => {
      const row = of(model);
      return row === undefined ? NO_ROW : change(row.point_earlier, row.point, row.change, row.percent_change, decimals);
    };
    const steps = of('deterministic') ?? of('stochastic');
    return { period, steps: steps === undefined ? MISSING : `${steps.h_earlier} \u2192 ${steps.h}`, deterministic: cells('deterministic'), stochastic: cells('stochastic') };
  });
  return { rows, all: every.length };
}

function notes(entry: SeriesRevisions): string[] {
  const w = revisionsWording;
  if (!entry.in_earlier || entry.last.earlier === null) return [w.newSeries];
  const orders = entry.orders.length === 0 ? [w.ordersSame] : entry.orders.map((o) => w.orderChanged(o.model, o.earlier, o.now));
  const recommendation = entry.recommendation === null ? [] : [w.recommendationChanged(entry.recommendation.earlier, entry.recommendation.now)];
  return [w.lastObserved(entry.last.earlier, entry.last.now), ...orders, ...recommendation];
}

function dataNote(entry: SeriesRevisions): string {
  if (!entry.in_earlier) return '';
  if (entry.data === null) return revisionsWording.dataUnknown;
  if (entry.data.length === 0) return revisionsWording.dataNone;
  return entry.data.length > DATA_ROWS_SHOWN ? revisionsWording.dataMore(DATA_ROWS_SHOWN, entry.data.length) : '';
}

async function seriesBlock(entry: SeriesRevisions, input: Pick<MemoInput, 'series'>, revisions: Revisions, earlierAsOf: string): Promise<RevisionSeriesView> {
  const index = input.series.findIndex((s) => s.record.series.id === entry.series_id);
  const memoSeries = index < 0 ? undefined : input.series[index];
  const anchor = index < 0 ? '' : `series-${index + 1}`;
  const title = noLinks(entry.title);
  const units = memoSeries?.units === undefined ? undefined : noLinks(memoSeries.units);
  const decimals = memoSeries === undefined ? 2 : seriesDecimals(memoSeries.record);
  const { earlier } = entry.paths;
  const revised = forecastRows(entry.forecasts, decimals);
  const figure =
    earlier === null
      ? null
      : await figureView(`revisions-${index + 1}`, revisionChart({ series: title, units, decimals, asOf: noLinks(revisions.as_of), earlierAsOf, paths: { now: entry.paths.now, earlier }, forecasts: entry.forecasts }));
  return {
    anchor,
    title,
    notes: notes(entry),
    figure,
    forecastCaption: revisionsWording.forecastCaption(units ?? ''),
    forecastRows: revised.rows,
    forecastRowsNote: revised.rows.length < revised.all ? revisionsWording.rowsShown(revised.rows.length, revised.all) : '',
    noCommonPeriods: entry.in_earlier && entry.forecasts.length === 0 ? revisionsWording.noCommonPeriods : '',
    dataCaption: revisionsWording.dataCaption(units ?? ''),
    dataRows: (entry.data ?? []).slice(0, DATA_ROWS_SHOWN).map((row) => ({ period: row.period, ...change(row.value_earlier, row.value, row.change, row.percent_change, decimals) })),
    dataNote: dataNote(entry),
  };
}

export async function revisionsView(input: Pick<MemoInput, 'revisions' | 'series'>): Promise<RevisionsView | null> {
  const { revisions } = input;
  if (revisions === undefined) return null;
  const asOf = noLinks(revisions.as_of);
  const { columns } = revisionsWording;
  const perModel = [columns.earlier, columns.now, columns.change, columns.percent];
  const base = { heading: revisionsWording.heading, columns, modelColumns: [...perModel, ...perModel] };
  const { earlier } = revisions;
  if (earlier === null) return { ...base, compared: false, intro: '', dropped: '', series: [] };
  const earlierAsOf = noLinks(earlier.as_of);
  const series: RevisionSeriesView[] = [];
  // One chart at a time, as for the series sections.
  for (const entry of revisions.series) series.push(await seriesBlock(entry, input, revisions, earlierAsOf));
  return {
    ...base,
    compared: true,
    intro: revisionsWording.intro(asOf, earlierAsOf, noLinks(earlier.run_date)),
    dropped: revisions.dropped.length === 0 ? '' : revisionsWording.dropped(revisions.dropped.map((d) => noLinks(d.title))),
    series,
  };
}
