import { describe, expect, it } from 'vitest';
import { multiplyPolynomials, squarePolynomial } from '../../../src/engine/checks/polynomial-products.js';

describe('polynomial products', () => {
  it('multiplies ascending coefficients: (1 + 2s)(3 - s + s^2) = 3 + 5s - s^2 + 2s^3', () => {
    expect(multiplyPolynomials([1, 2], [3, -1, 1])).toEqual([3, 5, -1, 2]);
    expect(multiplyPolynomials([], [1])).toEqual([]);
  });

  it('squares: (2 - s)^2 = 4 - 4s + s^2', () => {
    expect(squarePolynomial([2, -1])).toEqual([4, -4, 1]);
  });
});
