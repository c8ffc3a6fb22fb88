/**
 * Solid circle of diameter d.
 *
 * A = pi d^2 / 4, I = pi d^4 / 64 (Roark 8th ed., Table A.1, solid circle; from memory); Wpl = d^3 / 6;
 * J = pi d^4 / 32 and tau max = 16 T / (pi d^3), exact (Roark 8th ed., Table 10.7, case 1); shear at
 * the neutral axis Q = d^3 / 12 with b = d, so tau = 4 V / (3 A).
 *
 * @example roundProperties({ shape: 'round', diameter: 0.02 }).torsionConstant // 1.5708e-8
 */

import type { RoundDimensions } from './dimensions.js';
import { assembleSectionProperties } from './section-assembly.js';
import { requirePositive } from './section-geometry-checks.js';
import type { SectionProperties, StressPoint } from './section-properties.js';

export function roundProperties(dimensions: RoundDimensions): SectionProperties {
  const d = dimensions.diameter;
  requirePositive(d, 'diameter');
  const r = d / 2;
  const secondMoment = (Math.PI * d ** 4) / 64;
  const shear = { firstMoment: d ** 3 / 12, width: d };
  return assembleSectionProperties({
    shape: 'round',
    depth: d,
    width: d,
    area: (Math.PI * d * d) / 4,
    centroidY: r,
    centroidZ: r,
    secondMomentZ: secondMoment,
    secondMomentY: secondMoment,
    productMoment: 0,
    plasticModulusZ: d ** 3 / 6,
    plasticModulusY: d ** 3 / 6,
    torsionConstant: (Math.PI * d ** 4) / 32,
    torsionalShearPerTorque: 16 / (Math.PI * d ** 3),
    shearY: shear,
    shearZ: shear,
    warpingConstant: 0,
    closed: true,
    bendingCombination: 'resultant',
    outlinePoints: circleOutlinePoints(d),
    thickestElement: d,
  });
}

/** The four extreme fibres of a circle of diameter d, from the bottom-left of its bounding box. */
export function circleOutlinePoints(d: number): StressPoint[] {
  const r = d / 2;
  return [
    { y: d, z: r, label: 'top fibre' },
    { y: 0, z: r, label: 'bottom fibre' },
    { y: r, z: d, label: 'fibre at +z' },
    { y: r, z: 0, label: 'fibre at -z' },
  ];
}
