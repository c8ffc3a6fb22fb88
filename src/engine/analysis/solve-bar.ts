/**
 * A bar along x: the axial problem (displacement ux, rigidity EA, forces fx and qx) or the torsion
 * problem (twist rx, rigidity GJ, torques mx). The internal force N is the action on the face whose
 * outward normal is +x, so dN/dx = -q, a point load P drops N by P, and rigidity u' = N.
 *
 * Elements run between structural nodes with stiffness (rigidity / h)[1 -1; -1 1]; the loads inside
 * an element enter as its exact fixed-end forces, and the fields between nodes come from statics from
 * the element's left end plus one integration of N / rigidity, so every value is the exact solution.
 */

import {
  addToBand,
  createSymmetricBandMatrix,
  factorSymmetricBand,
  restrainInBand,
  solveWithBandFactors,
} from './banded-solver.js';
import { anyNonZero, largestMotionNode, structuralNodeIndices, type LineMechanism } from './line-problem.js';
import type { MemberNodes } from './member-nodes.js';
import { zeroFilledDoubles, type DoubleArray } from './zero-filled.js';

export interface BarProblem {
  /** EA (N) or GJ (N*m^2). */
  readonly rigidity: number;
  /** Per node: the concentrated load along or about x. */
  readonly pointLoad: Float64Array;
  /** Per piece: the distributed load at its start and at its end (linear between). */
  readonly loadAtStart: Float64Array;
  readonly loadAtEnd: Float64Array;
  /** Per node: 1 where a support holds the motion rigidly; spring stiffness added there. */
  readonly rigid: Uint8Array;
  readonly spring: Float64Array;
}

export interface BarSolution {
  readonly kind: 'solved';
  /** Per piece, ascending coefficients in the local coordinate s: 3 for the force, 4 for the motion. */
  readonly force: DoubleArray;
  readonly displacement: DoubleArray;
  /** Per node: the load all the restraints there apply to the bar (zero where there are none). */
  readonly reaction: Float64Array;
  /** Per node: the displacement (or twist) at structural nodes. */
  readonly nodalDisplacement: Float64Array;
}

const FORCE_TERMS = 3;
const DISPLACEMENT_TERMS = 4;

function emptyBarSolution(nodeCount: number): BarSolution {
  const pieces = nodeCount - 1;
  return {
    kind: 'solved',
    force: zeroFilledDoubles(pieces * FORCE_TERMS),
    displacement: zeroFilledDoubles(pieces * DISPLACEMENT_TERMS),
    reaction: new Float64Array(nodeCount),
    nodalDisplacement: new Float64Array(nodeCount),
  };
}

/** End values of a march along an element: force just left of its end node and displacement there. */
interface BarMarchEnd {
  force: number;
  displacement: number;
}

/**
 * Statics and one integration from node `first` to node `last`, starting from force N and
 * displacement u; point loads at the nodes strictly between are applied on the way. Writes the
 * piece coefficients when `solution` is given.
 */
function marchBar(
  nodes: MemberNodes,
  problem: BarProblem,
  first: number,
  last: number,
  startForce: number,
  startDisplacement: number,
  rigidity: number,
  end: BarMarchEnd,
  solution?: BarSolution,
): void {
  const x = nodes.positions;
  let force = startForce;
  let displacement = startDisplacement;
  for (let j = first; j < last; j++) {
    if (j > first) force -= problem.pointLoad[j] as number;
    const length = (x[j + 1] as number) - (x[j] as number);
    const qa = problem.loadAtStart[j] as number;
    const qb = problem.loadAtEnd[j] as number;
    if (solution) {
      const slope = (qb - qa) / length;
      const f = solution.force;
      const d = solution.displacement;
      const i = j * FORCE_TERMS;
      const k = j * DISPLACEMENT_TERMS;
      f[i] = force;
      f[i + 1] = -qa;
      f[i + 2] = -slope / 2;
      d[k] = displacement;
      d[k + 1] = force / rigidity;
      d[k + 2] = -qa / (2 * rigidity);
      d[k + 3] = -slope / (6 * rigidity);
    }
    displacement += (force * length - ((2 * qa + qb) * length * length) / 6) / rigidity;
    force -= ((qa + qb) * length) / 2;
  }
  end.force = force;
  end.displacement = displacement;
}

