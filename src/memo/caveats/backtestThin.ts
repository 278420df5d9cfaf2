// Fires when the backtest was not run or could not be (high) or used fewer than ten forecast origins
// (medium; our threshold: with fewer, a single unusual period moves the averages and the
// comparison tests have little power).
import type { Caveat, CaveatRule } from './caveat.js';
import { caveatWording } from './caveatWording.js';

export const MIN_BACKTEST_ORIGINS = 10;

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
