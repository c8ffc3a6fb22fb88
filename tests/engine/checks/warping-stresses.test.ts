import { describe, expect, it } from 'vitest';
import { analyseMember } from '../../../src/engine/analysis/analyse-member.js';
import { buildCheckContext } from '../../../src/engine/checks/check-context.js';
import type { MemberCheckInput } from '../../../src/engine/checks/check-input.js';
import { checkMember } from '../../../src/engine/checks/check-member.js';
import type { FailureCheck } from '../../../src/engine/checks/check-outcome.js';
import { warpingStressChecks } from '../../../src/engine/checks/warping-stresses.js';
import type { LoadModel, MemberModel, SupportModel } from '../../../src/engine/member/model.js';
import type { Material } from '../../../src/engine/materials/material.js';
import type { SectionDimensions } from '../../../src/engine/sections/dimensions.js';
import { sectionProperties } from '../../../src/engine/sections/section-from-dimensions.js';
import type { SectionProperties } from '../../../src/engine/sections/section-properties.js';
import { FIXED, modelOf, PIN, ROLLER, support } from './fixtures/analyses.js';
import { relativeError } from './fixtures/inputs.js';
import { steel } from './fixtures/materials.js';
import { iSection } from './fixtures/sections.js';

const FREE_LOAD = { fx: 0, fy: 0, fz: 0, mx: 0, my: 0, mz: 0 };

/** A member analysed by the engine (as check-member.test.ts does); dimensions passed when known. */
function analysedInput(
  section: SectionProperties,
  dimensions: SectionDimensions | undefined,
  material: Material,
  length: number,
  supports: readonly SupportModel[],
  loads: readonly LoadModel[],
): MemberCheckInput {
  const model: MemberModel = { ...modelOf(length, supports, section, material), loads };
  return { analysis: analyseMember(model), model, section, ...(dimensions === undefined ? {} : { dimensions }), material };
}

/** The warping stresses the check's location reports, MPa. */
function reportedWarping(check: FailureCheck | undefined): { normal: number; shear: number } {
  const match = /sigma_w = ([\d.e+-]+) MPa, tau_w = ([\d.e+-]+) MPa/.exec(check?.location ?? '');
  return { normal: Number(match?.[1] ?? NaN), shear: Number(match?.[2] ?? NaN) };
}

// IPE 200-like I: h 200, b 100, tw 5.6, tf 8.5, r 12 mm (EN 10365 dimensions, from memory).
const IPE200: SectionDimensions = { shape: 'i-section', depth: 0.2, flangeWidth: 0.1, webThickness: 0.0056, flangeThickness: 0.0085, rootRadius: 0.012 };
const section = sectionProperties(IPE200);
const LENGTH = 3.6;
const TORQUE = 1e3;
const FORCE = 10e3;

// Hand values (Timoshenko & Gere 2nd ed. ch. 5; AISC Design Guide 9, 2nd ed., ch. 3-4; from memory):
//   Iw = tf b^3 h_s^2 / 24, h_s = h - tf = 0.1915 m: 0.0085 x 1e-3 x 0.1915^2 / 24 = 1.29881e-8 m^6 (the
//   section's own value); J the section's own 7.0157e-8 m^4 (with the root fillets; tabulated It of IPE 200
//   is 6.98 cm^4, which would give 126.6 MPa below instead of 126.3);
//   G J = 81e9 x 7.0157e-8 = 5682.7 N*m^2, E Iw = 210e9 x 1.29881e-8 = 2727.5 N*m^4,
//   lambda = sqrt(G J / (E Iw)) = sqrt(2.08348) = 1.44343 1/m.
const hs = 0.2 - 0.0085;
const handWarpingConstant = (0.0085 * 0.1 ** 3 * hs ** 2) / 24;
const lambda = Math.sqrt((steel.shearModulus * section.torsionConstant) / (steel.elasticModulus * section.warpingConstant));
//   omega_n,max = h_s b / 4 = 0.1915 x 0.1 / 4 = 4.7875e-3 m^2 at the flange tips (DG9, I-shapes).
const omegaMax = (hs * 0.1) / 4;

