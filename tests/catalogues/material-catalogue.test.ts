/**
 * The material registry over the embedded catalogue: lookup in any spelling, suggestions, duplicates,
 * thickness bands, and the values of the grades (all typed from memory of their standards).
 */

import { describe, expect, it } from 'vitest';
import { EngineError } from '../../src/engine/engine-error.js';
import { DISTORTION_ENERGY_SHEAR_RATIO } from '../../src/engine/materials/material.js';
import { DuplicateGradeError, MaterialCatalogue, normaliseGrade } from '../../src/catalogues/material-catalogue.js';
import type { MaterialEntry } from '../../src/catalogues/material-entry.js';
import {
  EMBEDDED_MATERIALS_NAME,
  embeddedMaterialCatalogue,
  embeddedMaterials,
} from '../../src/catalogues/embedded-materials.js';

const catalogue = embeddedMaterialCatalogue();

function grade(name: string): MaterialEntry {
  const entry = catalogue.find(name);
  if (entry === undefined) throw new Error(`no grade ${name}`);
  return entry;
}

/** 1 ksi = 1000 lbf/in^2 = 1000 x 0.45359237 x 9.80665 N / 0.0254^2 m^2 = 6.894757293168361 MPa. */
const PA_PER_KSI = 6.894757293168361e6;

function thrown(action: () => unknown): unknown {
  try {
    action();
  } catch (error) {
    return error;
  }
  throw new Error('expected an error');
}

describe('normaliseGrade', () => {
  it.each([
    ['EN 10025-2 S 355', 's355'],
    ['ASTM A992', 'a992'],
    ['AISI 304', '304'],
    ['EN AW-6061-T6', '6061t6'],
    ['1.4301', '14301'],
    ['A500 Gr B (round)', 'a500grbround'],
  ])('%s -> %s', (spelling, key) => {
    expect(normaliseGrade(spelling)).toBe(key);
  });

  it('keeps a bare standard name rather than leaving nothing', () => {
    expect(normaliseGrade('ASTM')).toBe('astm');
  });
});

describe('MaterialCatalogue.find', () => {
  it.each([
    ['S355', 'S355'],
    ['s355', 'S355'],
    ['S 355', 'S355'],
    ['S-355', 'S355'],
    ['EN 10025-2 S355', 'S355'],
    ['EN10025-2 S355', 'S355'],
    ['S355J2', 'S355'],
    ['S355 K2', 'S355'],
    ['1.0577', 'S355'],
    ['s235jr', 'S235'],
    ['EN 10025-2 S275', 'S275'],
    ['a992', 'A992'],
    ['ASTM A992', 'A992'],
    ['A 36', 'A36'],
    ['ASTM A572 Gr 50', 'A572 Gr 50'],
    ['A572-50', 'A572 Gr 50'],
    ['A500 Gr B', 'A500 Gr B (round)'],
    ['a500 gr b (rectangular)', 'A500 Gr B (shaped)'],
    ['ASTM A500 Grade C', 'A500 Gr C (round)'],
    ['A500 Gr C (square)', 'A500 Gr C (shaped)'],
    ['6061-t6', 'EN AW-6061-T6'],
    ['EN AW-6061-T6', 'EN AW-6061-T6'],
    ['en aw 6063 t6', 'EN AW-6063-T6'],
    ['AW-6082-T6', 'EN AW-6082-T6'],
    ['EN AW-AlSi1MgMn-T6', 'EN AW-6082-T6'],
    ['AISI 1018 CD', 'AISI 1018 CD'],
    ['1018 cold drawn', 'AISI 1018 CD'],
    ['SAE 1045 CD', 'AISI 1045 CD'],
    ['AISI 304', 'AISI 304'],
    ['304', 'AISI 304'],
    ['1.4301', 'AISI 304'],
    ['X5CrNi18-10', 'AISI 304'],
    ['UNS S31600', 'AISI 316'],
    ['316', 'AISI 316'],
    ['1.4401', 'AISI 316'],
    ['ASTM A48 Class 30', 'ASTM A48 Class 30'],
    ['a48 class 30', 'ASTM A48 Class 30'],
    ['Class 30 gray iron', 'ASTM A48 Class 30'],
  ])('%s -> %s', (spelling, expected) => {
    expect(catalogue.find(spelling)?.grade).toBe(expected);
  });

  it.each(['S460', 'A514', '7075-T6', '1018', '', 'EN'])('finds nothing for %j', (spelling) => {
    expect(catalogue.find(spelling)).toBeUndefined();
  });
});

