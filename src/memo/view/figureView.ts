// A chart as the template places it: inline SVG plus a caption that repeats its description.
import type { TopLevelSpec } from 'vega-lite';
import { renderChartSvg } from '../charts/renderChart.js';

export interface FigureView {
  id: string;
  svg: string;
  caption: string;
}

export async function figureView(id: string, chart: TopLevelSpec): Promise<FigureView> {
  return { id, svg: await renderChartSvg(chart, id), caption: chart.description ?? '' };
}
