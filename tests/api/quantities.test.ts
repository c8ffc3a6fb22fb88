import { describe, expect, it } from 'vitest';
import { quantityToSI, unitFactorToSI } from '../../src/api/quantities.js';

// Conversion factors: NIST SP 811 (2008), Appendix B.8/B.9: 1 in = 0.0254 m exactly,
// 1 lbf = 4.4482216152605 N exactly, so 1 kip = 4448.2216152605 N and 1 psi = 6894.757293168 Pa.
const KIP = 4448.2216152605;
const FOOT = 0.3048;
const PSI = 4.4482216152605 / 0.0254 ** 2;

function si(input: number | string, kind: Parameters<typeof quantityToSI>[1]): number {
  const result = quantityToSI(input, kind);
  if (!result.ok) throw new Error(result.message);
  return result.value;
}

describe('quantityToSI', () => {
  it('passes SI numbers through', () => {
    expect(si(2.5, 'length')).toBe(2.5);
    expect(si(-1200, 'force')).toBe(-1200);
  });

  it('converts the strings the contract documents', () => {
    expect(si('250 mm', 'length')).toBeCloseTo(0.25, 15);
    expect(si('12 kN', 'force')).toBeCloseTo(12000, 9);
    expect(si('5 kip/ft', 'forcePerLength')).toBeCloseTo((5 * KIP) / FOOT, 6);
    expect(si('36 ksi', 'stress')).toBeCloseTo(36000 * PSI, 1);
    expect(si('2.5 kN*m', 'moment')).toBeCloseTo(2500, 9);
    expect(si('1943 cm^4', 'secondMoment')).toBeCloseTo(1943e-8, 18);
    expect(si('90 deg', 'angle')).toBeCloseTo(Math.PI / 2, 15);
    expect(si('50 kN*m/rad', 'rotationalStiffness')).toBeCloseTo(50000, 9);
    expect(si('7850 kg/m^3', 'density')).toBeCloseTo(7850, 9);
  });

  it('accepts a rotational stiffness without the radian, which is dimensionless', () => {
    expect(si('50 kN*m', 'rotationalStiffness')).toBeCloseTo(50000, 9);
  });

  it('refuses a unit of the wrong dimension, naming what was expected', () => {
    const result = quantityToSI('3 kN', 'length');
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.message).toMatch(/not a length/);
  });

  it('refuses unknown units, bare numeric strings and non-finite numbers', () => {
    expect(quantityToSI('3 furlongz', 'length').ok).toBe(false);
    expect(quantityToSI('3', 'length').ok).toBe(false);
    expect(quantityToSI(Number.POSITIVE_INFINITY, 'length').ok).toBe(false);
    expect(quantityToSI(Number.NaN, 'force').ok).toBe(false);
    expect(quantityToSI('1e400 m', 'length').ok).toBe(false);
    expect(quantityToSI('', 'length').ok).toBe(false);
  });

  it('refuses an angle given as a plain length-free quantity of the wrong kind', () => {
    expect(quantityToSI('2 m', 'angle').ok).toBe(false);
  });
});

describe('unitFactorToSI', () => {
  it('gives SI units per unit, and undefined for a unit of another kind', () => {
    expect(unitFactorToSI('mm', 'length')).toBeCloseTo(0.001, 18);
    expect(unitFactorToSI('kip*ft', 'moment')).toBeCloseTo(KIP * FOOT, 6);
    expect(unitFactorToSI('kN', 'length')).toBeUndefined();
    expect(unitFactorToSI('no-such-unit', 'length')).toBeUndefined();
  });

  it('round-trips every kind through its US unit and back', () => {
    const pairs: [Parameters<typeof quantityToSI>[1], string][] = [
      ['length', 'in'],
      ['force', 'kip'],
      ['moment', 'kip*ft'],
      ['stress', 'ksi'],
      ['forcePerLength', 'kip/ft'],
      ['secondMoment', 'in^4'],
      ['massPerLength', 'lbm/ft'],
    ];
    for (const [kind, unit] of pairs) {
      const factor = unitFactorToSI(unit, kind) as number;
      const valueSI = 1234.5678;
      const presented = valueSI / factor;
      expect(si(`${presented} ${unit}`, kind)).toBeCloseTo(valueSI, 8);
    }
  });
});

describe('odd units', () => {
  it('refuses an angle where none belongs, without throwing', () => {
    expect(quantityToSI('5 N*m*rad', 'moment').ok).toBe(false);
    expect(quantityToSI('5 N/rad', 'force').ok).toBe(false);
    const result = quantityToSI('2 m', 'angle');
    expect(!result.ok && result.message).toMatch(/not an angle/);
  });

  it('refuses magnitudes past 1e15 in SI', () => {
    expect(quantityToSI('1e300 Pa', 'stress').ok).toBe(false);
    expect(quantityToSI(-1e300, 'force').ok).toBe(true);
  });

  it('takes psi and ksi as exact pounds-force per square inch (NIST SP 811: 1 psi = 6894.757293168 Pa)', () => {
    const result = quantityToSI('1 psi', 'stress');
    expect(result.ok && result.value).toBeCloseTo(4.4482216152605 / 0.0254 ** 2, 9);
  });

  it('does not take a number as an output unit', () => {
    expect(unitFactorToSI('2 kN', 'force')).toBeUndefined();
    expect(unitFactorToSI('0 m', 'length')).toBeUndefined();
  });
});

describe('remembered unit strings', () => {
  it('answer the same the second time, for good and bad strings alike, and per kind', () => {
    expect(si('2.7 m', 'length')).toBe(2.7);
    expect(si('2.7 m', 'length')).toBe(2.7);
    expect(quantityToSI('2.7 m', 'force')).toEqual({ ok: false, message: '"2.7 m" is not a force (expected a unit like N)' });
    expect(quantityToSI('2.7 m', 'force')).toEqual(quantityToSI('2.7 m', 'force'));
    expect(unitFactorToSI('kN', 'force')).toBe(1000);
    expect(unitFactorToSI('kN', 'length')).toBeUndefined();
    expect(unitFactorToSI('kN', 'length')).toBeUndefined();
  });

  it('stay right past the bound, when the memory starts afresh', () => {
    // mathjs converts mm to m within a few ulps.
    for (let i = 0; i < 5000; i++) expect(Math.abs(si(`${i} mm`, 'length') - i / 1000)).toBeLessThanOrEqual(4e-15 * Math.max(1, i / 1000));
    expect(si('0 mm', 'length')).toBe(0);
    expect(si('4999 mm', 'length')).toBeCloseTo(4.999, 14);
  });
});
