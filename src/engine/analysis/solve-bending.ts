/**
 * Bending in one plane, in that plane's own frame: x along the member, t across it, rotations and
 * couples positive from x towards t (for the vertical plane t = y and this is the right-hand rule
 * about z). Shear V is the sum of the t forces left of x, the moment M is positive when the fibre at
 * -t is in tension: dV/dx = q, dM/dx = V, a force F raises V by F, a couple C lowers M by C, and
 * rigidity v'' = M (Euler-Bernoulli).
 *
 * Prismatic beam elements between structural nodes (ends, supports, hinges); a hinge gives the node a
 * second rotation so each side turns on its own. Loads inside an element enter as its exact
 * fixed-end actions; between nodes, V and M come from statics from the element's left end and the
 * slope and deflection from integrating M / rigidity twice from the solved end values, so every
 * value is the exact solution, not an interpolation.
 */

import {
  addToBand,
  createSymmetricBandMatrix,
  factorSymmetricBand,
  restrainInBand,
  solveWithBandFactors,
  type SymmetricBandMatrix,
} from './banded-solver.js';
import { anyNonZero, largestMotionNode, structuralNodeIndices, type LineMechanism } from './line-problem.js';
import type { MemberNodes } from './member-nodes.js';
import { zeroFilledDoubles, type DoubleArray } from './zero-filled.js';

export interface BendingProblem {
  /** EI, N*m^2. */
  readonly rigidity: number;
  /** Per node: the concentrated force along t (N) and couple (N*m). */
  readonly pointForce: Float64Array;
  readonly pointCouple: Float64Array;
  /** Per piece: the distributed load along t at its start and at its end (linear between), N/m. */
  readonly loadAtStart: Float64Array;
  readonly loadAtEnd: Float64Array;
  /** Per node: rigid restraints and spring stiffnesses of the translation and of the rotation. */
  readonly translationRigid: Uint8Array;
  readonly translationSpring: Float64Array;
  readonly rotationRigid: Uint8Array;
  readonly rotationSpring: Float64Array;
}

export interface BendingSolution {
  readonly kind: 'solved';
  /** Per piece, ascending coefficients in the local coordinate s: 3, 4, 5 and 6 of them. */
  readonly shear: DoubleArray;
  readonly moment: DoubleArray;
  readonly slope: DoubleArray;
  readonly deflection: DoubleArray;
  /** Per node: the force and couple all the restraints there apply (zero where there are none). */
  readonly reactionForce: Float64Array;
  readonly reactionCouple: Float64Array;
  /** Per node: translation and rotation at structural nodes; the rotation is 0 at a hinge. */
  readonly translation: Float64Array;
  readonly rotation: Float64Array;
}

const SHEAR_TERMS = 3;
const MOMENT_TERMS = 4;
const SLOPE_TERMS = 5;
const DEFLECTION_TERMS = 6;

function emptyBendingSolution(nodeCount: number): BendingSolution {
  const pieces = nodeCount - 1;
  return {
    kind: 'solved',
    shear: zeroFilledDoubles(pieces * SHEAR_TERMS),
    moment: zeroFilledDoubles(pieces * MOMENT_TERMS),
    slope: zeroFilledDoubles(pieces * SLOPE_TERMS),
    deflection: zeroFilledDoubles(pieces * DEFLECTION_TERMS),
    reactionForce: new Float64Array(nodeCount),
    reactionCouple: new Float64Array(nodeCount),
    translation: new Float64Array(nodeCount),
    rotation: new Float64Array(nodeCount),
  };
}

/** Shear and moment just left of the end node of a march, slope and deflection there. */
interface BendingMarchEnd {
  shear: number;
  moment: number;
  slope: number;
  deflection: number;
}

/**
 * Statics and two integrations from node `first` to node `last`, starting from the given shear,
 * moment, slope and deflection; point loads at the nodes strictly between are applied on the way.
 * Writes the piece coefficients when `solution` is given.
 */
