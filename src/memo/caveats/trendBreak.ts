// Fires when the break test rejects "no break" at 5% for either model. High when the broken
// model is the recommended one, medium when nothing is recommended, low when only the other
// model is broken. Silent when the stability checks were not run (the stability section says so).
import { addPeriods } from '../../base/period.js';
import { formatSignificant } from '../format/formatNumber.js';
import type { TrendModelKind } from '../../base/settings.js';
import type { Caveat, CaveatRule } from './caveat.js';
import { caveatWording } from './caveatWording.js';

const ID = 'trend-break';

export const trendBreak: CaveatRule = {
  id: ID,
  fires: 'break test rejects at 5% for either model',
  evaluate({ record }): Caveat | null {
    const tests = record.evidence.stability?.break_test;
    if (tests === undefined) return null;
    const broken = (['deterministic', 'stochastic'] as const).filter((model) => tests[model].reject['5']);
    if (broken.length === 0) return null;
    const recommended: TrendModelKind | undefined = record.recommendation?.model;
    const breaks = broken.map((model) => ({
      model,
      period: addPeriods(record.series.first, tests[model].break_index),
      stat: formatSignificant(tests[model].stat, 3),
      critical: formatSignificant(tests[model].critical['5'], 3),
    }));
    const numbers: Record<string, number | string> = {};
    for (const b of breaks) numbers[`${b.model}_from`] = b.period;
    for (const model of broken) numbers[`${model}_stat`] = tests[model].stat ?? 'n/a';
    return {
      id: ID,
      severity: recommended === undefined ? 'medium' : broken.includes(recommended) ? 'high' : 'low',
      text: caveatWording.trendBreak({ breaks }),
      numbers,
    };
  },
};
