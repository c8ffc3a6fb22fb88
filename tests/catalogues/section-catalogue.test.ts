import { describe, expect, it } from 'vitest';
import type { SectionEntry } from '../../src/catalogues/section-entry.js';
import { EMBEDDED_SECTIONS_NAME, embeddedSectionCatalogue, embeddedSections } from '../../src/catalogues/embedded-sections.js';
import { DuplicateDesignationError, SectionCatalogue } from '../../src/catalogues/section-catalogue.js';
import { PIPES } from '../../src/catalogues/sections/asme-b36-pipe.js';
import { W_SHAPES } from '../../src/catalogues/sections/astm-a6-w.js';
import { CHS_SECTIONS } from '../../src/catalogues/sections/en-10219-chs.js';
import { RHS_SECTIONS } from '../../src/catalogues/sections/en-10219-rhs.js';
import { SHS_SECTIONS } from '../../src/catalogues/sections/en-10219-shs.js';
import { HEA_SECTIONS } from '../../src/catalogues/sections/en-10365-hea.js';
import { HEB_SECTIONS } from '../../src/catalogues/sections/en-10365-heb.js';
import { IPE_SECTIONS } from '../../src/catalogues/sections/en-10365-ipe.js';
import { FLAT_BARS, ROUND_BARS } from '../../src/catalogues/sections/metric-bars.js';

/** Invented demo stock of a fictional maker of steel shelving, Brightrack Storage Ltd. */
const COMPANY_FILE = 'brightrack-sections.json';
function companySection(designation: string, massPerLength: number, depth?: number): SectionEntry {
  return {
    designation,
    family: 'BRIGHTRACK',
    standard: 'Brightrack Storage Ltd stock list (invented demo data)',
    dimensions: {
      shape: 'custom',
      area: massPerLength / 7850,
      secondMomentZ: 2e-7,
      secondMomentY: 5e-8,
      torsionConstant: 1e-9,
      ...(depth === undefined ? {} : { depth, width: depth / 2 }),
    },
    massPerLength,
    tabulated: {},
    source: 'invented demo data',
  };
}

const catalogue = embeddedSectionCatalogue();
const designationsOf = (entries: readonly SectionEntry[]): string[] => entries.map((entry) => entry.designation);

describe('the embedded section catalogue', () => {
  it('holds every embedded family without a duplicate', () => {
    expect(catalogue.size).toBe(embeddedSections().length);
    expect(catalogue.families()).toEqual([
      { family: 'CHS', count: CHS_SECTIONS.length },
      { family: 'FLAT', count: FLAT_BARS.length },
      { family: 'HEA', count: HEA_SECTIONS.length },
      { family: 'HEB', count: HEB_SECTIONS.length },
      { family: 'IPE', count: IPE_SECTIONS.length },
      { family: 'PIPE', count: PIPES.length },
      { family: 'RHS', count: RHS_SECTIONS.length },
      { family: 'ROUND', count: ROUND_BARS.length },
      { family: 'SHS', count: SHS_SECTIONS.length },
      { family: 'W', count: W_SHAPES.length },
    ]);
  });
});

describe('find', () => {
  const spellings: readonly (readonly [string, string])[] = [
    ['IPE 200', 'IPE 200'],
    ['IPE200', 'IPE 200'],
    ['ipe 200', 'IPE 200'],
    ['IPE  200', 'IPE 200'],
    ['HE 200 A', 'HEA 200'],
    ['heb1000', 'HEB 1000'],
    ['W8X31', 'W8X31'],
    ['W 8 x 31', 'W8X31'],
    ['w8x31', 'W8X31'],
    ['NPS 2 SCH 40', 'NPS 2 SCH 40'],
    ['nps2 sch40', 'NPS 2 SCH 40'],
    ['NPS 1 1/2 SCH 80', 'NPS 1-1/2 SCH 80'],
    ['shs 100 × 100 × 5', 'SHS 100x100x5'],
    ['RHS 120X60X4', 'RHS 120x60x4'],
    ['CHS 60.3*3.2', 'CHS 60.3x3.2'],
    ['CHS 273x8', 'CHS 273.0x8.0'],
    ['rd 20', 'RD 20'],
    ['FL 100 x 10', 'FL 100x10'],
  ];
  for (const [typed, designation] of spellings) {
    it(`finds ${designation} from "${typed}"`, () => {
      expect(catalogue.find(typed)?.designation).toBe(designation);
    });
  }

  it('finds nothing for a size no catalogue has', () => {
    expect(catalogue.find('IPE 250')).toBeUndefined();
    expect(catalogue.find('')).toBeUndefined();
  });
});

