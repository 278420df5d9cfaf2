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
  /** The year sentences of yearWording.ts: the summary's figure, the horizon that stops short, the method note. */
  yearSentence: /(\d{4}) as a whole \(the (total|average) of its (\d+) (?:month|quarter)s\): (\S+) under the (deterministic|stochastic)-trend model(?: \([^)]*\))?, ([0-9.]+)% interval (\S+) to (\S+?)\.(?=\s|$)/g,
  yearHorizonShort: /The forecast horizon ends at (\S+), before (\d{4}) is complete/g,
  yearNote:
    /The figure for (\d{4}) on the first page is the (total|average) of its \d+ (?:month|quarter)s: (\S+) under the deterministic trend and (\S+) under the stochastic trend\. .*?Had the (?:month|quarter)s been taken as independent, the (?:total|average)\u2019s standard deviation would be (\S+)% of the one used under the deterministic trend and (\S+)% under the stochastic trend(: the errors of later)?/g,
  yearSimulationError: /another seed would move the interval\u2019s ends by up to (\S+)% of its half-width/g,
  yearSimulationWrong: (said: string) => `the memo puts the simulation's error at ${said}% of the interval's half-width, which is not the record's`,
  yearFigure: (year: string, model: string, said: string) => `the memo gives ${said} for ${year} under the ${model} trend, which is not the record's figure`,
  yearWithoutFigure: (year: string) => `the memo gives a figure for ${year}, for which the record has none`,
  yearNotShort: (year: string, end: string) => `the memo says the horizon ends at ${end}, before ${year} is complete, which the record does not say`,
  yearNoteWrong: (year: string) => `the note on the figure for ${year} does not agree with the record's figures`,
  yearUnsaid: (year: string, available: boolean) =>
    available ? `the record has a figure for ${year} and the summary does not give the recommended model's` : `the horizon stops inside ${year} and the summary does not say so`,
  agreementUnsaid: (ratio: number) => `the two models' intervals at the end of the horizon are within 2% (ratio ${ratio.toFixed(3)}), and the memo does not say so`,
};
