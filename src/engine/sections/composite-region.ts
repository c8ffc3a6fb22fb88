/**
 * Properties of a cross-section summed from signed rectangles and quarter discs (region-parts.ts):
 * area, centroid and second moments by the parallel-axis theorem, the plastic modulus about the
 * equal-area axis, and the cut where the transverse shear stress V Q / (I b) peaks.
 */

import { chordAt, extentAlong, integralsBelow, productMomentAboutOrigin } from './region-parts.js';
import type { Coordinate, CutIntegrals, RegionPart } from './region-parts.js';
import type { SectionProperties } from './section-properties.js';

/**
 * Area, centroid (from the origin of the parts' coordinates) and second moments about the centroidal
 * axes of a region, m^2 and m^4.
 */
export type RegionSummary = Pick<
  SectionProperties,
  'area' | 'centroidY' | 'centroidZ' | 'secondMomentZ' | 'secondMomentY' | 'productMoment'
>;

/** First moment Q about the centroidal axis of the part beyond a cut, and the width the cut crosses. */
export interface ShearCut {
  readonly firstMoment: number;
  readonly width: number;
}

function totalAlong(parts: readonly RegionPart[], coordinate: Coordinate, cut: number): CutIntegrals {
  let area = 0;
  let firstMoment = 0;
  let secondMoment = 0;
  for (const part of parts) {
    const piece = integralsBelow(part, coordinate, cut);
    area += piece.area;
    firstMoment += piece.firstMoment;
    secondMoment += piece.secondMoment;
  }
  return { area, firstMoment, secondMoment };
}

function chordOf(parts: readonly RegionPart[], coordinate: Coordinate, at: number, side: 'below' | 'above'): number {
  let chord = 0;
  for (const part of parts) chord += chordAt(part, coordinate, at, side);
  return Math.max(0, chord);
}

function extentOf(parts: readonly RegionPart[], coordinate: Coordinate): readonly [number, number] {
  let min = Infinity;
  let max = -Infinity;
  for (const part of parts) {
    const [low, high] = extentAlong(part, coordinate);
    min = Math.min(min, low);
    max = Math.max(max, high);
  }
  return [min, max];
}

export function summariseRegion(parts: readonly RegionPart[]): RegionSummary {
  const alongY = totalAlong(parts, 'y', Infinity);
  const alongZ = totalAlong(parts, 'z', Infinity);
  const area = alongY.area;
  const centroidY = alongY.firstMoment / area;
  const centroidZ = alongZ.firstMoment / area;
  let product = 0;
  for (const part of parts) product += productMomentAboutOrigin(part);
  return {
    area,
    centroidY,
    centroidZ,
    secondMomentZ: alongY.secondMoment - area * centroidY * centroidY,
    secondMomentY: alongZ.secondMoment - area * centroidZ * centroidZ,
    productMoment: product - area * centroidY * centroidZ,
  };
}

function coordinateFor(axis: 'z' | 'y'): Coordinate {
  return axis === 'z' ? 'y' : 'z';
}

/** The position of the axis that halves the area: a line y = c for bending about z, z = c about y. */
export function plasticNeutralAxis(parts: readonly RegionPart[], axis: 'z' | 'y'): number {
  const coordinate = coordinateFor(axis);
  const [min, max] = extentOf(parts, coordinate);
  const half = totalAlong(parts, coordinate, Infinity).area / 2;
  let low = min;
  let high = max;
  // The area below a line grows monotonically with it: bisect to the last representable step.
  for (let step = 0; step < 200; step += 1) {
    const middle = (low + high) / 2;
    if (middle <= low || middle >= high) break;
    if (totalAlong(parts, coordinate, middle).area < half) low = middle;
    else high = middle;
  }
  return (low + high) / 2;
}

/** Integral of |s - c| dA about the equal-area axis c (EN 1993-1-1 Wpl; any textbook definition). */
export function plasticModulusAbout(parts: readonly RegionPart[], axis: 'z' | 'y'): number {
  const coordinate = coordinateFor(axis);
  const cut = plasticNeutralAxis(parts, axis);
  const whole = totalAlong(parts, coordinate, Infinity);
  const below = totalAlong(parts, coordinate, cut);
  return whole.firstMoment - 2 * below.firstMoment + cut * (2 * below.area - whole.area);
}

/**
 * The cut for shear along `shear` (a line y = c for shear along y) where Q / b is largest, Q being
 * the first moment about the centroid (at `centroid` along that coordinate) of the part beyond the
 * cut and b the width it crosses. Within each stretch between piece edges the chord is smooth;
 * where a curved piece spans the stretch it is sampled, then the best sample refined by
 * golden-section search.
 */
