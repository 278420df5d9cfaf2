// What a memo says about the next full calendar year (yearWording.ts), read back against the
// record's `next_year`:
// - the figure's year, kind (total or average), number of periods, point and interval in the
//   summary sentence are the record's, at the printed precision;
// - the horizon-short sentence appears only where the record has no figure, and names the
//   horizon's end;
// - the method note's points, independence shares and simulation error are the record's, and it
//   says the errors add up only where every share is below 100%;
// - a monthly or quarterly series' card says one or the other: the recommended model's figure,
//   or why there is none.
import type { AnalysisRecord, NextYearRecord, YearForecast } from '../../analysis/record.js';
import type { TrendModelKind } from '../../base/settings.js';
import { MISSING } from '../format/formatNumber.js';
import { atLevel } from '../intervalLevels.js';
import { consistencyWording as w } from './consistencyWording.js';

/** Each contradiction between `text` (a series' card and section as plain text) and its record's year figure. */
export function yearClaims(record: AnalysisRecord, text: string): string[] {
  const year = record.next_year ?? null;
  return [...summaryClaims(year, text), ...horizonClaims(year, text), ...noteClaims(year, text), ...simulationClaims(year, text), ...missingClaims(record, year, text)];
}

/** A number as the memo prints it ("47,837", "−1.25") and half a unit of its last printed digit. */
function printed(value: string): { value: number; slack: number } {
  const plain = value.replace(/,/g, '').replace('\u2212', '-');
  const decimals = plain.includes('.') ? plain.length - plain.indexOf('.') - 1 : 0;
  return { value: Number(plain), slack: 0.5 * 10 ** -decimals };
}

/** Whether the printed text is `actual` rounded (with room for the binary representation), or the mark for no number where there is none. */
function shows(text: string, actual: number | null | undefined): boolean {
  // An interval end a Box-Cox inverse ran off its range is infinite in the record, null in its JSON, and printed as the missing mark.
  if (actual === null || actual === undefined || !Number.isFinite(actual)) return text === MISSING;
  const { value, slack } = printed(text);
  return Math.abs(value - actual) <= slack * (1 + 1e-9) + 1e-12 * Math.abs(actual);
}

function figureOf(year: NextYearRecord | null, model: string): YearForecast | null {
  if (year === null || (model !== 'deterministic' && model !== 'stochastic')) return null;
  return year[model as TrendModelKind];
}

function summaryClaims(year: NextYearRecord | null, text: string): string[] {
  return [...text.matchAll(w.yearSentence)].flatMap(([, label, figure, periods, point, model, level, low, high]) => {
    const found = figureOf(year, model);
    if (year === null || found === null || !year.available) return [w.yearWithoutFigure(label)];
    const interval = atLevel(found.intervals, Number(level));
    const right =
      label === year.year && figure === year.figure && Number(periods) === year.periods && shows(point, found.point) && shows(low, interval?.[0]) && shows(high, interval?.[1]);
    return right ? [] : [w.yearFigure(label, model, `${point} (${low} to ${high})`)];
  });
}

function horizonClaims(year: NextYearRecord | null, text: string): string[] {
  return [...text.matchAll(w.yearHorizonShort)].flatMap(([, end, label]) =>
    year !== null && !year.available && year.horizon_end === end && year.year === label ? [] : [w.yearNotShort(label, end)],
  );
}

function noteClaims(year: NextYearRecord | null, text: string): string[] {
  return [...text.matchAll(w.yearNote)].flatMap(([, label, figure, pointDeterministic, pointStochastic, shareDeterministic, shareStochastic, adds]) => {
    const { deterministic, stochastic } = year ?? { deterministic: null, stochastic: null };
    if (year === null || deterministic === null || stochastic === null) return [w.yearWithoutFigure(label)];
    const share = (f: YearForecast) => (100 * f.sd_if_independent) / f.sd;
    const right =
      label === year.year &&
      figure === year.figure &&
      shows(pointDeterministic, deterministic.point) &&
      shows(pointStochastic, stochastic.point) &&
      shows(shareDeterministic, share(deterministic)) &&
      shows(shareStochastic, share(stochastic)) &&
      (adds === undefined || (share(deterministic) < 100 && share(stochastic) < 100));
    return right ? [] : [w.yearNoteWrong(label)];
  });
}

/** The simulation's error, the larger of the two models', as a percentage. */
function simulationClaims(year: NextYearRecord | null, text: string): string[] {
  return [...text.matchAll(w.yearSimulationError)].flatMap(([, said]) => {
    const errors = [year?.deterministic?.simulation_error, year?.stochastic?.simulation_error];
    const largest = errors.every((error) => typeof error === 'number') ? 100 * Math.max(...(errors as number[])) : null;
    return shows(said, largest) ? [] : [w.yearSimulationWrong(said)];
  });
}

/** A card must give the recommended model's figure, or say why the horizon gives none. */
function missingClaims(record: AnalysisRecord, year: NextYearRecord | null, text: string): string[] {
  if (year === null || record.recommendation === undefined) return [];
  // The year is the first group of the figure's sentence and the second of the horizon's.
  const named = year.available ? [...text.matchAll(w.yearSentence)].map((match) => match[1]) : [...text.matchAll(w.yearHorizonShort)].map((match) => match[2]);
  return named.includes(year.year) ? [] : [w.yearUnsaid(year.year, year.available)];
}
