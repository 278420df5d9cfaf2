// A RunPlan's series read and analysed into the memo's record document: the analysis a run
// does before anything is rendered. The files are assembled from the document afterwards
// (assembleMemo.ts), so `run` can weigh the new content against an issued memo first, and
// `review` can render again from a stored record.json without analysing anything.
//   RunPlan ─readSeriesFile─▶ Series[] ─completeAnalysis─▶ AnalysisRecord[] ─▶ RecordDocument
import type { AnalysisRecord } from '../analysis/record.js';
import type { InputProblem } from '../base/problem.js';
import type { RunPlan } from '../config/runPlan.js';
import type { MemoInput } from '../memo/memoInput.js';
import { analysePlannedSeries, type SeriesTask } from './analysePlannedSeries.js';
import { readAllSeries, type PlannedSeries } from './readPlannedSeries.js';
import { RECORD_DOCUMENT_SCHEMA, seriesHistory, type RecordDocument } from './recordDocument.js';
import type { SeriesPool } from './seriesPool.js';

export interface PrepareMemoOptions {
  /** YYYY-MM-DD. */
  runDate: string;
  /** Worker threads for each series' backtest (without a pool); the results do not depend on it. */
  threads?: number;
  /** Worker threads that analyse whole series; shared by every memo of a batch. */
  pool?: SeriesPool;
  /** Called as each series finishes, for progress reports. */
  onSeriesDone?: (memoId: string, seriesId: string) => void;
}

export interface PreparedMemo {
  /** Each series as read, with its settings, in the config's order. */
  loaded: PlannedSeries[];
  records: AnalysisRecord[];
  document: RecordDocument;
  /** Warnings that do not stop the run: series whose data end well before memo.as_of. */
  warnings: InputProblem[];
}

export async function prepareMemo(plan: RunPlan, options: PrepareMemoOptions): Promise<PreparedMemo> {
  const date = options.runDate;
  const loaded = await readAllSeries(plan);
  // Series are independent: on a pool they run side by side, and their order is kept.
  const analyse = options.pool?.analyse ?? ((task: SeriesTask) => analysePlannedSeries({ ...task, threads: options.threads }));
  const records = await Promise.all(
    loaded.map(async (planned) => {
      const record = await analyse(planned);
      options.onSeriesDone?.(plan.memo.id, planned.plan.id);
      return record;
    }),
  );
  const memo: MemoInput['memo'] = {
    id: plan.memo.id,
    title: plan.memo.title,
    client: plan.memo.client ?? '',
    prepared_by: plan.memo.preparedBy ?? '',
    reference: plan.memo.reference ?? '',
    as_of: plan.memo.asOf ?? '',
    author: plan.memo.author ?? '',
    reviewers: plan.memo.reviewers.map((reviewer) => ({ name: reviewer.name, role: reviewer.role ?? '' })),
    sign_off: plan.memo.signOff.map((entry) => ({ ...entry })),
  };
  const history = loaded.map(({ series }) => seriesHistory(series));
  const document: RecordDocument = {
    schema: RECORD_DOCUMENT_SCHEMA,
    memo,
    run_date: date,
    records,
    history: loaded.map(({ plan: seriesPlan }, i) => ({ series_id: seriesPlan.id, values: history[i] })),
  };
  return { loaded, records, document, warnings: loaded.flatMap(({ asOfGap }) => (asOfGap === undefined ? [] : [asOfGap.warning])) };
}
