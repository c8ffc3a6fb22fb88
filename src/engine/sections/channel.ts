/**
 * Parallel-flange channel: depth h, flange width b (from the back of the web), web tw along y at the
 * -z side, flanges tf pointing to +z, and two quarter-circle root fillets of radius r (0 or absent
 * for none). Flange toe radii are not modelled.
 *
 * Area, centroid, second moments, plastic moduli (the equal-area axis about y lies off the
 * centroid) and shear cuts are exact for that outline (composite-region.ts).
 * J = 2 K_flange + (h - 2 tf) tw^3 / 3 + 2 alpha D^4, with the corner-junction term of Roark's
 * L-section at each web-flange corner (Roark 8th ed., Table 10.7; open-section-torsion.ts); tau max =
 * T max(tf, tw) / J. Iw by the thin-walled mid-line formula with b' = b - tw / 2, h' = h - tf:
 *   Iw = tf b'^3 h'^2 / 12 * (3 b' tf + 2 h' tw) / (6 b' tf + h' tw)
 * (Seaburg & Carter, AISC Steel Design Guide 9, Torsional Analysis of Structural Steel Members,
 * 1997, Appendix A, channel; from memory).
 *
 * @example channelProperties({ shape: 'channel', depth: 0.2, flangeWidth: 0.08, webThickness: 0.006, flangeThickness: 0.011, rootRadius: 0.013 }).area
 */

import { outlineValues, summariseRegion } from './composite-region.js';
import type { ShearCut } from './composite-region.js';
import type { ChannelDimensions } from './dimensions.js';
import { cornerJunctionTorsionConstant, plateTorsionConstant, torsionConstantWithinBounds } from './open-section-torsion.js';
import { channelWarpingConstant } from './shear-centre.js';
import { filletParts, rectanglePart } from './region-parts.js';
import type { RegionPart } from './region-parts.js';
import { assembleSectionProperties } from './section-assembly.js';
import { requireAtMost, requireBelow, requireFlangedDimensions } from './section-geometry-checks.js';
import type { SectionProperties } from './section-properties.js';

export function channelParts(h: number, b: number, tw: number, tf: number, r: number): RegionPart[] {
  return [
    rectanglePart(0, tf, 0, b),
    rectanglePart(h - tf, h, 0, b),
    rectanglePart(tf, h - tf, 0, tw),
    ...filletParts(tf, tw, r, 1, 1),
    ...filletParts(h - tf, tw, r, -1, 1),
  ];
}

export function channelProperties(dimensions: ChannelDimensions): SectionProperties {
  const { depth: h, flangeWidth: b, webThickness: tw, flangeThickness: tf } = dimensions;
  const r = requireFlangedDimensions(dimensions);
  requireBelow(2 * tf, h, 'flangeThickness', 'the depth, for the two flanges');
  requireBelow(tw, b, 'webThickness', 'the flange width');
  requireAtMost(tw + r, b, 'rootRadius', 'the flange width, for the web and a fillet');
  requireAtMost(2 * tf + 2 * r, h, 'rootRadius', 'the depth, for two flanges and two fillets');

  const parts = channelParts(h, b, tw, tf, r);
  const region = summariseRegion(parts);
  const outstand = b - tw - r;
  // Shear along y also runs along each flange beyond the fillet toe: Q = tf * outstand * (h - tf) / 2.
  const flangeShear: ShearCut[] = outstand > 0 ? [{ firstMoment: (tf * outstand * (h - tf)) / 2, width: tf }] : [];
  const torsionConstant = torsionConstantWithinBounds(
    2 * plateTorsionConstant(b, tf) + ((h - 2 * tf) * tw ** 3) / 3 + 2 * cornerJunctionTorsionConstant(tf, tw, r),
    [[b, tf], [h, tw]],
    [b, h],
    region.secondMomentZ + region.secondMomentY,
  );
  const warpingConstant = channelWarpingConstant(dimensions);
  return assembleSectionProperties({
    shape: 'channel',
    depth: h,
    width: b,
    ...outlineValues(parts, region, { centroidY: h / 2, shearAlongY: flangeShear }),
    torsionConstant,
    torsionalShearPerTorque: Math.max(tf, tw) / torsionConstant,
    warpingConstant,
    closed: false,
    bendingCombination: 'points',
    outlinePoints: [
      { y: h, z: b, label: 'top flange tip' },
      { y: h, z: 0, label: 'top of the web back' },
      { y: 0, z: b, label: 'bottom flange tip' },
      { y: 0, z: 0, label: 'bottom of the web back' },
    ],
    thickestElement: Math.max(tf, tw),
  });
}
