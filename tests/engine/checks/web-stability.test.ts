import { describe, expect, it } from 'vitest';
import { analyseMember } from '../../../src/engine/analysis/analyse-member.js';
import { buildCheckContext } from '../../../src/engine/checks/check-context.js';
import type { MemberCheckInput } from '../../../src/engine/checks/check-input.js';
import { checkMember } from '../../../src/engine/checks/check-member.js';
import { webStabilityChecks } from '../../../src/engine/checks/web-stability.js';
import type { LoadModel, MemberModel, SupportModel } from '../../../src/engine/member/model.js';
import type { Material } from '../../../src/engine/materials/material.js';
import type { SectionDimensions } from '../../../src/engine/sections/dimensions.js';
import { sectionProperties } from '../../../src/engine/sections/section-from-dimensions.js';
import { modelOf, PIN, ROLLER, support } from './fixtures/analyses.js';
import { relativeError } from './fixtures/inputs.js';
import { steel } from './fixtures/materials.js';

const FREE_LOAD = { fx: 0, fy: 0, fz: 0, mx: 0, my: 0, mz: 0 };

/** A member analysed by the engine from its dimensions, supports and loads (as check-member.test.ts does). */
function analysedInput(dimensions: SectionDimensions, material: Material, length: number, supports: readonly SupportModel[], loads: readonly LoadModel[]): MemberCheckInput {
  const section = sectionProperties(dimensions);
  const model: MemberModel = { ...modelOf(length, supports, section, material), loads };
  return { analysis: analyseMember(model), model, section, dimensions, material };
}

const findingsOf = (input: MemberCheckInput) => webStabilityChecks(buildCheckContext(input));

// Welded plate girder I 800 x 250 x 5 / 15 in S355, no root fillets: hw = 800 - 2 x 15 = 770 mm.
const GIRDER: SectionDimensions = { shape: 'i-section', depth: 0.8, flangeWidth: 0.25, webThickness: 0.005, flangeThickness: 0.015, rootRadius: 0 };
// IPE 200-like rolled I: h 200, b 100, tw 5.6, tf 8.5, r 12 mm (EN 10365 dimensions, from memory).
const IPE200: SectionDimensions = { shape: 'i-section', depth: 0.2, flangeWidth: 0.1, webThickness: 0.0056, flangeThickness: 0.0085, rootRadius: 0.012 };

// EN 1993-1-5:2006 (from memory), S355: eps = sqrt(235 / 355) = 0.813617, eta = 1.2 (5.1(2) Note 2).
// Shear buckling, clause 5, no intermediate stiffeners, non-rigid end post:
//   hw / tw = 770 / 5 = 154 > 72 eps / eta = 72 x 0.813617 / 1.2 = 48.817: the check is required (5.1(2));
//   lambda_w = hw / (86.4 tw eps) = 770 / (86.4 x 5 x 0.813617) = 770 / 351.482 = 2.19072 (eq. 5.6);
//   chi_w = 0.83 / lambda_w = 0.83 / 2.19072 = 0.378871 (Table 5.1);
//   V_bw = chi_w fyw hw tw / sqrt(3) = 0.378871 x 355e6 x 0.770 x 0.005 / 1.7320508 = 0.378871 x 789 093
//        = 298 964 N (eq. 5.2 without gamma_M1); flange-induced buckling limit 0.55 (E / fyf) sqrt(Aw / Afc)
//        = 0.55 x 591.55 x sqrt(3850 / 3750) = 329.7 >= 154 (eq. 8.1): in range.
const GIRDER_SHEAR_BUCKLING = 298_964;
// Patch loading, clause 6, ss = 0: m1 = fyf bf / (fyw tw) = 250 / 5 = 50 (eq. 6.8);
//   m2 = 0.02 (hw / tf)^2 = 0.02 x (770 / 15)^2 = 52.7022 (eq. 6.9, kept: lambda_F > 0.5 both ways below).
// Type (a), inside the span: k_F = 6 (Fig. 6.1); F_cr = 0.9 k_F E tw^3 / hw = 0.9 x 6 x 210e9 x 1.25e-7 / 0.77
//   = 184 091 N (eq. 6.5); l_y = ss + 2 tf (1 + sqrt(m1 + m2)) = 0.03 x (1 + 10.13421) = 0.334026 m (eq. 6.10);
//   F_y = l_y tw fyw = 592 897 N; lambda_F = sqrt(592 897 / 184 091) = 1.79462; chi_F = 0.5 / lambda_F
//   (eq. 6.3), so F_R = chi_F F_y = 0.5 sqrt(F_y F_cr) = 0.5 sqrt(1.091468e11) = 165 187 N (eq. 6.1).
const GIRDER_PATCH_TYPE_A = 165_187;
// Type (c) at a member end, c = 0: k_F = 2 + 6 (ss + c) / hw = 2 (Fig. 6.1); F_cr = 184 091 / 3 = 61 364 N;
//   l_e = min(k_F E tw^2 / (2 fyw hw), ss + c) = min(0.0192 m, 0) = 0 (eq. 6.13);
//   l_y = min(l_e + tf sqrt(m1 / 2 + (l_e / tf)^2 + m2), l_e + tf sqrt(m1 + m2)) = 0.015 sqrt(25 + 52.7022)
//   = 0.015 x 8.814885 = 0.132223 m (eqs. 6.11, 6.12); F_y = 0.132223 x 0.005 x 355e6 = 234 696 N;
//   lambda_F = sqrt(234 696 / 61 364) = 1.95568; F_R = 0.5 sqrt(234 696 x 61 364) = 0.5 x 120 007 = 60 004 N.
const GIRDER_PATCH_TYPE_C = 60_004;