describe('MaterialCatalogue.nearest', () => {
  it('ranks the grade one edit away first', () => {
    expect(catalogue.nearest('S356', 1)).toEqual(['S355']);
    expect(catalogue.nearest('A929', 1)).toEqual(['A992']);
  });

  it('puts every grade that extends the spelling before the rest', () => {
    expect(new Set(catalogue.nearest('A500', 4))).toEqual(
      new Set(['A500 Gr B (round)', 'A500 Gr B (shaped)', 'A500 Gr C (round)', 'A500 Gr C (shaped)']),
    );
  });

  it('returns as many as asked, without repeats, and refuses a negative count', () => {
    expect(catalogue.nearest('S355', 0)).toEqual([]);
    const all = catalogue.nearest('x', 100);
    expect(all).toHaveLength(catalogue.size);
    expect(new Set(all).size).toBe(all.length);
    expect(() => catalogue.nearest('S355', -1)).toThrow(RangeError);
  });
});

describe('MaterialCatalogue.list and embeddedMaterials', () => {
  it('lists every embedded entry in order', () => {
    // 3 EN 10025-2 + 7 ASTM + 3 aluminium + 2 AISI carbon + 2 stainless + 1 cast iron.
    expect(embeddedMaterials()).toHaveLength(18);
    expect(catalogue.list().map((entry) => entry.grade)).toEqual(embeddedMaterials().map((entry) => entry.grade));
    expect(catalogue.size).toBe(18);
  });
});

describe('MaterialCatalogue.add', () => {
  const s355 = grade('S355');

  it('refuses a grade already held, naming both entries and both sources', () => {
    const fresh = embeddedMaterialCatalogue();
    const error = thrown(() => fresh.add([{ ...s355, grade: 'S 355', aliases: [] }], 'acme-steels.json'));
    expect(error).toBeInstanceOf(DuplicateGradeError);
    const message = (error as Error).message;
    expect(message).toContain('"S 355"');
    expect(message).toContain('acme-steels.json');
    expect(message).toContain('grade S355');
    expect(message).toContain(EMBEDDED_MATERIALS_NAME);
  });

  it('refuses an alias that clashes with a held alias', () => {
    const fresh = embeddedMaterialCatalogue();
    const error = thrown(() => fresh.add([{ ...s355, grade: 'ACME-HS', aliases: ['1.4301'] }], 'acme-steels.json'));
    expect(error).toBeInstanceOf(DuplicateGradeError);
    expect((error as Error).message).toContain('AISI 304');
  });

  it('refuses a list that holds a grade twice, and adds nothing of it', () => {
    const fresh = embeddedMaterialCatalogue();
    const first = { ...s355, grade: 'ACME-1', aliases: [] };
    const second = { ...s355, grade: 'acme 1', aliases: [] };
    expect(() => fresh.add([first, second], 'acme-steels.json')).toThrow(DuplicateGradeError);
    expect(fresh.find('ACME-1')).toBeUndefined();
    expect(fresh.size).toBe(18);
  });

  it('adds a new grade with its aliases', () => {
    const fresh = embeddedMaterialCatalogue();
    fresh.add([{ ...s355, grade: 'ACME-HS', aliases: ['Acme high strength'] }], 'acme-steels.json');
    expect(fresh.find('acme hs')?.grade).toBe('ACME-HS');
    expect(fresh.find('ACME HIGH-STRENGTH')?.grade).toBe('ACME-HS');
    expect(fresh.size).toBe(19);
  });

  it('refuses thickness bands that do not rise', () => {
    const fresh = new MaterialCatalogue();
    const bands = [
      { maxThickness: 0.04, yieldStrength: 345e6, ultimateStrength: 470e6 },
      { maxThickness: 0.016, yieldStrength: 355e6, ultimateStrength: 470e6 },
    ];
    expect(() => fresh.add([{ ...s355, thicknessBands: bands }], 'acme-steels.json')).toThrow(/rise strictly/);
  });
});

