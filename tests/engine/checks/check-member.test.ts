import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { analyseMember } from '../../../src/engine/analysis/analyse-member.js';
import type { DiagramField, Polynomial } from '../../../src/engine/analysis/result.js';
import { checkMember } from '../../../src/engine/checks/check-member.js';
import type { MemberCheckInput } from '../../../src/engine/checks/check-input.js';
import { FAILURE_MODES } from '../../../src/engine/checks/failure-mode.js';
import { EngineError } from '../../../src/engine/engine-error.js';
import type { LoadModel, MemberModel, SupportModel } from '../../../src/engine/member/model.js';
import type { Material } from '../../../src/engine/materials/material.js';
import { sectionProperties } from '../../../src/engine/sections/section-from-dimensions.js';
import type { SectionProperties } from '../../../src/engine/sections/section-properties.js';
import { analysisFrom, FIXED, modelOf, PIN, ROLLER, simpleSpanUniformLoad, support } from './fixtures/analyses.js';
import { inputOf, relativeError } from './fixtures/inputs.js';
import { castIron, columnSteel, steel } from './fixtures/materials.js';
import { iSection, rectangle, round, tee } from './fixtures/sections.js';

/** Every number anywhere in a value, with its path. */
function numbersIn(value: unknown, path = ''): { path: string; value: number }[] {
  if (typeof value === 'number') return [{ path, value }];
  if (Array.isArray(value)) return value.flatMap((item, i) => numbersIn(item, `${path}[${i}]`));
  if (value !== null && typeof value === 'object') {
    return Object.entries(value).flatMap(([key, item]) => numbersIn(item, `${path}.${key}`));
  }
  return [];
}

function expectFinite(outcome: unknown): void {
  const bad = numbersIn(outcome).filter((entry) => !Number.isFinite(entry.value));
  expect(bad).toEqual([]);
}

describe('checkMember with hand-built analyses', () => {
  it('gives every utilization 0, no governing failure and a pass for an unloaded member', () => {
    const outcome = checkMember(inputOf({ analysis: analysisFrom(3, [{ start: 0, end: 3, fields: {} }]), section: rectangle(0.1, 0.2), material: steel }));
    expect(outcome.checks.length).toBeGreaterThan(0);
    for (const check of outcome.checks) {
      expect(check.utilization).toBe(0);
      expect(check.safetyFactor).toBeNull();
      expect(check.position).toBeNull();
    }
    expect(outcome.governing).toBeNull();
    expect(outcome.verdict).toBe('pass');
    expect(outcome.buckling.governing.regime).toBe('none');
    expect(outcome.stresses.equivalent).toEqual({ value: 0, position: null, location: null });
    expectFinite(outcome);
  });

  it('reports every failure mode once, as a check, as not applicable or as unchecked', () => {
    const outcome = checkMember(inputOf({ analysis: simpleSpanUniformLoad(4, 10e3, 1.4e7), section: iSection(0.2, 0.1, 0.0056, 0.0085), material: steel }));
    const reported = [...outcome.checks.map((c) => c.mode), ...outcome.notApplicable.map((n) => n.mode), ...outcome.unchecked.map((n) => n.mode)].sort();
    expect(reported).toEqual([...FAILURE_MODES].sort());
  });

  it('fails the verdict when any check fails and names the worst one', () => {
    // w = 200 kN/m on 4 m: M = 400 kN*m, 100 x 200 mm: sigma = 600 MPa > 355 MPa.
    const outcome = checkMember(inputOf({ analysis: simpleSpanUniformLoad(4, 200e3, 1.4e7), section: rectangle(0.1, 0.2), material: steel }));
    expect(outcome.verdict).toBe('fail');
    const worst = Math.max(...outcome.checks.map((c) => c.utilization));
    expect(outcome.governing?.utilization).toBe(worst);
  });

  it('echoes the criteria it used', () => {
    const outcome = checkMember(
      inputOf({ analysis: simpleSpanUniformLoad(4, 1e3, 1.4e7), section: rectangle(0.1, 0.2), material: steel, criteria: { deflectionLimitRatio: 360 } }),
    );
    expect(outcome.criteria.deflectionLimitRatio).toBe(360);
    expect(outcome.checks.find((c) => c.mode === 'deflection')?.capacity).toBeCloseTo(4 / 360, 15);
  });

  it('refuses a section property it would divide by when it is not positive', () => {
    expect(() => checkMember(inputOf({ analysis: simpleSpanUniformLoad(4, 1e3, 1), section: { ...rectangle(0.1, 0.2), area: 0 }, material: steel }))).toThrow(
      EngineError,
    );
  });

  const coefficient = fc.double({ min: -1e6, max: 1e6, noNaN: true });
  const polynomial: fc.Arbitrary<Polynomial> = fc.array(coefficient, { minLength: 1, maxLength: 4 });
  const pieceFields: fc.Arbitrary<Partial<Record<DiagramField, Polynomial>>> = fc.record({
    axial: polynomial,
    shearY: polynomial,
    shearZ: polynomial,
    momentZ: polynomial,
    momentY: polynomial,
    torque: polynomial,
    deflectionY: polynomial,
    deflectionZ: polynomial,
    twist: polynomial,
  });
  const sections: readonly SectionProperties[] = [rectangle(0.05, 0.1), round(0.06), iSection(0.2, 0.1, 0.0056, 0.0085), tee()];
  const materials: readonly Material[] = [steel, castIron];

  it('keeps every number finite for any polynomial fields, section, material and option (property)', () => {
    fc.assert(
      fc.property(
        fc.array(pieceFields, { minLength: 1, maxLength: 3 }),
        fc.integer({ min: 0, max: sections.length - 1 }),
        fc.integer({ min: 0, max: materials.length - 1 }),
        fc.boolean(),
        fc.double({ min: 0, max: 0.05, noNaN: true }),
        (fields, sectionIndex, materialIndex, amplification, eccentricity) => {
          const length = fields.length * 1.5;
          const analysis = analysisFrom(
            length,
            fields.map((piece, i) => ({ start: i * 1.5, end: (i + 1) * 1.5, fields: piece })),
          );
          const input: MemberCheckInput = inputOf({
            analysis,
            section: sections[sectionIndex] as SectionProperties,
            material: materials[materialIndex] as Material,
            buckling: { amplification, eccentricity },
          });
          const outcome = checkMember(input);
          expectFinite(outcome);
          for (const check of outcome.checks) {
            expect(check.utilization).toBeGreaterThanOrEqual(0);
            expect(check.passes).toBe(check.utilization <= 1);
          }
        },
      ),
      { numRuns: 150 },
    );
  });
});