describe('warping stresses of an I-section under torque', () => {
  const loads: LoadModel[] = [{ kind: 'point', position: LENGTH / 2, ...FREE_LOAD, fy: -FORCE, mx: TORQUE }];
  const input = analysedInput(section, IPE200, steel, LENGTH, [support(0, PIN), support(LENGTH, ROLLER)], loads);

  it('uses the section\'s own Iw, which is the closed form tf b^3 h_s^2 / 24', () => {
    expect(relativeError(section.warpingConstant, handWarpingConstant)).toBeLessThan(1e-12);
    expect(lambda).toBeCloseTo(1.44343, 4);
  });

  it('adds sigma_w = B omega_n / Iw = 126.3 MPa at mid-span, fork ends, 1 kN*m at mid-span', () => {
    // Forks at both ends, T at mid-span: by symmetry each half carries T / 2 with phi = phi'' = 0 at the fork
    // and phi' = 0 at mid-span; B(L / 2) = T tanh(lambda L / 2) / (2 lambda) (DG9 case 3, from memory):
    //   lambda L / 2 = 2.59817, tanh = 0.98898, B = 1000 x 0.98898 / 2.88685 = 342.58 N*m^2;
    //   sigma_w = B omega_n / Iw = 342.58 x 4.7875e-3 / 1.29881e-8 = 126.28 MPa.
    // Warping torque at mid-span T_w = T / 2 = 500 N*m (phi' = 0 there, so T_sv = 0); S_w,max = h_s b^2 tf / 16
    //   = 0.1915 x 0.01 x 0.0085 / 16 = 1.01734e-6 m^4; tau_w = T_w S_w / (Iw tf) = 500 x 1.01734e-6 /
    //   (1.29881e-8 x 0.0085) = 4.608 MPa.
    const bimoment = (TORQUE * Math.tanh((lambda * LENGTH) / 2)) / (2 * lambda);
    const sigmaW = (bimoment * omegaMax) / handWarpingConstant;
    const tauW = ((TORQUE / 2) * ((hs * 0.1 ** 2 * 0.0085) / 16)) / (handWarpingConstant * 0.0085);
    expect(sigmaW / 1e6).toBeCloseTo(126.28, 1);
    expect(tauW / 1e6).toBeCloseTo(4.608, 2);

    const findings = warpingStressChecks(buildCheckContext(input));
    expect(findings.checks).toHaveLength(1);
    const check = findings.checks[0];
    expect(check?.mode).toBe('combined');
    expect(check?.position).toBeCloseTo(LENGTH / 2, 9);
    const reported = reportedWarping(check);
    // Four significant figures in the text: within 5e-4 relative.
    expect(relativeError(reported.normal * 1e6, sigmaW)).toBeLessThan(5e-4);
    expect(relativeError(reported.shear * 1e6, tauW)).toBeLessThan(5e-4);

    // Its demand adds the warping normal stress to the bending stress: at least M / Wz + sigma_w, with
    // M = P L / 4 = 10e3 x 3.6 / 4 = 9000 N*m (AISC Manual Table 3-23, case 7).
    const bendingStress = (FORCE * LENGTH) / 4 / section.sectionModulusZ;
    expect(check?.demand ?? 0).toBeGreaterThanOrEqual(bendingStress + sigmaW);
    // And exactly the von Mises of the sums (warping-stresses.ts, an upper bound): normal M / Wz + sigma_w;
    // shear = largest V Q / (I t) (from the engine's peaks) + Saint-Venant (T / 2) tmax / J + tau_w.
    const context = buildCheckContext(input);
    const saintVenant = ((TORQUE / 2) * Math.max(0.0085, 0.0056)) / section.torsionConstant;
    const shear = context.peaks.transverseShear.value + saintVenant + tauW;
    const expected = Math.sqrt((bendingStress + sigmaW) ** 2 + 3 * shear ** 2);
    expect(relativeError(check?.demand ?? 0, expected)).toBeLessThan(1e-6);
    expect(check?.capacity).toBe(355e6);
  });

  it('appears in checkMember beside the plain combined check, with the larger demand', () => {
    const outcome = checkMember(input);
    const combined = outcome.checks.filter((c) => c.mode === 'combined');
    expect(combined).toHaveLength(2);
    const withWarping = combined.find((c) => (c.location ?? '').includes('with warping'));
    const plain = combined.find((c) => !(c.location ?? '').includes('with warping'));
    expect(withWarping).toBeDefined();
    expect(withWarping?.demand ?? 0).toBeGreaterThan(plain?.demand ?? Infinity);
  });

  it('takes the larger of fully fixed ends holding warping (110.0 MPa) or not (the fork value): fork here', () => {
    // Fixed ends (phi = phi' = 0) and phi' = 0 at mid-span under T / 2 in each half: phi' = (T / 2GJ)(1 -
    // cosh(lambda x) + tanh(lambda L / 4) sinh(lambda x)), so |B| = T tanh(lambda L / 4) / (2 lambda) at the
    // ends and at mid-span (derived here from G J phi' - E Iw phi''' = T / 2):
    //   lambda L / 4 = 1.29908, tanh = 0.86178, B = 1000 x 0.86178 / 2.88685 = 298.52 N*m^2,
    //   sigma_w = 298.52 x 4.7875e-3 / 1.29881e-8 = 110.04 MPa.
    const fixed = analysedInput(section, IPE200, steel, LENGTH, [support(0, FIXED), support(LENGTH, FIXED)], [
      { kind: 'point', position: LENGTH / 2, ...FREE_LOAD, mx: TORQUE },
    ]);
    const check = warpingStressChecks(buildCheckContext(fixed)).checks[0];
    const sigmaFixed = ((TORQUE * Math.tanh((lambda * LENGTH) / 4)) / (2 * lambda) * omegaMax) / handWarpingConstant;
    expect(sigmaFixed / 1e6).toBeCloseTo(110.04, 1);
    // Forks: B = T tanh(lambda L / 2) / (2 lambda), the larger at mid-span, and the one a bolted end plate gives.
    const sigmaFork = ((TORQUE * Math.tanh((lambda * LENGTH) / 2)) / (2 * lambda) * omegaMax) / handWarpingConstant;
    expect(sigmaFork).toBeGreaterThan(sigmaFixed);
    expect(relativeError(reportedWarping(check).normal * 1e6, sigmaFork)).toBeLessThan(5e-4);
  });

  it('adds no warping check without torque', () => {
    const noTorque = analysedInput(section, IPE200, steel, LENGTH, [support(0, PIN), support(LENGTH, ROLLER)], [
      { kind: 'point', position: LENGTH / 2, ...FREE_LOAD, fy: -FORCE },
    ]);
    const findings = warpingStressChecks(buildCheckContext(noTorque));
    expect(findings.checks).toEqual([]);
    expect(findings.unchecked ?? []).toEqual([]);
    expect(checkMember(noTorque).checks.filter((c) => c.mode === 'combined')).toHaveLength(1);
  });

  it('leaves torsion unchecked for an I-section given only by its properties (plates unknown)', () => {
    // The hand-built fixture I 200 x 100 x 5.6 / 8.5 has shape 'i-section' but no dimensions.
    const byProperties = iSection(0.2, 0.1, 0.0056, 0.0085);
    const torqued = analysedInput(byProperties, undefined, steel, LENGTH, [support(0, PIN), support(LENGTH, ROLLER)], [
      { kind: 'point', position: LENGTH / 2, ...FREE_LOAD, mx: TORQUE },
    ]);
    const findings = warpingStressChecks(buildCheckContext(torqued));
    expect(findings.checks).toEqual([]);
    expect(findings.unchecked?.map((u) => u.mode)).toEqual(['torsion']);
    expect(findings.unchecked?.[0]?.reason).toContain('plate dimensions are not known');
    const outcome = checkMember(torqued);
    expect(outcome.unchecked.some((u) => u.mode === 'torsion')).toBe(true);
    expect(outcome.verdict).not.toBe('pass');
  });

  it('leaves torsion unchecked under a distributed torque that varies along the member', () => {
    const varying = analysedInput(section, IPE200, steel, LENGTH, [support(0, PIN), support(LENGTH, ROLLER)], [
      { kind: 'distributed', from: 0, to: LENGTH, qx: [0, 0], qy: [0, 0], qz: [0, 0], mx: [0, 500] },
    ]);
    const findings = warpingStressChecks(buildCheckContext(varying));
    expect(findings.checks).toEqual([]);
    expect(findings.unchecked?.[0]?.reason).toContain('varies along the member');
  });
});