export function governingShearCut(parts: readonly RegionPart[], shear: Coordinate, centroid: number): ShearCut {
  const whole = totalAlong(parts, shear, Infinity);
  const [min, max] = extentOf(parts, shear);
  const scale = max - min;

  const firstMomentBeyond = (cut: number): number => {
    const below = totalAlong(parts, shear, cut);
    const q = cut >= centroid
      ? whole.firstMoment - below.firstMoment - centroid * (whole.area - below.area)
      : centroid * below.area - below.firstMoment;
    return Math.max(0, q);
  };
  const cutAt = (at: number, side: 'below' | 'above'): ShearCut => ({
    firstMoment: firstMomentBeyond(at),
    width: chordOf(parts, shear, at, side),
  });
  const ratio = (cut: ShearCut): number => (cut.width > scale * 1e-12 ? cut.firstMoment / cut.width : 0);

  const edges = new Set<number>([min, max, centroid]);
  for (const part of parts) for (const edge of extentAlong(part, shear)) edges.add(edge);
  const sorted = [...edges].filter((edge) => edge >= min && edge <= max).sort((a, b) => a - b);

  let best: ShearCut = cutAt(centroid, 'above');
  const consider = (candidate: ShearCut): void => {
    if (ratio(candidate) > ratio(best)) best = candidate;
  };
  consider(cutAt(centroid, 'below'));

  const samples = 24;
  for (let index = 0; index + 1 < sorted.length; index += 1) {
    const start = sorted[index] as number;
    const end = sorted[index + 1] as number;
    if (!(end - start > scale * 1e-12)) continue;
    consider(cutAt(start, 'above'));
    consider(cutAt(end, 'below'));
    // Where only rectangles span the stretch the chord is constant and Q peaks at the centroid,
    // so Q / b peaks at an end or at the centroid, both already taken.
    const curved = parts.some((part) => {
      if (part.kind !== 'quarter-disc') return false;
      const [low, high] = extentAlong(part, shear);
      return low <= start && high >= end;
    });
    if (!curved) continue;
    const positions: number[] = [];
    for (let k = 1; k < samples; k += 1) positions.push(start + ((end - start) * k) / samples);
    let bestIndex = 0;
    let bestValue = -Infinity;
    positions.forEach((position, k) => {
      const value = ratio(cutAt(position, 'above'));
      if (value > bestValue) {
        bestValue = value;
        bestIndex = k;
      }
    });
    let low = positions[bestIndex - 1] ?? start;
    let high = positions[bestIndex + 1] ?? end;
    const golden = (Math.sqrt(5) - 1) / 2;
    let left = high - golden * (high - low);
    let right = low + golden * (high - low);
    let leftValue = ratio(cutAt(left, 'above'));
    let rightValue = ratio(cutAt(right, 'above'));
    for (let step = 0; step < 200 && high - low > scale * 1e-10; step += 1) {
      if (leftValue >= rightValue) {
        high = right;
        right = left;
        rightValue = leftValue;
        left = high - golden * (high - low);
        leftValue = ratio(cutAt(left, 'above'));
      } else {
        low = left;
        left = right;
        leftValue = rightValue;
        right = low + golden * (high - low);
        rightValue = ratio(cutAt(right, 'above'));
      }
    }
    consider(cutAt((low + high) / 2, 'above'));
  }
  return best;
}

/** Among candidate cuts, the one with the largest Q / b, which gives the largest V Q / (I b). */
export function largerShearCut(cuts: readonly ShearCut[]): ShearCut {
  let best = cuts[0] as ShearCut;
  for (const cut of cuts) {
    if (cut.firstMoment / cut.width > best.firstMoment / best.width) best = cut;
  }
  return best;
}

/** What a section's outline gives: the values of SectionCore that follow from its parts alone. */
export interface OutlineValues extends RegionSummary {
  readonly plasticModulusZ: number;
  readonly plasticModulusY: number;
  readonly shearY: ShearCut;
  readonly shearZ: ShearCut;
}

export interface OutlineSymmetry {
  /** The horizontal line y = centroidY is an axis of symmetry (exact centroid, product moment 0). */
  readonly centroidY?: number;
  /** The vertical line z = centroidZ is an axis of symmetry. */
  readonly centroidZ?: number;
  /** Further candidate cuts for shear along y and z, such as along a flange outstand. */
  readonly shearAlongY?: readonly ShearCut[];
  readonly shearAlongZ?: readonly ShearCut[];
}

export function outlineValues(parts: readonly RegionPart[], region: RegionSummary, symmetry: OutlineSymmetry = {}): OutlineValues {
  const centroidY = symmetry.centroidY ?? region.centroidY;
  const centroidZ = symmetry.centroidZ ?? region.centroidZ;
  const symmetric = symmetry.centroidY !== undefined || symmetry.centroidZ !== undefined;
  return {
    area: region.area,
    centroidY,
    centroidZ,
    secondMomentZ: region.secondMomentZ,
    secondMomentY: region.secondMomentY,
    productMoment: symmetric ? 0 : region.productMoment,
    plasticModulusZ: plasticModulusAbout(parts, 'z'),
    plasticModulusY: plasticModulusAbout(parts, 'y'),
    shearY: largerShearCut([governingShearCut(parts, 'y', centroidY), ...(symmetry.shearAlongY ?? [])]),
    shearZ: largerShearCut([governingShearCut(parts, 'z', centroidZ), ...(symmetry.shearAlongZ ?? [])]),
  };
}
