// The consistency check's own words: the phrases it looks for in a memo (kept here beside the
// sentences that print them, so a rewording shows up in one diff) and its reports.
import { MODEL_GLOSS } from '../wording.js';
import { evidenceWording } from '../evidenceWording.js';

export const consistencyWording = {
  /** The claim the stochastic trend's gloss makes. */
  growthClaim: MODEL_GLOSS.stochastic.slice(MODEL_GLOSS.stochastic.indexOf('uncertainty grows')),
  /** The start of the sentence that says the two models agree. */
  agreementMark: evidenceWording.modelsAgree('').slice(0, 40),
  problem: (series: string, problem: string) => `series ${series}: ${problem}`,
  significance: (p: string, claim: string, level: string) => `${p} is called ${claim} at ${level}%`,
  unknownPeriod: (period: string, level: string) => `a width comparison names ${period} at ${level}%, which the record does not forecast`,
  narrower: (period: string, claimed: string, actual: number) => `at ${period} the memo says ${claimed}% narrower; the record gives ${actual.toFixed(1)}%`,
  noGrowth: (growth: number) => `the memo says the stochastic trend's uncertainty grows with the horizon, but its interval at the last horizon is ${growth.toFixed(3)} times the first`,
  agreementUnsaid: (ratio: number) => `the two models' intervals at the end of the horizon are within 2% (ratio ${ratio.toFixed(3)}), and the memo does not say so`,
};
