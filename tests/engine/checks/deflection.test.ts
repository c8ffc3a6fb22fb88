import { describe, expect, it } from 'vitest';
import { deflectionChecks } from '../../../src/engine/checks/deflection.js';
import { analysisFrom, cantileverTipLoad, FIXED, PIN, ROLLER, simpleSpanUniformLoad, support } from './fixtures/analyses.js';
import { contextOf, relativeError } from './fixtures/inputs.js';
import { steel } from './fixtures/materials.js';
import { rectangle } from './fixtures/sections.js';

const section = rectangle(0.1, 0.2);
const EI = steel.elasticModulus * section.secondMomentZ;

describe('deflectionChecks', () => {
  it('checks a simple span against L / 250', () => {
    // 5 w L^4 / (384 E I) with w = 10 kN/m, L = 4 m, EI = 210e9 * 6.6667e-5 = 1.4e7 N*m^2: 2.381 mm against 16 mm.
    const [check] = deflectionChecks(contextOf({ analysis: simpleSpanUniformLoad(4, 10e3, EI), section, material: steel })).checks;
    expect(relativeError(check?.demand ?? 0, (5 * 10e3 * 4 ** 4) / (384 * EI))).toBeLessThan(1e-12);
    expect(check?.capacity).toBeCloseTo(0.016, 15);
    expect(check?.position).toBeCloseTo(2, 9);
    expect(check?.location).toBe('span 0 m to 4 m, deflection along y');
    expect(check?.requiredSafetyFactor).toBe(1);
  });

  it('checks a cantilever against L / 180', () => {
    // P L^3 / (3 E I) = 1e3 * 8 / (3 * 1.4e7) = 0.1905 mm against 2 / 180 = 11.11 mm.
    const analysis = cantileverTipLoad(2, 1e3, EI);
    const [check] = deflectionChecks(contextOf({ analysis, section, material: steel, supports: [support(0, FIXED)] })).checks;
    expect(relativeError(check?.demand ?? 0, (1e3 * 8) / (3 * EI))).toBeLessThan(1e-12);
    expect(check?.capacity).toBeCloseTo(2 / 180, 15);
    expect(check?.position).toBe(2);
    expect(check?.location).toBe('overhang 0 m to 2 m, deflection along y');
  });

  it('checks each span and overhang of a continuous member against its own length', () => {
    // Span l = 4 m with an overhang a = 1 m and a tip load P = 10 kN down, EI = 1e6 N*m^2 (AISC Manual Table 3-23,
    // case 24, from memory): between supports v = P a x (l^2 - x^2) / (6 E I l), up, at most 0.06415 P a l^2 / EI =
    // 10.26 mm (limit 16 mm, U = 0.64); overhang v = -P s (2 a l + 3 a s - s^2) / (6 E I), at the tip
    // P a^2 (l + a) / (3 E I) = 16.67 mm against 1 / 180 = 5.556 mm, U = 3.0: the overhang governs.
    const P = 10e3;
    const k = 1 / (6 * 1e6);
    const analysis = analysisFrom(5, [
      { start: 0, end: 4, fields: { deflectionY: [0, P * 1 * k * 16 * 0.25, 0, -P * 1 * k * 0.25] } },
      { start: 4, end: 5, fields: { deflectionY: [0, -P * k * 8, -P * k * 3, P * k] } },
    ]);
    const supports = [support(0, PIN), support(4, ROLLER)];
    const [check] = deflectionChecks(contextOf({ analysis, section, material: steel, supports })).checks;
    expect(check?.location).toBe('overhang 4 m to 5 m, deflection along y');
    expect(check?.demand).toBeCloseTo((P * 5) / (3 * 1e6), 12);
    expect(check?.utilization).toBeCloseTo(3, 9);
    const spanOnly = deflectionChecks(
      contextOf({ analysis, section, material: steel, supports, criteria: { cantileverDeflectionLimitRatio: 10 } }),
    ).checks[0];
    expect(spanOnly?.location).toBe('span 0 m to 4 m, deflection along y');
    expect(spanOnly?.demand).toBeCloseTo((0.06415 * P * 16) / 1e6, 6);
  });

  it('checks the horizontal plane too', () => {
    const analysis = analysisFrom(4, [{ start: 0, end: 4, fields: { deflectionZ: [0, -0.01, 0.0025] } }]);
    const [check] = deflectionChecks(contextOf({ analysis, section, material: steel })).checks;
    // w = 0.0025 x (x - 4): 10 mm at x = 2 against 16 mm.
    expect(check?.demand).toBeCloseTo(0.01, 12);
    expect(check?.location).toContain('deflection along z');
  });
});
