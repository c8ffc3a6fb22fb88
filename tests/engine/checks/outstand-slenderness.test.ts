import { describe, expect, it } from 'vitest';
import {
  elementSlenderness,
  governingElementSlenderness,
  slendernessEpsilon,
} from '../../../src/engine/checks/outstand-slenderness.js';
import { EngineError } from '../../../src/engine/engine-error.js';

const MM = 1e-3;
const near = (actual: number, expected: number, relative = 1e-12) =>
  expect(Math.abs(actual / expected - 1)).toBeLessThan(relative);

// EN 1993-1-1:2005, Table 5.2 (from memory). eps = sqrt(235 / fy): S235 1, S355 sqrt(235 / 355) = 0.813616.
const EPS355 = Math.sqrt(235 / 355);

describe('eps and the limits', () => {
  it('is 1 for S235 and 0.8136 for S355', () => {
    expect(slendernessEpsilon(235e6)).toBe(1);
    near(slendernessEpsilon(355e6), 0.813616, 1e-6);
    expect(() => slendernessEpsilon(0)).toThrow(EngineError);
  });

  it('puts an I-section flange outstand at 9 / 10 / 14 eps and its web at 33 / 38 / 42 eps or 72 / 83 / 124 eps', () => {
    const section = { shape: 'i-section' as const, depth: 0.3, flangeWidth: 0.15, webThickness: 0.0071, flangeThickness: 0.0107, rootRadius: 0.015 };
    const [flange, web] = elementSlenderness(section, 235e6, 'compression');
    expect([flange!.limitClass1, flange!.limitClass2, flange!.limitClass3]).toEqual([9, 10, 14]);
    expect([web!.limitClass1, web!.limitClass2, web!.limitClass3]).toEqual([33, 38, 42]);
    const [, bentWeb] = elementSlenderness(section, 355e6, 'bending-about-z');
    // S355: 72 * 0.813616 = 58.580, 83 * 0.813616 = 67.530, 124 * 0.813616 = 100.888.
    near(bentWeb!.limitClass1!, 58.580, 1e-4);
    near(bentWeb!.limitClass2!, 67.530, 1e-4);
    near(bentWeb!.limitClass3, 100.888, 1e-4);
    const [flange355] = elementSlenderness(section, 355e6, 'compression');
    // 14 * 0.813616 = 11.3906.
    near(flange355!.limitClass3, 14 * EPS355);
    near(flange355!.limitClass3, 11.3906, 1e-4);
  });
});

describe('I-sections', () => {
  it('flags a welded-like I 300 x 300 x 10 x 10 slender: c/t = 14.5 above 14 eps', () => {
    // c = (300 - 10 - 0) / 2 = 145 mm, c/t = 14.5 > 14 (S235) and > 11.39 (S355): class 4.
    // Web: c = 300 - 20 = 280, c/t = 28: S235 in compression <= 33 class 1; S355 33 eps = 26.85 < 28 <= 38 eps = 30.92: class 2.
    const section = { shape: 'i-section' as const, depth: 0.3, flangeWidth: 0.3, webThickness: 0.01, flangeThickness: 0.01, rootRadius: 0 };
    for (const fy of [235e6, 355e6]) {
      const worst = governingElementSlenderness(section, fy, 'compression')!;
      expect(worst.element).toBe('flange outstand in compression');
      near(worst.ratio, 14.5);
      expect(worst.sectionClass).toBe(4);
      expect(worst.slender).toBe(true);
    }
    const [, web] = elementSlenderness(section, 355e6, 'compression');
    near(web!.ratio, 28);
    expect(web!.sectionClass).toBe(2);
  });

  it('classifies IPE 300 (h 300, b 150, tw 7.1, tf 10.7, r 15 mm): class 2 in compression in S235, slender web in S355', () => {
    // Flange c = (150 - 7.1 - 30) / 2 = 56.45, c/t = 5.276: class 1. Web c = 300 - 21.4 - 30 = 248.6, c/t = 35.01:
    // S235 33 < 35.01 <= 38: class 2; S355 35.01 > 42 eps = 34.17: class 4; in bending 35.01 <= 58.58: class 1.
    const section = { shape: 'i-section' as const, depth: 0.3, flangeWidth: 0.15, webThickness: 0.0071, flangeThickness: 0.0107, rootRadius: 0.015 };
    const mild = governingElementSlenderness(section, 235e6, 'compression')!;
    expect(mild.element).toBe('web in compression');
    near(mild.ratio, 248.6 / 7.1, 1e-12);
    expect(mild.sectionClass).toBe(2);
    const [flange] = elementSlenderness(section, 235e6, 'compression');
    near(flange!.ratio, 56.45 / 10.7, 1e-12);
    expect(flange!.sectionClass).toBe(1);
    expect(governingElementSlenderness(section, 355e6, 'compression')!.sectionClass).toBe(4);
    expect(governingElementSlenderness(section, 355e6, 'bending-about-z')!.sectionClass).toBe(1);
  });
});

