// Fires when the backtest was not run or could not be (high) or used fewer than
// MIN_BACKTEST_ORIGINS forecast origins (medium): the threshold below which the recommendation
// rule does not count the comparison as evidence either.
import { MIN_BACKTEST_ORIGINS } from '../../base/settings.js';
import type { Caveat, CaveatRule } from './caveat.js';
import { caveatWording } from './caveatWording.js';


const ID = 'backtest-thin';

export const backtestThin: CaveatRule = {
  id: ID,
  fires: `backtest not run, or fewer than ${MIN_BACKTEST_ORIGINS} origins`,
  evaluate({ record }): Caveat | null {
    const { backtest } = record;
    if (backtest === undefined || backtest === null) {
      return { id: ID, severity: 'high', text: caveatWording.backtestNotRun(record.backtest_unavailable), numbers: { origins: 0 } };
    }
    const origins = backtest.origins.length;
    if (origins >= MIN_BACKTEST_ORIGINS) return null;
    return {
      id: ID,
      severity: 'medium',
      text: caveatWording.backtestThin({ origins, minimum: MIN_BACKTEST_ORIGINS }),
      numbers: { origins, minimum: MIN_BACKTEST_ORIGINS },
    };
  },
};
