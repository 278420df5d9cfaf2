// The memo's chart colours and line styles. Two models that must read apart in colour, in
// greyscale print and for red-green colour blindness: a dark spruce green and a light amber
// differ in lightness as well as hue, and every line also differs by its dash.
import type { BacktestMethod } from '../../analysis/record.js';

export const INK = '#23272e';
export const MUTED = '#6b6f76';
export const RULE = '#9a9ea5';
export const GRID = '#e6e4df';

export const MODEL_COLOUR: Record<BacktestMethod, string> = {
  deterministic: '#1f5f58',
  stochastic: '#c98a2b',
  naive: '#7d8087',
  seasonal_naive: '#5b6470',
};

/** Dash arrays in pixels; history is solid. */
export const MODEL_DASH: Record<BacktestMethod, number[]> = {
  deterministic: [7, 3],
  stochastic: [2, 2],
  naive: [1, 4],
  seasonal_naive: [5, 2, 1, 2],
};

export const MODEL_SHAPE: Record<BacktestMethod, string> = {
  deterministic: 'circle',
  stochastic: 'square',
  naive: 'triangle-up',
  seasonal_naive: 'diamond',
};

/** Opacity of the narrowest (inner) and the widest (outer) prediction band. */
export const BAND_OPACITY = { inner: 0.34, outer: 0.16 } as const;

/**
 * Opacity of band `rank` of `count`, 0 the narrowest: evenly spaced from inner to outer, so the
 * nested bands, drawn over each other, darken towards the point forecast in colour and in
 * greyscale alike. A lone band takes the middle.
 */
export function bandOpacity(rank: number, count: number): number {
  const share = count === 1 ? 0.5 : rank / (count - 1);
  return BAND_OPACITY.inner * (1 - share) + BAND_OPACITY.outer * share;
}

/** A system font stack: no font is downloaded. */
export const CHART_FONT = '"Helvetica Neue", Helvetica, Arial, "Liberation Sans", "DejaVu Sans", sans-serif';
