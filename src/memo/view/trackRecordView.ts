// The track record section as the template places it, and its one sentence for page 1: per
// series a summary line, the chart of the recommended models' forecasts against the outcomes,
// the accuracy so far of each model and of the recommended choice, and the detail table of
// every forecast now observed (the latest ones when there are many).
import { trackRecordChart } from '../charts/trackRecordChart.js';
import { formatNumber, formatPercent, formatPercentPoints, MISSING } from '../format/formatNumber.js';
import { noLinks } from '../format/noLinks.js';
import { seriesDecimals } from '../format/seriesDecimals.js';
import type { MemoInput } from '../memoInput.js';
import type { ChoiceScore, LevelCoverage, SeriesTrackRecord, TrackedChoice, TrackedForecast, TrackRecord } from '../trackRecordPart.js';
import { MIN_OUTCOMES_TO_JUDGE, trackRecordWording as w } from '../trackRecordWording.js';
import { figureView, type FigureView } from './figureView.js';

/** Observed forecasts listed per series; the rest are counted. */
export const DETAIL_ROWS_SHOWN = 24;

const CHOICES: readonly TrackedChoice[] = ['recommended', 'deterministic', 'stochastic'];

interface ModelCells {
  point: string;
  /** One cell per level: in, out or n/a. */
  inside: string[];
}

export interface TrackSeriesView {
  anchor: string;
  title: string;
  summary: string;
  figure: FigureView | null;
  tooFew: string;
  scoreCaption: string;
  scoreRows: { choice: string; outcomes: string; held: string[]; mae: string; mape: string }[];
  showMape: boolean;
  mapeNote: string;
  detailCaption: string;
  detailRows: { asOf: string; period: string; steps: string; actual: string; deterministic: ModelCells; stochastic: ModelCells }[];
  detailNote: string;
}

export interface TrackRecordView {
  heading: string;
  /** One sentence over every series, for page 1. */
  summary: string;
  intro: string;
  dependence: string;
  levels: string[];
  columns: typeof w.columns;
  levelColumns: string[];
  /** The detail table's columns under each model: the point, then one per level. */
  detailColumns: string[];
  modelSpan: number;
  series: TrackSeriesView[];
}

function held(coverage: LevelCoverage): string {
  const share = coverage.total >= MIN_OUTCOMES_TO_JUDGE ? formatPercent(coverage.hits / coverage.total) : null;
  return w.held(coverage.hits, coverage.total, share);
}

function heldAtLevels(score: ChoiceScore): string {
  return score.coverage.map((c) => w.heldAt(held(c), c.level)).join(' and ');
}

function modelCells(forecast: TrackedForecast | null, levels: readonly string[], decimals: number, recommended: boolean): ModelCells {
  if (forecast === null) return { point: MISSING, inside: levels.map(() => MISSING) };
  const point = formatNumber(forecast.point, decimals);
  return {
    point: recommended ? `${point} ${w.recommendedMark}` : point,
    inside: levels.map((level) => {
      const inside = forecast.inside[level];
      return inside === undefined || inside === null ? w.inside.null : w.inside[inside ? 'true' : 'false'];
    }),
  };
}

