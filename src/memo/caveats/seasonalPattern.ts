// Fires for a series whose forecasts carry a seasonal part (harmonics, a seasonal factor or
// seasonal differences in either model) when the pattern rests on few complete years (fewer
// than FEW_SEASONAL_YEARS: medium) or has been changing (the seasonal test rules out a stable
// pattern, or one season's effect moved by half the pattern's range or more between the first
// and last complete years: medium). A pattern estimated from few years, or one that is
// shifting, is the part of a seasonal forecast most likely to be wrong next year.
import type { Caveat, CaveatRule } from './caveat.js';
import { caveatWording } from './caveatWording.js';

const ID = 'seasonal-pattern';
/** Fewer complete years than this and each season's effect rests on a handful of values (our threshold). */
export const FEW_SEASONAL_YEARS = 5;
/** A change of this share of the pattern's range between the first and last complete years counts as changing (the evidence stage's "changing" band). */
const CHANGING_SHARE = 0.5;

export const seasonalPattern: CaveatRule = {
  id: ID,
  fires: `a seasonal part in either model's forecasts, with fewer than ${FEW_SEASONAL_YEARS} complete years, or a seasonal pattern the data show changing`,
  evaluate({ record }): Caveat | null {
    const seasonal = record.seasonal;
    if (seasonal === undefined || !seasonal.applied) return null;
    // A pattern neither model forecasts (the search found no seasonal part worth its terms)
    // cannot be wrong next year in the forecasts: nothing to warn about.
    const carried = Object.values(record.models).some((model) => {
      const part = model.seasonal;
      return part != null && (part.harmonics > 0 || part.P + part.Q > 0 || part.seasonal_differences);
    });
    if (!carried) return null;
    const found = record.evidence.seasonal;
    const years = found?.pattern?.complete_years ?? Math.floor(record.series.n / seasonal.period);
    const share = found?.pattern?.change_share ?? null;
    const unstable = found?.unit_root?.seasonal_differencing === true;
    const shifting = share !== null && share >= CHANGING_SHARE;
    const few = years < FEW_SEASONAL_YEARS;
    if (!few && !unstable && !shifting) return null;
    return {
      id: ID,
      severity: 'medium',
      text: caveatWording.seasonalPattern({ years, few, changing: unstable || shifting, share, season: seasonal.period === 12 ? 'month' : 'quarter' }),
      numbers: { years, ...(share === null ? {} : { change_share: share }), unstable: unstable ? 'yes' : 'no' },
    };
  },
};
