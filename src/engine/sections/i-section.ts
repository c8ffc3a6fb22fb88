/**
 * Doubly symmetric rolled I or H section: depth h, flange width b, web tw, flanges tf, and four
 * quarter-circle root fillets of radius r between web and flanges (each (1 - pi/4) r^2, integrated
 * exactly as a square less a quarter disc).
 *
 * Area, second moments, plastic moduli and shear cuts are exact for that outline (composite-region.ts).
 * J = 2 K_flange + (h - 2 tf) tw^3 / 3 + 2 alpha D^4 (Roark 8th ed., Table 10.7, I-section, after El
 * Darwish & Johnston; open-section-torsion.ts); tau max = T max(tf, tw) / J at the thickest plate's
 * face, the thin-walled value (the peak at the fillet is not modelled).
 * Iw = tf b^3 (h - tf)^2 / 24, the flanges' warping about the shear centre (Timoshenko & Gere,
 * Theory of Elastic Stability, 2nd ed., lateral buckling of I-beams; from memory), which is how
 * EN 10365 tabulates it.
 *
 * @example iSectionProperties({ shape: 'i-section', depth: 0.2, flangeWidth: 0.1, webThickness: 0.0056, flangeThickness: 0.0085, rootRadius: 0.012 }).area // 2.848e-3 (IPE 200)
 */

import { outlineValues, summariseRegion } from './composite-region.js';
import type { ShearCut } from './composite-region.js';
import type { ISectionDimensions } from './dimensions.js';
import { plateTorsionConstant, teeJunctionTorsionConstant, torsionConstantWithinBounds } from './open-section-torsion.js';
import { filletParts, rectanglePart } from './region-parts.js';
import type { RegionPart } from './region-parts.js';
import { assembleSectionProperties } from './section-assembly.js';
import { requireAtMost, requireBelow, requireFlangedDimensions } from './section-geometry-checks.js';
import type { SectionProperties } from './section-properties.js';

/** The outline from the bottom-left of the bounding box: flanges, web, four root fillets. */
export function iSectionParts(h: number, b: number, tw: number, tf: number, r: number): RegionPart[] {
  const webLeft = (b - tw) / 2;
  const webRight = (b + tw) / 2;
  return [
    rectanglePart(0, tf, 0, b),
    rectanglePart(h - tf, h, 0, b),
    rectanglePart(tf, h - tf, webLeft, webRight),
    ...filletParts(tf, webRight, r, 1, 1),
    ...filletParts(tf, webLeft, r, 1, -1),
    ...filletParts(h - tf, webRight, r, -1, 1),
    ...filletParts(h - tf, webLeft, r, -1, -1),
  ];
}

export function iSectionProperties(dimensions: ISectionDimensions): SectionProperties {
  const { depth: h, flangeWidth: b, webThickness: tw, flangeThickness: tf } = dimensions;
  const r = requireFlangedDimensions(dimensions);
  requireBelow(2 * tf, h, 'flangeThickness', 'the depth, for the two flanges');
  requireBelow(tw, b, 'webThickness', 'the flange width');
  requireAtMost(tw + 2 * r, b, 'rootRadius', 'the flange width, for the web and two fillets');
  requireAtMost(2 * tf + 2 * r, h, 'rootRadius', 'the depth, for two flanges and two fillets');

  const parts = iSectionParts(h, b, tw, tf, r);
  const region = summariseRegion(parts);
  const outstand = (b - tw) / 2 - r;
  // Shear along y also runs along each flange outstand beyond the fillet toe: Q = tf * outstand * (h - tf) / 2.
  const flangeShear: ShearCut[] = outstand > 0 ? [{ firstMoment: (tf * outstand * (h - tf)) / 2, width: tf }] : [];
  const torsionConstant = torsionConstantWithinBounds(
    2 * plateTorsionConstant(b, tf) + ((h - 2 * tf) * tw ** 3) / 3 + 2 * teeJunctionTorsionConstant(tf, tw, r),
    [[b, tf], [h, tw]],
    [b, h],
    region.secondMomentZ + region.secondMomentY,
  );
  return assembleSectionProperties({
    shape: 'i-section',
    depth: h,
    width: b,
    ...outlineValues(parts, region, { centroidY: h / 2, centroidZ: b / 2, shearAlongY: flangeShear }),
    torsionConstant,
    torsionalShearPerTorque: Math.max(tf, tw) / torsionConstant,
    warpingConstant: (tf * b ** 3 * (h - tf) ** 2) / 24,
    closed: false,
    bendingCombination: 'points',
    outlinePoints: [
      { y: h, z: b, label: 'top flange tip, +z' },
      { y: h, z: 0, label: 'top flange tip, -z' },
      { y: 0, z: b, label: 'bottom flange tip, +z' },
      { y: 0, z: 0, label: 'bottom flange tip, -z' },
    ],
    thickestElement: Math.max(tf, tw),
  });
}
