// The joint forecast-error covariance across horizons (src/statespace/forecastCovariance.ts):
// - its diagonal is the forecast variances the memo's intervals use (forecast.ts), process part
//   and total, for every case of the seasonal and plain reference sets, gaps included;
// - its off-diagonals against statsmodels 0.13.5 SARIMAX's state space (Z T^(j−i) P_{n+i} Z'
//   from the library's own matrices and predicted covariances) and against the dense Gaussian
//   conditional covariance with GLS coefficients (autocovariances from statsmodels'
//   arma_acovf), computed once outside the tests (test/fixtures/forecast-covariance/,
//   provenance in test/fixtures/README.md);
// - a random walk with drift against its algebra.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import type { TrendModelKind } from '../../src/base/settings.js';
import { designForecastCovariance } from '../../src/models/jointForecast.js';
import { expandedCoefficients, plainOrder } from '../../src/models/seasonalArma.js';
import { filterDesign, forecastDesign, trendDesign, type TrendDesign } from '../../src/models/trendModels.js';
import { forecastCovariance } from '../../src/statespace/forecastCovariance.js';
import { expectRelative } from '../evidence/expectRelative.js';

interface CovarianceCase {
  id: string;
  /** Relative to test/fixtures/. */
  data: string;
  transform: 'none' | 'log';
  kind: TrendModelKind;
  missing: number[];
  period: number;
  first_season: number;
  harmonics: number;
  seasonalDifferencing: boolean;
  p: number;
  q: number;
  P: number;
  Q: number;
  ar: number[];
  ma: number[];
  seasonal_ar: number[];
  seasonal_ma: number[];
  beta: number[];
  cov_beta: number[];
  sigma2: number;
  horizon: number;
}
interface ReferenceCase {
  id: string;
  statsmodels_process: number[][];
  dense: { process: number[][]; total: number[][] } | null;
}

const fixture = (path: string): string => readFileSync(new URL(`../fixtures/${path}`, import.meta.url), 'utf8');
const inputs = JSON.parse(fixture('forecast-covariance/cases.json')) as { cases: CovarianceCase[] };
const reference = JSON.parse(fixture('forecast-covariance/statsmodels-covariance.json')) as { cases: ReferenceCase[] };

function modelScale(c: CovarianceCase): Float64Array {
  const values = fixture(c.data).trim().split('\n').slice(1).map((line) => Number(line.split(',')[1]));
  return Float64Array.from(values, (v, t) => (c.missing.includes(t + 1) ? Number.NaN : c.transform === 'log' ? Math.log(v) : v));
}

function atStoredParameters(c: CovarianceCase): { design: TrendDesign; input: Parameters<typeof forecastDesign>[1] } {
  const seasonality = c.period === 1 ? undefined : { period: c.period, firstSeason: c.first_season, harmonics: c.harmonics, seasonalDifferencing: c.seasonalDifferencing };
  const design = trendDesign(c.kind, modelScale(c), seasonality);
  const order = c.P + c.Q === 0 ? plainOrder(c.p, c.q) : { p: c.p, q: c.q, P: c.P, Q: c.Q, period: c.period };
  const { ar, ma } = expandedCoefficients(
    { ar: Float64Array.from(c.ar), ma: Float64Array.from(c.ma), seasonalAr: Float64Array.from(c.seasonal_ar), seasonalMa: Float64Array.from(c.seasonal_ma) },
    order,
  );
  return { design, input: { ar, ma, beta: c.beta, covBeta: c.cov_beta, sigma2: c.sigma2, ...filterDesign(design, ar, ma) } };
}

/**
 * Entry by entry within `tolerance` of the reference's scale there, √(C_ii C_jj) (an entry that
 * is zero by structure, two seasons that share no shock, is then compared with its scale).
 */
function expectCovariance(ours: Float64Array, expected: number[][], tolerance: number): void {
  const size = expected.length;
  for (let i = 0; i < size; i++) {
    for (let j = 0; j < size; j++) {
      const scale = Math.sqrt(expected[i][i] * expected[j][j]);
      expect(Math.abs(ours[i * size + j] - expected[i][j]), `(${i + 1}, ${j + 1}): ${ours[i * size + j]} vs ${expected[i][j]}`).toBeLessThanOrEqual(tolerance * scale);
    }
  }
}