describe('web shear buckling (EN 1993-1-5:2006 clause 5)', () => {
  it('checks the slender 800 x 250 x 5 / 15 web against V_bw = 298.96 kN', () => {
    // 4 m simple span, 500 kN at mid-span: |Vy| = 250 kN over each half (statics).
    const input = analysedInput(GIRDER, steel, 4, [support(0, PIN), support(4, ROLLER)], [{ kind: 'point', position: 2, ...FREE_LOAD, fy: -500e3 }]);
    const check = findingsOf(input).checks.find((c) => c.mode === 'web-shear-buckling');
    expect(check).toBeDefined();
    expect(relativeError(check?.demand ?? 0, 250e3)).toBeLessThan(1e-9);
    expect(relativeError(check?.capacity ?? 0, GIRDER_SHEAR_BUCKLING)).toBeLessThan(2e-6);
    // Utilization 1.5 x 250 / 298.964 = 1.2543 with the default required factor 1.5: fails.
    expect(check?.utilization).toBeCloseTo((1.5 * 250e3) / GIRDER_SHEAR_BUCKLING, 5);
    expect(check?.passes).toBe(false);
    expect(check?.location).toContain('hw / tw = 154');
    expect(check?.basis).toContain('lambda_w = 2.191');
    expect(check?.basis).toContain('chi_w = 0.3789');
  });

  it('lists a stocky IPE-like web as not applicable with the 72 eps / eta reason', () => {
    // hw / tw = (200 - 2 x 8.5) / 5.6 = 183 / 5.6 = 32.68 <= 72 eps / eta = 48.82 (5.1(2)).
    const input = analysedInput(IPE200, steel, 3.6, [support(0, PIN), support(3.6, ROLLER)], [{ kind: 'point', position: 1.8, ...FREE_LOAD, fy: -10e3 }]);
    const findings = findingsOf(input);
    expect(findings.checks.some((c) => c.mode === 'web-shear-buckling')).toBe(false);
    const reason = findings.notApplicable.find((n) => n.mode === 'web-shear-buckling')?.reason ?? '';
    expect(reason).toContain('72 eps / eta');
    expect(reason).toContain('hw / tw = 32.68');
    expect(reason).toContain('48.82');
  });
});

