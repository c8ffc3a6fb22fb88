/**
 * The polynomial arithmetic of the squared stress measures, whose extremes are roots of a derivative:
 * products, and sums and multiples formed term for term as analysis/polynomial.ts forms them (the same
 * numbers), written out with no closure and no argument list. polynomial-buffer.ts does the same
 * arithmetic in reused buffers for the scan of every piece.
 */

import { packedZeros } from '../analysis/zero-filled.js';
import type { Polynomial } from '../analysis/result.js';

export function multiplyPolynomials(p: Polynomial, q: Polynomial): number[] {
  if (p.length === 0 || q.length === 0) return [];
  const product = packedZeros(p.length + q.length - 1);
  for (let i = 0; i < p.length; i++) {
    for (let j = 0; j < q.length; j++) product[i + j] = (product[i + j] as number) + (p[i] as number) * (q[j] as number);
  }
  return product;
}

export function squarePolynomial(p: Polynomial): number[] {
  return multiplyPolynomials(p, p);
}

/** p * factor, coefficient by coefficient (scalePolynomial). */
export function scaledPolynomial(p: Polynomial, factor: number): number[] {
  const scaled: number[] = [];
  for (let i = 0; i < p.length; i++) scaled.push((p[i] as number) * factor);
  return scaled;
}

/** a + b (+ c), each sum started from 0 and taken in that order (addPolynomials). */
export function sumOfPolynomials(a: Polynomial, b: Polynomial, c: Polynomial = []): number[] {
  const sum = packedZeros(Math.max(0, a.length, b.length, c.length));
  for (let i = 0; i < a.length; i++) sum[i] = (sum[i] as number) + (a[i] as number);
  for (let i = 0; i < b.length; i++) sum[i] = (sum[i] as number) + (b[i] as number);
  for (let i = 0; i < c.length; i++) sum[i] = (sum[i] as number) + (c[i] as number);
  return sum;
}
