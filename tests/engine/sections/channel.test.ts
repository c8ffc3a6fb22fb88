import { describe, expect, it } from 'vitest';
import { EngineError } from '../../../src/engine/engine-error.js';
import { channelProperties } from '../../../src/engine/sections/channel.js';
import type { ChannelDimensions } from '../../../src/engine/sections/dimensions.js';

const near = (actual: number, expected: number, relative = 1e-12) =>
  expect(Math.abs(actual / expected - 1)).toBeLessThan(relative);

// Millimetres throughout, so the hand arithmetic reads as written.
const channel = (h: number, b: number, tw: number, tf: number, r?: number): ChannelDimensions => ({
  shape: 'channel',
  depth: h,
  flangeWidth: b,
  webThickness: tw,
  flangeThickness: tf,
  ...(r === undefined ? {} : { rootRadius: r }),
});

describe('a channel 200 x 80, web 6, flanges 11, no fillets (mm)', () => {
  const p = channelProperties(channel(200, 80, 6, 11));
  // Flanges 2 x 80 x 11 = 1760 at z = 40; web 178 x 6 = 1068 at z = 3.
  const area = 2828;
  const cz = (1760 * 40 + 1068 * 3) / area; // 26.0269

  it('has A, centroid and second moments by parallel axes', () => {
    near(p.area, area);
    near(p.centroidZ, cz);
    expect(p.centroidY).toBe(100);
    near(p.secondMomentZ, (80 * 200 ** 3 - 74 * 178 ** 3) / 12); // 1.85549e7 mm^4
    near(p.secondMomentY, 2 * ((11 * 80 ** 3) / 12 + 880 * (40 - cz) ** 2) + (178 * 6 ** 3) / 12 + 1068 * (3 - cz) ** 2);
    near(p.fibreDistanceNegativeZ, cz);
    near(p.fibreDistancePositiveZ, 80 - cz);
    near(p.sectionModulusY, p.secondMomentY / (80 - cz));
  });

  it('has its plastic axis about y off the centroid, at z = 15.727', () => {
    // Half the area 1414: z in [0, 6] holds 200 * 6 = 1200; the flanges (22 high) the other 214,
    // so c = 6 + 214 / 22. Wpl = 200 (6 c - 18) + 11 (c - 6)^2 + 11 (80 - c)^2.
    const c = 6 + 214 / 22;
    near(p.plasticModulusY, 200 * (6 * c - 18) + 11 * (c - 6) ** 2 + 11 * (80 - c) ** 2, 1e-10);
    // About z it is symmetric: b tf (h - tf) + tw hw^2 / 4 = 166 320 + 47 526.
    near(p.plasticModulusZ, 213846, 1e-11);
  });

  it('peaks in shear in the web for Vy and in the flanges at the centroid for Vz', () => {
    near(p.shearFirstMomentY, 213846 / 2, 1e-10);
    near(p.shearWidthY, 6, 1e-10);
    // The centroid lies in the flanges (cz > tw): Q = 2 * 11 (80 - cz)^2 / 2 over b = 22.
    near(p.shearFirstMomentZ, 11 * (80 - cz) ** 2, 1e-9);
    near(p.shearWidthZ, 22, 1e-10);
  });

  it('has J from the plates and two corner junctions (Roark 8th ed., Table 10.7, L-section; from memory)', () => {
    const q = 11 / 80;
    const flange = 80 * 11 ** 3 * (1 / 3 - 0.21 * q * (1 - q ** 4 / 12));
    const web = (178 * 6 ** 3) / 3;
    const diameter = 2 * (17 - Math.sqrt(2 * 11 * 6)); // D = 2 [(tf + tw) - sqrt(2 tf tw)] with r = 0
    const junction = (6 / 11) * 0.07 * diameter ** 4;
    near(p.torsionConstant, 2 * flange + web + 2 * junction, 1e-12);
    near(p.torsionalShearPerTorque, 11 / p.torsionConstant);
  });

  it('has the thin-walled warping constant (AISC Design Guide 9, channel; from memory)', () => {
    // b' = 80 - 3 = 77, h' = 200 - 11 = 189.
    const expected = ((11 * 77 ** 3 * 189 ** 2) / 12) * ((3 * 77 * 11 + 2 * 189 * 6) / (6 * 77 * 11 + 189 * 6));
    near(p.warpingConstant, expected);
  });

  it('has the web back and the flange tips as stress points', () => {
    expect(p.stressPoints.map((point) => [point.y, point.z])).toEqual([
      [100, 80 - cz],
      [100, -cz],
      [-100, 80 - cz],
      [-100, -cz],
    ]);
    expect(p.thickestElement).toBe(11);
    expect(p.closed).toBe(false);
  });
});

describe('root fillets of a channel', () => {
  it('add 2 (1 - pi/4) r^2 and raise J by the fillet term', () => {
    const bare = channelProperties(channel(200, 80, 6, 11, 0));
    const filleted = channelProperties(channel(200, 80, 6, 11, 13));
    near(filleted.area - bare.area, 2 * (1 - Math.PI / 4) * 169, 1e-10);
    expect(filleted.centroidZ).toBeGreaterThan(0);
    expect(filleted.torsionConstant).toBeGreaterThan(bare.torsionConstant);
  });
});

describe('channelProperties refuses impossible geometry', () => {
  const cases: readonly [ChannelDimensions, string][] = [
    [channel(200, 80, 6, 100), 'flangeThickness'],
    [channel(200, 80, 80, 11), 'webThickness'],
    [channel(200, 80, 6, 11, 75), 'rootRadius'],
    [channel(200, 80, 6, 11, -2), 'rootRadius'],
    [channel(200, -80, 6, 11), 'flangeWidth'],
  ];
  for (const [dimensions, field] of cases) {
    it(`names ${field}`, () => {
      try {
        channelProperties(dimensions);
        expect.unreachable();
      } catch (error) {
        expect(error).toBeInstanceOf(EngineError);
        expect((error as EngineError).path).toEqual(['section', field]);
      }
    });
  }
});