function marchBending(
  nodes: MemberNodes,
  problem: BendingProblem,
  first: number,
  last: number,
  rigidity: number,
  state: BendingMarchEnd,
  solution?: BendingSolution,
): void {
  const x = nodes.positions;
  let { shear, moment, slope, deflection } = state;
  for (let j = first; j < last; j++) {
    if (j > first) {
      shear += problem.pointForce[j] as number;
      moment -= problem.pointCouple[j] as number;
    }
    const h = (x[j + 1] as number) - (x[j] as number);
    const qa = problem.loadAtStart[j] as number;
    const qb = problem.loadAtEnd[j] as number;
    if (solution) {
      const rate = (qb - qa) / h;
      const v = solution.shear;
      const m = solution.moment;
      const r = solution.slope;
      const d = solution.deflection;
      let i = j * SHEAR_TERMS;
      v[i] = shear;
      v[i + 1] = qa;
      v[i + 2] = rate / 2;
      i = j * MOMENT_TERMS;
      m[i] = moment;
      m[i + 1] = shear;
      m[i + 2] = qa / 2;
      m[i + 3] = rate / 6;
      i = j * SLOPE_TERMS;
      r[i] = slope;
      r[i + 1] = moment / rigidity;
      r[i + 2] = shear / (2 * rigidity);
      r[i + 3] = qa / (6 * rigidity);
      r[i + 4] = rate / (24 * rigidity);
      i = j * DEFLECTION_TERMS;
      d[i] = deflection;
      d[i + 1] = slope;
      d[i + 2] = moment / (2 * rigidity);
      d[i + 3] = shear / (6 * rigidity);
      d[i + 4] = qa / (24 * rigidity);
      d[i + 5] = rate / (120 * rigidity);
    }
    const h2 = h * h;
    deflection += slope * h + ((moment * h2) / 2 + (shear * h2 * h) / 6 + ((4 * qa + qb) * h2 * h2) / 120) / rigidity;
    slope += (moment * h + (shear * h2) / 2 + ((3 * qa + qb) * h2 * h) / 24) / rigidity;
    moment += shear * h + ((2 * qa + qb) * h2) / 6;
    shear += ((qa + qb) * h) / 2;
  }
  state.shear = shear;
  state.moment = moment;
  state.slope = slope;
  state.deflection = deflection;
}

/** Degrees of freedom of the structural nodes: a translation and one rotation, two at an inner hinge. */
interface BendingDofs {
  readonly translation: Int32Array;
  /** The rotation the element on the left of the node uses, and the one on its right. */
  readonly rotationLeft: Int32Array;
  readonly rotationRight: Int32Array;
  readonly count: number;
  readonly halfBandwidth: number;
}

function numberDofs(nodes: MemberNodes, structural: Int32Array): BendingDofs {
  const m = structural.length;
  const translation = new Int32Array(m);
  const rotationLeft = new Int32Array(m);
  const rotationRight = new Int32Array(m);
  let count = 0;
  let halfBandwidth = 0;
  for (let k = 0; k < m; k++) {
    translation[k] = count++;
    rotationLeft[k] = count++;
    const released = nodes.hinge[structural[k] as number] === 1 && k > 0 && k < m - 1;
    rotationRight[k] = released ? count++ : (rotationLeft[k] as number);
    if (k > 0) halfBandwidth = Math.max(halfBandwidth, (rotationLeft[k] as number) - (translation[k - 1] as number));
  }
  return { translation, rotationLeft, rotationRight, count, halfBandwidth };
}

/**
 * Adds the Euler-Bernoulli element stiffness on (v_a, theta_a, v_b, theta_b): the end actions of the
 * exact homogeneous solution (Przemieniecki, Theory of Matrix Structural Analysis, 1968, ch. 5; from memory).
 */
function addBeamElement(matrix: SymmetricBandMatrix, dofs: Int32Array, rigidity: number, h: number): void {
  const k = rigidity / (h * h * h);
  const va = dofs[0] as number;
  const ta = dofs[1] as number;
  const vb = dofs[2] as number;
  const tb = dofs[3] as number;
  addToBand(matrix, va, va, 12 * k);
  addToBand(matrix, ta, va, 6 * h * k);
  addToBand(matrix, ta, ta, 4 * h * h * k);
  addToBand(matrix, vb, va, -12 * k);
  addToBand(matrix, vb, ta, -6 * h * k);
  addToBand(matrix, vb, vb, 12 * k);
  addToBand(matrix, tb, va, 6 * h * k);
  addToBand(matrix, tb, ta, 2 * h * h * k);
  addToBand(matrix, tb, vb, -6 * h * k);
  addToBand(matrix, tb, tb, 4 * h * h * k);
}

const unrestrained = (rigid: Uint8Array, spring: Float64Array, node: number): boolean =>
  rigid[node] === 0 && spring[node] === 0;

