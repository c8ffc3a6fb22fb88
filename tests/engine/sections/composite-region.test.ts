import { describe, expect, it } from 'vitest';
import {
  governingShearCut,
  largerShearCut,
  outlineValues,
  plasticModulusAbout,
  plasticNeutralAxis,
  summariseRegion,
} from '../../../src/engine/sections/composite-region.js';
import { negated, quarterDiscPart, rectanglePart } from '../../../src/engine/sections/region-parts.js';

describe('a rectangle built from two pieces', () => {
  const b = 0.04;
  const h = 0.1;
  const parts = [rectanglePart(0, 0.03, 0, b), rectanglePart(0.03, h, 0, b)];

  it('has the closed-form area, centroid and second moments (Roark 8th ed., Table A.1, rectangle)', () => {
    const region = summariseRegion(parts);
    expect(region.area).toBeCloseTo(b * h, 15);
    expect(region.centroidY).toBeCloseTo(h / 2, 15);
    expect(region.secondMomentZ / ((b * h ** 3) / 12)).toBeCloseTo(1, 12);
    expect(region.secondMomentY / ((h * b ** 3) / 12)).toBeCloseTo(1, 12);
    expect(region.productMoment / region.secondMomentZ).toBeCloseTo(0, 12);
  });

  it('has plastic modulus b h^2 / 4 about the mid-depth', () => {
    expect(plasticNeutralAxis(parts, 'z')).toBeCloseTo(h / 2, 14);
    expect(plasticModulusAbout(parts, 'z') / ((b * h * h) / 4)).toBeCloseTo(1, 12);
  });

  it('peaks in shear at the neutral axis with Q = b h^2 / 8', () => {
    const cut = governingShearCut(parts, 'y', h / 2);
    expect(cut.firstMoment / ((b * h * h) / 8)).toBeCloseTo(1, 10);
    expect(cut.width).toBeCloseTo(b, 14);
  });
});

describe('a disc built from four quarter discs', () => {
  const r = 0.5;
  const parts = [
    quarterDiscPart(r, r, r, 1, 1),
    quarterDiscPart(r, r, r, 1, -1),
    quarterDiscPart(r, r, r, -1, 1),
    quarterDiscPart(r, r, r, -1, -1),
  ];

  it('has area pi r^2 and I = pi r^4 / 4 (Roark 8th ed., Table A.1, solid circle)', () => {
    const region = summariseRegion(parts);
    expect(region.area).toBeCloseTo(Math.PI * r * r, 14);
    expect(region.secondMomentZ / ((Math.PI * r ** 4) / 4)).toBeCloseTo(1, 12);
    expect(region.secondMomentY / ((Math.PI * r ** 4) / 4)).toBeCloseTo(1, 12);
    expect(region.productMoment).toBeCloseTo(0, 14);
  });

  it('has plastic modulus 4 r^3 / 3 (= d^3 / 6) and peak shear Q = 2 r^3 / 3 over b = 2 r', () => {
    expect(plasticModulusAbout(parts, 'y') / ((4 * r ** 3) / 3)).toBeCloseTo(1, 12);
    const cut = governingShearCut(parts, 'z', r);
    expect(cut.firstMoment / ((2 * r ** 3) / 3)).toBeCloseTo(1, 10);
    expect(cut.width).toBeCloseTo(2 * r, 10);
  });
});

describe('a tee whose neutral axis lies in its wide flange (mm)', () => {
  // Flange 200 x 20 over y in [40, 60], stem 10 x 40 over y in [0, 40].
  const parts = [rectanglePart(40, 60, 0, 200), rectanglePart(0, 40, 95, 105)];

  it('has its centroid in the flange', () => {
    // (4000 * 50 + 400 * 20) / 4400 = 47.2727...
    expect(summariseRegion(parts).centroidY).toBeCloseTo(208000 / 4400, 12);
  });

  it('has its equal-area axis at y = 49 and plastic modulus 31 800 mm^3', () => {
    // Half the area, 2200 = stem 400 + 200 (c - 40), so c = 49; Wpl = 400 (49 - 20) + 200 * 9 * 4.5
    // + 200 * 11 * 5.5 = 11 600 + 8 100 + 12 100.
    expect(plasticNeutralAxis(parts, 'z')).toBeCloseTo(49, 11);
    expect(plasticModulusAbout(parts, 'z')).toBeCloseTo(31800, 8);
  });

  it('peaks in shear in the stem at the junction, not at the neutral axis', () => {
    // Stem below y = 40: Q = 400 (47.2727 - 20) = 10 909.09 mm^3 over b = 10, ratio 1 090.9, against
    // 200 * 12.727^2 / 2 / 200 = 81.0 at the neutral axis.
    const centroid = 208000 / 4400;
    const cut = governingShearCut(parts, 'y', centroid);
    expect(cut.width).toBeCloseTo(10, 12);
    expect(cut.firstMoment).toBeCloseTo(400 * (centroid - 20), 8);
  });
});

describe('a hollow square built from positive and negative pieces', () => {
  const parts = [rectanglePart(0, 10, 0, 10), ...negated([rectanglePart(1, 9, 1, 9)])];

  it('has the difference of the two rectangles', () => {
    const region = summariseRegion(parts);
    expect(region.area).toBeCloseTo(100 - 64, 12);
    expect(region.secondMomentZ).toBeCloseTo((10 ** 4 - 8 ** 4) / 12, 9);
  });

  it('cuts both walls at the neutral axis', () => {
    const cut = governingShearCut(parts, 'y', 5);
    expect(cut.width).toBeCloseTo(2, 12);
    // Q = (10 * 5^2 - 8 * 4^2) / 2 = 61.
    expect(cut.firstMoment).toBeCloseTo(61, 9);
  });
});

describe('largerShearCut', () => {
  it('keeps the cut with the largest Q / b', () => {
    const first = { firstMoment: 10, width: 2 };
    const second = { firstMoment: 12, width: 3 };
    expect(largerShearCut([second, first])).toBe(first);
  });
});

describe('outlineValues', () => {
  // An L of two 10 x 1 rectangles (heel at the origin): symmetric about neither axis.
  const parts = [rectanglePart(0, 10, 0, 1), rectanglePart(0, 1, 1, 10)];
  const region = summariseRegion(parts);

  it('keeps the product moment of an unsymmetric outline and zeroes it on an axis of symmetry', () => {
    expect(outlineValues(parts, region).productMoment).toBe(region.productMoment);
    expect(region.productMoment).toBeLessThan(0);
    const square = [rectanglePart(0, 2, 0, 2)];
    const values = outlineValues(square, summariseRegion(square), { centroidY: 1, centroidZ: 1 });
    expect(values.productMoment).toBe(0);
    expect(values.centroidY).toBe(1);
    // 2 x 2 square: Wpl = b h^2 / 4 = 2.
    expect(values.plasticModulusZ).toBeCloseTo(2, 12);
  });

  it('takes a further shear cut when its Q / b is larger', () => {
    const further = { firstMoment: 1000, width: 1 };
    expect(outlineValues(parts, region, { shearAlongY: [further] }).shearY).toBe(further);
    expect(outlineValues(parts, region, { shearAlongZ: [{ firstMoment: 1e-6, width: 1 }] }).shearZ.firstMoment).toBeGreaterThan(1e-6);
  });
});
