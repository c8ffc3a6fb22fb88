import { describe, expect, it } from 'vitest';
import { beamColumnChecks, firstLoadFactorReaching } from '../../../src/engine/checks/beam-column.js';
import { constantAxial } from './fixtures/analyses.js';
import { contextOf, relativeError } from './fixtures/inputs.js';
import { castIron, steel } from './fixtures/materials.js';
import { rectangle, round } from './fixtures/sections.js';

const E = steel.elasticModulus;
const SY = steel.yieldStrength;

describe('firstLoadFactorReaching', () => {
  it('finds the root of a convex function that starts negative, or null when it never gets there', () => {
    expect(firstLoadFactorReaching((x) => x * x - 2, 10)).toBeCloseTo(Math.SQRT2, 14);
    expect(firstLoadFactorReaching((x) => x - 20, 10)).toBeNull();
  });
});

describe('moment amplification', () => {
  // 100 wide x 50 deep: Iz = 0.1 * 0.05^3 / 12 = 1.0417e-6 m^4 (the weak axis), A = 0.005 m^2, L = 3 m pinned:
  // P_e,z = pi^2 E Iz / L^2 = 239.89 kN; P_e,y = 959.5 kN.
  const section = rectangle(0.1, 0.05);
  const eulerZ = (Math.PI ** 2 * E * section.secondMomentZ) / 9;

  it('matches the closed form of N/A + sigma_b / (1 - N/P_e) = Sy with every load scaled by lambda', () => {
    // P = 50 kN (sigma_a = 10 MPa), Mz = 500 N*m (sigma_b = 500 * 0.025 / Iz = 12 MPa), r = P / P_e = 0.20843.
    // lambda sigma_a + lambda sigma_b / (1 - lambda r) = Sy is sigma_a r lambda^2 - (sigma_a + sigma_b + Sy r) lambda + Sy = 0,
    // smaller root lambda = 2 Sy / (B + sqrt(B^2 - 4 sigma_a r Sy)), B = sigma_a + sigma_b + Sy r: lambda = 4.055.
    const analysis = constantAxial(3, -50e3, { momentZ: [500] });
    const context = contextOf({ analysis, section, material: steel, buckling: { amplification: true } });
    const { checks } = beamColumnChecks(context, context.peaks.axialCompression);
    const [check] = checks;
    const sigmaA = 50e3 / section.area;
    const sigmaB = (500 * 0.025) / section.secondMomentZ;
    const r = 50e3 / eulerZ;
    const b = sigmaA + sigmaB + SY * r;
    const lambda = (2 * SY) / (b + Math.sqrt(b * b - 4 * sigmaA * r * SY));
    expect(lambda).toBeCloseTo(4.055, 3);
    expect(check?.mode).toBe('beam-column');
    expect(relativeError(check?.safetyFactor ?? 0, lambda)).toBeLessThan(1e-12);
    expect(check?.capacity).toBeCloseTo(lambda * 50e3, 3);
    expect(check?.location).toBe('extreme fibre, compression side');
  });

  it('stays finite beyond the Euler load: the load factor falls below 1', () => {
    const analysis = constantAxial(3, -300e3, { momentZ: [500] });
    const context = contextOf({ analysis, section, material: steel, buckling: { amplification: true } });
    const check = beamColumnChecks(context, context.peaks.axialCompression).checks.find((c) => c.mode === 'beam-column');
    expect(check?.safetyFactor).toBeLessThan(eulerZ / 300e3);
    expect(Number.isFinite(check?.utilization)).toBe(true);
    expect(check?.passes).toBe(false);
  });

  it('without moments reduces to the lower of the squash load and the Euler load', () => {
    // Squash A Sy = 1775 kN > P_e,z = 239.89 kN.
    const context = contextOf({ analysis: constantAxial(3, -100e3), section, material: steel, buckling: { amplification: true } });
    const check = beamColumnChecks(context, context.peaks.axialCompression).checks.find((c) => c.mode === 'beam-column');
    expect(relativeError(check?.capacity ?? 0, eulerZ)).toBeLessThan(1e-9);
  });

  it('runs by default under compression, is listed when switched off, and does not apply without compression', () => {
    const byDefault = contextOf({ analysis: constantAxial(3, -100e3), section, material: steel });
    expect(beamColumnChecks(byDefault, byDefault.peaks.axialCompression).checks.map((c) => c.mode)).toEqual(['beam-column']);
    const context = contextOf({ analysis: constantAxial(3, -100e3), section, material: steel, buckling: { amplification: false } });
    expect(beamColumnChecks(context, context.peaks.axialCompression).notApplicable.map((n) => n.mode)).toEqual([
      'beam-column',
      'eccentric-column',
    ]);
    const tension = contextOf({ analysis: constantAxial(3, 100e3), section, material: steel, buckling: { amplification: true, eccentricity: 0.01 } });
    const findings = beamColumnChecks(tension, tension.peaks.axialCompression);
    expect(findings.checks).toHaveLength(0);
    expect(findings.notApplicable.every((n) => n.reason.includes('no compressive axial force'))).toBe(true);
  });
});

