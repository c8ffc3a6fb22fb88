import { describe, expect, it } from 'vitest';
import { buildMemberNodes } from '../../../src/engine/analysis/member-nodes.js';
import { distributedLoad, memberModel, pinnedAt, pointLoad, rollerAt } from '../member/model-builders.js';

const L = 10;

describe('buildMemberNodes', () => {
  it('puts nodes at the ends, supports, hinges, point loads and the ends of distributed loads, ascending', () => {
    const nodes = buildMemberNodes(
      memberModel(L, [rollerAt(8), pinnedAt(1)], [pointLoad(5, { fy: -1 }), distributedLoad(2, 3, { qy: -1 })], {
        hinges: [6],
      }),
    );
    expect(Array.from(nodes.positions)).toEqual([0, 1, 2, 3, 5, 6, 8, 10]);
    expect(Array.from(nodes.structural)).toEqual([1, 1, 0, 0, 0, 1, 1, 1]);
    expect(Array.from(nodes.hinge)).toEqual([0, 0, 0, 0, 0, 1, 0, 0]);
    expect(Array.from(nodes.supportNode)).toEqual([6, 1]);
    expect(Array.from(nodes.loadStartNode)).toEqual([4, 2]);
    expect(Array.from(nodes.loadEndNode)).toEqual([4, 3]);
  });

  it('merges supports and hinges within 1e-9 of the length, keeping the support position', () => {
    const nodes = buildMemberNodes(memberModel(L, [pinnedAt(4), rollerAt(L)], [], { hinges: [4 + 0.5e-9 * L] }));
    expect(Array.from(nodes.positions)).toEqual([0, 4, L]);
    expect(nodes.hinge[1]).toBe(1);
  });

  it('snaps positions near an end onto the end exactly', () => {
    const nodes = buildMemberNodes(memberModel(L, [pinnedAt(1e-12), rollerAt(L * (1 + 1e-12))], []));
    expect(Array.from(nodes.positions)).toEqual([0, L]);
    expect(Array.from(nodes.supportNode)).toEqual([0, 1]);
  });

  it('merges a load into a node only within 1e-12 of the length: loads are not moved further', () => {
    const model = memberModel(L, [pinnedAt(0), rollerAt(4)], [pointLoad(4 + 1e-13 * L, { fy: -1 }), pointLoad(4 + 1e-10 * L, { fy: -1 })]);
    const nodes = buildMemberNodes(model);
    expect(Array.from(nodes.positions)).toEqual([0, 4, 4 + 1e-10 * L, L]);
    expect(Array.from(nodes.loadStartNode)).toEqual([1, 2]);
  });

  it('maps a distributed load shorter than the load tolerance onto one node', () => {
    const nodes = buildMemberNodes(memberModel(L, [pinnedAt(0), rollerAt(L)], [distributedLoad(5, 5 + 1e-13 * L, { qy: -1 })]));
    expect(nodes.loadStartNode[0]).toBe(nodes.loadEndNode[0]);
    expect(nodes.count).toBe(3);
  });
});
