// The published tables behind the p-values and critical values.
import { describe, expect, it } from 'vitest';
import { kpssCritical, kpssPValue } from '../../src/evidence/kpssTable.js';
import { mackinnonCritical } from '../../src/evidence/mackinnonCritical.js';
import { mackinnonPValue } from '../../src/evidence/mackinnonPValue.js';
import { expectRelative } from './expectRelative.js';

describe('KPSS Table 1 (Kwiatkowski, Phillips, Schmidt & Shin 1992)', () => {
  it('level-stationarity critical values 0.347, 0.463, 0.574, 0.739 at 10%, 5%, 2.5%, 1%', () => {
    expect(kpssCritical('level')).toEqual({ '10': 0.347, '5': 0.463, '2.5': 0.574, '1': 0.739 });
  });

  it('trend-stationarity critical values 0.119, 0.146, 0.176, 0.216 at 10%, 5%, 2.5%, 1%', () => {
    expect(kpssCritical('trend')).toEqual({ '10': 0.119, '5': 0.146, '2.5': 0.176, '1': 0.216 });
  });

  it('a statistic equal to a table entry gets that entry’s size, with no bound', () => {
    expect(kpssPValue(0.463, 'level')).toEqual({ p_value: 0.05 });
    expect(kpssPValue(0.176, 'trend')).toEqual({ p_value: 0.025 });
    expect(kpssPValue(0.119, 'trend')).toEqual({ p_value: 0.1 });
    expect(kpssPValue(0.739, 'level')).toEqual({ p_value: 0.01 });
  });

  it('interpolates linearly between entries', () => {
    // Halfway between 0.146 (5%) and 0.176 (2.5%) in Table 1 is 3.75%.
    expectRelative(kpssPValue(0.161, 'trend').p_value, 0.0375, 1e-12);
  });

  it('reports the table edge with a bound outside the table', () => {
    expect(kpssPValue(0.2, 'level')).toEqual({ p_value: 0.1, p_bound: 'above' });
    expect(kpssPValue(0.3, 'trend')).toEqual({ p_value: 0.01, p_bound: 'below' });
  });
});

describe('MacKinnon (2010) critical values', () => {
  // MacKinnon (2010), Table 2 response surfaces evaluated at T = 100, to the 4 decimals the
  // paper's users quote (from memory; they agree with statsmodels 0.13.5 mackinnoncrit(N=1,
  // regression, nobs=100)). Rounding to 4 decimals allows 5e-5 absolute, under 2e-5 relative.
  const ROUNDING = 2e-5;

  it('constant, T = 100: −3.4975, −2.8909, −2.5824 at 1%, 5%, 10%', () => {
    const critical = mackinnonCritical('constant', 100);
    expectRelative(critical['1'], -3.4975, ROUNDING);
    expectRelative(critical['5'], -2.8909, ROUNDING);
    expectRelative(critical['10'], -2.5824, ROUNDING);
  });

  it('constant + trend, T = 100: −4.0523, −3.4553, −3.1533 at 1%, 5%, 10%', () => {
    const critical = mackinnonCritical('trend', 100);
    expectRelative(critical['1'], -4.0523, ROUNDING);
    expectRelative(critical['5'], -3.4553, ROUNDING);
    expectRelative(critical['10'], -3.1533, ROUNDING);
  });
});

describe('MacKinnon (1994) p-values', () => {
  it('gives about the nominal size at MacKinnon (2010) asymptotic critical values', () => {
    // β∞ of MacKinnon (2010), Table 2, are the asymptotic 5% and 1% points; the 1994 and 2010
    // surfaces are separate fits, so agreement to 1e-3 (5%) and 1e-2 (1%) relative is expected.
    expectRelative(mackinnonPValue(-2.86154, 'constant'), 0.05, 1e-3);
    expectRelative(mackinnonPValue(-3.41049, 'trend'), 0.05, 1e-3);
    expectRelative(mackinnonPValue(-3.43035, 'constant'), 0.01, 1e-2);
    expectRelative(mackinnonPValue(-3.95877, 'trend'), 0.01, 1e-2);
  });

  it('is 0 below τ_min and 1 above τ_max (MacKinnon 1994)', () => {
    expect(mackinnonPValue(-20, 'constant')).toBe(0);
    expect(mackinnonPValue(3, 'constant')).toBe(1);
    expect(mackinnonPValue(-17, 'trend')).toBe(0);
    expect(mackinnonPValue(0.8, 'trend')).toBe(1);
  });
});