describe('nearest', () => {
  it('ranks the same family by edit distance, then by nearness of the numbers', () => {
    // "IPE250" is one substitution from IPE 200, 220, 240, 270, 450 and 550; the numbers then rank
    // them: |250 - 240| / 250 = 0.04 < 20 / 270 < 30 / 250 < 50 / 250 < 200 / 450.
    expect(catalogue.nearest('IPE 250')).toEqual(['IPE 240', 'IPE 270', 'IPE 220', 'IPE 200', 'IPE 450']);
    expect(catalogue.nearest('ipe250', 2)).toEqual(['IPE 240', 'IPE 270']);
  });

  it('puts an exact match first', () => {
    expect(catalogue.nearest('W 8 x 31', 1)).toEqual(['W8X31']);
  });

  it('finds a transposed family name among all families', () => {
    // "IEP200" has no family of its own and is one transposition from "IPE200".
    expect(catalogue.nearest('IEP 200', 1)).toEqual(['IPE 200']);
    // "HEC200" is one substitution from both HEA200 and HEB200, equal numbers: by name.
    expect(catalogue.nearest('HEC 200', 2)).toEqual(['HEA 200', 'HEB 200']);
  });

  it('prefers the same family to a closer spelling in another', () => {
    // SHS 100x100x5 is one letter from "RHS100X100X5", yet every RHS comes first, led by
    // RHS 150x100x5, also one substitution away (0 -> 5).
    const ranked = catalogue.nearest('RHS 100x100x5');
    expect(ranked[0]).toBe('RHS 150x100x5');
    expect(ranked.every((designation) => designation.startsWith('RHS'))).toBe(true);
  });

  it('returns as many as asked, or all there are', () => {
    expect(catalogue.nearest('IPE 200', 0)).toEqual([]);
    expect(new SectionCatalogue([{ name: 'few', entries: IPE_SECTIONS.slice(0, 3) }]).nearest('IPE 200', 10)).toHaveLength(3);
    expect(() => catalogue.nearest('IPE 200', -1)).toThrow(RangeError);
    expect(() => catalogue.nearest('IPE 200', 1.5)).toThrow(RangeError);
  });
});

describe('list', () => {
  it('sorts by family, then mass per length', () => {
    const { items, total } = catalogue.list({ limit: catalogue.size });
    expect(total).toBe(catalogue.size);
    for (let i = 1; i < items.length; i += 1) {
      const before = items[i - 1] as SectionEntry;
      const after = items[i] as SectionEntry;
      const inOrder = before.family < after.family ||
        (before.family === after.family && before.massPerLength <= after.massPerLength);
      expect(inOrder, `${before.designation} before ${after.designation}`).toBe(true);
    }
  });

  it('filters by family, case-insensitively', () => {
    const page = catalogue.list({ family: 'ipe' });
    expect(page.total).toBe(18); // IPE 80 to IPE 600, EN 10365
    expect(page.items[0]?.designation).toBe('IPE 80');
    expect(catalogue.list({ family: 'NO SUCH FAMILY' }).total).toBe(0);
  });

  it('filters by overall depth, width and mass per length (bounds included)', () => {
    // IPE depth h is the number in the name: IPE 80 to IPE 200 are at most 0.2 m deep.
    expect(designationsOf(catalogue.list({ family: 'IPE', maxDepth: 0.2 }).items)).toEqual(
      ['IPE 80', 'IPE 100', 'IPE 120', 'IPE 140', 'IPE 160', 'IPE 180', 'IPE 200'],
    );
    // HEB 100 to HEB 200 have b = h, at most 200 mm; from HEB 220 on b > 0.2 m.
    expect(catalogue.list({ family: 'HEB', maxWidth: 0.2 }).total).toBe(6);
    // HEA masses (EN 10365): 16.7, 19.9, 24.7, then HEA 160 at 30.4 kg/m.
    expect(designationsOf(catalogue.list({ family: 'HEA', maxMassPerLength: 30 }).items)).toEqual(
      ['HEA 100', 'HEA 120', 'HEA 140'],
    );
    // Every filter at once: RHS at most 0.12 m deep, 0.06 m wide, 12 kg/m. RHS 100x50x5 and
    // RHS 120x60x4 both weigh 10.5 kg/m; equal masses go by normalised designation.
    expect(designationsOf(catalogue.list({ family: 'RHS', maxDepth: 0.12, maxWidth: 0.06, maxMassPerLength: 12 }).items)).toEqual(
      ['RHS 60x40x3', 'RHS 80x40x3', 'RHS 80x40x4', 'RHS 100x50x4', 'RHS 100x60x4', 'RHS 100x50x5', 'RHS 120x60x4'],
    );
  });

  it('pages through the matches', () => {
    const page = catalogue.list({ family: 'IPE', offset: 5, limit: 4 });
    // Skipping IPE 80, 100, 120, 140 and 160.
    expect(designationsOf(page.items)).toEqual(['IPE 180', 'IPE 200', 'IPE 220', 'IPE 240']);
    expect(page).toMatchObject({ total: 18, offset: 5, limit: 4 });
    expect(catalogue.list({ family: 'IPE', offset: 18 }).items).toEqual([]);
    expect(catalogue.list({ family: 'IPE', limit: 0 })).toMatchObject({ items: [], total: 18 });
    expect(catalogue.list()).toMatchObject({ offset: 0, limit: 50, total: catalogue.size });
    expect(catalogue.list().items).toHaveLength(50);
  });

  it('refuses paging and bounds that are not counts or sizes', () => {
    expect(() => catalogue.list({ offset: -1 })).toThrow(RangeError);
    expect(() => catalogue.list({ limit: 2.5 })).toThrow(RangeError);
    expect(() => catalogue.list({ maxDepth: Number.NaN })).toThrow(RangeError);
    expect(() => catalogue.list({ maxMassPerLength: -1 })).toThrow(RangeError);
  });

  it('leaves out a section of unknown size when a size bound is set', () => {
    const company = new SectionCatalogue([
      { name: COMPANY_FILE, entries: [companySection('BR 40 POST', 2.1), companySection('BR 60 BEAM', 3.4, 0.06)] },
    ]);
    expect(designationsOf(company.list().items)).toEqual(['BR 40 POST', 'BR 60 BEAM']);
    expect(designationsOf(company.list({ maxDepth: 1 }).items)).toEqual(['BR 60 BEAM']);
    expect(designationsOf(company.list({ maxWidth: 1 }).items)).toEqual(['BR 60 BEAM']);
    expect(designationsOf(company.list({ maxMassPerLength: 3 }).items)).toEqual(['BR 40 POST']);
  });
});