/**
 * The start shear and moment of the element from node a to node b, given the values found from its
 * end displacements. Where statics alone fixes one of them, it replaces the displacement value
 * (equal in exact arithmetic, and free of the rounding of a difference of displacements): a free
 * member end carries only its point load, and the moment is zero at a hinge.
 */
function withStatics(
  nodes: MemberNodes,
  problem: BendingProblem,
  a: number,
  b: number,
  first: boolean,
  last: boolean,
  h: number,
  loadShear: number,
  loadMoment: number,
  shear: number,
  moment: number,
): [number, number] {
  const { translationRigid, translationSpring, rotationRigid, rotationSpring, pointForce, pointCouple } = problem;
  const leftShear = first && unrestrained(translationRigid, translationSpring, a);
  const rightShear = last && unrestrained(translationRigid, translationSpring, b);
  const leftMoment = nodes.hinge[a] === 1 || (first && unrestrained(rotationRigid, rotationSpring, a));
  const rightMoment = nodes.hinge[b] === 1 || (last && unrestrained(rotationRigid, rotationSpring, b));
  // V(a+) = F_a at x = 0, V(b-) = -F_b at x = length; M(a+) = -C_a, M(b-) = C_b (C = 0 at a hinge).
  let startShear = shear;
  let startMoment = moment;
  if (leftShear) startShear = pointForce[a] as number;
  else if (rightShear) startShear = -(pointForce[b] as number) - loadShear;
  if (leftMoment && rightMoment && !leftShear && !rightShear) {
    startMoment = -(pointCouple[a] as number);
    startShear = ((pointCouple[b] as number) - loadMoment - startMoment) / h;
  } else if (leftMoment) startMoment = -(pointCouple[a] as number);
  else if (rightMoment) startMoment = (pointCouple[b] as number) - startShear * h - loadMoment;
  return [startShear, startMoment];
}