describe('secant formula', () => {
  // Round bar d = 40 mm, L = 1.5 m pinned, e = 5 mm: r = 10 mm, c = 20 mm, e c / r^2 = 1.
  const section = round(0.04);
  const secantStress = (force: number) =>
    (force / section.area) * (1 + ((0.005 * 0.02) / 0.01 ** 2) / Math.cos((1.5 / (2 * 0.01)) * Math.sqrt(force / (E * section.area))));

  it('finds the load at which P/A [1 + (e c / r^2) sec((L / 2r) sqrt(P / EA))] reaches Sy (Shigley 10th ed., eq. 4-50)', () => {
    const context = contextOf({ analysis: constantAxial(1.5, -10e3), section, material: steel, buckling: { eccentricity: 0.005 } });
    const check = beamColumnChecks(context, context.peaks.axialCompression).checks.find((c) => c.mode === 'eccentric-column');
    expect(check?.mode).toBe('eccentric-column');
    expect(relativeError(secantStress(check?.capacity ?? 0), SY)).toBeLessThan(1e-9);
    // Below the Euler load pi^2 E I / L^2 = 9.8696 * 210e9 * 1.25664e-7 / 2.25 = 115.8 kN and below A Sy / 2 = 223 kN
    // (e c / r^2 = 1 doubles the stress at small loads).
    expect(check?.capacity).toBeLessThan(115.8e3);
    expect(check?.capacity).toBeLessThan((section.area * SY) / 2);
  });

  it('tends to the lower of the squash and Euler loads as the eccentricity vanishes', () => {
    const context = contextOf({ analysis: constantAxial(1.5, -10e3), section, material: steel, buckling: { eccentricity: 1e-9 } });
    const check = beamColumnChecks(context, context.peaks.axialCompression).checks.find((c) => c.mode === 'eccentric-column');
    const euler = (Math.PI ** 2 * E * section.secondMomentZ) / 1.5 ** 2;
    expect(relativeError(check?.capacity ?? 0, euler)).toBeLessThan(1e-3);
  });

  it('also checks the tension side of a brittle column', () => {
    // Cast iron, e c / r^2 = 4 (e = 20 mm): the bending on the far side exceeds P/A three times over, and Sut is
    // 3.5 times smaller than Suc, so the tension side governs.
    const context = contextOf({ analysis: constantAxial(0.5, -10e3), section, material: castIron, buckling: { eccentricity: 0.02 } });
    const check = beamColumnChecks(context, context.peaks.axialCompression).checks.find((c) => c.mode === 'eccentric-column');
    expect(check?.location).toContain('tension side');
    expect(check?.requiredSafetyFactor).toBe(2.5);
  });
});
