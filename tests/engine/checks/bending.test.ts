import { describe, expect, it } from 'vitest';
import { bendingChecks } from '../../../src/engine/checks/bending.js';
import { cantileverTipLoad, FIXED, simpleSpanUniformLoad, support, uniformMoment } from './fixtures/analyses.js';
import { contextOf } from './fixtures/inputs.js';
import { castIron, steel } from './fixtures/materials.js';
import { rectangle, tee } from './fixtures/sections.js';

describe('bendingChecks', () => {
  it('gives M c / I at midspan of a simple span under a uniform load', () => {
    // w = 10 kN/m, L = 4 m: M = w L^2 / 8 = 20 kN*m at x = 2 m; 100 x 200 mm: M c / I = 30 MPa; SF = 355 / 30.
    const section = rectangle(0.1, 0.2);
    const analysis = simpleSpanUniformLoad(4, 10e3, steel.elasticModulus * section.secondMomentZ);
    const [check] = bendingChecks(contextOf({ analysis, section, material: steel })).checks;
    expect(check?.demand).toBeCloseTo(30e6, 3);
    expect(check?.position).toBeCloseTo(2, 12);
    expect(check?.safetyFactor).toBeCloseTo(355 / 30, 9);
    expect(check?.location).toBe('bottom corner, +z (tension side)');
  });

  it('lets the tension side of a cast-iron tee govern with the smaller stress', () => {
    // Tee 100 x 20 flange over 20 x 80 stem: centroid 67.78 mm above the bottom, so c_top = 32.22 mm and
    // c_bottom = 67.78 mm; Iz = 1.054321e-6 + 2.087901e-6 = 3.142222e-6 m^4 (parallel axes, by hand).
    // A cantilever with a 1 kN tip load at 1 m hogs by 1 kN*m at the root: the flange (top) is in tension,
    // 1000 * 0.03222 / 3.142e-6 = 10.25 MPa, and the stem tip in compression, 21.57 MPa.
    // Against Sut = 214 and Suc = 752 MPa: 10.25 / 214 = 0.0479 > 21.57 / 752 = 0.0287, tension governs.
    const section = tee();
    expect(section.secondMomentZ).toBeCloseTo(3.142222e-6, 11);
    const analysis = cantileverTipLoad(1, 1000, castIron.elasticModulus * section.secondMomentZ);
    const context = contextOf({ analysis, section, material: castIron, supports: [support(0, FIXED)] });
    expect(context.peaks.bendingTension.value / 1e6).toBeCloseTo(10.25, 2);
    expect(context.peaks.bendingCompression.value / 1e6).toBeCloseTo(21.57, 2);
    const [check] = bendingChecks(context).checks;
    expect(check?.capacity).toBe(214e6);
    expect((check?.demand ?? 0) / 1e6).toBeCloseTo(10.25, 2);
    expect(check?.location).toBe('flange tip, +z (tension side)');
    expect(check?.requiredSafetyFactor).toBe(2);
    expect(check?.position).toBe(0);
  });

  it('lets the compression side govern for steel, whose strengths are equal', () => {
    const section = tee();
    const analysis = cantileverTipLoad(1, 1000, steel.elasticModulus * section.secondMomentZ);
    const [check] = bendingChecks(contextOf({ analysis, section, material: steel, supports: [support(0, FIXED)] })).checks;
    expect(check?.location).toBe('stem bottom, +z (compression side)');
    expect((check?.demand ?? 0) / 1e6).toBeCloseTo(21.57, 2);
  });

  it('reports no demand without a moment', () => {
    const section = rectangle(0.1, 0.2);
    const [check] = bendingChecks(contextOf({ analysis: uniformMoment(3, 0, 1), section, material: steel })).checks;
    expect(check?.utilization).toBe(0);
    expect(check?.safetyFactor).toBeNull();
  });
});
