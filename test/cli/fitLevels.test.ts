// `trendbrief fit --backtest` at interval levels other than the built-in 80 and 95: the
// backtest scores every level, the comparison tests and the recommendation read the scored
// level (by default the widest), and the printed summary has a column per level. Expected
// names and columns are our spec (src/analysis/recommendModel.ts, src/cli/formatSummary.ts,
// src/cli/formatBacktest.ts); numbers are the record's own.
import { describe, expect, it } from 'vitest';
import { fitRecord, QUICK_BACKTEST, runCli } from '../support/runCli.js';

const SERIES = 'test/fixtures/lake-huron.csv';

const CASES: { options: string[]; levels: number[]; scored: number }[] = [
  { options: ['--levels', '50,90'], levels: [50, 90], scored: 90 },
  { options: ['--levels', '90'], levels: [90], scored: 90 },
  { options: ['--levels', '68,95,99'], levels: [68, 95, 99], scored: 99 },
  { options: ['--levels', '50,90', '--scored-level', '50'], levels: [50, 90], scored: 50 },
];

/** The line of `text` that starts with `start` (after its indent). */
function lineStarting(text: string, start: RegExp): string {
  const line = text.split('\n').find((l) => start.test(l.trimStart()));
  if (line === undefined) throw new Error(`no line starting ${start}`);
  return line;
}

/** The levels a line names, e.g. "90% interval", in order. */
function levelsIn(line: string, before: string): number[] {
  return Array.from(line.matchAll(new RegExp(`${before}(\\d+(?:\\.\\d+)?)%`, 'g')), (m) => Number(m[1]));
}

describe('fit --backtest at other levels', () => {
  for (const c of CASES) {
    it(`${c.options.join(' ')}: scores every level and recommends on the ${c.scored}% interval score`, async () => {
      const record = await fitRecord(SERIES, [...QUICK_BACKTEST, ...c.options]);
      expect(record.settings.levels).toEqual(c.levels);
      const backtest = record.backtest;
      if (backtest === undefined || backtest === null) throw new Error('no backtest in the record');
      for (const row of backtest.per_horizon.deterministic) {
        expect(Object.keys(row.interval_score).map(Number).sort((a, b) => a - b)).toEqual(c.levels);
        for (const level of c.levels) expect(row.interval_score[String(level)]).toBeGreaterThan(0);
      }
      expect([...new Set(backtest.comparison.map((row) => row.loss))]).toEqual(['squared_error', `interval_score_${c.scored}`]);
      const recommendation = record.recommendation;
      if (recommendation === undefined) throw new Error('no recommendation in the record');
      expect(recommendation.scored_level).toBe(c.scored);
      expect(recommendation.rule_text).toContain(`${c.scored}% interval scores`);
      // h = 2, 3: the upper half of a three-step backtest, h > 3/2 (src/analysis/recommendModel.ts).
      expect(recommendation.reasons[0]).toContain(`at h = 2, 3 the average ${c.scored}% interval score`);
      expect(recommendation.reasons.join(' ')).not.toContain("There are no backtest");
    });

    it(`${c.options.join(' ')}: prints a column per level`, async () => {
      const run = await runCli(['fit', SERIES, ...QUICK_BACKTEST, ...c.options]);
      expect(run.stderr).toBe('');
      expect(run.code).toBe(0);
      const lines = run.stdout.split('\n');
      const forecastHeader = lineStarting(run.stdout, /^Period\s+h\s/);
      // Side by side (one set of levels per model) or one block per model, each with the same heads.
      const perModel = lines.filter((line) => /^\s+Period\s+h\s/.test(line));
      const levelsShown = perModel.length === 1 ? levelsIn(forecastHeader, '') : perModel.flatMap((line) => levelsIn(line, ''));
      expect(levelsShown).toEqual([...c.levels, ...c.levels]);
      const accuracyHeader = lines.findIndex((line) => /^\s+h\s+Det\.\s+Stoch\./.test(line));
      expect(levelsIn(lines[accuracyHeader - 1], '')).toEqual([c.scored, ...c.levels]);
      const comparisonHeader = lines.findIndex((line) => /^\s+h\s+p-value\s/.test(line));
      expect(lines[comparisonHeader - 1]).toContain(`${c.scored}% interval score`);
      expect(run.stdout).toContain(`at h = 2, 3 the average ${c.scored}% interval score`);
    });
  }
});
