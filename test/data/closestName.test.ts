import { describe, expect, it } from 'vitest';
import { closestName, editDistance } from '../../src/base/closestName.js';

describe('editDistance', () => {
  it('matches textbook values', () => {
    // kitten -> sitting needs 3 edits: the standard Levenshtein example (from memory).
    expect(editDistance('kitten', 'sitting')).toBe(3);
    expect(editDistance('', 'abc')).toBe(3);
    expect(editDistance('same', 'same')).toBe(0);
  });

  it('counts an adjacent transposition as one edit, without editing a substring twice', () => {
    // Damerau (1964): a swap of neighbours is one error. The optimal-string-alignment variant gives
    // 'ca' -> 'abc' distance 3 where unrestricted Damerau-Levenshtein gives 2 (from memory).
    expect(editDistance('gdp', 'gpd')).toBe(1);
    expect(editDistance('ca', 'abc')).toBe(3);
  });
});

describe('closestName', () => {
  const columns = ['period', 'value', 'gdp', 'unemployment'];

  it('suggests the nearest candidate for a slip', () => {
    expect(closestName('gpd', columns)).toBe('gdp');
    expect(closestName('vlaue', columns)).toBe('value');
    expect(closestName('unemploymnet', columns)).toBe('unemployment');
    expect(closestName('Period', columns)).toBe('period');
  });

  it('suggests nothing when no candidate is close', () => {
    expect(closestName('inflation', columns)).toBeUndefined();
    expect(closestName('x', [])).toBeUndefined();
  });

  it('prefers the earlier candidate on a tie', () => {
    expect(closestName('ab', ['ac', 'ad'])).toBe('ac');
  });
});
