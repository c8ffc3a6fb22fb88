/**
 * Width-to-thickness classification of the compressed plate elements of a section, EN 1993-1-1:2005,
 * Table 5.2 (from memory), with eps = sqrt(235 / fy[MPa]). An element beyond its class 3 limit is
 * class 4, slender: it buckles locally before the section yields, and the buckling and strength
 * checks that use the gross section overestimate it.
 *
 * Limits (c / t), classes 1 / 2 / 3:
 *   - internal part in compression (sheet 1): 33 eps / 38 eps / 42 eps;
 *   - internal part in bending (sheet 1):     72 eps / 83 eps / 124 eps;
 *   - outstand flange in compression (sheet 2): 9 eps / 10 eps / 14 eps;
 *   - angle in compression (sheet 3), class 3 only: h / t <= 15 eps and (b + h) / (2 t) <= 11.5 eps;
 *     sheet 3 gives no class 1 or 2 for it, so an angle is reported class 3 at best;
 *   - circular hollow section (sheet 3): d / t <= 50 eps^2 / 70 eps^2 / 90 eps^2.
 * c from the dimensions (rolled sections: c measured from the root fillet's toe, sheets 1 and 2):
 *   - I flange outstand c = (b - tw - 2 r) / 2, channel flange c = b - tw - r, tee flange as the I;
 *   - I and channel web c = h - 2 tf - 2 r (internal), tee stem c = h - tf - r, taken as an outstand
 *     in compression (common practice: Table 5.2 names no tee stem);
 *   - box walls c = b - 3 t and h - 3 t (the conventional flat width of a hollow section when the
 *     corner radius is not known, from memory; conservative for the usual corner radii of 1.5 t or more);
 *   - angle: h the longer leg, b the shorter, both whole (sheet 3).
 * Under bending about z (y up), the flanges (walls along z) are in compression and the webs (walls
 * along y) in bending; under axial compression all are in compression. Solid and custom sections have
 * no plate elements to classify (null).
 *
 * @example governingElementSlenderness({ shape: 'i-section', depth: 0.3, flangeWidth: 0.3, webThickness: 0.01, flangeThickness: 0.01, rootRadius: 0 }, 355e6, 'compression') // flange outstand, c/t 14.5, class 4
 */

import { EngineError } from '../engine-error.js';
import type { SectionDimensions } from '../sections/dimensions.js';

export type SectionClass = 1 | 2 | 3 | 4;

/** What the section carries: the webs' stress state follows from it. */
export type ElementLoading = 'compression' | 'bending-about-z';

export interface ElementSlenderness {
  /** Which plate element, in plain words. */
  readonly element: string;
  /** c / t (or d / t, (b + h) / 2 t): dimensionless. */
  readonly ratio: number;
  /** Limits for classes 1 and 2 (absent where Table 5.2 gives none) and 3. */
  readonly limitClass1?: number;
  readonly limitClass2?: number;
  readonly limitClass3: number;
  readonly sectionClass: SectionClass;
  /** Class 4: local buckling before yield. */
  readonly slender: boolean;
}

/** eps = sqrt(235 MPa / fy) (EN 1993-1-1:2005, Table 5.2, from memory). */
export function slendernessEpsilon(yieldStrength: number): number {
  if (!Number.isFinite(yieldStrength) || yieldStrength <= 0) {
    throw new EngineError('not-applicable', `The yield strength must be a finite number greater than zero (got ${yieldStrength}).`, ['material', 'yieldStrength']);
  }
  return Math.sqrt(235e6 / yieldStrength);
}

/** Table 5.2 limits as multiples of eps, classes 1, 2, 3 (EN 1993-1-1:2005, from memory). */
export const INTERNAL_COMPRESSION_LIMITS = [33, 38, 42] as const;
export const INTERNAL_BENDING_LIMITS = [72, 83, 124] as const;
export const OUTSTAND_COMPRESSION_LIMITS = [9, 10, 14] as const;
/** Angles, class 3: h / t and (b + h) / (2 t), as multiples of eps. */
export const ANGLE_LEG_LIMIT = 15;
export const ANGLE_LEGS_LIMIT = 11.5;
/** Circular hollow sections, multiples of eps^2. */
export const TUBE_LIMITS = [50, 70, 90] as const;