describe('the other shapes', () => {
  it('finds the plain channel 100 x 50 x 3 mm slender in its flanges: c/t = 47 / 3 = 15.67', () => {
    // Flange c = 50 - 3 - 0 = 47, c/t = 15.667 > 14 (S235) and 11.39 (S355): class 4.
    // Web c = 100 - 6 = 94, c/t = 31.33: S235 <= 33 class 1; S355 30.92 < 31.33 <= 34.17 class 3.
    const section = { shape: 'channel' as const, depth: 100 * MM, flangeWidth: 50 * MM, webThickness: 3 * MM, flangeThickness: 3 * MM };
    const worst = governingElementSlenderness(section, 355e6, 'compression')!;
    expect(worst.element).toBe('flange outstand in compression');
    near(worst.ratio, 47 / 3);
    expect(worst.slender).toBe(true);
    const [, web355] = elementSlenderness(section, 355e6, 'compression');
    expect(web355!.sectionClass).toBe(3);
    const [, web235] = elementSlenderness(section, 235e6, 'compression');
    expect(web235!.sectionClass).toBe(1);
  });

  it('classifies the angle 60 x 60 x 6 class 3 in S235 and class 4 in S355', () => {
    // h/t = 60 / 6 = 10 <= 15 eps; (b + h) / 2t = 120 / 12 = 10: <= 11.5 (S235), > 11.5 * 0.8136 = 9.357 (S355).
    const angle = { shape: 'angle' as const, legY: 60 * MM, legZ: 60 * MM, thickness: 6 * MM };
    const mild = governingElementSlenderness(angle, 235e6, 'compression')!;
    expect(mild.sectionClass).toBe(3);
    expect(mild.limitClass1).toBeUndefined();
    const high = governingElementSlenderness(angle, 355e6, 'compression')!;
    expect(high.element).toBe('both legs, (b + h) / (2 t)');
    near(high.ratio, 10);
    near(high.limitClass3, 11.5 * EPS355);
    expect(high.slender).toBe(true);
  });

  it('takes the longer leg of an unequal angle for h / t', () => {
    // 100 x 50 x 8: h/t = 12.5, (b + h) / 2t = 150 / 16 = 9.375; both within S235's 15 and 11.5.
    const [leg, legs] = elementSlenderness({ shape: 'angle', legY: 50 * MM, legZ: 100 * MM, thickness: 8 * MM }, 235e6, 'compression');
    near(leg!.ratio, 12.5);
    near(legs!.ratio, 9.375);
    expect(leg!.sectionClass).toBe(3);
  });

  it('treats a tee stem as an outstand: tee 100 x 100 x 8 x 10 is class 3 by its stem', () => {
    // Flange c = (100 - 8) / 2 = 46, c/t = 4.6: class 1. Stem c = 100 - 10 = 90, c/t = 11.25: 10 < 11.25 <= 14 (S235): class 3.
    const worst = governingElementSlenderness(
      { shape: 'tee', depth: 100 * MM, flangeWidth: 100 * MM, webThickness: 8 * MM, flangeThickness: 10 * MM },
      235e6,
      'compression',
    )!;
    expect(worst.element).toBe('stem as an outstand in compression');
    near(worst.ratio, 11.25);
    expect(worst.sectionClass).toBe(3);
  });

  it('classifies box walls with c = b - 3t: 200 x 100 x 4 in S355', () => {
    // Walls: along z c/t = (100 - 12) / 4 = 22 <= 26.85: class 1; along y c/t = (200 - 12) / 4 = 47:
    // in compression 47 > 42 eps = 34.17: class 4; in bending 47 <= 72 eps = 58.58: class 1.
    const box = { shape: 'box' as const, width: 100 * MM, depth: 200 * MM, wallThickness: 4 * MM };
    const compressed = governingElementSlenderness(box, 355e6, 'compression')!;
    expect(compressed.element).toBe('wall along y (web) in compression');
    near(compressed.ratio, 47);
    expect(compressed.sectionClass).toBe(4);
    const bent = governingElementSlenderness(box, 355e6, 'bending-about-z')!;
    expect(bent.sectionClass).toBe(1);
    // Both class 1: the worse by ratio / class 3 limit is the flange wall, 22 / 34.17 = 0.644 > 47 / 100.89 = 0.466.
    expect(bent.element).toBe('wall along z (flange) in compression');
  });

  it('classifies a tube by d / t against 50 / 70 / 90 eps^2: 168.3 x 4 in S355 is class 2', () => {
    // d/t = 42.075; eps^2 = 235 / 355 = 0.66197: 33.10 < 42.075 <= 46.34.
    const worst = governingElementSlenderness({ shape: 'tube', outerDiameter: 168.3 * MM, wallThickness: 4 * MM }, 355e6, 'compression')!;
    near(worst.ratio, 42.075);
    near(worst.limitClass3, (90 * 235) / 355);
    expect(worst.sectionClass).toBe(2);
  });

  it('has nothing to classify in solid and custom sections', () => {
    expect(governingElementSlenderness({ shape: 'rectangle', width: 0.1, depth: 0.2 }, 235e6, 'compression')).toBeNull();
    expect(governingElementSlenderness({ shape: 'round', diameter: 0.05 }, 235e6, 'compression')).toBeNull();
    expect(
      governingElementSlenderness({ shape: 'custom', area: 1e-3, secondMomentZ: 1e-6, secondMomentY: 1e-7, torsionConstant: 1e-9 }, 235e6, 'compression'),
    ).toBeNull();
  });
});
