/**
 * The member model the engine analyses: a straight prismatic member in SI units.
 *
 * Axes: x along the member from its start (x = 0) to its end (x = length), y up (gravity is -y),
 * z horizontal, right-handed. Depth is measured along y, width along z.
 */

/** The six directions a support may restrain: translations along and rotations about x, y, z. */
export type Direction = 'ux' | 'uy' | 'uz' | 'rx' | 'ry' | 'rz';

export const DIRECTIONS: readonly Direction[] = ['ux', 'uy', 'uz', 'rx', 'ry', 'rz'];

/** How a support acts in one direction: rigidly, not at all, or as a linear spring (N/m or N*m/rad). */
export type Restraint = 'rigid' | 'free' | { readonly spring: number };

export interface SupportModel {
  /** Position along the member, m, in [0, length]. */
  readonly position: number;
  readonly restraints: Readonly<Record<Direction, Restraint>>;
  /** Length of the seat the member bears on (the stiff bearing length of the web checks), m; 0 when not given. */
  readonly bearingLength?: number;
}

/** A moment release in both bending planes (torque and axial force are carried through). */
export interface HingeModel {
  readonly position: number;
}

/** Concentrated actions at one position: forces in N, moments in N*m, by the right-hand rule. */
export interface PointLoadModel {
  readonly kind: 'point';
  readonly position: number;
  readonly fx: number;
  readonly fy: number;
  readonly fz: number;
  readonly mx: number;
  readonly my: number;
  readonly mz: number;
  /** Length along the member over which the load bears on the flange (stiff bearing length), m; 0 when not given. */
  readonly bearingLength?: number;
}

/** Intensity at `from` and at `to`; varies linearly between. */
export type LinearIntensity = readonly [number, number];

/**
 * A distributed load over [from, to]: forces per length qx, qy, qz in N/m along the axes and a
 * distributed torque mx in N*m/m about x (right-hand rule).
 */
export interface DistributedLoadModel {
  readonly kind: 'distributed';
  readonly from: number;
  readonly to: number;
  readonly qx: LinearIntensity;
  readonly qy: LinearIntensity;
  readonly qz: LinearIntensity;
  readonly mx: LinearIntensity;
}

export type LoadModel = PointLoadModel | DistributedLoadModel;

/** Rigidities of the section and material: EA (N), EIz and EIy (N*m^2), GJ (N*m^2). */
export interface MemberStiffness {
  readonly axial: number;
  /** E * secondMomentZ: bending in the vertical x-y plane. */
  readonly bendingZ: number;
  /** E * secondMomentY: bending in the horizontal x-z plane. */
  readonly bendingY: number;
  readonly torsional: number;
}

export interface MemberModel {
  readonly length: number;
  readonly supports: readonly SupportModel[];
  readonly hinges: readonly HingeModel[];
  readonly loads: readonly LoadModel[];
  readonly stiffness: MemberStiffness;
}

/** Standard gravity, m/s^2 (CGPM 1901; ISO 80000-3). */
export const STANDARD_GRAVITY = 9.80665;
