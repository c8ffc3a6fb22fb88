import fc from 'fast-check';
import { lusolve } from 'mathjs';
import { describe, expect, it } from 'vitest';
import {
  addToBand,
  bandEntry,
  createSymmetricBandMatrix,
  factorSymmetricBand,
  restrainInBand,
  solveWithBandFactors,
  type SymmetricBandMatrix,
} from '../../../src/engine/analysis/banded-solver.js';

function dense(matrix: SymmetricBandMatrix): number[][] {
  return Array.from({ length: matrix.size }, (_, i) =>
    Array.from({ length: matrix.size }, (_, j) => bandEntry(matrix, i, j)),
  );
}

function relativeError(actual: ArrayLike<number>, expected: ArrayLike<number>): number {
  let difference = 0;
  let size = 0;
  for (let i = 0; i < expected.length; i++) {
    difference = Math.max(difference, Math.abs((actual[i] as number) - (expected[i] as number)));
    size = Math.max(size, Math.abs(expected[i] as number));
  }
  return difference / size;
}

/**
 * A = C C^T with C lower triangular of half-bandwidth b, diagonal in [0.5, 2] and each row's
 * off-diagonal entries summing to at most 0.45 in magnitude: C is diagonally dominant, so A is
 * symmetric positive definite, of band b and well conditioned.
 */
const spdBandSystem = fc
  .record({ size: fc.integer({ min: 1, max: 40 }), halfBandwidth: fc.integer({ min: 0, max: 5 }) })
  .chain(({ size, halfBandwidth }) =>
    fc.record({
      size: fc.constant(size),
      halfBandwidth: fc.constant(halfBandwidth),
      lower: fc.array(fc.double({ min: -1, max: 1, noNaN: true }), {
        minLength: size * (halfBandwidth + 1),
        maxLength: size * (halfBandwidth + 1),
      }),
      diagonal: fc.array(fc.double({ min: 0.5, max: 2, noNaN: true }), { minLength: size, maxLength: size }),
      rhs: fc.array(fc.double({ min: -1, max: 1, noNaN: true }), { minLength: size, maxLength: size }),
    }),
  )
  .map(({ size, halfBandwidth, lower, diagonal, rhs }) => {
    const c = (i: number, j: number): number =>
      i === j
        ? (diagonal[i] as number)
        : j < i && i - j <= halfBandwidth
          ? ((lower[i * (halfBandwidth + 1) + i - j] as number) * 0.45) / halfBandwidth
          : 0;
    const matrix = createSymmetricBandMatrix(size, halfBandwidth);
    for (let i = 0; i < size; i++) {
      for (let j = Math.max(0, i - halfBandwidth); j <= i; j++) {
        let sum = 0;
        for (let k = 0; k <= j; k++) sum += c(i, k) * c(j, k);
        addToBand(matrix, i, j, sum);
      }
    }
    // A right-hand side of order one keeps the relative error meaningful.
    const b = rhs.map((value, i) => (i === 0 ? 1 + Math.abs(value) : value));
    return { matrix, b };
  });

describe('factorSymmetricBand and solveWithBandFactors', () => {
  it('match mathjs lusolve on random symmetric positive definite band systems to 1e-9', () => {
    fc.assert(
      fc.property(spdBandSystem, ({ matrix, b }) => {
        const factors = factorSymmetricBand(matrix);
        expect(factors.kind).toBe('factored');
        if (factors.kind !== 'factored') return;
        const x = solveWithBandFactors(factors, b);
        const reference = (lusolve(dense(matrix), b) as number[][]).map((row) => row[0] as number);
        expect(relativeError(x, reference)).toBeLessThanOrEqual(1e-9);
      }),
      { numRuns: 150 },
    );
  });

  it('solves a 4 x 4 tridiagonal system exactly', () => {
    // [2 -1 0 0; -1 2 -1 0; 0 -1 2 -1; 0 0 -1 2] x = [1 0 0 1] has x = [1 1 1 1] (substitution).
    const matrix = createSymmetricBandMatrix(4, 1);
    for (let i = 0; i < 4; i++) addToBand(matrix, i, i, 2);
    for (let i = 1; i < 4; i++) addToBand(matrix, i, i - 1, -1);
    const factors = factorSymmetricBand(matrix);
    if (factors.kind !== 'factored') throw new Error('expected a factorization');
    expect(Array.from(solveWithBandFactors(factors, [1, 0, 0, 1]))).toEqual([1, 1, 1, 1].map((v) => expect.closeTo(v, 14)));
  });

  it('finds the vanishing pivot of a free-free bar and its rigid motion', () => {
    // Three bar elements of stiffness 1 with no support: K [1 1 1 1] = 0, so the last pivot vanishes.
    const matrix = createSymmetricBandMatrix(4, 1);
    for (let e = 0; e < 3; e++) {
      addToBand(matrix, e, e, 1);
      addToBand(matrix, e + 1, e + 1, 1);
      addToBand(matrix, e + 1, e, -1);
    }
    const factors = factorSymmetricBand(matrix);
    expect(factors.kind).toBe('singular');
    if (factors.kind !== 'singular') return;
    expect(factors.pivotIndex).toBe(3);
    for (const value of factors.nullVector) expect(value).toBeCloseTo(1, 12);
  });

  it('judges a pivot against its own diagonal, not an absolute epsilon', () => {
    // The same free bar scaled by 1e-20 is still singular, and a well-posed system scaled by 1e-20 is not.
    const singular = createSymmetricBandMatrix(2, 1);
    addToBand(singular, 0, 0, 1e-20);
    addToBand(singular, 1, 1, 1e-20);
    addToBand(singular, 1, 0, -1e-20);
    expect(factorSymmetricBand(singular).kind).toBe('singular');
    const regular = createSymmetricBandMatrix(2, 1);
    addToBand(regular, 0, 0, 2e-20);
    addToBand(regular, 1, 1, 2e-20);
    addToBand(regular, 1, 0, -1e-20);
    const factors = factorSymmetricBand(regular);
    if (factors.kind !== 'factored') throw new Error('expected a factorization');
    // [2 -1; -1 2] 1e-20 x = [1e-20 1e-20] gives x = [1 1].
    for (const value of solveWithBandFactors(factors, [1e-20, 1e-20])) expect(value).toBeCloseTo(1, 12);
  });

  it('reports a zero row as singular where it lies', () => {
    const matrix = createSymmetricBandMatrix(3, 1);
    addToBand(matrix, 0, 0, 1);
    addToBand(matrix, 2, 2, 1);
    const factors = factorSymmetricBand(matrix);
    expect(factors.kind === 'singular' && factors.pivotIndex).toBe(1);
  });

  it('restrainInBand turns a row and column into the identity without touching the rest', () => {
    const matrix = createSymmetricBandMatrix(3, 1);
    for (let i = 0; i < 3; i++) addToBand(matrix, i, i, 2);
    addToBand(matrix, 1, 0, -1);
    addToBand(matrix, 2, 1, -1);
    restrainInBand(matrix, 1);
    expect(dense(matrix)).toEqual([
      [2, 0, 0],
      [0, 1, 0],
      [0, 0, 2],
    ]);
  });

  it('refuses an entry outside the band', () => {
    const matrix = createSymmetricBandMatrix(4, 1);
    expect(() => addToBand(matrix, 3, 0, 1)).toThrow(RangeError);
    expect(bandEntry(matrix, 3, 0)).toBe(0);
  });
});
