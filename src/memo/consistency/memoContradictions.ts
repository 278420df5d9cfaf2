// A last reading of every memo before it is written: the statements it prints are checked
// against the numbers of the records they speak for, by reading the rendered text, apart from
// the code that wrote it. A memo that contradicts itself is a defect of ours, never the
// user's: renderMemoHtml refuses to return it.
//
// Checked per series (its summary card and its section):
// - a test called significant or not significant at a level agrees with its p-value;
// - "N% narrower" agrees with the widths of the two intervals at that period and level;
// - the stochastic trend's "uncertainty grows with the horizon" holds: its widest interval at
//   the last horizon is more than MATERIAL wider than at the first;
// - when the two models' intervals at the end of the horizon are within MATERIAL of each
//   other, the memo says so;
// - what it says of the next full calendar year is the record's (yearClaims.ts).
import type { AnalysisRecord, ForecastRow } from '../../analysis/record.js';
import { atLevel, widestLevel } from '../intervalLevels.js';
import { consistencyWording as w } from './consistencyWording.js';
import { yearClaims } from './yearClaims.js';

/** Relative differences within this are "about the same"; beyond it a memo may call two widths different. */
export const MATERIAL = 0.02;

/** The two models' widest intervals at the end of the horizon, deterministic ÷ stochastic width. */
export function endWidthRatio(record: Pick<AnalysisRecord, 'forecasts' | 'settings'>): number | undefined {
  const level = widestLevel(record.settings);
  const width = (rows: ForecastRow[]): number | undefined => {
    const interval = atLevel(rows.at(-1)?.intervals, level);
    return interval === undefined ? undefined : interval[1] - interval[0];
  };
  const deterministic = width(record.forecasts.deterministic);
  const stochastic = width(record.forecasts.stochastic);
  return deterministic === undefined || stochastic === undefined ? undefined : deterministic / stochastic;
}

/** Whether the two models give about the same interval at the end of the horizon. */
export function modelsAgree(record: Pick<AnalysisRecord, 'forecasts' | 'settings'>): boolean {
  const ratio = endWidthRatio(record);
  return ratio !== undefined && Math.abs(ratio - 1) <= MATERIAL;
}

/** Each contradiction in words; empty when the memo agrees with its records. */
export function memoContradictions(records: readonly AnalysisRecord[], html: string): string[] {
  const cards = chunks(html, '<tbody class="summary-card', '</tbody>');
  const sections = chunks(html, '<section class="series" id="', '</section>');
  // Each series' part of the technical appendix (the year figure's method note, the models).
  const details = chunks(html, '<section class="series-detail" id="', '</section>');
  return records.flatMap((record, i) => {
    const text = plainText(`${cards[i] ?? ''} ${sections[i] ?? ''} ${details[i] ?? ''}`);
    return [...significanceClaims(text), ...narrowerClaims(record, text), ...growthClaims(record, text), ...agreementClaims(record, text), ...yearClaims(record, text)].map((problem) =>
      w.problem(record.series.id, problem),
    );
  });
}

/** Every stretch of `html` from `start` to the next `end`, in order. */
function chunks(html: string, start: string, end: string): string[] {
  return html
    .split(start)
    .slice(1)
    .map((part) => part.slice(0, part.indexOf(end) < 0 ? part.length : part.indexOf(end)));
}

const ENTITIES: Readonly<Record<string, string>> = { '&amp;': '&', '&lt;': '<', '&gt;': '>', '&quot;': '"', '&#x27;': "'", '&#x60;': '`', '&#x3D;': '=' };

/** The memo's words without markup, entities decoded and white space collapsed. */
export function plainText(html: string): string {
  return html
    .replace(/<svg[\s\S]*?<\/svg>/g, ' ')
    .replace(/<[^>]+>/g, ' ')
    .replace(/&#?\w+;/g, (entity) => ENTITIES[entity] ?? entity)
    .replace(/\s+/g, ' ');
}

/** "p = 0.029 …: significant at 5%", "p below 0.001 …: not significant at 10%". */
function significanceClaims(text: string): string[] {
  const pattern = /\b(p = |p below |p above )([0-9.]+)[^.:;]*: (significant|not significant) at ([0-9.]+)%/g;
  return [...text.matchAll(pattern)].flatMap(([, kind, value, claim, level]) => {
    const p = Number(value);
    const alpha = Number(level) / 100;
    // "p below x" is significant when x ≤ α and undecided above; "p above x" is not when x ≥ α.
    const significant = kind === 'p = ' ? p < alpha : kind === 'p below ' ? (p <= alpha ? true : undefined) : p >= alpha ? false : undefined;
    return significant !== undefined && (claim === 'significant') !== significant ? [w.significance(`${kind}${value}`, claim, level)] : [];
  });
}

/** "At 2039 the deterministic-trend model's 95% interval is 59% narrower than …". */
function narrowerClaims(record: AnalysisRecord, text: string): string[] {
  const pattern = /At (\S+) the deterministic-trend model's ([0-9.]+)% interval is ([0-9]+)% narrower/g;
  return [...text.matchAll(pattern)].flatMap(([, period, level, narrower]) => {
    const widthAt = (rows: ForecastRow[]): number | undefined => {
      const interval = atLevel(rows.find((row) => row.period === period)?.intervals, Number(level));
      return interval === undefined ? undefined : interval[1] - interval[0];
    };
    const deterministic = widthAt(record.forecasts.deterministic);
    const stochastic = widthAt(record.forecasts.stochastic);
    if (deterministic === undefined || stochastic === undefined) return [w.unknownPeriod(period, level)];
    const actual = 100 * (1 - deterministic / stochastic);
    return actual <= 100 * MATERIAL || Math.abs(actual - Number(narrower)) > 1 ? [w.narrower(period, narrower, actual)] : [];
  });
}

/** The stochastic trend's gloss says its uncertainty grows with the horizon. */
function growthClaims(record: AnalysisRecord, text: string): string[] {
  if (!text.includes(w.growthClaim)) return [];
  const level = widestLevel(record.settings);
  const rows = record.forecasts.stochastic;
  const first = atLevel(rows[0]?.intervals, level);
  const last = atLevel(rows.at(-1)?.intervals, level);
  if (first === undefined || last === undefined || rows.length < 2) return [];
  const growth = (last[1] - last[0]) / (first[1] - first[0]);
  return growth > 1 + MATERIAL ? [] : [w.noGrowth(growth)];
}

/** Models that give about the same interval must be said to. */
function agreementClaims(record: AnalysisRecord, text: string): string[] {
  if (!modelsAgree(record)) return [];
  return text.includes(w.agreementMark) ? [] : [w.agreementUnsaid(endWidthRatio(record) ?? Number.NaN)];
}
