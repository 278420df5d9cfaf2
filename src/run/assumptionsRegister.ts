// The assumptions register of one series: every modelling choice, its value as applied (from
// the record's settings, or the backtest's own record of what it ran), its basis, and who set
// it (the config, the tool's default, or the data for what the analysis chose).
import type { AnalysisRecord } from '../analysis/record.js';
import { TREND_MODELS } from '../base/settings.js';
import type { SeriesPlan } from '../config/runPlan.js';
import { SETTING_KEYS } from '../config/settingsSpec.js';
import type { Assumption } from '../memo/memoInput.js';

const CHOICES: Record<string, string> = {
  horizon: 'Forecast horizon',
  transform: 'Transform of the values',
  levels: 'Prediction interval levels',
  coefficient_uncertainty: 'Coefficient uncertainty in the intervals',
  point: 'Point forecast',
  year_figure: 'Figure for a whole year',
  estimation: 'Estimation of the coefficients',
  seasonal: 'Seasonal part',
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
  'recommendation.scored_level': 'Interval level the rule scores',
  'recommendation.model': 'Recommended model fixed',
  'recommendation.justification': 'Justification for the fixed model',
  missing: 'Missing observations',
};

export function assumptionsRegister(plan: SeriesPlan, record: AnalysisRecord, configName: string): Assumption[] {
  const rows: Assumption[] = [];
  for (const key of SETTING_KEYS) {
    const value = appliedValue(key, record);
    if (value === undefined) continue;
    // The horizon's row says where it was set, in steps or as an end period.
    const at = plan.settingPlaces.get(key) ?? (key === 'horizon' ? plan.settingPlaces.get('through') : undefined);
    rows.push({
      choice: CHOICES[key] ?? key,
      value,
      basis: at === undefined ? 'the tool\u2019s default' : `${configName}, line ${at.line} (${at.field})`,
      set_by: at === undefined ? 'default' : 'config',
    });
  }
  for (const kind of TREND_MODELS) {
    const model = record.models[kind];
    const part = model.seasonal;
    const seasonalValue =
      part === null
        ? ''
        : `; seasonal: ${part.harmonics} harmonic pair${part.harmonics === 1 ? '' : 's'}, seasonal ARMA (${part.P}, ${part.Q})${part.seasonal_differences ? ', seasonal differences' : ''}`;
    const fixedPart = record.seasonal?.setting === 'fixed';
    rows.push({
      choice: part === null ? `ARMA order of the ${kind} trend` : `ARMA order and seasonal part of the ${kind} trend`,
      value: `(${model.p}, ${model.q})${seasonalValue}`,
      basis:
        `lowest AICc, p ≤ ${record.settings.max_p}, q ≤ ${record.settings.max_q}` +
        (part === null ? '' : fixedPart ? '; seasonal part as configured' : '; seasonal part searched alongside'),
      set_by: 'data',
    });
  }
  if (record.recommendation !== undefined) {
    rows.push({
      choice: 'Model recommended',
      value: `${record.recommendation.model} trend`,
      basis: record.recommendation.fixed_by_config
        ? `fixed by the config: ${record.recommendation.justification ?? ''}`
        : `the ${record.settings.recommendation.rule} rule on this series' evidence (series page)`,
      set_by: record.recommendation.fixed_by_config ? 'config' : 'data',
    });
  }
  return rows;
}

/** The value a setting took in this analysis, as text; undefined for a setting that does not apply. */
function appliedValue(key: string, record: AnalysisRecord): string | undefined {
  const { settings } = record;
  const backtest = record.backtest ?? undefined;
  switch (key) {
    case 'horizon': {
      const end = record.forecasts.stochastic.at(-1)?.period;
      return `${settings.horizon} periods${end === undefined ? '' : `, through ${end}`}`;
    }
    case 'through':
      // Shown in the horizon's row.
      return undefined;
    case 'backtest.horizon':
      return backtest === undefined ? 'not run' : `${backtest.settings.horizon} periods`;
    case 'backtest.min_train':
      return backtest === undefined ? 'not run' : `${backtest.settings.min_training_length} observations`;
    case 'backtest.origins':
      return backtest === undefined ? `not run (${record.backtest_unavailable ?? 'no backtest'})` : `${backtest.origins.length} (asked: ${settings.backtest.origins})`;
    case 'backtest.refit':
      return settings.backtest.refit;
    case 'backtest.window':
      return settings.backtest.window;
    case 'recommendation.rule':
      return settings.recommendation.rule;
    case 'recommendation.significance':
      return String(settings.recommendation.significance);
    case 'recommendation.scored_level':
      return `${settings.recommendation.scored_level}%`;
    case 'recommendation.model':
      return settings.recommendation.model ?? undefined;
    case 'recommendation.justification':
      return settings.recommendation.justification ?? undefined;
    case 'transform': {
      const { transform } = settings;
      return transform.kind === 'box-cox' ? `Box-Cox, lambda ${transform.lambda}` : transform.kind === 'log' ? 'natural log' : 'none';
    }
    case 'levels':
      return settings.levels.map((level) => `${level}%`).join(', ');
    case 'coefficient_uncertainty':
      return settings.coefficient_uncertainty ? 'included' : 'left out';
    case 'seasonal': {
      const { seasonal } = settings;
      if (seasonal.kind === 'none') return seasonal.period === 1 ? 'none (annual data)' : 'none (the data are taken as seasonally adjusted)';
      if (seasonal.kind === 'auto') return 'chosen from the data';
      const parts = [`${seasonal.harmonics} harmonic pair${seasonal.harmonics === 1 ? '' : 's'}`, `seasonal AR ${seasonal.seasonal_ar}`, `seasonal MA ${seasonal.seasonal_ma}`];
      return `fixed: ${parts.join(', ')}; ${seasonal.seasonal_differences ? 'the stochastic trend on seasonal differences' : 'no seasonal differences'}`;
    }
    case 'estimation': {
      if (settings.estimation === 'ml') return 'exact maximum likelihood';
      // Say where REML could not be used, so the register agrees with the models section.
      const kept = (['deterministic', 'stochastic'] as const).filter((kind) => record.models[kind].restricted_fallback !== null);
      const where = kept.map((kind) => (kind === 'deterministic' ? 'the deterministic trend' : 'the stochastic trend')).join(' and ');
      return kept.length === 0 ? 'restricted maximum likelihood (REML)' : `restricted maximum likelihood (REML); exact maximum likelihood for ${where}, whose REML fit was not usable`;
    }
    case 'point':
      return settings.point === 'median' ? 'median (back-transformed)' : 'mean (bias-adjusted)';
    case 'year_figure': {
      const periods = record.settings.seasonal.period;
      if (periods === 1) return 'not used (each forecast of an annual series is a year)';
      const unit = periods === 12 ? 'months' : 'quarters';
      return settings.year_figure === 'total' ? `total of the ${periods} ${unit}` : `average of the ${periods} ${unit}`;
    }
    case 'max_p':
      return String(settings.max_p);
    case 'max_q':
      return String(settings.max_q);
    case 'significance':
      return String(settings.significance);
    case 'missing':
      return settings.missing;
    default:
      throw new Error(`assumptionsRegister: no wording for the setting ${key}`);
  }
}
