import { describe, expect, it } from 'vitest';
import { angleProperties } from '../../../src/engine/sections/angle.js';
import { channelProperties } from '../../../src/engine/sections/channel.js';
import type { AngleDimensions, ChannelDimensions, TeeDimensions } from '../../../src/engine/sections/dimensions.js';
import { iSectionProperties } from '../../../src/engine/sections/i-section.js';
import {
  angleWarpingConstantWithThickness,
  channelShearCentreDistance,
  channelWarpingConstant,
  shearCentreOf,
  teeWarpingConstantWithThickness,
} from '../../../src/engine/sections/shear-centre.js';
import { teeProperties } from '../../../src/engine/sections/tee.js';

const MM = 1e-3;
const near = (actual: number, expected: number, relative = 1e-12) =>
  expect(Math.abs(actual / expected - 1)).toBeLessThan(relative);

/**
 * An independent check by thin-walled sectorial theory (Vlasov; Trahair, Flexural-Torsional Buckling
 * of Structures, 1993, ch. 5; from memory): along a polyline of plates, the sectorial coordinate about
 * a pole P grows on each straight plate from A to B by (A - P) x (B - A); the warping constant about P
 * is the integral of (omega - mean omega)^2 t ds. It is a quadratic in the pole, least at the shear
 * centre. omega is linear on a plate: int omega ds = L (w0 + w1) / 2, int omega^2 ds = L (w0^2 + w0 w1 + w1^2) / 3.
 */
interface Plate {
  readonly from: readonly [number, number];
  readonly to: readonly [number, number];
  readonly thickness: number;
}

function warpingAboutPole(plates: readonly Plate[], pole: readonly [number, number], chainStart: readonly [number, number]): number {
  // The plates are listed in chains from chainStart: each begins where an earlier one ended (or at chainStart).
  const omegaAt = new Map<string, number>([[chainStart.join(','), 0]]);
  let area = 0;
  let first = 0;
  let second = 0;
  for (const plate of plates) {
    const w0 = omegaAt.get(plate.from.join(','));
    if (w0 === undefined) throw new Error('plates must be chained');
    const [z0, y0] = plate.from;
    const [z1, y1] = plate.to;
    const w1 = w0 + (z0 - pole[0]) * (y1 - y0) - (y0 - pole[1]) * (z1 - z0);
    omegaAt.set(plate.to.join(','), w1);
    const length = Math.hypot(z1 - z0, y1 - y0);
    area += plate.thickness * length;
    first += (plate.thickness * length * (w0 + w1)) / 2;
    second += (plate.thickness * length * (w0 * w0 + w0 * w1 + w1 * w1)) / 3;
  }
  return second - first ** 2 / area;
}

describe('a plain channel 100 x 50 x 3 mm, no fillets (the flexural-torsional example)', () => {
  const dimensions: ChannelDimensions = { shape: 'channel', depth: 100 * MM, flangeWidth: 50 * MM, webThickness: 3 * MM, flangeThickness: 3 * MM };
  const centre = shearCentreOf(dimensions, channelProperties(dimensions))!;
  // Mid-line: b' = 50 - 1.5 = 48.5, h' = 100 - 3 = 97 (mm).
  // e = 3 b'^2 tf / (6 b' tf + h' tw) = 3 * 2352.25 * 3 / (873 + 291) = 21170.25 / 1164 = 18.1875 mm.
  // Cross-check e = b'^2 h'^2 tf / (4 Iz'), Iz' = 3 * 97^3 / 12 + 2 * 48.5 * 3 * 48.5^2 = 228168.25 + 684504.75
  //   = 912673 mm^4: 2352.25 * 9409 * 3 / 3650692 = 18.1875 mm.
  it('lies e = 18.1875 mm behind the web mid-line', () => {
    near(channelShearCentreDistance(dimensions), 18.1875 * MM);
    near(((48.5 * 97) ** 2 * 3) / (4 * 912673), 18.1875, 1e-12);
  });

  it('sits 30.3009 mm from the centroid on the web side, on the axis of symmetry', () => {
    // Centroid (outline): flanges 2 * 150 at z = 25, web 94 * 3 = 282 at z = 1.5: cz = 7923 / 582 = 13.61340 mm.
    // z_S = 1.5 - 18.1875 = -16.6875 mm, so z0 = -16.6875 - 13.61340 = -30.30090 mm; y0 = 50 - 50 = 0.
    near(centre.offsetZ, (1.5 - 18.1875 - 7923 / 582) * MM);
    near(centre.offsetZ, -30.30090 * MM, 1e-6);
    expect(centre.offsetY).toBe(0);
  });

  it('has Iw = 2.34810e8 mm^6 (AISC DG9 form), the least sectorial warping constant, at the shear centre', () => {
    // tf b'^3 h'^2 / 12 * (3 b' tf + 2 h' tw) / (6 b' tf + h' tw)
    //   = 3 * 114084.125 * 9409 / 12 * (436.5 + 582) / 1164 = 2.683544e8 * 0.875 = 2.348101e8 mm^6.
    near(channelWarpingConstant(dimensions), 2.3481008515e8 * MM ** 6, 1e-10);
    expect(centre.warpingConstant).toBe(channelWarpingConstant(dimensions));
    // The same from sectorial coordinates (mm; web mid-line at z = 0): the quadratic in the pole's z has
    // its vertex at z = -e, where it takes the value Iw.
    const plates: Plate[] = [
      { from: [48.5, 48.5], to: [0, 48.5], thickness: 3 },
      { from: [0, 48.5], to: [0, -48.5], thickness: 3 },
      { from: [0, -48.5], to: [48.5, -48.5], thickness: 3 },
    ];
    const at = (z: number) => warpingAboutPole(plates, [z, 0], [48.5, 48.5]);
    const [f0, f1, f2] = [at(-40), at(-20), at(0)];
    const vertex = -20 - (20 * (f2 - f0)) / (2 * (f2 - 2 * f1 + f0));
    near(vertex, -18.1875, 1e-9);
    near(at(vertex), 2.3481008515e8, 1e-9);
  });
});

