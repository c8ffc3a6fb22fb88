import { describe, expect, it } from 'vitest';
import { buildMemberNodes } from '../../../src/engine/analysis/member-nodes.js';
import { memberProblems } from '../../../src/engine/analysis/member-problems.js';
import { solveBar } from '../../../src/engine/analysis/solve-bar.js';
import type { MemberModel } from '../../../src/engine/member/model.js';
import { DEMO_STIFFNESS, distributedLoad, fixedAt, memberModel, pointLoad, rollerAt, supportAt } from '../member/model-builders.js';

function axial(model: MemberModel) {
  const nodes = buildMemberNodes(model);
  return solveBar(nodes, memberProblems(model, nodes).axial);
}

describe('solveBar', () => {
  it('solves a bar fixed at both ends under a uniform axial load: N = q (L/2 - x), u = q x (L - x) / (2 EA)', () => {
    // Symmetry halves the load between the walls: N(0) = qL/2 and dN/dx = -q; integrating N / EA
    // with u(0) = 0 gives the parabola.
    const q = 600;
    const L = 4;
    const result = axial(memberModel(L, [fixedAt(0), fixedAt(L)], [distributedLoad(0, L, { qx: q })]));
    if (result.kind !== 'solved') throw new Error('expected a solution');
    const EA = DEMO_STIFFNESS.axial;
    expect(result.force[0]).toBeCloseTo((q * L) / 2, 9);
    expect(result.force[1]).toBe(-q);
    expect(result.displacement[0]).toBe(0);
    expect(result.displacement[1]).toBeCloseTo((q * L) / (2 * EA), 20);
    expect(result.displacement[2]).toBeCloseTo(-q / (2 * EA), 20);
    expect(result.reaction[0]).toBeCloseTo((-q * L) / 2, 9);
    expect(result.reaction[1]).toBeCloseTo((-q * L) / 2, 9);
  });

  it('gives a free end exactly its point load: N(L-) = P', () => {
    const P = 250;
    const result = axial(memberModel(3, [fixedAt(0), rollerAt(1)], [pointLoad(3, { fx: P })]));
    if (result.kind !== 'solved') throw new Error('expected a solution');
    // The last piece runs from the roller at 1 m to the free end; N is constant P there.
    expect(result.force[3]).toBe(P);
  });

  it('reports a bar held nowhere along x under an axial load as a mechanism', () => {
    const result = axial(memberModel(3, [rollerAt(0), supportAt(3, { uy: 'rigid' })], [pointLoad(1, { fx: 1 })]));
    expect(result).toEqual({ kind: 'mechanism', motion: 'translation', node: 0 });
  });
});
