import { describe, expect, it } from 'vitest';
import { buildMemberNodes } from '../../../src/engine/analysis/member-nodes.js';
import { memberProblems } from '../../../src/engine/analysis/member-problems.js';
import { distributedLoad, memberModel, pointLoad, supportAt } from '../member/model-builders.js';

describe('memberProblems', () => {
  const model = memberModel(
    4,
    [
      supportAt(0, { ux: 'rigid', uy: 'rigid', uz: { spring: 5 }, ry: { spring: 7 }, rz: 'rigid' }),
      supportAt(0, { uz: { spring: 3 } }),
    ],
    [pointLoad(1, { fx: 1, fy: 2, fz: 3, mx: 4, my: 5, mz: 6 }), distributedLoad(0, 4, { qy: [-2, 2], mx: 1 })],
  );
  const nodes = buildMemberNodes(model);
  const problems = memberProblems(model, nodes);

  it('sends each action to its problem; the horizontal plane takes my as the couple -my', () => {
    // Node 1 is the point load at x = 1.
    expect(problems.axial.pointLoad[1]).toBe(1);
    expect(problems.torsion.pointLoad[1]).toBe(4);
    expect([problems.vertical.pointForce[1], problems.vertical.pointCouple[1]]).toEqual([2, 6]);
    expect([problems.horizontal.pointForce[1], problems.horizontal.pointCouple[1]]).toEqual([3, -5]);
  });

  it('spreads a linear load over the pieces it covers by interpolation', () => {
    // qy from -2 at 0 to 2 at 4: -1 at x = 1, on pieces [0, 1] and [1, 4].
    expect(Array.from(problems.vertical.loadAtStart)).toEqual([-2, -1]);
    expect(Array.from(problems.vertical.loadAtEnd)).toEqual([-1, 2]);
    expect(Array.from(problems.torsion.loadAtStart)).toEqual([1, 1]);
  });

  it('adds the springs of supports at one node and keeps rigid restraints apart', () => {
    expect(problems.horizontal.translationSpring[0]).toBe(8);
    expect(problems.horizontal.rotationSpring[0]).toBe(7);
    expect(problems.vertical.translationRigid[0]).toBe(1);
    expect(problems.vertical.rotationRigid[0]).toBe(1);
    expect(problems.torsion.rigid[0]).toBe(0);
  });

  it('turns a load shorter than the node tolerance into its resultant at one node', () => {
    const short = memberModel(4, [supportAt(0, { uy: 'rigid' })], [distributedLoad(2, 2 + 1e-13, { qy: [1e12, 3e12] })]);
    const shortNodes = buildMemberNodes(short);
    const p = memberProblems(short, shortNodes).vertical;
    // Resultant (1e12 + 3e12) / 2 x 1e-13 = 0.2 N.
    expect(p.pointForce[1]).toBeCloseTo(0.2, 3);
    expect(Array.from(p.loadAtStart).every((v) => v === 0)).toBe(true);
  });
});
