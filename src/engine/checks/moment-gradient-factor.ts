/** The moment-gradient factor Cb (C1) of an unbraced length, from its bending-moment diagram. */

import { fieldAt } from '../analysis/field-values.js';
import type { DiagramField, MemberAnalysis } from '../analysis/result.js';
import { largestMagnitudeOn } from './critical-positions.js';

/**
 * Cb = 12.5 Mmax / (2.5 Mmax + 3 MA + 4 MB + 3 MC), absolute values of the largest moment and of the
 * moments at the quarter, centre and three-quarter points (AISC 360-16 eq. F1-1, from memory). 1 for a
 * uniform moment; 1 when there is no moment.
 */
export function momentGradientFactor(largest: number, quarter: number, centre: number, threeQuarter: number): number {
  const denominator = 2.5 * largest + 3 * quarter + 4 * centre + 3 * threeQuarter;
  return largest > 0 && denominator > 0 ? (12.5 * largest) / denominator : 1;
}

/** |field| at x, the larger of its two sides (a concentrated moment makes a jump). */
function magnitudeAt(analysis: MemberAnalysis, field: DiagramField, x: number): number {
  return Math.max(Math.abs(fieldAt(analysis, field, x, 'left')), Math.abs(fieldAt(analysis, field, x, 'right')));
}

/** Cb of the strong-axis moment (momentZ) over [from, to]; `largest` is its largest |momentZ| when already known. */
export function momentGradientFactorOn(
  analysis: MemberAnalysis,
  from: number,
  to: number,
  largest: number = largestMagnitudeOn(analysis, 'momentZ', from, to).value,
): number {
  const length = to - from;
  return momentGradientFactor(
    largest,
    magnitudeAt(analysis, 'momentZ', from + 0.25 * length),
    magnitudeAt(analysis, 'momentZ', from + 0.5 * length),
    magnitudeAt(analysis, 'momentZ', from + 0.75 * length),
  );
}
