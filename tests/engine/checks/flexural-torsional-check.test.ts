import { describe, expect, it } from 'vitest';
import { analyseMember } from '../../../src/engine/analysis/analyse-member.js';
import { buildCheckContext } from '../../../src/engine/checks/check-context.js';
import type { MemberCheckInput } from '../../../src/engine/checks/check-input.js';
import { checkMember } from '../../../src/engine/checks/check-member.js';
import { flexuralTorsionalChecks, localBucklingChecks } from '../../../src/engine/checks/flexural-torsional-check.js';
import type { LoadModel, MemberModel, SupportModel } from '../../../src/engine/member/model.js';
import type { Material } from '../../../src/engine/materials/material.js';
import type { SectionDimensions } from '../../../src/engine/sections/dimensions.js';
import { sectionProperties } from '../../../src/engine/sections/section-from-dimensions.js';
import { modelOf, PIN, ROLLER, support } from './fixtures/analyses.js';
import { relativeError } from './fixtures/inputs.js';
import { steel } from './fixtures/materials.js';

const FREE_LOAD = { fx: 0, fy: 0, fz: 0, mx: 0, my: 0, mz: 0 };

/** A member analysed by the engine from its dimensions (as check-member.test.ts does). */
function analysedInput(dimensions: SectionDimensions, material: Material, length: number, supports: readonly SupportModel[], loads: readonly LoadModel[]): MemberCheckInput {
  const section = sectionProperties(dimensions);
  const model: MemberModel = { ...modelOf(length, supports, section, material), loads };
  return { analysis: analyseMember(model), model, section, dimensions, material };
}

/** A pin-ended strut of length L with an axial compression P applied at its far end. */
function strut(dimensions: SectionDimensions, length: number, compression: number): MemberCheckInput {
  return analysedInput(dimensions, steel, length, [support(0, PIN), support(length, ROLLER)], [{ kind: 'point', position: length, ...FREE_LOAD, fx: -compression }]);
}

/** Both modules' findings together, in check-member.ts's order. */
const findingsOf = (input: MemberCheckInput) => {
  const context = buildCheckContext(input);
  const parts = [flexuralTorsionalChecks(context), localBucklingChecks(context)];
  return {
    checks: parts.flatMap((part) => part.checks),
    notApplicable: parts.flatMap((part) => part.notApplicable),
    unchecked: parts.flatMap((part) => part.unchecked ?? []),
  };
};

/** Johnson's parabola above Sy / 2 (Shigley 10th ed., eqs. 4-44 and 4-46, from memory), as a load. */
function johnsonLoad(elasticLoad: number, area: number, yieldStrength: number): number {
  const elastic = elasticLoad / area;
  return (elastic <= yieldStrength / 2 ? elastic : yieldStrength * (1 - yieldStrength / (4 * elastic))) * area;
}

// Plain channel 100 x 50 x 3 mm (sharp corners), S355, 1 m pin-ended (K = 1 about both axes and for twist).
const CHANNEL: SectionDimensions = { shape: 'channel', depth: 0.1, flangeWidth: 0.05, webThickness: 0.003, flangeThickness: 0.003 };

