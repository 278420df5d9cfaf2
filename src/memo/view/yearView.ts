// The next full calendar year's figure (the record's `next_year`) as the memo shows it: two rows
// under the summary card's end-of-horizon rows, one per model, a sentence on the recommended
// model's figure (or why there is none), and the method note under the forecast table.
import type { AnalysisRecord, NextYearRecord, YearForecast } from '../../analysis/record.js';
import { TREND_MODELS, type TrendModelKind } from '../../base/settings.js';
import { formatNumber } from '../format/formatNumber.js';
import { atLevel, widestLevel } from '../intervalLevels.js';
import { METHOD_NAME, scaleName } from '../wording.js';
import { yearParts, yearWording } from '../yearWording.js';
import { intervalText, type ForecastCells } from './forecastTableView.js';

export interface SummaryYear {
  /** The first cell of the year's rows ("2025 total"); empty when there is no figure. */
  head: string;
  /** One row per model, the recommended one marked; empty when there is no figure. */
  models: (ForecastCells & { name: string; recommended: boolean })[];
  /** The recommended model's figure in words, or why there is none; empty without a recommendation. */
  sentence: string;
}

/** The summary's part for the year; null for a series without one (annual data). */
export function summaryYear(record: AnalysisRecord, decimals: number): SummaryYear | null {
  const year = record.next_year;
  if (year === null || year === undefined) return null;
  if (!year.available) return { head: '', models: [], sentence: yearWording.horizonShort({ year: year.year, horizonEnd: year.horizon_end, lastPeriod: year.last_period }) };
  const recommended = record.recommendation?.model;
  const models = TREND_MODELS.flatMap((kind) => {
    const figure = year[kind];
    if (figure === null) return [];
    return [
      {
        name: METHOD_NAME[kind],
        recommended: kind === recommended,
        point: formatNumber(figure.point, decimals),
        intervals: record.settings.levels.map((level) => intervalText(atLevel(figure.intervals, level), decimals)),
      },
    ];
  });
  return { head: yearWording.head(year.year, year.figure), models, sentence: recommended === undefined ? '' : sentence(record, year, recommended, decimals) };
}

function sentence(record: AnalysisRecord, year: NextYearRecord, model: TrendModelKind, decimals: number): string {
  const figure = year[model];
  if (figure === null) return '';
  const level = widestLevel(record.settings);
  const interval = atLevel(figure.intervals, level);
  return yearWording.summary({
    year: year.year,
    figure: year.figure,
    parts: yearParts(year.periods),
    model,
    point: formatNumber(figure.point, decimals),
    level,
    low: formatNumber(interval?.[0], decimals),
    high: formatNumber(interval?.[1], decimals),
    convention: year.method === 'simulation' ? record.settings.point : null,
  });
}

/** The method note under the forecast table; empty when the series has no figure for the year. */
export function yearNote(record: AnalysisRecord, decimals: number): string {
  const year = record.next_year;
  if (year === null || year === undefined || !year.available) return '';
  const { deterministic, stochastic } = year;
  if (deterministic === null || stochastic === null) return '';
  const both = (read: (figure: YearForecast) => string): Record<TrendModelKind, string> => ({ deterministic: read(deterministic), stochastic: read(stochastic) });
  return yearWording.method({
    year: year.year,
    figure: year.figure,
    parts: yearParts(year.periods),
    points: both((figure) => formatNumber(figure.point, decimals)),
    independentShare: both((figure) => formatNumber(independentShare(figure), 0)),
    dependence: dependence([independentShare(deterministic), independentShare(stochastic)]),
    simulation:
      year.method === 'simulation'
        ? {
            scale: scaleName(record.series.transform),
            draws: formatNumber(year.draws, 0),
            point: record.settings.point,
            fromPoints: both((figure) => formatNumber(figure.from_points, decimals)),
            error: formatNumber(100 * Math.max(deterministic.simulation_error ?? Number.NaN, stochastic.simulation_error ?? Number.NaN), 1),
          }
        : null,
  });
}

/** The standard deviation were the periods independent, as a percentage of the joint one. */
function independentShare(figure: Pick<YearForecast, 'sd' | 'sd_if_independent'>): number {
  return (100 * figure.sd_if_independent) / figure.sd;
}

/** All shares below 100% as printed (the errors add up), all above (they offset), or neither. */
function dependence(shares: number[]): 'adds' | 'offsets' | 'neither' {
  const printed = shares.map(Math.round);
  if (printed.every((share) => share < 100)) return 'adds';
  return printed.every((share) => share > 100) ? 'offsets' : 'neither';
}
