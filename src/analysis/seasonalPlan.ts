// What seasonal part a series' two models may take, decided before they are fitted: none (the
// `seasonal: none` setting, annual data, or too few years for a pattern to be estimated), a
// form fixed in the config, or one chosen from the data. Chosen from the data, the stochastic
// model's seasonal differences follow the seasonal unit-root test (src/evidence/seasonalEvidence),
// and the harmonics and seasonal ARMA orders are left to the AICc search (src/models/seasonalSearch).
import { parsePeriod } from '../base/period.js';
import type { Series } from '../base/series.js';
import type { AnalysisSettings, TrendModelKind } from '../base/settings.js';
import { seasonalEvidence, type SeasonalEvidenceRecord } from '../evidence/seasonalEvidence.js';
import type { FixedSeasonalPart, SeasonalSearchSpec } from '../models/trendModels.js';

/**
 * Fewest complete years for a seasonal part: with fewer, each month's effect rests on one or
 * two values and the seasonal test has next to no power (our threshold; the test itself needs
 * more than two cycles).
 */
export const MIN_SEASONAL_YEARS = 3;

/** The record's account of the seasonal part: what was asked, what was applied and why. */
export interface SeasonalRecord {
  /** Observations per year (1 for annual data). */
  period: number;
  /** The setting: auto, none or fixed. */
  setting: AnalysisSettings['seasonal']['kind'];
  /** Whether the models were given a seasonal part at all. */
  applied: boolean;
  /** Why not, when the setting asked for one; null otherwise. */
  reason: string | null;
  /** Whether the stochastic model works on seasonal differences; null when no seasonal part. */
  seasonal_differences: boolean | null;
  /** Who decided the seasonal differences: the seasonal test, or the config; null when no seasonal part. */
  differences_decided_by: 'evidence' | 'config' | null;
}

export interface SeasonalPlan {
  record: SeasonalRecord;
  /** The seasonal evidence, when the series has a seasonal part to assess. */
  evidence?: SeasonalEvidenceRecord;
  /** What each model's search may try, or the part fixed in the config; absent without a seasonal part. */
  specs?: Record<TrendModelKind, SeasonalSearchSpec | FixedSeasonalPart>;
  /** Calendar start of the series, for the seasonal pattern's labels. */
  start?: { season: number; year: number };
}

export function planSeasonal(series: Series, w: Float64Array, settings: AnalysisSettings): SeasonalPlan {
  const { seasonal } = settings;
  const { period } = seasonal;
  const none = (reason: string | null): SeasonalPlan => ({
    record: { period, setting: seasonal.kind, applied: false, reason, seasonal_differences: null, differences_decided_by: null },
  });
  if (seasonal.kind === 'none' || period === 1) return none(null);
  if (series.n < MIN_SEASONAL_YEARS * period) {
    return none(`The series has fewer than ${MIN_SEASONAL_YEARS} years of ${period === 12 ? 'months' : 'quarters'} (${series.n} observations), too few to estimate a seasonal pattern, so neither model has a seasonal part.`);
  }
  const first = parsePeriod(series.first);
  const start = { season: first?.sub ?? 1, year: first?.year ?? 0 };
  const evidence = seasonalEvidence(w, period, { significance: settings.significance, start });
  const fixed = seasonal.kind === 'fixed' ? seasonal : undefined;
  const differences = fixed !== undefined ? fixed.seasonal_differences : (evidence.unit_root?.seasonal_differencing ?? false);
  const spec = (kind: TrendModelKind): SeasonalSearchSpec | FixedSeasonalPart => {
    const common = { period, firstSeason: start.season - 1, seasonalDifferencing: kind === 'stochastic' && differences };
    return fixed === undefined
      ? { ...common, maxHarmonics: Math.floor(period / 2), maxSeasonalP: 1, maxSeasonalQ: 1 }
      : { ...common, harmonics: fixed.harmonics, P: fixed.seasonal_ar, Q: fixed.seasonal_ma };
  };
  return {
    record: { period, setting: seasonal.kind, applied: true, reason: null, seasonal_differences: differences, differences_decided_by: fixed === undefined ? 'evidence' : 'config' },
    evidence,
    specs: { deterministic: spec('deterministic'), stochastic: spec('stochastic') },
    start,
  };
}
