/**
 * Solid rectangle, width b along z, depth h along y.
 *
 * A = b h, Iz = b h^3 / 12, Iy = h b^3 / 12 (Roark 8th ed., Table A.1, rectangle; from memory);
 * Wpl = b h^2 / 4; shear peaks at the neutral axis with Q = b h^2 / 8, so tau = 1.5 V / A; torsion by
 * the exact series (rectangle-torsion.ts).
 *
 * @example rectangleProperties({ shape: 'rectangle', width: 0.05, depth: 0.1 }).secondMomentZ // 4.1667e-6
 */

import type { RectangleDimensions } from './dimensions.js';
import { rectangleTorsion } from './rectangle-torsion.js';
import { assembleSectionProperties } from './section-assembly.js';
import { requirePositive } from './section-geometry-checks.js';
import type { SectionProperties } from './section-properties.js';

export function rectangleProperties(dimensions: RectangleDimensions): SectionProperties {
  const { width: b, depth: h } = dimensions;
  requirePositive(b, 'width');
  requirePositive(h, 'depth');
  const torsion = rectangleTorsion(b, h);
  return assembleSectionProperties({
    shape: 'rectangle',
    depth: h,
    width: b,
    area: b * h,
    centroidY: h / 2,
    centroidZ: b / 2,
    secondMomentZ: (b * h ** 3) / 12,
    secondMomentY: (h * b ** 3) / 12,
    productMoment: 0,
    plasticModulusZ: (b * h * h) / 4,
    plasticModulusY: (h * b * b) / 4,
    torsionConstant: torsion.torsionConstant,
    torsionalShearPerTorque: torsion.torsionalShearPerTorque,
    shearY: { firstMoment: (b * h * h) / 8, width: b },
    shearZ: { firstMoment: (h * b * b) / 8, width: h },
    warpingConstant: 0,
    // A deep narrow bar can buckle laterally-torsionally, so a rectangle is not treated as closed.
    closed: false,
    bendingCombination: 'points',
    outlinePoints: [
      { y: h, z: b, label: 'top corner, +z' },
      { y: h, z: 0, label: 'top corner, -z' },
      { y: 0, z: b, label: 'bottom corner, +z' },
      { y: 0, z: 0, label: 'bottom corner, -z' },
    ],
    thickestElement: Math.min(b, h),
  });
}
