// The seasonal search (src/models/seasonalSearch.ts) on two seasonal open datasets
// (test/fixtures/seasonal-models/, provenance in test/fixtures/README.md) and a seeded series:
// what it selects follows its rule (the admissible candidate of lowest AICc among those it
// fitted, AICc counted as orderSearch.ts defines it), every candidate it fits reaches the
// likelihood statsmodels' SARIMAX reaches for it (test/fixtures/seasonal-search/, the
// exhaustive search over every candidate), what the model reports follows from the selection,
// and a fixed pattern put into a series comes back out.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import type { TrendModelKind } from '../../src/base/settings.js';
import { aicc } from '../../src/models/orderSearch.js';
import { harmonicColumnCount } from '../../src/models/harmonics.js';
import { fitTrendModel, minimumObservations, type SeasonalSearchSpec, type TrendModelFit } from '../../src/models/trendModels.js';
import { seededNormals } from '../evidence/seededNormals.js';

function readSeries(file: string, log: boolean): Float64Array {
  const text = readFileSync(new URL(`../fixtures/seasonal-models/${file}`, import.meta.url), 'utf8');
  return Float64Array.from(text.trim().split('\n').slice(1).map((line) => Number(line.split(',')[1])), (v) => (log ? Math.log(v) : v));
}

interface ExhaustiveCandidate {
  K: number;
  p: number;
  q: number;
  P: number;
  Q: number;
  loglik: number;
}
/** statsmodels 0.13.5 SARIMAX fits of every candidate (test/fixtures/seasonal-search/exhaustiveSearch.py). */
const exhaustive = JSON.parse(readFileSync(new URL('../fixtures/seasonal-search/exhaustive-search.json', import.meta.url), 'utf8')) as {
  results: { data: string; model: 'deterministic' | 'first-differences' | 'seasonal-differences'; candidates: ExhaustiveCandidate[] }[];
};

function spec(period: number, seasonalDifferencing: boolean): SeasonalSearchSpec {
  return { period, firstSeason: 0, seasonalDifferencing, maxHarmonics: period / 2, maxSeasonalP: 1, maxSeasonalQ: 1 };
}

const MODELS: [string, TrendModelKind, boolean, 'deterministic' | 'first-differences' | 'seasonal-differences'][] = [
  ['deterministic', 'deterministic', false, 'deterministic'],
  ['stochastic on first differences', 'stochastic', false, 'first-differences'],
  ['stochastic on seasonal differences', 'stochastic', true, 'seasonal-differences'],
];
const SERIES: [string, Float64Array, number][] = [
  ['us-accidental-deaths.csv', readSeries('us-accidental-deaths.csv', false), 12],
  ['uk-gas.csv', readSeries('uk-gas.csv', true), 4],
];

