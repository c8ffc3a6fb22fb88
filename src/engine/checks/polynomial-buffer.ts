/**
 * A polynomial held in a reusable buffer, for the scan of every piece: the products, multiples and
 * sums of polynomial-products.ts written into buffers kept from piece to piece, so that the scan makes
 * no array per operation. Each operation does the same arithmetic in the same order as its
 * counterpart there (each sum started from 0), so the coefficients are the same numbers.
 */

import type { Polynomial } from '../analysis/result.js';

export class PolynomialBuffer {
  /** Ascending coefficients in [0, terms); entries beyond are left over from earlier use. */
  readonly coefficients: number[] = [];
  terms = 0;

  /** A copy of p. */
  copyOf(p: Polynomial): this {
    this.resize(p.length);
    for (let i = 0; i < p.length; i++) this.coefficients[i] = p[i] as number;
    return this;
  }

  /** p * p (squarePolynomial); p must be another buffer. */
  squareOf(p: PolynomialBuffer): this {
    const n = p.terms;
    this.resize(n === 0 ? 0 : 2 * n - 1);
    const product = this.coefficients;
    const c = p.coefficients;
    for (let i = 0; i < this.terms; i++) product[i] = 0;
    for (let i = 0; i < n; i++) {
      for (let j = 0; j < n; j++) product[i + j] = (product[i + j] as number) + (c[i] as number) * (c[j] as number);
    }
    return this;
  }

  /** p * factor (scaledPolynomial); p may be this buffer. */
  scaledOf(p: PolynomialBuffer, factor: number): this {
    this.resize(p.terms);
    for (let i = 0; i < p.terms; i++) this.coefficients[i] = (p.coefficients[i] as number) * factor;
    return this;
  }

  /** a + b (+ c), each sum started from 0 and taken in that order (sumOfPolynomials); none may be this buffer. */
  sumOf(a: PolynomialBuffer, b: PolynomialBuffer, c?: PolynomialBuffer): this {
    this.resize(Math.max(0, a.terms, b.terms, c === undefined ? 0 : c.terms));
    const sum = this.coefficients;
    for (let i = 0; i < this.terms; i++) sum[i] = 0;
    for (let i = 0; i < a.terms; i++) sum[i] = (sum[i] as number) + (a.coefficients[i] as number);
    for (let i = 0; i < b.terms; i++) sum[i] = (sum[i] as number) + (b.coefficients[i] as number);
    if (c !== undefined) for (let i = 0; i < c.terms; i++) sum[i] = (sum[i] as number) + (c.coefficients[i] as number);
    return this;
  }

  /** The coefficients as a polynomial of their own. */
  toPolynomial(): number[] {
    return this.coefficients.slice(0, this.terms);
  }

  private resize(terms: number): void {
    while (this.coefficients.length < terms) this.coefficients.push(0);
    this.terms = terms;
  }
}
