import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { boxParts } from '../../../src/engine/sections/box.js';
import { iSectionParts } from '../../../src/engine/sections/i-section.js';
import { RegionAlong } from '../../../src/engine/sections/region-along.js';
import { chordAt, integralsBelow, rectanglePart, type Coordinate, type RegionPart } from '../../../src/engine/sections/region-parts.js';

/** IPE 200 (EN 10365, values from memory) and a 100 x 100 x 5 box with 10 mm corners, bounding-box coordinates. */
const OUTLINES: readonly RegionPart[][] = [iSectionParts(0.2, 0.1, 0.0056, 0.0085, 0.012), boxParts(0.1, 0.1, 0.005, 0.01)];

describe('RegionAlong', () => {
  it('integrates a 40 x 100 mm rectangle below y = 30 mm: A = 1.2e-3, first moment A * 0.015, second A * 0.03^2 / 3', () => {
    const below = new RegionAlong([rectanglePart(0, 0.1, 0, 0.04)], 'y').totalBelow(0.03);
    expect(below.area).toBeCloseTo(1.2e-3, 15);
    expect(below.firstMoment).toBeCloseTo(1.2e-3 * 0.015, 15);
    expect(below.secondMoment).toBeCloseTo((1.2e-3 * 0.03 ** 2) / 3, 15);
  });

  const coordinate = fc.constantFrom<Coordinate>('y', 'z');

  it('sums integralsBelow and chordAt part by part to the same numbers (property)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: OUTLINES.length - 1 }), coordinate, fc.double({ min: -0.01, max: 0.21, noNaN: true }), (index, along, cut) => {
        const parts = OUTLINES[index] as RegionPart[];
        let area = 0;
        let firstMoment = 0;
        let secondMoment = 0;
        let chord = 0;
        for (const part of parts) {
          const piece = integralsBelow(part, along, cut);
          area += piece.area;
          firstMoment += piece.firstMoment;
          secondMoment += piece.secondMoment;
          chord += chordAt(part, along, cut, 'above');
        }
        const region = new RegionAlong(parts, along);
        const below = region.totalBelow(cut);
        expect([below.area, below.firstMoment, below.secondMoment]).toStrictEqual([area, firstMoment, secondMoment]);
        expect(region.chordAt(cut, 'above')).toBe(Math.max(0, chord));
      }),
      { numRuns: 300 },
    );
  });

  it('bounds the chord from below strictly inside a stretch that no part edge cuts (property)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: OUTLINES.length - 1 }), coordinate, fc.double({ min: 0.001, max: 0.999, noNaN: true }), fc.nat(), (index, along, fraction, pick) => {
        const region = new RegionAlong(OUTLINES[index] as RegionPart[], along);
        const edges = [...new Set(region.profiles.flatMap((profile) => [profile.min, profile.max]))].sort((a, b) => a - b);
        const i = pick % (edges.length - 1);
        const start = edges[i] as number;
        const end = edges[i + 1] as number;
        const inside = start + (end - start) * fraction;
        expect(region.leastChordBetween(start, end)).toBeLessThanOrEqual(region.chordAt(inside, 'above'));
      }),
      { numRuns: 300 },
    );
  });
});