export function solveBending(nodes: MemberNodes, problem: BendingProblem): BendingSolution | LineMechanism {
  const solution = emptyBendingSolution(nodes.count);
  if (!anyNonZero(problem.pointForce, problem.pointCouple, problem.loadAtStart, problem.loadAtEnd)) return solution;
  const x = nodes.positions;
  const structural = structuralNodeIndices(nodes);
  const m = structural.length;
  const dofs = numberDofs(nodes, structural);
  const stiffness = createSymmetricBandMatrix(dofs.count, dofs.halfBandwidth);
  const rhs = new Float64Array(dofs.count);
  const rotationIntegral = new Float64Array(m - 1);
  const deflectionIntegral = new Float64Array(m - 1);
  const loadShearEnd = new Float64Array(m - 1);
  const loadMomentEnd = new Float64Array(m - 1);
  const state: BendingMarchEnd = { shear: 0, moment: 0, slope: 0, deflection: 0 };
  const rigidity = problem.rigidity;
  const element = new Int32Array(4);
  const clampActions = new Float64Array(4);

  for (let e = 0; e + 1 < m; e++) {
    const a = structural[e] as number;
    const b = structural[e + 1] as number;
    const h = (x[b] as number) - (x[a] as number);
    state.shear = state.moment = state.slope = state.deflection = 0;
    marchBending(nodes, problem, a, b, 1, state);
    const i0 = state.slope;
    const i1 = state.deflection;
    rotationIntegral[e] = i0;
    deflectionIntegral[e] = i1;
    loadShearEnd[e] = state.shear;
    loadMomentEnd[e] = state.moment;
    // Both ends clamped: rotation and deflection of the end are zero; solve for the start moment and shear.
    const startMoment = (2 * i0) / h - (6 * i1) / (h * h);
    const startShear = (12 * i1) / (h * h * h) - (6 * i0) / (h * h);
    element[0] = dofs.translation[e] as number;
    element[1] = dofs.rotationRight[e] as number;
    element[2] = dofs.translation[e + 1] as number;
    element[3] = dofs.rotationLeft[e + 1] as number;
    // The clamps' actions on the element; the equivalent nodal loads are their opposites.
    clampActions[0] = startShear;
    clampActions[1] = -startMoment;
    clampActions[2] = -(startShear + state.shear);
    clampActions[3] = startMoment + startShear * h + state.moment;
    for (let r = 0; r < 4; r++) rhs[element[r] as number] = (rhs[element[r] as number] as number) - (clampActions[r] as number);
    addBeamElement(stiffness, element, rigidity, h);
  }
  for (let k = 0; k < m; k++) {
    const node = structural[k] as number;
    const translation = dofs.translation[k] as number;
    rhs[translation] = (rhs[translation] as number) + (problem.pointForce[node] as number);
    addToBand(stiffness, translation, translation, problem.translationSpring[node] as number);
    if (nodes.hinge[node] === 1) {
      // A couple on a frictionless pin turns it freely; the rotation restraints there hold only the pin.
      if (problem.pointCouple[node] !== 0) return { kind: 'mechanism', motion: 'rotation', node };
      continue;
    }
    const rotation = dofs.rotationLeft[k] as number;
    rhs[rotation] = (rhs[rotation] as number) + (problem.pointCouple[node] as number);
    addToBand(stiffness, rotation, rotation, problem.rotationSpring[node] as number);
  }
  for (let k = 0; k < m; k++) {
    const node = structural[k] as number;
    if (problem.translationRigid[node] === 1) {
      restrainInBand(stiffness, dofs.translation[k] as number);
      rhs[dofs.translation[k] as number] = 0;
    }
    if (problem.rotationRigid[node] === 1 && nodes.hinge[node] !== 1) {
      restrainInBand(stiffness, dofs.rotationLeft[k] as number);
      rhs[dofs.rotationLeft[k] as number] = 0;
    }
  }

  const factors = factorSymmetricBand(stiffness);
  if (factors.kind === 'singular') {
    const k = largestMotionNode(factors.nullVector, dofs.translation);
    if (k >= 0) return { kind: 'mechanism', motion: 'translation', node: structural[k] as number };
    const r = largestMotionNode(factors.nullVector, dofs.rotationLeft);
    return { kind: 'mechanism', motion: 'rotation', node: structural[Math.max(0, r)] as number };
  }
  const d = solveWithBandFactors(factors, rhs);

  const shearLeft = new Float64Array(m);
  const momentLeft = new Float64Array(m);
  const shearRight = new Float64Array(m);
  const momentRight = new Float64Array(m);
  for (let e = 0; e + 1 < m; e++) {
    const a = structural[e] as number;
    const b = structural[e + 1] as number;
    const h = (x[b] as number) - (x[a] as number);
    const va = d[dofs.translation[e] as number] as number;
    const ta = d[dofs.rotationRight[e] as number] as number;
    const vb = d[dofs.translation[e + 1] as number] as number;
    const tb = d[dofs.rotationLeft[e + 1] as number] as number;
    // rigidity (theta_b - theta_a) = M0 h + V0 h^2 / 2 + I0 and
    // rigidity (v_b - v_a - theta_a h) = M0 h^2 / 2 + V0 h^3 / 6 + I1, solved for M0 and V0.
    const r1 = rigidity * (tb - ta) - (rotationIntegral[e] as number);
    const r2 = rigidity * (vb - va - ta * h) - (deflectionIntegral[e] as number);
    const [startShear, startMoment] = withStatics(
      nodes,
      problem,
      a,
      b,
      e === 0,
      e === m - 2,
      h,
      loadShearEnd[e] as number,
      loadMomentEnd[e] as number,
      (-12 * r2) / (h * h * h) + (6 * r1) / (h * h),
      (-2 * r1) / h + (6 * r2) / (h * h),
    );
    shearRight[e] = startShear;
    momentRight[e] = startMoment;
    state.shear = startShear;
    state.moment = startMoment;
    state.slope = ta;
    state.deflection = va;
    marchBending(nodes, problem, a, b, rigidity, state, solution);
    shearLeft[e + 1] = state.shear;
    momentLeft[e + 1] = state.moment;
  }
  for (let k = 0; k < m; k++) {
    const node = structural[k] as number;
    // V(x+) = V(x-) + F + R and M(x+) = M(x-) - C - C_R at a node.
    solution.reactionForce[node] =
      (shearRight[k] as number) - (shearLeft[k] as number) - (problem.pointForce[node] as number);
    solution.reactionCouple[node] =
      (momentLeft[k] as number) - (momentRight[k] as number) - (problem.pointCouple[node] as number);
    solution.translation[node] = d[dofs.translation[k] as number] as number;
    solution.rotation[node] = nodes.hinge[node] === 1 ? 0 : (d[dofs.rotationLeft[k] as number] as number);
  }
  return solution;
}
