// Fires when the data end more than one period before the latest period the memo's as-of
// period could include (the run measures the gap: src/run/checkAsOf.ts). The forecasts then
// start from the last observation, and their first steps are for periods already past;
// high when every forecast is.
import { addPeriods } from '../../base/period.js';
import { countPeriods } from '../wording.js';
import type { Caveat, CaveatRule } from './caveat.js';
import { caveatWording } from './caveatWording.js';

const ID = 'data-ends-early';

export const dataEndsEarly: CaveatRule = {
  id: ID,
  fires: 'the data end more than one period before the as-of period',
  evaluate({ record, dataEnd }): Caveat | null {
    if (dataEnd === undefined) return null;
    const { horizon } = record.settings;
    const allBefore = dataEnd.missing >= horizon;
    return {
      id: ID,
      severity: allBefore ? 'high' : 'medium',
      text: caveatWording.dataEndsEarly({
        last: dataEnd.last,
        asOf: dataEnd.as_of,
        missing: countPeriods(dataEnd.missing, record.series.frequency),
        from: addPeriods(dataEnd.last, 1),
        to: dataEnd.reachable,
        allBefore,
        count: dataEnd.missing,
      }),
      numbers: { last: dataEnd.last, as_of: dataEnd.as_of, reachable: dataEnd.reachable, missing: dataEnd.missing, horizon },
    };
  },
};
