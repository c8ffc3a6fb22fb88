/** The solved one-dimensional problems gathered into the member's pieces, one per pair of nodes. */

import type { MemberNodes } from './member-nodes.js';
import type { DiagramField, MemberPiece, Polynomial } from './result.js';
import type { MemberSolutions } from './support-reactions.js';

/** The zero polynomial, shared by every piece of a field that vanishes there. */
const ZERO: Polynomial = Object.freeze([0]);

/** Coefficients [offset, offset + terms) without trailing zeros (at least one kept) and without -0. */
function polynomialAt(coefficients: ArrayLike<number>, piece: number, terms: number): Polynomial {
  const offset = piece * terms;
  let degree = terms - 1;
  while (degree >= 0 && coefficients[offset + degree] === 0) degree--;
  if (degree < 0) return ZERO;
  const p = new Array<number>(degree + 1);
  for (let k = 0; k <= degree; k++) p[k] = (coefficients[offset + k] as number) + 0;
  return p;
}

export function memberPieces(nodes: MemberNodes, solutions: MemberSolutions): MemberPiece[] {
  const { axial, torsion, vertical, horizontal } = solutions;
  const pieces = new Array<MemberPiece>(nodes.count - 1);
  for (let j = 0; j < pieces.length; j++) {
    const fields: Record<DiagramField, Polynomial> = {
      axial: polynomialAt(axial.force, j, 3),
      shearY: polynomialAt(vertical.shear, j, 3),
      momentZ: polynomialAt(vertical.moment, j, 4),
      shearZ: polynomialAt(horizontal.shear, j, 3),
      momentY: polynomialAt(horizontal.moment, j, 4),
      torque: polynomialAt(torsion.force, j, 3),
      deflectionY: polynomialAt(vertical.deflection, j, 6),
      slopeZ: polynomialAt(vertical.slope, j, 5),
      deflectionZ: polynomialAt(horizontal.deflection, j, 6),
      slopeY: polynomialAt(horizontal.slope, j, 5),
      twist: polynomialAt(torsion.displacement, j, 4),
    };
    pieces[j] = { start: nodes.positions[j] as number, end: nodes.positions[j + 1] as number, fields };
  }
  return pieces;
}
