// A series plan → the options analyseSeries takes, every setting passed explicitly so the
// record shows the config's choices rather than the analysis stage's own defaults.
import type { AnalysisOptions } from '../analysis/analyseSeries.js';
import type { SeriesPlan } from './runPlan.js';

export function toAnalysisOptions(series: SeriesPlan): AnalysisOptions {
  const { settings } = series;
  return {
    id: series.id,
    title: series.title,
    horizon: settings.horizon.value,
    levels: [...settings.levels.value],
    maxP: settings.maxP.value,
    maxQ: settings.maxQ.value,
    transform: settings.transform.value,
    coefficientUncertainty: settings.coefficientUncertainty.value,
    point: settings.point.value,
    significance: settings.significance.value,
  };
}