describe('flexural-torsional buckling of a plain channel 100 x 50 x 3, 1 m, 60 kN', () => {
  // Hand values in mm first, then SI (closed forms of the outline; thin-walled shear centre and Iw):
  //   A = 2 x 50 x 3 + 94 x 3 = 582 mm^2;
  //   Iz = [50 x 100^3 - 47 x 94^3] / 12 = (50 000 000 - 39 037 448) / 12 = 913 546 mm^4;
  //   centroid from the web back z_c = (2 x 150 x 25 + 282 x 1.5) / 582 = 13.6134 mm;
  //   Iy = 2 [3 x 50^3 / 12 + 150 (25 - 13.6134)^2] + 94 x 3^3 / 12 + 282 (1.5 - 13.6134)^2 = 142 987 mm^4.
  const area = 582e-6;
  const centroidZ = (2 * 150 * 25 + 282 * 1.5) / 582 / 1000;
  const secondMomentZ = (0.05 * 0.1 ** 3 - 0.047 * 0.094 ** 3) / 12;
  const secondMomentY = 2 * ((0.003 * 0.05 ** 3) / 12 + 150e-6 * (0.025 - centroidZ) ** 2) + (0.094 * 0.003 ** 3) / 12 + 282e-6 * (0.0015 - centroidZ) ** 2;
  //   Shear centre (Roark 8th ed. / AISC DG9 App. A, from memory), b' = 48.5, h' = 97 mm:
  //   e0 = 3 b'^2 tf / (6 b' tf + h' tw) = 21 170.25 / 1164 = 18.1875 mm behind the web mid-line (z = 1.5 mm),
  //   so a = (1.5 - 18.1875) - 13.6134 = -30.3009 mm from the centroid, along z (the major axis).
  const bm = 0.0485;
  const hm = 0.097;
  const e0 = (3 * bm ** 2 * 0.003) / (6 * bm * 0.003 + hm * 0.003);
  const offset = 0.0015 - e0 - centroidZ;
  //   Iw = tf b'^3 h'^2 / 12 x (3 b' tf + 2 h' tw) / (6 b' tf + h' tw) = 268 354 383 x 0.875 = 2.34810e8 mm^6 (DG9).
  const warpingConstant = ((0.003 * bm ** 3 * hm ** 2) / 12) * ((3 * bm * 0.003 + 2 * hm * 0.003) / (6 * bm * 0.003 + hm * 0.003));
  //   r0^2 = (Iz + Iy) / A + a^2 = 1815.35 + 918.14 = 2733.49 mm^2 (Timoshenko & Gere 2nd ed. sec. 5.2).
  const r0Squared = (secondMomentZ + secondMomentY) / area + offset ** 2;
  //   Euler (K L = 1 m): Pz = pi^2 E Iz = 1 893 431 N, Py = pi^2 E Iy = 296 358 N;
  const pi2E = Math.PI ** 2 * steel.elasticModulus;
  const loadZ = pi2E * secondMomentZ;
  const loadY = pi2E * secondMomentY;

  const input = strut(CHANNEL, 1, 60e3);
  const section = input.section;
  //   Pt = (G J + pi^2 E Iw / L^2) / r0^2 = (81e9 x 1.7333e-9 + 486.66) / 2.73349e-3 = 229 399 N, with the
  //   section's own J (1733 mm^4; the thin-walled sum of b t^3 / 3 gives 1746 mm^4);
  const loadT = (steel.shearModulus * section.torsionConstant + pi2E * warpingConstant) / r0Squared;
  //   the coupled root of (Pz - P)(Pt - P) r0^2 - P^2 a^2 = 0 (offset along the axis of Pz), H = 1 - a^2 / r0^2 = 0.66412:
  //   P_FT = (Pz + Pt) / (2H) [1 - sqrt(1 - 4 Pz Pt H / (Pz + Pt)^2)] = 219 711 N (AISC 360-16 eq. E4-5 form, from memory);
  const h = 1 - offset ** 2 / r0Squared;
  const sum = loadZ + loadT;
  const flexuralTorsional = (sum / (2 * h)) * (1 - Math.sqrt(1 - (4 * loadZ * loadT * h) / sum ** 2));
  //   through Johnson: 219 711 / 582e-6 = 377.51 MPa > Sy / 2, 355 (1 - 355 / 1510.0) = 271.54 MPa, x A = 158 037 N;
  //   flexural alone: 296 358 / 582e-6 = 509.21 MPa, 355 (1 - 355 / 2036.8) = 293.13 MPa, x A = 170 600 N.
  const capacity = johnsonLoad(flexuralTorsional, area, 355e6);
  const flexuralCapacity = johnsonLoad(Math.min(loadZ, loadY), area, 355e6);

  it('matches the hand section properties it starts from', () => {
    expect(relativeError(section.area, area)).toBeLessThan(1e-12);
    expect(relativeError(section.secondMomentZ, secondMomentZ)).toBeLessThan(1e-12);
    expect(relativeError(section.secondMomentY, secondMomentY)).toBeLessThan(1e-9);
    expect(offset * 1000).toBeCloseTo(-30.3009, 3);
    expect(r0Squared * 1e6).toBeCloseTo(2733.49, 1);
    expect(loadT).toBeCloseTo(229_399, -2);
    expect(flexuralTorsional).toBeCloseTo(219_711, -2);
  });

  it('is checked for flexural-torsional buckling: about 158.0 kN against 170.6 kN flexural', () => {
    expect(capacity / 1e3).toBeCloseTo(158.04, 1);
    expect(flexuralCapacity / 1e3).toBeCloseTo(170.6, 1);
    const check = findingsOf(input).checks.find((c) => c.mode === 'flexural-torsional-buckling');
    expect(check).toBeDefined();
    expect(relativeError(check?.demand ?? 0, 60e3)).toBeLessThan(1e-9);
    expect(relativeError(check?.capacity ?? 0, capacity)).toBeLessThan(1e-6);
    expect(check?.location).toMatch(/^flexural-torsional/);
    // 2.5 x 60 / 158.04 = 0.949: passes with the default required factor 2.5.
    expect(check?.utilization).toBeCloseTo((2.5 * 60e3) / capacity, 9);
    expect(check?.passes).toBe(true);
    // The flexural buckling check of the same member stays at the higher, flexural capacity.
    const outcome = checkMember(input);
    expect(relativeError(outcome.checks.find((c) => c.mode === 'buckling')?.capacity ?? 0, flexuralCapacity)).toBeLessThan(1e-6);
  });

  it('leaves local buckling unchecked: flange c/t = 47 / 3 = 15.67 > 14 eps = 11.39', () => {
    // EN 1993-1-1:2005 Table 5.2 sheet 2 (from memory): outstand c = b - tw - r = 50 - 3 - 0 = 47 mm,
    // c / t = 15.667; class 3 limit 14 eps = 14 x sqrt(235 / 355) = 14 x 0.813617 = 11.39: class 4.
    const findings = findingsOf(input);
    const gap = findings.unchecked?.find((u) => u.mode === 'local-buckling');
    expect(gap?.reason).toContain('flange outstand');
    expect(gap?.reason).toContain('c/t = 15.67');
    expect(gap?.reason).toContain('11.39');
    expect(findings.notApplicable.some((n) => n.mode === 'local-buckling')).toBe(false);
    // Nothing fails, yet the member is not verified.
    const outcome = checkMember(input);
    expect(outcome.checks.every((c) => c.passes)).toBe(true);
    expect(outcome.verdict).toBe('not-verified');
  });
});

