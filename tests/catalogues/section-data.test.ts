/**
 * Sanity of the embedded European and metric-bar section tables, typed from memory: the geometry is
 * possible, the tabulated area and the mass follow from the dimensions, and the tabulated values agree
 * with each other. Only simple closed forms are used here, not the section-properties module.
 */

import { describe, expect, it } from 'vitest';
import type { SectionEntry } from '../../src/catalogues/section-entry.js';
import { designationNumbers, normaliseDesignation } from '../../src/catalogues/designation.js';
import { CHS_SECTIONS } from '../../src/catalogues/sections/en-10219-chs.js';
import { RHS_SECTIONS } from '../../src/catalogues/sections/en-10219-rhs.js';
import { SHS_SECTIONS } from '../../src/catalogues/sections/en-10219-shs.js';
import { HEA_SECTIONS } from '../../src/catalogues/sections/en-10365-hea.js';
import { HEB_SECTIONS } from '../../src/catalogues/sections/en-10365-heb.js';
import { IPE_SECTIONS } from '../../src/catalogues/sections/en-10365-ipe.js';
import { FLAT_BARS, ROUND_BARS } from '../../src/catalogues/sections/metric-bars.js';
import type {
  BoxDimensions,
  ISectionDimensions,
  SectionDimensions,
  TubeDimensions,
} from '../../src/engine/sections/dimensions.js';

const STEEL_DENSITY = 7850; // kg/m^3, the density EN 10365 and EN 10219-2 tabulate mass with
const TOLERANCE = 0.01; // 1 %: the tables print 3 to 4 significant figures

const FAMILIES: Readonly<Record<string, readonly SectionEntry[]>> = {
  IPE: IPE_SECTIONS,
  HEA: HEA_SECTIONS,
  HEB: HEB_SECTIONS,
  SHS: SHS_SECTIONS,
  RHS: RHS_SECTIONS,
  CHS: CHS_SECTIONS,
  ROUND: ROUND_BARS,
  FLAT: FLAT_BARS,
};
const ALL = Object.values(FAMILIES).flat();
const I_SECTIONS = [...IPE_SECTIONS, ...HEA_SECTIONS, ...HEB_SECTIONS];

const relativeGap = (value: number, reference: number): number => Math.abs(value - reference) / reference;
const mmOf = (metres: number): number => Math.round(metres * 1e4) / 10;

/** Rolled I section: flanges, web between them, four root fillets of area (1 - pi/4) r^2 each. */
function iSectionArea({ depth: h, flangeWidth: b, webThickness: tw, flangeThickness: tf, rootRadius: r }: ISectionDimensions): number {
  return 2 * b * tf + (h - 2 * tf) * tw + (4 - Math.PI) * r ** 2;
}

/** EN 10219-2 Annex B (as recalled): A = 2 t (B + H - 2 t) - (4 - pi)(ro^2 - ri^2), ri = ro - t. */
function boxArea({ depth: h, width: b, wallThickness: t, outerCornerRadius: ro = 0 }: BoxDimensions): number {
  const ri = Math.max(ro - t, 0);
  return 2 * t * (b + h - 2 * t) - (4 - Math.PI) * (ro ** 2 - ri ** 2);
}

/** Annulus: A = pi (D - t) t. */
function tubeArea({ outerDiameter: d, wallThickness: t }: TubeDimensions): number {
  return Math.PI * (d - t) * t;
}

function simpleArea(dimensions: SectionDimensions): number {
  switch (dimensions.shape) {
    case 'i-section':
      return iSectionArea(dimensions);
    case 'box':
      return boxArea(dimensions);
    case 'tube':
      return tubeArea(dimensions);
    case 'round':
      return (Math.PI * dimensions.diameter ** 2) / 4;
    case 'rectangle':
      return dimensions.width * dimensions.depth;
    default:
      throw new Error(`no simple area for ${dimensions.shape}`);
  }
}

