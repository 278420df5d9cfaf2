// The seasonal part of a trend model, chosen from the data with the ARMA order, by AICc among
// the admissible fits (admissibility.ts), one model at a time. A seasonal part is
// (K, P, Q): K harmonic pairs for a fixed pattern (harmonics.ts; none on seasonal
// differences, which remove a fixed pattern) and seasonal AR and MA factors of orders P, Q
// for a pattern that drifts (seasonalArma.ts). All parts are fitted to the same response, so
// their AICc compare; whether the stochastic model differences seasonally changes the
// response, so the caller decides that (from the seasonal evidence) and AICc never does.
//
// Trying every part with every (p, q) would cost (K + 1)(P + 1)(Q + 1)(p + 1)(q + 1) fits, 448
// for a monthly series at the default limits, most with a state of dimension 13 to 16. The
// search goes in stages instead (our design, in the spirit of the stepwise search of
// Hyndman & Khandakar 2008, §3.2, from memory, which also moves from a small order to its
// neighbours):
//   1. at a small base order, (1, 1) within the limits: the number of harmonic pairs K* with
//      no seasonal factor (a state of dimension 2, cheap), then the seasonal factors with K*
//      pairs and with none; again at (1, 0) when that leaves only the plain part;
//   2. the (p, q) grid with the best part held (orderSearch.ts, neighbours' optima as starts);
//   3. the best part's neighbours at the grid's best (p, q): one harmonic pair more or fewer,
//      a seasonal factor added or dropped, the harmonics dropped; if one beats it, back to 2
//      with that part, at most `MAX_ROUNDS` times.
// The model is the admissible fit of lowest AICc among all fitted. The plain part (0, 0, 0)
// at (0, 0) is always fitted, so an admissible fit always exists.
import type { TrendModelKind } from '../base/settings.js';
import { admissibility, type InadmissibleReason } from './admissibility.js';
import { countObserved, fitRegressionArma, regressorsIdentified, type RegressionArmaFit } from './fitRegressionArma.js';
import { checkHarmonics } from './harmonics.js';
import { aicc, fitGrid, neighbourStarts, padStart, type Candidate, type GridFit } from './orderSearch.js';
import { designWorkspace, trendDesign, type TrendDesign } from './trendDesign.js';

/** Stage 3 sends the search back to stage 2 at most this many times. */
const MAX_ROUNDS = 3;

/** What a seasonal series lets the search try. */
export interface SeasonalSearchSpec {
  /** Observations per year s: 12 monthly, 4 quarterly. */
  period: number;
  /** Position in the year of the first observation: month − 1, or quarter − 1. */
  firstSeason: number;
  /** Stochastic model: seasonal differences instead of first differences (the deterministic model never differences). */
  seasonalDifferencing: boolean;
  /** Most harmonic pairs tried, 0..⌊s/2⌋. */
  maxHarmonics: number;
  /** Largest seasonal AR and MA orders tried (0 or 1 each). */
  maxSeasonalP: number;
  maxSeasonalQ: number;
}

/** A seasonal part: harmonic pairs and seasonal ARMA orders. */
export interface SeasonalChoice {
  harmonics: number;
  P: number;
  Q: number;
}

/** A candidate of the seasonal search: a nonseasonal order with its seasonal part. */
export interface SeasonalCandidate extends Candidate {
  P: number;
  Q: number;
  harmonics: number;
}

/**
 * The optimum (unconstrained parameters) of each candidate a search fitted, and the optimiser's
 * inverse Hessian there, by candidate: handed to a search on a series one observation longer
 * (the next backtest origin), whose fits then start there alone, with that curvature.
 */
export type CandidateOptima = Record<string, { x: Float64Array; inverseHessian: Float64Array }>;

export interface SeasonalSearchResult {
  best: RegressionArmaFit;
  /** Every candidate's optimum, for a warm search of a neighbouring series. */
  optima: CandidateOptima;
  bestAicc: number;
  /** The best fit's design (its harmonic pairs). */
  design: TrendDesign;
  choice: SeasonalChoice;
  /** Every fit made, in the order made. */
  candidates: SeasonalCandidate[];
  /** The converged fit of lowest AICc when it is not admissible and beats the selected one, else null. */
  setAside: { fit: RegressionArmaFit; aicc: number; reason: InadmissibleReason; choice: SeasonalChoice } | null;
  /**
   * A fixed part whose seasonal factors no admissible fit could carry: the factors asked for
   * and the reason of their best fit; the model then runs without them. Null otherwise.
   */
  droppedFactors: { P: number; Q: number; reason: InadmissibleReason } | null;
}

