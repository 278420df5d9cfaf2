// The evidence section: the unit-root checks as a table with plain outcomes, the combined
// reading as the evidence stage wrote it, and each model's residual findings.
import type { AdfResult, KpssResult } from '../../analysis/record.js';
import { evidenceWording, UNIT_ROOT_ROWS } from '../evidenceWording.js';
import { formatPCell, formatPercent, formatSignificant } from '../format/formatNumber.js';
import { noLinks } from '../format/noLinks.js';
import type { AnalysisRecord } from '../../analysis/record.js';
import type { TrendModelKind } from '../../base/settings.js';
import { MODEL_NAME } from '../wording.js';

export interface UnitRootRow {
  name: string;
  statistic: string;
  lags: string;
  p: string;
  critical5: string;
  outcome: string;
  rejects: boolean;
}

export interface EvidenceView {
  intro: string;
  reading: string;
  verdict: string;
  tests: UnitRootRow[];
  residualsIntro: string;
  /** One sentence for the series' main page: which checks flagged which model's errors. */
  residualSummary: string;
  residuals: { model: string; findings: { text: string; flagged: boolean }[] }[];
  unavailable: string[];
  /** The seasonal checks in words, for a monthly or quarterly series; null when there is nothing to say. */
  seasonal: { heading: string; sentences: string[]; pattern: SeasonalPatternTable | null } | null;
}

/** The seasonal effects by month or quarter: the STL average, the first and last complete years, and the fixed line's pattern. */
export interface SeasonalPatternTable {
  caption: string;
  columns: string[];
  rows: { season: string; cells: string[] }[];
}

type RowWords = (typeof UNIT_ROOT_ROWS)[keyof typeof UNIT_ROOT_ROWS];

function kpssRejects(result: KpssResult, level: number): boolean {
  if (result.p_bound === 'below') return true;
  if (result.p_bound === 'above') return false;
  return result.p_value < level;
}

function row(words: RowWords, result: KpssResult | AdfResult | null, rejects: boolean): UnitRootRow | [] {
  if (result === null) return [];
  return {
    name: words.name,
    statistic: formatSignificant(result.stat, 3),
    lags: String(result.lags),
    p: formatPCell(result.p_value, 'p_bound' in result ? result.p_bound : undefined),
    critical5: formatSignificant(result.critical['5'], 3),
    outcome: rejects ? words.rejects : words.holds,
    rejects,
  };
}

export function evidenceView(record: AnalysisRecord): EvidenceView {
  const { kpss, adf, reading, residuals, unavailable } = record.evidence;
  const level = reading.level;
  const models: readonly TrendModelKind[] = ['deterministic', 'stochastic'];
  return {
    intro: evidenceWording.unitRootIntro(formatPercent(level)),
    reading: noLinks(reading.text),
    verdict: reading.verdict,
    tests: [
      row(UNIT_ROOT_ROWS.kpssLevel, kpss.level, kpss.level !== null && kpssRejects(kpss.level, level)),
      row(UNIT_ROOT_ROWS.kpssTrend, kpss.trend, kpss.trend !== null && kpssRejects(kpss.trend, level)),
      row(UNIT_ROOT_ROWS.adfConstant, adf.constant, adf.constant !== null && adf.constant.p_value < level),
      row(UNIT_ROOT_ROWS.adfTrend, adf.trend, adf.trend !== null && adf.trend.p_value < level),
    ].flat(),
    residualsIntro: evidenceWording.residualsIntro,
    residualSummary: evidenceWording.residualSummary(
      models.map((model) => ({ model, flagged: residuals[model].findings.filter((f) => f.flagged).map((f) => f.check) })),
    ),
    residuals: models.map((model) => ({
      model: MODEL_NAME[model],
      findings: residuals[model].findings.map((f) => ({ text: noLinks(f.text), flagged: f.flagged })),
    })),
    unavailable: unavailable.map((u) => noLinks(evidenceWording.unavailable(u.test, u.reason))),
    seasonal: seasonalSentences(record),
  };
}

/** The seasonal test's and the STL strength's readings, or why the models have no seasonal part. */
function seasonalSentences(record: AnalysisRecord): EvidenceView['seasonal'] {
  const sentences = seasonalReadings(record);
  if (sentences.length === 0) return null;
  return { heading: evidenceWording.seasonalHeading, sentences: sentences.map(noLinks), pattern: patternTable(record) };
}

/** The seasonal readings in words, for the memo and the terminal alike; none for an annual series. */
export function seasonalReadings(record: AnalysisRecord): string[] {
  const { seasonal } = record;
  // Records written before the seasonal part have no `seasonal` key.
  if (seasonal === undefined || seasonal.period === 1) return [];
  const found = record.evidence.seasonal;
  return [
    ...(seasonal.reason === null ? [] : [seasonal.reason]),
    ...(seasonal.setting === 'none' ? [evidenceWording.seasonalNone] : []),
    ...(found?.unit_root?.text === undefined ? [] : [found.unit_root.text]),
    ...(seasonal.differences_decided_by === 'config' ? [evidenceWording.seasonalDifferencesByConfig(seasonal.seasonal_differences === true)] : []),
    ...(found?.strength?.text === undefined ? [] : [found.strength.text]),
    ...(found?.unavailable ?? []).map((u) => evidenceWording.unavailable(u.test, u.reason)),
  ];
}

function patternTable(record: AnalysisRecord): SeasonalPatternTable | null {
  const found = record.evidence.seasonal?.pattern;
  if (found === undefined || found === null) return null;
  const fixed = record.models.deterministic.seasonal?.pattern ?? null;
  const columns = [
    evidenceWording.patternColumns.average,
    ...(found.first_year_effect === null || found.first_year === null ? [] : [String(found.first_year)]),
    ...(found.last_year_effect === null || found.last_year === null ? [] : [String(found.last_year)]),
    ...(fixed === null ? [] : [evidenceWording.patternColumns.fixedLine]),
  ];
  const rows = found.season.map((season, i) => ({
    season: evidenceWording.seasonName(found.period, season),
    cells: [
      formatSignificant(found.mean_effect[i], 3),
      ...(found.first_year_effect === null || found.first_year === null ? [] : [formatSignificant(found.first_year_effect[i], 3)]),
      ...(found.last_year_effect === null || found.last_year === null ? [] : [formatSignificant(found.last_year_effect[i], 3)]),
      // The model's pattern is indexed from January or Q1.
      ...(fixed === null ? [] : [formatSignificant(fixed[season - 1], 3)]),
    ],
  }));
  return { caption: evidenceWording.patternCaption(record.series.transform.kind !== 'none', found.period), columns, rows };
}
