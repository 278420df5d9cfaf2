// What a checked config asks for: the memo's details, where the output goes, and per series
// its file and the settings the config writes for it, with where each is written, so the memo
// can print each choice with "set by: config" or "set by: default".
import type { Frequency } from '../base/period.js';
import type { OUTPUT_FORMATS, SeriesEntry } from './configSpec.js';
import type { WrittenSettings } from './resolveSettings.js';

/** Where in the config a value is written. */
export interface ConfigPlace {
  /** Dotted path, e.g. `series[1].horizon` or `defaults.horizon`. */
  field: string;
  line: number;
  column: number;
}

export type OutputFormat = (typeof OUTPUT_FORMATS)[number];

export interface SeriesPlan {
  id: string;
  /** The configured title, or the id. */
  title: string;
  units?: string;
  notes?: string;
  /** Where the data come from and which release; shown on page 1. */
  source?: string;
  vintage?: string;
  /** Absolute path of the CSV file. */
  file: string;
  /** The path as written in the config. */
  fileAsWritten: string;
  /** Where the config writes the path (`series[0].file`); absent only in plans made by hand. */
  fileAt?: ConfigPlace;
  periodColumn?: string;
  column?: string;
  frequency?: Frequency;
  /** How the file is read: a workbook's sheet, a CSV file's delimiter, the decimal mark of values written as text. */
  sheet?: string;
  delimiter?: SeriesEntry['delimiter'];
  decimalMark?: SeriesEntry['decimal_mark'];
  /** Where the series entry starts. */
  at: ConfigPlace;
  /** The series' own settings over those under `defaults`, as written; what neither sets is absent (resolveSettings fills it). */
  settings: WrittenSettings;
  /** Where the config writes each setting, by key (`horizon`, `backtest.origins`); absent for a key it leaves out. */
  settingPlaces: ReadonlyMap<string, ConfigPlace>;
}

export interface Reviewer {
  name: string;
  role?: string;
  /** PEM text of an Ed25519 public key; checked to parse as one. */
  public_key?: string;
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
  /** Where memo.as_of is written, for the messages that compare it with the data. */
  asOfAt?: ConfigPlace;
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
