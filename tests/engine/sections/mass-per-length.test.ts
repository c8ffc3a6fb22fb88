import { describe, expect, it } from 'vitest';
import { massPerLength } from '../../../src/engine/sections/mass-per-length.js';

describe('massPerLength', () => {
  it('gives IPE 200 in steel as 22.4 kg/m (EN 10365, from memory)', () => {
    // 28.48 cm^2 * 7850 kg/m^3 = 22.357 kg/m.
    expect(massPerLength({ area: 28.48e-4 }, 7850)).toBeCloseTo(22.3568, 4);
  });

  it('is linear in the density', () => {
    expect(massPerLength({ area: 1e-3 }, 2700)).toBeCloseTo(2.7, 12);
  });
});
