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
import { PolynomialBuffer } from './polynomial-buffer.js';
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
function derivativeCanVanish(p: Polynomial, terms: number = p.length): boolean {
  for (let i = 2; i < terms; i++) if ((p[i] as number) !== 0) return true;
  return false;
}

/**
 * Polynomials with distinct derivatives, kept by their last coefficient so that an equal one is found
 * without comparing it with every other. Equal means the same coefficients from index 1 on, signed
 * zeros told apart: the same derivative and so the same roots. A polynomial is given by its first
 * `terms` coefficients, so that one held in a buffer is looked up without a copy.
 */
class DerivativeSet {
  private readonly buckets = new Map<number, Polynomial[]>();

  /**
   * Keeps the polynomial unless one with its derivative is kept already, and returns what it kept
   * (a copy of the coefficients with `copy`, for a buffer that is reused), or undefined.
   */
  addIfNew(p: Polynomial, terms: number, copy: boolean): Polynomial | undefined {
    const last = p[terms - 1] as number;
    let bucket = this.buckets.get(last);
    if (bucket === undefined) {
      bucket = [];
      this.buckets.set(last, bucket);
    } else {
      for (const key of bucket) if (sameDerivative(key, p, terms)) return undefined;
    }
    const key = copy ? p.slice(0, terms) : p;
    bucket.push(key);
    return key;
  }
}

function sameDerivative(key: Polynomial, p: Polynomial, terms: number): boolean {
  if (key.length !== terms) return false;
  for (let i = 1; i < terms; i++) if (!Object.is(key[i], p[i])) return false;
  return true;
}

function ascending(a: number, b: number): number {
  return a - b;
}

/**
 * The piece ends and the interior roots of the derivatives of the polynomials offered, ascending.
 * A derivative that is constant has no root, and one met before adds nothing, so neither is solved.
 */
class CoordinateSearch {
  private readonly coordinates: number[];
  private readonly solved = new DerivativeSet();

  constructor(private readonly length: number) {
    this.coordinates = [0, length];
  }

  offer(p: Polynomial): void {
    this.solveIfNew(p, p.length, false);
  }

  /** Offers what the buffer holds now; a copy is kept if it is solved, since the buffer is reused. */
  offerBuffer(buffer: PolynomialBuffer): void {
    this.solveIfNew(buffer.coefficients, buffer.terms, true);
  }

  private solveIfNew(p: Polynomial, terms: number, copy: boolean): void {
    if (!derivativeCanVanish(p, terms)) return;
    const solved = this.solved.addIfNew(p, terms, copy);
    if (solved === undefined) return;
    for (const root of realRootsIn(derivative(solved), 0, this.length)) this.coordinates.push(root);
  }

  /** The coordinates, ascending, without those within 1e-12 of the length of the one before. */
  distinct(): number[] {
    const { coordinates, length } = this;
    coordinates.sort(ascending);
    const distinct = [coordinates[0] as number];
    for (let i = 1; i < coordinates.length; i++) {
      const s = coordinates[i] as number;
      if (s - (coordinates[i - 1] as number) > 1e-12 * length) distinct.push(s);
    }
    return distinct;
  }
}

/** The piece ends and the interior roots of the derivatives of the given polynomials, ascending. */
export function criticalCoordinates(piece: MemberPiece, polynomials: readonly Polynomial[]): number[] {
  const search = new CoordinateSearch(piece.end - piece.start);
  for (const p of polynomials) search.offer(p);
  return search.distinct();
}

