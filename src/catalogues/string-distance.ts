/**
 * Damerau–Levenshtein distance: the fewest insertions, deletions, substitutions and transpositions
 * of two adjacent characters that turn one string into the other, each costing 1. This is the
 * unrestricted form (a transposed pair may be edited again), after Lowrance and Wagner, "An
 * Extension of the String-to-String Correction Problem", J. ACM 22(2), 1975.
 * Example: damerauLevenshteinDistance('IPE 200', 'IEP 200') === 1; ('CA', 'ABC') === 2.
 */
export function damerauLevenshteinDistance(from: string, to: string): number {
  const a = Array.from(from);
  const b = Array.from(to);
  const beyond = a.length + b.length;
  // Cell (i + 1, j + 1) holds the distance between the first i characters of a and the first j of b;
  // row 0 and column 0 hold `beyond`, a bound no real alignment reaches.
  const columns = b.length + 2;
  const distance = new Int32Array((a.length + 2) * columns).fill(beyond);
  const cell = (i: number, j: number): number => i * columns + j;
  const at = (i: number, j: number): number => distance[cell(i, j)] ?? beyond;
  for (let i = 0; i <= a.length; i += 1) distance[cell(i + 1, 1)] = i;
  for (let j = 0; j <= b.length; j += 1) distance[cell(1, j + 1)] = j;
  /** The last row (1-based) in which each character of a was seen. */
  const lastRowOf = new Map<string, number>();
  for (let i = 1; i <= a.length; i += 1) {
    const charA = a[i - 1] ?? '';
    let lastMatchColumn = 0;
    for (let j = 1; j <= b.length; j += 1) {
      const charB = b[j - 1] ?? '';
      const k = lastRowOf.get(charB) ?? 0;
      const l = lastMatchColumn;
      const same = charA === charB;
      if (same) lastMatchColumn = j;
      distance[cell(i + 1, j + 1)] = Math.min(
        at(i, j) + (same ? 0 : 1),
        at(i + 1, j) + 1,
        at(i, j + 1) + 1,
        at(k, l) + (i - k - 1) + 1 + (j - l - 1),
      );
    }
    lastRowOf.set(charA, i);
  }
  return at(a.length + 1, b.length + 1);
}
