import { describe, expect, it } from 'vitest';
import {
  chordAt,
  extentAlong,
  filletParts,
  integralsBelow,
  negated,
  productMomentAboutOrigin,
  quarterDiscPart,
  rectanglePart,
} from '../../../src/engine/sections/region-parts.js';
import type { RegionPart } from '../../../src/engine/sections/region-parts.js';

const sumOf = (parts: readonly RegionPart[], coordinate: 'y' | 'z', cut = Infinity) =>
  parts.reduce(
    (total, part) => {
      const piece = integralsBelow(part, coordinate, cut);
      return {
        area: total.area + piece.area,
        firstMoment: total.firstMoment + piece.firstMoment,
        secondMoment: total.secondMoment + piece.secondMoment,
      };
    },
    { area: 0, firstMoment: 0, secondMoment: 0 },
  );

describe('rectangle pieces', () => {
  const part = rectanglePart(1, 3, 2, 7);

  it('integrates 1, y, y^2 over the whole piece', () => {
    // width 5, y from 1 to 3: area 10, integral of y = 5 (9 - 1) / 2 = 20, of y^2 = 5 (27 - 1) / 3.
    const whole = integralsBelow(part, 'y', Infinity);
    expect(whole.area).toBeCloseTo(10, 12);
    expect(whole.firstMoment).toBeCloseTo(20, 12);
    expect(whole.secondMoment).toBeCloseTo(130 / 3, 12);
  });

  it('integrates only below a cut, along z as well', () => {
    // Along z the chord is the height 2; below z = 4: area 2 (4 - 2) = 4, integral of z = 2 (16 - 4) / 2 = 12.
    const below = integralsBelow(part, 'z', 4);
    expect(below.area).toBeCloseTo(4, 12);
    expect(below.firstMoment).toBeCloseTo(12, 12);
    expect(integralsBelow(part, 'y', 1).area).toBe(0);
  });

  it('has its chord on either side of its edges as limits', () => {
    expect(chordAt(part, 'y', 1, 'above')).toBe(5);
    expect(chordAt(part, 'y', 1, 'below')).toBe(0);
    expect(chordAt(part, 'y', 3, 'below')).toBe(5);
    expect(chordAt(part, 'y', 3, 'above')).toBe(0);
    expect(chordAt(part, 'z', 5, 'above')).toBe(2);
  });

  it('has the product moment (y1^2 - y0^2)(z1^2 - z0^2) / 4 about the origin', () => {
    // (9 - 1)(49 - 4) / 4 = 90.
    expect(productMomentAboutOrigin(part)).toBeCloseTo(90, 12);
    expect(productMomentAboutOrigin(negated([part])[0] as RegionPart)).toBeCloseTo(-90, 12);
  });
});

describe('quarter-disc pieces', () => {
  const r = 2;
  const part = quarterDiscPart(0, 0, r, 1, 1);

  it('has area pi r^2 / 4, centroid 4 r / (3 pi) and I about its straight edge pi r^4 / 16', () => {
    // Quarter circle: Roark 8th ed., Table A.1, quadrant of a circle (from memory); also direct integration.
    const whole = integralsBelow(part, 'y', Infinity);
    expect(whole.area).toBeCloseTo(Math.PI, 12);
    expect(whole.firstMoment / whole.area).toBeCloseTo((4 * r) / (3 * Math.PI), 12);
    expect(whole.secondMoment).toBeCloseTo(Math.PI, 12);
  });

  it('integrates below a cut through it', () => {
    // Integral of sqrt(r^2 - t^2) from 0 to r/2 = (t sqrt(r^2 - t^2) + r^2 asin(t/r)) / 2 = r^2 (sqrt(3) / 8 + pi / 12).
    expect(integralsBelow(part, 'y', r / 2).area).toBeCloseTo(r * r * (Math.sqrt(3) / 8 + Math.PI / 12), 12);
  });

  it('lies on the side it points to', () => {
    const down = quarterDiscPart(5, 1, r, -1, 1);
    expect(extentAlong(down, 'y')).toEqual([3, 5]);
    expect(extentAlong(down, 'z')).toEqual([1, 3]);
    // The first moment about y = 5 of a quarter disc below it is -r^3 / 3.
    const whole = integralsBelow(down, 'y', Infinity);
    expect(whole.firstMoment - 5 * whole.area).toBeCloseTo(-(r ** 3) / 3, 12);
  });

  it('has chord sqrt(r^2 - t^2), r on its straight edge and 0 at its rim', () => {
    expect(chordAt(part, 'y', 1, 'above')).toBeCloseTo(Math.sqrt(3), 14);
    expect(chordAt(part, 'y', 0, 'above')).toBeCloseTo(r, 14);
    expect(chordAt(part, 'y', 0, 'below')).toBe(0);
    expect(chordAt(part, 'y', r, 'below')).toBeCloseTo(0, 14);
  });

  it('has product moment r^4 / 8 about its corner, signed by the quadrant', () => {
    // Integral over the quarter of t u dA = int_0^r t (r^2 - t^2) / 2 dt = r^4 / 8.
    expect(productMomentAboutOrigin(part)).toBeCloseTo(r ** 4 / 8, 12);
    expect(productMomentAboutOrigin(quarterDiscPart(0, 0, r, -1, 1))).toBeCloseTo(-(r ** 4) / 8, 12);
  });
});

describe('fillets (spandrels)', () => {
  it('has area (1 - pi/4) r^2 and centroid (10 - 3 pi) r / (3 (4 - pi)) from each face', () => {
    // Spandrel: the r x r square (centroid r/2) less the quarter disc (centroid r - 4r/(3 pi) from the
    // faces): x = [r^3 / 2 - (pi r^2 / 4)(r - 4 r / (3 pi))] / ((1 - pi/4) r^2) = (10 - 3 pi) r / (12 - 3 pi).
    const r = 3;
    const parts = filletParts(10, 20, r, 1, 1);
    const alongY = sumOf(parts, 'y');
    const alongZ = sumOf(parts, 'z');
    const expectedOffset = ((10 - 3 * Math.PI) * r) / (12 - 3 * Math.PI);
    expect(alongY.area).toBeCloseTo((1 - Math.PI / 4) * r * r, 12);
    expect(alongY.firstMoment / alongY.area).toBeCloseTo(10 + expectedOffset, 12);
    expect(alongZ.firstMoment / alongZ.area).toBeCloseTo(20 + expectedOffset, 12);
  });

  it('mirrors with the direction it opens to', () => {
    const r = 1;
    const parts = filletParts(0, 0, r, -1, -1);
    const alongY = sumOf(parts, 'y');
    expect(alongY.firstMoment / alongY.area).toBeCloseTo(-((10 - 3 * Math.PI) * r) / (12 - 3 * Math.PI), 12);
  });

  it('has a chord that grows from 0 at its toe to r at the face', () => {
    const parts = filletParts(0, 0, 1, 1, 1);
    const chord = (y: number) => parts.reduce((total, part) => total + chordAt(part, 'y', y, 'above'), 0);
    expect(chord(0)).toBeCloseTo(1, 14);
    // At height t the fillet spans 1 - sqrt(1 - (1 - t)^2); t = 0.5 gives 1 - sqrt(0.75).
    expect(chord(0.5)).toBeCloseTo(1 - Math.sqrt(0.75), 14);
    expect(filletParts(0, 0, 0, 1, 1)).toEqual([]);
  });
});
