/** Products of the field polynomials, for the squared stress measures whose extremes are roots of a derivative. */

import type { Polynomial } from '../analysis/result.js';

export function multiplyPolynomials(p: Polynomial, q: Polynomial): number[] {
  if (p.length === 0 || q.length === 0) return [];
  const product = new Array<number>(p.length + q.length - 1).fill(0);
  for (let i = 0; i < p.length; i++) {
    for (let j = 0; j < q.length; j++) product[i + j] = (product[i + j] as number) + (p[i] as number) * (q[j] as number);
  }
  return product;
}

export function squarePolynomial(p: Polynomial): number[] {
  return multiplyPolynomials(p, p);
}
