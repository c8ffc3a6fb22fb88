import { describe, expect, it } from 'vitest';
import { buildMemberNodes } from '../../../src/engine/analysis/member-nodes.js';
import { memberProblems } from '../../../src/engine/analysis/member-problems.js';
import { solveBending, type BendingSolution } from '../../../src/engine/analysis/solve-bending.js';
import type { MemberModel } from '../../../src/engine/member/model.js';
import { DEMO_STIFFNESS, distributedLoad, fixedAt, memberModel, pinnedAt, pointLoad, rollerAt } from '../member/model-builders.js';

function vertical(model: MemberModel) {
  const nodes = buildMemberNodes(model);
  return { nodes, result: solveBending(nodes, memberProblems(model, nodes).vertical) };
}

function solved(result: ReturnType<typeof vertical>['result']): BendingSolution {
  if (result.kind !== 'solved') throw new Error('expected a solution');
  return result;
}

describe('solveBending', () => {
  it('writes shear, moment, slope and deflection of each piece as ascending coefficients', () => {
    // Cantilever, uniform w: V = w (L - x), M = -w (L - x)^2 / 2 (sign rules of result.ts), so at
    // the root V = wL, M = -wL^2/2, slope 0 and deflection 0; EI v'' = M.
    const w = 2e3;
    const L = 3;
    const s = solved(vertical(memberModel(L, [fixedAt(0)], [distributedLoad(0, L, { qy: -w })])).result);
    const EI = DEMO_STIFFNESS.bendingZ;
    expect(Array.from(s.shear)).toEqual([w * L, -w, 0].map((v) => expect.closeTo(v, 6)));
    expect(Array.from(s.moment)).toEqual([(-w * L * L) / 2, w * L, -w / 2, 0].map((v) => expect.closeTo(v, 6)));
    expect(s.slope[0]).toBe(0);
    expect(s.slope[1]).toBeCloseTo((-w * L * L) / 2 / EI, 15);
    expect(s.deflection[0]).toBe(0);
    expect(s.deflection[2]).toBeCloseTo((-w * L * L) / 4 / EI, 15);
  });

  it('gives a free end the shear and moment of statics (the shear exactly 0), not a difference of displacements', () => {
    // Free tip of a propped overhang: V(L-) = 0 and M(L-) = 0 exactly.
    const model = memberModel(7, [pinnedAt(0), rollerAt(5)], [distributedLoad(0, 7, { qy: [-1e3, -3e3] })]);
    const { nodes, result } = vertical(model);
    const s = solved(result);
    const last = nodes.count - 2;
    const h = 2;
    const shearEnd = (s.shear[3 * last] as number) + (s.shear[3 * last + 1] as number) * h + (s.shear[3 * last + 2] as number) * h * h;
    expect(shearEnd).toBe(0);
    const m = s.moment.slice(4 * last, 4 * last + 4);
    expect(Math.abs((m[0] as number) + (m[1] as number) * h + (m[2] as number) * h * h + (m[3] as number) * h ** 3)).toBeLessThanOrEqual(1e-9);
  });

  it('returns zero fields without factorizing an unloaded plane, even one with no supports in it', () => {
    const held = (x: number) => ({ ...pinnedAt(x), restraints: { ...pinnedAt(x).restraints, uy: 'free' as const } });
    const s = solved(vertical(memberModel(4, [held(0), held(4)], [pointLoad(2, { fz: 1 })])).result);
    expect(s.moment.every((v) => v === 0)).toBe(true);
    expect(s.reactionForce.every((v) => v === 0)).toBe(true);
  });

  it('reports a mechanism with its motion and node', () => {
    const { nodes, result } = vertical(memberModel(4, [pinnedAt(0)], [pointLoad(2, { fy: -1 })]));
    expect(result).toEqual({ kind: 'mechanism', motion: 'translation', node: nodes.count - 1 });
  });

  it('reports a couple on a hinge as a turning pin', () => {
    const model = memberModel(4, [fixedAt(0), rollerAt(4)], [pointLoad(2, { mz: 10 })], { hinges: [2] });
    const { result } = vertical(model);
    expect(result).toEqual({ kind: 'mechanism', motion: 'rotation', node: 1 });
  });
});