function lengths(dimensions: SectionDimensions): number[] {
  return Object.values(dimensions).filter((value): value is number => typeof value === 'number');
}

describe('embedded European sections and metric bars', () => {
  it('holds the full EN 10365 ranges, IPE 80-600, HEA and HEB 100-1000', () => {
    const ipeSizes = [80, 100, 120, 140, 160, 180, 200, 220, 240, 270, 300, 330, 360, 400, 450, 500, 550, 600];
    const heSizes = [100, 120, 140, 160, 180, 200, 220, 240, 260, 280, 300, 320, 340, 360, 400, 450, 500, 550, 600,
      650, 700, 800, 900, 1000];
    expect(IPE_SECTIONS.map((entry) => entry.designation)).toEqual(ipeSizes.map((size) => `IPE ${size}`));
    expect(HEA_SECTIONS.map((entry) => entry.designation)).toEqual(heSizes.map((size) => `HEA ${size}`));
    expect(HEB_SECTIONS.map((entry) => entry.designation)).toEqual(heSizes.map((size) => `HEB ${size}`));
  });

  it('has no designation twice, even after normalisation', () => {
    const keys = ALL.map((entry) => normaliseDesignation(entry.designation));
    expect(new Set(keys).size).toBe(ALL.length);
  });

  for (const [family, entries] of Object.entries(FAMILIES)) {
    it(`${family}: family, standard and a from-memory source on every entry`, () => {
      for (const entry of entries) {
        expect(entry.family).toBe(family);
        expect(entry.standard.length).toBeGreaterThan(0);
        expect(entry.source).toMatch(/from memory/);
      }
    });
  }

  for (const entry of ALL) {
    describe(entry.designation, () => {
      it('has positive, finite dimensions and mass', () => {
        for (const length of lengths(entry.dimensions)) {
          expect(Number.isFinite(length) && length > 0).toBe(true);
        }
        expect(Number.isFinite(entry.massPerLength) && entry.massPerLength > 0).toBe(true);
      });

      it('tabulates a mass within 1 % of 7850 kg/m^3 times the area of its dimensions', () => {
        expect(relativeGap(entry.massPerLength, STEEL_DENSITY * simpleArea(entry.dimensions))).toBeLessThan(TOLERANCE);
      });

      if (entry.tabulated.area !== undefined) {
        const tabulatedArea = entry.tabulated.area;
        it('tabulates an area within 1 % of the area of its dimensions', () => {
          expect(relativeGap(tabulatedArea, simpleArea(entry.dimensions))).toBeLessThan(TOLERANCE);
        });
      }
    });
  }

  it('names each size by its dimensions', () => {
    // IPE and HEB carry the depth h in mm; HEA does not (HEA 200 is 190 mm deep). Hollow sections
    // and bars carry their sizes in mm in the order of their rows.
    for (const entry of [...IPE_SECTIONS, ...HEB_SECTIONS]) {
      const depth = (entry.dimensions as ISectionDimensions).depth;
      expect(designationNumbers(normaliseDesignation(entry.designation)), entry.designation).toEqual([mmOf(depth)]);
    }
    for (const entry of [...SHS_SECTIONS, ...RHS_SECTIONS, ...CHS_SECTIONS, ...ROUND_BARS, ...FLAT_BARS]) {
      const d = entry.dimensions;
      const sizes =
        d.shape === 'box' ? [d.depth, d.width, d.wallThickness]
          : d.shape === 'tube' ? [d.outerDiameter, d.wallThickness]
            : d.shape === 'round' ? [d.diameter]
              : d.shape === 'rectangle' ? [d.depth, d.width] : [];
      expect(designationNumbers(normaliseDesignation(entry.designation)), entry.designation).toEqual(sizes.map(mmOf));
    }
  });

  describe('I sections', () => {
    for (const entry of I_SECTIONS) {
      const d = entry.dimensions as ISectionDimensions;
      const t = entry.tabulated;
      it(`${entry.designation}: plausible geometry and tabulated values`, () => {
        expect(d.shape).toBe('i-section');
        expect(2 * d.flangeThickness).toBeLessThan(d.depth);
        expect(d.webThickness).toBeLessThan(d.flangeWidth);
        expect(d.webThickness + 2 * d.rootRadius).toBeLessThan(d.flangeWidth);
        const { secondMomentZ, secondMomentY, sectionModulusZ, sectionModulusY, plasticModulusZ, plasticModulusY } = t;
        if (secondMomentZ === undefined || secondMomentY === undefined) return;
        // The strong axis (our z, the table's y-y) carries the larger second moment.
        expect(secondMomentZ).toBeGreaterThan(secondMomentY);
        // Elastic moduli by definition: W = I / (h / 2) and I / (b / 2) for a doubly symmetric section.
        if (sectionModulusZ !== undefined) expect(relativeGap(sectionModulusZ, secondMomentZ / (d.depth / 2))).toBeLessThan(TOLERANCE);
        if (sectionModulusY !== undefined) expect(relativeGap(sectionModulusY, secondMomentY / (d.flangeWidth / 2))).toBeLessThan(TOLERANCE);
        // The plastic modulus exceeds the elastic one (shape factor above 1).
        if (plasticModulusZ !== undefined && sectionModulusZ !== undefined) expect(plasticModulusZ).toBeGreaterThan(sectionModulusZ);
        if (plasticModulusY !== undefined && sectionModulusY !== undefined) expect(plasticModulusY).toBeGreaterThan(sectionModulusY);
      });

      if (t.warpingConstant !== undefined) {
        const warpingConstant = t.warpingConstant;
        it(`${entry.designation}: warping constant within 1 % of tf b^3 (h - tf)^2 / 24`, () => {
          // Thin-walled doubly symmetric I: Iw = If (h - tf)^2 / 2 with If = tf b^3 / 12 per flange
          // (Timoshenko & Gere, Theory of Elastic Stability, 2nd ed., sec. 5.2).
          const expected = (d.flangeThickness * d.flangeWidth ** 3 * (d.depth - d.flangeThickness) ** 2) / 24;
          expect(relativeGap(warpingConstant, expected)).toBeLessThan(TOLERANCE);
        });
      }
    }
  });

  describe('hollow sections', () => {
    for (const entry of [...SHS_SECTIONS, ...RHS_SECTIONS]) {
      const d = entry.dimensions as BoxDimensions;
      it(`${entry.designation}: plausible geometry and second moments`, () => {
        expect(d.shape).toBe('box');
        expect(2 * d.wallThickness).toBeLessThan(Math.min(d.depth, d.width));
        // EN 10219-2 corner radius for t up to 6 mm is 2 t, for 6 to 10 mm 2.5 t (as recalled).
        expect(d.outerCornerRadius).toBeCloseTo((d.wallThickness <= 0.006 ? 2 : 2.5) * d.wallThickness, 12);
        const { secondMomentZ, secondMomentY } = entry.tabulated;
        if (secondMomentZ === undefined || secondMomentY === undefined) return;
        if (entry.family === 'SHS') expect(secondMomentZ).toBe(secondMomentY);
        else expect(secondMomentZ).toBeGreaterThan(secondMomentY);
      });
    }

    for (const entry of CHS_SECTIONS) {
      it(`${entry.designation}: torsion constant twice the second moment`, () => {
        // A thin or thick annulus: J = 2 I exactly (polar moment of a circle).
        const { secondMomentZ, torsionConstant } = entry.tabulated;
        expect(secondMomentZ).toBeDefined();
        expect(relativeGap(torsionConstant ?? 0, 2 * (secondMomentZ ?? 0))).toBeLessThan(TOLERANCE);
      });
    }
  });
});
