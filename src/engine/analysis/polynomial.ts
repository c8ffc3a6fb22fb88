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

/** Degree after dropping leading coefficients that are zero relative to the largest one. */
function trimmed(p: Polynomial): number[] {
  const scale = Math.max(0, ...p.map(Math.abs));
  const out = [...p];
  while (out.length > 0 && Math.abs(out[out.length - 1] as number) <= 1e-14 * scale) out.pop();
  return out;
}

/**
 * Real roots of p in the open interval (a, b), ascending. The interval is cut at the roots of p'
 * (found the same way), so p is monotonic on each part and a sign change brackets exactly one root,
 * which bisection then pins to machine precision.
 */
export function realRootsIn(p: Polynomial, a: number, b: number): number[] {
  const q = trimmed(p);
  if (q.length <= 1 || !(b > a)) return [];
  if (q.length === 2) {
    const root = -(q[0] as number) / (q[1] as number);
    return root > a && root < b ? [root] : [];
  }
  const cuts = [a, ...realRootsIn(derivative(q), a, b), b];
  const roots: number[] = [];
  for (let i = 0; i + 1 < cuts.length; i++) {
    const lo = cuts[i] as number;
    const hi = cuts[i + 1] as number;
    const root = bracketedRoot(q, lo, hi);
    if (root !== undefined && root > a && root < b) {
      if (roots.length === 0 || root - (roots[roots.length - 1] as number) > 1e-12 * (b - a)) roots.push(root);
    }
  }
  return roots;
}

function bracketedRoot(p: Polynomial, lo: number, hi: number): number | undefined {
  let fLo = evaluatePolynomial(p, lo);
  const fHi = evaluatePolynomial(p, hi);
  if (fLo === 0) return lo;
  if (fHi === 0) return hi;
  if (Math.sign(fLo) === Math.sign(fHi)) return undefined;
  let left = lo;
  let right = hi;
  for (let i = 0; i < 200 && right - left > 0; i++) {
    const mid = 0.5 * (left + right);
    if (mid === left || mid === right) break;
    const fMid = evaluatePolynomial(p, mid);
    if (fMid === 0) return mid;
    if (Math.sign(fMid) === Math.sign(fLo)) {
      left = mid;
      fLo = fMid;
    } else right = mid;
  }
  return 0.5 * (left + right);
}
