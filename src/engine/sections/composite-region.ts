/**
 * Properties of a cross-section summed from signed rectangles and quarter discs (region-parts.ts):
 * area, centroid and second moments by the parallel-axis theorem, the plastic modulus about the
 * equal-area axis, and the cut where the transverse shear stress V Q / (I b) peaks.
 */

import { RegionAlong } from './region-along.js';
import { productMomentAboutOrigin } from './region-parts.js';
import type { Coordinate, RegionPart } from './region-parts.js';
import { ShearCutSearch } from './shear-cut-search.js';
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

export function summariseRegion(parts: readonly RegionPart[]): RegionSummary {
  const alongY = new RegionAlong(parts, 'y').totalBelow(Infinity);
  const alongZ = new RegionAlong(parts, 'z').totalBelow(Infinity);
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

function equalAreaCut(region: RegionAlong): number {
  const half = region.totalBelow(Infinity).area / 2;
  let low = region.min;
  let high = region.max;
  // The area below a line grows monotonically with it: bisect to the last representable step.
  for (let step = 0; step < 200; step += 1) {
    const middle = (low + high) / 2;
    if (middle <= low || middle >= high) break;
    if (region.totalBelow(middle).area < half) low = middle;
    else high = middle;
  }
  return (low + high) / 2;
}

/** The position of the axis that halves the area: a line y = c for bending about z, z = c about y. */
export function plasticNeutralAxis(parts: readonly RegionPart[], axis: 'z' | 'y'): number {
  return equalAreaCut(new RegionAlong(parts, coordinateFor(axis)));
}

/** Integral of |s - c| dA about the equal-area axis c (EN 1993-1-1 Wpl; any textbook definition). */
export function plasticModulusAbout(parts: readonly RegionPart[], axis: 'z' | 'y'): number {
  const region = new RegionAlong(parts, coordinateFor(axis));
  const cut = equalAreaCut(region);
  const { area: wholeArea, firstMoment: wholeFirstMoment } = region.totalBelow(Infinity);
  const below = region.totalBelow(cut);
  return wholeFirstMoment - 2 * below.firstMoment + cut * (2 * below.area - wholeArea);
}

/**
 * The cut for shear along `shear` (a line y = c for shear along y) where Q / b is largest, Q being
 * the first moment about the centroid (at `centroid` along that coordinate) of the part beyond the
 * cut and b the width it crosses (shear-cut-search.ts).
 */
export function governingShearCut(parts: readonly RegionPart[], shear: Coordinate, centroid: number): ShearCut {
  return new ShearCutSearch(new RegionAlong(parts, shear), centroid).governing();
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
