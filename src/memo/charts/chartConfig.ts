// The look every chart shares: fonts, sizes, axes and the absence of chart furniture that
// does not carry data. ARIA attributes on individual marks are off: the figure carries one
// description for the whole chart instead.
import type { Config } from 'vega-lite';
import { CHART_FONT, GRID, INK, MUTED, RULE } from './palette.js';

/**
 * Every chart comes out about 640 px wide and CSS scales it to the text column, so all charts
 * share one text size: single views fit their whole width to FULL_WIDTH; two panels of
 * PANEL_WIDTH plus their axes and spacing add up to about the same.
 */
export const FULL_WIDTH = 640;
export const PANEL_WIDTH = 262;

/** For single views: axes and labels inside FULL_WIDTH rather than added to it. */
export const FIT_WIDTH = { type: 'fit-x', contains: 'padding' } as const;

export const CHART_CONFIG: Config = {
  font: CHART_FONT,
  background: 'transparent',
  padding: { left: 4, right: 12, top: 4, bottom: 4 },
  aria: false,
  view: { stroke: null },
  title: { anchor: 'start', fontSize: 13, fontWeight: 600, color: INK, subtitleFontSize: 11, subtitleColor: MUTED, offset: 10 },
  axis: {
    labelFontSize: 10,
    titleFontSize: 10,
    titleFontWeight: 'normal',
    labelColor: MUTED,
    titleColor: MUTED,
    domainColor: RULE,
    tickColor: RULE,
    gridColor: GRID,
    labelFlush: false,
  },
  axisX: { grid: false },
  axisY: { domain: false, ticks: false, labelPadding: 4 },
  header: { labelFontSize: 11, labelColor: INK, labelFontWeight: 600, labelAnchor: 'start', labelPadding: 6 },
  legend: { orient: 'bottom', labelFontSize: 10, labelColor: INK, titleFontSize: 10, columnPadding: 18 },
  line: { strokeWidth: 1.6 },
};
