import { describe, expect, it } from 'vitest';
import { present, resolveOutputUnits, SI_OUTPUT, textInUnits, US_OUTPUT } from '../../src/api/output-units.js';
import { ProblemError } from '../../src/api/problems.js';

describe('resolveOutputUnits', () => {
  it('defaults to SI', () => {
    expect(resolveOutputUnits(undefined, [])).toBe(SI_OUTPUT);
    expect(SI_OUTPUT.names.moment).toBe('N*m');
    expect(present(SI_OUTPUT, 'force', 1500)).toBe(1500);
  });

  it('presents US customary values (NIST SP 811: 1 kip = 4448.2216152605 N, 1 ft = 0.3048 m)', () => {
    expect(resolveOutputUnits('US', [])).toBe(US_OUTPUT);
    expect(present(US_OUTPUT, 'force', 4448.2216152605)).toBeCloseTo(1, 12);
    expect(present(US_OUTPUT, 'moment', 4448.2216152605 * 0.3048)).toBeCloseTo(1, 12);
    expect(present(US_OUTPUT, 'length', 0.0254)).toBeCloseTo(1, 12);
  });

  it('takes a unit per kind and leaves the rest SI', () => {
    const units = resolveOutputUnits({ length: 'mm', stress: 'MPa' }, ['output', 'units']);
    expect(units.names.length).toBe('mm');
    expect(units.names.force).toBe('N');
    expect(present(units, 'length', 0.25)).toBeCloseTo(250, 12);
    expect(present(units, 'stress', 355e6)).toBeCloseTo(355, 9);
  });

  it('names every bad unit by its pointer', () => {
    try {
      resolveOutputUnits({ length: 'kN', force: 'parsec' }, ['output', 'units']);
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(ProblemError);
      expect((error as ProblemError).errors.map((e) => e.pointer)).toEqual(['/output/units/length', '/output/units/force']);
    }
  });

  it('never presents negative zero', () => {
    expect(Object.is(present(SI_OUTPUT, 'force', -0), 0)).toBe(true);
  });
});

describe('deflection units', () => {
  it('follow the length unit unless given their own', () => {
    expect(resolveOutputUnits({ length: 'mm' }, []).names.deflection).toBe('mm');
    expect(resolveOutputUnits({ length: 'm', deflection: 'mm' }, []).names.deflection).toBe('mm');
  });
});

describe('section property units', () => {
  it('follow a plain length unit as its powers unless given their own', () => {
    const units = resolveOutputUnits({ length: 'mm', secondMoment: 'cm^4' }, []);
    expect(units.names.area).toBe('mm^2');
    expect(units.names.sectionModulus).toBe('mm^3');
    expect(units.names.secondMoment).toBe('cm^4');
    expect(present(units, 'area', 28.5e-4)).toBeCloseTo(2850, 9);
    expect(present(units, 'warpingConstant', 12.99e-9)).toBeCloseTo(12.99e9, 0);
  });
});

describe('textInUnits', () => {
  it('writes the lengths of an engine text in the presented length unit, and leaves SI texts as they are', () => {
    const millimetres = resolveOutputUnits({ length: 'mm' }, ['output', 'units']);
    expect(textInUnits(millimetres, 'span 0 m to 3.6 m, deflection along y')).toBe('span 0 mm to 3600 mm, deflection along y');
    expect(textInUnits(millimetres, 'pin at support 1, plate 0.03 m thick')).toBe('pin at support 1, plate 30 mm thick');
    // 2.7 m / 0.0254 m = 106.2992... in, six significant digits as the engine writes its own.
    expect(textInUnits(US_OUTPUT, 'unbraced length 0 m to 2.7 m')).toBe('unbraced length 0 in to 106.299 in');
    const text = 'overhang 0 m to 1.2 m';
    expect(textInUnits(SI_OUTPUT, text)).toBe(text);
    // Only numbers followed by the unit m are lengths: words and other units stay.
    expect(textInUnits(millimetres, 'bottom fibre (tension side), 2 mm of web')).toBe('bottom fibre (tension side), 2 mm of web');
  });
});

describe('derived units', () => {
  it('follow the base units named: mm and kN give kN/mm, mm^-3 and kN*m/mm, each factor read back by mathjs', () => {
    const units = resolveOutputUnits({ length: 'mm', force: 'kN', moment: 'kN*m' }, []);
    expect(units.names).toMatchObject({
      forcePerLength: 'kN/mm', translationalStiffness: 'kN/mm', momentPerLength: 'kN*m/mm', rotationalStiffness: 'kN*m/rad',
      torsionalShearPerTorque: 'mm^-3', area: 'mm^2', warpingConstant: 'mm^6', stress: 'Pa', density: 'kg/m^3', massPerLength: 'kg/m',
    });
    // 2,200 N/m is 0.0022 kN/mm; 20 kN/mm is 2e7 N/m; 1,000 m^-3 is 1e-6 mm^-3.
    expect(present(units, 'forcePerLength', 2200)).toBeCloseTo(0.0022, 15);
    expect(present(units, 'translationalStiffness', 2e7)).toBeCloseTo(20, 12);
    expect(present(units, 'momentPerLength', 500)).toBeCloseTo(0.0005, 15);
    expect(present(units, 'rotationalStiffness', 5e4)).toBeCloseTo(50, 12);
    expect(present(units, 'torsionalShearPerTorque', 1000)).toBeCloseTo(1e-6, 18);
  });

  it('give the SI units back when only SI base units are in play', () => {
    const units = resolveOutputUnits({ stress: 'MPa' }, []);
    for (const kind of ['forcePerLength', 'translationalStiffness', 'momentPerLength', 'rotationalStiffness', 'torsionalShearPerTorque', 'area', 'secondMoment'] as const) {
      expect(units.names[kind]).toBe(SI_OUTPUT.names[kind]);
      expect(units.factors[kind]).toBe(1);
    }
  });

  it('yield to a unit the request names, and to the US customary table', () => {
    const units = resolveOutputUnits({ length: 'mm', force: 'kN', forcePerLength: 'kN/m' }, []);
    expect(units.names.forcePerLength).toBe('kN/m');
    expect(units.names.translationalStiffness).toBe('kN/mm');
    expect(present(units, 'forcePerLength', 2200)).toBeCloseTo(2.2, 12);
    expect(US_OUTPUT.names.forcePerLength).toBe('kip/ft');
    // 1 kip/ft = 4448.2216152605 N / 0.3048 m.
    expect(present(US_OUTPUT, 'forcePerLength', 4448.2216152605 / 0.3048)).toBeCloseTo(1, 12);
  });

  it('are made from whatever base units are named, and read back by mathjs', () => {
    const units = resolveOutputUnits({ length: 'cm', force: 'lbf', moment: 'lbf*in' }, []);
    expect(units.names.forcePerLength).toBe('lbf/cm');
    expect(units.names.momentPerLength).toBe('lbf*in/cm');
    const feetAndInches = resolveOutputUnits({ length: 'ft', force: 'kip' }, []);
    expect(feetAndInches.names.translationalStiffness).toBe('kip/ft');
    // 1 kip/ft in N/m.
    expect(feetAndInches.factors.translationalStiffness).toBeCloseTo(4448.2216152605 / 0.3048, 9);
  });
});
