// The memo's chart colours and line styles. Two models that must read apart in colour, in
// greyscale print and for red-green colour blindness: a dark spruce green and a light amber
// differ in lightness as well as hue, and every line also differs by its dash.
import type { ForecastMethod } from '../../analysis/record.js';

export const INK = '#23272e';
export const MUTED = '#6b6f76';
export const RULE = '#9a9ea5';
export const GRID = '#e6e4df';

export const MODEL_COLOUR: Record<ForecastMethod, string> = {
  deterministic: '#1f5f58',
  stochastic: '#c98a2b',
  naive: '#7d8087',
};

/** Dash arrays in pixels; history is solid. */
export const MODEL_DASH: Record<ForecastMethod, number[]> = {
  deterministic: [7, 3],
  stochastic: [2, 2],
  naive: [1, 4],
};

export const MODEL_SHAPE: Record<ForecastMethod, string> = {
  deterministic: 'circle',
  stochastic: 'square',
  naive: 'triangle-up',
};

/** Opacity of the inner (80%) and outer (95%) prediction bands. */
export const BAND_OPACITY = { inner: 0.34, outer: 0.16 } as const;

/** A system font stack: no font is downloaded. */
export const CHART_FONT = '"Helvetica Neue", Helvetica, Arial, "Liberation Sans", "DejaVu Sans", sans-serif';
