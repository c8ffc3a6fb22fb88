import { describe, expect, it } from 'vitest';
import type { SectionDimensions } from '../../src/engine/sections/dimensions.js';
import { overallDepth, overallWidth } from '../../src/catalogues/overall-size.js';

describe('overallDepth and overallWidth', () => {
  // Depth is the extent along y and width along z, read straight from the dimensions (m).
  const cases: readonly (readonly [SectionDimensions, number | undefined, number | undefined])[] = [
    [{ shape: 'rectangle', width: 0.01, depth: 0.1 }, 0.1, 0.01],
    [{ shape: 'round', diameter: 0.02 }, 0.02, 0.02],
    [{ shape: 'tube', outerDiameter: 0.0603, wallThickness: 0.0032 }, 0.0603, 0.0603],
    [{ shape: 'box', width: 0.06, depth: 0.12, wallThickness: 0.004 }, 0.12, 0.06],
    [{ shape: 'i-section', depth: 0.2, flangeWidth: 0.1, webThickness: 0.0056, flangeThickness: 0.0085, rootRadius: 0.012 }, 0.2, 0.1],
    [{ shape: 'channel', depth: 0.16, flangeWidth: 0.07, webThickness: 0.0055, flangeThickness: 0.0095 }, 0.16, 0.07],
    [{ shape: 'tee', depth: 0.05, flangeWidth: 0.1, webThickness: 0.006, flangeThickness: 0.008 }, 0.05, 0.1],
    [{ shape: 'angle', legY: 0.08, legZ: 0.06, thickness: 0.006 }, 0.08, 0.06],
    [{ shape: 'custom', area: 1e-3, secondMomentZ: 1e-6, secondMomentY: 1e-7, torsionConstant: 1e-8, depth: 0.3, width: 0.15 }, 0.3, 0.15],
    [{ shape: 'custom', area: 1e-3, secondMomentZ: 1e-6, secondMomentY: 1e-7, torsionConstant: 1e-8 }, undefined, undefined],
  ];
  for (const [dimensions, depth, width] of cases) {
    it(`reads ${dimensions.shape} as ${depth} deep and ${width} wide`, () => {
      expect(overallDepth(dimensions)).toBe(depth);
      expect(overallWidth(dimensions)).toBe(width);
    });
  }
});
