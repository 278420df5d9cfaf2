// The `evidence` part of an AnalysisRecord: unit-root tests on the model-scale levels, their
// combined reading, residual checks of both fitted models, and the stability of the trend (for
// models with a seasonal part, with that part kept in every refit); for a seasonal series
// (period > 1) also the seasonal evidence, and residual checks over at least two seasonal cycles
// of lags.
import type { Estimation } from '../base/settings.js';
import { adfTest } from './adfTest.js';
import { kpssTest } from './kpssTest.js';
import { residualChecks, type ResidualChecks } from './residualChecks.js';
import { seasonalEvidence, type SeasonalEvidenceOptions, type SeasonalEvidenceRecord } from './seasonalEvidence.js';
import { breakTestSummary, evidenceNotes } from './messages.js';
import type { RegressionArmaFit } from '../models/fitRegressionArma.js';
import { seasonalTrendStability, trendStability, type ModelWindows, type SeasonalTrendFit } from './trendStability.js';
import { trendVerdict } from './trendVerdict.js';
import type { AdfResult, KpssLagRule, KpssResult, StabilityRecord, TrendVerdictKind } from './types.js';

export interface EvidenceOptions {
  /** Significance level of every test and of the reading (the `significance` setting). */
  significance: number;
  /** KPSS lag truncation: data-dependent (default) or ceil(12(n/100)^{1/4}). */
  kpssLagRule?: KpssLagRule;
  /** Period label of observation `index` (0-based), so break dates read as periods. */
  periodOf?: (index: number) => string;
  /** Observations per year; default 1. Above 1 the record gets `seasonal` and longer residual checks. */
  period?: number;
  /** The seasonal evidence when the caller has it already (it decides the seasonal differencing before the fit). */
  seasonal?: SeasonalEvidenceRecord;
  /** Where the series starts in the calendar, for the seasonal pattern when `seasonal` is not given. */
  seasonStart?: SeasonalEvidenceOptions['start'];
}

export interface EvidenceRecord {
  kpss: { level: KpssResult | null; trend: KpssResult | null };
  adf: { constant: AdfResult | null; trend: AdfResult | null };
  reading: { verdict: TrendVerdictKind | 'unavailable'; level: number; text: string; kpss_rejects: boolean | null; adf_rejects: boolean | null };
  residuals: { deterministic: ResidualChecks; stochastic: ResidualChecks };
  /** Expanding-window slope and drift, and the break tests; null when they could not run. */
  stability: StabilityRecord | null;
  /** Tests that could not be computed on this series, with the reason. */
  unavailable: { test: string; reason: string }[];
  /** Caveats on how the tests were run, e.g. with missing values. */
  notes: string[];
  /** Seasonal unit-root test, seasonal strength and pattern; present only for period > 1. */
  seasonal?: SeasonalEvidenceRecord;
}

export interface FittedResiduals {
  residuals: ArrayLike<number>;
  p: number;
  q: number;
  /** Seasonal AR and MA orders of the fit; default 0. */
  P?: number;
  Q?: number;
  /** How the fit was estimated; the stability windows are estimated the same way. */
  estimation?: Estimation;
  /** A model with a seasonal part: its design and fit, which the trend-stability checks keep whole. */
  seasonal?: SeasonalTrendFit;
  /** A model without one: its fit to the whole series, which the trend-stability checks start from. */
  fit?: RegressionArmaFit;
  /** Its stability windows, if computed ahead (`seasonalModelWindows`). */
  windows?: ModelWindows;
}

export function collectEvidence(
  w: Float64Array,
  fits: { deterministic: FittedResiduals; stochastic: FittedResiduals },
  options: EvidenceOptions,
): EvidenceRecord {
  const { significance } = options;
  const period = options.period ?? 1;
  const lagRule = options.kpssLagRule ?? 'auto';
  const unavailable: EvidenceRecord['unavailable'] = [];
  const attempt = <T>(test: string, run: () => T): T | null => {
    try {
      return run();
    } catch (error) {
      unavailable.push({ test, reason: error instanceof Error ? error.message : String(error) });
      return null;
    }
  };
  const levels = Array.from(w).filter((v) => Number.isFinite(v));
  const missing = w.length - levels.length;
  const notes = missing > 0 ? [evidenceNotes.missingInUnitRootTests(missing)] : [];
  const kpss = {
    level: attempt('kpss.level', () => kpssTest(levels, { regression: 'level', lagRule })),
    trend: attempt('kpss.trend', () => kpssTest(levels, { regression: 'trend', lagRule })),
  };
  const adf = {
    constant: attempt('adf.constant', () => adfTest(levels, { regression: 'constant' })),
    trend: attempt('adf.trend', () => adfTest(levels, { regression: 'trend' })),
  };
  const reading: EvidenceRecord['reading'] =
    kpss.trend !== null && adf.trend !== null
      ? toReading(trendVerdict(kpss.trend, adf.trend, significance))
      : {
          verdict: 'unavailable',
          level: significance,
          text: 'The unit-root checks could not be computed on this series, so they give no evidence either way.',
          kpss_rejects: null,
          adf_rejects: null,
        };
  return {
    kpss,
    adf,
    reading,
    residuals: {
      deterministic: checkResiduals(fits.deterministic, significance, period),
      stochastic: checkResiduals(fits.stochastic, significance, period),
    },
    stability: missing > 0 ? skipStability(unavailable, evidenceNotes.stabilityNeedsComplete) : attempt('stability', () => {
      const deterministic = fits.deterministic.seasonal;
      const stochastic = fits.stochastic.seasonal;
      const stability =
        deterministic !== undefined && stochastic !== undefined
          ? seasonalTrendStability(w, { deterministic, stochastic }, { deterministic: fits.deterministic.windows, stochastic: fits.stochastic.windows })
          : trendStability(
              w,
              {
                deterministic: { p: fits.deterministic.p, q: fits.deterministic.q, estimation: fits.deterministic.estimation },
                stochastic: { p: fits.stochastic.p, q: fits.stochastic.q, estimation: fits.stochastic.estimation },
              },
              { deterministic: fits.deterministic.fit, stochastic: fits.stochastic.fit },
            );
      const periodOf = options.periodOf;
      if (periodOf === undefined) return stability;
      for (const kind of ['deterministic', 'stochastic'] as const) {
        const test = stability.break_test[kind];
        test.summary = breakTestSummary(kind, test.p_bound, periodOf(test.break_index));
      }
      return stability;
    }),
    unavailable,
    notes,
    ...(period > 1 ? { seasonal: options.seasonal ?? seasonalEvidence(w, period, { significance, start: options.seasonStart }) } : {}),
  };
}

function checkResiduals(fit: FittedResiduals, significance: number, period: number): ResidualChecks {
  if (period === 1) return residualChecks(fit.residuals, fit.p, fit.q, significance);
  return residualChecks(fit.residuals, fit.p, fit.q, significance, { period, P: fit.P ?? 0, Q: fit.Q ?? 0 });
}

function skipStability(unavailable: EvidenceRecord['unavailable'], reason: string): null {
  unavailable.push({ test: 'stability', reason });
  return null;
}

function toReading(verdict: ReturnType<typeof trendVerdict>): EvidenceRecord['reading'] {
  return {
    verdict: verdict.verdict,
    level: verdict.significance,
    text: verdict.summary,
    kpss_rejects: verdict.kpss_rejects,
    adf_rejects: verdict.adf_rejects,
  };
}
