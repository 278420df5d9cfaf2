// The scipy reference values of test/fixtures/backtest/scoreReference.json, typed.
import { readFileSync } from 'node:fs';

export interface DieboldMarianoReference {
  h: number;
  statistic: number | null;
  p_value: number | null;
  long_run_variance: number;
}

export interface ScoreReference {
  crps: { mean: number; sd: number; y: number; crps: number }[];
  diebold_mariano: Record<'alternating' | 'persistent', { differences: number[]; tests: DieboldMarianoReference[] }>;
}

export const scoreReference = JSON.parse(
  readFileSync(new URL('../fixtures/backtest/scoreReference.json', import.meta.url), 'utf8'),
) as ScoreReference;
