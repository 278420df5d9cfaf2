// The seasonal evidence for a monthly or quarterly series, one record for the analysis:
//
//   w (model-scale levels) ─first differences─▶ canovaHansenTest ─▶ unit_root: is the pattern
//                                                 stable, or does the stochastic model need (1 − B^s)?
//   w ─stlDecomposition─▶ seasonalStrength ─▶ strength (F_S, F_T) and pattern (effect by season,
//                                             first against last complete year)
//
// Each part that cannot be computed (missing values, too short a series) is null, with the
// reason under `unavailable`; nothing here throws on data. Every number is finite or null.
import { canovaHansenTest, CANOVA_HANSEN_LAG_RULE } from './canovaHansenTest.js';
import { evidenceNotes, seasonalStrengthSummary, seasonalTestSummary } from './messages.js';
import { seasonalStrength, type SeasonStart } from './seasonalStrength.js';
import type { StlOptions } from './stlDecomposition.js';
import type { SeasonalPattern, SeasonalStrength, SeasonalUnitRootResult } from './types.js';

export interface SeasonalEvidenceOptions {
  /** Significance level of the seasonal test (the `significance` setting). */
  significance: number;
  /** Calendar month or quarter (and year, if known) of the first observation; default season 1. */
  start?: SeasonStart;
  /** STL settings other than the period; defaults in stlDecomposition.ts (seasonal span 7, not robust). */
  stl?: Omit<StlOptions, 'period'>;
  /** Bartlett truncation of the seasonal test; default ceil(s (n/100)^{1/4}). */
  seasonalTestLags?: number;
}

export interface SeasonalEvidenceRecord {
  /** Observations per year: 4 or 12. */
  period: number;
  /** Levels given (missing ones included). */
  n: number;
  unit_root: SeasonalUnitRootResult | null;
  strength: SeasonalStrength | null;
  pattern: SeasonalPattern | null;
  /** Checks that could not be computed on this series, with the reason. */
  unavailable: { test: string; reason: string }[];
}

const CANOVA_HANSEN_SOURCE =
  'Canova & Hansen (1995), J. Business & Economic Statistics 13, 237–252; p-value from the VM(s − 1) limit';

/** Seasonal unit-root test, seasonal and trend strength, and the seasonal pattern of `w`. */
export function seasonalEvidence(w: ArrayLike<number>, period: number, options: SeasonalEvidenceOptions): SeasonalEvidenceRecord {
  if (!Number.isInteger(period) || period < 2 || period > 12) {
    throw new Error('seasonalEvidence needs a seasonal period from 2 to 12 (4 quarterly, 12 monthly)');
  }
  const { significance } = options;
  if (!(significance > 0 && significance < 1)) throw new Error('seasonalEvidence needs a significance level between 0 and 1');
  const levels = Float64Array.from(w);
  const unavailable: SeasonalEvidenceRecord['unavailable'] = [];
  const complete = levels.every((v) => Number.isFinite(v));
  const attempt = <T>(test: string, run: () => T): T | null => {
    if (!complete) {
      unavailable.push({ test, reason: evidenceNotes.seasonalNeedsComplete });
      return null;
    }
    try {
      return run();
    } catch (error) {
      unavailable.push({ test, reason: error instanceof Error ? error.message : String(error) });
      return null;
    }
  };

  const unit_root = attempt('seasonal.unit_root', (): SeasonalUnitRootResult => {
    const differences = levels.subarray(1).map((v, i) => v - levels[i]);
    const test = canovaHansenTest(differences, period, { lags: options.seasonalTestLags });
    const differencing = test.p_value < significance;
    return {
      method: 'canova-hansen',
      source: CANOVA_HANSEN_SOURCE,
      tested: 'first differences',
      stat: test.stat,
      restrictions: test.restrictions,
      lags: test.lags,
      lag_rule: options.seasonalTestLags === undefined ? CANOVA_HANSEN_LAG_RULE : 'fixed',
      n: test.n,
      period,
      p_value: test.p_value,
      critical: test.critical,
      significance,
      seasonal_differencing: differencing,
      by_frequency: test.by_frequency,
      text: seasonalTestSummary(differencing, test, significance, period),
    };
  });

  const decomposition = attempt('seasonal.strength', () => seasonalStrength(levels, period, options.start, options.stl));
  return {
    period,
    n: levels.length,
    unit_root,
    strength:
      decomposition === null
        ? null
        : { ...decomposition.strength, text: seasonalStrengthSummary(decomposition.strength, decomposition.pattern) },
    pattern: decomposition?.pattern ?? null,
    unavailable,
  };
}
