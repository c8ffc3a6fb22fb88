/**
 * Circular hollow section, outside diameter D, wall t, inside diameter d = D - 2 t.
 *
 * A = pi (D^2 - d^2) / 4, I = pi (D^4 - d^4) / 64 (Roark 8th ed., Table A.1, hollow circle; from
 * memory); Wpl = (D^3 - d^3) / 6; J = pi (D^4 - d^4) / 32 exact, tau max = T (D / 2) / J at the outer
 * surface (Roark 8th ed., Table 10.7, hollow circle); shear at the neutral axis Q = (D^3 - d^3) / 12
 * across both walls b = 2 t (about 2 V / A for a thin wall). Differences of powers are factored so a
 * thin wall loses no digits.
 *
 * @example tubeProperties({ shape: 'tube', outerDiameter: 0.1, wallThickness: 0.005 }).area // 1.4923e-3
 */

import type { TubeDimensions } from './dimensions.js';
import { circleOutlinePoints } from './round.js';
import { assembleSectionProperties } from './section-assembly.js';
import { requireBelow, requirePositive } from './section-geometry-checks.js';
import type { SectionProperties } from './section-properties.js';

export function tubeProperties(dimensions: TubeDimensions): SectionProperties {
  const { outerDiameter: D, wallThickness: t } = dimensions;
  requirePositive(D, 'outerDiameter');
  requirePositive(t, 'wallThickness');
  requireBelow(t, D / 2, 'wallThickness', 'half the outside diameter');
  const d = D - 2 * t;
  const r = D / 2;
  // D^2 - d^2 = 4 t (D - t); D^3 - d^3 = 2 t (D^2 + D d + d^2); D^4 - d^4 = 4 t (D - t)(D^2 + d^2).
  const squares = 4 * t * (D - t);
  const cubes = 2 * t * (D * D + D * d + d * d);
  const fourth = squares * (D * D + d * d);
  const secondMoment = (Math.PI * fourth) / 64;
  const torsionConstant = (Math.PI * fourth) / 32;
  const shear = { firstMoment: cubes / 12, width: 2 * t };
  return assembleSectionProperties({
    shape: 'tube',
    depth: D,
    width: D,
    area: (Math.PI * squares) / 4,
    centroidY: r,
    centroidZ: r,
    secondMomentZ: secondMoment,
    secondMomentY: secondMoment,
    productMoment: 0,
    plasticModulusZ: cubes / 6,
    plasticModulusY: cubes / 6,
    torsionConstant,
    torsionalShearPerTorque: r / torsionConstant,
    shearY: shear,
    shearZ: shear,
    warpingConstant: 0,
    closed: true,
    bendingCombination: 'resultant',
    outlinePoints: circleOutlinePoints(D),
    thickestElement: t,
  });
}
