/**
 * Where along the member a stress measure can peak, and the peak itself.
 *
 * On each piece the fields are exact polynomials, so a polynomial measure peaks at a piece end (both
 * sides of every node, since each piece is read with its own polynomials) or at an interior root of
 * its derivative. The coordinates gathered here are those roots for every field and for every
 * polynomial stress measure of the section; a measure with a square root in it (a resultant moment
 * with an axial force, a brittle failure criterion) is also searched between them by golden section.
 */

import { derivative, evaluatePolynomial, realRootsIn } from '../analysis/polynomial.js';
import type { DiagramField, MemberAnalysis, MemberPiece, Polynomial } from '../analysis/result.js';
import type { SectionProperties } from '../sections/section-properties.js';
import { scaledPolynomial, squarePolynomial, sumOfPolynomials } from './polynomial-products.js';
import { sectionForcesOnPiece, type SectionForces } from './section-forces.js';
import { sectionStressFactors, type SectionStressFactors } from './section-stress-factors.js';

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

/** A polynomial of degree two or more with a non-zero coefficient beyond the linear one: its derivative can have a root. */
function derivativeCanVanish(p: Polynomial): boolean {
  for (let i = 2; i < p.length; i++) if ((p[i] as number) !== 0) return true;
  return false;
}

/**
 * Polynomials kept by their last coefficient, so that an equal one is found without comparing it
 * with every other. Equal means the same coefficients from index `from` on, signed zeros told apart:
 * from 1, the same derivative and so the same roots.
 */
class PolynomialTable<T> {
  private readonly buckets = new Map<number, { readonly key: Polynomial; readonly value: T }[]>();

  constructor(private readonly from: 0 | 1) {}

  get(p: Polynomial): T | undefined {
    const bucket = this.buckets.get(p[p.length - 1] as number);
    if (bucket === undefined) return undefined;
    for (const entry of bucket) if (this.equal(entry.key, p)) return entry.value;
    return undefined;
  }

  set(p: Polynomial, value: T): void {
    const last = p[p.length - 1] as number;
    const bucket = this.buckets.get(last);
    if (bucket === undefined) this.buckets.set(last, [{ key: p, value }]);
    else bucket.push({ key: p, value });
  }

  private equal(p: Polynomial, q: Polynomial): boolean {
    if (p.length !== q.length) return false;
    for (let i = this.from; i < p.length; i++) if (!Object.is(p[i], q[i])) return false;
    return true;
  }
}

function ascending(a: number, b: number): number {
  return a - b;
}

/**
 * The piece ends and the interior roots of the derivatives of the given polynomials, ascending.
 * A derivative that is constant has no root, and one met before adds nothing, so neither is solved.
 */
export function criticalCoordinates(piece: MemberPiece, polynomials: readonly Polynomial[]): number[] {
  const length = piece.end - piece.start;
  const coordinates = [0, length];
  const solved = new PolynomialTable<true>(1);
  for (const p of polynomials) {
    if (!derivativeCanVanish(p) || solved.get(p) !== undefined) continue;
    solved.set(p, true);
    for (const root of realRootsIn(derivative(p), 0, length)) coordinates.push(root);
  }
  coordinates.sort(ascending);
  const distinct = [coordinates[0] as number];
  for (let i = 1; i < coordinates.length; i++) {
    const s = coordinates[i] as number;
    if (s - (coordinates[i - 1] as number) > 1e-12 * length) distinct.push(s);
  }
  return distinct;
}

/** The polynomial stress measures of a piece whose extremes must be among the critical coordinates. */
export function stressMeasurePolynomials(piece: MemberPiece, section: SectionProperties): Polynomial[] {
  return measurePolynomials(piece, sectionStressFactors(section));
}

function measurePolynomials(piece: MemberPiece, factors: SectionStressFactors): Polynomial[] {
  const { axial, shearY, shearZ, momentZ, momentY, torque } = piece.fields;
  const polynomials: Polynomial[] = [axial, shearY, shearZ, momentZ, momentY, torque];
  polynomials.push(sumOfPolynomials(squarePolynomial(momentZ), squarePolynomial(momentY)));
  polynomials.push(sumOfPolynomials(squarePolynomial(shearY), squarePolynomial(shearZ)));
  const axialStress = scaledPolynomial(axial, 1 / factors.area);
  const torsional = scaledPolynomial(torque, factors.torsionalShearPerTorque);
  const torsionalSquaredTimesThree = scaledPolynomial(squarePolynomial(torsional), 3);
  const { perMomentZ, perMomentY } = factors;
  // Points that share their normal stress (both flange tips under Mz alone) share its square: made once.
  const squaredByNormal = new PolynomialTable<Polynomial>(0);
  for (let k = 0; k < perMomentZ.length; k++) {
    const normal = sumOfPolynomials(
      axialStress,
      scaledPolynomial(momentZ, perMomentZ[k] as number),
      scaledPolynomial(momentY, perMomentY[k] as number),
    );
    let squared = squaredByNormal.get(normal);
    if (squared === undefined) {
      squared = sumOfPolynomials(squarePolynomial(normal), torsionalSquaredTimesThree);
      squaredByNormal.set(normal, squared);
    }
    polynomials.push(normal, squared);
  }
  const axialStressSquared = squarePolynomial(axialStress);
  for (const transverse of [scaledPolynomial(shearY, factors.shearPerForceY), scaledPolynomial(shearZ, factors.shearPerForceZ)]) {
    for (const sign of SIGNS) {
      const shear = sumOfPolynomials(torsional, scaledPolynomial(transverse, sign));
      polynomials.push(sumOfPolynomials(axialStressSquared, scaledPolynomial(squarePolynomial(shear), 3)));
    }
  }
  return polynomials;
}

const SIGNS = [1, -1] as const;

export function scanMember(analysis: MemberAnalysis, section: SectionProperties): MemberScan {
  const factors = sectionStressFactors(section);
  return {
    analysis,
    coordinates: analysis.pieces.map((piece) => criticalCoordinates(piece, measurePolynomials(piece, factors))),
  };
}

const INVERSE_GOLDEN_RATIO = (Math.sqrt(5) - 1) / 2;

/** Golden-section search for the largest value of f on [a, b]; returns the best point it saw. */
export function goldenSectionMaximum(f: (s: number) => number, a: number, b: number): { s: number; value: number } {
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
    const candidates = [lo, hi];
    if (derivativeCanVanish(p)) for (const root of realRootsIn(derivative(p), lo, hi)) candidates.push(root);
    for (const s of candidates) {
      const magnitude = Math.abs(evaluatePolynomial(p, s));
      if (magnitude > value) {
        value = magnitude;
        position = piece.start + s;
      }
    }
  }
  return { value, position };
}
