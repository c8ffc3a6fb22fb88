/**
 * The member split into its four independent one-dimensional problems (small displacements, a
 * straight prismatic member with the shear centre on the centroid): axial (ux, EA), torsion (rx, GJ),
 * bending in the vertical x-y plane (uy and rz, EIz) and bending in the horizontal x-z plane (uz and
 * ry, EIy).
 *
 * The horizontal plane is solved in the frame of the vertical one with z in the place of y: its
 * rotation is dw/dx = -ry, so a right-hand moment my enters as the couple -my; a rotational spring
 * keeps its stiffness.
 */

import type { Direction, MemberModel, Restraint } from '../member/model.js';
import type { MemberNodes } from './member-nodes.js';
import type { BarProblem } from './solve-bar.js';
import type { BendingProblem } from './solve-bending.js';

export interface MemberProblems {
  readonly axial: BarProblem;
  readonly torsion: BarProblem;
  readonly vertical: BendingProblem;
  readonly horizontal: BendingProblem;
}

function barProblem(rigidity: number, nodeCount: number): BarProblem {
  return {
    rigidity,
    pointLoad: new Float64Array(nodeCount),
    loadAtStart: new Float64Array(nodeCount - 1),
    loadAtEnd: new Float64Array(nodeCount - 1),
    rigid: new Uint8Array(nodeCount),
    spring: new Float64Array(nodeCount),
  };
}

function bendingProblem(rigidity: number, nodeCount: number): BendingProblem {
  return {
    rigidity,
    pointForce: new Float64Array(nodeCount),
    pointCouple: new Float64Array(nodeCount),
    loadAtStart: new Float64Array(nodeCount - 1),
    loadAtEnd: new Float64Array(nodeCount - 1),
    translationRigid: new Uint8Array(nodeCount),
    translationSpring: new Float64Array(nodeCount),
    rotationRigid: new Uint8Array(nodeCount),
    rotationSpring: new Float64Array(nodeCount),
  };
}

/** Adds a linear intensity over nodes [first, last] to the per-piece arrays. */
function spreadLinear(
  positions: Float64Array,
  first: number,
  last: number,
  [atFrom, atTo]: readonly [number, number],
  loadAtStart: Float64Array,
  loadAtEnd: Float64Array,
): void {
  if (atFrom === 0 && atTo === 0) return;
  const from = positions[first] as number;
  const span = (positions[last] as number) - from;
  const intensity = (node: number): number => {
    if (node === first) return atFrom;
    if (node === last) return atTo;
    return atFrom + ((atTo - atFrom) * ((positions[node] as number) - from)) / span;
  };
  for (let j = first; j < last; j++) {
    loadAtStart[j] = (loadAtStart[j] as number) + intensity(j);
    loadAtEnd[j] = (loadAtEnd[j] as number) + intensity(j + 1);
  }
}

function restrain(restraint: Restraint, node: number, rigid: Uint8Array, spring: Float64Array): void {
  if (restraint === 'rigid') rigid[node] = 1;
  else if (restraint !== 'free') spring[node] = (spring[node] as number) + restraint.spring;
}

export function memberProblems(model: MemberModel, nodes: MemberNodes): MemberProblems {
  const n = nodes.count;
  const axial = barProblem(model.stiffness.axial, n);
  const torsion = barProblem(model.stiffness.torsional, n);
  const vertical = bendingProblem(model.stiffness.bendingZ, n);
  const horizontal = bendingProblem(model.stiffness.bendingY, n);
  const add = (array: Float64Array, node: number, value: number): void => {
    array[node] = (array[node] as number) + value;
  };

  model.loads.forEach((load, i) => {
    const first = nodes.loadStartNode[i] as number;
    const last = nodes.loadEndNode[i] as number;
    if (load.kind === 'point') {
      add(axial.pointLoad, first, load.fx);
      add(torsion.pointLoad, first, load.mx);
      add(vertical.pointForce, first, load.fy);
      add(vertical.pointCouple, first, load.mz);
      add(horizontal.pointForce, first, load.fz);
      add(horizontal.pointCouple, first, -load.my);
    } else if (first === last) {
      // A range shorter than the node tolerance: its resultant at the one node it collapses to.
      const resultant = ([a, b]: readonly [number, number]): number => ((a + b) / 2) * (load.to - load.from);
      add(axial.pointLoad, first, resultant(load.qx));
      add(torsion.pointLoad, first, resultant(load.mx));
      add(vertical.pointForce, first, resultant(load.qy));
      add(horizontal.pointForce, first, resultant(load.qz));
    } else {
      const x = nodes.positions;
      spreadLinear(x, first, last, load.qx, axial.loadAtStart, axial.loadAtEnd);
      spreadLinear(x, first, last, load.mx, torsion.loadAtStart, torsion.loadAtEnd);
      spreadLinear(x, first, last, load.qy, vertical.loadAtStart, vertical.loadAtEnd);
      spreadLinear(x, first, last, load.qz, horizontal.loadAtStart, horizontal.loadAtEnd);
    }
  });

  const targets: Record<Direction, [Uint8Array, Float64Array]> = {
    ux: [axial.rigid, axial.spring],
    rx: [torsion.rigid, torsion.spring],
    uy: [vertical.translationRigid, vertical.translationSpring],
    rz: [vertical.rotationRigid, vertical.rotationSpring],
    uz: [horizontal.translationRigid, horizontal.translationSpring],
    ry: [horizontal.rotationRigid, horizontal.rotationSpring],
  };
  model.supports.forEach((support, i) => {
    const node = nodes.supportNode[i] as number;
    for (const direction of Object.keys(targets) as Direction[]) {
      const [rigid, spring] = targets[direction];
      restrain(support.restraints[direction], node, rigid, spring);
    }
  });
  return { axial, torsion, vertical, horizontal };
}
