import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  addPolynomials,
  antiderivative,
  derivative,
  derivativeCanVanish,
  evaluatePolynomial,
  isZeroPolynomial,
  realRootsIn,
  scalePolynomial,
} from '../../../src/engine/analysis/polynomial.js';

/** Ascending coefficients of (s - r1)(s - r2)... */
function fromRoots(roots: readonly number[]): number[] {
  let p = [1];
  for (const r of roots) {
    const next = new Array<number>(p.length + 1).fill(0);
    p.forEach((c, k) => {
      next[k + 1] = (next[k + 1] as number) + c;
      next[k] = (next[k] as number) - r * c;
    });
    p = next;
  }
  return p;
}

describe('polynomial arithmetic', () => {
  it('evaluates, differentiates and integrates 1 + 2s + 3s^2', () => {
    const p = [1, 2, 3];
    expect(evaluatePolynomial(p, 2)).toBe(17); // 1 + 4 + 12
    expect(derivative(p)).toEqual([2, 6]);
    expect(antiderivative(p, 5)).toEqual([5, 1, 1, 1]); // 5 + s + s^2 + s^3
    expect(addPolynomials([1, 2], [0, 0, 3])).toEqual([1, 2, 3]);
    expect(scalePolynomial(p, 2)).toEqual([2, 4, 6]);
    expect(evaluatePolynomial([], 3)).toBe(0);
  });
});

describe('realRootsIn', () => {
  it('finds the roots of (s - 1)(s - 2)(s - 3) inside (0, 4) and only those inside', () => {
    const p = fromRoots([1, 2, 3]);
    const roots = realRootsIn(p, 0, 4);
    expect(roots).toHaveLength(3);
    roots.forEach((root, i) => expect(root).toBeCloseTo(i + 1, 12));
    expect(realRootsIn(p, 1.5, 2.5).map((r) => Math.round(r * 1e12) / 1e12)).toEqual([2]);
    // The interval is open: a root on its end is not inside.
    expect(realRootsIn(p, 2, 3)).toEqual([]);
  });

  it('solves linear and quadratic polynomials in closed form', () => {
    expect(realRootsIn([-1, 2], 0, 1)).toEqual([0.5]);
    // s^2 - 1e8 s + 1 has roots 1e8 and about 1e-8: the small one without cancellation.
    const [small] = realRootsIn([1, -1e8, 1], 0, 1);
    expect(Math.abs((small as number) - 1e-8) / 1e-8).toBeLessThan(1e-12);
    expect(realRootsIn([1, 0, 1], -5, 5)).toEqual([]);
  });

  it('ignores a leading term that is negligible on the interval, not by its raw size', () => {
    // 1e-30 s^2 - s + 1: on (0, 2) the s^2 term is 4e-30 against 1, so the root is 1;
    // on (0, 1e31) it matters and the second root 1e30 appears.
    expect(realRootsIn([1, -1, 1e-30], 0, 2)).toEqual([1]);
    const far = realRootsIn([1, -1, 1e-30], 0, 1e31);
    expect(far).toHaveLength(2);
    expect((far[1] as number) / 1e30).toBeCloseTo(1, 9);
  });

  /**
   * 1e-9, or what the root's conditioning allows where roots crowd together (1e-3 apart, three in a
   * row): coefficients rounded by a few ulps move a simple root r by about
   * eps sum |c_k| r^k / |p'(r)| (Wilkinson, Rounding Errors in Algebraic Processes, 1963, ch. 2);
   * 64 of those leave room for the rounding of fromRoots and of the solver.
   */
  function rootTolerance(p: readonly number[], root: number): number {
    const size = p.reduce((sum, c, k) => sum + Math.abs(c) * root ** k, 0);
    const slope = Math.abs(evaluatePolynomial(derivative(p), root));
    return Math.max(1e-9, (64 * Number.EPSILON * size) / slope);
  }

  it('finds every simple root of random quartics and quintics to 1e-9, or as well as its conditioning allows', () => {
    const rootsArbitrary = fc.uniqueArray(fc.integer({ min: 1, max: 999 }), { minLength: 1, maxLength: 5 });
    fc.assert(
      fc.property(rootsArbitrary, fc.double({ min: 0.01, max: 100, noNaN: true }), (grid, scale) => {
        const roots = grid.map((k) => k / 1000).sort((a, b) => a - b);
        // Roots at least 1e-3 apart on (0, 1); any scale of the coefficients.
        const p = scalePolynomial(fromRoots(roots), scale);
        const found = realRootsIn(p, 0, 1);
        expect(found).toHaveLength(roots.length);
        found.forEach((root, i) => expect(Math.abs(root - (roots[i] as number))).toBeLessThanOrEqual(rootTolerance(p, roots[i] as number)));
      }),
      { numRuns: 200 },
    );
  });
});

describe('isZeroPolynomial and derivativeCanVanish', () => {
  const coefficient = fc.oneof(fc.constantFrom(0, -0), fc.double({ min: -1e6, max: 1e6, noNaN: true }));

  it('a polynomial of zeros of either sign is +0 at every s >= 0 (property)', () => {
    const zeros = fc.array(fc.constantFrom(0, -0), { maxLength: 6 });
    fc.assert(
      fc.property(zeros, fc.double({ min: 0, max: 1e6, noNaN: true }), (p, s) => {
        expect(isZeroPolynomial(p)).toBe(true);
        expect(Object.is(evaluatePolynomial(p, s), 0)).toBe(true);
      }),
    );
    expect(isZeroPolynomial([0, -0, 1e-300])).toBe(false);
  });

  it('a polynomial whose derivative cannot vanish has no stationary point for realRootsIn (property)', () => {
    fc.assert(
      fc.property(coefficient, coefficient, fc.array(fc.constantFrom(0, -0), { maxLength: 4 }), fc.double({ min: 0.01, max: 100, noNaN: true }), (c0, c1, zeros, b) => {
        const p = [c0, c1, ...zeros];
        expect(derivativeCanVanish(p)).toBe(false);
        expect(realRootsIn(derivative(p), 0, b)).toEqual([]);
      }),
    );
    expect(derivativeCanVanish([0, 0, 1])).toBe(true);
    // Only the first `terms` coefficients count.
    expect(derivativeCanVanish([0, 0, 0, 1], 3)).toBe(false);
  });
});