describe('MaterialCatalogue.forThickness', () => {
  const s355 = grade('S355');

  // EN 10025-2 Table 7 (values from memory): ReH 355 (t <= 16), 345 (16 < t <= 40), 335 (40 < t <= 63),
  // 325 (<= 80), 315 (<= 100), 295 (<= 150), 285 (<= 200), 275 (<= 250) MPa; Rm 510 (t < 3), 470 (3 <= t
  // <= 100), 450 (100 < t <= 250) MPa.
  it.each([
    [0.002, 355, 510],
    [0.003, 355, 470],
    [0.01, 355, 470],
    [0.016, 355, 470],
    [0.02, 345, 470],
    [0.04, 345, 470],
    [0.05, 335, 470],
    [0.07, 325, 470],
    [0.1, 315, 470],
    [0.12, 295, 450],
    [0.25, 275, 450],
  ])('S355 at t = %f m: ReH %i MPa, Rm %i MPa', (thickness, yieldMpa, tensileMpa) => {
    const material = catalogue.forThickness(s355, thickness);
    expect(material.yieldStrength).toBe(yieldMpa * 1e6);
    expect(material.compressiveYieldStrength).toBe(yieldMpa * 1e6);
    expect(material.ultimateStrength).toBe(tensileMpa * 1e6);
    expect(material.compressiveUltimateStrength).toBe(tensileMpa * 1e6);
    expect(material.source).toContain('EN 10025-2');
  });

  it('S235 and S275 bands: ReH 225 and 265 MPa at 20 mm, 215 and 255 MPa at 50 mm (Table 7)', () => {
    expect(catalogue.forThickness(grade('S235'), 0.02).yieldStrength).toBe(225e6);
    expect(catalogue.forThickness(grade('S275'), 0.02).yieldStrength).toBe(265e6);
    expect(catalogue.forThickness(grade('S235'), 0.05).yieldStrength).toBe(215e6);
    expect(catalogue.forThickness(grade('S275'), 0.05).yieldStrength).toBe(255e6);
  });

  it('returns a plain Material: no aliases or bands, the entry itself untouched', () => {
    const material = catalogue.forThickness(s355, 0.02);
    expect(material).not.toHaveProperty('aliases');
    expect(material).not.toHaveProperty('thicknessBands');
    expect(material.source).toContain('t = 20 mm');
    expect(s355.yieldStrength).toBe(355e6);
  });

  it('refuses a thickness beyond the last band, naming it and the standard range', () => {
    const error = thrown(() => catalogue.forThickness(s355, 0.3));
    expect(error).toBeInstanceOf(EngineError);
    expect((error as EngineError).kind).toBe('not-applicable');
    expect((error as EngineError).message).toContain('300 mm');
    expect((error as EngineError).message).toContain('250 mm');
  });

  it.each([0, -0.01, Number.NaN, Number.POSITIVE_INFINITY])('refuses thickness %f as impossible geometry', (thickness) => {
    const error = thrown(() => catalogue.forThickness(s355, thickness));
    expect(error).toBeInstanceOf(EngineError);
    expect((error as EngineError).kind).toBe('impossible-geometry');
  });

  it('applies aluminium bands: 6082-T6 fo 250 / fu 290 MPa up to 5 mm, 260 / 310 MPa up to 15 mm', () => {
    // EN 1999-1-1 Table 3.2b, 6082 T6 extruded profiles (values from memory).
    const alloy = grade('6082-T6');
    expect(catalogue.forThickness(alloy, 0.004).yieldStrength).toBe(250e6);
    expect(catalogue.forThickness(alloy, 0.004).ultimateStrength).toBe(290e6);
    expect(catalogue.forThickness(alloy, 0.01).yieldStrength).toBe(260e6);
    expect(catalogue.forThickness(alloy, 0.01).ultimateStrength).toBe(310e6);
    expect(() => catalogue.forThickness(alloy, 0.02)).toThrow(EngineError);
    // 6063 T6: 170 / 215 MPa up to 10 mm, 160 / 195 MPa up to 25 mm.
    expect(catalogue.forThickness(grade('6063-T6'), 0.012).yieldStrength).toBe(160e6);
    expect(catalogue.forThickness(grade('6063-T6'), 0.012).ultimateStrength).toBe(195e6);
  });

  it('keeps an entry without bands at any thickness, compression as the entry gives it', () => {
    const iron = grade('ASTM A48 Class 30');
    const material = catalogue.forThickness(iron, 0.5);
    expect(material.compressiveYieldStrength).toBe(iron.compressiveYieldStrength);
    expect(material.yieldStrength).toBe(iron.yieldStrength);
  });

  it('scales compression with the band in the entry\'s own ratio', () => {
    const asymmetric: MaterialEntry = {
      ...s355,
      grade: 'ACME-ASYM',
      aliases: [],
      compressiveYieldStrength: 2 * s355.yieldStrength,
    };
    const material = new MaterialCatalogue([asymmetric], 'acme').forThickness(asymmetric, 0.02);
    // Band 16 < t <= 40 mm: 345 MPa in tension, twice that in compression.
    expect(material.compressiveYieldStrength).toBeCloseTo(690e6, 3);
  });
});

