/**
 * The interior roots of p' on (0, length), the stationary points of one field on one piece, solved
 * once and shared: the extremes of the analysis and the checks of the same member ask for the same
 * ones (a deflection's cubic p' is a Newton search each time). The last polynomials solved are kept
 * with their roots, looked up by identity: a piece polynomial is never changed once made, so the same
 * array on the same length has the same roots. A WeakMap keyed by the arrays cost the analysis more
 * than the checks saved.
 */

import { derivative, realRootsIn } from './polynomial.js';
import type { Polynomial } from './result.js';

/** Enough for the solved fields of a member of a few dozen pieces; older ones are solved again. */
const KEPT = 64;
const keptPolynomials: (Polynomial | null)[] = [];
const keptLengths: number[] = [];
const keptRoots: (readonly number[])[] = [];
for (let i = 0; i < KEPT; i++) {
  keptPolynomials.push(null);
  keptLengths.push(0);
  keptRoots.push([]);
}
let nextSlot = 0;

/** realRootsIn(derivative(p), 0, length), solved now and kept for stationaryPointsOn. */
export function solveStationaryPoints(p: Polynomial, length: number): readonly number[] {
  const roots = realRootsIn(derivative(p), 0, length);
  keptPolynomials[nextSlot] = p;
  keptLengths[nextSlot] = length;
  keptRoots[nextSlot] = roots;
  nextSlot = (nextSlot + 1) % KEPT;
  return roots;
}

/** realRootsIn(derivative(p), 0, length): those kept for p if it was solved on this length lately, else solved now. */
export function stationaryPointsOn(p: Polynomial, length: number): readonly number[] {
  for (let i = 0; i < KEPT; i++) {
    if (keptPolynomials[i] === p && Object.is(keptLengths[i], length)) return keptRoots[i] as readonly number[];
  }
  return solveStationaryPoints(p, length);
}
