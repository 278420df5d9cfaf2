// Where text stops being UTF-8: the line and column of the first byte that does not belong to a
// well-formed sequence (RFC 3629, section 4: no overlong forms, no surrogates, nothing above
// U+10FFFF), so a message can point at the very character to fix.

/** Length of the well-formed sequence starting at `i`, or 0 when it is not one. */
function sequenceLength(bytes: Uint8Array, i: number): number {
  const lead = bytes[i];
  if (lead < 0x80) return 1;
  // The second byte's range depends on the lead (RFC 3629's UTF8-2 to UTF8-4 rules).
  const [length, low, high] =
    lead >= 0xc2 && lead <= 0xdf ? [2, 0x80, 0xbf]
    : lead === 0xe0 ? [3, 0xa0, 0xbf]
    : lead === 0xed ? [3, 0x80, 0x9f]
    : lead >= 0xe1 && lead <= 0xef ? [3, 0x80, 0xbf]
    : lead === 0xf0 ? [4, 0x90, 0xbf]
    : lead >= 0xf1 && lead <= 0xf3 ? [4, 0x80, 0xbf]
    : lead === 0xf4 ? [4, 0x80, 0x8f]
    : [0, 0, 0];
  if (length === 0 || i + length > bytes.length) return 0;
  if (bytes[i + 1] < low || bytes[i + 1] > high) return 0;
  for (let k = 2; k < length; k++) if (bytes[i + k] < 0x80 || bytes[i + k] > 0xbf) return 0;
  return length;
}

/** 1-based line and column (in characters) of the first byte that is not UTF-8; the end of the text when all of it is. */
export function firstInvalidUtf8(bytes: Uint8Array): { line: number; column: number } {
  let line = 1;
  let column = 1;
  // A byte order mark is not a character of the first line.
  let i = bytes[0] === 0xef && bytes[1] === 0xbb && bytes[2] === 0xbf ? 3 : 0;
  while (i < bytes.length) {
    const length = sequenceLength(bytes, i);
    if (length === 0) break;
    if (bytes[i] === 0x0a) {
      line += 1;
      column = 1;
    } else {
      column += 1;
    }
    i += length;
  }
  return { line, column };
}
