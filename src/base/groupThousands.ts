// Thousands grouped with commas, as every number the memo prints is (memo/format/formatNumber.ts),
// for the sentences the analysis writes into the record as well.

/** A plain decimal text with its whole part grouped: "12340.5" → "12,340.5", "−1234" → "−1,234". */
export function groupThousands(text: string): string {
  const [whole, fraction] = text.split('.');
  const grouped = whole.replace(/\B(?=(\d{3})+(?!\d))/g, ',');
  return fraction === undefined ? grouped : `${grouped}.${fraction}`;
}
