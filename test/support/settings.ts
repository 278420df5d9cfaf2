// Settings for tests, resolved as a config's would be: what a test writes, in the config's own
// keys, over the built-in values (src/config/resolveSettings.ts). The horizon is the one the
// tests' expected values were worked out at (ten years, twelve quarters, twenty-four months)
// unless the test writes one: the built-in default counts to a calendar year's end from the
// last observation, which these settings do not know.
import type { Frequency } from '../../src/base/period.js';
import type { AnalysisSettings } from '../../src/base/settings.js';
import { resolveSettings, type WrittenSettings } from '../../src/config/resolveSettings.js';

export const TEST_HORIZON: Readonly<Record<Frequency, number>> = { annual: 10, quarterly: 12, monthly: 24 };

/** `n` only matters to the default backtest horizon, which shortens for a short series. */
export function settingsFor(written: WrittenSettings = {}, frequency: Frequency = 'annual', n = 100): AnalysisSettings {
  const horizon = written.horizon === undefined && written.through === undefined ? { horizon: TEST_HORIZON[frequency] } : {};
  return resolveSettings({ ...written, ...horizon }, { frequency, n });
}
