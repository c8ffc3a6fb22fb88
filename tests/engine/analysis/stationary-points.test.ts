import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { derivative, realRootsIn } from '../../../src/engine/analysis/polynomial.js';
import { solveStationaryPoints, stationaryPointsOn } from '../../../src/engine/analysis/stationary-points.js';

/** The same numbers, signed zeros told apart. */
function expectSameNumbers(found: readonly number[], expected: readonly number[]): void {
  expect(found.length).toBe(expected.length);
  found.forEach((value, i) => expect(Object.is(value, expected[i])).toBe(true));
}

const coefficient = fc.oneof(fc.constantFrom(0, -0, 1, -1), fc.double({ min: -1e6, max: 1e6, noNaN: true }));
const polynomial = fc.array(coefficient, { minLength: 3, maxLength: 6 });
const length = fc.double({ min: 0.01, max: 20, noNaN: true });

describe('stationaryPointsOn', () => {
  it('gives the roots of realRootsIn(derivative(p), 0, length), solved anew or kept (property)', () => {
    fc.assert(
      fc.property(polynomial, length, length, (p, first, second) => {
        const expected = realRootsIn(derivative(p), 0, first);
        expectSameNumbers(solveStationaryPoints(p, first), expected);
        expectSameNumbers(stationaryPointsOn(p, first), expected);
        // The same array on another length is solved on that length.
        expectSameNumbers(stationaryPointsOn(p, second), realRootsIn(derivative(p), 0, second));
      }),
      { numRuns: 300 },
    );
  });

  it('solves a polynomial again once many others have been solved since', () => {
    // (s - 1)(s - 3) = 3 - 4 s + s^2 is stationary at s = 2.
    const p = [3, -4, 1];
    expect(solveStationaryPoints(p, 4)).toEqual([2]);
    for (let i = 0; i < 200; i++) solveStationaryPoints([i, 1, 1], 4);
    expect(stationaryPointsOn(p, 4)).toEqual([2]);
  });
});
