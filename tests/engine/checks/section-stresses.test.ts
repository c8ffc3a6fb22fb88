import { describe, expect, it } from 'vitest';
import type { SectionForces } from '../../../src/engine/checks/section-forces.js';
import {
  averageShearStress,
  bendingStressCoefficients,
  bendingStresses,
  combinedStressStates,
  normalStresses,
  productMomentOf,
  stressPointsOf,
  torsionalShearStress,
  transverseShearPerForce,
  transverseShearStress,
} from '../../../src/engine/checks/section-stresses.js';
import type { SectionProperties } from '../../../src/engine/sections/section-properties.js';
import { rectangle, round } from './fixtures/sections.js';

const NO_FORCES: SectionForces = { axial: 0, shearY: 0, shearZ: 0, momentZ: 0, momentY: 0, torque: 0 };
const forces = (values: Partial<SectionForces>): SectionForces => ({ ...NO_FORCES, ...values });

/** Rectangles [yMin, yMax] x [zMin, zMax] of an unequal angle 100 x 75 x 10 mm, heel at the origin. */
const ANGLE_PARTS = [
  { y0: 0, y1: 0.1, z0: 0, z1: 0.01 },
  { y0: 0, y1: 0.01, z0: 0.01, z1: 0.075 },
];

/** Exact area integrals of 1, y, z, y^2, z^2, y z over the parts, about a given origin. */
function integrals(originY: number, originZ: number) {
  let area = 0;
  let y = 0;
  let z = 0;
  let yy = 0;
  let zz = 0;
  let yz = 0;
  for (const p of ANGLE_PARTS) {
    const a = (p.y1 - p.y0) * (p.z1 - p.z0);
    const cy = (p.y0 + p.y1) / 2 - originY;
    const cz = (p.z0 + p.z1) / 2 - originZ;
    area += a;
    y += a * cy;
    z += a * cz;
    yy += a * (cy ** 2 + (p.y1 - p.y0) ** 2 / 12);
    zz += a * (cz ** 2 + (p.z1 - p.z0) ** 2 / 12);
    yz += a * cy * cz;
  }
  return { area, y, z, yy, zz, yz };
}

function angleSection(): SectionProperties {
  const raw = integrals(0, 0);
  const centroidY = raw.y / raw.area;
  const centroidZ = raw.z / raw.area;
  const about = integrals(centroidY, centroidZ);
  return {
    ...rectangle(0.075, 0.1),
    shape: 'angle',
    area: about.area,
    secondMomentZ: about.yy,
    secondMomentY: about.zz,
    productMoment: about.yz,
    stressPoints: [
      { y: 0.1 - centroidY, z: -centroidZ, label: 'tip of the vertical leg' },
      { y: -centroidY, z: -centroidZ, label: 'heel' },
      { y: -centroidY, z: 0.075 - centroidZ, label: 'tip of the horizontal leg' },
    ],
  };
}

