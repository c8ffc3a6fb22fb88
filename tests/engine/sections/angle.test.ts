import { describe, expect, it } from 'vitest';
import { EngineError } from '../../../src/engine/engine-error.js';
import { angleProperties } from '../../../src/engine/sections/angle.js';
import type { AngleDimensions } from '../../../src/engine/sections/dimensions.js';

const near = (actual: number, expected: number, relative = 1e-12) =>
  expect(Math.abs(actual / expected - 1)).toBeLessThan(relative);

// Millimetres throughout.
const angle = (legY: number, legZ: number, thickness: number, rootRadius?: number): AngleDimensions => ({
  shape: 'angle',
  legY,
  legZ,
  thickness,
  ...(rootRadius === undefined ? {} : { rootRadius }),
});

/** I about an axis at theta from +z towards +y (Mohr's circle). */
const aboutAxis = (iz: number, iy: number, iyz: number, theta: number) =>
  iz * Math.cos(theta) ** 2 + iy * Math.sin(theta) ** 2 - 2 * iyz * Math.sin(theta) * Math.cos(theta);

describe('an equal angle 100 x 100 x 10 with sharp corners (mm)', () => {
  const p = angleProperties(angle(100, 100, 10));
  // Leg along y: 100 x 10 = 1000 at (y, z) = (50, 5); leg along z beyond it: 90 x 10 = 900 at (5, 55).
  const c = (1000 * 50 + 900 * 5) / 1900; // 28.684 from the heel, both ways
  const iz = (10 * 100 ** 3) / 12 + 1000 * (50 - c) ** 2 + (90 * 10 ** 3) / 12 + 900 * (5 - c) ** 2;
  const iyz = 1000 * (50 - c) * (5 - c) + 900 * (5 - c) * (55 - c);

  it('has A, centroid, second moments and product moment by parallel axes', () => {
    near(p.area, 1900);
    near(p.centroidY, c);
    near(p.centroidZ, c);
    near(p.secondMomentZ, iz);
    near(p.secondMomentY, iz);
    near(p.productMoment, iyz);
    expect(p.productMoment).toBeLessThan(0);
  });

  it('has its major axis on the symmetry line through the heel: 45 degrees, I = Iz -+ Iyz', () => {
    expect(p.principalAngle).toBeCloseTo(Math.PI / 4, 14);
    near(p.secondMomentMajor, iz - iyz);
    near(p.secondMomentMinor, iz + iyz);
    near(p.radiusOfGyrationMinor, Math.sqrt((iz + iyz) / 1900));
  });

  it('has plastic moduli about the equal-area geometric axes', () => {
    // Half the area, 950, lies below y = c' inside the z leg: 100 c' = 950, c' = 9.5. Integral of
    // |y - 9.5| dA: the y leg 10 (9.5^2 + 90.5^2) / 2 plus the z leg 90 (9.5^2 + 0.5^2) / 2 = 45 475.
    near(p.plasticModulusZ, 45475, 1e-10);
    near(p.plasticModulusY, p.plasticModulusZ, 1e-12);
  });

  it('peaks in shear in the y leg at the neutral axis: Q = t (legY - c)^2 / 2', () => {
    near(p.shearFirstMomentY, (10 * (100 - c) ** 2) / 2, 1e-9);
    near(p.shearWidthY, 10, 1e-10);
  });

  it('has J = K_legY + K_legZ + alpha D^4 (Roark 8th ed., Table 10.7, L-section; from memory)', () => {
    const whole = 100 * 1000 * (1 / 3 - 0.021 * (1 - 1e-4 / 12));
    const q = 10 / 90;
    const outstand = 90 * 1000 * (1 / 3 - 0.105 * q * (1 - q ** 4 / 192));
    const diameter = 2 * (20 - Math.sqrt(200)); // D = 2 (2 t - sqrt(2) t) with r = 0
    near(p.torsionConstant, whole + outstand + 0.07 * diameter ** 4, 1e-12);
    near(p.torsionalShearPerTorque, 10 / p.torsionConstant);
  });

  it('has the heel, the two outer corners and the two leg tips as stress points', () => {
    expect(p.stressPoints.map((point) => [point.y + c, point.z + c].map((value) => Math.round(value * 1e9) / 1e9))).toEqual([
      [0, 0],
      [100, 0],
      [0, 100],
      [100, 10],
      [10, 100],
    ]);
    expect(p.warpingConstant).toBe(0);
    expect(p.closed).toBe(false);
  });
});

