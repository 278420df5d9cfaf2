// forecasts.csv: one row per series, model and step, every interval level, on the data's
// scale, with the series' units, whether the model is the one the memo recommends, and the
// date the period starts, plus the model-scale moments. Numbers are rounded to
// FORECAST_DIGITS significant digits (record.json keeps them in full). RFC 4180 quoting for
// text cells.
import type { AnalysisRecord } from '../analysis/record.js';
import { levelKey, TREND_MODELS } from '../base/settings.js';
import { periodStart } from '../base/period.js';

/** Significant digits of every number in forecasts.csv and forecasts.xlsx: more than any forecast can claim, few enough to read. */
export const FORECAST_DIGITS = 6;

/** The series' units by id, as the config gives them. */
export type UnitsById = ReadonlyMap<string, string | undefined>;

/** 'yes' for the recommended model, 'no' for the other, '' when the memo recommends none. */
export function recommendedFlag(record: AnalysisRecord, model: string): 'yes' | 'no' | '' {
  const chosen = record.recommendation?.model;
  return chosen === undefined ? '' : chosen === model ? 'yes' : 'no';
}

/** A number to FORECAST_DIGITS significant digits, as its shortest decimal text. */
export function roundedForecast(value: number): number {
  return Number(value.toPrecision(FORECAST_DIGITS));
}

export function forecastsCsv(records: readonly AnalysisRecord[], units: UnitsById): string {
  const levels = [...new Set(records.flatMap((record) => record.settings.levels))].sort((a, b) => a - b);
  const header = [
    'series_id',
    'units',
    'model',
    'recommended',
    'h',
    'period',
    'period_start',
    'point',
    ...levels.flatMap((level) => [`lower_${levelKey(level)}`, `upper_${levelKey(level)}`]),
    'model_scale_mean',
    'se_process',
    'se_total',
  ];
  const lines = [header.join(',')];
  for (const record of records) {
    for (const model of TREND_MODELS) {
      for (const row of record.forecasts[model]) {
        const bounds = levels.flatMap((level) => row.intervals[levelKey(level)] ?? [Number.NaN, Number.NaN]);
        const cells = [
          quote(record.series.id),
          quote(units.get(record.series.id) ?? ''),
          model,
          recommendedFlag(record, model),
          String(row.h),
          quote(row.period),
          periodStart(row.period),
          number(row.point),
          ...bounds.map(number),
          number(row.model_scale.mean),
          number(row.model_scale.se_process),
          number(row.model_scale.se_total),
        ];
        lines.push(cells.join(','));
      }
    }
  }
  return `${lines.join('\r\n')}\r\n`;
}

function number(value: number): string {
  return Number.isFinite(value) ? String(roundedForecast(value)) : '';
}

function quote(text: string): string {
  return /[",\r\n]/.test(text) ? `"${text.replaceAll('"', '""')}"` : text;
}
