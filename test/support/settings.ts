// Settings for tests, resolved as a config's would be: what a test writes, in the config's own
// keys, over the built-in values (src/config/resolveSettings.ts).
import type { Frequency } from '../../src/base/period.js';
import type { AnalysisSettings } from '../../src/base/settings.js';
import { resolveSettings, type WrittenSettings } from '../../src/config/resolveSettings.js';

/** `n` only matters to the default backtest horizon, which shortens for a short series. */
export function settingsFor(written: WrittenSettings = {}, frequency: Frequency = 'annual', n = 100): AnalysisSettings {
  return resolveSettings(written, { frequency, n });
}
