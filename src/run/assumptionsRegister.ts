// The assumptions register of one series: every modelling choice, its value as applied, its
// basis, and who set it (the config, or the tool's default). Values the config leaves to the
// data (the horizon, the backtest's training length) are read back from the record.
import type { AnalysisRecord } from '../analysis/record.js';
import { listSettings, type SeriesPlan, type Setting } from '../config/runPlan.js';
import type { Assumption } from '../memo/memoInput.js';

const CHOICES: Record<string, string> = {
  horizon: 'Forecast horizon',
  transform: 'Transform of the values',
  levels: 'Prediction interval levels',
  coefficient_uncertainty: 'Coefficient uncertainty in the intervals',
  point: 'Point forecast',
  max_p: 'Largest AR order searched',
  max_q: 'Largest MA order searched',
  significance: 'Significance level of the tests',
  'backtest.origins': 'Backtest origins',
  'backtest.horizon': 'Backtest horizon',
  'backtest.refit': 'Backtest refit at each origin',
  'backtest.window': 'Backtest training window',
  'backtest.min_train': 'Shortest backtest training window',
  'recommendation.rule': 'Recommendation rule',
  'recommendation.significance': 'Significance level of the rule',
  'recommendation.model': 'Recommended model fixed',
  'recommendation.justification': 'Justification for the fixed model',
  missing: 'Missing observations',
};

export function assumptionsRegister(plan: SeriesPlan, record: AnalysisRecord, configName: string): Assumption[] {
  const rows: Assumption[] = [];
  for (const setting of listSettings(plan.settings)) {
    const value = appliedValue(setting, record);
    if (value === undefined) continue;
    rows.push({
      choice: CHOICES[setting.key] ?? setting.key,
      value,
      basis: setting.at === undefined ? 'built-in default of the tool' : `${configName}, line ${setting.at.line} (${setting.at.field})`,
      set_by: setting.source,
    });
  }
  for (const kind of ['deterministic', 'stochastic'] as const) {
    const model = record.models[kind];
    rows.push({
      choice: `ARMA order of the ${kind} trend`,
      value: `(${model.p}, ${model.q})`,
      basis: `lowest AICc over p ≤ ${record.settings.max_p}, q ≤ ${record.settings.max_q}`,
      set_by: 'default',
    });
  }
  if (record.recommendation !== undefined) {
    rows.push({
      choice: 'Model recommended',
      value: `${record.recommendation.model} trend`,
      basis: record.recommendation.fixed_by_config ? `fixed by the config: ${record.recommendation.justification ?? ''}` : record.recommendation.rule_text,
      set_by: record.recommendation.fixed_by_config ? 'config' : 'default',
    });
  }
  return rows;
}

/** The value a setting took in this analysis, as text; undefined for a setting that does not apply. */
function appliedValue(setting: Setting<unknown>, record: AnalysisRecord): string | undefined {
  const backtest = record.backtest ?? undefined;
  switch (setting.key) {
    case 'horizon':
      return `${record.settings.horizon} periods`;
    case 'backtest.horizon':
      return backtest === undefined ? 'not run' : `${backtest.settings.horizon} periods`;
    case 'backtest.min_train':
      return backtest === undefined ? 'not run' : `${backtest.settings.min_training_length} observations`;
    case 'backtest.origins':
      return backtest === undefined ? `not run (${record.backtest_unavailable ?? 'no backtest'})` : `${backtest.origins.length} (asked: ${String(setting.value)})`;
    case 'recommendation.model':
    case 'recommendation.justification':
      return setting.value === undefined ? undefined : String(setting.value);
    case 'transform': {
      const transform = record.series.transform;
      return transform.kind === 'box-cox' ? `Box-Cox, lambda ${transform.lambda}` : transform.kind === 'log' ? 'natural log' : 'none';
    }
    case 'levels':
      return record.settings.levels.map((level) => `${level}%`).join(', ');
    case 'coefficient_uncertainty':
      return record.settings.coefficient_uncertainty ? 'included' : 'left out';
    case 'point':
      return record.settings.point === 'median' ? 'median (back-transformed)' : 'mean (bias-adjusted)';
    default:
      return typeof setting.value === 'object' ? JSON.stringify(setting.value) : String(setting.value);
  }
}
