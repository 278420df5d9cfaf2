// Written settings → the complete AnalysisSettings: built-in values, the defaults that depend on
// the data or on other settings, and the rule across keys (src/config/resolveSettings.ts; the
// values are our own spec's, src/config/builtInSettings.ts).
import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/base/problem.js';
import { readingSettings, resolveSettings } from '../../src/config/resolveSettings.js';

describe('resolveSettings', () => {
  it('fills every setting a config leaves out with its built-in value', () => {
    expect(resolveSettings({}, { frequency: 'annual', n: 100, last: '2024' })).toEqual({
      horizon: 5,
      transform: { kind: 'none' },
      levels: [80, 95],
      coefficient_uncertainty: true,
      point: 'median',
      year_figure: 'average',
      estimation: 'reml',
      seasonal: { kind: 'none', period: 1 },
      max_p: 3,
      max_q: 3,
      significance: 0.05,
      backtest: { origins: 20, horizon: 5, refit: 'reselect', window: 'expanding', min_train: 27 },
      recommendation: { rule: 'prefer-stochastic', significance: 0.05, scored_level: 95, model: null, justification: null },
      missing: 'error',
    });
  });

  it('forecasts by default through the end of a calendar year: five years ahead for annual data, the rest of the year and two more for monthly and quarterly', () => {
    const horizon = (frequency: 'annual' | 'quarterly' | 'monthly', last: string) => resolveSettings({}, { frequency, n: 100, last }).horizon;
    // 2024 → 2029; 2024-Q4 → 2026-Q4 (8 quarters); 2024-12 → 2026-12 (24 months); 2024-03 → 2026-12 (33 months).
    expect([horizon('annual', '2024'), horizon('quarterly', '2024-Q4'), horizon('quarterly', '2024-Q1'), horizon('monthly', '2024-12'), horizon('monthly', '2024-03')]).toEqual([5, 8, 11, 24, 33]);
    // A caller that does not know the last period gets the steps from a year's end.
    expect([resolveSettings({}, { frequency: 'annual', n: 100 }).horizon, resolveSettings({}, { frequency: 'monthly', n: 100 }).horizon]).toEqual([5, 24]);
    expect(resolveSettings({ horizon: 7 }, { frequency: 'monthly', n: 100, last: '2024-12' }).horizon).toBe(7);
  });

  it('counts the steps through an end period written at the series\' frequency or a coarser one', () => {
    const steps = (through: string, frequency: 'annual' | 'quarterly' | 'monthly', last: string) => resolveSettings({ through }, { frequency, n: 100, last }).horizon;
    expect(steps('2030', 'annual', '2024')).toBe(6);
    // A year ends with its fourth quarter and its twelfth month; a quarter with its third month.
    expect(steps('2030', 'quarterly', '2024-Q4')).toBe(24);
    expect(steps('2030', 'monthly', '2024-12')).toBe(72);
    expect(steps('2026-Q2', 'monthly', '2025-11')).toBe(7);
    expect(steps('2026-12', 'annual', '2024')).toBe(2);
  });

  it('refuses an end period that is not ahead of the data, ends inside a period, or lies too far out, at the place that wrote it', () => {
    const place = () => ({ file: 'memo.yaml', line: 7, column: 12, field: 'series[0].through' });
    const refusal = (through: string, frequency: 'annual' | 'monthly', last: string): string => {
      try {
        resolveSettings({ through }, { frequency, n: 100, last }, place);
      } catch (error) {
        return error instanceof InputError ? `${error.problems[0].line}: ${error.problems[0].message}` : String(error);
      }
      return 'accepted';
    };
    expect(refusal('2024', 'annual', '2024')).toBe('7: the forecast would end at 2024, but the data already run to 2024');
    expect(refusal('2024-Q4', 'monthly', '2024-12')).toBe('7: the forecast would end at 2024-Q4, but the data already run to 2024-12');
    expect(refusal('2026-06', 'annual', '2024')).toBe("7: '2026-06' ends inside a period of this annual series");
    expect(refusal('2200', 'monthly', '2024-12')).toBe('7: forecasting through 2200 takes 2112 steps; at most 1000 are allowed');
  });

  it('makes the shortest training window max(20, 3 × (max_p + max_q + 3))', () => {
    // The deterministic trend at (3,3) has 3 + 3 + intercept, slope and σ² = 9 parameters: 27.
    expect(resolveSettings({}, { frequency: 'annual', n: 100 }).backtest.min_train).toBe(27);
    // At (1,1) it has 5, and 3 × 5 = 15 is below the floor of 20.
    expect(resolveSettings({ max_p: 1, max_q: 1 }, { frequency: 'annual', n: 100 }).backtest.min_train).toBe(20);
    expect(resolveSettings({ backtest: { min_train: 12 } }, { frequency: 'annual', n: 100 }).backtest.min_train).toBe(12);
  });

  it('backtests as far ahead as the memo forecasts, shortened to leave ten origins on a short series', () => {
    // n = 100: 100 − 27 − 9 = 64 steps are possible, so the backtest covers the horizon of 10.
    expect(resolveSettings({ horizon: 10 }, { frequency: 'annual', n: 100 }).backtest.horizon).toBe(10);
    // n = 40: 40 − 27 − (10 − 1) = 4, the longest horizon that leaves ten origins after 27 to train on.
    expect(resolveSettings({ horizon: 10 }, { frequency: 'annual', n: 40 }).backtest.horizon).toBe(4);
    expect(resolveSettings({ horizon: 10 }, { frequency: 'annual', n: 30 }).backtest.horizon).toBe(1);
    expect(resolveSettings({ horizon: 200 }, { frequency: 'monthly', n: 2000 }).backtest.horizon).toBe(100);
    expect(resolveSettings({ backtest: { horizon: 3 } }, { frequency: 'annual', n: 100 }).backtest.horizon).toBe(3);
  });

  it('sorts the levels and scores the widest unless told otherwise', () => {
    const settings = resolveSettings({ levels: [90, 50] }, { frequency: 'annual', n: 100 });
    expect(settings.levels).toEqual([50, 90]);
    expect(settings.recommendation.scored_level).toBe(90);
    expect(resolveSettings({ levels: [68, 95, 99], recommendation: { scored_level: 68 } }, { frequency: 'annual', n: 100 }).recommendation.scored_level).toBe(68);
  });

  it('gives monthly and quarterly series a seasonal part chosen from the data, and annual ones none', () => {
    // Observations per year: 12 monthly, 4 quarterly (common practice).
    expect(resolveSettings({}, { frequency: 'monthly', n: 120 }).seasonal).toEqual({ kind: 'auto', period: 12 });
    expect(resolveSettings({ seasonal: 'none' }, { frequency: 'quarterly', n: 60 }).seasonal).toEqual({ kind: 'none', period: 4 });
    expect(resolveSettings({ seasonal: 'auto' }, { frequency: 'annual', n: 60 }).seasonal).toEqual({ kind: 'none', period: 1 });
    const form = { harmonics: 2, seasonal_ar: 0, seasonal_ma: 1, seasonal_differences: true };
    expect(resolveSettings({ seasonal: form }, { frequency: 'quarterly', n: 60 }).seasonal).toEqual({ kind: 'fixed', period: 4, ...form });
  });

  it('refuses a fixed seasonal form on annual data, and more harmonic pairs than the period has', () => {
    const form = { harmonics: 3, seasonal_ar: 0, seasonal_ma: 0, seasonal_differences: false };
    const place = (key: string) => ({ file: 'memo.yaml', line: 4, field: `defaults.${key}` });
    expect(() => resolveSettings({ seasonal: form }, { frequency: 'annual', n: 60 }, place)).toThrow(InputError);
    try {
      resolveSettings({ seasonal: form }, { frequency: 'quarterly', n: 60 }, place);
      expect.unreachable();
    } catch (error) {
      // A quarterly series has ⌊4/2⌋ = 2 harmonic pairs (common practice).
      expect((error as InputError).problems).toEqual([
        expect.objectContaining({ code: 'config.seasonal-harmonics', line: 4, field: 'defaults.seasonal', message: '3 harmonic pairs are more than a quarterly series has (at most 2)' }),
      ]);
    }
    expect(resolveSettings({ seasonal: { ...form, harmonics: 6 } }, { frequency: 'monthly', n: 60 }).seasonal).toMatchObject({ kind: 'fixed', harmonics: 6 });
  });

  it('refuses more harmonic pairs than the seasons observed can identify', () => {
    // Every February missing: 11 of 12 months observed. K pairs are 2K columns (11 at K = 6, whose
    // last sine vanishes) and need K·2 + 1 distinct seasons with the level (trigonometric
    // interpolation; common practice).
    const values = Float64Array.from({ length: 60 }, (_, t) => (t % 12 === 1 ? Number.NaN : 100 + t));
    const form = { harmonics: 6, seasonal_ar: 0, seasonal_ma: 0, seasonal_differences: false };
    const place = (key: string) => ({ file: 'memo.yaml', line: 7, field: `series[0].${key}` });
    try {
      resolveSettings({ seasonal: form }, { frequency: 'monthly', n: 60, values }, place);
      expect.unreachable();
    } catch (error) {
      expect((error as InputError).problems).toEqual([
        expect.objectContaining({
          code: 'config.seasonal-unseen',
          field: 'series[0].seasonal',
          message: '6 harmonic pairs need at least 12 of the 12 seasons observed, and the series has values in only 11',
          hint: 'give at most 5 harmonic pairs, or supply the missing seasons',
        }),
      ]);
    }
    expect(resolveSettings({ seasonal: { ...form, harmonics: 5 } }, { frequency: 'monthly', n: 60, values }, place).seasonal).toMatchObject({ harmonics: 5 });
  });

  it("gives the year's figure as written, else the average, which means something for a flow and a level alike", () => {
    // A flow's year is its total, a level's or a rate's its average (common practice): the config says which.
    expect(resolveSettings({}, { frequency: 'monthly', n: 100 }).year_figure).toBe('average');
    expect(resolveSettings({ year_figure: 'total' }, { frequency: 'quarterly', n: 100 }).year_figure).toBe('total');
    // Accepted on an annual series (under defaults it applies to every series); the analysis gives such a series no yearly figure.
    expect(resolveSettings({ year_figure: 'total' }, { frequency: 'annual', n: 100 }).year_figure).toBe('total');
  });

  it('turns the transform as written into the form the models take', () => {
    expect(resolveSettings({ transform: 'log' }, { frequency: 'annual', n: 100 }).transform).toEqual({ kind: 'log' });
    expect(resolveSettings({ transform: { box_cox: 0.5 } }, { frequency: 'annual', n: 100 }).transform).toEqual({ kind: 'box-cox', lambda: 0.5 });
  });

  it('refuses a scored level that is not among the levels, at the place it was written', () => {
    const error = (() => {
      try {
        resolveSettings({ levels: [50, 90], recommendation: { scored_level: 95 } }, { frequency: 'annual', n: 100 }, (key) => ({ file: 'memo.yaml', line: 9, column: 5, field: `defaults.${key}` }));
      } catch (caught) {
        return caught;
      }
      return undefined;
    })();
    expect(error).toBeInstanceOf(InputError);
    expect((error as InputError).problems).toEqual([
      expect.objectContaining({ code: 'config.scored-level', file: 'memo.yaml', line: 9, field: 'defaults.recommendation.scored_level', message: '95 is not one of the interval levels (50, 90)' }),
    ]);
  });

  it('gives a value nothing may change', () => {
    const settings = resolveSettings({}, { frequency: 'annual', n: 100 });
    expect(Object.isFrozen(settings) && Object.isFrozen(settings.levels) && Object.isFrozen(settings.backtest)).toBe(true);
  });

  it('resolves what reading a series needs with the same values', () => {
    expect(readingSettings({ transform: 'log', max_q: 1 })).toEqual({ transform: { kind: 'log' }, missing: 'error', max_p: 3, max_q: 1 });
  });
});
