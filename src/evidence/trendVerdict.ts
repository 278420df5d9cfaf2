// The joint reading of a stationarity test and a unit-root test, whose nulls are opposite
// (common practice since Kwiatkowski et al. 1992, §1): KPSS-trend asks "is the series
// stationary around a line?", ADF-trend asks "does it have a unit root?". Agreement gives a
// verdict; rejecting both or neither is reported as such rather than forced into one.
import type { AdfResult, KpssResult, TrendVerdict, TrendVerdictKind } from './types.js';
import { trendVerdictSummary } from './messages.js';

type KpssEvidence = Pick<KpssResult, 'p_value' | 'p_bound' | 'regression'>;
type AdfEvidence = Pick<AdfResult, 'p_value' | 'regression'>;

/**
 * Verdict from the trend versions of the two tests at `significance`, which
 * must lie within KPSS Table 1 (0.01 to 0.10) so that a p-value at the table's edge still
 * decides whether KPSS rejects.
 */
export function trendVerdict(kpss: KpssEvidence, adf: AdfEvidence, significance: number): TrendVerdict {
  if (kpss.regression !== 'trend') throw new Error("trendVerdict needs the KPSS test with regression 'trend'");
  if (adf.regression !== 'trend') throw new Error("trendVerdict needs the ADF test with regression 'trend'");
  if (!(significance >= 0.01 && significance <= 0.1)) {
    throw new Error('trendVerdict needs a significance level from 0.01 to 0.10, the range of KPSS Table 1');
  }
  // A bounded p-value lies strictly beyond its edge: below 0.01 rejects at any level in range,
  // above 0.10 rejects at none.
  const kpssRejects =
    kpss.p_bound === 'below' ? true : kpss.p_bound === 'above' ? false : kpss.p_value < significance;
  const adfRejects = adf.p_value < significance;
  const verdict = classify(kpssRejects, adfRejects);
  return {
    verdict,
    significance,
    kpss_rejects: kpssRejects,
    adf_rejects: adfRejects,
    summary: trendVerdictSummary(verdict, kpss, adf, significance),
  };
}

function classify(kpssRejects: boolean, adfRejects: boolean): TrendVerdictKind {
  if (kpssRejects) return adfRejects ? 'conflicting' : 'stochastic';
  return adfRejects ? 'deterministic' : 'inconclusive';
}
