/**
 * Non-uniform (warping) torsion of a straight open thin-walled member, solved exactly.
 *
 * Governing equation, with phi the twist about x (right-hand rule) and m_x the distributed torque:
 *   E Iw phi'''' - G J phi'' = m_x(x)
 * (Timoshenko & Gere, Theory of Elastic Stability, 2nd ed., ch. 5, torsion of thin-walled open
 * sections; Trahair, Flexural-Torsional Buckling of Structures, ch. 2; AISC Design Guide 9, 2nd ed.,
 * Appendix B; all from memory). The stress resultants are
 *   bimoment B = -E Iw phi'',  warping torque T_w = -E Iw phi''',  Saint-Venant torque T_sv = G J phi',
 * and the internal torque T = T_sv + T_w obeys T' = -m_x (a point torque T0 drops T by T0).
 *
 * Between nodes (ends, restraints, point torques, ends of distributed torques) m_x is constant and
 * the solution is exact: phi = A + B s + C f(s) + D g(s) + particular, lambda = sqrt(G J / (E Iw)).
 * Two bases are used, in the dimensionless coordinate tau = (x - x_start) / l:
 *  - a piece longer than 1 / lambda takes the shifted exponentials e^{-tau} and e^{-(Delta - tau)}
 *    (l = 1 / lambda, Delta its length over l) instead of cosh and sinh: both stay within [0, 1] on the
 *    piece, so the coefficients are of the order of phi'' and the system stays well conditioned for
 *    any lambda L (cosh(lambda L) overflows past lambda L = 710 and loses every digit of the end
 *    conditions long before);
 *  - a piece shorter than that takes 1, tau, (cosh z - 1)/k^2, (sinh z - z)/k^3 with z = k tau (k =
 *    lambda l <= 1), evaluated by their series: the coefficients are then the twist and its first
 *    three derivatives at the piece's start, which keeps a very short piece (a torque close to a
 *    restraint) and a small lambda L (down to G J = 0, pure warping torsion) as well conditioned as a
 *    long one, where the exponentials would all tend to 1 and cancel.
 *
 * Boundary and node conditions: a fork holds the twist and lets the section warp (phi = 0, and
 * phi'' = 0 at a member end, phi' and phi'' continuous inside); a fixed restraint holds twist and
 * warping (phi = 0, phi' = 0, on both sides when inside: it carries a bimoment as well as a torque);
 * a free end has B = 0 (phi'' = 0) and its torque equals the applied end torque. Inside the member
 * phi, phi', phi'' are continuous and T jumps by minus the applied point torque. The restraints'
 * torques follow from the jumps of T once the field is known.
 *
 * E Iw must be positive: with E Iw = 0 the equation drops to second order (uniform, Saint-Venant
 * torsion), which line-problem torsion already solves; this module refuses it with an error.
 *
 * @example solveWarpingTorsion({ length: 3.6, torsionalRigidity: 5653.8, warpingRigidity: 2727.9, restraints: [{ position: 0, kind: 'fork' }, { position: 3.6, kind: 'fork' }], pointTorques: [{ position: 1.8, torque: 1000 }] }).extremes.bimoment.value // 343.4 N m^2
 */

import { EngineError } from '../engine-error.js';
import { LOAD_POSITION_TOLERANCE, POSITION_TOLERANCE } from './tolerances.js';

export type TwistRestraintKind = 'fork' | 'fixed';

export interface TwistRestraint {
  /** m from the start of the member. */
  readonly position: number;
  /** fork: twist held, warping free; fixed: twist and warping held. */
  readonly kind: TwistRestraintKind;
}

export interface PointTorque {
  readonly position: number;
  /** N m about +x by the right-hand rule. */
  readonly torque: number;
}

export interface DistributedTorque {
  readonly from: number;
  readonly to: number;
  /** N m / m about +x by the right-hand rule. */
  readonly torquePerLength: number;
}

export interface WarpingTorsionInput {
  /** m */
  readonly length: number;
  /** G J, N m^2 (0 allowed: pure warping torsion). */
  readonly torsionalRigidity: number;
  /** E Iw, N m^4 (must be positive). */
  readonly warpingRigidity: number;
  readonly restraints: readonly TwistRestraint[];
  readonly pointTorques?: readonly PointTorque[];
  readonly distributedTorques?: readonly DistributedTorque[];
}

