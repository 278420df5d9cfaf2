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
import { assertSelfContained } from './format/selfContained.js';
import { InputError } from '../base/problem.js';
import { templateMessages } from './messages.js';

export interface RenderMemoOptions {
  /** A directory with the consultancy's own memo.hbs, memo.css or partials; missing files come from the built-in templates/. */
  templatesDir?: string;
}

export { assertSelfContained } from './format/selfContained.js';

export async function renderMemoHtml(input: MemoInput, options: RenderMemoOptions = {}): Promise<string> {
  const templates = loadTemplates(options.templatesDir);
  const handlebars = Handlebars.create();
  for (const [name, source] of Object.entries(templates.partials)) handlebars.registerPartial(name, source);
  const template = handlebars.compile(templates.main, { strict: true });
  const view = await buildMemoView(input);
  const html = renderTemplate(() => template({ ...view, css: templates.css }), options.templatesDir);
  assertSelfContained(html);
  const contradictions = [...memoContradictions(input.series.map((entry) => entry.record), html), ...trackRecordClaims(input.track_record, html)];
  if (contradictions.length > 0) throw new Error(`renderMemoHtml: the memo contradicts its records (${contradictions.join('; ')})`);
  return html;
}

/**
 * Runs the filled template. A consultancy's own template that fails at run time (a field the
 * view does not have, say) is theirs to fix: exit 2 naming the folder and, when Handlebars
 * gives one, the line. With the built-in templates a failure is our defect.
 */
function renderTemplate(render: () => string, templatesDir: string | undefined): string {
  try {
    return render();
  } catch (error) {
    if (templatesDir === undefined || !(error instanceof Error)) throw error;
    const at = /- (\d+):(\d+)$/.exec(error.message);
    throw new InputError(templateMessages.renderFailed(templatesDir, error.message.replace(/\s*- \d+:\d+$/, ''), at === null ? undefined : Number(at[1])));
  }
}
