/**
 * The reaction of every support, from the solved one-dimensional problems. A spring carries
 * -stiffness x displacement; the first rigid support in a direction at a node carries what the node
 * needs beyond its springs; other rigid supports at the same node in that direction carry nothing.
 * At a hinge the bending-rotation restraints hold only the pin, so their moments are zero.
 */

import { DIRECTIONS, type Direction, type MemberModel } from '../member/model.js';
import type { MemberNodes } from './member-nodes.js';
import type { MemberProblems } from './member-problems.js';
import type { SupportReaction } from './result.js';
import type { BarSolution } from './solve-bar.js';
import type { BendingSolution } from './solve-bending.js';

export interface MemberSolutions {
  readonly axial: BarSolution;
  readonly torsion: BarSolution;
  readonly vertical: BendingSolution;
  readonly horizontal: BendingSolution;
}

/** One direction's node totals and displacements, in the reported (right-hand) sign. */
interface DirectionData {
  readonly total: Float64Array;
  readonly displacement: Float64Array;
  readonly springTotal: Float64Array;
  /** -1 for ry, which the horizontal plane solves as dw/dx = -ry. */
  readonly sign: number;
  readonly bendingRotation: boolean;
}

const COMPONENT: Record<Direction, keyof Omit<SupportReaction, 'position'>> = {
  ux: 'fx',
  uy: 'fy',
  uz: 'fz',
  rx: 'mx',
  ry: 'my',
  rz: 'mz',
};

export function supportReactions(
  model: MemberModel,
  nodes: MemberNodes,
  problems: MemberProblems,
  solutions: MemberSolutions,
): SupportReaction[] {
  const { axial, torsion, vertical, horizontal } = solutions;
  const data: Record<Direction, DirectionData> = {
    ux: { total: axial.reaction, displacement: axial.nodalDisplacement, springTotal: problems.axial.spring, sign: 1, bendingRotation: false },
    rx: { total: torsion.reaction, displacement: torsion.nodalDisplacement, springTotal: problems.torsion.spring, sign: 1, bendingRotation: false },
    uy: { total: vertical.reactionForce, displacement: vertical.translation, springTotal: problems.vertical.translationSpring, sign: 1, bendingRotation: false },
    rz: { total: vertical.reactionCouple, displacement: vertical.rotation, springTotal: problems.vertical.rotationSpring, sign: 1, bendingRotation: true },
    uz: { total: horizontal.reactionForce, displacement: horizontal.translation, springTotal: problems.horizontal.translationSpring, sign: 1, bendingRotation: false },
    ry: { total: horizontal.reactionCouple, displacement: horizontal.rotation, springTotal: problems.horizontal.rotationSpring, sign: -1, bendingRotation: true },
  };
  const rigidTaken = new Uint8Array(nodes.count * DIRECTIONS.length);
  return model.supports.map((support, i) => {
    const node = nodes.supportNode[i] as number;
    const reaction = { position: Math.min(model.length, Math.max(0, support.position)), fx: 0, fy: 0, fz: 0, mx: 0, my: 0, mz: 0 };
    DIRECTIONS.forEach((direction, d) => {
      const restraint = support.restraints[direction];
      const { total, displacement, springTotal, sign, bendingRotation } = data[direction];
      if (restraint === 'free' || (bendingRotation && nodes.hinge[node] === 1)) return;
      const motion = sign * (displacement[node] as number);
      if (restraint !== 'rigid') {
        reaction[COMPONENT[direction]] = -restraint.spring * motion;
        return;
      }
      const taken = node * DIRECTIONS.length + d;
      if (rigidTaken[taken] === 1) return;
      rigidTaken[taken] = 1;
      reaction[COMPONENT[direction]] = sign * (total[node] as number) + (springTotal[node] as number) * motion;
    });
    return reaction;
  });
}