/** The field at one section; SI. */
export interface WarpingTorsionState {
  /** phi, rad */
  readonly twist: number;
  /** phi', rad/m */
  readonly twistRate: number;
  /** phi'', rad/m^2 */
  readonly twistSecondDerivative: number;
  /** phi''', rad/m^3 */
  readonly twistThirdDerivative: number;
  /** B = -E Iw phi'', N m^2 */
  readonly bimoment: number;
  /** T_w = -E Iw phi''', N m */
  readonly warpingTorque: number;
  /** T_sv = G J phi', N m */
  readonly saintVenantTorque: number;
  /** T = T_sv + T_w, N m */
  readonly torque: number;
}

export interface TwistRestraintReaction {
  readonly position: number;
  readonly kind: TwistRestraintKind;
  /** The torque the restraint applies to the member, N m about +x. */
  readonly torque: number;
  /** B(x+) - B(x-), N m^2, with B = 0 outside the member: 0 at a fork, the held bimoment at a fixed restraint. */
  readonly bimomentJump: number;
}

/** The signed value of largest magnitude and where it occurs (on a tie, any one of the places, as rounding decides). */
export interface FieldExtreme {
  readonly value: number;
  readonly position: number;
}

export interface WarpingTorsionExtremes {
  readonly twist: FieldExtreme;
  readonly bimoment: FieldExtreme;
  readonly warpingTorque: FieldExtreme;
  readonly saintVenantTorque: FieldExtreme;
}

export interface WarpingTorsionResult {
  /** lambda = sqrt(G J / (E Iw)), 1/m. */
  readonly lambda: number;
  /** lambda L, dimensionless. */
  readonly lambdaLength: number;
  /** The state at x; at a node, `side` picks the piece before ('left') or after it ('right', the default). */
  readonly at: (x: number, side?: 'left' | 'right') => WarpingTorsionState;
  /** One per input restraint, in input order. */
  readonly reactions: readonly TwistRestraintReaction[];
  /** Exact extremes: piece ends and the stationary points of each field on every piece. */
  readonly extremes: WarpingTorsionExtremes;
}

type NodeRestraint = 'none' | TwistRestraintKind;

interface Piece {
  readonly start: number;
  readonly end: number;
  /** Length over the reference length l. */
  readonly delta: number;
  readonly exponential: boolean;
  /** m_x l^4 / (E Iw): the right-hand side of phi'''' - k^2 phi'' in tau. */
  readonly load: number;
}

/** Coefficients of A, B, C, D and the particular term's value, for one derivative order in tau. */
type BasisRow = [number, number, number, number, number];

/** A pivot below this fraction of its equilibrated row marks a mechanism (exact zero lands near 1e-16). */
const SINGULAR_PIVOT = 1e-12;

/** sum_{n >= 0} z^{2n} / (2n + offset)!, for |z| <= 1 (the terms fall by at least 1/12 each). */
function evenSeries(z: number, offset: number): number {
  let factorial = 1;
  for (let i = 2; i <= offset; i++) factorial *= i;
  let term = 1 / factorial;
  let sum = term;
  const z2 = z * z;
  for (let n = 0; n < 30 && term > 1e-18 * sum; n++) {
    term *= z2 / ((2 * n + offset + 1) * (2 * n + offset + 2));
    sum += term;
  }
  return sum;
}