describe('a tee 100 x 100, flange 10, stem 8, no fillets', () => {
  const dimensions: TeeDimensions = { shape: 'tee', depth: 100 * MM, flangeWidth: 100 * MM, webThickness: 8 * MM, flangeThickness: 10 * MM };
  const centre = shearCentreOf(dimensions, teeProperties(dimensions))!;

  it('has its shear centre where the flange and stem mid-lines meet, 20.93 mm above the centroid', () => {
    // Flange 1000 mm^2 at y = 95, stem 90 * 8 = 720 at y = 45: cy = 127400 / 1720 = 74.06977 mm.
    // Mid-lines meet at y = 100 - 5 = 95, z = 50: y0 = 95 - 74.06977 = 20.93023 mm, z0 = 0.
    near(centre.offsetY, (95 - 127400 / 1720) * MM);
    expect(Math.abs(centre.offsetZ)).toBeLessThan(1e-15);
  });

  it('has no mid-line warping, and tf^3 b^3 / 144 + tw^3 (h - tf/2)^3 / 36 with the thickness', () => {
    // 1000 * 1e6 / 144 + 512 * 857375 / 36 = 6944444.4 + 12193777.8 = 19138222.2 mm^6.
    expect(centre.warpingConstant).toBe(0);
    near(teeWarpingConstantWithThickness(dimensions), 19138222.222 * MM ** 6, 1e-10);
    expect(centre.warpingConstantWithThickness).toBe(teeWarpingConstantWithThickness(dimensions));
  });
});

describe('an equal angle 60 x 60 x 6, no fillet', () => {
  const dimensions: AngleDimensions = { shape: 'angle', legY: 60 * MM, legZ: 60 * MM, thickness: 6 * MM };
  const centre = shearCentreOf(dimensions, angleProperties(dimensions))!;

  it('has its shear centre at the heel (3, 3) mm, 14.21 mm from the centroid along both axes', () => {
    // Leg along y 360 mm^2 at (y 30, z 3), leg along z 54 * 6 = 324 at (y 3, z 33): cy = cz = 11772 / 684
    // = 17.21053 mm. y0 = z0 = 3 - 17.21053 = -14.21053 mm.
    near(centre.offsetY, (3 - 11772 / 684) * MM);
    near(centre.offsetZ, (3 - 11772 / 684) * MM);
  });

  it('is the pole of least warping: 0 at the heel, more anywhere else', () => {
    const plates: Plate[] = [
      { from: [3, 3], to: [3, 60], thickness: 6 },
      { from: [3, 3], to: [60, 3], thickness: 6 },
    ];
    expect(Math.abs(warpingAboutPole(plates, [3, 3], [3, 3]))).toBeLessThan(1e-9);
    expect(warpingAboutPole(plates, [3.5, 3], [3, 3])).toBeGreaterThan(1);
    expect(warpingAboutPole(plates, [3, 2.5], [3, 3])).toBeGreaterThan(1);
  });

  it('has through-thickness warping t^3 (b\'^3 + d\'^3) / 36 = 2.222316e6 mm^6', () => {
    // 216 * 2 * 57^3 / 36 = 12 * 185193 = 2222316 mm^6.
    near(angleWarpingConstantWithThickness(dimensions), 2222316 * MM ** 6, 1e-12);
    expect(centre.warpingConstant).toBe(0);
  });
});

describe('doubly symmetric and unknown shapes', () => {
  it('puts the shear centre of an I at its centroid with Iw = tf b^3 (h - tf)^2 / 24', () => {
    const dimensions = { shape: 'i-section' as const, depth: 0.2, flangeWidth: 0.1, webThickness: 0.0056, flangeThickness: 0.0085, rootRadius: 0.012 };
    const centre = shearCentreOf(dimensions, iSectionProperties(dimensions))!;
    expect(centre.offsetY).toBe(0);
    expect(centre.offsetZ).toBe(0);
    // IPE 200: 8.5 * 100^3 * 191.5^2 / 24 = 8.5e6 * 36672.25 / 24 = 1.298809e10 mm^6 (EN 10365 tabulates 12.99e9 mm^6; from memory).
    near(centre.warpingConstant, 1.298809e10 * MM ** 6, 1e-6);
    near(centre.warpingConstant, iSectionProperties(dimensions).warpingConstant);
  });

  it('puts it at the centroid of a box and a tube, and knows none for a custom section', () => {
    expect(shearCentreOf({ shape: 'box', width: 0.1, depth: 0.2, wallThickness: 0.005 }, { centroidY: 0.1, centroidZ: 0.05 })).toEqual({
      offsetY: 0,
      offsetZ: 0,
      warpingConstant: 0,
      warpingConstantWithThickness: 0,
    });
    expect(shearCentreOf({ shape: 'tube', outerDiameter: 0.1, wallThickness: 0.004 }, { centroidY: 0.05, centroidZ: 0.05 })?.offsetY).toBe(0);
    expect(shearCentreOf({ shape: 'custom', area: 1e-3, secondMomentZ: 1e-6, secondMomentY: 1e-7, torsionConstant: 1e-9 }, { centroidY: 0, centroidZ: 0 })).toBeNull();
  });
});
