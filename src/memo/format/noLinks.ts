// The memo must contain no web address (DESIGN.md, "Output and safety"). Text from the
// analyst or a data file could carry one; a word joiner after the colon keeps it readable
// while no longer forming "scheme://".
const SCHEME_SEPARATOR = /:\/\//g;

export function noLinks(text: string): string {
  return text.replace(SCHEME_SEPARATOR, ':\u2060//');
}
