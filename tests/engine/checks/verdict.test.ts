import { describe, expect, it } from 'vitest';
import { checkMember } from '../../../src/engine/checks/check-member.js';
import type { UncheckedMode } from '../../../src/engine/checks/check-outcome.js';
import { verdictOf } from '../../../src/engine/checks/verdict.js';
import { simpleSpanUniformLoad } from './fixtures/analyses.js';
import { inputOf } from './fixtures/inputs.js';
import { steel } from './fixtures/materials.js';
import { iSection, rectangle } from './fixtures/sections.js';

const passing = { passes: true } as const;
const failing = { passes: false } as const;
const fatigueGap: UncheckedMode = { mode: 'fatigue', reason: 'test: not evaluated' };
const localGap: UncheckedMode = { mode: 'local-buckling', reason: 'test: not evaluated' };

describe('verdictOf', () => {
  it('passes only when every check passes and nothing is left unchecked', () => {
    expect(verdictOf([passing, passing, passing], [])).toBe('pass');
    // No checks at all and no gaps: nothing can fail, nothing is missing.
    expect(verdictOf([], [])).toBe('pass');
  });

  it('answers not-verified, never pass, when a mode that can govern was not evaluated', () => {
    expect(verdictOf([passing, passing], [fatigueGap])).toBe('not-verified');
    expect(verdictOf([], [localGap])).toBe('not-verified');
    expect(verdictOf([passing], [fatigueGap, localGap])).toBe('not-verified');
  });

  it('fails on any failed check, whatever else is missing and wherever the failure sits', () => {
    expect(verdictOf([failing], [])).toBe('fail');
    expect(verdictOf([passing, passing, failing], [])).toBe('fail');
    expect(verdictOf([failing, passing], [fatigueGap])).toBe('fail');
    expect(verdictOf([passing, failing, passing], [fatigueGap, localGap])).toBe('fail');
  });
});

describe('checkMember verdict', () => {
  it('passes a lightly loaded solid beam that every check covers', () => {
    // 100 x 200 mm rectangle, 4 m simple span, w = 1 kN/m: M = w L^2 / 8 = 2 kN*m, sigma = 6 M / (b h^2)
    // = 12000 / (0.1 x 0.04) = 3 MPa, far below 355 / 1.5; deflection 5 w L^4 / (384 E I) = 0.238 mm
    // (AISC Manual Table 3-23, case 1) against L / 250 = 16 mm.
    const outcome = checkMember(inputOf({ analysis: simpleSpanUniformLoad(4, 1e3, steel.elasticModulus * ((0.1 * 0.2 ** 3) / 12)), section: rectangle(0.1, 0.2), material: steel }));
    expect(outcome.checks.find((check) => check.mode === 'bending')?.demand).toBeCloseTo(3e6, 3);
    expect(outcome.unchecked).toEqual([]);
    expect(outcome.checks.every((check) => check.passes)).toBe(true);
    expect(outcome.verdict).toBe('pass');
  });

  it('keeps the verdict from pass when a shaft on a bearing leaves fatigue unchecked', () => {
    // Same beam on two supports that both let it turn about x (rx): it runs in bearings, so fatigue is listed as unchecked.
    const length = 4;
    const outcome = checkMember(
      inputOf({
        analysis: simpleSpanUniformLoad(length, 1e3, steel.elasticModulus * ((0.1 * 0.2 ** 3) / 12)),
        section: rectangle(0.1, 0.2),
        material: steel,
        supports: [
          { position: 0, restraints: { ux: 'rigid', uy: 'rigid', uz: 'rigid', rx: 'free', ry: 'free', rz: 'free' } },
          { position: length, restraints: { ux: 'free', uy: 'rigid', uz: 'rigid', rx: 'free', ry: 'free', rz: 'free' } },
        ],
        // Nothing holds its twist, so no fork: the deep bar is taken as braced against lateral-torsional buckling.
        lateralTorsional: { braced: true },
      }),
    );
    expect(outcome.checks.every((check) => check.passes)).toBe(true);
    expect(outcome.unchecked.map((gap) => gap.mode)).toEqual(['fatigue']);
    expect(outcome.verdict).toBe('not-verified');
  });

  it('fails an overloaded I-beam even though it also has unchecked modes', () => {
    // Properties-only I 200 x 100 x 5.6 / 8.5 (fixtures, no plate dimensions): Iz = [0.1 x 0.2^3 - 0.0944 x
    // 0.183^3] / 12 = (8e-4 - 5.7853e-4) / 12 = 1.8456e-5 m^4, W = Iz / 0.1 = 1.8456e-4 m^3; w = 200 kN/m on
    // 4 m gives M = w L^2 / 8 = 400 kN*m and sigma = 400e3 / 1.8456e-4 = 2167 MPa >> 355 MPa.
    const section = iSection(0.2, 0.1, 0.0056, 0.0085);
    const outcome = checkMember(
      inputOf({
        analysis: simpleSpanUniformLoad(4, 200e3, steel.elasticModulus * section.secondMomentZ),
        section,
        material: steel,
        supports: [
          { position: 0, restraints: { ux: 'rigid', uy: 'rigid', uz: 'rigid', rx: 'rigid', ry: 'free', rz: 'free' } },
          { position: 4, restraints: { ux: 'free', uy: 'rigid', uz: 'rigid', rx: 'free', ry: 'free', rz: 'free' } },
        ],
      }),
    );
    expect(outcome.unchecked.length).toBeGreaterThan(0);
    const bending = outcome.checks.find((check) => check.mode === 'bending');
    expect((bending?.demand ?? 0) / 2167e6).toBeCloseTo(1, 3);
    expect(bending?.passes).toBe(false);
    expect(outcome.verdict).toBe('fail');
  });
});
