import { describe, expect, it } from 'vitest';
import { EngineError } from '../../../src/engine/engine-error.js';
import { iSectionProperties } from '../../../src/engine/sections/i-section.js';
import type { ISectionDimensions } from '../../../src/engine/sections/dimensions.js';

const near = (actual: number, expected: number, relative = 1e-12) =>
  expect(Math.abs(actual / expected - 1)).toBeLessThan(relative);

const mm = (value: number) => value / 1000;

const section = (h: number, b: number, tw: number, tf: number, r: number): ISectionDimensions => ({
  shape: 'i-section',
  depth: mm(h),
  flangeWidth: mm(b),
  webThickness: mm(tw),
  flangeThickness: mm(tf),
  rootRadius: mm(r),
});

describe('an I-section with rootRadius 0 is three rectangles', () => {
  const [h, b, tw, tf] = [0.3, 0.15, 0.0071, 0.0107];
  const p = iSectionProperties({ shape: 'i-section', depth: h, flangeWidth: b, webThickness: tw, flangeThickness: tf, rootRadius: 0 });
  const hw = h - 2 * tf;

  it('has A, Iz, Iy of two flanges and a web (parallel axes)', () => {
    near(p.area, 2 * b * tf + hw * tw);
    near(p.secondMomentZ, (b * h ** 3 - (b - tw) * hw ** 3) / 12);
    near(p.secondMomentY, (2 * tf * b ** 3 + hw * tw ** 3) / 12);
    expect(p.centroidY).toBe(h / 2);
    expect(p.centroidZ).toBe(b / 2);
  });

  it('has Wpl = b tf (h - tf) + tw hw^2 / 4 and tf b^2 / 2 + hw tw^2 / 4', () => {
    near(p.plasticModulusZ, b * tf * (h - tf) + (tw * hw * hw) / 4, 1e-11);
    near(p.plasticModulusY, (tf * b * b) / 2 + (hw * tw * tw) / 4, 1e-11);
  });

  it('peaks in shear in the web at the neutral axis: Q = Wpl / 2 over tw', () => {
    near(p.shearFirstMomentY, p.plasticModulusZ / 2, 1e-10);
    near(p.shearWidthY, tw, 1e-10);
    // Shear along z peaks in the flanges just clear of the web: b = 2 tf.
    near(p.shearWidthZ, 2 * tf, 1e-10);
  });
});

describe('root fillets are added exactly', () => {
  it('adds 4 (1 - pi/4) r^2 of area', () => {
    const bare = iSectionProperties(section(200, 100, 5.6, 8.5, 0));
    const filleted = iSectionProperties(section(200, 100, 5.6, 8.5, 12));
    near(filleted.area - bare.area, 4 * (1 - Math.PI / 4) * mm(12) ** 2, 1e-10);
  });

  it('adds the fillets\' own second moment about the centroid', () => {
    // Each spandrel: area (1 - pi/4) r^2 with its centroid e = (10 - 3 pi) r / (12 - 3 pi) off the
    // flange face. About the flange face the r x r square has r^4 / 3 and the quarter disc, whose
    // centre is r off the face, r^2 A - 2 r (r^3 / 3) + pi r^4 / 16 = (5 pi / 16 - 2/3) r^4; the
    // spandrel (1 - 5 pi / 16) r^4, so about its own centroid (1 - 5 pi / 16) r^4 - A e^2.
    // Four of them at h/2 - tf - e from the centroid.
    const [h, tf, r] = [mm(200), mm(8.5), mm(12)];
    const area = (1 - Math.PI / 4) * r * r;
    const e = ((10 - 3 * Math.PI) * r) / (12 - 3 * Math.PI);
    const own = (1 - (5 * Math.PI) / 16) * r ** 4 - area * e * e;
    const added = 4 * (own + area * (h / 2 - tf - e) ** 2);
    const bare = iSectionProperties(section(200, 100, 5.6, 8.5, 0));
    const filleted = iSectionProperties(section(200, 100, 5.6, 8.5, 12));
    near(filleted.secondMomentZ - bare.secondMomentZ, added, 1e-9);
  });
});

