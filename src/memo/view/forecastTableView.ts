// The forecast table: both models side by side at every horizon, with the width ratio.
import { formatNumber } from '../format/formatNumber.js';
import type { AnalysisRecord } from '../../analysis/record.js';
import type { TrendModelKind } from '../../base/settings.js';
import { widthRatios } from '../charts/widthRatioChart.js';

export interface ForecastCells {
  point: string;
  interval80: string;
  interval95: string;
}

export interface ForecastTableRow {
  h: number;
  period: string;
  deterministic: ForecastCells;
  stochastic: ForecastCells;
  ratio: string;
}

/** "575.36 – 580.31". */
export function intervalText(interval: [number, number] | undefined, decimals: number): string {
  if (interval === undefined) return formatNumber(null, decimals);
  return `${formatNumber(interval[0], decimals)}\u2009\u2013\u2009${formatNumber(interval[1], decimals)}`;
}

export function forecastCells(record: AnalysisRecord, model: TrendModelKind, index: number, decimals: number): ForecastCells {
  const row = record.forecasts[model][index];
  return {
    point: formatNumber(row?.point, decimals),
    interval80: intervalText(row?.intervals['80'], decimals),
    interval95: intervalText(row?.intervals['95'], decimals),
  };
}

export function forecastTableView(record: AnalysisRecord, decimals: number): ForecastTableRow[] {
  const ratios = widthRatios(record);
  return record.forecasts.deterministic.map((row, i) => ({
    h: row.h,
    period: row.period,
    deterministic: forecastCells(record, 'deterministic', i, decimals),
    stochastic: forecastCells(record, 'stochastic', i, decimals),
    ratio: formatNumber(ratios[i]?.ratio, 2),
  }));
}