/**
 * The polynomial stress measures of a piece whose extremes must be among the critical coordinates,
 * each a new array: the plain statement of what scanMember forms in buffers.
 */
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
  for (let k = 0; k < perMomentZ.length; k++) {
    const normal = sumOfPolynomials(
      axialStress,
      scaledPolynomial(momentZ, perMomentZ[k] as number),
      scaledPolynomial(momentY, perMomentY[k] as number),
    );
    polynomials.push(normal, sumOfPolynomials(squarePolynomial(normal), torsionalSquaredTimesThree));
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

/** The buffers the measures of a piece are formed in, shared by every scan (each runs synchronously). */
const buffers = {
  axial: new PolynomialBuffer(),
  shearY: new PolynomialBuffer(),
  shearZ: new PolynomialBuffer(),
  momentZ: new PolynomialBuffer(),
  momentY: new PolynomialBuffer(),
  torque: new PolynomialBuffer(),
  axialStress: new PolynomialBuffer(),
  axialStressSquared: new PolynomialBuffer(),
  torsional: new PolynomialBuffer(),
  torsionalSquaredTimesThree: new PolynomialBuffer(),
  normal: new PolynomialBuffer(),
  transverse: new PolynomialBuffer(),
  shear: new PolynomialBuffer(),
  first: new PolynomialBuffer(),
  second: new PolynomialBuffer(),
  measure: new PolynomialBuffer(),
};

/**
 * Offers every polynomial of measurePolynomials, in its order and formed by the same operations, in
 * buffers instead of new arrays. A square shared by two points is formed twice: the search solves it once.
 */
function offerMeasurePolynomials(search: CoordinateSearch, piece: MemberPiece, factors: SectionStressFactors): void {
  const { axial, shearY, shearZ, momentZ, momentY, torque } = piece.fields;
  const b = buffers;
  search.offer(axial);
  search.offer(shearY);
  search.offer(shearZ);
  search.offer(momentZ);
  search.offer(momentY);
  search.offer(torque);
  b.axial.copyOf(axial);
  b.shearY.copyOf(shearY);
  b.shearZ.copyOf(shearZ);
  b.momentZ.copyOf(momentZ);
  b.momentY.copyOf(momentY);
  b.torque.copyOf(torque);
  search.offerBuffer(b.measure.sumOf(b.first.squareOf(b.momentZ), b.second.squareOf(b.momentY)));
  search.offerBuffer(b.measure.sumOf(b.first.squareOf(b.shearY), b.second.squareOf(b.shearZ)));
  b.axialStress.scaledOf(b.axial, 1 / factors.area);
  b.torsional.scaledOf(b.torque, factors.torsionalShearPerTorque);
  b.torsionalSquaredTimesThree.squareOf(b.torsional).scaledOf(b.torsionalSquaredTimesThree, 3);
  const { perMomentZ, perMomentY } = factors;
  for (let k = 0; k < perMomentZ.length; k++) {
    b.normal.sumOf(b.axialStress, b.first.scaledOf(b.momentZ, perMomentZ[k] as number), b.second.scaledOf(b.momentY, perMomentY[k] as number));
    search.offerBuffer(b.normal);
    search.offerBuffer(b.measure.sumOf(b.first.squareOf(b.normal), b.torsionalSquaredTimesThree));
  }
  b.axialStressSquared.squareOf(b.axialStress);
  offerNeutralAxisMeasures(search, b.shearY, factors.shearPerForceY);
  offerNeutralAxisMeasures(search, b.shearZ, factors.shearPerForceZ);
}

/** The neutral-axis measures of one direction of transverse shear, with it adding to the torsional shear and against it. */
function offerNeutralAxisMeasures(search: CoordinateSearch, shearForce: PolynomialBuffer, shearPerForce: number): void {
  const b = buffers;
  b.transverse.scaledOf(shearForce, shearPerForce);
  for (const sign of SIGNS) {
    b.shear.sumOf(b.torsional, b.first.scaledOf(b.transverse, sign));
    b.second.squareOf(b.shear).scaledOf(b.second, 3);
    search.offerBuffer(b.measure.sumOf(b.axialStressSquared, b.second));
  }
}

export function scanMember(analysis: MemberAnalysis, section: SectionProperties): MemberScan {
  const factors = sectionStressFactors(section);
  const coordinates = analysis.pieces.map((piece) => {
    const search = new CoordinateSearch(piece.end - piece.start);
    offerMeasurePolynomials(search, piece, factors);
    return search.distinct();
  });
  return { analysis, coordinates };
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

/** The largest |p(s)| offered so far and where, the first one offered winning a tie. */
class LargestMagnitude {
  value = 0;
  position: number | null = null;

  offer(p: Polynomial, start: number, s: number): void {
    const magnitude = Math.abs(evaluatePolynomial(p, s));
    if (magnitude > this.value) {
      this.value = magnitude;
      this.position = start + s;
    }
  }
}

/** Largest |field| over [from, to] (ends and interior extremes of every piece inside), and where. */
export function largestMagnitudeOn(
  analysis: MemberAnalysis,
  field: DiagramField,
  from: number,
  to: number,
): { readonly value: number; readonly position: number | null } {
  const largest = new LargestMagnitude();
  for (const piece of analysis.pieces) {
    const lo = Math.max(from, piece.start) - piece.start;
    const hi = Math.min(to, piece.end) - piece.start;
    if (hi < lo) continue;
    const p = piece.fields[field];
    largest.offer(p, piece.start, lo);
    largest.offer(p, piece.start, hi);
    if (derivativeCanVanish(p)) for (const root of realRootsIn(derivative(p), lo, hi)) largest.offer(p, piece.start, root);
  }
  return { value: largest.value, position: largest.position };
}
