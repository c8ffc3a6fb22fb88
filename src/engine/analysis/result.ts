/**
 * What the analysis returns: reactions and the exact internal-force and displacement fields of the
 * member, piece by piece, as polynomials in the local coordinate s = x - start of the piece.
 *
 * Sign conventions (documented in the contract):
 * - axial: internal force, positive in tension; EA du/dx = axial.
 * - shearY: the sum of the y forces (loads and reactions) on the part of the member left of x.
 * - momentZ: positive sagging (bottom fibre, -y, in tension); d(momentZ)/dx = shearY; EIz v'' = momentZ.
 * - deflectionY: positive up (+y); slopeZ = d(deflectionY)/dx (the right-hand rotation about z).
 * - The horizontal plane is the vertical plane with z in the place of y: shearZ is the sum of the z
 *   forces left of x, d(momentY)/dx = shearZ, momentY is positive when the fibre at -z is in tension,
 *   EIy w'' = momentY, slopeY = d(deflectionZ)/dx (the opposite sign of the right-hand rotation about y).
 * - torque: internal twisting moment on the face whose outward normal is +x, right-hand rule;
 *   GJ dtwist/dx = torque; twist is the right-hand rotation about x.
 */

import type { Direction } from '../member/model.js';

export const DIAGRAM_FIELDS = [
  'axial',
  'shearY',
  'momentZ',
  'shearZ',
  'momentY',
  'torque',
  'deflectionY',
  'slopeZ',
  'deflectionZ',
  'slopeY',
  'twist',
] as const;

export type DiagramField = (typeof DIAGRAM_FIELDS)[number];

/** Ascending coefficients: p(s) = c[0] + c[1] s + c[2] s^2 + ... */
export type Polynomial = readonly number[];

/** One piece of the member between two consecutive nodes, with every field exact on it. */
export interface MemberPiece {
  readonly start: number;
  readonly end: number;
  readonly fields: Readonly<Record<DiagramField, Polynomial>>;
}

/** Forces (N) and moments (N*m) a support applies to the member, along the axes, right-hand rule. */
export interface SupportReaction {
  readonly position: number;
  readonly fx: number;
  readonly fy: number;
  readonly fz: number;
  readonly mx: number;
  readonly my: number;
  readonly mz: number;
}

export interface Extreme {
  readonly value: number;
  readonly position: number;
}

export interface FieldExtremes {
  readonly max: Extreme;
  readonly min: Extreme;
}

/** Residuals of the six equilibrium sums over the whole member, divided by the load scale. */
export interface EquilibriumResidual {
  /** max |sum F| / force scale (dimensionless). */
  readonly force: number;
  /** max |sum M about x = 0| / moment scale (dimensionless). */
  readonly moment: number;
  readonly forceScale: number;
  readonly momentScale: number;
}

export interface MemberAnalysis {
  readonly length: number;
  /** Node positions, ascending: ends, supports, hinges, point loads and ends of distributed loads. */
  readonly nodes: readonly number[];
  /** Pieces between consecutive nodes, in order; pieces[i] spans nodes[i] to nodes[i + 1]. */
  readonly pieces: readonly MemberPiece[];
  /** One per support, in the order the supports were given. */
  readonly reactions: readonly SupportReaction[];
  readonly extremes: Readonly<Record<DiagramField, FieldExtremes>>;
  readonly equilibrium: EquilibriumResidual;
}

/** A direction in which the member can move without deforming, found from a vanishing pivot. */
export interface Mechanism {
  readonly direction: Direction;
  /** Where the stiffness vanished, m. */
  readonly position: number;
}
