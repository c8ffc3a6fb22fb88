import { describe, expect, it } from 'vitest';
import { designationNumbers, designationPrefix, normaliseDesignation } from '../../src/catalogues/designation.js';

describe('normaliseDesignation', () => {
  // Each group: spellings a user may type for one section; all must read as the first one's key.
  const sameSection: readonly (readonly string[])[] = [
    ['IPE 200', 'IPE200', 'ipe 200', 'IPE  200', ' IPE 200 ', 'Ipe\t200', 'IPE-200'],
    ['HEA 200', 'hea200', 'HE 200 A', 'he200a', 'HE-200-A'],
    ['HEB 1000', 'HE 1000 B', 'heb1000'],
    ['W8X31', 'W 8 x 31', 'w8x31', 'W8x31', 'W 8 X 31', 'W8*31', 'W 8 × 31'],
    ['NPS 2 SCH 40', 'nps2 sch40', 'NPS2SCH40', 'nps 2 sch 40'],
    ['NPS 1-1/2 SCH 80', 'NPS 1 1/2 SCH 80', 'nps 1 - 1/2 sch80', 'NPS1-1/2SCH80'],
    ['SHS 100x100x5', 'SHS 100X100X5', 'shs 100 x 100 x 5', 'SHS 100×100×5', 'SHS 100*100*5', 'SHS 100x100x5.0'],
    ['RHS 120x60x4', 'rhs120x60x4', 'RHS 120 × 60 × 4'],
    ['CHS 60.3x3.2', 'chs 60.3 x 3.2', 'CHS 60,3x3,2', 'CHS 60.30x3.20'],
    ['CHS 273.0x8.0', 'CHS 273x8', 'chs 273 x 8.0'],
    ['RD 20', 'rd20', 'RD 20.0'],
    ['FL 100x10', 'fl 100 x 10', 'FL100X10'],
  ];

  for (const [first, ...others] of sameSection) {
    it(`reads every spelling of ${first} alike`, () => {
      const key = normaliseDesignation(first ?? '');
      for (const spelling of others) expect(normaliseDesignation(spelling), spelling).toBe(key);
    });
  }

  it('gives the documented keys', () => {
    // Upper case, no spaces, X between sizes, numbers without trailing zeros, series letter first.
    expect(normaliseDesignation('IPE 200')).toBe('IPE200');
    expect(normaliseDesignation('HE 200 A')).toBe('HEA200');
    expect(normaliseDesignation('HE 300 AA')).toBe('HEAA300');
    expect(normaliseDesignation('W 8 x 31')).toBe('W8X31');
    expect(normaliseDesignation('NPS 1 1/2 SCH 40')).toBe('NPS1-1/2SCH40');
    expect(normaliseDesignation('CHS 273.0x8.0')).toBe('CHS273X8');
    expect(normaliseDesignation('NPS 2 XXS')).toBe('NPS2XXS');
  });

  it('keeps sections that differ apart', () => {
    const distinct = ['IPE 200', 'IPE 220', 'HEA 200', 'HEB 200', 'SHS 100x100x5', 'SHS 100x100x6', 'RHS 100x50x5',
      'NPS 1-1/2 SCH 40', 'NPS 11/2 SCH 40', 'NPS 2 SCH 40', 'NPS 2 SCH 80', 'W8X31', 'W8X35', 'CHS 60.3x3.2',
      'CHS 60.3x3.6', 'RD 20', 'FL 20x5'];
    const keys = new Set(distinct.map(normaliseDesignation));
    expect(keys.size).toBe(distinct.length);
  });
});

describe('designationPrefix', () => {
  it('is the leading letters of a normalised designation', () => {
    expect(designationPrefix('IPE200')).toBe('IPE');
    expect(designationPrefix('W8X31')).toBe('W');
    expect(designationPrefix('NPS2SCH40')).toBe('NPS');
    expect(designationPrefix('200')).toBe('');
  });
});

describe('designationNumbers', () => {
  it('lists the numbers in order', () => {
    expect(designationNumbers('SHS100X100X5')).toEqual([100, 100, 5]);
    expect(designationNumbers('CHS60.3X3.2')).toEqual([60.3, 3.2]);
    expect(designationNumbers('IPE')).toEqual([]);
  });
});