describe('an unequal angle 150 x 90 x 10 with a 12 mm root radius', () => {
  const p = angleProperties(angle(150, 90, 10, 12));

  it('keeps the invariants of Mohr\'s circle', () => {
    near(p.secondMomentMajor + p.secondMomentMinor, p.secondMomentZ + p.secondMomentY, 1e-12);
    near(p.secondMomentMajor * p.secondMomentMinor, p.secondMomentZ * p.secondMomentY - p.productMoment ** 2, 1e-10);
    near(aboutAxis(p.secondMomentZ, p.secondMomentY, p.productMoment, p.principalAngle), p.secondMomentMajor, 1e-12);
  });

  it('has its major axis nearly across the long leg: tan = 0.361 (EN 10056-1, from memory)', () => {
    // The long leg along y makes Iz the larger, so the major axis lies within 45 degrees of z.
    expect(p.principalAngle).toBeGreaterThan(0);
    expect(p.principalAngle).toBeLessThan(Math.PI / 4);
    near(Math.tan(p.principalAngle), 0.361, 0.01);
  });

  it('adds (1 - pi/4) r^2 of fillet', () => {
    near(p.area - angleProperties(angle(150, 90, 10, 0)).area, (1 - Math.PI / 4) * 144, 1e-10);
  });
});

describe('the shear cut of an angle whose neutral axis lies in its z leg', () => {
  it('is at the junction in the y leg', () => {
    // y leg 50 x 10 = 500 at y = 25, z leg 190 x 10 = 1900 at y = 5: centroid 9.1667 < t. Just above
    // y = 10 the cut crosses only the y leg: Q = 400 (30 - 9.1667) over b = 10.
    const p = angleProperties(angle(50, 200, 10));
    const cy = (500 * 25 + 1900 * 5) / 2400;
    near(p.shearFirstMomentY, 400 * (30 - cy), 1e-9);
    near(p.shearWidthY, 10, 1e-10);
  });
});

describe('a thin equal angle', () => {
  it('approaches I_major = t L^3 / 3 and I_minor = t L^3 / 12 (thin legs of length L)', () => {
    // Legs of length L from the heel: about the symmetry line each point of the y leg at height s is
    // s / sqrt(2) away, so I = 2 t L^3 / 6; about the perpendicular through the centroid (L/4, L/4) it
    // is |s - L/2| / sqrt(2), I = 2 t (L^3 / 12) / 2.
    const [L, t] = [1, 1e-5];
    const p = angleProperties(angle(L, L, t));
    near(p.secondMomentMajor, (t * L ** 3) / 3, 1e-4);
    near(p.secondMomentMinor, (t * L ** 3) / 12, 1e-4);
  });
});

describe('L 100 x 100 x 10 against EN 10056-1 (tabulated value from memory)', () => {
  it('has A = 19.2 cm^2 once the two 6 mm toe radii (not modelled) are taken off', () => {
    const p = angleProperties(angle(100, 100, 10, 12));
    const toes = 2 * (1 - Math.PI / 4) * 36;
    near(p.area - toes, 1920, 0.005);
  });
});

describe('angleProperties refuses impossible geometry', () => {
  const cases: readonly [AngleDimensions, string][] = [
    [angle(100, 100, 100), 'thickness'],
    [angle(100, 50, 60), 'thickness'],
    [angle(100, 50, 10, 41), 'rootRadius'],
    [angle(100, 50, 10, -1), 'rootRadius'],
    [angle(-100, 50, 10), 'legY'],
  ];
  for (const [dimensions, field] of cases) {
    it(`names ${field}`, () => {
      try {
        angleProperties(dimensions);
        expect.unreachable();
      } catch (error) {
        expect(error).toBeInstanceOf(EngineError);
        expect((error as EngineError).path).toEqual(['section', field]);
      }
    });
  }
});
