// A series named in a config, read with the checks a run makes (enough observations for the
// order limits, values the transform accepts), and its settings resolved once its frequency is
// known. Shared by `check` and `run`.
import { formatProblem, InputError, type InputLocation, type InputProblem } from '../base/problem.js';
import type { Series } from '../base/series.js';
import type { AnalysisSettings } from '../base/settings.js';
import { shownPath } from '../base/shownPath.js';
import { requiredObservations } from '../analysis/analyseSeries.js';
import { readingSettings, resolveSettings } from '../config/resolveSettings.js';
import type { RunPlan, SeriesPlan } from '../config/runPlan.js';
import { dataMessages } from '../data/messages.js';
import { readSeriesFile } from '../data/readSeriesFile.js';
import { checkAsOf, type AsOfCheck } from './checkAsOf.js';

export interface PlannedSeries {
  plan: SeriesPlan;
  series: Series;
  settings: AnalysisSettings;
  /** Set when the data end more than one period before the memo's as-of period (checkAsOf). */
  asOfGap?: NonNullable<AsOfCheck['gap']>;
}

/** `scheme://`, as RFC 3986 writes a URI's scheme. */
const WEB_ADDRESS = /^[A-Za-z][A-Za-z0-9+.-]*:\/\//;

/** Problems with a series file that could not be read at all: reported at the config's `file:` entry. */
const UNREADABLE_FILE: ReadonlySet<string> = new Set(['csv.file-missing', 'csv.not-a-file', 'csv.bad-link', 'csv.name-too-long', 'csv.unreadable', 'csv.too-large']);

/** `configFile` names the config in messages about the series file as a whole (missing, too large) and about its settings. */
export async function readPlannedSeries(plan: SeriesPlan, configFile: string): Promise<PlannedSeries> {
  const reading = readingSettings(plan.settings);
  const entry = { file: configFile, ...(plan.fileAt ?? { ...plan.at, field: `${plan.at.field}.file` }) };
  // A web address would otherwise be read as a relative path and reported as a missing file.
  if (WEB_ADDRESS.test(plan.fileAsWritten)) throw new InputError(dataMessages.atFileEntry(dataMessages.webAddress(shownPath(plan.file)), plan.fileAsWritten, entry));
  let series: Series;
  try {
    series = await readSeriesFile(shownPath(plan.file), {
      column: plan.column,
      periodColumn: plan.periodColumn,
      frequency: plan.frequency,
      sheet: plan.sheet,
      delimiter: plan.delimiter,
      decimalMark: plan.decimalMark,
      minObservations: requiredObservations(reading.max_p, reading.max_q),
      transform: reading.transform,
      missing: reading.missing,
    });
  } catch (error) {
    if (!(error instanceof InputError)) throw error;
    const named = { file: configFile, ...plan.at };
    throw new InputError(
      error.problems.map((problem) =>
        UNREADABLE_FILE.has(problem.code) ? dataMessages.atFileEntry(problem, plan.fileAsWritten, entry)
        : problem.line === undefined && problem.field === undefined ? dataMessages.namedBy(problem, named)
        : problem,
      ),
    );
  }
  // A setting the config leaves out is reported at the series entry it applies to.
  const placeOf = (key: string): InputLocation => ({ file: configFile, ...(plan.settingPlaces.get(key) ?? { ...plan.at, field: `${plan.at.field}.${key}` }) });
  return { plan, series, settings: resolveSettings(plan.settings, series, placeOf) };
}

/**
 * Every series of a config read and its settings resolved, the problems of all of them collected
 * before failing; with memo.as_of each series' last observation is checked against it.
 */
export async function readAllSeries(plan: RunPlan): Promise<PlannedSeries[]> {
  const problems: InputProblem[] = [];
  const loaded: PlannedSeries[] = [];
  for (const seriesPlan of plan.series) {
    try {
      const planned = await readPlannedSeries(seriesPlan, plan.configFile);
      const { asOf, asOfAt } = plan.memo;
      const check = asOf === undefined ? null : checkAsOf(asOf, { file: plan.configFile, ...(asOfAt ?? { field: 'memo.as_of' }) }, seriesPlan.id, seriesPlan.fileAsWritten, planned.series);
      if (check?.refusal != null) problems.push(check.refusal);
      loaded.push(check?.gap == null ? planned : { ...planned, asOfGap: check.gap });
    } catch (error) {
      if (!(error instanceof InputError)) throw error;
      problems.push(...error.problems);
    }
  }
  // A setting written once under defaults and wrong for every series is reported once.
  if (problems.length > 0) throw new InputError([...new Map(problems.map((problem) => [formatProblem(problem), problem])).values()]);
  return loaded;
}
