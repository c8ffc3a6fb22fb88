import { describe, expect, it } from 'vitest';
import { EngineError } from '../../../src/engine/engine-error.js';
import { tubeProperties } from '../../../src/engine/sections/tube.js';

const near = (actual: number, expected: number, relative = 1e-12) =>
  expect(Math.abs(actual / expected - 1)).toBeLessThan(relative);

describe('tubeProperties, 100 x 5 mm', () => {
  const p = tubeProperties({ shape: 'tube', outerDiameter: 0.1, wallThickness: 0.005 });

  it('has the closed forms of Roark 8th ed., Table A.1, hollow circle (from memory)', () => {
    // A = pi (100^2 - 90^2) / 4 = 1492.26 mm^2; I = pi (100^4 - 90^4) / 64 = 1.688108e6 mm^4.
    near(p.area, (Math.PI * 1900) / 4 / 1e6);
    near(p.secondMomentZ, (Math.PI * (1e8 - 6.561e7)) / 64 / 1e12);
    near(p.plasticModulusZ, (1e6 - 729000) / 6 / 1e9);
    near(p.torsionConstant, 2 * p.secondMomentZ);
    near(p.torsionalShearPerTorque, 0.05 / p.torsionConstant);
  });

  it('cuts both walls for shear: Q = (D^3 - d^3) / 12 over 2 t', () => {
    expect(p.shearWidthY).toBeCloseTo(0.01, 15);
    near(p.shearFirstMomentY, (1e6 - 729000) / 12 / 1e9);
  });

  it('is closed and bends by the resultant moment; its thickest element is the wall', () => {
    expect(p.closed).toBe(true);
    expect(p.bendingCombination).toBe('resultant');
    expect(p.thickestElement).toBe(0.005);
  });
});

describe('a thin tube', () => {
  // Mean radius r, wall t << r: J -> 2 pi r^3 t, I -> pi r^3 t, A -> 2 pi r t, tau (shear) -> 2 V / A.
  const r = 0.05;
  const t = r * 1e-5;
  const p = tubeProperties({ shape: 'tube', outerDiameter: 2 * r + t, wallThickness: t });

  it('approaches the thin-ring values without losing digits', () => {
    near(p.area, 2 * Math.PI * r * t, 1e-11);
    // Exact: J = 2 pi r^3 t (1 + t^2 / (4 r^2)), I half of it.
    near(p.torsionConstant, 2 * Math.PI * r ** 3 * t, 1e-9);
    near(p.secondMomentZ, Math.PI * r ** 3 * t, 1e-9);
    near((p.shearFirstMomentY / (p.secondMomentZ * p.shearWidthY)) * p.area, 2, 1e-5);
  });
});

describe('tubeProperties refuses impossible geometry', () => {
  it('rejects a wall of at least half the diameter, naming wallThickness', () => {
    try {
      tubeProperties({ shape: 'tube', outerDiameter: 0.1, wallThickness: 0.05 });
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(EngineError);
      expect((error as EngineError).path).toEqual(['section', 'wallThickness']);
    }
  });

  it('rejects a diameter that is not positive', () => {
    expect(() => tubeProperties({ shape: 'tube', outerDiameter: -0.1, wallThickness: 0.005 })).toThrow(EngineError);
  });
});