/** The basis of a piece at tau, for derivative order 0 to 4 in tau. */
function basisRow(piece: Piece, k: number, tau: number, order: number): BasisRow {
  const mu = piece.load;
  if (piece.exponential) {
    // k = 1: phi = A + B tau + C e^{-tau} + D e^{-(Delta - tau)} - mu tau^2 / 2.
    const a = Math.exp(-tau);
    const b = Math.exp(tau - piece.delta);
    switch (order) {
      case 0:
        return [1, tau, a, b, (-mu * tau * tau) / 2];
      case 1:
        return [0, 1, -a, b, -mu * tau];
      case 2:
        return [0, 0, a, b, -mu];
      case 3:
        return [0, 0, -a, b, 0];
      default:
        return [0, 0, a, b, 0];
    }
  }
  // phi = A + B tau + C E2 + D E3 + mu E4 with E0 = cosh z, E_n' = E_{n-1}, E0' = k^2 E1, z = k tau.
  const z = k * tau;
  const e0 = Math.cosh(z);
  const e1 = tau * evenSeries(z, 1);
  const e2 = tau * tau * evenSeries(z, 2);
  const e3 = tau * tau * tau * evenSeries(z, 3);
  const e4 = tau * tau * tau * tau * evenSeries(z, 4);
  const k2 = k * k;
  switch (order) {
    case 0:
      return [1, tau, e2, e3, mu * e4];
    case 1:
      return [0, 1, e1, e2, mu * e3];
    case 2:
      return [0, 0, e0, e1, mu * e2];
    case 3:
      return [0, 0, k2 * e1, e0, mu * e1];
    default:
      return [0, 0, k2 * e0, k2 * e1, mu * e0];
  }
}

function combine(row: BasisRow, c: ArrayLike<number>, offset: number): number {
  return (
    row[0] * (c[offset] as number) +
    row[1] * (c[offset + 1] as number) +
    row[2] * (c[offset + 2] as number) +
    row[3] * (c[offset + 3] as number) +
    row[4]
  );
}

/** Dense Gaussian elimination with row equilibration and partial pivoting; null when singular. */
function solveDense(matrix: number[][], rhs: number[]): Float64Array | null {
  const n = rhs.length;
  for (let i = 0; i < n; i++) {
    const row = matrix[i] as number[];
    let scale = 0;
    for (const v of row) scale = Math.max(scale, Math.abs(v));
    if (scale === 0) return null;
    for (let j = 0; j < n; j++) row[j] = (row[j] as number) / scale;
    rhs[i] = (rhs[i] as number) / scale;
  }
  for (let col = 0; col < n; col++) {
    let pivotRow = col;
    for (let i = col + 1; i < n; i++) {
      if (Math.abs((matrix[i] as number[])[col] as number) > Math.abs((matrix[pivotRow] as number[])[col] as number)) pivotRow = i;
    }
    const pivot = (matrix[pivotRow] as number[])[col] as number;
    if (!(Math.abs(pivot) > SINGULAR_PIVOT)) return null;
    if (pivotRow !== col) {
      [matrix[col], matrix[pivotRow]] = [matrix[pivotRow] as number[], matrix[col] as number[]];
      [rhs[col], rhs[pivotRow]] = [rhs[pivotRow] as number, rhs[col] as number];
    }
    const pr = matrix[col] as number[];
    for (let i = col + 1; i < n; i++) {
      const ri = matrix[i] as number[];
      const factor = (ri[col] as number) / pivot;
      if (factor === 0) continue;
      for (let j = col; j < n; j++) ri[j] = (ri[j] as number) - factor * (pr[j] as number);
      rhs[i] = (rhs[i] as number) - factor * (rhs[col] as number);
    }
  }
  const x = new Float64Array(n);
  for (let i = n - 1; i >= 0; i--) {
    const ri = matrix[i] as number[];
    let sum = rhs[i] as number;
    for (let j = i + 1; j < n; j++) sum -= (ri[j] as number) * (x[j] as number);
    x[i] = sum / (ri[i] as number);
  }
  return x;
}

/** Roots of a x^2 + b x + c = 0 without cancellation (a may be 0). */
function quadraticRoots(a: number, b: number, c: number): number[] {
  if (a === 0) return b === 0 ? [] : [-c / b];
  const disc = b * b - 4 * a * c;
  if (disc < 0) return [];
  const q = -0.5 * (b + (b >= 0 ? 1 : -1) * Math.sqrt(disc));
  return q === 0 ? [0] : [q / a, c / q];
}

