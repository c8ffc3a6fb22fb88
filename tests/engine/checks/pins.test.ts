import { describe, expect, it } from 'vitest';
import { EngineError } from '../../../src/engine/engine-error.js';
import { pinChecks } from '../../../src/engine/checks/pins.js';
import type { PinInput } from '../../../src/engine/checks/check-input.js';
import { analysisFrom, reaction } from './fixtures/analyses.js';
import { contextOf } from './fixtures/inputs.js';
import { steel } from './fixtures/materials.js';
import { rectangle } from './fixtures/sections.js';

// Reaction (3, 4, 0) kN at the first support: R = 5 kN. Pin d = 10 mm: A = 7.854e-5 m^2.
const analysis = analysisFrom(2, [{ start: 0, end: 2, fields: {} }], [reaction(0, { fx: 3000, fy: 4000 }), reaction(2)]);
const pin = (overrides: Partial<PinInput> = {}): PinInput => ({
  support: 0,
  diameter: 0.01,
  material: steel,
  shearPlanes: 1,
  plateThickness: 0.005,
  clevisPlateThickness: 0.005,
  gap: 0,
  ...overrides,
});
const checksFor = (pins: PinInput[]) => pinChecks(contextOf({ analysis, section: rectangle(0.05, 0.1), material: steel, pins })).checks;

describe('pinChecks', () => {
  it('gives R / A in single shear and R / (2 A) in double shear: a ratio of 2', () => {
    const single = checksFor([pin()]).find((c) => c.mode === 'pin-shear');
    const double = checksFor([pin({ shearPlanes: 2 })]).find((c) => c.mode === 'pin-shear');
    // 5000 / 7.854e-5 = 63.66 MPa, and half of it.
    expect((single?.demand ?? 0) / 1e6).toBeCloseTo(63.66, 2);
    expect((single?.demand ?? 0) / (double?.demand ?? 1)).toBeCloseTo(2, 12);
    expect(single?.capacity).toBeCloseTo(355e6 / Math.sqrt(3), 3);
    expect(single?.position).toBe(0);
    expect(double?.location).toBe('pin at support 0 (double shear)');
  });

  it('gives bearing R / (d t) against the lower of the pin and member strengths', () => {
    // 5000 / (0.01 * 0.005) = 100 MPa.
    const weakPin = { ...steel, compressiveYieldStrength: 235e6, yieldStrength: 235e6 };
    const bearing = checksFor([pin({ material: weakPin })]).find((c) => c.mode === 'pin-bearing');
    expect(bearing?.demand).toBeCloseTo(100e6, 3);
    expect(bearing?.capacity).toBe(235e6);
    const strongPin = { ...steel, compressiveYieldStrength: 700e6, yieldStrength: 700e6 };
    expect(checksFor([pin({ material: strongPin })]).find((c) => c.mode === 'pin-bearing')?.capacity).toBe(355e6);
  });

  it('lists the pin modes as not applicable when no pin is declared', () => {
    const findings = pinChecks(contextOf({ analysis, section: rectangle(0.05, 0.1), material: steel }));
    expect(findings.checks).toHaveLength(0);
    expect(findings.notApplicable.map((n) => n.mode)).toEqual(['pin-shear', 'pin-bearing', 'pin-bending']);
  });

  it('bends a clevis pin by F (b + 4c + 2a) / 8 (EN 1993-1-8:2005 Table 3.10, from memory)', () => {
    // R = 5 kN, b = 5 mm, a = 2.5 mm, c = 1 mm: M = 5000 (0.005 + 0.004 + 0.005) / 8 = 8.75 N*m;
    // pi d^3 / 32 = pi 1e-6 / 32 = 9.8175e-8 m^3, sigma = 89.13 MPa, against Sy 355 MPa of the pin.
    const bending = checksFor([pin({ shearPlanes: 2, clevisPlateThickness: 0.0025, gap: 0.001 })]).find((c) => c.mode === 'pin-bending');
    expect(bending?.demand).toBeCloseTo(8.75 / ((Math.PI * 0.01 ** 3) / 32), 3);
    expect((bending?.demand ?? 0) / 1e6).toBeCloseTo(89.13, 2);
    expect(bending?.capacity).toBe(355e6);
    expect(bending?.basis).toContain('EN 1993-1-8');
  });

  it('bends a single-shear pin by the couple of the two plates\' bearing resultants (common practice)', () => {
    // M = 5000 (0.008 / 2 + 0.002 + 0.005 / 2) = 5000 x 0.0085 = 42.5 N*m.
    const bending = checksFor([pin({ plateThickness: 0.008, clevisPlateThickness: 0.005, gap: 0.002 })]).find((c) => c.mode === 'pin-bending');
    expect(bending?.demand).toBeCloseTo(42.5 / ((Math.PI * 0.01 ** 3) / 32), 3);
  });

  it('refuses a pin at a support that does not exist', () => {
    expect(() => checksFor([pin({ support: 5 })])).toThrow(EngineError);
  });
});
