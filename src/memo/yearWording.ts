// Every word the memo says about the next full calendar year's figure (the record's
// `next_year`): the summary's rows and sentence, and the method note under the forecast table.
// Numbers arrive formatted; these functions only choose the words. The consistency check
// (consistency/yearClaims.ts) reads the sentences back, so its patterns live beside them here.
import type { TrendModelKind, YearFigure } from '../base/settings.js';
import { levelPercent, MODEL_IN_TEXT } from './wording.js';

/** Months or quarters, as the year's parts are named in a sentence. */
export interface YearParts {
  periods: number;
  /** "month" or "quarter". */
  part: string;
}

export function yearParts(periods: number): YearParts {
  return { periods, part: periods === 12 ? 'month' : 'quarter' };
}

/** What the figure is: "the total of its 12 months", "the average of its 4 quarters". */
function combined(figure: YearFigure, parts: YearParts): string {
  return `the ${figure} of its ${parts.periods} ${parts.part}s`;
}

/** The point's convention in words, for a transformed series (the period points are medians or means). */
function pointConvention(figure: YearFigure, parts: YearParts, point: 'median' | 'mean'): string {
  const figures = figure === 'total' ? 'totals' : 'averages';
  return point === 'median'
    ? `the median of the simulated ${figures}, as the ${parts.part}ly figures are medians`
    : `the expected ${figure}: the ${parts.part}ly means ${figure === 'total' ? 'added up' : 'averaged'}`;
}

export const yearWording = {
  /** The first cell of the year's rows in the summary table: "2025 total", "2025 average". */
  head: (year: string, figure: YearFigure) => `${year} ${figure}`,
  /**
   * The summary's sentence: the recommended model's figure for the year. `convention` says how
   * the point was had when the series is transformed (null without a transform, where the
   * median and the mean are one number).
   */
  summary: (a: { year: string; figure: YearFigure; parts: YearParts; model: TrendModelKind; point: string; level: number; low: string; high: string; convention: 'median' | 'mean' | null }) =>
    `${a.year} as a whole (${combined(a.figure, a.parts)}): ${a.point} under the ${MODEL_IN_TEXT[a.model]}` +
    (a.convention === null ? '' : ` (${pointConvention(a.figure, a.parts, a.convention)})`) +
    `, ${levelPercent(a.level)} interval ${a.low} to ${a.high}.`,
  /** In place of the figure when the horizon stops inside the year. */
  horizonShort: (a: { year: string; horizonEnd: string; lastPeriod: string }) =>
    `The forecast horizon ends at ${a.horizonEnd}, before ${a.year} is complete, so the memo gives no figure for ${a.year} as a whole; a horizon reaching ${a.lastPeriod} would.`,
  /** The method note under the forecast table. */
  method: (a: {
    year: string;
    figure: YearFigure;
    parts: YearParts;
    points: Record<TrendModelKind, string>;
    /** The figure's standard deviation were the parts independent, as a percentage of the joint one, per model. */
    independentShare: Record<TrendModelKind, string>;
    /** Whether those shares are all below 100% (the errors add up), all above (they offset), or neither. */
    dependence: 'adds' | 'offsets' | 'neither';
    /** Null without a transform. */
    /** `error`: the larger model's simulation error as a percentage of the interval's half-width. */
    simulation: { scale: string; draws: string; point: 'median' | 'mean'; fromPoints: Record<TrendModelKind, string>; error: string } | null;
  }) => {
    const { parts } = a;
    const why =
      a.dependence === 'adds'
        ? `: the errors of later ${parts.part}s share the shocks since the last observation, and the estimated trend, with earlier ones, so they add up to more than independent errors would.`
        : a.dependence === 'offsets'
          ? `: the ${parts.part}s\u2019 errors partly offset one another.`
          : '.';
    const opening =
      `The figure for ${a.year} on the first page is ${combined(a.figure, parts)}: ${a.points.deterministic} under the deterministic trend and ${a.points.stochastic} under the stochastic trend. ` +
      `Its interval comes from the joint distribution of the ${parts.part}s\u2019 forecast errors, not from the ${parts.part}ly intervals one by one. ` +
      `Had the ${parts.part}s been taken as independent, the ${a.figure}\u2019s standard deviation would be ${a.independentShare.deterministic}% of the one used under the deterministic trend and ${a.independentShare.stochastic}% under the stochastic trend${why}`;
    if (a.simulation === null) return opening;
    const { simulation } = a;
    const pointText =
      simulation.point === 'median'
        ? `The point is ${pointConvention(a.figure, parts, 'median')}, so it is not quite the ${parts.part}ly points ${a.figure === 'total' ? 'added up' : 'averaged'} (${simulation.fromPoints.deterministic} and ${simulation.fromPoints.stochastic}).`
        : `The point is ${pointConvention(a.figure, parts, 'mean')}.`;
    return (
      `${opening} Modelled on the ${simulation.scale} scale, the ${a.figure} of back-transformed values has no formula, so it is simulated: ${simulation.draws} draws of the ${parts.periods} ${parts.part}s together from each fitted model, each back-transformed and ${a.figure === 'total' ? 'added up' : 'averaged'}, the interval running between the draws\u2019 matching percentiles. ` +
      `The draws are the same on every run (a fixed seed); by their own order statistics, another seed would move the interval\u2019s ends by up to ${simulation.error}% of its half-width (95% bounds). ${pointText}`
    );
  },
} as const;
