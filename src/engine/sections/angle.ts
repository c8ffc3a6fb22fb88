/**
 * Angle: leg legY along y and leg legZ along z, both of thickness t, heel at the bottom -z corner,
 * one quarter-circle root fillet of radius r (0 or absent for none). Toe radii are not modelled.
 *
 * Area, centroid, second moments about the geometric axes, product moment, plastic moduli about
 * the geometric axes (equal-area axes parallel to z and y) and shear cuts are exact for that
 * outline (composite-region.ts); the principal axes follow from Mohr's circle. Shear stresses use
 * the geometric-axis formula V Q / (I b), as for an angle restrained to bend about that axis.
 * J = K_legY + K_legZ + alpha D^4 (Roark 8th ed., Table 10.7, L-section with fillet, after El
 * Darwish & Johnston; open-section-torsion.ts), with legY taken whole and legZ beyond it;
 * tau max = T t / J. The warping constant of an angle is small and taken as 0.
 *
 * @example angleProperties({ shape: 'angle', legY: 0.1, legZ: 0.1, thickness: 0.01, rootRadius: 0.012 }).secondMomentMinor
 */

import { outlineValues, summariseRegion } from './composite-region.js';
import type { ShearCut } from './composite-region.js';
import type { AngleDimensions } from './dimensions.js';
import {
  cornerJunctionTorsionConstant,
  outstandTorsionConstant,
  plateTorsionConstant,
  torsionConstantWithinBounds,
} from './open-section-torsion.js';
import { filletParts, rectanglePart } from './region-parts.js';
import type { RegionPart } from './region-parts.js';
import { assembleSectionProperties } from './section-assembly.js';
import { requireAtMost, requireBelow, requireNonNegative, requirePositive } from './section-geometry-checks.js';
import type { SectionProperties } from './section-properties.js';

export function angleParts(legY: number, legZ: number, t: number, r: number): RegionPart[] {
  return [rectanglePart(0, legY, 0, t), rectanglePart(0, t, t, legZ), ...filletParts(t, t, r, 1, 1)];
}

export function angleProperties(dimensions: AngleDimensions): SectionProperties {
  const { legY, legZ, thickness: t } = dimensions;
  requirePositive(legY, 'legY');
  requirePositive(legZ, 'legZ');
  requirePositive(t, 'thickness');
  const r = requireNonNegative(dimensions.rootRadius, 'rootRadius');
  requireBelow(t, Math.min(legY, legZ), 'thickness', 'the shorter leg');
  requireAtMost(t + r, Math.min(legY, legZ), 'rootRadius', 'the shorter leg, for the thickness and the fillet');

  const parts = angleParts(legY, legZ, t, r);
  const region = summariseRegion(parts);
  // Shear along y also runs along the z leg beyond the fillet toe, and shear along z along the y leg.
  const legZBeyond = legZ - t - r;
  const legYBeyond = legY - t - r;
  const alongLegZ: ShearCut[] = legZBeyond > 0 ? [{ firstMoment: t * legZBeyond * Math.abs(region.centroidY - t / 2), width: t }] : [];
  const alongLegY: ShearCut[] = legYBeyond > 0 ? [{ firstMoment: t * legYBeyond * Math.abs(region.centroidZ - t / 2), width: t }] : [];
  const torsionConstant = torsionConstantWithinBounds(
    plateTorsionConstant(legY, t) + outstandTorsionConstant(legZ - t, t) + cornerJunctionTorsionConstant(t, t, r),
    [[legY, t], [legZ, t]],
    [legY, legZ],
    region.secondMomentZ + region.secondMomentY,
  );
  return assembleSectionProperties({
    shape: 'angle',
    depth: legY,
    width: legZ,
    ...outlineValues(parts, region, { shearAlongY: alongLegZ, shearAlongZ: alongLegY }),
    torsionConstant,
    torsionalShearPerTorque: t / torsionConstant,
    warpingConstant: 0,
    closed: false,
    bendingCombination: 'points',
    outlinePoints: [
      { y: 0, z: 0, label: 'heel' },
      { y: legY, z: 0, label: 'outer corner at the end of the y leg' },
      { y: 0, z: legZ, label: 'outer corner at the end of the z leg' },
      { y: legY, z: t, label: 'tip of the y leg, inner face' },
      { y: t, z: legZ, label: 'tip of the z leg, inner face' },
    ],
    thickestElement: t,
  });
}
