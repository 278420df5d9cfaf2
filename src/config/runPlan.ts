// What a checked config asks for, in the terms the later stages use: the memo's details, where
// the output goes, and per series the effective value of every setting together with who set it,
// so the memo can print each choice with "set by: config" or "set by: default".
import type { Frequency } from '../data/period.js';
import type { TransformSpec } from '../data/series.js';
import type { OUTPUT_FORMATS, SettingsEntry } from './configSpec.js';
import type { RECOMMENDATION_RULES } from './builtInSettings.js';

export type SettingSource = 'config' | 'default';

/** Where in the config a value is written. */
export interface ConfigPlace {
  /** Dotted path, e.g. `series[1].horizon` or `defaults.horizon`. */
  field: string;
  line: number;
  column: number;
}

export interface Setting<T> {
  /** The key as written in YAML, e.g. `backtest.min_train`. */
  key: string;
  value: T;
  source: SettingSource;
  /** Where the config sets the value; absent for a built-in default. */
  at?: ConfigPlace;
}

type Backtest = NonNullable<SettingsEntry['backtest']>;
type Recommendation = NonNullable<SettingsEntry['recommendation']>;

export type BacktestRefit = NonNullable<Backtest['refit']>;
export type BacktestWindow = NonNullable<Backtest['window']>;
export type RecommendationRule = (typeof RECOMMENDATION_RULES)[number];
export type TrendModelChoice = NonNullable<Recommendation['model']>;
export type OutputFormat = (typeof OUTPUT_FORMATS)[number];

/** Every overridable setting of one series; undefined values are left to the stage that knows the data. */
export interface SeriesSettings {
  /** Undefined: the frequency's default horizon (10 annual, 12 quarterly, 24 monthly). */
  horizon: Setting<number | undefined>;
  transform: Setting<TransformSpec>;
  /** Ascending. */
  levels: Setting<number[]>;
  coefficientUncertainty: Setting<boolean>;
  point: Setting<'median' | 'mean'>;
  maxP: Setting<number>;
  maxQ: Setting<number>;
  significance: Setting<number>;
  backtest: {
    origins: Setting<number>;
    /** Undefined: the backtest stage's default, 5. */
    horizon: Setting<number | undefined>;
    refit: Setting<BacktestRefit>;
    window: Setting<BacktestWindow>;
    /** Undefined: the fewest observations the order limits need. */
    minTrain: Setting<number | undefined>;
  };
  recommendation: {
    rule: Setting<RecommendationRule>;
    significance: Setting<number>;
    /** Undefined: the rule decides. */
    model: Setting<TrendModelChoice | undefined>;
    justification: Setting<string | undefined>;
  };
  missing: Setting<'error' | 'allow'>;
}

/** A series' settings as one flat list in config order, for the memo's assumptions register. */
export function listSettings(settings: SeriesSettings): Setting<unknown>[] {
  const { backtest, recommendation, missing, ...modelling } = settings;
  return [...Object.values(modelling), ...Object.values(backtest), ...Object.values(recommendation), missing];
}

export interface SeriesPlan {
  id: string;
  /** The configured title, or the id. */
  title: string;
  units?: string;
  notes?: string;
  /** Absolute path of the CSV file. */
  file: string;
  /** The path as written in the config. */
  fileAsWritten: string;
  periodColumn?: string;
  column?: string;
  frequency?: Frequency;
  /** Where the series entry starts. */
  at: ConfigPlace;
  settings: SeriesSettings;
}

export interface Reviewer {
  name: string;
  role?: string;
}

export interface SignOff {
  reviewer: string;
  /** YYYY-MM-DD. */
  date: string;
  decision: 'approved' | 'approved-with-changes' | 'rejected';
  comment?: string;
}

export interface MemoDetails {
  /** Lowercase letters, digits and single hyphens; names the memo's output folder. */
  id: string;
  title: string;
  client?: string;
  preparedBy?: string;
  reference?: string;
  /** A period label: 2026, 2026-Q3 or 2026-10. */
  asOf?: string;
  author?: string;
  reviewers: Reviewer[];
  signOff: SignOff[];
}

export interface OutputPlan {
  /** Absolute folder the memo's own folder is written into. */
  folder: string;
  /** The folder as written in the config, or the default `out`. */
  folderAsWritten: string;
  /** Where the config sets the folder; absent for the default. */
  folderAt?: ConfigPlace;
  /** Absolute path of the memo's folder: `folder/<memo id>`. */
  memoFolder: string;
  formats: OutputFormat[];
  paper: 'A4' | 'Letter';
  /** A folder of templates replacing the built-in ones. */
  templates?: { folder: string; folderAsWritten: string; at: ConfigPlace };
}

export interface RunPlan {
  /** The config file as the caller named it, for messages. */
  configFile: string;
  /** SHA-256 of the config text, lowercase hex. */
  configSha256: string;
  /** Absolute folder that relative paths in the config are resolved against. */
  baseDir: string;
  memo: MemoDetails;
  output: OutputPlan;
  series: SeriesPlan[];
}
