import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  addPolynomials,
  antiderivative,
  derivative,
  evaluatePolynomial,
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

/**
 * realRootsIn as it read before its cuts and its quadratic's two candidates were written out without
 * a spread and a sort: the reference the present one must match number for number.
 */
function referenceRealRootsIn(p: readonly number[], a: number, b: number): number[] {
  const pushDistinct = (roots: number[], root: number): void => {
    if (roots.length === 0 || root - (roots[roots.length - 1] as number) > 1e-12 * (b - a)) roots.push(root);
  };
  const trimmedOn = (c: readonly number[]): readonly number[] => {
    const reach = Math.max(Math.abs(a), Math.abs(b));
    let power = 1;
    let largest = 0;
    for (let k = 0; k < c.length; k++) {
      largest = Math.max(largest, Math.abs(c[k] as number) * power);
      power *= reach;
    }
    let degree = c.length - 1;
    while (degree >= 0 && Math.abs(c[degree] as number) * reach ** degree <= 1e-14 * largest) degree--;
    return degree === c.length - 1 ? c : c.slice(0, degree + 1);
  };
  const bracketedRoot = (c: readonly number[], lo: number, hi: number): number | undefined => {
    const fLo = evaluatePolynomial(c, lo);
    const fHi = evaluatePolynomial(c, hi);
    if (fLo === 0) return lo;
    if (fHi === 0) return hi;
    if (fLo < 0 === fHi < 0) return undefined;
    let negative = fLo < 0 ? lo : hi;
    let positive = fLo < 0 ? hi : lo;
    let x = 0.5 * (lo + hi);
    let lastStep = hi - lo;
    for (let i = 0; i < 200; i++) {
      let value = 0;
      let slope = 0;
      for (let k = c.length - 1; k >= 0; k--) {
        slope = slope * x + value;
        value = value * x + (c[k] as number);
      }
      if (value === 0) return x;
      if (value < 0) negative = x;
      else positive = x;
      const left = Math.min(negative, positive);
      const right = Math.max(negative, positive);
      let next = x - value / slope;
      if (!(next > left && next < right) || Math.abs(next - x) > 0.5 * lastStep) next = 0.5 * (left + right);
      lastStep = Math.abs(next - x);
      if (next === x || lastStep <= 2 * Number.EPSILON * Math.abs(next) || right - left <= 0) return next;
      x = next;
    }
    return x;
  };
  if (!(b > a)) return [];
  const q = trimmedOn(p);
  if (q.length <= 1) return [];
  if (q.length === 2) {
    const root = -(q[0] as number) / (q[1] as number);
    return root > a && root < b ? [root] : [];
  }
  const roots: number[] = [];
  if (q.length === 3) {
    const [c0, c1, c2] = q as [number, number, number];
    const discriminant = c1 * c1 - 4 * c2 * c0;
    if (discriminant < 0) return [];
    const r = -0.5 * (c1 + (c1 < 0 ? -1 : 1) * Math.sqrt(discriminant));
    const candidates = r === 0 ? [0] : [r / c2, c0 / r].sort((x, y) => x - y);
    for (const root of candidates) if (root > a && root < b) pushDistinct(roots, root);
    return roots;
  }
  const cuts = [a, ...referenceRealRootsIn(derivative(q), a, b), b];
  for (let i = 0; i + 1 < cuts.length; i++) {
    const root = bracketedRoot(q, cuts[i] as number, cuts[i + 1] as number);
    if (root !== undefined && root > a && root < b) pushDistinct(roots, root);
  }
  return roots;
}

describe('realRootsIn against its plain formulation', () => {
  it('gives the same numbers for any polynomial and interval (property)', () => {
    // Exact zeros, signed zeros, huge and tiny coefficients, and equal roots are the cases a rewrite could miss.
    const coefficient = fc.oneof(
      fc.constantFrom(0, -0, 1, -1, 2),
      fc.double({ min: -1e6, max: 1e6, noNaN: true }),
      fc.double({ min: -1e-300, max: 1e-300, noNaN: true }),
      fc.double({ noNaN: true }),
    );
    const polynomial = fc.oneof(
      fc.array(coefficient, { minLength: 0, maxLength: 7 }),
      fc.array(fc.integer({ min: -3, max: 3 }), { minLength: 1, maxLength: 6 }).map((roots) => fromRoots(roots)),
    );
    fc.assert(
      fc.property(polynomial, fc.double({ min: -10, max: 10, noNaN: true }), fc.double({ min: 0, max: 20, noNaN: true }), (p, a, width) => {
        const found = realRootsIn(p, a, a + width);
        const expected = referenceRealRootsIn(p, a, a + width);
        expect(found.length).toBe(expected.length);
        found.forEach((root, i) => expect(Object.is(root, expected[i])).toBe(true));
      }),
      { numRuns: 1500 },
    );
  });
});
