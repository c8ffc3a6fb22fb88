import { describe, expect, it } from 'vitest';
import { analyseMember } from '../../../src/engine/analysis/analyse-member.js';
import { fieldAt } from '../../../src/engine/analysis/field-values.js';
import { fixedAt, memberModel, pinnedAt, pointLoad, rollerAt, supportAt } from '../member/model-builders.js';

const P = 1000;

describe('support reactions', () => {
  it('gives a node reaction to the first rigid support there, none to a second one', () => {
    // A 4 m simple span with two rollers at 4 m: statics gives 500 N at each end.
    const a = analyseMember(memberModel(4, [pinnedAt(0), rollerAt(4), rollerAt(4)], [pointLoad(2, { fy: -P })]));
    expect(a.reactions[1]?.fy).toBeCloseTo(P / 2, 9);
    expect(a.reactions[2]?.fy).toBe(0);
  });

  it('gives a spring -k times its displacement and a rigid support beside it the rest', () => {
    // At a rigidly held node the spring does not move, so it carries nothing.
    const spring = supportAt(4, { uy: { spring: 1e6 } });
    const a = analyseMember(memberModel(4, [pinnedAt(0), rollerAt(4), spring], [pointLoad(2, { fy: -P })]));
    expect(a.reactions[2]?.fy).toBe(0);
    expect(a.reactions[1]?.fy).toBeCloseTo(P / 2, 9);
    // Alone, the spring carries its statical share, -k v.
    const b = analyseMember(memberModel(4, [pinnedAt(0), spring], [pointLoad(2, { fy: -P })]));
    expect(b.reactions[1]?.fy).toBeCloseTo(P / 2, 9);
    expect(b.reactions[1]?.fy).toBeCloseTo(-1e6 * fieldAt(b, 'deflectionY', 4), 9);
  });

  it('reports no bending moment at a hinge, whatever the support there restrains', () => {
    // A fixed support at a hinge acts on the pin: the members on either side turn freely.
    const a = analyseMember(
      memberModel(8, [pinnedAt(0), fixedAt(4), rollerAt(8)], [pointLoad(2, { fy: -P }), pointLoad(6, { fy: -P })], {
        hinges: [4],
      }),
    );
    expect(a.reactions[1]?.mz).toBe(0);
    expect(a.reactions[1]?.my).toBe(0);
    // Two simple spans of 4 m, each with P at mid-span: P/2 at the ends, P in the middle.
    expect(a.reactions[0]?.fy).toBeCloseTo(P / 2, 9);
    expect(a.reactions[1]?.fy).toBeCloseTo(P, 9);
  });

  it('reports reactions in model order with their positions, and no -0', () => {
    const a = analyseMember(memberModel(4, [rollerAt(4), pinnedAt(0)], [pointLoad(1, { fy: -P })]));
    expect(a.reactions.map((r) => r.position)).toEqual([4, 0]);
    // Statics: the roller takes P/4, the pin 3P/4.
    expect(a.reactions[0]?.fy).toBeCloseTo(P / 4, 9);
    expect(a.reactions[1]?.fy).toBeCloseTo((3 * P) / 4, 9);
    for (const r of a.reactions) for (const v of Object.values(r)) expect(Object.is(v, -0)).toBe(false);
  });
});
