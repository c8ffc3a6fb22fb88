import { describe, expect, it } from 'vitest';
import { element, escapeText, formatCoordinate, formatValue, textElement } from '../../src/rendering/svg-markup.js';

describe('escapeText', () => {
  it('replaces the five characters that could end text or an attribute', () => {
    expect(escapeText(`<script>alert("x") & 'y'</script>`)).toBe('&lt;script&gt;alert(&quot;x&quot;) &amp; &#39;y&#39;&lt;/script&gt;');
  });

  it('hands back text with nothing to escape unchanged, including an empty string', () => {
    expect(escapeText('Shear force Vy (kN*m)')).toBe('Shear force Vy (kN*m)');
    expect(escapeText('')).toBe('');
  });

  it('escapes an ampersand that already looks like an entity, so text is never read as markup', () => {
    expect(escapeText('&lt;')).toBe('&amp;lt;');
  });
});

describe('element', () => {
  it('writes attributes quoted and escaped, numbers as coordinates, and closes an empty element itself', () => {
    expect(element('circle', { cx: 1, cy: -0.001, r: 2.345, class: 'a"b' })).toBe('<circle cx="1.00" cy="0.00" r="2.35" class="a&quot;b"/>');
  });

  it('wraps children as given, while textElement escapes its text', () => {
    expect(element('g', {}, '<line/>')).toBe('<g><line/></g>');
    expect(textElement('text', { x: 0 }, '<b>')).toBe('<text x="0.00">&lt;b&gt;</text>');
  });
});

describe('formatCoordinate', () => {
  it('writes a fixed number of decimals, two by default', () => {
    expect(formatCoordinate(12.3456)).toBe('12.35');
    expect(formatCoordinate(7)).toBe('7.00');
    expect(formatCoordinate(7.25, 1)).toBe('7.3');
    expect(formatCoordinate(-3.2, 0)).toBe('-3');
  });

  it('never writes "-0", whatever the number of decimals', () => {
    expect(formatCoordinate(-0)).toBe('0.00');
    expect(formatCoordinate(-0.001)).toBe('0.00');
    expect(formatCoordinate(-0.4, 0)).toBe('0');
    expect(formatCoordinate(-0.00004, 4)).toBe('0.0000');
    // Rounds away from zero, so the sign stays: -0.006 to two decimals is -0.01.
    expect(formatCoordinate(-0.006)).toBe('-0.01');
  });

  it('throws for NaN and the infinities instead of writing them', () => {
    expect(() => formatCoordinate(Number.NaN)).toThrow(RangeError);
    expect(() => formatCoordinate(Number.POSITIVE_INFINITY)).toThrow(RangeError);
    expect(() => formatCoordinate(Number.NEGATIVE_INFINITY)).toThrow(RangeError);
  });

  it('refuses a number of decimals it cannot write', () => {
    expect(() => formatCoordinate(1, 7)).toThrow(RangeError);
    expect(() => formatCoordinate(1, 1.5)).toThrow(RangeError);
  });
});

describe('formatValue', () => {
  it('rounds to four significant digits and drops trailing zeros', () => {
    expect(formatValue(4.8)).toBe('4.8');
    expect(formatValue(-2)).toBe('-2');
    expect(formatValue(3.14159)).toBe('3.142');
    expect(formatValue(0.0012344)).toBe('0.001234');
    // 123456 to four digits is 123500, written in full below 1e6.
    expect(formatValue(123456)).toBe('123500');
  });

  it('uses an exponent only below 1e-3 and from 1e6 of magnitude', () => {
    expect(formatValue(0.001)).toBe('0.001');
    expect(formatValue(0.00012346)).toBe('1.235e-4');
    expect(formatValue(-0.00001)).toBe('-1e-5');
    expect(formatValue(2.5e7)).toBe('2.5e+7');
    expect(formatValue(999999)).toBe('1e+6');
    // 0.00099996 rounds to 0.001000, back inside the plain range.
    expect(formatValue(0.00099996)).toBe('0.001');
  });

  it('writes zero of either sign as "0"', () => {
    expect(formatValue(0)).toBe('0');
    expect(formatValue(-0)).toBe('0');
  });

  it('throws for NaN and the infinities', () => {
    expect(() => formatValue(Number.NaN)).toThrow(RangeError);
    expect(() => formatValue(Number.NEGATIVE_INFINITY)).toThrow(RangeError);
  });
});