interface Entry {
  fit: RegressionArmaFit;
  choice: SeasonalChoice;
  candidate: SeasonalCandidate;
}

/**
 * A seasonal part fixed by the analyst: the (p, q) grid is still searched. The rules of the
 * search apply: the deterministic model never differences, and on seasonal differences the
 * stochastic model takes no harmonics (they would describe a pattern the differences removed).
 */
export interface FixedSeasonalPart extends SeasonalChoice {
  period: number;
  firstSeason: number;
  seasonalDifferencing: boolean;
}

/** The design of a model with a fixed seasonal part, under the search's rules. */
export function fixedPartDesign(kind: TrendModelKind, w: Float64Array, part: FixedSeasonalPart): { design: TrendDesign; choice: SeasonalChoice } {
  const seasonalDifferencing = kind === 'stochastic' && part.seasonalDifferencing;
  const harmonics = seasonalDifferencing ? 0 : part.harmonics;
  const design = trendDesign(kind, w, { period: part.period, firstSeason: part.firstSeason, harmonics, seasonalDifferencing });
  return { design, choice: { harmonics, P: part.P, Q: part.Q } };
}

/**
 * The (p, q) grid with a fixed seasonal part, in the form of the search's result. When no fit
 * with the fixed seasonal factors is admissible (the data push a factor to the unit circle,
 * say), the grid runs again without them, keeping the harmonics and the differencing, and the
 * result says which factors were dropped and why: an analyst's part is honoured where the data
 * allow, and a fit that may not be selected is never selected silently.
 */
export function searchWithSeasonalPart(kind: TrendModelKind, w: Float64Array, maxP: number, maxQ: number, part: FixedSeasonalPart): SeasonalSearchResult {
  const { design, choice } = fixedPartDesign(kind, w, part);
  if (!(choice.P === 0 || choice.P === 1) || !(choice.Q === 0 || choice.Q === 1)) throw new RangeError(`seasonal part: P and Q must be 0 or 1, got (${choice.P},${choice.Q})`);
  const differenced = kind === 'stochastic';
  const gridFor = (c: SeasonalChoice): Entry[] =>
    fitGrid(design.response, design.regressors, maxP, maxQ, {
      ...designWorkspace(design),
      differenced,
      ...(c.P + c.Q > 0 ? { seasonal: { period: part.period, P: c.P, Q: c.Q } } : {}),
    }).map((entry: GridFit) => ({ fit: entry.fit, choice: c, candidate: { ...entry.candidate, ...c } }));
  const held = gridFor(choice);
  if (held.some((entry) => entry.candidate.admissible)) return selectFrom(held, design, null);
  // The reason the best converged fit gives says most about the data; non-convergence only when nothing converged.
  const best = lowestAicc(held.filter((entry) => entry.candidate.converged)) ?? lowestAicc(held);
  const plain = { ...choice, P: 0, Q: 0 };
  return selectFrom([...held, ...gridFor(plain)], design, { P: choice.P, Q: choice.Q, reason: best?.candidate.reason ?? 'not-converged' });
}

function checkSeasonalSearchSpec(spec: SeasonalSearchSpec): void {
  checkHarmonics(spec.period, spec.maxHarmonics);
  for (const [name, value] of [['maxSeasonalP', spec.maxSeasonalP], ['maxSeasonalQ', spec.maxSeasonalQ]] as const) {
    if (!(value === 0 || value === 1)) throw new RangeError(`seasonal search: ${name} must be 0 or 1, got ${value}`);
  }
}

/** The seasonal parts the search tries for a model. */
function seasonalChoices(kind: TrendModelKind, spec: SeasonalSearchSpec): SeasonalChoice[] {
  const harmonicsTried = kind === 'stochastic' && spec.seasonalDifferencing ? 0 : spec.maxHarmonics;
  const choices: SeasonalChoice[] = [];
  for (let harmonics = 0; harmonics <= harmonicsTried; harmonics++) {
    for (let P = 0; P <= spec.maxSeasonalP; P++) for (let Q = 0; Q <= spec.maxSeasonalQ; Q++) choices.push({ harmonics, P, Q });
  }
  return choices;
}

