import { describe, expect, it } from 'vitest';
import {
  cornerJunctionDiameter,
  cornerJunctionTorsionConstant,
  outstandTorsionConstant,
  plateTorsionConstant,
  teeJunctionDiameter,
  teeJunctionTorsionConstant,
  torsionConstantWithinBounds,
} from '../../../src/engine/sections/open-section-torsion.js';

describe('plate terms (Roark 8th ed., Table 10.7, case 4, full sides; from memory)', () => {
  it('gives a b^3 (1/3 - 0.21 (b/a)(1 - (b/a)^4 / 12))', () => {
    // 100 x 10: 100 * 1000 * (1/3 - 0.021 (1 - 1e-4 / 12)) = 31 233.35...
    expect(plateTorsionConstant(100, 10)).toBeCloseTo(100000 * (1 / 3 - 0.021 * (1 - 1e-4 / 12)), 9);
    // Square: 1/3 - 0.21 * 11/12 = 0.1408333.
    expect(plateTorsionConstant(1, 1)).toBeCloseTo(1 / 3 - 0.1925, 14);
  });

  it('gives an outstand with one free end as c d^3 (1/3 - 0.105 (d/c)(1 - (d/c)^4 / 192))', () => {
    const [c, d] = [90, 10];
    const q = d / c;
    expect(outstandTorsionConstant(c, d)).toBeCloseTo(c * d ** 3 * (1 / 3 - 0.105 * q * (1 - q ** 4 / 192)), 9);
  });
});

describe('junction diameters are the inscribed circles', () => {
  it('touches the flange face and both fillets of a tee junction', () => {
    // Flange face at y = 0, flange down to -tf, stem half-width tw / 2, fillet centres at
    // (z, y) = (+-(tw/2 + r), -tf - r). The circle centre (0, -D/2) is D/2 + r from each fillet centre.
    const [tf, tw, r] = [8.5, 5.6, 12];
    const radius = teeJunctionDiameter(tf, tw, r) / 2;
    expect(Math.hypot(tw / 2 + r, tf + r - radius)).toBeCloseTo(radius + r, 10);
  });

  it('touches both outer faces and the fillet of a corner', () => {
    // Outer faces z = 0 and y = 0; fillet centre at (t2 + r, t1 + r); the circle centre is (D/2, D/2).
    const [t1, t2, r] = [11, 6, 13];
    const radius = cornerJunctionDiameter(t1, t2, r) / 2;
    expect(Math.hypot(t2 + r - radius, t1 + r - radius)).toBeCloseTo(radius + r, 10);
    // Sharp equal corner: the circle through the re-entrant corner, D = 2 sqrt(2) t / (1 + sqrt(2)).
    expect(cornerJunctionDiameter(1, 1, 0)).toBeCloseTo((2 * Math.SQRT2) / (1 + Math.SQRT2), 14);
  });

  it('is bounded by the web itself when the web is more than 2 (tf + r) thick', () => {
    // tf 1, tw 3, r 0: touching the face and both corners would need radius (1 + 9/4) / 2 = 1.625 > tf,
    // so the circle would poke out of the web's sides; the web's own circle, D = tw = 3, is the largest.
    expect(teeJunctionDiameter(1, 3, 0)).toBe(3);
    // At the limit tw = 2 (tf + r) both agree: tf 1, tw 2, r 0 gives (1 + 1) / 1 = 2 = tw.
    expect(teeJunctionDiameter(1, 2, 0)).toBeCloseTo(2, 14);
  });

  it('is bounded by the thick plate when a thin plate meets it', () => {
    // t 10 and 1, r 0: touching both faces and the corner gives radius 11 - sqrt(20) = 6.53 > 1 + 0,
    // so the circle sits in the thick plate alone: D = 10.
    expect(cornerJunctionDiameter(10, 1, 0)).toBe(10);
  });
});

describe('junction terms alpha D^4 (Roark 8th ed., Table 10.7, after El Darwish & Johnston; from memory)', () => {
  it('uses alpha = (t_min / t_max)(0.15 + 0.10 r / t_f) at a tee', () => {
    // IPE 200 values: alpha = (5.6 / 8.5)(0.15 + 1.2 / 8.5) = 0.191834, D = 495.29 / 32.5 = 15.2397.
    const diameter = (20.5 ** 2 + 5.6 * 13.4) / 32.5;
    expect(teeJunctionTorsionConstant(8.5, 5.6, 12)).toBeCloseTo((5.6 / 8.5) * (0.15 + 1.2 / 8.5) * diameter ** 4, 6);
  });

  it('uses alpha = (t_thin / t_thick)(0.07 + 0.076 r / t_thick) at a corner', () => {
    const alpha = 1 * (0.07 + (0.076 * 12) / 10);
    expect(cornerJunctionTorsionConstant(10, 10, 12)).toBeCloseTo(alpha * cornerJunctionDiameter(10, 10, 12) ** 4, 8);
    expect(cornerJunctionTorsionConstant(6, 11, 13)).toBeCloseTo(cornerJunctionTorsionConstant(11, 6, 13), 10);
  });
});

describe('torsionConstantWithinBounds', () => {
  // Exact J of a 1 x 1 square: 0.140577 (rectangle series); of a 2 x 1 rectangle 2 * 0.228682 = 0.457363.
  it('passes an estimate that lies within the bounds', () => {
    expect(torsionConstantWithinBounds(0.2, [[1, 1]], [2, 1], 1)).toBe(0.2);
  });

  it('raises it to the contained rectangle and lowers it to the bounding one or the polar moment', () => {
    expect(torsionConstantWithinBounds(0.1, [[1, 1]], [2, 1], 1)).toBeCloseTo(0.140577, 6);
    expect(torsionConstantWithinBounds(0.5, [[1, 1]], [2, 1], 1)).toBeCloseTo(0.457363, 6);
    expect(torsionConstantWithinBounds(0.3, [[1, 1]], [2, 1], 0.2)).toBe(0.2);
  });
});
