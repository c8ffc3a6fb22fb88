import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { fourDecimalText, fourSignificantText } from '../../../src/engine/checks/number-texts.js';

describe('number texts', () => {
  it('write 1.1359 as "1.136" to four significant digits and 0.57735 as "0.5774" with four decimals', () => {
    expect(fourSignificantText(1.1359)).toBe('1.136');
    expect(fourSignificantText(1)).toBe('1');
    expect(fourDecimalText(0.57735)).toBe('0.5774');
  });

  it('give the text toPrecision and toFixed give, the first time and again (property)', () => {
    fc.assert(
      fc.property(fc.double({ noNaN: true }), (x) => {
        for (let i = 0; i < 2; i++) {
          expect(fourSignificantText(x)).toBe(`${Number(x.toPrecision(4))}`);
          expect(fourDecimalText(x)).toBe(x.toFixed(4));
        }
      }),
      { numRuns: 2000 },
    );
  });
});