describe('normal stresses', () => {
  it('puts the bottom fibre in tension under a sagging moment: sigma = M c / I', () => {
    // 100 x 200 mm: I = 0.1 * 0.2^3 / 12 = 6.667e-5 m^4, c = 0.1 m; M = 20 kN*m gives 30 MPa.
    const section = rectangle(0.1, 0.2);
    const stresses = bendingStresses(section, forces({ momentZ: 20e3 }));
    const bottom = stresses.find((s) => s.location === 'bottom corner, +z');
    const top = stresses.find((s) => s.location === 'top corner, +z');
    expect(bottom?.value).toBeCloseTo(30e6, 3);
    expect(top?.value).toBeCloseTo(-30e6, 3);
  });

  it('puts the -z fibre in tension under a positive momentY', () => {
    // I about y = 0.2 * 0.1^3 / 12 = 1.6667e-5 m^4, c = 0.05 m; My = 1 kN*m gives 3 MPa at -z.
    const section = rectangle(0.1, 0.2);
    const stresses = bendingStresses(section, forces({ momentY: 1e3 }));
    expect(stresses.find((s) => s.location === 'top corner, -z')?.value).toBeCloseTo(3e6, 3);
    expect(stresses.find((s) => s.location === 'top corner, +z')?.value).toBeCloseTo(-3e6, 3);
  });

  it('adds N / A to the bending stress', () => {
    const section = rectangle(0.1, 0.2);
    const stresses = normalStresses(section, forces({ axial: 20e3, momentZ: 20e3 }));
    // N / A = 20 kN / 0.02 m^2 = 1 MPa on top of +-30 MPa.
    expect(Math.max(...stresses.map((s) => s.value))).toBeCloseTo(31e6, 3);
    expect(Math.min(...stresses.map((s) => s.value))).toBeCloseTo(-29e6, 3);
  });

  it('uses the resultant moment for a round bar: sqrt(Mz^2 + My^2) * 32 / (pi d^3)', () => {
    const section = round(0.04);
    const stresses = bendingStresses(section, forces({ momentZ: 300, momentY: 400 }));
    // 500 N*m * 32 / (pi 0.04^3) = 79.577 MPa on each side.
    expect(stresses[0]?.value).toBeCloseTo((500 * 32) / (Math.PI * 0.04 ** 3), 3);
    expect(stresses[1]?.value).toBeCloseTo((-500 * 32) / (Math.PI * 0.04 ** 3), 3);
  });

  it('reproduces the moments it came from on an unsymmetric angle (the derivation in section-stresses.ts)', () => {
    const section = angleSection();
    expect(productMomentOf(section)).not.toBe(0);
    // The centroid carries no bending stress.
    const { perMomentZ, perMomentY } = bendingStressCoefficients(section, 0, 0);
    expect(Math.abs(perMomentZ)).toBe(0);
    expect(Math.abs(perMomentY)).toBe(0);
    const applied = { momentZ: 1200, momentY: -700 };
    // sigma is linear: sigma = gy y + gz z with the gradients from the coefficients at unit offsets.
    const unitY = bendingStressCoefficients(section, 1, 0);
    const unitZ = bendingStressCoefficients(section, 0, 1);
    const gy = unitY.perMomentZ * applied.momentZ + unitY.perMomentY * applied.momentY;
    const gz = unitZ.perMomentZ * applied.momentZ + unitZ.perMomentY * applied.momentY;
    const raw = integrals(0, 0);
    const about = integrals(raw.y / raw.area, raw.z / raw.area);
    // Mz = -integral(sigma y dA) and My = -integral(sigma z dA), the definitions in result.ts.
    expect(-(gy * about.yy + gz * about.yz)).toBeCloseTo(applied.momentZ, 9);
    expect(-(gy * about.yz + gz * about.zz)).toBeCloseTo(applied.momentY, 9);
    // No net force from bending: integral(sigma dA) = gy * integral(y) + gz * integral(z) = 0 about the centroid.
    expect(Math.abs(gy * about.y + gz * about.z)).toBeLessThan(1e-9);
  });

  it('treats a product moment of round-off size as zero', () => {
    const section = { ...rectangle(0.1, 0.2), productMoment: 1e-25 };
    expect(productMomentOf(section)).toBe(0);
  });

  it('falls back to the bounding-box corners when a section lists no stress points', () => {
    const section = { ...rectangle(0.1, 0.2), stressPoints: [] };
    const points = stressPointsOf(section);
    expect(points).toHaveLength(4);
    expect(points.map((p) => [p.y, p.z])).toContainEqual([0.1, 0.05]);
    expect(points.map((p) => [p.y, p.z])).toContainEqual([-0.1, -0.05]);
  });
});

describe('shear stresses', () => {
  it('gives 1.5 V / A for a rectangle and 4 V / (3 A) for a round bar (Q / (I b) of each)', () => {
    const rect = rectangle(0.1, 0.2);
    expect(transverseShearPerForce(rect).alongY * rect.area).toBeCloseTo(1.5, 12);
    expect(transverseShearPerForce(rect).alongZ * rect.area).toBeCloseTo(1.5, 12);
    const bar = round(0.05);
    expect(transverseShearPerForce(bar).alongY * bar.area).toBeCloseTo(4 / 3, 12);
  });

  it('falls back to V / A when a section has no shear cut', () => {
    const section = { ...rectangle(0.1, 0.2), shearWidthY: 0 };
    const perForce = transverseShearPerForce(section);
    expect(perForce.elementary).toBe(false);
    expect(perForce.alongY).toBeCloseTo(1 / section.area, 12);
  });

  it('takes the larger direction on a rectangle and the resultant shear on a round bar', () => {
    const rect = rectangle(0.1, 0.2);
    const shear = transverseShearStress(rect, forces({ shearY: 3000, shearZ: -4000 }));
    // 1.5 * 4000 / 0.02 = 0.3 MPa, along z.
    expect(shear.value).toBeCloseTo(0.3e6, 6);
    expect(shear.location).toBe('neutral axis, shear along z');
    const bar = round(0.05);
    const resultant = transverseShearStress(bar, forces({ shearY: 3000, shearZ: -4000 }));
    expect(resultant.value).toBeCloseTo(((4 / 3) * 5000) / bar.area, 6);
    expect(averageShearStress(bar, forces({ shearY: 3000, shearZ: -4000 }))).toBeCloseTo(5000 / bar.area, 6);
  });

  it('gives 16 T / (pi d^3) for torsion of a round bar', () => {
    expect(torsionalShearStress(round(0.04), forces({ torque: -800 }))).toBeCloseTo((16 * 800) / (Math.PI * 0.04 ** 3), 3);
  });

  it('combines torsion with bending at the fibres and with transverse shear at the neutral axis', () => {
    const section = rectangle(0.1, 0.2);
    const torsional = torsionalShearStress(section, forces({ torque: 100 }));
    const states = combinedStressStates(section, forces({ axial: 2000, shearY: 1000, torque: 100 }));
    expect(states).toHaveLength(5);
    const neutral = states[4];
    expect(neutral?.normal).toBeCloseTo(2000 / section.area, 9);
    expect(neutral?.shear).toBeCloseTo(torsional + (1.5 * 1000) / section.area, 9);
    for (const fibre of states.slice(0, 4)) expect(fibre.shear).toBeCloseTo(torsional, 9);
  });
});
