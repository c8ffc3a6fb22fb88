import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { damerauLevenshteinDistance } from '../../src/catalogues/string-distance.js';

describe('damerauLevenshteinDistance', () => {
  // Expected values counted by hand from the definition (insert, delete, substitute, swap neighbours).
  const cases: readonly (readonly [string, string, number])[] = [
    ['', '', 0],
    ['', 'IPE', 3], // three insertions
    ['IPE200', 'IPE200', 0],
    ['IPE200', 'IPE220', 1], // one substitution
    ['IPE200', 'IEP200', 1], // one transposition
    ['IPE200', 'IPE20', 1], // one deletion
    ['HEA200', 'HEB220', 2], // two substitutions
    ['kitten', 'sitting', 3], // the classic Levenshtein example: k->s, e->i, insert g
    // CA -> AC (swap) -> ABC (insert B): 2. The restricted "optimal string alignment" form gives 3,
    // since it may not edit between a swapped pair; this case pins the unrestricted form.
    ['CA', 'ABC', 2],
    ['ab', 'ba', 1],
    ['abcdef', 'badcfe', 3], // three swaps
  ];
  for (const [from, to, expected] of cases) {
    it(`is ${expected} from "${from}" to "${to}"`, () => {
      expect(damerauLevenshteinDistance(from, to)).toBe(expected);
      expect(damerauLevenshteinDistance(to, from)).toBe(expected);
    });
  }

  it('counts characters beyond the basic plane as one each', () => {
    expect(damerauLevenshteinDistance('100×5', '100x5')).toBe(1);
    expect(damerauLevenshteinDistance('𝟙', '1')).toBe(1);
  });

  it('is a metric bounded by the longer length', () => {
    const text = fc.string({ maxLength: 8, unit: fc.constantFrom('A', 'B', 'C', '1', '2') });
    fc.assert(
      fc.property(text, text, text, (a, b, c) => {
        const ab = damerauLevenshteinDistance(a, b);
        expect(ab).toBe(damerauLevenshteinDistance(b, a));
        expect(ab === 0).toBe(a === b);
        expect(ab).toBeLessThanOrEqual(Math.max(a.length, b.length));
        expect(ab).toBeGreaterThanOrEqual(Math.abs(a.length - b.length));
        // The unrestricted form satisfies the triangle inequality (Lowrance and Wagner 1975).
        expect(damerauLevenshteinDistance(a, c)).toBeLessThanOrEqual(ab + damerauLevenshteinDistance(b, c));
      }),
    );
  });
});
