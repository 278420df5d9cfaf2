// Vega-Lite spec → Vega spec → SVG string, in Node with no browser or canvas (vega's
// headless View). The SVG is made fit to inline in the memo: no namespace URLs (HTML5 does not
// need them and the memo holds no web address), element ids renumbered from a per-chart
// prefix (vega's counter is global, so ids would otherwise clash between charts and change
// with the order of rendering), and one accessible label for the whole figure.
import { parse, View } from 'vega';
import { compile, type TopLevelSpec } from 'vega-lite';
import type { Spec as VegaSpec } from 'vega';
import { useTextWidthEstimate } from './textWidth.js';

export interface CompiledChart {
  spec: VegaSpec;
  /** Warnings vega-lite reported while compiling; a valid chart has none. */
  warnings: string[];
}

export function compileChart(chart: TopLevelSpec): CompiledChart {
  const warnings: string[] = [];
  const record = (...args: readonly unknown[]) => warnings.push(args.map(String).join(' '));
  const logger = {
    level: () => logger,
    warn: (...args: readonly unknown[]) => (record(...args), logger),
    info: () => logger,
    debug: () => logger,
    error: (...args: readonly unknown[]) => {
      throw new Error(`vega-lite: ${args.map(String).join(' ')}`);
    },
  };
  const { spec } = compile(chart, { logger });
  return { spec, warnings };
}

function escapeAttribute(text: string): string {
  return text.replace(/&/g, '&amp;').replace(/"/g, '&quot;').replace(/</g, '&lt;').replace(/>/g, '&gt;');
}

const NAMESPACE = / xmlns(:\w+)?="[^"]*"/g;
const ID = / id="([^"]+)"/g;

/** The chart as an inline <svg> element; `prefix` makes its element ids unique in the page. */
export async function renderChartSvg(chart: TopLevelSpec, prefix: string): Promise<string> {
  useTextWidthEstimate();
  const view = new View(parse(compileChart(chart).spec), { renderer: 'none' });
  try {
    const raw = await view.toSVG();
    let svg = raw.replace(NAMESPACE, '');
    const ids = Array.from(svg.matchAll(ID), (m) => m[1]);
    ids.forEach((id, k) => {
      svg = svg.split(`id="${id}"`).join(`id="${prefix}-${k + 1}"`).split(`url(#${id})`).join(`url(#${prefix}-${k + 1})`);
    });
    const label = [titleText(chart), chart.description].filter((s) => s !== undefined && s !== '').join('. ');
    svg = svg.replace(/^<svg /, `<svg role="img" aria-label="${escapeAttribute(label)}" `);
    // The analyst's text reaches the chart through noLinks ("https:⁠//"), so only a real address matches.
    if (/https?:\/\//.test(svg)) throw new Error('renderChartSvg: the chart still contains a web address');
    return svg;
  } finally {
    view.finalize();
  }
}

function titleText(chart: TopLevelSpec): string | undefined {
  const { title } = chart;
  if (typeof title === 'string') return title;
  if (title !== undefined && typeof title === 'object' && 'text' in title && typeof title.text === 'string') return title.text;
  return undefined;
}
