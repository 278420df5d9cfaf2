// The config stage: a YAML file in, a RunPlan out.
//   loadConfig: file → bytes (1 MB limit, UTF-8) → parseConfig
//   parseConfig: readYamlTree → validateNode(CONFIG_SPEC) → checkConfigRules → buildRunPlan
// The same CONFIG_SPEC gives the JSON Schema (toJsonSchema) that editors use.

export { RECOMMENDATION_RULES } from './builtInSettings.js';
export { CONFIG_SPEC, OUTPUT_FORMATS, type ConfigDocument } from './configSpec.js';
export { loadConfig, MAX_CONFIG_FILE_BYTES } from './loadConfig.js';
export { parseConfig } from './parseConfig.js';
export { MAX_ALIAS_COUNT } from './readYamlTree.js';
export { listSettings } from './runPlan.js';
export type {
  BacktestRefit,
  BacktestWindow,
  ConfigPlace,
  MemoDetails,
  OutputFormat,
  OutputPlan,
  RecommendationRule,
  Reviewer,
  RunPlan,
  SeriesPlan,
  SeriesSettings,
  Setting,
  SettingSource,
  SignOff,
  TrendModelChoice,
} from './runPlan.js';
export { toAnalysisOptions } from './toAnalysisOptions.js';
export { configSchemaText, toJsonSchema } from './toJsonSchema.js';
