import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { addPolynomials, scalePolynomial } from '../../../src/engine/analysis/polynomial.js';
import {
  multiplyPolynomials,
  scaledPolynomial,
  squarePolynomial,
  sumOfPolynomials,
} from '../../../src/engine/checks/polynomial-products.js';

describe('polynomial products', () => {
  it('multiplies ascending coefficients: (1 + 2s)(3 - s + s^2) = 3 + 5s - s^2 + 2s^3', () => {
    expect(multiplyPolynomials([1, 2], [3, -1, 1])).toEqual([3, 5, -1, 2]);
    expect(multiplyPolynomials([], [1])).toEqual([]);
  });

  it('squares: (2 - s)^2 = 4 - 4s + s^2', () => {
    expect(squarePolynomial([2, -1])).toEqual([4, -4, 1]);
  });
});

describe('polynomial sums and multiples', () => {
  it('adds and scales term by term: (1 + 2s) + (3 - s + s^2) = 4 + s + s^2; 3 (1 - s) = 3 - 3s', () => {
    expect(sumOfPolynomials([1, 2], [3, -1, 1])).toEqual([4, 1, 1]);
    expect(sumOfPolynomials([1], [2], [0, 0, 5])).toEqual([3, 0, 5]);
    expect(scaledPolynomial([1, -1], 3)).toEqual([3, -3]);
  });

  const polynomial = fc.array(fc.double({ noNaN: true }), { maxLength: 5 });

  it('gives the very numbers of addPolynomials and scalePolynomial, signed zeros included (property)', () => {
    fc.assert(
      fc.property(polynomial, polynomial, polynomial, fc.double({ noNaN: true }), (a, b, c, factor) => {
        expect(sumOfPolynomials(a, b)).toStrictEqual(addPolynomials(a, b));
        expect(sumOfPolynomials(a, b, c)).toStrictEqual(addPolynomials(a, b, c));
        expect(scaledPolynomial(a, factor)).toStrictEqual(scalePolynomial(a, factor));
      }),
      { numRuns: 300 },
    );
  });
});
