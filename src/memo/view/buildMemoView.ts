// MemoInput → the view the templates render: every string formatted and made link-free,
// every chart rendered to SVG. The templates only place what is here.
import { noLinks } from '../format/noLinks.js';
import type { MemoInput } from '../memoInput.js';
import { cssMargin, PAPER_SIZES } from '../print/paperSize.js';
import { CAUTIONS, HEADINGS, LABELS, METHOD_NAME, MODEL_NAME, SIGN_OFF_NOTE, summaryIntro, TEMPLATE_TEXT } from '../wording.js';
import { memoStatus, type MemoStatus } from './memoStatus.js';
import { revisionsView, type RevisionsView } from './revisionsView.js';
import { trackRecordView, type TrackRecordView } from './trackRecordView.js';
import { seriesView, type SeriesView } from './seriesView.js';
import { signOffView, type SignOffRow } from './signOffView.js';
import type { SummaryCard } from './summaryView.js';

export interface MemoView {
  page: { size: string; margin: string };
  details: { id: string; title: string; client: string; preparedBy: string; reference: string; asOf: string; author: string; reviewers: { name: string; role: string }[] };
  status: MemoStatus & { draft: boolean };
  summary: { intro: string; cards: SummaryCard[] };
  series: SeriesView[];
  revisions: RevisionsView | null;
  /** How the earlier as-of memos' forecasts fared; `summary` is one sentence for page 1. Absent without earlier memos. */
  trackRecord?: TrackRecordView;
  assumptions: { anchor: string; title: string; rows: { choice: string; value: string; basis: string; setBy: string }[] }[];
  cautions: readonly string[];
  signOff: { note: string; rows: SignOffRow[] };
  reproducibility: {
    tool: string;
    version: string;
    command: string;
    runDate: string;
    config: { file: string; sha256: string };
    data: { file: string; sha256: string }[];
    sources: { title: string; file: string; column: string; sha256: string }[];
  };
  headings: typeof HEADINGS;
  labels: typeof LABELS;
  modelNames: typeof MODEL_NAME;
  methodNames: typeof METHOD_NAME;
  text: typeof TEMPLATE_STRINGS;
}

/** The template text that needs no numbers, with column heads repeated once per model. */
const TEMPLATE_STRINGS = {
  memoKind: TEMPLATE_TEXT.memoKind,
  recommendedMarker: TEMPLATE_TEXT.recommendedMarker,
  assumes: TEMPLATE_TEXT.assumes,
  noAssumptions: TEMPLATE_TEXT.noAssumptions,
  comparisonCaption: TEMPLATE_TEXT.comparisonCaption,
  accuracyNote: TEMPLATE_TEXT.accuracyNote,
  pointColumns: [...TEMPLATE_TEXT.pointColumns, ...TEMPLATE_TEXT.pointColumns, ...TEMPLATE_TEXT.pointColumns],
};

export async function buildMemoView(input: MemoInput): Promise<MemoView> {
  const { memo, reproducibility } = input;
  const series: SeriesView[] = [];
  // One series at a time: vega views are created and finalised in turn, never all at once.
  for (const [i, entry] of input.series.entries()) series.push(await seriesView(entry, i));
  const trackRecord = await trackRecordView(input);
  const status = memoStatus(memo);
  const digest = (d: { file: string; sha256: string }) => ({ file: noLinks(d.file), sha256: noLinks(d.sha256) });
  return {
    page: { size: PAPER_SIZES[input.paper].css, margin: cssMargin() },
    details: {
      id: noLinks(memo.id),
      title: noLinks(memo.title),
      client: noLinks(memo.client),
      preparedBy: noLinks(memo.prepared_by),
      reference: noLinks(memo.reference),
      asOf: noLinks(memo.as_of),
      author: noLinks(memo.author),
      reviewers: memo.reviewers.map((r) => ({ name: noLinks(r.name), role: noLinks(r.role) })),
    },
    status: { ...status, detail: noLinks(status.detail), draft: status.state === 'draft' },
    summary: { intro: summaryIntro(sharedLevels(input), series.some((s) => s.summary.year !== null)), cards: series.map((s) => s.summary) },
    series,
    revisions: await revisionsView(input),
    ...(trackRecord === undefined ? {} : { trackRecord }),
    assumptions: input.series.map((entry, i) => ({
      anchor: series[i].anchor,
      title: series[i].title,
      rows: entry.assumptions.map((a) => ({ choice: noLinks(a.choice), value: noLinks(a.value), basis: noLinks(a.basis), setBy: LABELS.setByValue[a.set_by] })),
    })),
    cautions: CAUTIONS,
    signOff: { note: SIGN_OFF_NOTE, rows: signOffView(memo) },
    reproducibility: {
      tool: noLinks(reproducibility.tool),
      version: noLinks(reproducibility.version),
      command: noLinks(reproducibility.command),
      runDate: noLinks(reproducibility.run_date),
      config: digest(reproducibility.config),
      data: reproducibility.data.map(digest),
      sources: input.series.map(({ record }) => ({
        title: noLinks(record.series.title),
        file: noLinks(record.series.source.file),
        column: noLinks(record.series.source.column),
        sha256: record.series.source.sha256,
      })),
    },
    headings: HEADINGS,
    labels: LABELS,
    modelNames: MODEL_NAME,
    methodNames: METHOD_NAME,
    text: TEMPLATE_STRINGS,
  };
}

/** The interval levels every series of the memo was analysed at; null when they differ. */
function sharedLevels(input: MemoInput): readonly number[] | null {
  const [first, ...rest] = input.series.map(({ record }) => record.settings.levels);
  if (first === undefined) return null;
  return rest.every((levels) => levels.join() === first.join()) ? first : null;
}
