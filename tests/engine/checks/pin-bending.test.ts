import { describe, expect, it } from 'vitest';
import type { PinInput } from '../../../src/engine/checks/check-input.js';
import { pinBendingMoment } from '../../../src/engine/checks/pin-bending.js';
import { pinChecks } from '../../../src/engine/checks/pins.js';
import { analysisFrom, reaction } from './fixtures/analyses.js';
import { contextOf, relativeError } from './fixtures/inputs.js';
import { steel } from './fixtures/materials.js';
import { rectangle } from './fixtures/sections.js';

type PinGeometry = Pick<PinInput, 'shearPlanes' | 'plateThickness' | 'clevisPlateThickness' | 'gap'>;

describe('pinBendingMoment, double shear (EN 1993-1-8:2005 Table 3.10, from memory)', () => {
  it('gives M = F (b + 4c + 2a) / 8 for an eye plate between two clevis plates', () => {
    // F = 100 kN, eye b = 20 mm, clevis plates a = 12 mm, gaps c = 2 mm:
    // M = 100e3 x (0.020 + 4 x 0.002 + 2 x 0.012) / 8 = 100e3 x 0.052 / 8 = 650 N*m.
    const pin: PinGeometry = { shearPlanes: 2, plateThickness: 0.02, clevisPlateThickness: 0.012, gap: 0.002 };
    const bending = pinBendingMoment(pin, 100e3);
    expect(relativeError(bending.moment, 650)).toBeLessThan(1e-12);
    expect(bending.basis).toContain('EN 1993-1-8');
  });

  it('agrees with the simple beam between the clevis plates\' mid-thicknesses (statics)', () => {
    // The clevis reactions F / 2 act at the clevis mid-thicknesses, a span b + 2c + a apart; the eye load F
    // is spread over b at mid-span. M_max = (F / 2)(b + 2c + a) / 2 - (F / 2)(b / 4) = F (b + 4c + 2a) / 8,
    // the Table 3.10 form. F = 40 kN, b = 16 mm, a = 10 mm, c = 3 mm:
    // (40e3 / 2)(0.016 + 0.006 + 0.010) / 2 - (40e3 / 2)(0.016 / 4) = 320 - 80 = 240 N*m.
    const bending = pinBendingMoment({ shearPlanes: 2, plateThickness: 0.016, clevisPlateThickness: 0.01, gap: 0.003 }, 40e3);
    expect(relativeError(bending.moment, 240)).toBeLessThan(1e-12);
  });

  it('is linear in the force, zero for no force', () => {
    const pin: PinGeometry = { shearPlanes: 2, plateThickness: 0.02, clevisPlateThickness: 0.012, gap: 0.002 };
    expect(pinBendingMoment(pin, 0).moment).toBe(0);
    expect(relativeError(pinBendingMoment(pin, 250e3).moment, 2.5 * pinBendingMoment(pin, 100e3).moment)).toBeLessThan(1e-12);
  });
});

describe('pinBendingMoment, single shear (the two bearing resultants a couple, common practice)', () => {
  it('gives M = F (t1 / 2 + c + t2 / 2)', () => {
    // F = 20 kN, t1 = 10 mm, t2 = 6 mm, c = 1 mm: lever 0.005 + 0.001 + 0.003 = 0.009 m, M = 180 N*m.
    const bending = pinBendingMoment({ shearPlanes: 1, plateThickness: 0.01, clevisPlateThickness: 0.006, gap: 0.001 }, 20e3);
    expect(relativeError(bending.moment, 180)).toBeLessThan(1e-12);
    expect(bending.basis).toContain('couple');
  });

  it('is the same whichever plate is which', () => {
    const swapped = pinBendingMoment({ shearPlanes: 1, plateThickness: 0.006, clevisPlateThickness: 0.01, gap: 0.001 }, 20e3);
    expect(relativeError(swapped.moment, 180)).toBeLessThan(1e-12);
  });

  it('bends a single-shear pin more than the same plates in double shear with the same force', () => {
    // t = 10 mm both, c = 0, F = 10 kN: single 10e3 x 0.010 = 100 N*m; double 10e3 x (0.01 + 0.02) / 8 = 37.5 N*m.
    const single = pinBendingMoment({ shearPlanes: 1, plateThickness: 0.01, clevisPlateThickness: 0.01, gap: 0 }, 10e3);
    const double = pinBendingMoment({ shearPlanes: 2, plateThickness: 0.01, clevisPlateThickness: 0.01, gap: 0 }, 10e3);
    expect(relativeError(single.moment, 100)).toBeLessThan(1e-12);
    expect(relativeError(double.moment, 37.5)).toBeLessThan(1e-12);
  });
});

describe('pin-bending check (pins.ts with pin-bending.ts)', () => {
  // Reaction (0, 12, 5) kN at support 0: R = sqrt(12^2 + 5^2) = 13 kN. Pin d = 16 mm:
  // pi d^3 / 32 = pi x 4.096e-6 / 32 = 4.0212e-7 m^3 (Shigley 10th ed., Table A-18, from memory).
  const analysis = analysisFrom(2, [{ start: 0, end: 2, fields: {} }], [reaction(0, { fy: 12e3, fz: 5e3 }), reaction(2)]);
  const pin = (overrides: Partial<PinInput>): PinInput => ({
    support: 0,
    diameter: 0.016,
    material: steel,
    shearPlanes: 1,
    plateThickness: 0.012,
    clevisPlateThickness: 0.008,
    gap: 0.002,
    ...overrides,
  });
  const bendingOf = (p: PinInput) => pinChecks(contextOf({ analysis, section: rectangle(0.05, 0.1), material: steel, pins: [p] })).checks.find((c) => c.mode === 'pin-bending');

  it('single shear: sigma = R (t1 / 2 + c + t2 / 2) / (pi d^3 / 32) = 387.9 MPa, which fails at 1.5', () => {
    // M = 13e3 x (0.006 + 0.002 + 0.004) = 13e3 x 0.012 = 156 N*m; sigma = 156 / 4.02124e-7 = 387.9 MPa against
    // Sy = 355 MPa: utilization 1.5 x 387.9 / 355 = 1.639.
    const check = bendingOf(pin({}));
    const modulus = (Math.PI * 0.016 ** 3) / 32;
    expect(relativeError(check?.demand ?? 0, 156 / modulus)).toBeLessThan(1e-9);
    expect((check?.demand ?? 0) / 1e6).toBeCloseTo(387.9, 1);
    expect(check?.capacity).toBe(355e6);
    expect(check?.utilization).toBeCloseTo((1.5 * 156) / modulus / 355e6, 9);
    expect(check?.passes).toBe(false);
    expect(check?.position).toBe(0);
  });

  it('double shear: M = R (b + 4c + 2a) / 8 gives 145.5 MPa and passes', () => {
    // M = 13e3 x (0.012 + 0.008 + 0.016) / 8 = 13e3 x 0.036 / 8 = 58.5 N*m; sigma = 58.5 / 4.02124e-7 = 145.5 MPa.
    const check = bendingOf(pin({ shearPlanes: 2 }));
    const modulus = (Math.PI * 0.016 ** 3) / 32;
    expect(relativeError(check?.demand ?? 0, 58.5 / modulus)).toBeLessThan(1e-9);
    expect((check?.demand ?? 0) / 1e6).toBeCloseTo(145.48, 1);
    expect(check?.passes).toBe(true);
  });
});
