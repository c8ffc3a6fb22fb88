/**
 * An upper bound of the equivalent stress over a stretch of a piece, so that the search between
 * critical positions can pass over a stretch whose every value lies below a peak already found (the
 * search could not change the result there: its best point would be lower than that peak).
 *
 * Each force field is bounded by its Taylor expansion about the middle of the stretch,
 * |p(m + t)| <= sum |p_i(m)| r^i for |t| <= r (exact for a polynomial), plus 1e-10 of
 * sum |c_i| b^i, far above the rounding of that expansion and of the field's own evaluation. The
 * stresses then follow by the triangle inequality, the measures being increasing in |sigma| and |tau|:
 * - fibre k: |sigma| <= |N| / A + |perMomentZ_k| |Mz| + |perMomentY_k| |My| (resultant sections:
 *   |N| / A + hypot(|Mz|, |My|) c / I), with tau = |T| * torsionalShearPerTorque;
 * - neutral axis: |sigma| <= |N| / A, tau <= |T| * torsionalShearPerTorque plus the transverse shear bound;
 * - von Mises sqrt(sigma^2 + 3 tau^2) grows with |sigma| and |tau|;
 * - modified Mohr: both principal stresses are at most |sigma| / 2 + hypot(sigma / 2, tau) <= |sigma| + |tau|
 *   in magnitude, so its three branches (equivalent-stress.ts) are at most K (|sigma| + |tau|) with
 *   K = max(1, (|Suc - Sut| + Sut) / Suc, Sut / Suc).
 */

import type { MemberPiece, Polynomial } from '../analysis/result.js';
import type { Material } from '../materials/material.js';
import type { SectionStressFactors } from './section-stress-factors.js';

/** Relative allowance for rounding: the field's evaluation and the Taylor shift err by far less. */
const FIELD_ROUNDING_ALLOWANCE = 1e-10;

let shifted = new Float64Array(8);

/** An upper bound of |p(s)| for s in [a, b], 0 <= a <= b; NaN or Infinity when p holds such values. */
export function polynomialMagnitudeBound(p: Polynomial, a: number, b: number): number {
  const n = p.length;
  if (shifted.length < n) shifted = new Float64Array(n);
  const middle = (a + b) / 2;
  const radius = (b - a) / 2;
  for (let i = 0; i < n; i++) shifted[i] = p[i] as number;
  // Repeated synthetic division: the coefficients of p(middle + t) (Horner's method for a Taylor shift).
  for (let k = 0; k < n - 1; k++) {
    for (let i = n - 2; i >= k; i--) shifted[i] = (shifted[i] as number) + middle * (shifted[i + 1] as number);
  }
  let bound = 0;
  let scale = 0;
  let radiusPower = 1;
  let reachPower = 1;
  const reach = Math.max(Math.abs(a), Math.abs(b));
  for (let i = 0; i < n; i++) {
    bound += Math.abs(shifted[i] as number) * radiusPower;
    scale += Math.abs(p[i] as number) * reachPower;
    radiusPower *= radius;
    reachPower *= reach;
  }
  return bound + FIELD_ROUNDING_ALLOWANCE * scale;
}

/** K of the modified-Mohr bound above (1 for Suc >= Sut). */
export function modifiedMohrBoundFactor(material: Material): number {
  const tension = material.ultimateStrength;
  const compression = material.compressiveUltimateStrength;
  return Math.max(1, (Math.abs(compression - tension) + tension) / compression, tension / compression);
}

/** An upper bound of the equivalent stress (StressMeasures.equivalentAt) over local coordinates [a, b] of the piece. */
export function equivalentStressBound(
  factors: SectionStressFactors,
  material: Material,
  piece: MemberPiece,
  a: number,
  b: number,
): number {
  const { fields } = piece;
  const axial = polynomialMagnitudeBound(fields.axial, a, b) / factors.area;
  const shearY = polynomialMagnitudeBound(fields.shearY, a, b);
  const shearZ = polynomialMagnitudeBound(fields.shearZ, a, b);
  const momentZ = polynomialMagnitudeBound(fields.momentZ, a, b);
  const momentY = polynomialMagnitudeBound(fields.momentY, a, b);
  const torsional = polynomialMagnitudeBound(fields.torque, a, b) * factors.torsionalShearPerTorque;
  let bending = 0;
  let transverse: number;
  if (factors.resultant) {
    bending = (Math.hypot(momentZ, momentY) * factors.fibreDistance) / factors.secondMomentZ;
    transverse = factors.shearPerForceY * Math.hypot(shearY, shearZ);
  } else {
    const { perMomentZ, perMomentY } = factors;
    for (let k = 0; k < perMomentZ.length; k++) {
      bending = Math.max(bending, Math.abs(perMomentZ[k] as number) * momentZ + Math.abs(perMomentY[k] as number) * momentY);
    }
    transverse = Math.max(factors.shearPerForceY * shearY, factors.shearPerForceZ * shearZ);
  }
  const fibre = axial + bending;
  const neutralShear = torsional + transverse;
  if (material.behaviour === 'brittle') {
    return modifiedMohrBoundFactor(material) * Math.max(fibre + torsional, axial + neutralShear);
  }
  return Math.max(Math.sqrt(fibre * fibre + 3 * torsional * torsional), Math.sqrt(axial * axial + 3 * neutralShear * neutralShear));
}
