// MemoInput → the view the templates render: every string formatted and made link-free,
// every chart rendered to SVG. The templates only place what is here.
import { noLinks } from '../format/noLinks.js';
import type { MemoInput } from '../memoInput.js';
import { cssMargin, PAPER_SIZES } from '../print/paperSize.js';
import { CAUTIONS, HEADINGS, PAGE_ONE, LABELS, METHOD_NAME, MODEL_NAME, SIGN_OFF_NOTE, TEMPLATE_TEXT } from '../wording.js';
import { commentResolutions, memoStatus, type MemoStatus } from './memoStatus.js';
import { revisionsView, type RevisionsView } from './revisionsView.js';
import { trackRecordView, type TrackRecordView } from './trackRecordView.js';
import { seriesView, type SeriesView } from './seriesView.js';
import { registerView, type RegisterView } from './registerView.js';
import { changesLine, intervalHead, pageOneSeries, type PageOneSeries } from './pageOneView.js';
import { seriesDecimals } from '../format/seriesDecimals.js';
import { signOffView, type SignOffView } from './signOffView.js';
import { supersedesView, type SupersedesView } from './supersedesView.js';
import { REVIEW_TEXT } from '../signOffWording.js';

export interface MemoView {
  page: { size: string; margin: string };
  details: { id: string; title: string; client: string; preparedBy: string; reference: string; asOf: string; author: string; reviewers: { name: string; role: string }[] };
  status: MemoStatus & { draft: boolean };
  pageOne: {
    heading: string;
    heads: { next: string; year: string; end: string; interval: string };
    series: PageOneSeries[];
    changes: string;
    legend: string;
    issued: { label: string; date: string };
  };
  series: SeriesView[];
  /** How the rule and the checks work, said once for the whole memo (each series' detail refers to it). */
  methods: string[];
  revisions: RevisionsView | null;
  /** How the earlier as-of memos' forecasts fared; `summary` is one sentence for page 1. Absent without earlier memos. */
  trackRecord?: TrackRecordView;
  assumptions: RegisterView;
  cautions: readonly string[];
  signOff: SignOffView & { note: string };
  /** SHA-256 of the memo's content, which recorded sign-offs are bound to; '' when the memo was rendered without one. */
  digest: string;
  /** Comments of valid approvals with changes that no later sign-off has resolved yet. */
  openComments: Array<{ number: number; reviewer: string; date: string; comment: string }>;
  /** For a revised memo: the revision it supersedes, why, and one sentence for page 1. */
  supersedes?: SupersedesView;
  reproducibility: {
    tool: string;
    version: string;
    command: string;
    runDate: string;
    config: { file: string; sha256: string };
    /** Each data file once, with the series (and column) it feeds. */
    data: { file: string; sha256: string; feeds: string }[];
  };
  headings: typeof HEADINGS;
  review: typeof REVIEW_TEXT;
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
  ruleStudyPointer: TEMPLATE_TEXT.ruleStudyPointer,
};

export async function buildMemoView(input: MemoInput): Promise<MemoView> {
  const { memo, reproducibility } = input;
  const series: SeriesView[] = [];
  // One series at a time: vega views are created and finalised in turn, never all at once.
  for (const [i, entry] of input.series.entries()) series.push(await seriesView(entry, i));
  const trackRecord = await trackRecordView(input);
  const signOffs = input.sign_offs ?? [];
  const interval = intervalHead(input.series.map((entry) => entry.record));
  const status = memoStatus(memo.reviewers, signOffs);
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
    status: { ...status, detail: noLinks(status.detail), draft: status.state !== 'signed-off' },
    pageOne: {
      heading: PAGE_ONE.heading,
      heads: { next: PAGE_ONE.nextHead, year: PAGE_ONE.yearHead, end: PAGE_ONE.endHead, interval },
      series: input.series.map((entry, i) => pageOneSeries(entry, series[i], seriesDecimals(entry.record))),
      changes: noLinks(changesLine(input.revisions)),
      legend: PAGE_ONE.legend(interval.replace(' interval', '').toLowerCase()),
      issued: { label: PAGE_ONE.issued, date: noLinks(reproducibility.run_date) },
    },
    series,
    methods: [
      ...new Set(
        series.flatMap((s) => [
          ...(s.recommendation === null || s.recommendation.fixedByConfig !== '' ? [] : [s.recommendation.rule]),
          ...(s.recommendation?.ruleStudy ? [s.recommendation.ruleStudy] : []),
          s.aiccNote,
          s.evidence.intro,
          s.evidence.residualsIntro,
          ...(s.backtest === null ? [] : [TEMPLATE_TEXT.backtestGlossary, s.backtest.comparisonIntro]),
          ...(s.stability?.method ?? []),
        ]),
      ),
    ],
    revisions: await revisionsView(input),
    ...(trackRecord === undefined ? {} : { trackRecord }),
    assumptions: registerView(input, series),
    cautions: CAUTIONS,
    signOff: { note: SIGN_OFF_NOTE, ...signOffView(memo, signOffs) },
    digest: noLinks(input.digest ?? ''),
    openComments: commentResolutions(signOffs).open.map((entry) => ({ number: entry.number, reviewer: noLinks(entry.reviewer), date: noLinks(entry.date), comment: noLinks(entry.comment) })),
    ...(input.supersedes === undefined ? {} : { supersedes: supersedesView(input.supersedes) }),
    reproducibility: {
      tool: noLinks(reproducibility.tool),
      version: noLinks(reproducibility.version),
      command: noLinks(reproducibility.command),
      runDate: noLinks(reproducibility.run_date),
      config: digest(reproducibility.config),
      data: dataFiles(input),
    },
    headings: HEADINGS,
    review: REVIEW_TEXT,
    labels: LABELS,
    modelNames: MODEL_NAME,
    methodNames: METHOD_NAME,
    text: TEMPLATE_STRINGS,
  };
}


/**
 * Each data file once: its path as the config wrote it, its digest and what it feeds ("column
 * 'value': Metered household connections"). A file read for two series is listed once.
 */
function dataFiles(input: MemoInput): MemoView['reproducibility']['data'] {
  const files = new Map<string, { file: string; sha256: string; feeds: string[] }>();
  input.reproducibility.data.forEach((entry, i) => {
    const record = input.series[i]?.record;
    const key = `${entry.file}\u0000${entry.sha256}`;
    const found = files.get(key) ?? { file: noLinks(entry.file), sha256: noLinks(entry.sha256), feeds: [] };
    if (record !== undefined) found.feeds.push(LABELS.feeds(noLinks(record.series.source.column), noLinks(record.series.title)));
    files.set(key, found);
  });
  return [...files.values()].map((f) => ({ file: f.file, sha256: f.sha256, feeds: f.feeds.join('; ') }));
}