describe.each(inputs.cases)('forecast covariance: $id', (c) => {
  const { design, input } = atStoredParameters(c);
  const covariance = designForecastCovariance(design, input, { first: 1, last: c.horizon });
  const size = c.horizon;

  it('has the forecast variances on its diagonal, process part and total', () => {
    const moments = forecastDesign(design, input, c.horizon);
    for (let h = 0; h < size; h++) {
      // The same quantities by forecast.ts's structured recursions (common practice: two implementations agree).
      expectRelative(covariance.process[h * size + h], moments.seProcess[h] ** 2, 1e-12);
      expectRelative(covariance.total[h * size + h], moments.seTotal[h] ** 2, 1e-12);
    }
  });

  it("matches statsmodels SARIMAX's covariance of the process part at every pair of horizons", () => {
    const sm = reference.cases.find((r) => r.id === c.id);
    if (sm === undefined) throw new Error(`no reference for ${c.id}`);
    // statsmodels 0.13.5: Z T^(j−i) P_{n+i|n} Z' from the filter of the extended sample (forecastCovariance.py).
    expectCovariance(covariance.process, sm.statsmodels_process, 1e-11);
    if (sm.dense === null) return;
    // The dense conditional Gaussian covariance with GLS coefficients (numpy, arma_acovf from statsmodels 0.13.5).
    expectCovariance(covariance.process, sm.dense.process, 1e-11);
    expectCovariance(covariance.total, sm.dense.total, 1e-11);
  });
});

describe('forecast covariance by algebra', () => {
  it('a random walk with drift: Cov(e_i, e_j) = σ²·min(i, j) + i·j·Var(ĉ)', () => {
    // Levels y_{n+h} = y_n + h·c + ε_{n+1} + … + ε_{n+h}, so the process errors share min(i, j)
    // shocks and the drift's error enters h times (common practice; Box, Jenkins & Reinsel 2008, §5.2).
    const sigma2 = 2.5;
    const varianceOfDrift = 0.04;
    const horizon = 12;
    const input = { ar: [], ma: [], beta: [0.3], covBeta: [varianceOfDrift], sigma2, finalState: [Float64Array.of(0), Float64Array.of(0)], finalCovariance: Float64Array.of(1) };
    const rows = Array.from({ length: horizon }, () => [1]);
    const { process, total } = forecastCovariance(input, rows, { first: 1, last: horizon }, { integrate: { lastLevel: 10 } });
    for (let i = 1; i <= horizon; i++) {
      for (let j = 1; j <= horizon; j++) {
        expectRelative(process[(i - 1) * horizon + j - 1], sigma2 * Math.min(i, j), 1e-14);
        expectRelative(total[(i - 1) * horizon + j - 1], sigma2 * Math.min(i, j) + i * j * varianceOfDrift, 1e-14);
      }
    }
    // The year's total: Var(Σ e_h) = σ² Σ_k k² + (Σ h)² Var(ĉ) = 650σ² + 78²·Var(ĉ) at 12 months.
    const sum = Array.from(total).reduce((a, b) => a + b, 0);
    expectRelative(sum, 650 * sigma2 + 78 * 78 * varianceOfDrift, 1e-14);
  });

  it('a window that starts later is the matching block of the full matrix', () => {
    const c = inputs.cases.find((x) => x.seasonalDifferencing && x.missing.length > 0) ?? inputs.cases[0];
    const { design, input } = atStoredParameters(c);
    const full = designForecastCovariance(design, input, { first: 1, last: c.horizon });
    const block = designForecastCovariance(design, input, { first: 3, last: c.horizon });
    const m = c.horizon - 2;
    for (let i = 0; i < m; i++) for (let j = 0; j < m; j++) expect(block.total[i * m + j]).toBe(full.total[(i + 2) * c.horizon + j + 2]);
  });
});
