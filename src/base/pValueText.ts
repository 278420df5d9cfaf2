// How a p-value is stated wherever a reader sees one: the record's sentences, the memo and
// the terminal summary.

/** A test's p-value as stated, honouring the edges of a lookup table. */
export interface StatedPValue {
  p_value: number;
  p_bound?: 'below' | 'above';
}

/** "p = 0.042", "p below 0.01", "p above 0.10". */
export function formatPValue({ p_value, p_bound }: StatedPValue): string {
  if (p_bound === 'below') return `p below ${p_value.toFixed(2)}`;
  if (p_bound === 'above') return `p above ${p_value.toFixed(2)}`;
  if (p_value < 0.001) return 'p below 0.001';
  return `p = ${p_value.toFixed(3)}`;
}
