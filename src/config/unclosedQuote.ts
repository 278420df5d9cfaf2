// The YAML parser reports an unclosed quote where the text ends, since a quoted value may run
// over several lines; the place to fix is where the quote opens, found here in the parser's
// token stream (the yaml package's CST).
import { CST, Parser } from 'yaml';

/** Offset of the quoted value that runs to the end of the text without its closing quote, if any. */
export function unclosedQuoteOffset(text: string): number | undefined {
  const end = text.trimEnd().length;
  let found: number | undefined;
  for (const token of new Parser().parse(text)) {
    if (token.type !== 'document') continue;
    CST.visit(token, (item) => {
      for (const part of [item.key, item.value]) {
        if (found === undefined && part !== null && part !== undefined && isUnclosed(part, end)) found = part.offset;
      }
      return found === undefined ? undefined : CST.visit.BREAK;
    });
  }
  return found;
}

function isUnclosed(token: CST.Token, end: number): boolean {
  if (token.type !== 'double-quoted-scalar' && token.type !== 'single-quoted-scalar') return false;
  const quote = token.type === 'double-quoted-scalar' ? '"' : "'";
  const closed = token.source.length >= 2 && token.source.endsWith(quote);
  return !closed && token.offset + token.source.length >= end;
}