describe('IPE 200 against EN 10365:2017 (tabulated values from memory)', () => {
  // h 200, b 100, tw 5.6, tf 8.5, r 12 mm. EN names the strong axis y-y; ours is z.
  const p = iSectionProperties(section(200, 100, 5.6, 8.5, 12));

  it('matches A, Iy, Iz, Wel, Wpl within 1 %', () => {
    near(p.area, 28.48e-4, 0.01);
    near(p.secondMomentZ, 1943e-8, 0.01);
    near(p.secondMomentY, 142.4e-8, 0.01);
    near(p.sectionModulusZ, 194.3e-6, 0.01);
    near(p.plasticModulusZ, 220.6e-6, 0.01);
    near(p.sectionModulusY, 28.47e-6, 0.01);
    near(p.plasticModulusY, 44.61e-6, 0.01);
  });

  it('matches It = 6.98 cm^4 and Iw = 12.99e3 cm^6 within 1 %', () => {
    near(p.torsionConstant, 6.98e-8, 0.01);
    near(p.warpingConstant, 12.99e3 * 1e-12, 0.01);
  });

  it('has Iw = tf b^3 (h - tf)^2 / 24 and tau = T tf / J', () => {
    near(p.warpingConstant, (mm(8.5) * mm(100) ** 3 * mm(191.5) ** 2) / 24);
    near(p.torsionalShearPerTorque, mm(8.5) / p.torsionConstant);
  });

  it('is open, with its flange tips as stress points and the flange as thickest element', () => {
    expect(p.closed).toBe(false);
    expect(p.bendingCombination).toBe('points');
    expect(p.thickestElement).toBe(mm(8.5));
    expect(p.stressPoints.map((point) => [point.y, point.z])).toEqual([
      [0.1, 0.05],
      [0.1, -0.05],
      [-0.1, 0.05],
      [-0.1, -0.05],
    ]);
  });
});

describe('more EN 10365 sections (tabulated values from memory)', () => {
  const rows: readonly [string, ISectionDimensions, number, number, number, number, number][] = [
    // designation, dimensions, A cm^2, Iy cm^4 (our Z), Iz cm^4 (our Y), It cm^4, Iw 10^3 cm^6
    ['IPE 300', section(300, 150, 7.1, 10.7, 15), 53.81, 8356, 603.8, 20.12, 125.9],
    ['HEA 200', section(190, 200, 6.5, 10, 18), 53.83, 3692, 1336, 20.98, 108.0],
    ['HEB 200', section(200, 200, 9, 15, 18), 78.08, 5696, 2003, 59.28, 171.1],
  ];
  for (const [name, dimensions, area, strong, weak, torsion, warping] of rows) {
    it(`matches ${name} within 1 %`, () => {
      const p = iSectionProperties(dimensions);
      near(p.area, area * 1e-4, 0.01);
      near(p.secondMomentZ, strong * 1e-8, 0.01);
      near(p.secondMomentY, weak * 1e-8, 0.01);
      near(p.torsionConstant, torsion * 1e-8, 0.01);
      near(p.warpingConstant, warping * 1e-9, 0.01);
    });
  }
});

describe('iSectionProperties refuses impossible geometry', () => {
  const cases: readonly [ISectionDimensions, string][] = [
    [section(200, 100, 5.6, 100, 0), 'flangeThickness'],
    [section(200, 100, 100, 8.5, 0), 'webThickness'],
    [section(200, 100, 5.6, 8.5, 50), 'rootRadius'],
    [section(200, 100, 5.6, 95, 6), 'rootRadius'],
    [section(200, 100, 5.6, 8.5, -1), 'rootRadius'],
    [section(0, 100, 5.6, 8.5, 12), 'depth'],
    [section(200, 100, 0, 8.5, 12), 'webThickness'],
  ];
  for (const [dimensions, field] of cases) {
    it(`names ${field}`, () => {
      try {
        iSectionProperties(dimensions);
        expect.unreachable();
      } catch (error) {
        expect(error).toBeInstanceOf(EngineError);
        expect((error as EngineError).path).toEqual(['section', field]);
      }
    });
  }
});
