// Fires when the Ljung-Box check flags either model's one-step errors. High when the flagged
// model is the recommended one, medium otherwise.
import type { TrendModelKind } from '../../base/settings.js';
import { formatP } from '../format/formatNumber.js';
import type { Caveat, CaveatRule } from './caveat.js';
import { caveatWording } from './caveatWording.js';

const ID = 'residual-pattern';

export const residualPattern: CaveatRule = {
  id: ID,
  fires: 'Ljung-Box flags either model',
  evaluate({ record }): Caveat | null {
    const flagged = (['deterministic', 'stochastic'] as const).flatMap((model) => {
      const checks = record.evidence.residuals[model];
      const finding = checks.findings.find((f) => f.check === 'ljung_box');
      return finding?.flagged === true && checks.ljung_box !== null ? [{ model, ljung: checks.ljung_box }] : [];
    });
    if (flagged.length === 0) return null;
    const recommended: TrendModelKind | undefined = record.recommendation?.model;
    const numbers: Record<string, number> = {};
    for (const { model, ljung } of flagged) numbers[`${model}_p`] = ljung.p_value;
    return {
      id: ID,
      severity: flagged.some(({ model }) => model === recommended) ? 'high' : 'medium',
      text: caveatWording.residualPattern({
        models: flagged.map(({ model, ljung }) => ({ model, p: formatP(ljung.p_value), lags: ljung.lags })),
      }),
      numbers,
    };
  },
};
