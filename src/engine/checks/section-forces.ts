/** The internal forces at one cross-section, read from the exact fields of an analysed piece. */

import { evaluatePolynomial } from '../analysis/polynomial.js';
import type { MemberPiece } from '../analysis/result.js';

/** N, Vy, Vz (N), Mz, My, T (N*m), with the sign conventions of analysis/result.ts. */
export interface SectionForces {
  readonly axial: number;
  readonly shearY: number;
  readonly shearZ: number;
  readonly momentZ: number;
  readonly momentY: number;
  readonly torque: number;
}

export const FORCE_FIELDS = ['axial', 'shearY', 'shearZ', 'momentZ', 'momentY', 'torque'] as const;

/** The forces at local coordinate s = x - piece.start. */
export function sectionForcesOnPiece(piece: MemberPiece, s: number): SectionForces {
  const { fields } = piece;
  return {
    axial: evaluatePolynomial(fields.axial, s),
    shearY: evaluatePolynomial(fields.shearY, s),
    shearZ: evaluatePolynomial(fields.shearZ, s),
    momentZ: evaluatePolynomial(fields.momentZ, s),
    momentY: evaluatePolynomial(fields.momentY, s),
    torque: evaluatePolynomial(fields.torque, s),
  };
}
