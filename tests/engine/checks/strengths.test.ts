import { describe, expect, it } from 'vitest';
import { DISTORTION_ENERGY_SHEAR_RATIO } from '../../../src/engine/materials/material.js';
import { materialStrengths } from '../../../src/engine/checks/strengths.js';
import { castIron, steel } from './fixtures/materials.js';

describe('materialStrengths', () => {
  it('checks a ductile material against its yield strengths', () => {
    const strengths = materialStrengths(steel, DISTORTION_ENERGY_SHEAR_RATIO);
    expect(strengths.tension).toEqual({ value: 355e6, symbol: 'Sy' });
    expect(strengths.compression).toEqual({ value: 355e6, symbol: 'Syc' });
  });

  it('takes shear yield as 1/sqrt(3) = 0.5774 Sy by distortion energy, near the 0.58 Sy of common practice', () => {
    // Shigley 10th ed., eq. 5-21: Ssy = 0.577 Sy. 355 MPa * 0.57735 = 204.96 MPa; 0.58 gives 205.9 MPa.
    expect(DISTORTION_ENERGY_SHEAR_RATIO).toBeCloseTo(0.57735, 5);
    expect(materialStrengths(steel, DISTORTION_ENERGY_SHEAR_RATIO).shear.value / 1e6).toBeCloseTo(204.96, 2);
    expect(materialStrengths(steel, 0.58).shear.value / 1e6).toBeCloseTo(205.9, 1);
    expect(Math.abs(0.58 - DISTORTION_ENERGY_SHEAR_RATIO) / 0.58).toBeLessThan(0.005);
  });

  it('checks a brittle material against its ultimate strengths, with Sut in shear (modified Mohr in pure shear)', () => {
    const strengths = materialStrengths(castIron, DISTORTION_ENERGY_SHEAR_RATIO);
    expect(strengths.tension).toEqual({ value: 214e6, symbol: 'Sut' });
    expect(strengths.compression).toEqual({ value: 752e6, symbol: 'Suc' });
    expect(strengths.shear).toEqual({ value: 214e6, symbol: 'Sut' });
  });
});
