// Fires when the unit-root reading is 'stochastic': the tests reject a steady line and cannot
// reject lasting shocks. High when the memo nonetheless recommends the deterministic model,
// medium when it recommends nothing, low when it recommends the stochastic one (the evidence
// then supports the choice; the note stays for the reviewer).
import { formatPercent } from '../format/formatNumber.js';
import type { Caveat, CaveatRule } from './caveat.js';
import { caveatWording } from './caveatWording.js';
import { formatPValue } from '../../base/pValueText.js';

const ID = 'unit-root-evidence';

export const unitRootEvidence: CaveatRule = {
  id: ID,
  fires: "unit-root reading is 'stochastic'",
  evaluate({ record }): Caveat | null {
    const { reading, kpss, adf } = record.evidence;
    if (reading.verdict !== 'stochastic' || kpss.trend === null || adf.trend === null) return null;
    const recommended = record.recommendation?.model ?? null;
    return {
      id: ID,
      severity: recommended === 'deterministic' ? 'high' : recommended === null ? 'medium' : 'low',
      text: caveatWording.unitRootEvidence({
        kpss: `KPSS ${formatPValue(kpss.trend)}`,
        adf: `ADF ${formatPValue(adf.trend)}`,
        level: formatPercent(reading.level),
        recommended,
      }),
      numbers: { kpss_p: kpss.trend.p_value, adf_p: adf.trend.p_value, level: reading.level },
    };
  },
};
