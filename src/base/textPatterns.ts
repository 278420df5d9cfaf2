// Regular-expression sources shared by the validator and the JSON Schema (ECMA-262 syntax,
// used with the `u` flag on both sides), so both accept exactly the same text.

/**
 * Free text (never only white space) on one line, text that may span lines, an id that becomes a folder name, or a
 * calendar date written YYYY-MM-DD.
 */
export type TextForm = 'line' | 'block' | 'slug' | 'date';

/**
 * Characters refused in text: C0 and C1 controls, DEL, the Unicode line and paragraph separators,
 * and the bidirectional embeddings, overrides and isolates that can make text display in an order
 * other than the one it is stored in (Unicode TR #9; the "Trojan Source" attacks, Boucher &
 * Anderson 2021). Text that may span lines keeps the line feed.
 */
const REFUSED_IN_BLOCK = '\\u0000-\\u0009\\u000B-\\u001F\\u007F-\\u009F\\u2028\\u2029\\u202A-\\u202E\\u2066-\\u2069';
const REFUSED_IN_LINE = '\\u0000-\\u001F\\u007F-\\u009F\\u2028\\u2029\\u202A-\\u202E\\u2066-\\u2069';

export const SLUG_PATTERN = '^[a-z0-9]+(-[a-z0-9]+)*$';
export const DATE_PATTERN = '^[0-9]{4}-(0[1-9]|1[0-2])-(0[1-9]|[12][0-9]|3[01])$';
/** The three period forms of src/data/period.ts: 2026, 2026-Q3, 2026-10. */
export const PERIOD_PATTERN = '^[0-9]{4}(-Q[1-4]|-(0[1-9]|1[0-2]))?$';

/** True when a text matching DATE_PATTERN names a day the calendar has (no 2026-02-30). */
export function isCalendarDay(value: string): boolean {
  const [year, month, day] = value.split('-').map(Number);
  const date = new Date(Date.UTC(year, month - 1, day));
  return date.getUTCMonth() === month - 1 && date.getUTCDate() === day;
}

/** Smallest and largest year that may be written as a bare number for a period. */
export const PERIOD_YEAR_RANGE = { min: 1000, max: 9999 } as const;

/** The whole-value pattern a text of this form must match. */
export function textPattern(form: TextForm): string {
  switch (form) {
    // At least one character that is neither refused nor white space: blank text says nothing.
    case 'line':
      return `^[^${REFUSED_IN_LINE}]*[^\\s${REFUSED_IN_LINE}][^${REFUSED_IN_LINE}]*$`;
    case 'block':
      return `^[^${REFUSED_IN_BLOCK}]*[^\\s${REFUSED_IN_BLOCK}][^${REFUSED_IN_BLOCK}]*$`;
    case 'slug':
      return SLUG_PATTERN;
    case 'date':
      return DATE_PATTERN;
  }
}

/** The first refused character in free text, with its 1-based position in code points. */
export function firstRefusedCharacter(value: string, form: 'line' | 'block'): { codePoint: number; position: number } | undefined {
  const refused = new RegExp(`[${form === 'line' ? REFUSED_IN_LINE : REFUSED_IN_BLOCK}]`, 'u');
  let position = 0;
  for (const character of value) {
    position += 1;
    if (refused.test(character)) return { codePoint: character.codePointAt(0) ?? 0, position };
  }
  return undefined;
}