/**
 * The search; with `warm`, the optima of the same search on a neighbouring series (the previous
 * backtest origin's window), each candidate fitted there starts from its optimum alone, run to
 * the end: a candidate's optimum moves little when one observation is added, and the stages
 * take the same path as a cold search's, so the search costs a fraction of a cold one. A
 * candidate not fitted there starts cold.
 */
export function searchSeasonalModel(kind: TrendModelKind, w: Float64Array, maxP: number, maxQ: number, spec: SeasonalSearchSpec, warm?: CandidateOptima): SeasonalSearchResult {
  checkSeasonalSearchSpec(spec);
  const seasonalDifferencing = kind === 'stochastic' && spec.seasonalDifferencing;
  const differenced = kind === 'stochastic';
  const designs = new Map<number, TrendDesign>();
  const designFor = (harmonics: number): TrendDesign => {
    let design = designs.get(harmonics);
    if (design === undefined) {
      design = trendDesign(kind, w, { period: spec.period, firstSeason: spec.firstSeason, harmonics, seasonalDifferencing });
      designs.set(harmonics, design);
    }
    return design;
  };
  const entries = new Map<string, Entry>();
  const entryAt = (choice: SeasonalChoice, p: number, q: number): Entry | undefined => entries.get(entryKey(choice, p, q));
  const record = (choice: SeasonalChoice, fit: RegressionArmaFit): Entry => {
    const design = designFor(choice.harmonics);
    const parameters = fit.order.p + fit.order.q + choice.P + choice.Q + design.regressors.length + 1;
    const value = aicc(fit.loglik, parameters, fit.nobs);
    const { admissible, reason } = admissibility(fit, differenced);
    const entry: Entry = {
      fit,
      choice,
      candidate: { p: fit.order.p, q: fit.order.q, P: choice.P, Q: choice.Q, harmonics: choice.harmonics, loglik: fit.loglik, aicc: value, converged: fit.converged, admissible, reason },
    };
    entries.set(entryKey(choice, fit.order.p, fit.order.q), entry);
    return entry;
  };
  // A harmonic count whose columns the observed values cannot tell apart (a season never observed) is not tried.
  const identified = new Map<number, boolean>();
  const fits = (choice: SeasonalChoice, p: number, q: number): boolean => {
    const design = designFor(choice.harmonics);
    if (countObserved(design.response) - (p + q + choice.P + choice.Q + design.regressors.length + 1) - 1 <= 0) return false;
    let known = identified.get(choice.harmonics);
    if (known === undefined) {
      known = regressorsIdentified(design.response, design.regressors);
      identified.set(choice.harmonics, known);
    }
    return known;
  };
  /**
   * One fit at (p, q), started from its neighbours already fitted: the same part's smaller
   * orders (orderSearch.ts's starts: padded, and with a common factor), the same harmonics with
   * a seasonal factor fewer (padded, they reproduce that fit exactly), and the same seasonal
   * orders with one harmonic pair fewer.
   */
  const fitAt = (choice: SeasonalChoice, p: number, q: number): Entry | undefined => {
    const known = entryAt(choice, p, q);
    if (known !== undefined) return known;
    if (!fits(choice, p, q)) return undefined;
    const neighbours = [
      { ...choice, P: choice.P - 1 },
      { ...choice, Q: choice.Q - 1 },
      { ...choice, P: choice.P - 1, Q: choice.Q - 1 },
      { ...choice, harmonics: choice.harmonics - 1 },
    ].filter((c) => c.P >= 0 && c.Q >= 0 && c.harmonics >= 0);
    const starts = [
      ...neighbourStarts((a, b) => entryAt(choice, a, b)?.fit, p, q),
      ...neighbours
        .map((c) => entryAt(c, p, q))
        .filter((entry): entry is Entry => entry !== undefined)
        .map((entry) => padStart(entry.fit, p, q, choice.P, choice.Q)),
    ];
    const design = designFor(choice.harmonics);
    const near = warm?.[entryKey(choice, p, q)];
    const fit = fitRegressionArma(design.response, design.regressors, p, q, {
      ...designWorkspace(design),
      seasonal: { period: spec.period, P: choice.P, Q: choice.Q },
      ...(near === undefined ? { starts } : { starts: [near.x], startsOnly: true, curvature: near.inverseHessian }),
    });
    return record(choice, fit);
  };
  const bestOf = (candidates: readonly (Entry | undefined)[]): Entry | undefined => {
    let best: Entry | undefined;
    for (const entry of candidates) {
      if (entry !== undefined && entry.candidate.admissible && entry.candidate.aicc < (best?.candidate.aicc ?? Number.POSITIVE_INFINITY)) best = entry;
    }
    return best;
  };

  const choices = seasonalChoices(kind, spec);
  const allowed = (c: SeasonalChoice): boolean => choices.some((other) => sameChoice(other, c));
  const plain = choices[0];
  fitAt(plain, 0, 0);
  const baseP = Math.min(1, maxP);
  const baseQ = Math.min(1, maxQ);
  // Stage 1.
  // A part at the base order is started from its own (0, 0) fit too (with a common factor), as
  // the grid would start it: on US accidental deaths' first differences the plain (1, 1) has
  // maxima at −568.8, −566.9 and −564.5, and only those starts find the upper two. The parts are
  // then compared by their better admissible fit of the two: a base order whose best fits sit on
  // the unit circle for the good parts would otherwise hand stage 2 a poor one (UK gas's
  // deterministic trend: a seasonal MA part at −107 instead of a seasonal AR part at −170).
  const atBase = (c: SeasonalChoice, p: number, q: number): Entry | undefined => {
    const smallest = p > 0 && q > 0 ? fitAt(c, 0, 0) : undefined;
    return bestOf([smallest, fitAt(c, p, q)]) ?? entryAt(c, p, q);
  };
  const stageOne = (p: number, q: number): Entry | undefined => {
    const harmonicsBest = bestOf(choices.filter((c) => c.P + c.Q === 0).map((c) => atBase(c, p, q)))?.choice.harmonics ?? 0;
    const factorsFirst = choices.filter((c) => c.P + c.Q > 0 && (c.harmonics === harmonicsBest || c.harmonics === 0));
    return bestOf([...factorsFirst, ...choices.filter((c) => c.P + c.Q === 0)].map((c) => atBase(c, p, q)));
  };
  let first = stageOne(baseP, baseQ);
  // On a series whose trend is a fixed line, the differenced model's MA term at the base order
  // undoes the differencing for some seasonal parts (often every part with harmonics), which
  // leaves only the others admissible there; a pure AR base order cannot undo it, so when any
  // part was set aside for that reason the parts are compared there too.
  const undone = choices.some((c) => entryAt(c, baseP, baseQ)?.candidate.reason === 'undoes-differencing');
  if (baseQ > 0 && (first === undefined || sameChoice(first.choice, plain) || undone)) {
    const second = stageOne(baseP, 0);
    if (second !== undefined && (first === undefined || second.candidate.aicc < first.candidate.aicc)) first = second;
  }
  let choice = first?.choice ?? plain;
  // A part's grid runs once, every order with its neighbours' optima as starts, even where an
  // earlier stage fitted that order already: those fits had fewer starts (US accidental deaths
  // had candidates 2 log-likelihood units below statsmodels' until the grid refitted them), so
  // each candidate keeps the better of its fits.
  const gridded = new Set<string>();
  for (let round = 0; round < MAX_ROUNDS; round++) {
    // Stage 2.
    if (warm !== undefined) {
      // Warm, the grid's refits would start from the same optima: each order is fitted once.
      for (let p = 0; p <= maxP; p++) for (let q = 0; q <= maxQ; q++) fitAt(choice, p, q);
    } else if (!gridded.has(entryKey(choice, 0, 0))) {
      gridded.add(entryKey(choice, 0, 0));
      const design = designFor(choice.harmonics);
      const grid = fitGrid(design.response, design.regressors, maxP, maxQ, {
        ...designWorkspace(design),
        differenced,
        seasonal: { period: spec.period, P: choice.P, Q: choice.Q },
      });
      for (const { fit } of grid) {
        const earlier = entryAt(choice, fit.order.p, fit.order.q);
        if (earlier === undefined || betterFit(fit, earlier.fit)) record(choice, fit);
      }
    }
    const orders = Array.from({ length: (maxP + 1) * (maxQ + 1) }, (_, i) => entryAt(choice, Math.floor(i / (maxQ + 1)), i % (maxQ + 1)));
    const gridBest = bestOf(orders);
    if (gridBest === undefined) break;
    // Stage 3.
    const { p, q } = gridBest.fit.order;
    const next = bestOf([choice, ...neighbourChoices(choice)].filter(allowed).map((c) => fitAt(c, p, q)));
    if (next === undefined || sameChoice(next.choice, choice)) break;
    choice = next.choice;
  }
  const all = [...entries.values()];
  const best = bestOf(all);
  if (best === undefined) throw new Error('searchSeasonalModel: no admissible fit, not even the plain (0, 0)');
  return { ...resultOf(all, best), design: designFor(best.choice.harmonics), droppedFactors: null };
}

