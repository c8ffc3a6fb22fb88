/**
 * Tee: flange b x tf on top (+y), stem tw hanging down to the overall depth h, and two
 * quarter-circle root fillets of radius r (0 or absent for none). Toe radii are not modelled.
 *
 * Area, centroid, second moments, plastic moduli (the equal-area axis about z lies off the
 * centroid, often in the flange) and shear cuts are exact for that outline (composite-region.ts).
 * J = K_flange + K_stem + alpha D^4 (Roark 8th ed., Table 10.7, T-section with fillets, after El
 * Darwish & Johnston; open-section-torsion.ts), the stem's far end free; tau max = T max(tf, tw) / J.
 * The warping constant of a tee is small and taken as 0.
 *
 * @example teeProperties({ shape: 'tee', depth: 0.1, flangeWidth: 0.1, webThickness: 0.01, flangeThickness: 0.01 }).centroidY
 */

import { outlineValues, summariseRegion } from './composite-region.js';
import type { ShearCut } from './composite-region.js';
import type { TeeDimensions } from './dimensions.js';
import {
  outstandTorsionConstant,
  plateTorsionConstant,
  teeJunctionTorsionConstant,
  torsionConstantWithinBounds,
} from './open-section-torsion.js';
import { filletParts, rectanglePart } from './region-parts.js';
import type { RegionPart } from './region-parts.js';
import { assembleSectionProperties } from './section-assembly.js';
import { requireAtMost, requireBelow, requireFlangedDimensions } from './section-geometry-checks.js';
import type { SectionProperties } from './section-properties.js';

export function teeParts(h: number, b: number, tw: number, tf: number, r: number): RegionPart[] {
  const stemLeft = (b - tw) / 2;
  const stemRight = (b + tw) / 2;
  return [
    rectanglePart(h - tf, h, 0, b),
    rectanglePart(0, h - tf, stemLeft, stemRight),
    ...filletParts(h - tf, stemRight, r, -1, 1),
    ...filletParts(h - tf, stemLeft, r, -1, -1),
  ];
}

export function teeProperties(dimensions: TeeDimensions): SectionProperties {
  const { depth: h, flangeWidth: b, webThickness: tw, flangeThickness: tf } = dimensions;
  const r = requireFlangedDimensions(dimensions);
  requireBelow(tf, h, 'flangeThickness', 'the depth');
  requireBelow(tw, b, 'webThickness', 'the flange width');
  requireAtMost(tw + 2 * r, b, 'rootRadius', 'the flange width, for the stem and two fillets');
  requireAtMost(tf + r, h, 'rootRadius', 'the depth, for the flange and a fillet');

  const parts = teeParts(h, b, tw, tf, r);
  const region = summariseRegion(parts);
  const outstand = (b - tw) / 2 - r;
  // Shear along y also runs along each flange outstand beyond the fillet toe.
  const flangeArm = Math.abs(h - tf / 2 - region.centroidY);
  const flangeShear: ShearCut[] = outstand > 0 ? [{ firstMoment: tf * outstand * flangeArm, width: tf }] : [];
  const torsionConstant = torsionConstantWithinBounds(
    plateTorsionConstant(b, tf) + outstandTorsionConstant(h - tf, tw) + teeJunctionTorsionConstant(tf, tw, r),
    [[b, tf], [h, tw]],
    [b, h],
    region.secondMomentZ + region.secondMomentY,
  );
  return assembleSectionProperties({
    shape: 'tee',
    depth: h,
    width: b,
    ...outlineValues(parts, region, { centroidZ: b / 2, shearAlongY: flangeShear }),
    torsionConstant,
    torsionalShearPerTorque: Math.max(tf, tw) / torsionConstant,
    warpingConstant: 0,
    closed: false,
    bendingCombination: 'points',
    outlinePoints: [
      { y: h, z: b, label: 'flange tip, top, +z' },
      { y: h, z: 0, label: 'flange tip, top, -z' },
      { y: h - tf, z: b, label: 'flange tip, underside, +z' },
      { y: h - tf, z: 0, label: 'flange tip, underside, -z' },
      { y: 0, z: (b + tw) / 2, label: 'stem toe, +z' },
      { y: 0, z: (b - tw) / 2, label: 'stem toe, -z' },
    ],
    thickestElement: Math.max(tf, tw),
  });
}