describe('sections that do not need or cannot have the flexural-torsional check', () => {
  it('lists it as not applicable for a doubly symmetric I in compression (flexural buckling governs)', () => {
    // IPE 200-like (h 200, b 100, tw 5.6, tf 8.5, r 12 mm), 2 m, 60 kN: Py = pi^2 E Iy / L^2 with Iy about
    // 1.42e-6 m^4 is about 736 kN; Pt = (G J + pi^2 E Iw / L^2) / r0^2 = (81e9 x 7.02e-8 + pi^2 x 210e9 x
    // 1.299e-8 / 4) / ((1.943e-5 + 1.42e-6) / 2.85e-3) = (5683 + 6731) / 7.32e-3, about 1.70e6 N: flexural governs.
    const ipe: SectionDimensions = { shape: 'i-section', depth: 0.2, flangeWidth: 0.1, webThickness: 0.0056, flangeThickness: 0.0085, rootRadius: 0.012 };
    const input = strut(ipe, 2, 60e3);
    const findings = findingsOf(input);
    expect(findings.checks.some((c) => c.mode === 'flexural-torsional-buckling')).toBe(false);
    const reason = findings.notApplicable.find((n) => n.mode === 'flexural-torsional-buckling')?.reason ?? '';
    expect(reason).toMatch(/^doubly symmetric/);
    const pt = Number(/torsional load ([\d.e+]+) N/.exec(reason)?.[1]);
    expect(pt / 1e6).toBeCloseTo(1.70, 1);
    // Its plates are within class 3 (web c/t = (200 - 17 - 24) / 5.6 = 28.39 <= 42 eps = 34.17): not applicable.
    expect(findings.notApplicable.find((n) => n.mode === 'local-buckling')?.reason).toContain('c/t = 28.39');
  });

  it('leaves it unchecked for an open custom section in compression, and says why', () => {
    const custom: SectionDimensions = { shape: 'custom', area: 2e-3, secondMomentZ: 4e-6, secondMomentY: 1e-6, torsionConstant: 5e-8, depth: 0.15, width: 0.08 };
    const input = strut(custom, 2, 60e3);
    const findings = findingsOf(input);
    expect(findings.checks).toEqual([]);
    const modes = (findings.unchecked ?? []).map((u) => u.mode).sort();
    expect(modes).toEqual(['flexural-torsional-buckling', 'local-buckling']);
    expect(findings.unchecked?.find((u) => u.mode === 'flexural-torsional-buckling')?.reason).toContain('shear centre is not known');
    expect(checkMember(input).verdict).not.toBe('pass');
  });

  it('lists it as not applicable for a closed custom section', () => {
    const closed: SectionDimensions = { shape: 'custom', area: 2e-3, secondMomentZ: 4e-6, secondMomentY: 1e-6, torsionConstant: 3e-6, depth: 0.15, width: 0.08, closed: true };
    const findings = findingsOf(strut(closed, 2, 60e3));
    expect(findings.notApplicable.find((n) => n.mode === 'flexural-torsional-buckling')?.reason).toMatch(/^closed section/);
  });

  it('lists it as not applicable with no compression anywhere', () => {
    const findings = findingsOf(analysedInput(CHANNEL, steel, 1, [support(0, PIN), support(1, ROLLER)], [{ kind: 'point', position: 1, ...FREE_LOAD, fx: 20e3 }]));
    expect(findings.notApplicable.find((n) => n.mode === 'flexural-torsional-buckling')?.reason).toBe('no compressive axial force anywhere along the member');
    expect(findings.notApplicable.find((n) => n.mode === 'local-buckling')?.reason).toBe('nothing along the member is in compression or shear');
  });

  it('never gives a tee or an angle more than the flexural capacity (the smallest root is at most min(P1, P2, Pt))', () => {
    // Rayleigh quotient bound (flexural-torsional-buckling.ts header; Timoshenko & Gere 2nd ed. sec. 5.3):
    // the check's capacity cannot exceed the flexural buckling check's, Johnson's parabola being monotone.
    const shapes: SectionDimensions[] = [
      { shape: 'tee', depth: 0.1, flangeWidth: 0.1, webThickness: 0.008, flangeThickness: 0.01 },
      { shape: 'angle', legY: 0.1, legZ: 0.075, thickness: 0.008, rootRadius: 0.01 },
    ];
    for (const dimensions of shapes) {
      const outcome = checkMember(strut(dimensions, 1.5, 20e3));
      const torsional = outcome.checks.find((c) => c.mode === 'flexural-torsional-buckling');
      const flexural = outcome.checks.find((c) => c.mode === 'buckling');
      expect(torsional).toBeDefined();
      expect(torsional?.capacity ?? Infinity).toBeLessThanOrEqual((flexural?.capacity ?? 0) * (1 + 1e-12));
    }
  });
});
