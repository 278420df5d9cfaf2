// Everything the memo shows for one series, formatted and with its charts rendered.
import type { Caveat } from '../caveats/caveat.js';
import { collectCaveats } from '../caveats/caveatRules.js';
import { forecastChart } from '../charts/forecastChart.js';
import { stabilityChart } from '../charts/stabilityChart.js';
import { evidenceWording } from '../evidenceWording.js';
import { noLinks } from '../format/noLinks.js';
import { seriesDecimals } from '../format/seriesDecimals.js';
import { scoredLevel } from '../intervalLevels.js';
import type { MemoSeries } from '../memoInput.js';
import { AICC_NOTE, FREQUENCY_NAME, LABELS, MODEL_GLOSS, NOT_RUN, scaleName, TEMPLATE_TEXT } from '../wording.js';
import { backtestView, type BacktestView } from './backtestView.js';
import { evidenceView, type EvidenceView } from './evidenceView.js';
import { figureView, type FigureView } from './figureView.js';
import { forecastTableView, type ForecastTable } from './forecastTableView.js';
import { modelView, scaleNote, type ModelView } from './modelsView.js';
import { stabilityView, type StabilityView } from './stabilityView.js';
import { agreement } from './agreement.js';
import { summaryYear, yearNote, type SummaryYear } from './yearView.js';
import { widthNote } from './widthRatios.js';

export interface SeriesView {
  anchor: string;
  title: string;
  units: string;
  notes: string;
  span: string;
  scale: string;
  recommendation: {
    model: string;
    gloss: string;
    decidedBy: string;
    rule: string;
    /** How the rule behaved in the simulation study; empty when the config fixed the model. */
    ruleStudy: string;
    fixedByConfig: string;
    justification: string;
    evidenceHeading: string;
    evidence: { finding: string; favours: string }[];
    /** What the rule concluded from the evidence (the reasons that are not findings). */
    conclusions: string[];
  } | null;
  notRun: typeof NOT_RUN;
  backtestUnavailable: string;
  captions: { point: string };
  figures: {
    forecast: FigureView;
    stability: FigureView | null;
  };
  forecastTable: ForecastTable;
  /** How the two models' interval widths compare, in one sentence (the width ratio column's reading). */
  widthNote: string;
  /** How the next full year's figure on page 1 was had; empty without one. */
  yearNote: string;
  backtest: BacktestView | null;
  evidence: EvidenceView;
  models: ModelView[];
  /** Notes that read the same for both models, said once under them. */
  sharedModelNotes: string[];
  modelScale: string;
  aiccNote: string;
  stability: StabilityView | null;
  caveats: { id: string; severity: Caveat['severity']; label: string; text: string }[];
  /** The next full calendar year under both models and in words (page 1); null for annual series. */
  year: SummaryYear | null;
}

export async function seriesView(entry: MemoSeries, index: number): Promise<SeriesView> {
  const { record } = entry;
  const anchor = `series-${index + 1}`;
  const title = noLinks(record.series.title);
  const units = entry.units === undefined ? undefined : noLinks(entry.units);
  const decimals = seriesDecimals(record);
  const chartInput = { series: title, units, decimals, record };
  const caveats = collectCaveats({ record, units, dataEnd: entry.data_end });
  const backtest = record.backtest ?? undefined;
  const { recommendation } = record;
  const stability = record.evidence.stability ?? undefined;
  const history = entry.history;
  return {
    anchor,
    title,
    units: units ?? '',
    notes: noLinks(entry.notes ?? ''),
    span: `${FREQUENCY_NAME[record.series.frequency]}, ${record.series.first} to ${record.series.last}, ${record.series.n} observations`,
    scale: scaleName(record.series.transform),
    recommendation:
      recommendation === undefined
        ? null
        : {
            model: evidenceWording.recommendation(recommendation.model),
            gloss: MODEL_GLOSS[recommendation.model],
            decidedBy: evidenceWording.decidedBy[recommendation.decided_by],
            rule: noLinks(recommendation.rule_text),
            ruleStudy: evidenceWording.ruleStudy(recommendation.rule),
            fixedByConfig: recommendation.fixed_by_config ? evidenceWording.fixedByConfig : '',
            justification: noLinks(recommendation.justification ?? ''),
            evidenceHeading: evidenceWording.evidenceHeading,
            evidence: recommendation.evidence.map((item) => ({ finding: noLinks(item.finding), favours: evidenceWording.favours(item.favours) })),
            conclusions: [
              ...recommendation.reasons.filter((reason) => !recommendation.evidence.some((item) => item.finding === reason)).map(noLinks),
              ...agreement(record),
            ],
          },
    notRun: NOT_RUN,
    backtestUnavailable: record.backtest_unavailable === undefined ? '' : noLinks(evidenceWording.backtestUnavailable(record.backtest_unavailable)),
    captions: {
      point: TEMPLATE_TEXT.backtestCaption(units ?? ''),
    },
    figures: {
      forecast: await figureView(`${anchor}-forecast`, forecastChart({ ...chartInput, history })),
      // One window is the full history alone: a chart of one point per panel says nothing the text does not.
      stability: stability === undefined || stability.windows.deterministic.length <= 1 ? null : await figureView(`${anchor}-stability`, stabilityChart({ ...chartInput, stability })),
    },
    forecastTable: forecastTableView(record, decimals, units ?? ''),
    widthNote: widthNote(record),
    yearNote: yearNote(record, decimals),
    backtest: backtest === undefined ? null : backtestView(backtest, record.series.frequency, decimals, scoredLevel(record)),
    evidence: evidenceView(record),
    ...withSharedNotes([modelView(record, 'deterministic'), modelView(record, 'stochastic')]),
    modelScale: scaleNote(record),
    aiccNote: AICC_NOTE,
    stability: stability === undefined ? null : stabilityView(stability, record.series.first, { deterministic: record.models.deterministic.seasonal, stochastic: record.models.stochastic.seasonal }),
    caveats: caveats.map((c) => ({ id: c.id, severity: c.severity, label: LABELS.severity[c.severity], text: noLinks(c.text) })),
    year: summaryYear(record, decimals),
  };
}

/** The two models with the notes both carry taken out and said once. */
function withSharedNotes(models: ModelView[]): { models: ModelView[]; sharedModelNotes: string[] } {
  const shared = models[0].notes.filter((note) => models.every((model) => model.notes.includes(note)));
  return { models: models.map((model) => ({ ...model, notes: model.notes.filter((note) => !shared.includes(note)) })), sharedModelNotes: shared };
}
