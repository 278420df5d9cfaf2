// What a memo may not contain, since it must stand alone (DESIGN.md, "Output and safety"): a
// script, a web address, or a stylesheet import. The rendered memo is checked against it as a
// last guard, and a consultancy's own templates are checked file by file when they load, so a
// fault there is reported at its file and line.

export const FORBIDDEN_IN_MEMO: readonly RegExp[] = [/<script/i, /https?:\/\//i, /@import/i];

/** The first forbidden pattern in `text` and where it is, or null. */
export function firstForbidden(text: string): { pattern: RegExp; index: number } | null {
  let first: { pattern: RegExp; index: number } | null = null;
  for (const pattern of FORBIDDEN_IN_MEMO) {
    const match = pattern.exec(text);
    if (match !== null && (first === null || match.index < first.index)) first = { pattern, index: match.index };
  }
  return first;
}

/** Throws when the HTML could load or run anything: the memo must stand alone. */
export function assertSelfContained(html: string): void {
  const found = firstForbidden(html);
  if (found === null) return;
  const around = html.slice(Math.max(0, found.index - 40), found.index + 40).replace(/\s+/g, ' ');
  throw new Error(`renderMemoHtml: the memo would not be self-contained (found ${found.pattern.source} near "${around}"); check the templates and CSS`);
}
