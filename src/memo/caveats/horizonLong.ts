// Fires when the horizon is long relative to the history: more than a quarter of the
// observations (our threshold: a model checked on n points has seen few stretches of length
// n/4, so its behaviour over such a stretch is barely tested); high above half.
import { countPeriods } from '../wording.js';
import { formatPercent } from '../format/formatNumber.js';
import type { Caveat, CaveatRule } from './caveat.js';
import { caveatWording } from './caveatWording.js';

export const HORIZON_SHARE_CAUTION = 0.25;
export const HORIZON_SHARE_HIGH = 0.5;

const ID = 'horizon-long';

export const horizonLong: CaveatRule = {
  id: ID,
  fires: `horizon longer than ${HORIZON_SHARE_CAUTION * 100}% of the observations`,
  evaluate({ record }): Caveat | null {
    const { horizon } = record.settings;
    const { n, frequency } = record.series;
    const share = horizon / n;
    if (!(share > HORIZON_SHARE_CAUTION)) return null;
    return {
      id: ID,
      severity: share > HORIZON_SHARE_HIGH ? 'high' : 'medium',
      text: caveatWording.horizonLong({
        horizon: countPeriods(horizon, frequency),
        history: `${n} observations`,
        share: formatPercent(share),
      }),
      numbers: { horizon, n, share },
    };
  },
};
