/**
 * The largest stresses along the member, each with where it occurs: the demands of the stress checks.
 * The equivalent stress of a round section (a resultant moment with an axial force) or of a brittle
 * material is not a polynomial in x, so it is also searched between the critical positions.
 *
 * Each measure is the one of section-stresses.ts and equivalent-stress.ts, taken as peakOf takes it
 * (the first position, in member order, where the largest value occurs; the first point of the
 * section there). All of them are read in one pass over the critical positions, from the section's
 * factors worked out once, with no objects made per position. The search between positions skips a
 * stretch that an upper bound shows to lie below the peak already found there (equivalent-stress-bound.ts).
 */

import { evaluatePolynomial, isZeroPolynomial } from '../analysis/polynomial.js';
import type { MemberPiece } from '../analysis/result.js';
import type { Material } from '../materials/material.js';
import type { MemberCheckInput } from './check-input.js';
import type { StressExtreme, StressSummary } from './check-outcome.js';
import { goldenSectionMaximum, type MemberScan } from './critical-positions.js';
import { equivalentStressBound } from './equivalent-stress-bound.js';
import { modifiedMohrEquivalentStress, vonMisesStress } from './equivalent-stress.js';
import { fibreBendingStresses, fibreCount, sectionStressFactors, type SectionStressFactors } from './section-stress-factors.js';

const WHOLE_SECTION = 'whole section';
const TORSIONAL_POINT = 'largest torsional shear point';
const NEUTRAL_AXIS = 'neutral axis';
const NEUTRAL_AXIS_ALONG_Y = 'neutral axis, shear along y';
const NEUTRAL_AXIS_ALONG_Z = 'neutral axis, shear along z';

/** The largest value offered so far, the first one offered winning a tie. */
class PeakTracker {
  value = 0;
  position: number | null = null;
  location: string | null = null;

  offer(value: number, piece: MemberPiece, s: number, location: string | null): void {
    if (value > this.value) {
      this.value = value;
      this.position = piece.start + s;
      this.location = location;
    }
  }

  extreme(): StressExtreme {
    return { value: this.value, position: this.position, location: this.location };
  }
}

/** Every stress measure of one section, evaluated from the internal forces at a position. */
class StressMeasures {
  readonly axialTension = new PeakTracker();
  readonly axialCompression = new PeakTracker();
  readonly bendingTension = new PeakTracker();
  readonly bendingCompression = new PeakTracker();
  readonly transverseShear = new PeakTracker();
  readonly averageShear = new PeakTracker();
  readonly torsionalShear = new PeakTracker();
  readonly equivalent = new PeakTracker();
  private readonly fibres: Float64Array;
  private readonly brittle: boolean;
  /** Set by readForces: the forces at the position last read, and the measures that follow from them. */
  private axial = 0;
  private shearY = 0;
  private shearZ = 0;
  private momentZ = 0;
  private momentY = 0;
  private torque = 0;
  private transverse = 0;
  private transverseLocation = NEUTRAL_AXIS;
  private equivalentLocation: string | null = null;
  /** The piece last read, and which of its force fields are zero (+0 at every s >= 0, so not evaluated). */
  private piece: MemberPiece | null = null;
  private axialIsZero = false;
  private shearYIsZero = false;
  private shearZIsZero = false;
  private momentZIsZero = false;
  private momentYIsZero = false;
  private torqueIsZero = false;

  constructor(
    private readonly factors: SectionStressFactors,
    private readonly material: Material,
  ) {
    this.fibres = new Float64Array(fibreCount(factors));
    this.brittle = material.behaviour === 'brittle';
  }

  /** Offers the value of every measure at local coordinate s of the piece. */
  offerAll(piece: MemberPiece, s: number): void {
    this.readForces(piece, s);
    const { area, torsionalShearPerTorque, fibreLabels } = this.factors;
    this.axialTension.offer(Math.max(this.axial, 0) / area, piece, s, WHOLE_SECTION);
    this.axialCompression.offer(Math.max(-this.axial, 0) / area, piece, s, WHOLE_SECTION);
    let tension = 0;
    let tensionLocation: string | null = null;
    let compression = 0;
    let compressionLocation: string | null = null;
    const { fibres } = this;
    for (let k = 0; k < fibres.length; k++) {
      const stress = fibres[k] as number;
      if (stress > tension) {
        tension = stress;
        tensionLocation = fibreLabels[k] as string;
      }
      if (-1 * stress > compression) {
        compression = -1 * stress;
        compressionLocation = fibreLabels[k] as string;
      }
    }
    this.bendingTension.offer(tension, piece, s, tensionLocation);
    this.bendingCompression.offer(compression, piece, s, compressionLocation);
    this.transverseShear.offer(this.transverse, piece, s, this.transverseLocation);
    this.averageShear.offer(Math.hypot(this.shearY, this.shearZ) / area, piece, s, WHOLE_SECTION);
    this.torsionalShear.offer(Math.abs(this.torque) * torsionalShearPerTorque, piece, s, TORSIONAL_POINT);
    this.offerEquivalentRead(piece, s);
  }

  /** Offers the equivalent stress alone at local coordinate s of the piece. */
  offerEquivalent(piece: MemberPiece, s: number): void {
    this.readForces(piece, s);
    this.offerEquivalentRead(piece, s);
  }

  /** The equivalent stress at local coordinate s of the piece (for the search between positions). */
  equivalentAt(piece: MemberPiece, s: number): number {
    this.readForces(piece, s);
    return this.equivalentOfRead();
  }