const FREE_LOAD = { fx: 0, fy: 0, fz: 0, mx: 0, my: 0, mz: 0 };

function analysedInput(
  section: SectionProperties,
  material: Material,
  length: number,
  supports: readonly SupportModel[],
  loads: readonly LoadModel[],
  extra: Partial<MemberCheckInput> = {},
): MemberCheckInput {
  const model: MemberModel = { ...modelOf(length, supports, section, material), loads };
  return { analysis: analyseMember(model), model, section, material, ...extra };
}

describe('checkMember through analyseMember and sectionProperties', () => {
  it('puts the bottom fibre of a sagging simple span in tension: 30 MPa, 1.5 MPa shear, 2.381 mm', () => {
    // 100 x 200 mm, 4 m, w = 10 kN/m: M = 20 kN*m, M c / I = 30 MPa; V = 20 kN, 1.5 V / A = 1.5 MPa;
    // 5 w L^4 / (384 E I) = 2.381 mm (AISC Manual Table 3-23, case 1).
    const section = sectionProperties({ shape: 'rectangle', width: 0.1, depth: 0.2 });
    const input = analysedInput(section, steel, 4, [support(0, PIN), support(4, ROLLER)], [
      { kind: 'distributed', from: 0, to: 4, qx: [0, 0], qy: [-10e3, -10e3], qz: [0, 0], mx: [0, 0] },
    ]);
    const outcome = checkMember(input);
    const bending = outcome.checks.find((c) => c.mode === 'bending');
    expect(relativeError(bending?.demand ?? 0, 30e6)).toBeLessThan(1e-9);
    expect(bending?.position).toBeCloseTo(2, 9);
    expect(bending?.location).toMatch(/^bottom/);
    expect(outcome.stresses.transverseShear.value).toBeCloseTo(1.5e6, 0);
    expect(relativeError(outcome.checks.find((c) => c.mode === 'deflection')?.demand ?? 0, (5 * 10e3 * 256) / (384 * steel.elasticModulus * section.secondMomentZ))).toBeLessThan(1e-9);
    expect(outcome.governing?.mode).toBe('deflection');
    expectFinite(outcome);
  });

  it('checks a flagpole column with K = 2 read from its fixed base', () => {
    // d = 40 mm, L = 1.5 m, fixed at 0, 10 kN down the axis at the top: K L = 3 m, P_cr = pi^2 E I / 9 = 28.53 kN.
    const section = sectionProperties({ shape: 'round', diameter: 0.04 });
    const input = analysedInput(section, columnSteel, 1.5, [support(0, FIXED)], [{ kind: 'point', position: 1.5, ...FREE_LOAD, fx: -10e3 }]);
    const outcome = checkMember(input);
    expect(outcome.buckling.governing.effectiveLengthFactor).toBe(2);
    expect(relativeError(outcome.buckling.governing.criticalLoad, 28.526e3)).toBeLessThan(1e-3);
    const buckling = outcome.checks.find((c) => c.mode === 'buckling');
    expect(buckling?.demand).toBeCloseTo(10e3, 6);
    expect(buckling?.safetyFactor).toBeCloseTo(2.8526, 3);
  });

  it('checks the overhang of a continuous beam against its own length / 180', () => {
    // Span 4 m, overhang 1 m, 10 kN down at the tip: tip deflection P a^2 (l + a) / (3 E I) (AISC Manual
    // Table 3-23, case 24, from memory).
    const section = sectionProperties({ shape: 'rectangle', width: 0.1, depth: 0.2 });
    const input = analysedInput(section, steel, 5, [support(0, PIN), support(4, ROLLER)], [{ kind: 'point', position: 5, ...FREE_LOAD, fy: -10e3 }]);
    const deflection = checkMember(input).checks.find((c) => c.mode === 'deflection');
    const tip = (10e3 * 1 * 5) / (3 * steel.elasticModulus * section.secondMomentZ);
    expect(relativeError(deflection?.demand ?? 0, tip)).toBeLessThan(1e-9);
    expect(deflection?.capacity).toBeCloseTo(1 / 180, 15);
    expect(deflection?.location).toBe('overhang 4 m to 5 m, deflection along y');
  });

  it('twists a shaft by T L / (G J) and checks its pins', () => {
    // d = 30 mm, L = 1 m fixed at 0, T = 200 N*m at the end: twist = 200 / (G pi 0.03^4 / 32) = 0.03144 rad.
    const section = sectionProperties({ shape: 'round', diameter: 0.03 });
    const input = analysedInput(section, steel, 1, [support(0, FIXED)], [{ kind: 'point', position: 1, ...FREE_LOAD, mx: 200, fy: -500 }], {
      pins: [{ support: 0, diameter: 0.012, material: steel, shearPlanes: 2, plateThickness: 0.01, clevisPlateThickness: 0.005, gap: 0 }],
    });
    const outcome = checkMember(input);
    const twist = outcome.checks.find((c) => c.mode === 'twist');
    expect(relativeError(twist?.demand ?? 0, 200 / (steel.shearModulus * section.torsionConstant))).toBeLessThan(1e-9);
    // Reaction 500 N: double shear 500 / (2 pi 0.012^2 / 4) = 2.210 MPa.
    expect(outcome.checks.find((c) => c.mode === 'pin-shear')?.demand).toBeCloseTo(500 / ((2 * Math.PI * 0.012 ** 2) / 4), 3);
  });

  it('buckles an angle strut about its minor principal axis and warns of unsymmetric bending', () => {
    const section = sectionProperties({ shape: 'angle', legY: 0.1, legZ: 0.075, thickness: 0.008, rootRadius: 0.01 });
    const input = analysedInput(section, steel, 2, [support(0, PIN), support(2, ROLLER)], [
      { kind: 'point', position: 2, ...FREE_LOAD, fx: -20e3 },
      { kind: 'point', position: 1, ...FREE_LOAD, fy: -2e3 },
    ]);
    const outcome = checkMember(input);
    expect(outcome.buckling.axes.map((a) => a.axis)).toEqual(['minor']);
    expect(outcome.buckling.governing.slendernessRatio).toBeCloseTo(2 / section.radiusOfGyrationMinor, 9);
    expect(outcome.notices.some((n) => n.includes('unsymmetric-bending formula'))).toBe(true);
    expectFinite(outcome);
  });
});
