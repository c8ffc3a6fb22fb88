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

import type { Direction, LinearIntensity, MemberModel, Restraint } from '../member/model.js';
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

/** The intensity at a node of [first, last]: the given values at the ends, linear in x between. */
function intensityAt(positions: Float64Array, node: number, first: number, last: number, intensity: LinearIntensity): number {
  const atFrom = intensity[0];
  const atTo = intensity[1];
  if (node === first) return atFrom;
  if (node === last) return atTo;
  const from = positions[first] as number;
  const span = (positions[last] as number) - from;
  return atFrom + ((atTo - atFrom) * ((positions[node] as number) - from)) / span;
}

/** Adds a linear intensity over nodes [first, last] to the per-piece arrays. */
function spreadLinear(
  positions: Float64Array,
  first: number,
  last: number,
  intensity: LinearIntensity,
  loadAtStart: Float64Array,
  loadAtEnd: Float64Array,
): void {
  if (intensity[0] === 0 && intensity[1] === 0) return;
  for (let j = first; j < last; j++) {
    loadAtStart[j] = (loadAtStart[j] as number) + intensityAt(positions, j, first, last, intensity);
    loadAtEnd[j] = (loadAtEnd[j] as number) + intensityAt(positions, j + 1, first, last, intensity);
  }
}

/** Integral of a linear intensity over a range of the given length. */
function resultantOver(intensity: LinearIntensity, length: number): number {
  return ((intensity[0] + intensity[1]) / 2) * length;
}

function addAt(array: Float64Array, node: number, value: number): void {
  array[node] = (array[node] as number) + value;
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

  model.loads.forEach((load, i) => {
    const first = nodes.loadStartNode[i] as number;
    const last = nodes.loadEndNode[i] as number;
    if (load.kind === 'point') {
      addAt(axial.pointLoad, first, load.fx);
      addAt(torsion.pointLoad, first, load.mx);
      addAt(vertical.pointForce, first, load.fy);
      addAt(vertical.pointCouple, first, load.mz);
      addAt(horizontal.pointForce, first, load.fz);
      addAt(horizontal.pointCouple, first, -load.my);
    } else if (first === last) {
      // A range shorter than the node tolerance: its resultant at the one node it collapses to.
      const length = load.to - load.from;
      addAt(axial.pointLoad, first, resultantOver(load.qx, length));
      addAt(torsion.pointLoad, first, resultantOver(load.mx, length));
      addAt(vertical.pointForce, first, resultantOver(load.qy, length));
      addAt(horizontal.pointForce, first, resultantOver(load.qz, length));
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
  const directions = Object.keys(targets) as Direction[];
  model.supports.forEach((support, i) => {
    const node = nodes.supportNode[i] as number;
    for (const direction of directions) {
      const [rigid, spring] = targets[direction];
      restrain(support.restraints[direction], node, rigid, spring);
    }
  });
  return { axial, torsion, vertical, horizontal };
}
