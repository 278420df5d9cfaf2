// What the caller wants from a series file and what the later use of the series requires.
import type { Frequency } from '../base/period.js';
import type { MissingPolicy, Transform } from '../base/settings.js';
import type { DecimalMarkSetting, DelimiterSetting } from './detectDialect.js';

export interface SeriesOptions {
  /** Value column; default: the first column that is not the period column. */
  column?: string;
  /** Period column; default: the first column. */
  periodColumn?: string;
  /** Expected frequency; default: the first period label's, or the spacing of the dates (dateSpacing). */
  frequency?: Frequency;
  /** Fewest observations the caller's use of the series needs. */
  minObservations?: number;
  /** The transform the models will apply: the values must allow it. */
  transform?: Transform;
  /**
   * 'allow': empty cells, missing-value markers and missing periods become NaN observations
   * (the first and last must still be present); 'error': each is a problem.
   */
  missing: MissingPolicy;
  /** CSV: the cell delimiter; default 'auto' (detectDelimiter). */
  delimiter?: DelimiterSetting;
  /** Values written as text: the decimal mark; default 'auto' (detectDecimalMark). */
  decimalMark?: DecimalMarkSetting;
  /** Workbook: the sheet's name; default the first sheet. */
  sheet?: string;
}
