import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { PolynomialBuffer } from '../../../src/engine/checks/polynomial-buffer.js';
import { scaledPolynomial, squarePolynomial, sumOfPolynomials } from '../../../src/engine/checks/polynomial-products.js';

/** The same numbers, signed zeros told apart. */
function sameNumbers(actual: readonly number[], expected: readonly number[]): boolean {
  return actual.length === expected.length && actual.every((value, i) => Object.is(value, expected[i]));
}

describe('PolynomialBuffer', () => {
  it('squares, scales and adds as the products module does: (2 - s)^2 + 3 (1 + s) = 7 - s + s^2', () => {
    const p = new PolynomialBuffer().copyOf([2, -1]);
    const square = new PolynomialBuffer().squareOf(p);
    const scaled = new PolynomialBuffer().scaledOf(new PolynomialBuffer().copyOf([1, 1]), 3);
    expect(new PolynomialBuffer().sumOf(square, scaled).toPolynomial()).toEqual([7, -1, 1]);
  });

  it('gives the numbers of squarePolynomial, scaledPolynomial and sumOfPolynomials, reused buffers and all (property)', () => {
    // One set of buffers serves every run, longer and shorter polynomials in turn, as the scan uses them.
    const coefficient = fc.oneof(fc.constantFrom(0, -0, 1, -1), fc.double({ noNaN: true }));
    const polynomial = fc.array(coefficient, { maxLength: 5 });
    const [a, b, c, out, other] = Array.from({ length: 5 }, () => new PolynomialBuffer());
    fc.assert(
      fc.property(polynomial, polynomial, polynomial, coefficient, (p, q, r, factor) => {
        a!.copyOf(p);
        b!.copyOf(q);
        c!.copyOf(r);
        expect(sameNumbers(out!.squareOf(a!).toPolynomial(), squarePolynomial(p))).toBe(true);
        expect(sameNumbers(out!.scaledOf(b!, factor).toPolynomial(), scaledPolynomial(q, factor))).toBe(true);
        expect(sameNumbers(other!.copyOf(q).scaledOf(other!, factor).toPolynomial(), scaledPolynomial(q, factor))).toBe(true);
        expect(sameNumbers(out!.sumOf(a!, b!).toPolynomial(), sumOfPolynomials(p, q))).toBe(true);
        expect(sameNumbers(out!.sumOf(a!, b!, c!).toPolynomial(), sumOfPolynomials(p, q, r))).toBe(true);
      }),
      { numRuns: 1000 },
    );
  });
});
