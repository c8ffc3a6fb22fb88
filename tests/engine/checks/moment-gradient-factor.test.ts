import { describe, expect, it } from 'vitest';
import { momentGradientFactor, momentGradientFactorOn } from '../../../src/engine/checks/moment-gradient-factor.js';
import { analysisFrom, simpleSpanUniformLoad } from './fixtures/analyses.js';

describe('momentGradientFactor (AISC 360-16 eq. F1-1, from memory)', () => {
  it('is 1 for a uniform moment', () => {
    expect(momentGradientFactor(5, 5, 5, 5)).toBe(1);
  });

  it('is 1.136 for a simple span under a uniform load', () => {
    // Mmax = w L^2 / 8, MA = MC = 3 w L^2 / 32, MB = w L^2 / 8: 12.5 / 8 / (2.5 / 8 + 6 * 3 / 32 + 4 / 8) = 1.5625 / 1.375.
    expect(momentGradientFactor(1 / 8, 3 / 32, 1 / 8, 3 / 32)).toBeCloseTo(1.13636, 5);
  });

  it('is 1.67 for a moment falling linearly to zero at one end', () => {
    // Mmax = M, MA = 0.25 M, MB = 0.5 M, MC = 0.75 M: 12.5 / (2.5 + 0.75 + 2 + 2.25) = 12.5 / 7.5.
    expect(momentGradientFactor(1, 0.25, 0.5, 0.75)).toBeCloseTo(5 / 3, 12);
  });

  it('is 1 without any moment', () => {
    expect(momentGradientFactor(0, 0, 0, 0)).toBe(1);
  });
});

describe('momentGradientFactorOn', () => {
  it('reads the quarter points from the moment diagram', () => {
    expect(momentGradientFactorOn(simpleSpanUniformLoad(6, 1e3, 1), 0, 6)).toBeCloseTo(1.13636, 5);
  });

  it('takes the larger side of a jump at a quarter point', () => {
    // Mz = 0 on [0, 1) and 4 on [1, 4]: MA at x = 1 reads 4, so Cb = 12.5 * 4 / (10 + 12 + 16 + 12) = 1.
    const analysis = analysisFrom(4, [
      { start: 0, end: 1, fields: { momentZ: [0] } },
      { start: 1, end: 4, fields: { momentZ: [4] } },
    ]);
    expect(momentGradientFactorOn(analysis, 0, 4)).toBe(1);
  });
});
