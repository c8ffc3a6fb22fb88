import { describe, expect, it } from 'vitest';
import { shearChecks } from '../../../src/engine/checks/shear.js';
import { analysisFrom, simpleSpanUniformLoad } from './fixtures/analyses.js';
import { contextOf } from './fixtures/inputs.js';
import { steel } from './fixtures/materials.js';
import { iSection, rectangle } from './fixtures/sections.js';

describe('shearChecks', () => {
  it('gives 1.5 V / A at the support of a simple span, against Sy / sqrt(3)', () => {
    // V = w L / 2 = 20 kN on 0.02 m^2: tau = 1.5 MPa (average 1.0 MPa); Ssy = 355 / sqrt(3) = 204.96 MPa.
    const section = rectangle(0.1, 0.2);
    const analysis = simpleSpanUniformLoad(4, 10e3, 1);
    const context = contextOf({ analysis, section, material: steel });
    const [check] = shearChecks(context).checks;
    expect(check?.demand).toBeCloseTo(1.5e6, 3);
    expect((check?.capacity ?? 0) / 1e6).toBeCloseTo(204.96, 2);
    expect(context.peaks.averageShear.value).toBeCloseTo(1e6, 3);
    expect([0, 4]).toContain(check?.position);
  });

  it('uses the requested shear yield ratio: 0.58 Sy instead of 0.5774 Sy', () => {
    const section = rectangle(0.1, 0.2);
    const analysis = simpleSpanUniformLoad(4, 10e3, 1);
    const [check] = shearChecks(contextOf({ analysis, section, material: steel, criteria: { shearYieldRatio: 0.58 } })).checks;
    expect(check?.capacity).toBeCloseTo(0.58 * 355e6, 3);
    expect(check?.basis).toContain('Ssy = 0.5800 Sy');
  });

  it('finds the web shear of an I-section: V Q / (I tw)', () => {
    // 200 x 100 x 5.6 x 8.5 I: Q = 0.1 * 0.0085 * 0.1915 / 2 + 0.0056 * 0.0915^2 / 2 = 1.04831e-4 m^3,
    // Iz = (0.1 * 0.2^3 - 0.0944 * 0.183^3) / 12 = 1.84559e-5 m^4; V = 50 kN: tau = 50e3 * Q / (Iz * 0.0056) = 50.71 MPa.
    const section = iSection(0.2, 0.1, 0.0056, 0.0085);
    const analysis = analysisFrom(2, [{ start: 0, end: 2, fields: { shearY: [50e3], momentZ: [0, 50e3] } }]);
    const [check] = shearChecks(contextOf({ analysis, section, material: steel })).checks;
    expect((check?.demand ?? 0) / 1e6).toBeCloseTo(50.71, 1);
    expect(check?.location).toBe('neutral axis, shear along y');
  });
});
