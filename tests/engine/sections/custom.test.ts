import { describe, expect, it } from 'vitest';
import { EngineError } from '../../../src/engine/engine-error.js';
import { customProperties } from '../../../src/engine/sections/custom.js';
import type { CustomDimensions } from '../../../src/engine/sections/dimensions.js';

const near = (actual: number, expected: number, relative = 1e-12) =>
  expect(Math.abs(actual / expected - 1)).toBeLessThan(relative);

const pathOf = (dimensions: CustomDimensions) => {
  try {
    customProperties(dimensions);
  } catch (error) {
    if (error instanceof EngineError && error.kind === 'impossible-geometry') return error.path;
    throw error;
  }
  return undefined;
};

// IPE 200 as tabulated in EN 10365:2017 (values from memory), SI.
const ipe200: CustomDimensions = {
  shape: 'custom',
  area: 28.48e-4,
  secondMomentZ: 1943e-8,
  secondMomentY: 142.4e-8,
  torsionConstant: 6.98e-8,
  depth: 0.2,
  width: 0.1,
  sectionModulusZ: 194.3e-6,
  sectionModulusY: 28.47e-6,
  plasticModulusZ: 220.6e-6,
  plasticModulusY: 44.61e-6,
  warpingConstant: 12.99e-9,
};

describe('a custom section with its tabulated values', () => {
  const p = customProperties(ipe200);

  it('uses what is given', () => {
    expect(p.area).toBe(28.48e-4);
    near(p.sectionModulusZ, 194.3e-6);
    near(p.sectionModulusY, 28.47e-6);
    expect(p.plasticModulusZ).toBe(220.6e-6);
    expect(p.warpingConstant).toBe(12.99e-9);
    expect(p.depth).toBe(0.2);
  });

  it('derives the radii of gyration and the fibre distances I / W', () => {
    near(p.radiusOfGyrationZ, Math.sqrt(1943e-8 / 28.48e-4)); // 8.26 cm, EN 10365 lists iy = 8.26 cm
    near(p.radiusOfGyrationMinor, Math.sqrt(142.4e-8 / 28.48e-4));
    near(p.fibreDistanceTop, 1943e-8 / 194.3e-6);
    near(p.fibreDistanceBottom, p.fibreDistanceTop);
  });

  it('marks what it had to stand in for', () => {
    expect(p.known).toEqual({
      bendingStressZ: true,
      bendingStressY: true,
      plasticModulusZ: true,
      plasticModulusY: true,
      shearStressY: false,
      shearStressZ: false,
      torsionalShearStress: false,
      warpingConstant: true,
      thickestElement: false,
      productMoment: false,
    });
  });

  it('stands in for shear with 1.5 V / A, for torsion with T R / J, for the thickest plate with min(depth, width)', () => {
    near((p.shearFirstMomentY / (p.secondMomentZ * p.shearWidthY)) * p.area, 1.5);
    near(p.torsionalShearPerTorque, Math.hypot(p.fibreDistanceTop, p.fibreDistancePositiveZ) / 6.98e-8);
    expect(p.thickestElement).toBe(0.1);
    expect(p.closed).toBe(false);
  });
});

describe('a custom section with a shear area, torsional modulus and thickest plate', () => {
  const p = customProperties({ ...ipe200, shearAreaY: 14.0e-4, torsionalModulus: 8.2e-6, thickestElement: 0.0085, closed: false });

  it('gives tau = V / Av, T / Wt and the given plate', () => {
    // Av = 14.0 cm^2 is the EN 1993-1-1 shear area of IPE 200 as tabulated (from memory).
    near(p.shearFirstMomentY / (p.secondMomentZ * p.shearWidthY), 1 / 14.0e-4);
    near(p.torsionalShearPerTorque, 1 / 8.2e-6);
    expect(p.thickestElement).toBe(0.0085);
    expect(p.known?.shearStressY).toBe(true);
    expect(p.known?.torsionalShearStress).toBe(true);
    expect(p.known?.thickestElement).toBe(true);
  });
});

describe('a custom section with only the four required values', () => {
  const p = customProperties({ shape: 'custom', area: 1e-3, secondMomentZ: 1e-6, secondMomentY: 2e-7, torsionConstant: 1e-8 });

  it('cannot give bending stresses and says so', () => {
    expect(p.known?.bendingStressZ).toBe(false);
    expect(p.known?.bendingStressY).toBe(false);
    // Stand-in fibre distance: the radius of gyration, the least any section can have.
    near(p.fibreDistanceTop, Math.sqrt(1e-6 / 1e-3));
  });

  it('takes the elastic modulus for the plastic one, 0 warping and sqrt(A) for the thickest plate', () => {
    near(p.plasticModulusZ, p.sectionModulusZ);
    expect(p.warpingConstant).toBe(0);
    near(p.thickestElement, Math.sqrt(1e-3));
    expect(p.known?.plasticModulusZ).toBe(false);
  });

  it('takes the given axes as principal', () => {
    expect(p.productMoment).toBe(0);
    expect(p.secondMomentMajor).toBe(1e-6);
    expect(p.secondMomentMinor).toBe(2e-7);
  });
});

describe('a custom section with a depth and no modulus', () => {
  it('puts the fibres at depth / 2', () => {
    const p = customProperties({ shape: 'custom', area: 1e-3, secondMomentZ: 1e-6, secondMomentY: 2e-7, torsionConstant: 1e-8, depth: 0.1 });
    expect(p.fibreDistanceTop).toBe(0.05);
    near(p.sectionModulusZ, 1e-6 / 0.05);
    expect(p.known?.bendingStressZ).toBe(true);
    expect(p.known?.bendingStressY).toBe(false);
  });
});

describe('customProperties refuses values no section can have', () => {
  const base: CustomDimensions = { shape: 'custom', area: 1e-3, secondMomentZ: 1e-6, secondMomentY: 2e-7, torsionConstant: 1e-8 };

  it('names the field', () => {
    expect(pathOf({ ...base, area: 0 })).toEqual(['section', 'area']);
    expect(pathOf({ ...base, torsionConstant: -1 })).toEqual(['section', 'torsionConstant']);
    // J above the polar moment Iz + Iy = 1.2e-6.
    expect(pathOf({ ...base, torsionConstant: 2e-6 })).toEqual(['section', 'torsionConstant']);
    // Iz above A (d/2)^2 = 1e-3 * 0.02^2 = 4e-7.
    expect(pathOf({ ...base, depth: 0.04 })).toEqual(['section', 'secondMomentZ']);
    // Iz / W = 0.2 m beyond the 0.1 m depth.
    expect(pathOf({ ...base, depth: 0.1, sectionModulusZ: 5e-6 })).toEqual(['section', 'sectionModulusZ']);
    // W above sqrt(A Iz) = 3.16e-5.
    expect(pathOf({ ...base, sectionModulusZ: 5e-5 })).toEqual(['section', 'sectionModulusZ']);
    expect(pathOf({ ...base, shearAreaY: 2e-3 })).toEqual(['section', 'shearAreaY']);
    expect(pathOf({ ...base, warpingConstant: -1 })).toEqual(['section', 'warpingConstant']);
    expect(pathOf({ ...base, width: 0 })).toEqual(['section', 'width']);
  });

  it('allows 1 % for rounded tables', () => {
    expect(pathOf({ ...base, depth: 0.1, sectionModulusZ: 1e-6 / 0.0498 })).toBeUndefined();
  });
});
