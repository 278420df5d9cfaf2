// `trendbrief fit FILE.csv`: read, analyse, print the record (--json) or a summary.
import { readSeriesCsv } from '../data/readSeriesCsv.js';
import { analyseSeries, requiredObservations } from '../analysis/analyseSeries.js';
import { completeAnalysis } from '../analysis/completeAnalysis.js';
import { formatSummary } from './formatSummary.js';
import { parseFitOptions, MAX_BACKTEST_HORIZON, MAX_BACKTEST_ORIGINS, MAX_HORIZON, MAX_ORDER } from './parseFitOptions.js';

export const FIT_HELP = `Usage: trendbrief fit FILE.csv [options]

Fits the deterministic trend (levels on [1, t] with ARMA errors) and the stochastic trend
(differences on a drift with ARMA errors), each with its own AICc order search, and
forecasts both with prediction intervals.

Options:
  --column NAME             value column (default: the first column after the period)
  --period-column NAME      period column (default: the first column)
  --frequency F             annual, quarterly or monthly (default: inferred from the periods)
  --transform T             none, log or box-cox:LAMBDA (default: none)
  --horizon H               forecast steps, 1 to ${MAX_HORIZON} (default: 10 annual, 12 quarterly, 24 monthly)
  --max-p N, --max-q N      largest AR and MA orders searched, 0 to ${MAX_ORDER} (default: 3 each)
  --levels L1,L2            interval levels in percent (default: 80,95)
  --no-coef-uncertainty     intervals from the ARMA process alone, without coefficient uncertainty
  --point median|mean       back-transformed median (default) or bias-adjusted mean
  --backtest                re-run the whole method at past origins and score both models,
                            then apply the recommendation rule
  --origins K               backtest origins, 1 to ${MAX_BACKTEST_ORIGINS} (default: as many as fit, up to 20)
  --backtest-horizon B      horizons scored in the backtest, 1 to ${MAX_BACKTEST_HORIZON} (default: 5)
  --refit P                 at each origin: reselect the orders (default), reestimate at the
                            full-sample orders, or keep the full-sample fit (fixed)
                            (--origins, --backtest-horizon and --refit imply --backtest)
  --allow-missing           treat empty cells, missing-value markers and missing periods as gaps
                            (the filter skips them; first and last values must be present)
  --json                    print the full analysis record as JSON
  -h, --help                this text
`;

export async function runFit(args: readonly string[], io: { stdout(text: string): void }): Promise<number> {
  const request = parseFitOptions(args);
  const series = readSeriesCsv(request.file, {
    column: request.column,
    periodColumn: request.periodColumn,
    frequency: request.frequency,
    minObservations: requiredObservations(request.maxP, request.maxQ),
    transform: request.transform,
    missing: request.allowMissing ? 'allow' : 'error',
  });
  const options = {
    horizon: request.horizon,
    levels: request.levels,
    maxP: request.maxP,
    maxQ: request.maxQ,
    transform: request.transform,
    coefficientUncertainty: request.coefficientUncertainty,
    point: request.point,
  };
  const record = request.backtest === undefined ? analyseSeries(series, options) : await completeAnalysis(series, { ...options, backtest: request.backtest });
  io.stdout(request.json ? `${JSON.stringify(record, null, 2)}\n` : formatSummary(record));
  return 0;
}
