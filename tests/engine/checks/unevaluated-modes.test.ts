import { describe, expect, it } from 'vitest';
import { analyseMember } from '../../../src/engine/analysis/analyse-member.js';
import { checkMember } from '../../../src/engine/checks/check-member.js';
import { unevaluatedModes } from '../../../src/engine/checks/unevaluated-modes.js';
import type { LoadModel, MemberModel, SupportModel } from '../../../src/engine/member/model.js';
import { sectionProperties } from '../../../src/engine/sections/section-from-dimensions.js';
import { FIXED, modelOf, PIN, ROLLER, simpleSpanUniformLoad, support } from './fixtures/analyses.js';
import { contextOf, inputOf } from './fixtures/inputs.js';
import { steel } from './fixtures/materials.js';
import { round } from './fixtures/sections.js';

const FREE_LOAD = { fx: 0, fy: 0, fz: 0, mx: 0, my: 0, mz: 0 };
/** A bearing: holds the member in place (uy, uz; the first also ux) and lets it turn about x. */
const LOCATING_BEARING = ['ux', 'uy', 'uz'] as const;
const FLOATING_BEARING = ['uy', 'uz'] as const;

const findingsFor = (supports: readonly SupportModel[]) =>
  unevaluatedModes(contextOf({ analysis: simpleSpanUniformLoad(1, 1e3, steel.elasticModulus * ((Math.PI * 0.04 ** 4) / 64)), section: round(0.04), material: steel, supports }));

describe('unevaluatedModes', () => {
  it('leaves fatigue unchecked for a member that turns freely in its bearings (uy, uz rigid, rx free everywhere)', () => {
    const findings = findingsFor([support(0, LOCATING_BEARING), support(1, FLOATING_BEARING)]);
    expect(findings.checks).toEqual([]);
    expect(findings.notApplicable).toEqual([]);
    expect(findings.unchecked?.map((u) => u.mode)).toEqual(['fatigue']);
    expect(findings.unchecked?.[0]?.reason).toContain('reverses its bending stress every revolution');
  });

  it('does not take a beam whose twist is held at one end only, and that carries no torque, for a shaft', () => {
    // Pin (with rx) at 0, and at 1 m a support free to turn, but no torque anywhere: an ordinary beam.
    const findings = findingsFor([support(0, PIN), support(1, FLOATING_BEARING)]);
    expect(findings.unchecked ?? []).toEqual([]);
    expect(findings.notApplicable.map((n) => n.mode)).toEqual(['fatigue']);
  });

  it('lists fatigue as not applicable for a beam on pinned and roller supports that hold the twist', () => {
    const findings = findingsFor([support(0, PIN), support(1, ROLLER)]);
    expect(findings.unchecked ?? []).toEqual([]);
    expect(findings.notApplicable.map((n) => n.mode)).toEqual(['fatigue']);
    expect(findings.notApplicable[0]?.reason).toContain('not a rotating shaft');
  });

  it('lists fatigue as not applicable for a cantilever built in at one end', () => {
    expect(findingsFor([support(0, FIXED)]).notApplicable.map((n) => n.mode)).toEqual(['fatigue']);
  });

  it('does not take a support free sideways (uz free) as a bearing, even with rx free', () => {
    // A rocker that holds only uy: not a bearing by the rule (uy and uz both rigid).
    const findings = findingsFor([support(0, PIN), support(1, ['uy'])]);
    expect(findings.unchecked ?? []).toEqual([]);
    expect(findings.notApplicable.map((n) => n.mode)).toEqual(['fatigue']);
  });
});

describe('fatigue through checkMember', () => {
  it('answers not-verified for a lightly loaded shaft whose every check passes', () => {
    // Round 40 mm steel shaft, 1 m, bearings at 0.1 m and 0.9 m, coupling at 1 m (rx), 1 kN at mid-span and
    // 50 N*m through a pulley at 0: M = P a / 4 = 1000 x 0.8 / 4 = 200 N*m, sigma = 32 M / (pi d^3) = 31.8 MPa;
    // tau = 16 T / (pi d^3) = 3.98 MPa (Shigley 10th ed., sec. 3-12, from memory): far below yield.
    const section = sectionProperties({ shape: 'round', diameter: 0.04 });
    const supports = [support(0.1, LOCATING_BEARING), support(0.9, FLOATING_BEARING), support(1, ['rx'])];
    const loads: LoadModel[] = [
      { kind: 'point', position: 0.5, ...FREE_LOAD, fy: -1e3 },
      { kind: 'point', position: 0, ...FREE_LOAD, mx: 50 },
    ];
    const model: MemberModel = { ...modelOf(1, supports, section, steel), loads };
    const outcome = checkMember({ analysis: analyseMember(model), model, section, dimensions: { shape: 'round', diameter: 0.04 }, material: steel });
    const bending = outcome.checks.find((c) => c.mode === 'bending');
    expect((bending?.demand ?? 0) / 1e6).toBeCloseTo((32 * 200) / (Math.PI * 0.04 ** 3) / 1e6, 3);
    expect(outcome.checks.every((c) => c.passes)).toBe(true);
    expect(outcome.unchecked.map((u) => u.mode)).toEqual(['fatigue']);
    expect(outcome.verdict).toBe('not-verified');
  });

  it('passes a round bar on pinned and roller supports (rx held) under a light load', () => {
    // d = 40 mm, 1 m, w = 1 kN/m: M = w L^2 / 8 = 125 N*m, sigma = 32 M / (pi d^3) = 19.9 MPa
    // (AISC Manual Table 3-23, case 1; Shigley 10th ed., Table A-18, from memory).
    const bendingZ = steel.elasticModulus * ((Math.PI * 0.04 ** 4) / 64);
    const outcome = checkMember(inputOf({ analysis: simpleSpanUniformLoad(1, 1e3, bendingZ), section: round(0.04), material: steel }));
    expect((outcome.checks.find((c) => c.mode === 'bending')?.demand ?? 0) / 1e6).toBeCloseTo((32 * 125) / (Math.PI * 0.04 ** 3) / 1e6, 3);
    expect(outcome.notApplicable.some((n) => n.mode === 'fatigue')).toBe(true);
    expect(outcome.unchecked).toEqual([]);
    expect(outcome.verdict).toBe('pass');
  });
});
