// Suggests the intended name for a misspelt one (a CSV column, a config key).

/**
 * Edit distance with adjacent transpositions counted as one edit: the optimal string
 * alignment variant of Damerau (1964) on top of the Wagner & Fischer (1974) recurrence.
 */
export function editDistance(a: string, b: string): number {
  const width = b.length + 1;
  const d = new Array<number>((a.length + 1) * width);
  for (let i = 0; i <= a.length; i++) d[i * width] = i;
  for (let j = 0; j <= b.length; j++) d[j] = j;
  for (let i = 1; i <= a.length; i++) {
    for (let j = 1; j <= b.length; j++) {
      const cost = a[i - 1] === b[j - 1] ? 0 : 1;
      let best = Math.min(d[(i - 1) * width + j] + 1, d[i * width + j - 1] + 1, d[(i - 1) * width + j - 1] + cost);
      if (i > 1 && j > 1 && a[i - 1] === b[j - 2] && a[i - 2] === b[j - 1]) {
        best = Math.min(best, d[(i - 2) * width + j - 2] + 1);
      }
      d[i * width + j] = best;
    }
  }
  return d[a.length * width + b.length];
}

/**
 * The candidate nearest to `name` ignoring case, or undefined when none is close enough to be a
 * plausible slip: at most one edit per three characters of `name`, and at least one allowed.
 * Ties go to the earlier candidate.
 */
export function closestName(name: string, candidates: readonly string[]): string | undefined {
  const target = name.toLowerCase();
  const allowed = Math.max(1, Math.floor(target.length / 3));
  let best: string | undefined;
  let bestDistance = Infinity;
  for (const candidate of candidates) {
    const distance = editDistance(target, candidate.toLowerCase());
    if (distance <= allowed && distance < bestDistance) {
      best = candidate;
      bestDistance = distance;
    }
  }
  return best;
}