  summary(): StressSummary {
    return {
      axialTension: this.axialTension.extreme(),
      axialCompression: this.axialCompression.extreme(),
      bendingTension: this.bendingTension.extreme(),
      bendingCompression: this.bendingCompression.extreme(),
      transverseShear: this.transverseShear.extreme(),
      averageShear: this.averageShear.extreme(),
      torsionalShear: this.torsionalShear.extreme(),
      equivalent: this.equivalent.extreme(),
    };
  }

  private offerEquivalentRead(piece: MemberPiece, s: number): void {
    const value = this.equivalentOfRead();
    this.equivalent.offer(value, piece, s, this.equivalentLocation);
  }

  /** sectionForcesOnPiece, then the fibre bending stresses and the transverse shear stress. */
  private readForces(piece: MemberPiece, s: number): void {
    const { fields } = piece;
    if (piece !== this.piece) this.noteZeroFields(piece);
    this.axial = this.axialIsZero ? 0 : evaluatePolynomial(fields.axial, s);
    this.shearY = this.shearYIsZero ? 0 : evaluatePolynomial(fields.shearY, s);
    this.shearZ = this.shearZIsZero ? 0 : evaluatePolynomial(fields.shearZ, s);
    this.momentZ = this.momentZIsZero ? 0 : evaluatePolynomial(fields.momentZ, s);
    this.momentY = this.momentYIsZero ? 0 : evaluatePolynomial(fields.momentY, s);
    this.torque = this.torqueIsZero ? 0 : evaluatePolynomial(fields.torque, s);
    const { factors } = this;
    fibreBendingStresses(factors, this.momentZ, this.momentY, this.fibres);
    if (factors.resultant) {
      this.transverse = factors.shearPerForceY * Math.hypot(this.shearY, this.shearZ);
      this.transverseLocation = NEUTRAL_AXIS;
      return;
    }
    const alongY = factors.shearPerForceY * Math.abs(this.shearY);
    const alongZ = factors.shearPerForceZ * Math.abs(this.shearZ);
    this.transverse = alongZ > alongY ? alongZ : alongY;
    this.transverseLocation = alongZ > alongY ? NEUTRAL_AXIS_ALONG_Z : NEUTRAL_AXIS_ALONG_Y;
  }

  /** A member is seldom loaded in every direction: most of its force fields are zero on a piece. */
  private noteZeroFields(piece: MemberPiece): void {
    const { fields } = piece;
    this.piece = piece;
    this.axialIsZero = isZeroPolynomial(fields.axial);
    this.shearYIsZero = isZeroPolynomial(fields.shearY);
    this.shearZIsZero = isZeroPolynomial(fields.shearZ);
    this.momentZIsZero = isZeroPolynomial(fields.momentZ);
    this.momentYIsZero = isZeroPolynomial(fields.momentY);
    this.torqueIsZero = isZeroPolynomial(fields.torque);
  }

  /**
   * equivalentStressAt over combinedStressStates: each fibre with N/A plus bending and the torsional
   * shear, then the neutral axis with N/A and torsional plus transverse shear; sets its location.
   */
  private equivalentOfRead(): number {
    const { area, torsionalShearPerTorque, fibreLabels } = this.factors;
    const torsional = Math.abs(this.torque) * torsionalShearPerTorque;
    const axial = this.axial / area;
    let best = 0;
    let location: string | null = null;
    const { fibres } = this;
    for (let k = 0; k < fibres.length; k++) {
      const value = this.equivalentOf(axial + (fibres[k] as number), torsional);
      if (value > best) {
        best = value;
        location = fibreLabels[k] as string;
      }
    }
    const neutral = this.equivalentOf(this.axial / area, torsional + this.transverse);
    if (neutral > best) {
      best = neutral;
      location = this.transverseLocation;
    }
    this.equivalentLocation = location;
    return best;
  }

  private equivalentOf(normal: number, shear: number): number {
    const { material } = this;
    return this.brittle
      ? modifiedMohrEquivalentStress(normal, shear, material.ultimateStrength, material.compressiveUltimateStrength)
      : vonMisesStress(normal, shear);
  }
}

/** A stretch is passed over when its bound, enlarged by this for the rounding of the stresses, is below the peak. */
const BOUND_ROUNDING_ALLOWANCE = 1e-9;

/** The largest equivalent stress at the critical positions themselves. */
function equivalentPeakAtCoordinates(measures: StressMeasures, scan: MemberScan): number {
  let peak = 0;
  scan.analysis.pieces.forEach((piece, index) => {
    for (const s of scan.coordinates[index] ?? []) peak = Math.max(peak, measures.equivalentAt(piece, s));
  });
  return peak;
}

export function stressPeaks(input: MemberCheckInput, scan: MemberScan): StressSummary {
  const { section, material } = input;
  const factors = sectionStressFactors(section);
  const measures = new StressMeasures(factors, material);
  const refineEquivalent = section.bendingCombination === 'resultant' || material.behaviour === 'brittle';
  // A stretch whose bound lies below this peak cannot hold the largest value: its search is skipped.
  const reached = refineEquivalent ? equivalentPeakAtCoordinates(measures, scan) : 0;
  scan.analysis.pieces.forEach((piece, index) => {
    const coordinates = scan.coordinates[index] ?? [];
    for (const s of coordinates) measures.offerAll(piece, s);
    if (!refineEquivalent) return;
    const equivalentAt = (t: number) => measures.equivalentAt(piece, t);
    for (let i = 0; i + 1 < coordinates.length; i++) {
      const from = coordinates[i] as number;
      const to = coordinates[i + 1] as number;
      if (equivalentStressBound(factors, material, piece, from, to) * (1 + BOUND_ROUNDING_ALLOWANCE) < reached) continue;
      const { s } = goldenSectionMaximum(equivalentAt, from, to);
      measures.offerEquivalent(piece, s);
    }
  });
  return measures.summary();
}
