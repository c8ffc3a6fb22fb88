import { describe, expect, it } from 'vitest';
import { EngineError } from '../../../src/engine/engine-error.js';
import type { TeeDimensions } from '../../../src/engine/sections/dimensions.js';
import { teeProperties } from '../../../src/engine/sections/tee.js';

const near = (actual: number, expected: number, relative = 1e-12) =>
  expect(Math.abs(actual / expected - 1)).toBeLessThan(relative);

// Millimetres throughout.
const tee = (h: number, b: number, tw: number, tf: number, r?: number): TeeDimensions => ({
  shape: 'tee',
  depth: h,
  flangeWidth: b,
  webThickness: tw,
  flangeThickness: tf,
  ...(r === undefined ? {} : { rootRadius: r }),
});

describe('a tee 100 deep, flange 100 x 10, stem 10, no fillets (mm)', () => {
  const p = teeProperties(tee(100, 100, 10, 10));
  // Flange 1000 at y = 95, stem 900 at y = 45: centroid (95 000 + 40 500) / 1900 = 71.316 from the bottom.
  const cy = 135500 / 1900;

  it('has A, centroid and second moments by parallel axes', () => {
    near(p.area, 1900);
    near(p.centroidY, cy);
    expect(p.centroidZ).toBe(50);
    near(p.secondMomentZ, (100 * 10 ** 3) / 12 + 1000 * (95 - cy) ** 2 + (10 * 90 ** 3) / 12 + 900 * (45 - cy) ** 2);
    near(p.secondMomentY, (10 * 100 ** 3) / 12 + (90 * 10 ** 3) / 12);
    near(p.fibreDistanceTop, 100 - cy);
    near(p.sectionModulusZ, p.secondMomentZ / cy);
  });

  it('has its plastic axis in the flange at y = 90.5: Wpl = 45 475 mm^3', () => {
    // Half the area 950 = stem 900 + 100 (c - 90), c = 90.5; Wpl = 900 (90.5 - 45) + 100 * 0.5 * 0.25
    // + 100 * 9.5 * 4.75 = 40 950 + 12.5 + 4 512.5. About y: tf b^2 / 4 + (h - tf) tw^2 / 4 = 27 250.
    near(p.plasticModulusZ, 45475, 1e-11);
    near(p.plasticModulusY, 27250, 1e-11);
  });

  it('peaks in shear in the stem at the neutral axis: Q = tw cy^2 / 2', () => {
    near(p.shearFirstMomentY, (10 * cy * cy) / 2, 1e-10);
    near(p.shearWidthY, 10, 1e-10);
  });

  it('has J = K_flange + K_stem + alpha D^4 (Roark 8th ed., Table 10.7, T-section; from memory)', () => {
    const flange = 100 * 1000 * (1 / 3 - 0.021 * (1 - 1e-4 / 12));
    const q = 10 / 90;
    const stem = 90 * 1000 * (1 / 3 - 0.105 * q * (1 - q ** 4 / 192));
    const junction = 0.15 * 12.5 ** 4; // alpha = 1 * 0.15, D = (10^2 + 10 * 2.5) / 10
    near(p.torsionConstant, flange + stem + junction, 1e-12);
    near(p.torsionalShearPerTorque, 10 / p.torsionConstant);
  });

  it('has six hull corners as stress points', () => {
    expect(p.stressPoints).toHaveLength(6);
    expect(p.stressPoints.map((point) => point.y).sort((a, b) => a - b)[0]).toBeCloseTo(-cy, 12);
    expect(p.warpingConstant).toBe(0);
  });
});

describe('where the shear peaks in other tees', () => {
  it('in the stem at the junction when the neutral axis lies in a wide flange', () => {
    // Flange 200 x 20 over a 40 long stem of 10: centroid 47.27 (in the flange); below the junction
    // the stem has Q = 400 (47.27 - 20) over b = 10.
    const p = teeProperties(tee(60, 200, 10, 20));
    const cy = 208000 / 4400;
    near(p.centroidY, cy);
    near(p.shearFirstMomentY, 400 * (cy - 20), 1e-9);
    near(p.shearWidthY, 10, 1e-10);
  });

  it('along a thin wide flange beyond a thick stem', () => {
    // Flange 300 x 5, stem 30 x 95: centroid (1500 * 97.5 + 2850 * 47.5) / 4350 = 64.74. Stem at the
    // neutral axis: Q / b = cy^2 / 2 = 2096; each outstand: Q = 5 * 135 (97.5 - cy) over b = 5, Q / b = 4423.
    const p = teeProperties(tee(100, 300, 30, 5));
    const cy = (1500 * 97.5 + 2850 * 47.5) / 4350;
    near(p.shearFirstMomentY, 5 * 135 * (97.5 - cy), 1e-12);
    expect(p.shearWidthY).toBe(5);
  });
});

describe('teeProperties refuses impossible geometry', () => {
  const cases: readonly [TeeDimensions, string][] = [
    [tee(100, 100, 10, 100), 'flangeThickness'],
    [tee(100, 100, 120, 10), 'webThickness'],
    [tee(100, 100, 10, 10, 46), 'rootRadius'],
    [tee(100, 100, 10, 10, -1), 'rootRadius'],
    [tee(0, 100, 10, 10), 'depth'],
  ];
  for (const [dimensions, field] of cases) {
    it(`names ${field}`, () => {
      try {
        teeProperties(dimensions);
        expect.unreachable();
      } catch (error) {
        expect(error).toBeInstanceOf(EngineError);
        expect((error as EngineError).path).toEqual(['section', field]);
      }
    });
  }
});
