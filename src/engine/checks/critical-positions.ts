/**
 * Where along the member a stress measure can peak, and the peak itself.
 *
 * On each piece the fields are exact polynomials, so a polynomial measure peaks at a piece end (both
 * sides of every node, since each piece is read with its own polynomials) or at an interior root of
 * its derivative. The coordinates gathered here are those roots for every field and for every
 * polynomial stress measure of the section; a measure with a square root in it (a resultant moment
 * with an axial force, a brittle failure criterion) is also searched between them by golden section.
 */

import { addPolynomials, derivative, evaluatePolynomial, realRootsIn, scalePolynomial } from '../analysis/polynomial.js';
import type { DiagramField, MemberAnalysis, MemberPiece, Polynomial } from '../analysis/result.js';
import type { SectionProperties } from '../sections/section-properties.js';
import { squarePolynomial } from './polynomial-products.js';
import { FORCE_FIELDS, sectionForcesOnPiece, type SectionForces } from './section-forces.js';
import { bendingStressCoefficients, stressPointsOf, transverseShearPerForce } from './section-stresses.js';

/** The member with, for each piece, the local coordinates where a stress measure can peak. */
export interface MemberScan {
  readonly analysis: MemberAnalysis;
  readonly coordinates: readonly (readonly number[])[];
}

export interface MeasureValue {
  readonly value: number;
  readonly location: string | null;
}

/** A non-negative quantity of the section forces, with where on the section it arises. */
export type Measure = (forces: SectionForces) => MeasureValue;

export interface Peak {
  readonly value: number;
  /** m; null when the measure is zero everywhere. */
  readonly position: number | null;
  readonly location: string | null;
}

/** The piece ends and the interior roots of the derivatives of the given polynomials, ascending. */
export function criticalCoordinates(piece: MemberPiece, polynomials: readonly Polynomial[]): number[] {
  const length = piece.end - piece.start;
  const coordinates = [0, length];
  for (const p of polynomials) coordinates.push(...realRootsIn(derivative(p), 0, length));
  coordinates.sort((a, b) => a - b);
  return coordinates.filter((s, i) => i === 0 || s - (coordinates[i - 1] as number) > 1e-12 * length);
}

/** The polynomial stress measures of a piece whose extremes must be among the critical coordinates. */
export function stressMeasurePolynomials(piece: MemberPiece, section: SectionProperties): Polynomial[] {
  const { axial, shearY, shearZ, momentZ, momentY, torque } = piece.fields;
  const polynomials: Polynomial[] = FORCE_FIELDS.map((field) => piece.fields[field]);
  polynomials.push(addPolynomials(squarePolynomial(momentZ), squarePolynomial(momentY)));
  polynomials.push(addPolynomials(squarePolynomial(shearY), squarePolynomial(shearZ)));
  const axialStress = scalePolynomial(axial, 1 / section.area);
  const torsional = scalePolynomial(torque, section.torsionalShearPerTorque);
  const torsionalSquaredTimesThree = scalePolynomial(squarePolynomial(torsional), 3);
  if (section.bendingCombination === 'points') {
    for (const point of stressPointsOf(section)) {
      const { perMomentZ, perMomentY } = bendingStressCoefficients(section, point.y, point.z);
      const normal = addPolynomials(axialStress, scalePolynomial(momentZ, perMomentZ), scalePolynomial(momentY, perMomentY));
      polynomials.push(normal, addPolynomials(squarePolynomial(normal), torsionalSquaredTimesThree));
    }
  }
  const perForce = transverseShearPerForce(section);
  for (const transverse of [scalePolynomial(shearY, perForce.alongY), scalePolynomial(shearZ, perForce.alongZ)]) {
    for (const sign of [1, -1]) {
      const shear = addPolynomials(torsional, scalePolynomial(transverse, sign));
      polynomials.push(addPolynomials(squarePolynomial(axialStress), scalePolynomial(squarePolynomial(shear), 3)));
    }
  }
  return polynomials;
}

export function scanMember(analysis: MemberAnalysis, section: SectionProperties): MemberScan {
  return {
    analysis,
    coordinates: analysis.pieces.map((piece) => criticalCoordinates(piece, stressMeasurePolynomials(piece, section))),
  };
}

const INVERSE_GOLDEN_RATIO = (Math.sqrt(5) - 1) / 2;

/** Golden-section search for the largest value of f on [a, b]; returns the best point it saw. */
function goldenSectionMaximum(f: (s: number) => number, a: number, b: number): { s: number; value: number } {
  let lo = a;
  let hi = b;
  let x1 = hi - INVERSE_GOLDEN_RATIO * (hi - lo);
  let x2 = lo + INVERSE_GOLDEN_RATIO * (hi - lo);
  let f1 = f(x1);
  let f2 = f(x2);
  for (let i = 0; i < 80 && hi - lo > 1e-13 * (b - a); i++) {
    if (f1 >= f2) {
      hi = x2;
      x2 = x1;
      f2 = f1;
      x1 = hi - INVERSE_GOLDEN_RATIO * (hi - lo);
      f1 = f(x1);
    } else {
      lo = x1;
      x1 = x2;
      f1 = f2;
      x2 = lo + INVERSE_GOLDEN_RATIO * (hi - lo);
      f2 = f(x2);
    }
  }
  return f1 >= f2 ? { s: x1, value: f1 } : { s: x2, value: f2 };
}

/**
 * The largest value of a measure over the member. With `refine`, each stretch between consecutive
 * critical coordinates is also searched by golden section (for measures that are not polynomials).
 */
export function peakOf(scan: MemberScan, measure: Measure, options: { readonly refine?: boolean } = {}): Peak {
  let best: Peak = { value: 0, position: null, location: null };
  const consider = (piece: MemberPiece, s: number) => {
    const { value, location } = measure(sectionForcesOnPiece(piece, s));
    if (value > best.value) best = { value, position: piece.start + s, location };
  };
  scan.analysis.pieces.forEach((piece, index) => {
    const coordinates = scan.coordinates[index] ?? [];
    for (const s of coordinates) consider(piece, s);
    if (!options.refine) return;
    for (let i = 0; i + 1 < coordinates.length; i++) {
      const { s } = goldenSectionMaximum(
        (t) => measure(sectionForcesOnPiece(piece, t)).value,
        coordinates[i] as number,
        coordinates[i + 1] as number,
      );
      consider(piece, s);
    }
  });
  return best;
}

/** Largest |field| over [from, to] (ends and interior extremes of every piece inside), and where. */
export function largestMagnitudeOn(
  analysis: MemberAnalysis,
  field: DiagramField,
  from: number,
  to: number,
): { readonly value: number; readonly position: number | null } {
  let value = 0;
  let position: number | null = null;
  for (const piece of analysis.pieces) {
    const lo = Math.max(from, piece.start) - piece.start;
    const hi = Math.min(to, piece.end) - piece.start;
    if (hi < lo) continue;
    const p = piece.fields[field];
    for (const s of [lo, hi, ...realRootsIn(derivative(p), lo, hi)]) {
      const magnitude = Math.abs(evaluatePolynomial(p, s));
      if (magnitude > value) {
        value = magnitude;
        position = piece.start + s;
      }
    }
  }
  return { value, position };
}
