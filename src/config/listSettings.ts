// A series' settings as one flat list in config order, for the memo's assumptions register
// ("set by: config" or "set by: default" beside each choice).
import type { SeriesSettings, Setting } from './runPlan.js';

export function listSettings(settings: SeriesSettings): Setting<unknown>[] {
  const { backtest, recommendation, ...top } = settings;
  const { missing, ...modelling } = top;
  return [...Object.values(modelling), ...Object.values(backtest), ...Object.values(recommendation), missing];
}