describe.each(SERIES)('seasonal search on %s', (file, w, period) => {
  describe.each(MODELS)('%s', (_model, kind, seasonalDifferencing, reference) => {
    const model: TrendModelFit = fitTrendModel(kind, w, 3, 3, { estimation: 'ml', seasonal: spec(period, seasonalDifferencing) });
    const seasonal = model.seasonal;
    const regression = (harmonics: number): number => (kind === 'deterministic' ? 2 : 1) + harmonicColumnCount(period, harmonics);
    const observations = w.length - (kind === 'deterministic' ? 0 : seasonalDifferencing ? period : 1);

    it('selects the admissible candidate of lowest AICc, each AICc counted from its parameters', () => {
      expect(seasonal).not.toBeNull();
      for (const c of model.candidates) {
        // Hurvich & Tsai (1989): k = p + q + P + Q + regression coefficients + 1.
        const k = c.p + c.q + c.P + c.Q + regression(c.harmonics) + 1;
        expect(c.aicc).toBe(aicc(c.loglik, k, observations));
        if (c.admissible) expect(model.aicc).toBeLessThanOrEqual(c.aicc);
      }
      const selected = model.candidates.filter((c) => c.admissible && c.aicc === model.aicc);
      expect(selected).toHaveLength(1);
      const [chosen] = selected;
      expect([chosen.p, chosen.q, chosen.P, chosen.Q, chosen.harmonics]).toEqual([model.fit.order.p, model.fit.order.q, model.fit.order.P, model.fit.order.Q, seasonal?.harmonics]);
      // The plain candidate is always fitted, so an admissible one always exists.
      expect(model.candidates.some((c) => c.p + c.q + c.P + c.Q + c.harmonics === 0 && c.admissible)).toBe(true);
      if (seasonalDifferencing) expect(model.candidates.every((c) => c.harmonics === 0)).toBe(true);
    });

    it("reaches statsmodels' log-likelihood for every candidate it fits", () => {
      const sm = exhaustive.results.find((r) => r.data === file && r.model === reference);
      if (sm === undefined) throw new Error(`no exhaustive reference for ${file} ${reference}`);
      for (const c of model.candidates) {
        const row = sm.candidates.find((r) => r.K === c.harmonics && r.p === c.p && r.q === c.q && r.P === c.P && r.Q === c.Q);
        expect(row, `${c.harmonics} (${c.p},${c.q})(${c.P},${c.Q})`).toBeDefined();
        // statsmodels 0.13.5 SARIMAX fit(method='lbfgs'), best of two starts; a correct engine reaches at least its value − 1e-3 (the convention of the shared reference fits).
        expect(c.loglik, `${c.harmonics} (${c.p},${c.q})(${c.P},${c.Q})`).toBeGreaterThanOrEqual((row?.loglik ?? Number.POSITIVE_INFINITY) - 1e-3);
      }
    });

    it('reports the selection: orders, coefficients, standard errors and what was set aside', () => {
      const { fit } = model;
      expect(fit.converged).toBe(true);
      expect(fit.p).toBe(fit.order.p + period * fit.order.P);
      expect(fit.q).toBe(fit.order.q + period * fit.order.Q);
      expect(Object.keys(model.coefficients)).toHaveLength(regression(seasonal?.harmonics ?? 0));
      expect(model.stderr.seasonalAr).toHaveLength(fit.order.P);
      expect(model.stderr.seasonalMa).toHaveLength(fit.order.Q);
      expect(model.seasonal?.pattern === null).toBe((seasonal?.harmonics ?? 0) === 0);
      if (model.setAside !== undefined) {
        expect(model.setAside.aicc).toBeLessThan(model.aicc);
        expect(model.setAside.reason).not.toBe('not-converged');
        expect(model.candidates.some((c) => c.aicc === model.setAside?.aicc && !c.admissible)).toBe(true);
      }
    });
  });
});

describe('seasonal search on a seeded series with a fixed pattern', () => {
  // 10 years of monthly data: a trend, the pattern 3·cos(2πm/12) + 1.5·sin(4πm/12) by month m,
  // and AR(1) noise with φ = 0.5 and unit shocks.
  const draw = seededNormals(20261202);
  let eta = 0;
  const truth = Array.from({ length: 12 }, (_, m) => 3 * Math.cos((2 * Math.PI * m) / 12) + 1.5 * Math.sin((4 * Math.PI * m) / 12));
  const w = Float64Array.from({ length: 120 }, (_, t) => {
    eta = 0.5 * eta + draw();
    return 50 + 0.1 * (t + 1) + truth[t % 12] + eta;
  });
  const model = fitTrendModel('deterministic', w, 2, 2, { estimation: 'ml', seasonal: spec(12, false) });

  it('finds harmonics and recovers the pattern within three standard errors of a month mean', () => {
    expect(model.seasonal?.harmonics).toBeGreaterThanOrEqual(2);
    const pattern = model.seasonal?.pattern ?? [];
    expect(pattern).toHaveLength(12);
    // Ten observations per month with AR(1) noise of variance 1/(1 − 0.25): a month's mean has a
    // standard error of about √(1.33·3/10) = 0.63 (the AR(1) long-run factor (1 + φ)/(1 − φ) = 3 over its variance; common practice).
    pattern.forEach((value, m) => expect(Math.abs(value - truth[m])).toBeLessThan(3 * 0.63));
  });
});

