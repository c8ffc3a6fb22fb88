import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { angleParts } from '../../../src/engine/sections/angle.js';
import { boxParts } from '../../../src/engine/sections/box.js';
import { channelParts } from '../../../src/engine/sections/channel.js';
import { summariseRegion, type ShearCut } from '../../../src/engine/sections/composite-region.js';
import { iSectionParts } from '../../../src/engine/sections/i-section.js';
import { RegionAlong } from '../../../src/engine/sections/region-along.js';
import { chordAt, extentAlong, integralsBelow, rectanglePart, type Coordinate, type RegionPart } from '../../../src/engine/sections/region-parts.js';
import { ShearCutSearch } from '../../../src/engine/sections/shear-cut-search.js';
import { teeParts } from '../../../src/engine/sections/tee.js';

/**
 * The plain search, part by part: the centroid, every stretch end, and every stretch a curved part
 * spans sampled at 23 points and refined by golden section, with no bound to pass over a stretch.
 */
function plainShearCut(parts: readonly RegionPart[], shear: Coordinate, centroid: number): ShearCut {
  const total = (cut: number) => {
    let area = 0;
    let firstMoment = 0;
    for (const part of parts) {
      const piece = integralsBelow(part, shear, cut);
      area += piece.area;
      firstMoment += piece.firstMoment;
    }
    return { area, firstMoment };
  };
  const whole = total(Infinity);
  let min = Infinity;
  let max = -Infinity;
  for (const part of parts) {
    const [low, high] = extentAlong(part, shear);
    min = Math.min(min, low);
    max = Math.max(max, high);
  }
  const scale = max - min;
  const cutAt = (at: number, side: 'below' | 'above'): ShearCut => {
    const below = total(at);
    const q = at >= centroid ? whole.firstMoment - below.firstMoment - centroid * (whole.area - below.area) : centroid * below.area - below.firstMoment;
    let width = 0;
    for (const part of parts) width += chordAt(part, shear, at, side);
    return { firstMoment: Math.max(0, q), width: Math.max(0, width) };
  };
  const ratio = (cut: ShearCut) => (cut.width > scale * 1e-12 ? cut.firstMoment / cut.width : 0);
  const edges = new Set([min, max, centroid]);
  for (const part of parts) for (const edge of extentAlong(part, shear)) edges.add(edge);
  const sorted = [...edges].filter((edge) => edge >= min && edge <= max).sort((a, b) => a - b);
  let best = cutAt(centroid, 'above');
  const consider = (candidate: ShearCut) => {
    if (ratio(candidate) > ratio(best)) best = candidate;
  };
  consider(cutAt(centroid, 'below'));
  const golden = (Math.sqrt(5) - 1) / 2;
  for (let index = 0; index + 1 < sorted.length; index++) {
    const start = sorted[index] as number;
    const end = sorted[index + 1] as number;
    if (!(end - start > scale * 1e-12)) continue;
    consider(cutAt(start, 'above'));
    consider(cutAt(end, 'below'));
    const curved = parts.some((part) => {
      const [low, high] = extentAlong(part, shear);
      return part.kind === 'quarter-disc' && low <= start && high >= end;
    });
    if (!curved) continue;
    const positions = Array.from({ length: 23 }, (_, k) => start + ((end - start) * (k + 1)) / 24);
    let bestIndex = 0;
    let bestValue = -Infinity;
    positions.forEach((position, k) => {
      const value = ratio(cutAt(position, 'above'));
      if (value > bestValue) {
        bestValue = value;
        bestIndex = k;
      }
    });
    let low = positions[bestIndex - 1] ?? start;
    let high = positions[bestIndex + 1] ?? end;
    let left = high - golden * (high - low);
    let right = low + golden * (high - low);
    let leftValue = ratio(cutAt(left, 'above'));
    let rightValue = ratio(cutAt(right, 'above'));
    for (let step = 0; step < 200 && high - low > scale * 1e-10; step++) {
      if (leftValue >= rightValue) {
        high = right;
        right = left;
        rightValue = leftValue;
        left = high - golden * (high - low);
        leftValue = ratio(cutAt(left, 'above'));
      } else {
        low = left;
        left = right;
        leftValue = rightValue;
        right = low + golden * (high - low);
        rightValue = ratio(cutAt(right, 'above'));
      }
    }
    consider(cutAt((low + high) / 2, 'above'));
  }
  return best;
}

const search = (parts: readonly RegionPart[], shear: Coordinate, centroid: number) =>
  new ShearCutSearch(new RegionAlong(parts, shear), centroid).governing();

describe('ShearCutSearch', () => {
  it('cuts a rectangle at its centroid: Q = b h^2 / 8 over b (Roark 8th ed., Table A.1)', () => {
    // 40 x 100 mm: Q = 0.04 * 0.1^2 / 8 = 5e-5 m^3 over b = 0.04 m.
    const cut = search([rectanglePart(0, 0.1, 0, 0.04)], 'y', 0.05);
    expect(cut.firstMoment).toBeCloseTo(5e-5, 15);
    expect(cut.width).toBeCloseTo(0.04, 15);
  });

  const millimetres = (min: number, max: number) => fc.double({ min, max, noNaN: true }).map((value) => value / 1000);
  const outlines = fc.oneof(
    fc
      .tuple(millimetres(60, 600), millimetres(40, 300), millimetres(3, 20), millimetres(4, 30), millimetres(0, 30))
      .filter(([h, b, tw, tf, r]) => tw + 2 * r < b && 2 * tf + 2 * r < h)
      .map(([h, b, tw, tf, r]) => iSectionParts(h, b, tw, tf, r)),
    fc
      .tuple(millimetres(60, 400), millimetres(40, 300), millimetres(1, 12), fc.double({ min: 0, max: 3, noNaN: true }))
      .filter(([h, b, t, k]) => 2 * t < Math.min(b, h) && 2 * k * t <= Math.min(b, h))
      .map(([h, b, t, k]) => boxParts(h, b, t, k * t)),
    fc
      .tuple(millimetres(40, 300), millimetres(40, 300), millimetres(3, 20), millimetres(3, 20), millimetres(0, 20))
      .filter(([h, b, tw, tf, r]) => tw + 2 * r < b && tf + r < h)
      .map(([h, b, tw, tf, r]) => teeParts(h, b, tw, tf, r)),
    fc
      .tuple(millimetres(30, 200), millimetres(30, 200), millimetres(3, 20), millimetres(0, 20))
      .filter(([legY, legZ, t, r]) => t + r < Math.min(legY, legZ))
      .map(([legY, legZ, t, r]) => angleParts(legY, legZ, t, r)),
    fc
      .tuple(millimetres(60, 400), millimetres(30, 120), millimetres(3, 15), millimetres(4, 20), millimetres(0, 20))
      .filter(([h, b, tw, tf, r]) => tw + r < b && 2 * tf + 2 * r < h)
      .map(([h, b, tw, tf, r]) => channelParts(h, b, tw, tf, r)),
  );

  it('finds the very cut of the plain search, passing over only stretches that cannot hold it (property)', () => {
    fc.assert(
      fc.property(outlines, (parts) => {
        const region = summariseRegion(parts);
        expect(search(parts, 'y', region.centroidY)).toStrictEqual(plainShearCut(parts, 'y', region.centroidY));
        expect(search(parts, 'z', region.centroidZ)).toStrictEqual(plainShearCut(parts, 'z', region.centroidZ));
      }),
      { numRuns: 150 },
    );
  });
});
