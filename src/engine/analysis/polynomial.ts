/**
 * Polynomials with ascending real coefficients, p(s) = c[0] + c[1] s + ..., the exact form of every
 * field on a piece of a prismatic member under piecewise-linear loads.
 */

import type { Polynomial } from './result.js';

/** Horner evaluation. */
export function evaluatePolynomial(p: Polynomial, s: number): number {
  let value = 0;
  for (let i = p.length - 1; i >= 0; i--) value = value * s + (p[i] as number);
  return value;
}

/**
 * Whether every coefficient is zero (of either sign). Such a p evaluates to +0 at every s >= 0 (each
 * Horner step adds a zero to a +0), so a search for its largest value can pass it over.
 */
export function isZeroPolynomial(p: Polynomial): boolean {
  for (let i = 0; i < p.length; i++) if ((p[i] as number) !== 0) return false;
  return true;
}

/**
 * Whether p' can have a root: a non-zero coefficient beyond the linear one among the first `terms`.
 * Without one p' is a constant, and realRootsIn finds no root of it.
 */
export function derivativeCanVanish(p: Polynomial, terms: number = p.length): boolean {
  for (let i = 2; i < terms; i++) if ((p[i] as number) !== 0) return true;
  return false;
}

export function derivative(p: Polynomial): number[] {
  const d: number[] = [];
  for (let i = 1; i < p.length; i++) d.push(i * (p[i] as number));
  return d;
}

/** The antiderivative that takes `atZero` at s = 0. */
export function antiderivative(p: Polynomial, atZero = 0): number[] {
  const a: number[] = [atZero];
  for (let i = 0; i < p.length; i++) a.push((p[i] as number) / (i + 1));
  return a;
}

export function addPolynomials(...ps: readonly Polynomial[]): number[] {
  const n = Math.max(0, ...ps.map((p) => p.length));
  const sum = new Array<number>(n).fill(0);
  for (const p of ps) for (let i = 0; i < p.length; i++) sum[i] = (sum[i] as number) + (p[i] as number);
  return sum;
}

export function scalePolynomial(p: Polynomial, factor: number): number[] {
  return p.map((c) => c * factor);
}

/**
 * Coefficients without the leading ones whose term is negligible on the interval: |c_k| R^k at or
 * below 1e-14 of the largest term, R = max(|a|, |b|).
 */
function trimmedOn(p: Polynomial, a: number, b: number): Polynomial {
  const reach = Math.max(Math.abs(a), Math.abs(b));
  let power = 1;
  let largest = 0;
  for (let k = 0; k < p.length; k++) {
    largest = Math.max(largest, Math.abs(p[k] as number) * power);
    power *= reach;
  }
  let degree = p.length - 1;
  while (degree >= 0 && Math.abs(p[degree] as number) * reach ** degree <= 1e-14 * largest) degree--;
  return degree === p.length - 1 ? p : p.slice(0, degree + 1);
}

/**
 * Real roots of p in the open interval (a, b), ascending. Degrees 1 and 2 are solved in closed form
 * (the quadratic by the cancellation-free formula); higher degrees are cut at the roots of p' (found
 * the same way), so p is monotonic on each part and a sign change brackets exactly one root, which a
 * Newton iteration safeguarded by bisection pins to machine precision. A root where p touches zero
 * without changing sign may be missed.
 */
export function realRootsIn(p: Polynomial, a: number, b: number): number[] {
  if (!(b > a)) return [];
  const q = trimmedOn(p, a, b);
  if (q.length <= 1) return [];
  if (q.length === 2) {
    const root = -(q[0] as number) / (q[1] as number);
    return root > a && root < b ? [root] : [];
  }
  if (q.length === 3) return quadraticRootsIn(q[0] as number, q[1] as number, q[2] as number, a, b);
  // The parts run from a to the first root of q', between consecutive roots, and from the last to b.
  const cuts = realRootsIn(derivative(q), a, b);
  const roots: number[] = [];
  let from = a;
  for (let i = 0; i <= cuts.length; i++) {
    const to = i < cuts.length ? (cuts[i] as number) : b;
    const root = bracketedRoot(q, from, to);
    if (root !== undefined && root > a && root < b) pushDistinct(roots, root, a, b);
    from = to;
  }
  return roots;
}

function pushDistinct(roots: number[], root: number, a: number, b: number): void {
  if (roots.length === 0 || root - (roots[roots.length - 1] as number) > 1e-12 * (b - a)) roots.push(root);
}

/** Roots of c0 + c1 s + c2 s^2 in (a, b), via q = -(c1 + sign(c1) sqrt(D)) / 2 (Numerical Recipes 3rd ed., sec. 5.6; from memory). */
function quadraticRootsIn(c0: number, c1: number, c2: number, a: number, b: number): number[] {
  const discriminant = c1 * c1 - 4 * c2 * c0;
  if (discriminant < 0) return [];
  const q = -0.5 * (c1 + (c1 < 0 ? -1 : 1) * Math.sqrt(discriminant));
  const roots: number[] = [];
  if (q === 0) {
    if (0 > a && 0 < b) roots.push(0);
    return roots;
  }
  // The two candidates in ascending order, swapped exactly when a sort by x - y would swap them.
  let lower = q / c2;
  let upper = c0 / q;
  if (upper - lower < 0) {
    const first = upper;
    upper = lower;
    lower = first;
  }
  if (lower > a && lower < b) pushDistinct(roots, lower, a, b);
  if (upper > a && upper < b) pushDistinct(roots, upper, a, b);
  return roots;
}

/** The root of p in [lo, hi] where p changes sign, or undefined if it does not. */
function bracketedRoot(p: Polynomial, lo: number, hi: number): number | undefined {
  const fLo = evaluatePolynomial(p, lo);
  const fHi = evaluatePolynomial(p, hi);
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
    for (let k = p.length - 1; k >= 0; k--) {
      slope = slope * x + value;
      value = value * x + (p[k] as number);
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
}
