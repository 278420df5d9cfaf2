// `trendbrief fit FILE.csv`: read, analyse, print the record (--json) or a summary.
import { analyseSeries, requiredObservations } from '../analysis/analyseSeries.js';
import { BUILT_IN_SETTINGS as BUILT_IN } from '../config/builtInSettings.js';
import { DEFAULT_YEARS_AHEAD as YEARS } from '../base/periodEnd.js';
import { readingSettings, resolveSettings } from '../config/resolveSettings.js';
import { BACKTEST_FIELDS, LEVEL, SETTINGS_FIELDS } from '../config/settingsSpec.js';
import { readSeriesFile } from '../data/readSeriesFile.js';
import { formatSummary } from './formatSummary.js';
import { fitOptionPlace, parseFitOptions } from './parseFitOptions.js';
import { EXIT } from './exitCodes.js';
import { fitProgress } from './progressReporter.js';
import { MIN_BACKTEST_ORIGINS } from '../base/settings.js';

export const FIT_HELP = `Usage: trendbrief fit FILE.csv|FILE.xlsx [options]

Fits the deterministic trend (levels on [1, t] with ARMA errors) and the stochastic trend
(differences on a drift with ARMA errors), each with its own AICc order search, and
forecasts both with prediction intervals. Each option sets the config setting of the same
meaning, with the same range and default.

Options:
  --column NAME             value column (default: the first column after the period)
  --period-column NAME      period column (default: the first column)
  --frequency F             annual, quarterly or monthly (default: inferred from the periods,
                            or from the spacing of dates such as 2003-01-31)
  --sheet NAME              the workbook's sheet holding the series (default: the first sheet)
  --delimiter D             auto, comma, semicolon or tab: what separates a CSV file's cells
                            (default: auto, read from the header line)
  --decimal-mark M          auto, point or comma: the decimal mark of values written as text
                            (default: auto, read from the values; thousands separators are
                            never read)
  --transform T             none, log or box-cox:LAMBDA (default: ${BUILT_IN.transform})
  --through PERIOD          the last period to forecast, e.g. 2030, 2030-Q4 or 2030-12 (default: the
                            end of the calendar year ${YEARS.monthly} years after the last observation's for
                            monthly and quarterly data, ${YEARS.annual} years after it for annual data)
  --horizon H               forecast steps instead, 1 to ${SETTINGS_FIELDS.horizon.max}
  --max-p N, --max-q N      largest AR and MA orders searched, 0 to ${SETTINGS_FIELDS.max_p.max} (default: ${BUILT_IN.max_p} and ${BUILT_IN.max_q})
  --levels L1,L2            one to ${SETTINGS_FIELDS.levels.maxItems} interval levels in percent, above ${LEVEL.min} and below ${LEVEL.max}
                            (default: ${BUILT_IN.levels.join(',')})
  --no-coef-uncertainty     intervals from the ARMA process alone, without coefficient uncertainty
  --point median|mean       back-transformed median (default) or bias-adjusted mean
  --year-figure total|average
                            monthly and quarterly series: the next full year's figure, its
                            periods added up (a flow) or their average (a level or a rate;
                            default)
  --seasonal auto|none      monthly and quarterly series: a seasonal part chosen from the data
                            (default), or none for seasonally adjusted data
  --estimation reml|ml      the chosen order's coefficients by restricted maximum likelihood
                            (default) or exact maximum likelihood; orders are chosen by AICc
                            on the exact likelihood either way
  --backtest                re-run the whole method at past origins and score both models,
                            then apply the recommendation rule
  --origins K               backtest origins, 1 to ${BACKTEST_FIELDS.origins.max} (default: ${BUILT_IN.backtest.origins}, fewer when the series is short)
  --backtest-horizon B      horizons scored in the backtest, 1 to ${BACKTEST_FIELDS.horizon.max} (default: the forecast
                            horizon, shorter when the series cannot spare ${MIN_BACKTEST_ORIGINS} origins for it)
  --refit P                 at each origin: reselect the orders (default), reestimate at the
                            full-sample orders, or keep the full-sample fit (fixed)
  --scored-level L          the interval level whose backtest scores the recommendation rule
                            compares; one of the levels (default: the widest)
                            (--origins, --backtest-horizon, --refit and --scored-level imply --backtest)
  --allow-missing           treat empty cells, missing-value markers and missing periods as gaps
                            (the filter skips them; first and last values must be present)
  --json                    print the full analysis record as JSON
  -h, --help                this text
`;

export async function runFit(args: readonly string[], io: { stdout(text: string): void; stderr?(text: string): void; isTTY?: boolean }): Promise<number> {
  // Help comes before the options are checked, so `fit --help` works whatever else is written.
  if (args.includes('--help') || args.includes('-h')) {
    io.stdout(FIT_HELP);
    return EXIT.ok;
  }
  const request = parseFitOptions(args);
  const reading = readingSettings(request.settings);
  const series = await readSeriesFile(request.file, {
    column: request.column,
    periodColumn: request.periodColumn,
    frequency: request.frequency,
    sheet: request.sheet,
    delimiter: request.delimiter,
    decimalMark: request.decimalMark,
    minObservations: requiredObservations(reading.max_p, reading.max_q),
    transform: reading.transform,
    missing: reading.missing,
  });
  const settings = resolveSettings(request.settings, series, fitOptionPlace);
  const identity = { id: series.column, title: series.column, file: series.file };
  // Progress only on a terminal, on stderr: stdout stays the summary or the record alone.
  const stderr = io.stderr;
  const progress = fitProgress(io.isTTY === true && stderr !== undefined ? { write: (text) => stderr(text), isTTY: true } : undefined);
  progress.stage('fitting both models');
  let backtestShown = false;
  const onBacktestProgress = (done: number, total: number): void => {
    if (!backtestShown) progress.stage('backtest');
    backtestShown = true;
    progress.origins(done, total);
  };
  const record = await analyseSeries(series, settings, identity, { backtest: request.backtest, ...(request.backtest ? { onBacktestProgress } : {}) }).finally(() => progress.finish());
  io.stdout(request.json ? `${JSON.stringify(record, null, 2)}\n` : formatSummary(record));
  return EXIT.ok;
}