describe('patch loading (EN 1993-1-5:2006 clause 6)', () => {
  it('takes the worst force: an end reaction of type (c) governs over twice the force inside the span', () => {
    // Reactions 250 kN at the ends (type (c), F_R = 60.00 kN: utilization 1.5 x 250 / 60.004 = 6.25) against
    // the 500 kN load at mid-span (type (a), F_R = 165.19 kN: 1.5 x 500 / 165.187 = 4.54).
    const input = analysedInput(GIRDER, steel, 4, [support(0, PIN), support(4, ROLLER)], [{ kind: 'point', position: 2, ...FREE_LOAD, fy: -500e3 }]);
    const patches = findingsOf(input).checks.filter((c) => c.mode === 'patch-loading');
    expect(patches).toHaveLength(1);
    const patch = patches[0];
    expect(relativeError(patch?.capacity ?? 0, GIRDER_PATCH_TYPE_C)).toBeLessThan(2e-5);
    expect(relativeError(patch?.demand ?? 0, 250e3)).toBeLessThan(1e-9);
    expect([0, 4]).toContain(patch?.position);
    expect(patch?.location).toContain('at the member end');
    expect(patch?.basis).toContain('(c), c = 0');
  });

  it('checks a force inside the span as type (a) when it is the worst', () => {
    // 6 m member on supports at 1 m and 5 m (overhangs), 300 kN at 3 m: reactions 150 kN, all forces inside
    // the member, so all type (a) with F_R = 165.19 kN; the 300 kN load governs (utilization 1.5 x 300 / 165.187 = 2.72).
    const input = analysedInput(GIRDER, steel, 6, [support(1, PIN), support(5, ROLLER)], [{ kind: 'point', position: 3, ...FREE_LOAD, fy: -300e3 }]);
    const patch = findingsOf(input).checks.find((c) => c.mode === 'patch-loading');
    expect(relativeError(patch?.capacity ?? 0, GIRDER_PATCH_TYPE_A)).toBeLessThan(2e-5);
    expect(relativeError(patch?.demand ?? 0, 300e3)).toBeLessThan(1e-9);
    expect(patch?.position).toBeCloseTo(3, 12);
    expect(patch?.location).toBe('web under load 1');
    expect(patch?.basis).toContain('load type (a)');
  });
});

describe('sections the web checks do not cover', () => {
  it('lists both modes as not applicable for a custom section (no plate dimensions)', () => {
    // A custom section with IPE 200-like properties (values rounded from the shape's closed forms).
    const custom: SectionDimensions = { shape: 'custom', area: 2.85e-3, secondMomentZ: 1.94e-5, secondMomentY: 1.42e-6, torsionConstant: 6.98e-8, depth: 0.2, width: 0.1 };
    const input = analysedInput(custom, steel, 3.6, [support(0, PIN), support(3.6, ROLLER)], [{ kind: 'point', position: 1.8, ...FREE_LOAD, fy: -10e3 }]);
    const findings = findingsOf(input);
    expect(findings.checks).toEqual([]);
    expect(findings.notApplicable.map((n) => n.mode)).toEqual(['web-shear-buckling', 'patch-loading']);
    for (const entry of findings.notApplicable) expect(entry.reason).toBe('not an I-section, channel or box with a known web');
    // The same through checkMember: neither mode is checked or left unchecked.
    const outcome = checkMember(input);
    expect(outcome.checks.filter((c) => c.mode === 'web-shear-buckling' || c.mode === 'patch-loading')).toEqual([]);
    expect(outcome.unchecked.filter((u) => u.mode === 'web-shear-buckling' || u.mode === 'patch-loading')).toEqual([]);
  });

  it('lists both modes as not applicable for an I-section without shear or transverse force', () => {
    // Pure axial compression 100 kN: Vy = 0 everywhere and no reaction along y.
    const input = analysedInput(GIRDER, steel, 4, [support(0, PIN), support(4, ROLLER)], [{ kind: 'point', position: 4, ...FREE_LOAD, fx: -100e3 }]);
    const findings = findingsOf(input);
    expect(findings.checks).toEqual([]);
    expect(findings.notApplicable.find((n) => n.mode === 'web-shear-buckling')?.reason).toBe('no shear force along y anywhere along the member');
    expect(findings.notApplicable.find((n) => n.mode === 'patch-loading')?.reason).toContain('no concentrated force across the flange');
  });
});
