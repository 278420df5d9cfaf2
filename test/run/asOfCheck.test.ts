// memo.as_of against each series' data (our spec: DEVELOPERS.md "The as-of period and the
// data"): data running past the as-of period are refused (exit 2, file:line:column), and data
// ending more than one period before it give a warning and a caveat in the memo, the run going
// on. Periods compare by the months they span. The Lake Huron fixture's last year is 1972
// (test/fixtures/lake-huron.csv).
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import type { Series } from '../../src/base/series.js';
import { checkAsOf, lastPeriodBy } from '../../src/run/checkAsOf.js';
import { runCli } from '../support/runCli.js';
import { fixRunDate, monthlyFolder, readText } from './monthlySetup.js';

fixRunDate();

function endingIn(last: string, frequency: Series['frequency']): Series {
  return { file: 'x.csv', column: 'v', periodColumn: 'p', frequency, periods: [last], values: new Float64Array([1]), first: last, last, n: 1, missing: 0, sha256: '' };
}

describe('the period the data can reach by the as-of period', () => {
  it('is the latest period of the series frequency ending by the end of the as-of period', () => {
    // Calendar arithmetic (common practice): a year ends in December, a quarter in its third month.
    expect(lastPeriodBy('2024', { frequency: 'monthly' })).toBe('2024-12');
    expect(lastPeriodBy('2024', { frequency: 'quarterly' })).toBe('2024-Q4');
    expect(lastPeriodBy('2024-06', { frequency: 'annual' })).toBe('2023');
    expect(lastPeriodBy('2024-12', { frequency: 'annual' })).toBe('2024');
    expect(lastPeriodBy('2024-08', { frequency: 'quarterly' })).toBe('2024-Q2');
    expect(lastPeriodBy('2024-Q3', { frequency: 'monthly' })).toBe('2024-09');
  });

  it('refuses data past the as-of period, accepts one period of lag, and reports more', () => {
    const at = { file: 'memo.yaml', line: 5, column: 10, field: 'memo.as_of' };
    expect(checkAsOf('2024', at, 's', 'x.csv', endingIn('2025-01', 'monthly')).refusal?.message).toBe(
      "series 's' (x.csv) has observations up to 2025-01, after the as-of period 2024",
    );
    // An annual observation for 2024 is not complete in June 2024.
    expect(checkAsOf('2024-06', at, 's', 'x.csv', endingIn('2024', 'annual')).refusal?.code).toBe('run.data-past-as-of');
    expect(checkAsOf('2024', at, 's', 'x.csv', endingIn('2024-11', 'monthly'))).toEqual({ refusal: null, gap: null });
    expect(checkAsOf('2024-06', at, 's', 'x.csv', endingIn('2023', 'annual'))).toEqual({ refusal: null, gap: null });
    const gap = checkAsOf('1971', at, 's', 'x.csv', endingIn('1960-12', 'monthly')).gap;
    // 1960-12 to 1971-12: 11 × 12 = 132 months.
    expect(gap?.dataEnd).toEqual({ last: '1960-12', as_of: '1971', reachable: '1971-12', missing: 132 });
    expect(gap?.warning.message).toBe("warning: series 's' (x.csv) ends in 1960-12, 132 months before 1971-12, the last period the as-of period 1971 can include");
  });
});

describe('check and run with memo.as_of', () => {
  it('refuse data running past the as-of period with exit 2 at memo.as_of, writing nothing', async () => {
    const root = monthlyFolder('1970');
    const expected =
      "memo.yaml:5:10: memo.as_of: series 'lake-level' (data/lake-huron.csv) has observations up to 1972, after the as-of period 1970; set memo.as_of to 1972 or later, or leave the observations after 1970 out of data/lake-huron.csv";
    const check = await runCli(['check', join(root, 'memo.yaml')]);
    expect(check.code).toBe(2);
    expect(check.errorLines).toEqual([`${join(root, expected)}`]);
    const run = await runCli(['run', join(root, 'memo.yaml'), '--quiet']);
    expect(run.code).toBe(2);
    expect(run.errorLines).toEqual([`${join(root, expected)}`]);
    expect(existsSync(join(root, 'out'))).toBe(false);
  });

  it('warn when the data end more than one period before the as-of period, and the memo says so', async () => {
    // Annual data ending 1972, memo as of 1980-06: the last full year by then is 1979, 7 years on.
    const root = monthlyFolder('1980-06', '[html, json]');
    const warning = `${join(root, 'memo.yaml')}:5:10: memo.as_of: warning: series 'lake-level' (data/lake-huron.csv) ends in 1972, 7 years before 1979, the last period the as-of period 1980-06 can include; check that data/lake-huron.csv holds the latest observations`;
    const check = await runCli(['check', join(root, 'memo.yaml')]);
    expect(check.code).toBe(0);
    expect(check.errorLines).toHaveLength(1);
    expect(check.errorLines[0].startsWith(warning)).toBe(true);
    expect(check.stdout).toContain('ok, memo lake-outlook');
    const run = await runCli(['run', join(root, 'memo.yaml'), '--quiet']);
    expect(run.code).toBe(0);
    expect(run.errorLines).toHaveLength(1);
    expect(run.errorLines[0].startsWith(warning)).toBe(true);
    const html = readText(root, 'out/lake-outlook/1980-06/memo.html').replace(/\s+/g, ' ');
    // The horizon is 4 years, all of them (1973–1976) before 1979: every forecast is for a past period.
    expect(html).toContain(
      'The data end in 1972, but the memo is as of 1980-06: the 7 years from 1973 to 1979 are not in the data. The forecasts start after 1972, so every one of them is for a period that has ended by the as-of period;',
    );
  });
});
