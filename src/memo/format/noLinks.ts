// The memo must contain no web address (DESIGN.md, "Output and safety"). Text from the
// analyst or a data file could carry one; a word joiner after the colon keeps it readable
// while no longer forming "scheme://". The same for a stylesheet import ("@⁠import").
const SCHEME_SEPARATOR = /:\/\//g;
/** A stylesheet import in the analyst's text is as harmless as a word, once it no longer reads "@import". */
const IMPORT = /@(import)/gi;

export function noLinks(text: string): string {
  return text.replace(SCHEME_SEPARATOR, ':\u2060//').replace(IMPORT, '@\u2060$1');
}