/** The fit of lowest AICc among `entries` (any admissibility), or undefined. */
function lowestAicc(entries: readonly Entry[]): Entry | undefined {
  let best: Entry | undefined;
  for (const entry of entries) if (entry.candidate.aicc < (best?.candidate.aicc ?? Number.POSITIVE_INFINITY)) best = entry;
  return best;
}

/** The admissible entry of lowest AICc, and the inadmissible one that beat it, as a search result (one design). */
function selectFrom(entries: readonly Entry[], design: TrendDesign, droppedFactors: SeasonalSearchResult['droppedFactors']): SeasonalSearchResult {
  let best: Entry | undefined;
  for (const entry of entries) {
    if (entry.candidate.admissible && entry.candidate.aicc < (best?.candidate.aicc ?? Number.POSITIVE_INFINITY)) best = entry;
  }
  // The (0, 0) fit without seasonal factors has nothing to be inadmissible about.
  if (best === undefined) throw new Error('searchWithSeasonalPart: no admissible fit, not even the plain (0, 0)');
  return { ...resultOf(entries, best), design, droppedFactors };
}

/** The search's result for the selected entry: candidates in order, and the best inadmissible fit that beat it. */
function resultOf(entries: readonly Entry[], best: Entry): Omit<SeasonalSearchResult, 'design' | 'droppedFactors'> {
  let setAside: Entry | undefined;
  for (const entry of entries) {
    const { reason, aicc: value } = entry.candidate;
    if (reason !== null && reason !== 'not-converged' && value < best.candidate.aicc && value < (setAside?.candidate.aicc ?? Number.POSITIVE_INFINITY)) setAside = entry;
  }
  const optima: CandidateOptima = {};
  for (const entry of entries) optima[entryKey(entry.choice, entry.fit.order.p, entry.fit.order.q)] = { x: entry.fit.unconstrained, inverseHessian: entry.fit.inverseHessian };
  return {
    best: best.fit,
    optima,
    bestAicc: best.candidate.aicc,
    choice: best.choice,
    candidates: entries.map((entry) => entry.candidate),
    setAside:
      setAside === undefined || setAside.candidate.reason === null
        ? null
        : { fit: setAside.fit, aicc: setAside.candidate.aicc, reason: setAside.candidate.reason, choice: setAside.choice },
  };
}

/** Whether a second fit of one candidate beats the first: converged where the first is not, or a higher log-likelihood. */
function betterFit(fit: RegressionArmaFit, than: RegressionArmaFit): boolean {
  if (fit.converged !== than.converged) return fit.converged;
  return fit.loglik > than.loglik;
}

/** A part's neighbours: a harmonic pair more or fewer, a seasonal factor added or dropped, no harmonics. */
function neighbourChoices(choice: SeasonalChoice): SeasonalChoice[] {
  const { harmonics, P, Q } = choice;
  return [
    { harmonics: harmonics + 1, P, Q },
    { harmonics: harmonics - 1, P, Q },
    { harmonics: 0, P, Q },
    { harmonics, P: 1 - P, Q },
    { harmonics, P, Q: 1 - Q },
  ].filter((c) => c.harmonics >= 0 && !sameChoice(c, choice));
}

function sameChoice(a: SeasonalChoice, b: SeasonalChoice): boolean {
  return a.harmonics === b.harmonics && a.P === b.P && a.Q === b.Q;
}

function entryKey(choice: SeasonalChoice, p: number, q: number): string {
  return `${choice.harmonics},${choice.P},${choice.Q},${p},${q}`;
}
