/**
 * Arrays of zeros for the engine's per-call numbers. Node 20 allocates a Float64Array of more than
 * eight entries outside the heap, several hundred nanoseconds each, while a short plain array costs a
 * fraction of that; a long plain array costs more to grow and to turn into doubles than the typed one.
 */

/** A plain array of doubles or a Float64Array: read and written the same way, holding the same numbers. */
export type DoubleArray = number[] | Float64Array;

/** Beyond this many entries a Float64Array is the cheaper (measured in Node 20: the two cost alike near 128). */
const LONGEST_PLAIN_ARRAY = 128;

/** n zeros in a packed array (new Array(n) would leave it holey, slower to read). */
export function packedZeros(n: number): number[] {
  const array: number[] = [];
  for (let i = 0; i < n; i++) array.push(0);
  return array;
}

/** n zeros to be overwritten with doubles: packed and plain while short, a Float64Array when long. */
export function zeroFilledDoubles(n: number): DoubleArray {
  return n <= LONGEST_PLAIN_ARRAY ? packedZeros(n) : new Float64Array(n);
}
