import { describe, expect, it } from 'vitest';
import {
  columnBuckling,
  columnCriticalStress,
  eulerCriticalStress,
  johnsonCriticalStress,
  transitionSlendernessRatio,
} from '../../../src/engine/checks/column-buckling.js';
import { constantAxial, FIXED, PIN, ROLLER, support } from './fixtures/analyses.js';
import { contextOf, relativeError } from './fixtures/inputs.js';
import { columnSteel, steel } from './fixtures/materials.js';
import { iSection, rectangle, round } from './fixtures/sections.js';

const E = 207e9;
const SY = 500e6;

describe('column formulas', () => {
  it('puts the transition at sqrt(2 pi^2 E / Sy) = 90.4 for E = 207 GPa, Sy = 500 MPa', () => {
    // sqrt(2 * 9.8696 * 207e9 / 500e6) = sqrt(8172.0) = 90.40 (Shigley 10th ed., eq. 4-45, from memory).
    expect(transitionSlendernessRatio(E, SY)).toBeCloseTo(90.40, 2);
  });

  it('is continuous at the transition, where Euler and Johnson both give Sy / 2', () => {
    const transition = transitionSlendernessRatio(E, SY);
    expect(eulerCriticalStress(E, transition)).toBeCloseTo(SY / 2, 0);
    expect(johnsonCriticalStress(E, SY, transition)).toBeCloseTo(SY / 2, 0);
    expect(columnCriticalStress(E, SY, transition * (1 - 1e-9)).regime).toBe('johnson');
    expect(columnCriticalStress(E, SY, transition).regime).toBe('euler');
  });

  it('gives Sy for a stub column (Johnson at zero slenderness)', () => {
    expect(columnCriticalStress(E, SY, 0)).toEqual({ regime: 'johnson', stress: SY });
  });
});

describe('columnBuckling', () => {
  it("reproduces Shigley's Euler column: d = 40 mm, l = 1.5 m, pinned, P = 22 kN", () => {
    // Shigley 10th ed., Example 4-17 (recalled from memory, re-derived here): l/k = 1500 / (40 / 4) = 150 > 90.4,
    // Euler: P_cr = pi^2 E I / l^2 with I = pi 0.04^4 / 64 = 1.25664e-7 m^4: 9.8696 * 207e9 * 1.25664e-7 / 2.25 = 114.1 kN;
    // n = 114.1 / 22 = 5.19.
    const analysis = constantAxial(1.5, -22e3);
    const context = contextOf({ analysis, section: round(0.04), material: columnSteel });
    const { summary, findings } = columnBuckling(context, context.peaks.axialCompression);
    const axis = summary.governing;
    expect(axis.regime).toBe('euler');
    expect(axis.slendernessRatio).toBeCloseTo(150, 9);
    expect(axis.effectiveLengthFactor).toBe(1);
    expect(relativeError(axis.criticalLoad, 114.10e3)).toBeLessThan(1e-3);
    expect(axis.safetyFactor).toBeCloseTo(5.19, 2);
    const [check] = findings.checks;
    expect(check?.mode).toBe('buckling');
    expect(check?.demand).toBeCloseTo(22e3, 6);
    expect(check?.requiredSafetyFactor).toBe(2.5);
    expect(check?.utilization).toBeCloseTo((22e3 * 2.5) / axis.criticalLoad, 12);
  });

  it('switches to Johnson for a short column: d = 24 mm, l = 0.5 m', () => {
    // l/k = 500 / 6 = 83.33 < 90.4: sigma_cr = 500e6 - (500e6 * 83.333 / (2 pi))^2 / 207e9 = 500 - 212.45 = 287.55 MPa;
    // A = pi 0.024^2 / 4 = 4.5239e-4 m^2: P_cr = 130.09 kN; n = 130.09 / 22 = 5.913 (Shigley 10th ed., eq. 4-46, from memory).
    const analysis = constantAxial(0.5, -22e3);
    const context = contextOf({ analysis, section: round(0.024), material: columnSteel });
    const { summary } = columnBuckling(context, context.peaks.axialCompression);
    expect(summary.governing.regime).toBe('johnson');
    expect(summary.governing.criticalStress / 1e6).toBeCloseTo(287.55, 1);
    expect(relativeError(summary.governing.criticalLoad, 130.09e3)).toBeLessThan(1e-3);
    expect(summary.governing.safetyFactor).toBeCloseTo(5.913, 2);
  });

  it('has no buckling check for a member in tension (regime none)', () => {
    const analysis = constantAxial(2, 50e3);
    const context = contextOf({ analysis, section: rectangle(0.05, 0.1), material: steel });
    const { summary, findings } = columnBuckling(context, context.peaks.axialCompression);
    expect(findings.checks).toHaveLength(0);
    expect(findings.notApplicable).toEqual([{ mode: 'buckling', reason: 'no compressive axial force anywhere along the member' }]);
    for (const axis of summary.axes) {
      expect(axis.regime).toBe('none');
      expect(axis.safetyFactor).toBeNull();
      expect(Number.isFinite(axis.criticalLoad)).toBe(true);
    }
  });

  it('checks both axes of an I-section and lets the weak axis govern', () => {
    // 200 x 100 x 5.6 x 8.5 I, 4 m pinned: r_y = sqrt(Iy / A) is about 22 mm against r_z about 82 mm.
    const section = iSection(0.2, 0.1, 0.0056, 0.0085);
    const context = contextOf({ analysis: constantAxial(4, -100e3), section, material: steel });
    const { summary } = columnBuckling(context, context.peaks.axialCompression);
    expect(summary.axes.map((a) => a.axis)).toEqual(['z', 'y']);
    expect(summary.governing.axis).toBe('y');
    expect(summary.governing.slendernessRatio).toBeCloseTo(4 / section.radiusOfGyrationY, 9);
  });

  it('uses K from the supports: a flagpole is fixed-free, K = 2', () => {
    // Euler with K L = 3 m for d = 40 mm: pi^2 * 207e9 * 1.25664e-7 / 9 = 28.53 kN.
    const context = contextOf({ analysis: constantAxial(1.5, -10e3), section: round(0.04), material: columnSteel, supports: [support(0, FIXED)] });
    const { summary } = columnBuckling(context, context.peaks.axialCompression);
    expect(summary.governing.effectiveLengthFactor).toBe(2);
    expect(summary.governing.effectiveLength).toBe(3);
    expect(relativeError(summary.governing.criticalLoad, 28.526e3)).toBeLessThan(1e-3);
  });

  it('takes the requested unbraced length and factor', () => {
    const context = contextOf({
      analysis: constantAxial(6, -10e3),
      section: round(0.04),
      material: columnSteel,
      supports: [support(0, PIN), support(6, ROLLER)],
      buckling: { unbracedLength: 1.5, effectiveLengthFactor: 1 },
    });
    const { summary } = columnBuckling(context, context.peaks.axialCompression);
    expect(summary.governing.effectiveLength).toBe(1.5);
    expect(summary.governing.slendernessRatio).toBeCloseTo(150, 9);
  });
});