describe('a seasonal part fixed by the analyst', () => {
  const w = readSeries('uk-gas.csv', true);
  const part = { period: 4, firstSeason: 0, harmonics: 2, P: 0, Q: 1, seasonalDifferencing: true };

  it('holds the part and searches the (p, q) grid only', () => {
    const model = fitTrendModel('deterministic', w, 3, 3, { estimation: 'ml', seasonal: part });
    // The deterministic model never differences, so it keeps the two harmonic pairs.
    expect(model.seasonal).toMatchObject({ harmonics: 2, P: 0, Q: 1, seasonalDifferencing: false });
    expect(model.candidates).toHaveLength(16);
    expect(model.candidates.every((c) => c.harmonics === 2 && c.P === 0 && c.Q === 1)).toBe(true);
    expect(model.aicc).toBe(Math.min(...model.candidates.filter((c) => c.admissible).map((c) => c.aicc)));
  });

  it('drops seasonal factors no admissible fit can carry, says so, and keeps the rest of the part', () => {
    // Nottingham temperatures have a fixed pattern: on first differences a seasonal AR and MA pair
    // runs to the unit circle (Φ → 1) at every (p, q) ≤ (1, 1). (0,1)(1,1) also takes its MA root
    // to 1, undoing the differences; whether the optimiser declares convergence on that boundary
    // turns on its last digits, so the reason given is that fit's, or the Φ → 1 of the next best.
    const temperature = readSeries('nottingham-temperature.csv', false);
    const model = fitTrendModel('stochastic', temperature, 1, 1, {
      estimation: 'ml',
      seasonal: { period: 12, firstSeason: 0, harmonics: 0, P: 1, Q: 1, seasonalDifferencing: false },
    });
    expect(model.seasonal).toMatchObject({ P: 0, Q: 0, droppedFactors: { P: 1, Q: 1 } });
    expect(['undoes-differencing', 'ar-unit-root']).toContain(model.seasonal?.droppedFactors?.reason);
    const held = model.candidates.filter((c) => c.P === 1 && c.Q === 1);
    expect(held).toHaveLength(4);
    expect(held.every((c) => !c.admissible)).toBe(true);
    expect(model.candidates.filter((c) => c.P === 0 && c.Q === 0)).toHaveLength(4);
  });

  it('takes no harmonics on seasonal differences, which remove a fixed pattern', () => {
    const model = fitTrendModel('stochastic', w, 1, 1, { estimation: 'ml', seasonal: part });
    expect(model.seasonal).toMatchObject({ harmonics: 0, P: 0, Q: 1, seasonalDifferencing: true });
    expect(Object.keys(model.coefficients)).toEqual(['drift']);
    expect(model.design.response).toHaveLength(w.length - 4);
  });
});

describe('seasonal search inputs', () => {
  const w = readSeries('uk-gas.csv', true);
  it('refuses seasonal factors beyond order 1 and harmonics beyond s/2 (a defect in the caller)', () => {
    expect(() => fitTrendModel('deterministic', w, 1, 1, { seasonal: { ...spec(4, false), maxSeasonalP: 2 } })).toThrow(/maxSeasonalP must be 0 or 1/);
    expect(() => fitTrendModel('deterministic', w, 1, 1, { seasonal: { ...spec(4, false), maxHarmonics: 3 } })).toThrow(/take 0..2 pairs/);
  });

  it('counts the observations a seasonal order needs, seasonal differences losing a year', () => {
    // k = p + q + P + Q + regression + 1 and m > k + 1 (AICc); m = n − s on seasonal differences.
    expect(minimumObservations('deterministic', 1, 1, { period: 12, P: 1, Q: 1, harmonics: 6, seasonalDifferencing: false })).toBe(1 + 1 + 2 + 13 + 1 + 2);
    expect(minimumObservations('stochastic', 1, 1, { period: 12, P: 1, Q: 1, harmonics: 0, seasonalDifferencing: true })).toBe(1 + 1 + 2 + 1 + 1 + 2 + 12);
    expect(minimumObservations('stochastic', 1, 1)).toBe(1 + 1 + 1 + 1 + 2 + 1);
  });
});

describe('a season never observed', () => {
  // Five years of seeded monthly data with every February of the first three missing: on the
  // first 30 months the twelve-month design is not identified (common practice: a dummy or
  // harmonic set needs each season observed), so the search leaves out the harmonic counts the
  // observed months cannot carry instead of failing.
  const draw = seededNormals(7);
  let eta = 0;
  const w = Float64Array.from({ length: 60 }, (_, t) => {
    eta = 0.5 * eta + draw();
    const missing = t % 12 === 1 && t < 36;
    return missing ? Number.NaN : 50 + 0.2 * t + 5 * Math.cos((2 * Math.PI * (t % 12)) / 12) + eta;
  });

  it('searches the window without the harmonic counts it cannot identify', () => {
    const model = fitTrendModel('deterministic', w.slice(0, 30), 1, 1, { estimation: 'ml', seasonal: spec(12, false) });
    // With eleven months observed, the full set of six pairs (twelve columns with the intercept) is out of reach.
    expect(model.candidates.every((c) => c.harmonics < 6)).toBe(true);
    expect(model.candidates.some((c) => c.harmonics > 0)).toBe(true);
  });
});
