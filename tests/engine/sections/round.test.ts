import { describe, expect, it } from 'vitest';
import { EngineError } from '../../../src/engine/engine-error.js';
import { roundProperties } from '../../../src/engine/sections/round.js';

const near = (actual: number, expected: number, relative = 1e-12) =>
  expect(Math.abs(actual / expected - 1)).toBeLessThan(relative);

describe('roundProperties, 20 mm bar', () => {
  const d = 0.02;
  const p = roundProperties({ shape: 'round', diameter: d });

  it('has the closed forms of Roark 8th ed., Table A.1, solid circle (from memory)', () => {
    near(p.area, 3.14159265358979e-4); // pi d^2 / 4
    near(p.secondMomentZ, (Math.PI * d ** 4) / 64); // 7.854e-9 m^4
    near(p.secondMomentY, p.secondMomentZ);
    near(p.sectionModulusZ, (Math.PI * d ** 3) / 32);
    near(p.radiusOfGyrationMinor, d / 4);
    near(p.plasticModulusZ, d ** 3 / 6);
  });

  it('has the exact torsion of a circle: J = pi d^4 / 32, tau = 16 T / (pi d^3) (Roark 8th ed., Table 10.7, case 1)', () => {
    near(p.torsionConstant, (Math.PI * 0.02 ** 4) / 32); // 1.5708e-8 m^4
    near(p.torsionalShearPerTorque, 16 / (Math.PI * d ** 3));
    // T r / J is the same stress.
    near(p.torsionalShearPerTorque, d / 2 / p.torsionConstant);
  });

  it('peaks in shear at 4 V / (3 A)', () => {
    near((p.shearFirstMomentY / (p.secondMomentZ * p.shearWidthY)) * p.area, 4 / 3);
    near((p.shearFirstMomentZ / (p.secondMomentY * p.shearWidthZ)) * p.area, 4 / 3);
  });

  it('bends by the resultant moment and counts as closed', () => {
    expect(p.bendingCombination).toBe('resultant');
    expect(p.closed).toBe(true);
    expect(p.thickestElement).toBe(d);
    expect(p.principalAngle).toBe(0);
    for (const point of p.stressPoints) near(Math.hypot(point.y, point.z), d / 2);
  });

  it('refuses a diameter that is not positive', () => {
    expect(() => roundProperties({ shape: 'round', diameter: 0 })).toThrow(EngineError);
  });
});