/** No support holds the bar at the node, rigidly or by a spring. */
function isFree(problem: BarProblem, node: number): boolean {
  return problem.rigid[node] === 0 && problem.spring[node] === 0;
}

export function solveBar(nodes: MemberNodes, problem: BarProblem): BarSolution | LineMechanism {
  const solution = emptyBarSolution(nodes.count);
  if (!anyNonZero(problem.pointLoad, problem.loadAtStart, problem.loadAtEnd)) return solution;
  const x = nodes.positions;
  const structural = structuralNodeIndices(nodes);
  const m = structural.length;
  const stiffness = createSymmetricBandMatrix(m, 1);
  const rhs = new Float64Array(m);
  const fixedEndIntegral = new Float64Array(m - 1);
  const loadForceEnd = new Float64Array(m - 1);
  const end: BarMarchEnd = { force: 0, displacement: 0 };
  const rigidity = problem.rigidity;

  for (let e = 0; e + 1 < m; e++) {
    const a = structural[e] as number;
    const b = structural[e + 1] as number;
    const h = (x[b] as number) - (x[a] as number);
    marchBar(nodes, problem, a, b, 0, 0, 1, end);
    fixedEndIntegral[e] = end.displacement;
    loadForceEnd[e] = end.force;
    // Both ends held: N0 h + integral of the load-only force = 0.
    const startForce = -end.displacement / h;
    rhs[e] = (rhs[e] as number) + startForce;
    rhs[e + 1] = (rhs[e + 1] as number) - (startForce + end.force);
    const k = rigidity / h;
    addToBand(stiffness, e, e, k);
    addToBand(stiffness, e + 1, e + 1, k);
    addToBand(stiffness, e + 1, e, -k);
  }
  for (let k = 0; k < m; k++) {
    const node = structural[k] as number;
    rhs[k] = (rhs[k] as number) + (problem.pointLoad[node] as number);
    addToBand(stiffness, k, k, problem.spring[node] as number);
  }
  for (let k = 0; k < m; k++) {
    if (problem.rigid[structural[k] as number] === 1) {
      restrainInBand(stiffness, k);
      rhs[k] = 0;
    }
  }

  const factors = factorSymmetricBand(stiffness);
  if (factors.kind === 'singular') {
    const dofOfNode = Int32Array.from({ length: m }, (_, k) => k);
    const k = largestMotionNode(factors.nullVector, dofOfNode);
    return { kind: 'mechanism', motion: 'translation', node: structural[Math.max(0, k)] as number };
  }
  const u = solveWithBandFactors(factors, rhs);

  const forceLeft = new Float64Array(m);
  const forceRight = new Float64Array(m);
  for (let e = 0; e + 1 < m; e++) {
    const a = structural[e] as number;
    const b = structural[e + 1] as number;
    const h = (x[b] as number) - (x[a] as number);
    // At a free member end statics fixes the force: N(0+) = -P_0 and N(length-) = P_length.
    let startForce = (rigidity * ((u[e + 1] as number) - (u[e] as number)) - (fixedEndIntegral[e] as number)) / h;
    if (e === 0 && isFree(problem, a)) startForce = -(problem.pointLoad[a] as number);
    else if (e === m - 2 && isFree(problem, b)) startForce = (problem.pointLoad[b] as number) - (loadForceEnd[e] as number);
    forceRight[e] = startForce;
    marchBar(nodes, problem, a, b, startForce, u[e] as number, rigidity, end, solution);
    forceLeft[e + 1] = end.force;
  }
  for (let k = 0; k < m; k++) {
    const node = structural[k] as number;
    // N(x+) = N(x-) - P - R at a node.
    solution.reaction[node] = (forceLeft[k] as number) - (forceRight[k] as number) - (problem.pointLoad[node] as number);
    solution.nodalDisplacement[node] = u[k] as number;
  }
  return solution;
}
