import { describe, expect, it } from 'vitest';
import { analyseMember } from '../../../src/engine/analysis/analyse-member.js';
import { DIAGRAM_FIELDS } from '../../../src/engine/analysis/result.js';
import { sampleDiagrams } from '../../../src/engine/analysis/sample-diagrams.js';
import { distributedLoad, fixedAt, memberModel, pinnedAt, pointLoad, rollerAt } from '../member/model-builders.js';

const P = 1000;

describe('sampleDiagrams', () => {
  it('doubles x where a field jumps, left value first, and keeps the sample count', () => {
    // 6 m simple span, P at 3 m: 11 samples 0.6 m apart include the ends and the load.
    const a = analyseMember(memberModel(6, [pinnedAt(0), rollerAt(6)], [pointLoad(3, { fy: -P })]));
    const { x, values } = sampleDiagrams(a, 11);
    expect(x).toHaveLength(12);
    const at3 = x.indexOf(3);
    expect(x[at3 + 1]).toBe(3);
    // Shear just left of the load is R = P/2, just right R - P = -P/2 (statics).
    expect(values.shearY[at3]).toBeCloseTo(P / 2, 9);
    expect(values.shearY[at3 + 1]).toBeCloseTo(-P / 2, 9);
    expect(values.momentZ[at3]).toBeCloseTo(values.momentZ[at3 + 1] as number, 9);
    // The ends appear once: nothing lies beyond them.
    expect(x.filter((v) => v === 0)).toHaveLength(1);
    expect(x.filter((v) => v === 6)).toHaveLength(1);
  });

  it('adds every node off the sample grid, once where nothing jumps', () => {
    // Load on [0, 2.5]: node 2.5 is not on the grid 0, 1.5, 3, 4.5, 6 and no field jumps there.
    const a = analyseMember(memberModel(6, [pinnedAt(0), rollerAt(6)], [distributedLoad(0, 2.5, { qy: -P })]));
    expect(sampleDiagrams(a, 5).x).toEqual([0, 1.5, 2.5, 3, 4.5, 6]);
  });

  it('doubles an interior support and a hinge, where shear or slope jumps', () => {
    const twoSpans = analyseMember(
      memberModel(8, [pinnedAt(0), rollerAt(4), rollerAt(8)], [distributedLoad(0, 8, { qy: -P })]),
    );
    expect(sampleDiagrams(twoSpans, 3).x).toEqual([0, 4, 4, 8]);
    // Gerber beam: at the hinge shear and moment are continuous but the slope jumps.
    const gerber = analyseMember(
      memberModel(6, [fixedAt(0), rollerAt(6)], [distributedLoad(0, 6, { qy: -P })], { hinges: [2] }),
    );
    const sampled = sampleDiagrams(gerber, 4);
    expect(sampled.x).toEqual([0, 2, 2, 4, 6]);
    expect(sampled.values.slopeZ[1]).not.toBeCloseTo(sampled.values.slopeZ[2] as number, 9);
  });

  it('merges a sample that lies within 1e-9 of the length of a node into it', () => {
    const a = analyseMember(memberModel(6, [pinnedAt(0), rollerAt(6)], [pointLoad(3 + 1e-12, { fy: -P })]));
    const { x } = sampleDiagrams(a, 3);
    expect(x).toEqual([0, 3 + 1e-12, 3 + 1e-12, 6]);
  });

  it('returns at least both ends, only finite numbers and no -0', () => {
    const a = analyseMember(memberModel(6, [fixedAt(0)], [pointLoad(6, { fz: P, mx: 10 })]));
    const sampled = sampleDiagrams(a, 0);
    expect(sampled.x).toEqual([0, 6]);
    const dense = sampleDiagrams(a, 50);
    for (const field of DIAGRAM_FIELDS) {
      expect(dense.values[field]).toHaveLength(dense.x.length);
      for (const v of dense.values[field]) {
        expect(Number.isFinite(v)).toBe(true);
        expect(Object.is(v, -0)).toBe(false);
      }
    }
    // The fields of the unloaded vertical plane are exactly zero.
    expect(dense.values.momentZ.every((v) => v === 0)).toBe(true);
  });
});
