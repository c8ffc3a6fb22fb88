import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  equivalentStressAt,
  modifiedMohrEquivalentStress,
  principalStresses,
  vonMisesStress,
} from '../../../src/engine/checks/equivalent-stress.js';
import { castIron, steel } from './fixtures/materials.js';
import { round } from './fixtures/sections.js';

const SUT = 214e6;
const SUC = 752e6;

describe('vonMisesStress', () => {
  it('is sqrt(3) tau in pure shear, so shear yield is Sy / sqrt(3) (Shigley 10th ed., eq. 5-21)', () => {
    expect(vonMisesStress(0, 100)).toBeCloseTo(100 * Math.sqrt(3), 12);
    expect(vonMisesStress(-250, 0)).toBe(250);
  });

  it('matches the shaft formula (16 / (pi d^3)) sqrt(4 M^2 + 3 T^2) (Shigley 10th ed., sec. 7-4, from memory)', () => {
    // d = 40 mm, M = 1000 N*m, T = 800 N*m: sigma = 32 M / (pi d^3) = 159.15 MPa, tau = 16 T / (pi d^3) = 63.66 MPa,
    // sigma' = sqrt(159.15^2 + 3 * 63.66^2) = 193.62 MPa.
    const d = 0.04;
    const sigma = (32 * 1000) / (Math.PI * d ** 3);
    const tau = (16 * 800) / (Math.PI * d ** 3);
    const shaft = (16 / (Math.PI * d ** 3)) * Math.sqrt(4 * 1000 ** 2 + 3 * 800 ** 2);
    expect(vonMisesStress(sigma, tau)).toBeCloseTo(shaft, 3);
    expect(vonMisesStress(sigma, tau) / 1e6).toBeCloseTo(193.62, 2);
  });
});

describe('principalStresses', () => {
  it('gives sigma / 2 +- sqrt((sigma / 2)^2 + tau^2)', () => {
    // sigma = 80, tau = 30: centre 40, radius 50.
    expect(principalStresses(80, 30)).toEqual({ major: 90, minor: -10 });
  });
});

describe('modifiedMohrEquivalentStress (Shigley 10th ed., eqs. 5-32a to 5-32c, from memory)', () => {
  it('is the major principal stress in tension and in pure shear (quadrant I and the first part of IV)', () => {
    expect(modifiedMohrEquivalentStress(100e6, 0, SUT, SUC)).toBe(100e6);
    expect(modifiedMohrEquivalentStress(0, 50e6, SUT, SUC)).toBeCloseTo(50e6, 3);
  });

  it('scales pure compression by Sut / Suc', () => {
    expect(modifiedMohrEquivalentStress(-376e6, 0, SUT, SUC)).toBeCloseTo(107e6, 3);
  });

  it('uses the line (Suc - Sut) sigmaA / Suc - Sut sigmaB / Suc beyond sigmaB = -sigmaA', () => {
    // sigma = -200 MPa, tau = 50 MPa: sigmaA = -100 + 111.803 = 11.803, sigmaB = -211.803 MPa.
    const { major, minor } = principalStresses(-200e6, 50e6);
    const expected = ((SUC - SUT) * major - SUT * minor) / SUC;
    expect(modifiedMohrEquivalentStress(-200e6, 50e6, SUT, SUC)).toBeCloseTo(expected, 3);
    expect(expected / 1e6).toBeCloseTo(68.72, 1);
  });

  it('is continuous where its branches meet: sigmaB = -sigmaA (sigma = 0) and sigmaA = 0 (tau = 0)', () => {
    // A 1 Pa step across each boundary moves the equivalent stress by about 1 Pa, not by a jump.
    const tau = 80e6;
    expect(Math.abs(modifiedMohrEquivalentStress(-1, tau, SUT, SUC) - modifiedMohrEquivalentStress(1, tau, SUT, SUC))).toBeLessThan(2);
    expect(Math.abs(modifiedMohrEquivalentStress(-300e6, 1, SUT, SUC) - modifiedMohrEquivalentStress(-300e6, 0, SUT, SUC))).toBeLessThan(2);
  });

  it('stays finite, non-negative and inside brittle Coulomb-Mohr (Shigley 10th ed., eq. 5-31, from memory)', () => {
    fc.assert(
      fc.property(fc.double({ min: -1e9, max: 1e9, noNaN: true }), fc.double({ min: 0, max: 1e9, noNaN: true }), (normal, shear) => {
        const value = modifiedMohrEquivalentStress(normal, shear, SUT, SUC);
        const { major, minor } = principalStresses(normal, shear);
        // Coulomb-Mohr: Sut / n = sigmaA - Sut sigmaB / Suc (with sigmaA >= 0 >= sigmaB), the outer bound of modified Mohr.
        const coulombMohr = Math.max(major, 0) - (SUT * Math.min(minor, 0)) / SUC;
        expect(Number.isFinite(value)).toBe(true);
        expect(value).toBeGreaterThanOrEqual(0);
        expect(value).toBeLessThanOrEqual(coulombMohr * (1 + 1e-12) + 1e-3);
      }),
    );
  });
});

describe('equivalentStressAt', () => {
  it('takes the worst of the section states: von Mises for steel, modified Mohr for cast iron', () => {
    const section = round(0.04);
    const forces = { axial: 0, shearY: 0, shearZ: 0, momentZ: 1000, momentY: 0, torque: 800 };
    const steelValue = equivalentStressAt(section, steel, forces);
    expect(steelValue.value / 1e6).toBeCloseTo(193.62, 2);
    const ironValue = equivalentStressAt(section, castIron, forces);
    // Tension side: sigma = 159.15, tau = 63.66 MPa: sigmaA = 79.58 + 101.92 = 181.50 MPa, sigmaB = -22.35 > -sigmaA.
    expect(ironValue.value / 1e6).toBeCloseTo(181.5, 1);
    expect(ironValue.location).toBe('extreme fibre, tension side');
  });
});
