/**
 * Global equilibrium of the member: the sums of all forces and of all moments about x = 0 of the
 * loads and the reactions, each divided by the scale of the numbers that enter it.
 */

import type { LinearIntensity, MemberModel } from '../member/model.js';
import type { EquilibriumResidual, SupportReaction } from './result.js';

/**
 * The magnitudes the sums are measured against: every force component that enters them (loads and
 * reactions) plus every moment component over the length, so that a member loaded only by couples
 * still has a force scale; the moment scale is that times the length.
 */
export interface EquilibriumScales {
  /** N */
  readonly forceScale: number;
  /** N*m */
  readonly momentScale: number;
}

/** Integral of |q| over a range of the given length, q linear between the end values. */
function absoluteIntegral(q: LinearIntensity, length: number): number {
  const a = q[0];
  const b = q[1];
  if (a * b >= 0) return ((Math.abs(a) + Math.abs(b)) / 2) * length;
  return ((a * a + b * b) / (2 * (Math.abs(a) + Math.abs(b)))) * length;
}

function clampedRange(model: MemberModel, from: number, to: number): [number, number] {
  return [Math.max(0, from), Math.min(model.length, to)];
}

export function equilibriumScales(model: MemberModel, reactions: readonly SupportReaction[]): EquilibriumScales {
  let force = 0;
  let moment = 0;
  for (const load of model.loads) {
    if (load.kind === 'point') {
      force += Math.abs(load.fx) + Math.abs(load.fy) + Math.abs(load.fz);
      moment += Math.abs(load.mx) + Math.abs(load.my) + Math.abs(load.mz);
    } else {
      const [from, to] = clampedRange(model, load.from, load.to);
      const length = to - from;
      force += absoluteIntegral(load.qx, length) + absoluteIntegral(load.qy, length) + absoluteIntegral(load.qz, length);
      moment += absoluteIntegral(load.mx, length);
    }
  }
  for (const r of reactions) {
    force += Math.abs(r.fx) + Math.abs(r.fy) + Math.abs(r.fz);
    moment += Math.abs(r.mx) + Math.abs(r.my) + Math.abs(r.mz);
  }
  const forceScale = force + moment / model.length;
  return { forceScale, momentScale: forceScale * model.length };
}

/** Force and moment sums of the member, one entry per axis. */
interface EquilibriumSums {
  readonly force: number[];
  readonly moment: number[];
}

/** Adds a concentrated action at x; r x F for r = (x, 0, 0) is (0, -x fz, x fy). */
function addAction(sums: EquilibriumSums, x: number, fx: number, fy: number, fz: number, mx: number, my: number, mz: number): void {
  const { force, moment } = sums;
  force[0] = (force[0] as number) + fx;
  force[1] = (force[1] as number) + fy;
  force[2] = (force[2] as number) + fz;
  moment[0] = (moment[0] as number) + mx;
  moment[1] = (moment[1] as number) + my - x * fz;
  moment[2] = (moment[2] as number) + mz + x * fy;
}

/** Integral of q over a range of the given length, q linear between the end values. */
function resultantOver(q: LinearIntensity, length: number): number {
  return ((q[0] + q[1]) / 2) * length;
}

/** Integral of x q(x) over [from, to] (of the given length) for q linear from q[0] to q[1]. */
function firstMomentOver(q: LinearIntensity, from: number, to: number, length: number): number {
  return (length / 6) * (q[0] * (2 * from + to) + q[1] * (from + 2 * to));
}

/** Sum of forces (three components) and of moments about the origin (three components). */
function equilibriumSums(model: MemberModel, reactions: readonly SupportReaction[]): EquilibriumSums {
  const sums: EquilibriumSums = { force: [0, 0, 0], moment: [0, 0, 0] };
  const { force, moment } = sums;
  for (const load of model.loads) {
    if (load.kind === 'point') {
      addAction(sums, Math.min(model.length, Math.max(0, load.position)), load.fx, load.fy, load.fz, load.mx, load.my, load.mz);
      continue;
    }
    const [from, to] = clampedRange(model, load.from, load.to);
    const length = to - from;
    force[0] = (force[0] as number) + resultantOver(load.qx, length);
    force[1] = (force[1] as number) + resultantOver(load.qy, length);
    force[2] = (force[2] as number) + resultantOver(load.qz, length);
    moment[0] = (moment[0] as number) + resultantOver(load.mx, length);
    moment[1] = (moment[1] as number) - firstMomentOver(load.qz, from, to, length);
    moment[2] = (moment[2] as number) + firstMomentOver(load.qy, from, to, length);
  }
  for (const r of reactions) addAction(sums, r.position, r.fx, r.fy, r.fz, r.mx, r.my, r.mz);
  return sums;
}

/** The largest magnitude among the values. */
function largestMagnitude(values: readonly number[]): number {
  let magnitude = Number.NEGATIVE_INFINITY;
  for (const value of values) magnitude = Math.max(magnitude, Math.abs(value));
  return magnitude;
}

export function equilibriumResidual(
  model: MemberModel,
  reactions: readonly SupportReaction[],
  scales: EquilibriumScales = equilibriumScales(model, reactions),
): EquilibriumResidual {
  const sums = equilibriumSums(model, reactions);
  const { forceScale, momentScale } = scales;
  return {
    force: forceScale > 0 ? largestMagnitude(sums.force) / forceScale : 0,
    moment: momentScale > 0 ? largestMagnitude(sums.moment) / momentScale : 0,
    forceScale,
    momentScale,
  };
}
