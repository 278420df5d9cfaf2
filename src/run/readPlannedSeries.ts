// A series named in a config, read with the checks a run makes: enough observations for the
// order limits and values the transform accepts. Shared by `check` and `run`.
import { isAbsolute, relative } from 'node:path';
import { requiredObservations } from '../analysis/analyseSeries.js';
import type { SeriesPlan } from '../config/runPlan.js';
import { readSeriesCsv } from '../data/readSeriesCsv.js';
import type { Series } from '../data/series.js';
import { dataMessages, InputError } from '../errors.js';

/** A path under the working folder is shown relative to it, as the user would type it. */
export function shownPath(file: string): string {
  const shown = relative(process.cwd(), file);
  return shown === '' || shown.startsWith('..') || isAbsolute(shown) ? file : shown;
}

/** `configFile`, when given, names the config in messages about the file as a whole (missing, too large), which then say where it is named. */
export function readPlannedSeries(series: SeriesPlan, configFile?: string): Series {
  const { settings } = series;
  try {
    return readSeriesCsv(shownPath(series.file), {
      column: series.column,
      periodColumn: series.periodColumn,
      frequency: series.frequency,
      minObservations: requiredObservations(settings.maxP.value, settings.maxQ.value),
      transform: settings.transform.value,
      missing: settings.missing.value,
    });
  } catch (error) {
    if (!(error instanceof InputError) || configFile === undefined) throw error;
    const named = { file: configFile, ...series.at };
    throw new InputError(error.problems.map((problem) => (problem.line === undefined && problem.field === undefined ? dataMessages.namedBy(problem, named) : problem)));
  }
}