describe('the grades (values from memory, each naming its source)', () => {
  it('A992 in SI: Fy 50 ksi = 344.74 MPa, Fu 65 ksi = 448.16 MPa, E 29,000 ksi = 199.95 GPa', () => {
    const a992 = grade('A992');
    expect(a992.yieldStrength).toBeCloseTo(50 * PA_PER_KSI, 3);
    expect(a992.yieldStrength / 1e6).toBeCloseTo(344.7379, 4);
    expect(a992.ultimateStrength / 1e6).toBeCloseTo(448.1592, 4);
    expect(a992.elasticModulus / 1e9).toBeCloseTo(199.948, 3);
    // G = 11,200 ksi = 77.2213 GPa; density 490 lb/ft^3 = 490 x 0.45359237 / 0.3048^3 = 7849.05 kg/m^3.
    expect(a992.shearModulus / 1e9).toBeCloseTo(77.2213, 4);
    expect(a992.density).toBeCloseTo(7849.05, 2);
    expect(a992.poissonRatio).toBe(0.3);
    expect(a992.behaviour).toBe('ductile');
  });

  it('A36 36/58 ksi; A500 Gr B round 42 / shaped 46 ksi, Gr C round 46 / shaped 50 ksi', () => {
    expect(grade('A36').yieldStrength).toBeCloseTo(36 * PA_PER_KSI, 3);
    expect(grade('A36').ultimateStrength).toBeCloseTo(58 * PA_PER_KSI, 3);
    expect(grade('A500 Gr B (round)').yieldStrength).toBeCloseTo(42 * PA_PER_KSI, 3);
    expect(grade('A500 Gr B (shaped)').yieldStrength).toBeCloseTo(46 * PA_PER_KSI, 3);
    expect(grade('A500 Gr C (round)').yieldStrength).toBeCloseTo(46 * PA_PER_KSI, 3);
    expect(grade('A500 Gr C (shaped)').yieldStrength).toBeCloseTo(50 * PA_PER_KSI, 3);
    expect(grade('A500 Gr C (shaped)').ultimateStrength).toBeCloseTo(62 * PA_PER_KSI, 3);
  });

  it('EN 10025-2 grades carry EN 1993-1-1 3.2.6 elastic constants and nominal strengths', () => {
    for (const name of ['S235', 'S275', 'S355']) {
      const steel = grade(name);
      expect(steel.elasticModulus).toBe(210e9);
      expect(steel.shearModulus).toBe(81e9);
      expect(steel.poissonRatio).toBe(0.3);
      expect(steel.density).toBe(7850);
      // The nominal yield is the number in the name.
      expect(steel.yieldStrength).toBe(Number(name.slice(1)) * 1e6);
    }
  });

  it('AISI 1018 CD Sy 370 / Sut 440 MPa, 1045 CD 530 / 630 MPa (Shigley 10th ed. Table A-20)', () => {
    expect(grade('AISI 1018 CD').yieldStrength).toBe(370e6);
    expect(grade('AISI 1018 CD').ultimateStrength).toBe(440e6);
    expect(grade('AISI 1045 CD').yieldStrength).toBe(530e6);
    expect(grade('AISI 1045 CD').ultimateStrength).toBe(630e6);
    expect(grade('AISI 1045 CD').elasticModulus).toBe(207e9);
    expect(grade('AISI 1045 CD').shearModulus).toBe(79.3e9);
  });

  it('AISI 304 and 316 annealed: 205 / 515 MPa, E 193 GPa, nu 0.29, 8000 kg/m^3', () => {
    for (const name of ['304', '316']) {
      const steel = grade(name);
      expect(steel.yieldStrength).toBe(205e6);
      expect(steel.ultimateStrength).toBe(515e6);
      expect(steel.elasticModulus).toBe(193e9);
      expect(steel.poissonRatio).toBe(0.29);
      expect(steel.density).toBe(8000);
      // G = 193 / (2 x 1.29) = 74.806 GPa.
      expect(steel.shearModulus / 1e9).toBeCloseTo(74.806, 3);
    }
  });

  it('grey cast iron is brittle: yield = tensile ultimate 31 ksi, compressive = compressive ultimate 109 ksi', () => {
    const iron = grade('ASTM A48 Class 30');
    expect(iron.behaviour).toBe('brittle');
    expect(iron.ultimateStrength).toBeCloseTo(31 * PA_PER_KSI, 3);
    expect(iron.yieldStrength).toBe(iron.ultimateStrength);
    expect(iron.compressiveUltimateStrength).toBeCloseTo(109 * PA_PER_KSI, 3);
    expect(iron.compressiveYieldStrength).toBe(iron.compressiveUltimateStrength);
    expect(iron.compressiveUltimateStrength).toBeGreaterThan(3 * iron.ultimateStrength);
    // nu = E / (2 G) - 1 = 13.0 / (2 x 5.2) - 1 = 0.25.
    expect(iron.poissonRatio).toBeCloseTo(0.25, 12);
    expect(iron.shearYieldRatio).toBe(1);
    expect(iron.thicknessBands).toEqual([]);
  });

  it.each(embeddedMaterials().map((entry) => [entry.grade, entry] as const))(
    '%s: finite positive values, a source said to be from memory, consistent elastic constants',
    (_name, entry) => {
      for (const value of [
        entry.elasticModulus,
        entry.shearModulus,
        entry.poissonRatio,
        entry.yieldStrength,
        entry.compressiveYieldStrength,
        entry.ultimateStrength,
        entry.compressiveUltimateStrength,
        entry.shearYieldRatio,
        entry.density,
      ]) {
        expect(Number.isFinite(value) && value > 0).toBe(true);
      }
      expect(entry.source).toContain('from memory');
      expect(entry.ultimateStrength).toBeGreaterThanOrEqual(entry.yieldStrength);
      // Isotropic elasticity G = E / (2 (1 + nu)); the handbooks round E, G and nu separately, which
      // leaves up to 1 % (Shigley Table A-5 carbon steel: 207 / 2.584 = 80.1 against G = 79.3 GPa).
      const isotropicShear = entry.elasticModulus / (2 * (1 + entry.poissonRatio));
      expect(Math.abs(entry.shearModulus / isotropicShear - 1)).toBeLessThan(0.015);
      if (entry.behaviour === 'ductile') {
        // Common practice for ductile metals: the same strengths in compression and by von Mises in shear.
        expect(entry.compressiveYieldStrength).toBe(entry.yieldStrength);
        expect(entry.compressiveUltimateStrength).toBe(entry.ultimateStrength);
        expect(entry.shearYieldRatio).toBe(DISTORTION_ENERGY_SHEAR_RATIO);
      }
      let previous = 0;
      for (const band of entry.thicknessBands) {
        expect(band.maxThickness).toBeGreaterThan(previous);
        expect(band.ultimateStrength).toBeGreaterThanOrEqual(band.yieldStrength);
        previous = band.maxThickness;
      }
    },
  );

  it('EN 10025-2 yield never rises with thickness', () => {
    for (const name of ['S235', 'S275', 'S355']) {
      const yields = grade(name).thicknessBands.map((band) => band.yieldStrength);
      for (let i = 1; i < yields.length; i += 1) expect(yields[i]).toBeLessThanOrEqual(yields[i - 1] ?? 0);
    }
  });
});
