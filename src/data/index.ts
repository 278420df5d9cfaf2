// The data stage: a CSV file in, one checked regularly spaced Series out.
//   readSeriesCsv: file -> bytes (size limit, UTF-8) -> parseSeriesCsv
//   parseSeriesCsv: readCsvTable -> selectColumns -> cells -> checkPeriods + checkSeries -> Series

export { checkSeries, type SeriesRules, type SeriesValues } from './checkSeries.js';
export { closestName, editDistance } from './closestName.js';
export { MAX_PROBLEMS_PER_CODE } from './limitProblems.js';
export { parseSeriesCsv } from './parseSeriesCsv.js';
export {
  addPeriods,
  formatPeriod,
  FREQUENCIES,
  parsePeriod,
  periodFromIndex,
  periodIndex,
  periodsPerYear,
  type Frequency,
  type Period,
} from './period.js';
export { MAX_SERIES_FILE_BYTES, readSeriesCsv } from './readSeriesCsv.js';
export type { Series, SeriesOptions, TransformSpec } from './series.js';
