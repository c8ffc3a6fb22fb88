/**
 * Where along the member a stress measure can peak, and the peak itself.
 *
 * On each piece the fields are exact polynomials, so a polynomial measure peaks at a piece end (both
 * sides of every node, since each piece is read with its own polynomials) or at an interior root of
 * its derivative. The coordinates gathered here are those roots for every field and for every
 * polynomial stress measure of the section; a measure with a square root in it (a resultant moment
 * with an axial force, a brittle failure criterion) is also searched between them by golden section.
 */

import { derivativeCanVanish, evaluatePolynomial, isZeroPolynomial, realRootsIn } from '../analysis/polynomial.js';
import { stationaryPointsOn } from '../analysis/stationary-points.js';
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

/**
 * Polynomials with distinct derivatives, kept as copies in arrays reused from piece to piece. Equal
 * means the same coefficients from index 1 on, signed zeros told apart: the same derivative and so the
 * same roots. A polynomial is given by its first `terms` coefficients, so that one held in a buffer is
 * looked up without a copy. A piece offers a score of polynomials at most, so a plain list is searched
 * faster than a map of them is built.
 */
class DerivativeSet {
  private readonly kept: number[][] = [];
  private count = 0;

  clear(): void {
    this.count = 0;
  }

  /** Keeps a copy of the polynomial unless one with its derivative is kept already, and returns the copy, or undefined. */
  addIfNew(p: Polynomial, terms: number): Polynomial | undefined {
    const { kept } = this;
    for (let k = 0; k < this.count; k++) if (sameDerivative(kept[k] as number[], p, terms)) return undefined;
    let key = kept[this.count];
    if (key !== undefined && key.length === terms) {
      for (let i = 0; i < terms; i++) key[i] = p[i] as number;
    } else {
      key = p.slice(0, terms);
      kept[this.count] = key;
    }
    this.count++;
    return key;
  }
}

function sameDerivative(key: Polynomial, p: Polynomial, terms: number): boolean {
  if (key.length !== terms) return false;
  for (let i = 1; i < terms; i++) if (!Object.is(key[i], p[i])) return false;
  return true;
}

/** Derivatives written into arrays of their exact length, one per length, reused (each root search runs synchronously). */
const derivativesByTerms: number[][] = [];

/** derivative(p) (polynomial.ts) in a reused array: the same numbers. */
function derivativeInBuffer(p: Polynomial): Polynomial {
  const terms = p.length - 1;
  let d = derivativesByTerms[terms];
  if (d === undefined) {
    d = [];
    for (let i = 0; i < terms; i++) d.push(0);
    derivativesByTerms[terms] = d;
  }
  for (let i = 1; i < p.length; i++) d[i - 1] = i * (p[i] as number);
  return d;
}

/**
 * Sorts in place as sort((a, b) => a - b) does: ascending, and stable, so that equal numbers (+0 and
 * -0) keep their order. The few coordinates of a piece are sorted faster by insertion than by the
 * built-in sort calling a comparator; none is NaN (each lies in [0, length]), so both agree.
 */
function sortAscending(values: number[]): void {
  for (let i = 1; i < values.length; i++) {
    const value = values[i] as number;
    let j = i - 1;
    while (j >= 0 && (values[j] as number) - value > 0) {
      values[j + 1] = values[j] as number;
      j--;
    }
    values[j + 1] = value;
  }
}

/**
 * The piece ends and the interior roots of the derivatives of the polynomials offered, ascending.
 * A derivative that is constant has no root, and one met before adds nothing, so neither is solved.
 * One search serves piece after piece (start clears it).
 */
class CoordinateSearch {
  private coordinates: number[] = [];
  private readonly solved = new DerivativeSet();
  private length = 0;

  start(length: number): this {
    this.length = length;
    this.coordinates = [0, length];
    this.solved.clear();
    return this;
  }

  /** Offers a field of the piece: its roots are those the analysis found (stationary-points.ts). */
  offerField(p: Polynomial): void {
    if (!derivativeCanVanish(p) || this.solved.addIfNew(p, p.length) === undefined) return;
    this.pushAll(stationaryPointsOn(p, this.length));
  }

  /** Offers the first `terms` coefficients of p, solved here: what a buffer holds now, or any polynomial. */
  offerPolynomial(p: Polynomial, terms: number = p.length): void {
    if (!derivativeCanVanish(p, terms)) return;
    const solved = this.solved.addIfNew(p, terms);
    if (solved === undefined) return;
    this.pushAll(realRootsIn(derivativeInBuffer(solved), 0, this.length));
  }

  offerBuffer(buffer: PolynomialBuffer): void {
    this.offerPolynomial(buffer.coefficients, buffer.terms);
  }

  private pushAll(roots: readonly number[]): void {
    for (let i = 0; i < roots.length; i++) this.coordinates.push(roots[i] as number);
  }

  /** The coordinates, ascending, without those within 1e-12 of the length of the one before. */
  distinct(): number[] {
    const { coordinates, length } = this;
    sortAscending(coordinates);
    const distinct = [coordinates[0] as number];
    for (let i = 1; i < coordinates.length; i++) {
      const s = coordinates[i] as number;
      if (s - (coordinates[i - 1] as number) > 1e-12 * length) distinct.push(s);
    }
    return distinct;
  }
}

/** The search every scan uses, one piece at a time. */
const sharedSearch = new CoordinateSearch();

/** The piece ends and the interior roots of the derivatives of the given polynomials, ascending. */
export function criticalCoordinates(piece: MemberPiece, polynomials: readonly Polynomial[]): number[] {
  const search = sharedSearch.start(piece.end - piece.start);
  for (const p of polynomials) search.offerPolynomial(p);
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
  search.offerField(axial);
  search.offerField(shearY);
  search.offerField(shearZ);
  search.offerField(momentZ);
  search.offerField(momentY);
  search.offerField(torque);
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
  const { pieces } = analysis;
  const coordinates: number[][] = [];
  for (let i = 0; i < pieces.length; i++) {
    const piece = pieces[i] as MemberPiece;
    offerMeasurePolynomials(sharedSearch.start(piece.end - piece.start), piece, factors);
    coordinates.push(sharedSearch.distinct());
  }
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
    // A zero field is +0 everywhere on the piece: nothing there exceeds the 0 the search starts from.
    if (isZeroPolynomial(p)) continue;
    largest.offer(p, piece.start, lo);
    largest.offer(p, piece.start, hi);
    if (!derivativeCanVanish(p)) continue;
    // The whole piece: the roots the analysis found are the same numbers.
    const roots = lo === 0 && hi === piece.end - piece.start ? stationaryPointsOn(p, hi) : realRootsIn(derivativeInBuffer(p), lo, hi);
    for (let i = 0; i < roots.length; i++) largest.offer(p, piece.start, roots[i] as number);
  }
  return { value: largest.value, position: largest.position };
}
