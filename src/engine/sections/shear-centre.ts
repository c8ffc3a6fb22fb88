/**
 * The shear centre of a section, relative to its centroid, and the thin-walled warping constant
 * about it: what a flexural-torsional buckling check needs beyond SectionProperties.
 *
 * Thin-walled (mid-line) theory throughout; fillets and corner radii are left out of the shear
 * centre, while the centroid is the exact one of the outline (SectionProperties), common practice.
 *   - Doubly symmetric (I, box, tube, round, rectangle): the centroid.
 *   - Channel: on the axis of symmetry, e = 3 b'^2 tf / (6 b' tf + h' tw) from the web mid-line,
 *     on the side away from the flanges, with b' = b - tw / 2 and h' = h - tf (Roark's Formulas for
 *     Stress and Strain, 8th ed., shear-centre table, channel, table number not checked; AISC Design
 *     Guide 9, 1997, Appendix A, channel; both from memory). It is e = b'^2 h'^2 tf / (4 Iz) with
 *     the mid-line Iz = h'^2 (6 b' tf + h' tw) / 12.
 *   - Tee: where the flange and stem mid-lines meet; angle: the heel, where the leg mid-lines meet
 *     (every element radiates from that point, so each element's shear flow passes through it).
 *   - Custom: unknown (no outline), null.
 * Warping: the mid-line value (the same formulas as the shape files), plus for tees and angles the
 * through-thickness ("secondary") term, which mid-line theory sets to 0:
 *   angle: Iw = t^3 (b'^3 + d'^3) / 36, legs to the mid-line of the other leg;
 *   tee:   Iw = tf^3 b^3 / 144 + tw^3 d'^3 / 36, d' = h - tf / 2
 * (AISC Design Guide 9, 1997, Appendix; AISC Manual shapes database notes; from memory).
 *
 * @example shearCentreOf({ shape: 'tee', depth: 0.1, flangeWidth: 0.1, webThickness: 0.008, flangeThickness: 0.01 }, { centroidY: 0.0740698, centroidZ: 0.05 }) // offsetY 0.0209302, offsetZ 0
 */

import type { AngleDimensions, ChannelDimensions, SectionDimensions, TeeDimensions } from './dimensions.js';

export interface ShearCentre {
  /** Shear centre minus centroid along y and along z, m (the code's axes: y up, z horizontal). */
  readonly offsetY: number;
  readonly offsetZ: number;
  /** Mid-line (thin-walled) warping constant about the shear centre, m^6; 0 for closed and solid. */
  readonly warpingConstant: number;
  /** The same plus the through-thickness term for tees and angles, m^6 (equal to it for other shapes). */
  readonly warpingConstantWithThickness: number;
}

/** The centroid from the bottom-left corner of the bounding box, m, as in SectionProperties. */
export interface CentroidPosition {
  readonly centroidY: number;
  readonly centroidZ: number;
}

/** Channel: the shear centre's distance e from the web mid-line, m, on the back of the web. */
export function channelShearCentreDistance(dimensions: Pick<ChannelDimensions, 'flangeWidth' | 'depth' | 'webThickness' | 'flangeThickness'>): number {
  const { flangeWidth: b, depth: h, webThickness: tw, flangeThickness: tf } = dimensions;
  const flangeMid = b - tw / 2;
  const webMid = h - tf;
  // Roark 8th ed. / AISC DG9, App. A (from memory); b', h' are the mid-line flange width and depth.
  return (3 * flangeMid ** 2 * tf) / (6 * flangeMid * tf + webMid * tw);
}

/** Channel: Iw = tf b'^3 h'^2 / 12 (3 b' tf + 2 h' tw) / (6 b' tf + h' tw), m^6 (AISC DG9, App. A, from memory). */
export function channelWarpingConstant(dimensions: Pick<ChannelDimensions, 'flangeWidth' | 'depth' | 'webThickness' | 'flangeThickness'>): number {
  const { flangeWidth: b, depth: h, webThickness: tw, flangeThickness: tf } = dimensions;
  const flangeMid = b - tw / 2;
  const webMid = h - tf;
  return (
    ((tf * flangeMid ** 3 * webMid ** 2) / 12) * ((3 * flangeMid * tf + 2 * webMid * tw) / (6 * flangeMid * tf + webMid * tw))
  );
}

/** Tee: through-thickness warping tf^3 b^3 / 144 + tw^3 (h - tf/2)^3 / 36, m^6 (AISC DG9, from memory). */
export function teeWarpingConstantWithThickness(dimensions: TeeDimensions): number {
  const { flangeWidth: b, depth: h, webThickness: tw, flangeThickness: tf } = dimensions;
  return (tf ** 3 * b ** 3) / 144 + (tw ** 3 * (h - tf / 2) ** 3) / 36;
}

/** Angle: through-thickness warping t^3 ((legY - t/2)^3 + (legZ - t/2)^3) / 36, m^6 (AISC DG9, from memory). */
export function angleWarpingConstantWithThickness(dimensions: AngleDimensions): number {
  const { legY, legZ, thickness: t } = dimensions;
  return (t ** 3 * ((legY - t / 2) ** 3 + (legZ - t / 2) ** 3)) / 36;
}

/**
 * The shear centre from the centroid and the warping constants; null for a custom section, whose
 * outline is unknown. The dimensions are taken as already checked by the shape's property function.
 */
export function shearCentreOf(dimensions: SectionDimensions, centroid: CentroidPosition): ShearCentre | null {
  switch (dimensions.shape) {
    case 'rectangle':
    case 'round':
    case 'tube':
    case 'box':
      return { offsetY: 0, offsetZ: 0, warpingConstant: 0, warpingConstantWithThickness: 0 };
    case 'i-section': {
      const { flangeWidth: b, depth: h, flangeThickness: tf } = dimensions;
      // Timoshenko & Gere, 2nd ed., ch. 6 (from memory): the flanges' warping, as i-section.ts.
      const warping = (tf * b ** 3 * (h - tf) ** 2) / 24;
      return { offsetY: 0, offsetZ: 0, warpingConstant: warping, warpingConstantWithThickness: warping };
    }
    case 'channel': {
      const webMidLineZ = dimensions.webThickness / 2;
      const warping = channelWarpingConstant(dimensions);
      return {
        offsetY: dimensions.depth / 2 - centroid.centroidY,
        offsetZ: webMidLineZ - channelShearCentreDistance(dimensions) - centroid.centroidZ,
        warpingConstant: warping,
        warpingConstantWithThickness: warping,
      };
    }
    case 'tee':
      return {
        offsetY: dimensions.depth - dimensions.flangeThickness / 2 - centroid.centroidY,
        offsetZ: dimensions.flangeWidth / 2 - centroid.centroidZ,
        warpingConstant: 0,
        warpingConstantWithThickness: teeWarpingConstantWithThickness(dimensions),
      };
    case 'angle':
      return {
        offsetY: dimensions.thickness / 2 - centroid.centroidY,
        offsetZ: dimensions.thickness / 2 - centroid.centroidZ,
        warpingConstant: 0,
        warpingConstantWithThickness: angleWarpingConstantWithThickness(dimensions),
      };
    case 'custom':
      return null;
  }
}