async function seriesBlock(entry: SeriesTrackRecord, input: Pick<MemoInput, 'series'>, levels: readonly string[]): Promise<TrackSeriesView> {
  const index = input.series.findIndex((s) => s.record.series.id === entry.series_id);
  const memoSeries = index < 0 ? undefined : input.series[index];
  const title = noLinks(entry.title);
  const units = memoSeries?.units === undefined ? '' : noLinks(memoSeries.units);
  const decimals = memoSeries === undefined ? 2 : seriesDecimals(memoSeries.record);
  const { recommended } = entry.scores;
  const pending = entry.memos.reduce((sum, memo) => sum + memo.forecasts - memo.observed, 0);
  const chartLevel = levels[0];
  const figure =
    entry.rows.length === 0 || chartLevel === undefined
      ? null
      : await figureView(`track-record-${index + 1}`, trackRecordChart({ series: title, units: units === '' ? undefined : units, level: chartLevel, rows: entry.rows, history: memoSeries?.history ?? [] }));
  const showMape = CHOICES.every((choice) => entry.scores[choice].outcomes === 0 || entry.scores[choice].mape !== null);
  const rows = entry.rows.slice(-DETAIL_ROWS_SHOWN);
  return {
    anchor: index < 0 ? '' : `series-${index + 1}`,
    title,
    summary:
      entry.memos.length === 0
        ? w.notInEarlier(title)
        : w.seriesSummary({ title, memos: entry.memos.length, outcomes: recommended.outcomes, pending, held: heldAtLevels(recommended), mae: formatNumber(recommended.mae, decimals) }),
    figure,
    tooFew: entry.rows.length > 0 && recommended.outcomes < MIN_OUTCOMES_TO_JUDGE ? w.tooFew(recommended.outcomes) : '',
    scoreCaption: w.scoreCaption(units),
    scoreRows:
      entry.rows.length === 0
        ? []
        : CHOICES.map((choice) => {
            const score = entry.scores[choice];
            return {
              choice: w.choice[choice],
              outcomes: String(score.outcomes),
              held: levels.map((level) => {
                const coverage = score.coverage.find((c) => c.level === level);
                return coverage === undefined ? MISSING : held(coverage);
              }),
              mae: formatNumber(score.mae, decimals),
              mape: formatPercentPoints(score.mape, 1),
            };
          }),
    showMape,
    mapeNote: entry.rows.length > 0 && !showMape ? w.mapeLeftOut : '',
    detailCaption: w.detailCaption(units),
    detailRows: rows.map((row) => ({
      asOf: noLinks(row.as_of),
      period: row.period,
      steps: String(row.h),
      actual: formatNumber(row.actual, decimals),
      deterministic: modelCells(row.models.deterministic, levels, decimals, row.recommended === 'deterministic'),
      stochastic: modelCells(row.models.stochastic, levels, decimals, row.recommended === 'stochastic'),
    })),
    detailNote: entry.rows.length > DETAIL_ROWS_SHOWN ? w.detailMore(DETAIL_ROWS_SHOWN, entry.rows.length) : '',
  };
}

/** The one sentence over every series. */
export function trackRecordSummary(record: TrackRecord): string {
  const { overall } = record;
  return w.summary({
    memos: record.earlier.length,
    outcomes: overall.outcomes,
    levels: overall.coverage.map((c) => ({ level: c.level, held: held(c) })),
    judged: overall.outcomes >= MIN_OUTCOMES_TO_JUDGE,
  });
}

export async function trackRecordView(input: Pick<MemoInput, 'track_record' | 'series'>): Promise<TrackRecordView | undefined> {
  const record = input.track_record;
  if (record === undefined || record.earlier.length === 0) return undefined;
  // The levels any earlier memo used, narrowest first; the chart draws the narrowest.
  const levels = [...new Set(record.series.flatMap((s) => s.rows.flatMap((row) => [row.models.deterministic, row.models.stochastic].flatMap((f) => (f === null ? [] : Object.keys(f.inside))))))].sort(
    (a, b) => Number(a) - Number(b),
  );
  const series: TrackSeriesView[] = [];
  // One chart at a time, as for the series sections.
  for (const entry of record.series) series.push(await seriesBlock(entry, input, levels));
  return {
    heading: w.heading,
    summary: trackRecordSummary(record),
    intro: w.intro(noLinks(record.as_of), record.earlier.map((e) => noLinks(e.as_of))),
    dependence: w.dependence,
    levels,
    columns: w.columns,
    levelColumns: levels.map((level) => w.columns.held(level)),
    detailColumns: [w.columns.point, ...levels.map(w.columns.level), w.columns.point, ...levels.map(w.columns.level)],
    modelSpan: levels.length + 1,
    series,
  };
}
