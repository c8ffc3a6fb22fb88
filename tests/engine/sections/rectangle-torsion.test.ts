import { describe, expect, it } from 'vitest';
import { ODD_RECIPROCAL_FIFTH_POWERS, rectangleTorsion } from '../../../src/engine/sections/rectangle-torsion.js';

describe('the constant sum over odd n of 1 / n^5', () => {
  it('matches a direct sum with its tail bound', () => {
    let sum = 0;
    for (let n = 19_999; n >= 1; n -= 2) sum += 1 / n ** 5;
    // The rest, over odd n > 20 000, is below 1 / (8 * 20 000^4) ~ 8e-19.
    expect(Math.abs(sum - ODD_RECIPROCAL_FIFTH_POWERS)).toBeLessThan(1e-15);
  });
});

describe('rectangleTorsion', () => {
  // Timoshenko & Goodier, Theory of Elasticity, 3rd ed., table for the rectangular bar (from memory):
  // J = k1 a b^3, tau max = T / (k2 a b^2), a / b = long / short side, three decimals.
  const table: readonly [number, number, number][] = [
    [1, 0.141, 0.208],
    [1.5, 0.196, 0.231],
    [2, 0.229, 0.246],
    [3, 0.263, 0.267],
    [4, 0.281, 0.282],
    [5, 0.291, 0.291],
    [10, 0.312, 0.312],
  ];
  for (const [ratio, k1, k2] of table) {
    it(`gives k1 = ${k1} and k2 = ${k2} for a / b = ${ratio}`, () => {
      const b = 0.02;
      const a = ratio * b;
      const torsion = rectangleTorsion(a, b);
      expect(Math.abs(torsion.torsionConstant / (a * b ** 3) - k1)).toBeLessThan(0.0006);
      expect(Math.abs(1 / (torsion.torsionalShearPerTorque * a * b * b) - k2)).toBeLessThan(0.0006);
    });
  }

  it('agrees with Roark 8th ed., Table 10.7, case 4 (from memory) to its stated accuracy', () => {
    // Half sides a >= b: K = a b^3 [16/3 - 3.36 (b/a)(1 - b^4 / (12 a^4))],
    // tau max = 3 T / (8 a b^2) [1 + 0.6095 (b/a) + 0.8865 (b/a)^2 - 1.8023 (b/a)^3 + 0.9100 (b/a)^4].
    for (const ratio of [1, 1.3, 2, 3.7, 8, 25]) {
      const half = 0.01;
      const a = ratio * half;
      const q = half / a;
      const roarkJ = a * half ** 3 * (16 / 3 - 3.36 * q * (1 - q ** 4 / 12));
      const roarkTau = (3 / (8 * a * half * half)) * (1 + 0.6095 * q + 0.8865 * q * q - 1.8023 * q ** 3 + 0.91 * q ** 4);
      const torsion = rectangleTorsion(2 * a, 2 * half);
      expect(Math.abs(torsion.torsionConstant / roarkJ - 1)).toBeLessThan(0.005);
      expect(Math.abs(torsion.torsionalShearPerTorque / roarkTau - 1)).toBeLessThan(0.005);
    }
  });

  it('approaches the thin strip a b^3 / 3 (1 - 0.630 b / a) and tau = 3 T / (a b^2)', () => {
    // For a >> b every tanh is 1: J = (a b^3 / 3)(1 - (192 / pi^5)(31 / 32) zeta(5) b / a).
    const a = 1;
    const b = 0.001;
    const torsion = rectangleTorsion(b, a);
    const expected = ((a * b ** 3) / 3) * (1 - (192 / Math.PI ** 5) * ODD_RECIPROCAL_FIFTH_POWERS * (b / a));
    expect(torsion.torsionConstant / expected).toBeCloseTo(1, 12);
    expect(torsion.torsionalShearPerTorque * ((a * b * b) / 3)).toBeCloseTo(1 / (1 - 0.630249 * (b / a)), 6);
  });

  it('does not depend on which side is named first', () => {
    expect(rectangleTorsion(0.03, 0.05)).toEqual(rectangleTorsion(0.05, 0.03));
  });
});