/** Zeros of f on [lo, hi], where f is monotone between consecutive breakpoints (bisection to the last bit). */
function zerosBetween(f: (t: number) => number, breakpoints: readonly number[]): number[] {
  const zeros: number[] = [];
  for (let i = 0; i + 1 < breakpoints.length; i++) {
    let lo = breakpoints[i] as number;
    let hi = breakpoints[i + 1] as number;
    let flo = f(lo);
    const fhi = f(hi);
    if (flo === 0 || fhi === 0 || flo > 0 === fhi > 0) continue;
    for (let iteration = 0; iteration < 200; iteration++) {
      const mid = 0.5 * (lo + hi);
      if (mid <= lo || mid >= hi) break;
      const fm = f(mid);
      if (fm === 0) {
        lo = hi = mid;
        break;
      }
      if (fm > 0 === flo > 0) {
        lo = mid;
        flo = fm;
      } else hi = mid;
    }
    zeros.push(0.5 * (lo + hi));
  }
  return zeros;
}

function inside(values: readonly number[], delta: number): number[] {
  return values.filter((t) => Number.isFinite(t) && t > 0 && t < delta);
}

/**
 * Interior stationary points of phi^(order) on a piece, in tau: the zeros of phi^(order + 1).
 * Closed forms where the derivative is a sum of two exponentials (or cosh and sinh); the zeros of
 * phi'' with a distributed torque on a short piece, and of phi' (the twist's extremes), by bisection
 * between the closed-form zeros of the next derivative.
 */
function stationaryPoints(piece: Piece, k: number, c: Float64Array, offset: number, order: number): number[] {
  const C = c[offset + 2] as number;
  const D = c[offset + 3] as number;
  const mu = piece.load;
  const delta = piece.delta;
  if (order === 0) {
    const breaks = [0, ...stationaryPoints(piece, k, c, offset, 1).sort((p, q) => p - q), delta];
    return zerosBetween((t) => combine(basisRow(piece, k, t, 1), c, offset), breaks);
  }
  if (piece.exponential) {
    const half = Math.exp(-delta / 2);
    if (order === 1) {
      // phi'' = C e^{-tau} + D e^{tau - Delta} - mu = 0; with w = e^{tau - Delta/2}: D' w^2 - mu w + C' = 0.
      return inside(
        quadraticRoots(D * half, -mu, C * half)
          .filter((w) => w > 0)
          .map((w) => delta / 2 + Math.log(w)),
        delta,
      );
    }
    // phi''' = -C e^{-tau} + D e^{tau-Delta} = 0 and phi'''' = C e^{-tau} + D e^{tau-Delta} = 0: e^{2 tau - Delta} = +-C / D.
    const ratio = order === 2 ? C / D : -C / D;
    return D !== 0 && ratio > 0 ? inside([(delta + Math.log(ratio)) / 2], delta) : [];
  }
  const P = C * k * k + mu;
  if (order === 2) {
    // phi''' = P sinh(z)/k + D cosh z = 0: tanh z = -D k / P (k -> 0: tau = -D / P).
    if (P === 0) return [];
    const s = (-D * k) / P;
    if (k === 0) return inside([-D / P], delta);
    return Math.abs(s) < 1 ? inside([Math.atanh(s) / k], delta) : [];
  }
  if (order === 3) {
    // phi'''' = P cosh z + D k sinh z = 0: tanh z = -P / (D k); none when k = 0 (phi''' is then linear).
    if (k === 0 || D === 0) return [];
    const s = -P / (D * k);
    return Math.abs(s) < 1 ? inside([Math.atanh(s) / k], delta) : [];
  }
  // order 1, short piece: phi'' is monotone between the zeros of phi'''.
  const breaks = [0, ...stationaryPoints(piece, k, c, offset, 2), delta];
  return zerosBetween((t) => combine(basisRow(piece, k, t, 2), c, offset), breaks);
}

function refuse(message: string, path: (string | number)[]): never {
  throw new EngineError('outside-member', message, path);
}