function classified(element: string, ratio: number, limits: readonly [number | undefined, number | undefined, number]): ElementSlenderness {
  const [one, two, three] = limits;
  const sectionClass: SectionClass =
    one !== undefined && ratio <= one ? 1 : two !== undefined && ratio <= two ? 2 : ratio <= three ? 3 : 4;
  return {
    element,
    ratio,
    ...(one === undefined ? {} : { limitClass1: one }),
    ...(two === undefined ? {} : { limitClass2: two }),
    limitClass3: three,
    sectionClass,
    slender: sectionClass === 4,
  };
}

const scaled = (limits: readonly [number, number, number], factor: number): [number, number, number] => [
  limits[0] * factor,
  limits[1] * factor,
  limits[2] * factor,
];

/** Every plate element's classification; an empty list for solid and custom sections. */
export function elementSlenderness(dimensions: SectionDimensions, yieldStrength: number, loading: ElementLoading): ElementSlenderness[] {
  const eps = slendernessEpsilon(yieldStrength);
  const outstand = scaled(OUTSTAND_COMPRESSION_LIMITS, eps);
  const internalCompression = scaled(INTERNAL_COMPRESSION_LIMITS, eps);
  const web = loading === 'compression' ? internalCompression : scaled(INTERNAL_BENDING_LIMITS, eps);
  const webWords = loading === 'compression' ? 'in compression' : 'in bending';
  switch (dimensions.shape) {
    case 'i-section': {
      const { depth: h, flangeWidth: b, webThickness: tw, flangeThickness: tf, rootRadius: r } = dimensions;
      return [
        classified('flange outstand in compression', (b - tw - 2 * r) / 2 / tf, outstand),
        classified(`web ${webWords}`, (h - 2 * tf - 2 * r) / tw, web),
      ];
    }
    case 'channel': {
      const { depth: h, flangeWidth: b, webThickness: tw, flangeThickness: tf } = dimensions;
      const r = dimensions.rootRadius ?? 0;
      return [
        classified('flange outstand in compression', (b - tw - r) / tf, outstand),
        classified(`web ${webWords}`, (h - 2 * tf - 2 * r) / tw, web),
      ];
    }
    case 'tee': {
      const { depth: h, flangeWidth: b, webThickness: tw, flangeThickness: tf } = dimensions;
      const r = dimensions.rootRadius ?? 0;
      return [
        classified('flange outstand in compression', (b - tw - 2 * r) / 2 / tf, outstand),
        classified('stem as an outstand in compression', (h - tf - r) / tw, outstand),
      ];
    }
    case 'angle': {
      const { legY, legZ, thickness: t } = dimensions;
      const longer = Math.max(legY, legZ);
      const shorter = Math.min(legY, legZ);
      return [
        classified('longer leg, h / t', longer / t, [undefined, undefined, ANGLE_LEG_LIMIT * eps]),
        classified('both legs, (b + h) / (2 t)', (longer + shorter) / (2 * t), [undefined, undefined, ANGLE_LEGS_LIMIT * eps]),
      ];
    }
    case 'box': {
      const { depth: h, width: b, wallThickness: t } = dimensions;
      return [
        classified('wall along z (flange) in compression', (b - 3 * t) / t, internalCompression),
        classified(`wall along y (web) ${webWords}`, (h - 3 * t) / t, web),
      ];
    }
    case 'tube':
      return [classified('tube wall, d / t', dimensions.outerDiameter / dimensions.wallThickness, scaled(TUBE_LIMITS, eps * eps))];
    case 'rectangle':
    case 'round':
    case 'custom':
      return [];
  }
}

/**
 * The worst element: the highest class, and among equals the largest ratio / class 3 limit; null for
 * sections without plate elements.
 */
export function governingElementSlenderness(
  dimensions: SectionDimensions,
  yieldStrength: number,
  loading: ElementLoading,
): ElementSlenderness | null {
  const elements = elementSlenderness(dimensions, yieldStrength, loading);
  let worst: ElementSlenderness | null = null;
  for (const element of elements) {
    if (
      worst === null ||
      element.sectionClass > worst.sectionClass ||
      (element.sectionClass === worst.sectionClass && element.ratio / element.limitClass3 > worst.ratio / worst.limitClass3)
    ) {
      worst = element;
    }
  }
  return worst;
}
