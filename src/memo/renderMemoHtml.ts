// MemoInput → one self-contained HTML document:
//   buildMemoView (format numbers, apply caveat rules, render charts to SVG)
//     → Handlebars (templates/memo.hbs and partials, CSS inlined) → checked for scripts and URLs,
//     and every statement checked against the records it speaks for (consistency/).
// Handlebars' {{ }} escapes every string; only the rendered SVG and the CSS are placed raw.
import Handlebars from 'handlebars';
import type { MemoInput } from './memoInput.js';
import { loadTemplates } from './loadTemplates.js';
import { memoContradictions } from './consistency/memoContradictions.js';
import { trackRecordClaims } from './consistency/trackRecordClaims.js';
import { buildMemoView } from './view/buildMemoView.js';

export interface RenderMemoOptions {
  /** A directory with the consultancy's own memo.hbs, memo.css or partials; missing files come from the built-in templates/. */
  templatesDir?: string;
}

const FORBIDDEN = [/<script/i, /https?:\/\//i, /@import/i];

/** Throws when the HTML could load or run anything: the memo must stand alone. */
export function assertSelfContained(html: string): void {
  for (const pattern of FORBIDDEN) {
    const match = pattern.exec(html);
    if (match !== null) {
      const around = html.slice(Math.max(0, match.index - 40), match.index + 40).replace(/\s+/g, ' ');
      throw new Error(`renderMemoHtml: the memo would not be self-contained (found ${pattern.source} near "${around}"); check the templates and CSS`);
    }
  }
}

export async function renderMemoHtml(input: MemoInput, options: RenderMemoOptions = {}): Promise<string> {
  const templates = loadTemplates(options.templatesDir);
  const handlebars = Handlebars.create();
  for (const [name, source] of Object.entries(templates.partials)) handlebars.registerPartial(name, source);
  const template = handlebars.compile(templates.main, { strict: true });
  const view = await buildMemoView(input);
  const html = template({ ...view, css: templates.css });
  assertSelfContained(html);
  const contradictions = [...memoContradictions(input.series.map((entry) => entry.record), html), ...trackRecordClaims(input.track_record, html)];
  if (contradictions.length > 0) throw new Error(`renderMemoHtml: the memo contradicts its records (${contradictions.join('; ')})`);
  return html;
}