/** Solves the member; throws EngineError for input that cannot be analysed (see the module comment). */
export function solveWarpingTorsion(input: WarpingTorsionInput): WarpingTorsionResult {
  const { length, torsionalRigidity: GJ, warpingRigidity: EIw, restraints } = input;
  const pointTorques = input.pointTorques ?? [];
  const distributedTorques = input.distributedTorques ?? [];
  if (!(Number.isFinite(length) && length > 0)) refuse(`The member length must be a positive number of metres, not ${length}.`, ['length']);
  if (!(Number.isFinite(EIw) && EIw > 0)) {
    throw new EngineError(
      'impossible-geometry',
      `The warping rigidity E Iw must be positive, not ${EIw}; with none the member twists in uniform (Saint-Venant) torsion alone.`,
      ['warpingRigidity'],
    );
  }
  if (!(Number.isFinite(GJ) && GJ >= 0)) {
    throw new EngineError('impossible-geometry', `The torsional rigidity G J must be zero or positive, not ${GJ}.`, ['torsionalRigidity']);
  }
  if (restraints.length === 0) {
    throw new EngineError('unstable-member', 'The member has no twist restraint, so nothing stops it turning about its axis.', ['restraints']);
  }

  const structuralTolerance = POSITION_TOLERANCE * length;
  const loadTolerance = LOAD_POSITION_TOLERANCE * length;
  const checkInside = (x: number, what: string, path: (string | number)[]): number => {
    if (!(Number.isFinite(x) && x >= -structuralTolerance && x <= length + structuralTolerance)) {
      refuse(`${what} at x = ${x} m lies outside the member (0 to ${length} m).`, path);
    }
    return Math.min(length, Math.max(0, x));
  };
  const checkFinite = (value: number, what: string, path: (string | number)[]): void => {
    if (!Number.isFinite(value)) throw new EngineError('not-applicable', `${what} must be a finite number, not ${value}.`, path);
  };

  // Structural nodes: the ends and the restraints (snapped to an end within POSITION_TOLERANCE x L).
  const restraintPositions = restraints.map((r, i) => {
    const x = checkInside(r.position, `Twist restraint ${i + 1}`, ['restraints', i, 'position']);
    if (r.kind !== 'fork' && r.kind !== 'fixed') throw new EngineError('not-applicable', `Twist restraint ${i + 1} is neither a fork nor fixed.`, ['restraints', i, 'kind']);
    if (x <= structuralTolerance) return 0;
    if (x >= length - structuralTolerance) return length;
    return x;
  });
  restraintPositions.forEach((x, i) => {
    for (let j = 0; j < i; j++) {
      if (Math.abs(x - (restraintPositions[j] as number)) <= structuralTolerance) {
        throw new EngineError('not-applicable', `Twist restraints ${j + 1} and ${i + 1} are at the same place (x = ${x} m); give one.`, ['restraints', i, 'position']);
      }
    }
  });
  const positions: number[] = [0, length, ...restraintPositions];
  // A load position joins a node within LOAD_POSITION_TOLERANCE x L of it.
  const snapLoad = (x: number): number => {
    for (const p of positions) if (Math.abs(p - x) <= loadTolerance) return p;
    positions.push(x);
    return x;
  };
  const torquesAt = pointTorques.map((t, i) => {
    checkFinite(t.torque, `Point torque ${i + 1}`, ['pointTorques', i, 'torque']);
    return { position: snapLoad(checkInside(t.position, `Point torque ${i + 1}`, ['pointTorques', i, 'position'])), torque: t.torque };
  });
  const ranges = distributedTorques.map((d, i) => {
    checkFinite(d.torquePerLength, `Distributed torque ${i + 1}`, ['distributedTorques', i, 'torquePerLength']);
    const from = snapLoad(checkInside(d.from, `The start of distributed torque ${i + 1}`, ['distributedTorques', i, 'from']));
    const to = snapLoad(checkInside(d.to, `The end of distributed torque ${i + 1}`, ['distributedTorques', i, 'to']));
    if (!(from < to)) refuse(`Distributed torque ${i + 1} ends at x = ${d.to} m, not after its start at x = ${d.from} m: its range is empty.`, ['distributedTorques', i, 'to']);
    return { from, to, value: d.torquePerLength };
  });

  const nodes = [...new Set(positions)].sort((p, q) => p - q);
  const nodeIndex = (x: number): number => nodes.indexOf(x);
  const nodeRestraint: NodeRestraint[] = nodes.map(() => 'none');
  restraints.forEach((r, i) => {
    nodeRestraint[nodeIndex(restraintPositions[i] as number)] = r.kind;
  });
  const nodeTorque = nodes.map(() => 0);
  for (const t of torquesAt) nodeTorque[nodeIndex(t.position)] = (nodeTorque[nodeIndex(t.position)] as number) + t.torque;

  if (GJ === 0 && restraints.length === 1 && restraints[0]?.kind === 'fork') {
    throw new EngineError('unstable-member', 'Without Saint-Venant stiffness (G J = 0) one fork cannot stop the member turning: give two forks or a fixed restraint.', ['restraints']);
  }

  // Reference length l and k = lambda l: l = 1/lambda (k = 1) when lambda L >= 1, else l = L (k = lambda L < 1).
  const lambda = Math.sqrt(GJ / EIw);
  const lambdaLength = lambda * length;
  const k = lambdaLength >= 1 ? 1 : lambdaLength;
  const reference = lambdaLength >= 1 ? 1 / lambda : length;
  const pieces: Piece[] = [];
  for (let p = 0; p + 1 < nodes.length; p++) {
    const start = nodes[p] as number;
    const end = nodes[p + 1] as number;
    const mid = 0.5 * (start + end);
    let m = 0;
    for (const r of ranges) if (r.from <= mid && mid <= r.to) m += r.value;
    const delta = (end - start) / reference;
    pieces.push({ start, end, delta, exponential: k === 1 && delta > 1, load: (m * reference ** 4) / EIw });
  }

  // Assemble 4 conditions per node between pieces and 2 at each end (4 unknowns a piece).
  const unknowns = 4 * pieces.length;
  const matrix: number[][] = [];
  const rhs: number[] = [];
  const torqueScale = reference ** 3 / EIw;
  type Term = { piece: number; tau: number; order: number | 'torque'; weight: number };
  const addRow = (terms: Term[], value: number): void => {
    const row = new Array<number>(unknowns).fill(0);
    let right = value;
    for (const term of terms) {
      const piece = pieces[term.piece] as Piece;
      const rows: [BasisRow, number][] =
        term.order === 'torque'
          ? [
              [basisRow(piece, k, term.tau, 1), k * k],
              [basisRow(piece, k, term.tau, 3), -1],
            ]
          : [[basisRow(piece, k, term.tau, term.order), 1]];
      for (const [basis, factor] of rows) {
        const w = term.weight * factor;
        for (let j = 0; j < 4; j++) row[4 * term.piece + j] = (row[4 * term.piece + j] as number) + w * basis[j as 0 | 1 | 2 | 3];
        right -= w * basis[4];
      }
    }
    matrix.push(row);
    rhs.push(right);
  };
  const last = pieces.length - 1;
  const endConditions = (piece: number, tau: number, kind: NodeRestraint, appliedTorque: number): void => {
    if (kind === 'none') {
      addRow([{ piece, tau, order: 2, weight: 1 }], 0);
      addRow([{ piece, tau, order: 'torque', weight: 1 }], appliedTorque * torqueScale);
      return;
    }
    addRow([{ piece, tau, order: 0, weight: 1 }], 0);
    addRow([{ piece, tau, order: kind === 'fork' ? 2 : 1, weight: 1 }], 0);
  };
  // T(0+) = -T0 at the start, T(L-) = +T0 at the end (T is 0 outside the member).
  endConditions(0, 0, nodeRestraint[0] as NodeRestraint, -(nodeTorque[0] as number));
  for (let j = 1; j < nodes.length - 1; j++) {
    const left = j - 1;
    const right = j;
    const end = (pieces[left] as Piece).delta;
    const kind = nodeRestraint[j] as NodeRestraint;
    const continuous = (order: number): void =>
      addRow(
        [
          { piece: left, tau: end, order, weight: 1 },
          { piece: right, tau: 0, order, weight: -1 },
        ],
        0,
      );
    if (kind === 'fixed') {
      for (const order of [0, 1]) {
        addRow([{ piece: left, tau: end, order, weight: 1 }], 0);
        addRow([{ piece: right, tau: 0, order, weight: 1 }], 0);
      }
    } else if (kind === 'fork') {
      addRow([{ piece: left, tau: end, order: 0, weight: 1 }], 0);
      addRow([{ piece: right, tau: 0, order: 0, weight: 1 }], 0);
      continuous(1);
      continuous(2);
    } else {
      continuous(0);
      continuous(1);
      continuous(2);
      addRow(
        [
          { piece: right, tau: 0, order: 'torque', weight: 1 },
          { piece: left, tau: end, order: 'torque', weight: -1 },
        ],
        -(nodeTorque[j] as number) * torqueScale,
      );
    }
  }
  endConditions(last, (pieces[last] as Piece).delta, nodeRestraint[nodes.length - 1] as NodeRestraint, nodeTorque[nodes.length - 1] as number);

  const coefficients = solveDense(matrix, rhs);
  if (coefficients === null) {
    throw new EngineError('unstable-member', 'The twist restraints leave the member free to turn (a mechanism).', ['restraints']);
  }

  const stateOf = (p: number, tau: number): WarpingTorsionState => {
    const piece = pieces[p] as Piece;
    const d = [0, 1, 2, 3].map((order) => combine(basisRow(piece, k, tau, order), coefficients, 4 * p));
    const twist = d[0] as number;
    const twistRate = (d[1] as number) / reference;
    const twistSecondDerivative = (d[2] as number) / reference ** 2;
    const twistThirdDerivative = (d[3] as number) / reference ** 3;
    const saintVenantTorque = GJ * twistRate;
    const warpingTorque = -EIw * twistThirdDerivative;
    return {
      twist,
      twistRate,
      twistSecondDerivative,
      twistThirdDerivative,
      bimoment: -EIw * twistSecondDerivative,
      warpingTorque,
      saintVenantTorque,
      torque: saintVenantTorque + warpingTorque,
    };
  };
  const pieceAt = (x: number, side: 'left' | 'right'): number => {
    let p = 0;
    while (p < last && (side === 'right' ? x >= (pieces[p] as Piece).end : x > (pieces[p] as Piece).end)) p++;
    return p;
  };
  const at = (x: number, side: 'left' | 'right' = 'right'): WarpingTorsionState => {
    if (!(Number.isFinite(x) && x >= -structuralTolerance && x <= length + structuralTolerance)) {
      refuse(`x = ${x} m lies outside the member (0 to ${length} m).`, ['x']);
    }
    const clamped = Math.min(length, Math.max(0, x));
    const p = pieceAt(clamped, side);
    const piece = pieces[p] as Piece;
    return stateOf(p, Math.min(piece.delta, Math.max(0, (clamped - piece.start) / reference)));
  };

  const zeroState = { bimoment: 0, torque: 0 };
  const reactions = restraints.map((r, i): TwistRestraintReaction => {
    const j = nodeIndex(restraintPositions[i] as number);
    const before = j === 0 ? zeroState : stateOf(j - 1, (pieces[j - 1] as Piece).delta);
    const after = j === nodes.length - 1 ? zeroState : stateOf(j, 0);
    return {
      position: restraintPositions[i] as number,
      kind: r.kind,
      torque: before.torque - after.torque - (nodeTorque[j] as number),
      bimomentJump: after.bimoment - before.bimoment,
    };
  });

  const fields: [keyof WarpingTorsionExtremes, number, (s: WarpingTorsionState) => number][] = [
    ['twist', 0, (s) => s.twist],
    ['bimoment', 2, (s) => s.bimoment],
    ['warpingTorque', 3, (s) => s.warpingTorque],
    ['saintVenantTorque', 1, (s) => s.saintVenantTorque],
  ];
  const extremes = {} as Record<keyof WarpingTorsionExtremes, FieldExtreme>;
  for (const [name, order, read] of fields) {
    let best: FieldExtreme = { value: 0, position: 0 };
    pieces.forEach((piece, p) => {
      const taus = [0, ...stationaryPoints(piece, k, coefficients, 4 * p, order), piece.delta];
      for (const tau of taus) {
        const value = read(stateOf(p, tau));
        if (Math.abs(value) > Math.abs(best.value)) best = { value, position: Math.min(piece.end, piece.start + tau * reference) };
      }
    });
    extremes[name] = best;
  }

  return { lambda, lambdaLength, at, reactions, extremes };
}
