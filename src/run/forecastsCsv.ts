// forecasts.csv: one row per series, model and horizon, every interval level, on the data's
// scale, plus the model-scale moments. RFC 4180 quoting for text cells.
import type { AnalysisRecord } from '../analysis/record.js';
import { levelKey } from '../base/settings.js';

export function forecastsCsv(records: readonly AnalysisRecord[]): string {
  const levels = [...new Set(records.flatMap((record) => record.settings.levels))].sort((a, b) => a - b);
  const header = ['series_id', 'model', 'h', 'period', 'point', ...levels.flatMap((level) => [`lower_${levelKey(level)}`, `upper_${levelKey(level)}`]), 'model_scale_mean', 'se_process', 'se_total'];
  const lines = [header.join(',')];
  for (const record of records) {
    for (const model of ['deterministic', 'stochastic'] as const) {
      for (const row of record.forecasts[model]) {
        const bounds = levels.flatMap((level) => row.intervals[levelKey(level)] ?? [Number.NaN, Number.NaN]);
        const cells = [quote(record.series.id), model, String(row.h), quote(row.period), number(row.point), ...bounds.map(number), number(row.model_scale.mean), number(row.model_scale.se_process), number(row.model_scale.se_total)];
        lines.push(cells.join(','));
      }
    }
  }
  return `${lines.join('\r\n')}\r\n`;
}

function number(value: number): string {
  return Number.isFinite(value) ? String(value) : '';
}

function quote(text: string): string {
  return /[",\r\n]/.test(text) ? `"${text.replaceAll('"', '""')}"` : text;
}