describe('company catalogues and duplicates', () => {
  it('adds a company file beside the embedded sections', () => {
    const withCompany = embeddedSectionCatalogue();
    withCompany.add([companySection('BR 40 POST', 2.1)], COMPANY_FILE);
    expect(withCompany.find('br40post')?.designation).toBe('BR 40 POST');
    expect(withCompany.size).toBe(catalogue.size + 1);
    expect(withCompany.families()).toContainEqual({ family: 'BRIGHTRACK', count: 1 });
  });

  it('refuses a company section that would replace an embedded one, naming the file and both entries', () => {
    const withCompany = embeddedSectionCatalogue();
    const attempt = (): void => withCompany.add([companySection('BR 40 POST', 2.1), companySection('HE 200 A', 42)], COMPANY_FILE);
    expect(attempt).toThrow(DuplicateDesignationError);
    expect(attempt).toThrow(
      `Section "HE 200 A" from ${COMPANY_FILE} duplicates "HEA 200" from ${EMBEDDED_SECTIONS_NAME} (both read as "HEA200")`,
    );
    // All or nothing: the file's first, valid entry was not added either.
    expect(withCompany.find('BR 40 POST')).toBeUndefined();
    expect(withCompany.find('HEA 200')?.standard).toBe('EN 10365:2017');
  });

  it('refuses a designation given twice in one file', () => {
    const fresh = new SectionCatalogue();
    expect(() => fresh.add([companySection('BR 40 POST', 2.1), companySection('br 40 post', 2.2)], COMPANY_FILE)).toThrow(
      `Section "br 40 post" from ${COMPANY_FILE} duplicates "BR 40 POST" from ${COMPANY_FILE}`,
    );
    expect(fresh.size).toBe(0);
  });

  it('refuses duplicates between the lists it is built from', () => {
    let caught: unknown;
    try {
      new SectionCatalogue([
        { name: 'first list', entries: IPE_SECTIONS },
        { name: 'second list', entries: [{ ...(IPE_SECTIONS[6] as SectionEntry), designation: 'ipe200' }] },
      ]);
    } catch (error) {
      caught = error;
    }
    expect(caught).toBeInstanceOf(DuplicateDesignationError);
    expect(caught).toMatchObject({
      designation: 'ipe200',
      sourceName: 'second list',
      existingDesignation: 'IPE 200',
      existingSourceName: 'first list',
      normalised: 'IPE200',
    });
  });
});
