/**
 * The extremes of one diagram of fixed loads plus factor x a train, from the two analyses, without
 * solving the member again (it is linear elastic): the two piece lists are merged at every node of
 * either, each polynomial moved to the start of the merged piece by a Taylor shift and summed, and the
 * result searched as the analysis searches its own (ends of pieces and roots of the derivative). The
 * search of a moving load asks for one diagram at many train positions: the fixed loads are solved
 * once, the train alone (a few point loads) at each position.
 */

import { extremesOfField } from '../analysis/field-extremes.js';
import type { DiagramField, FieldExtremes, MemberAnalysis, MemberPiece, Polynomial } from '../analysis/result.js';
import { LOAD_POSITION_TOLERANCE } from '../analysis/tolerances.js';

/** Coefficients of p(s + shift), ascending: repeated synthetic division (Taylor shift, Horner's scheme). */
export function shiftedPolynomial(p: Polynomial, shift: number): number[] {
  const c = [...p];
  if (shift === 0) return c;
  const degree = c.length - 1;
  for (let i = 0; i < degree; i++) {
    for (let k = degree - 1; k >= i; k--) c[k] = (c[k] as number) + shift * (c[k + 1] as number);
  }
  return c;
}

function sumOf(a: Polynomial, b: Polynomial, factor: number): number[] {
  const sum: number[] = [];
  for (let k = 0; k < Math.max(a.length, b.length); k++) sum.push((a[k] ?? 0) + factor * (b[k] ?? 0));
  return sum;
}

/** The piece of `pieces` that holds x, searching forward from `from`. */
function pieceHolding(pieces: readonly MemberPiece[], x: number, from: number): number {
  let i = from;
  while (i < pieces.length - 1 && x >= (pieces[i] as MemberPiece).end) i++;
  return i;
}

/**
 * Visits every piece of the merged node set, with the piece of each analysis that holds it. Nodes of the
 * two closer than the load-position tolerance are one node, as the analysis merges a load with a node.
 */
function forEachMergedPiece(fixed: MemberAnalysis, train: MemberAnalysis, visit: (start: number, end: number, a: MemberPiece, b: MemberPiece) => void): void {
  const tolerance = LOAD_POSITION_TOLERANCE * fixed.length;
  const all = [...fixed.nodes, ...train.nodes].sort((x, y) => x - y);
  const nodes: number[] = [];
  for (const x of all) if (nodes.length === 0 || x - (nodes[nodes.length - 1] as number) > tolerance) nodes.push(x);
  nodes[nodes.length - 1] = fixed.length;
  let i = 0;
  let j = 0;
  for (let k = 0; k + 1 < nodes.length; k++) {
    const start = nodes[k] as number;
    const end = nodes[k + 1] as number;
    const middle = 0.5 * (start + end);
    i = pieceHolding(fixed.pieces, middle, i);
    j = pieceHolding(train.pieces, middle, j);
    visit(start, end, fixed.pieces[i] as MemberPiece, train.pieces[j] as MemberPiece);
  }
}

export function superposedFieldExtremes(fixed: MemberAnalysis, train: MemberAnalysis, factor: number, field: DiagramField): FieldExtremes {
  const pieces: MemberPiece[] = [];
  forEachMergedPiece(fixed, train, (start, end, a, b) => {
    const polynomial = sumOf(shiftedPolynomial(a.fields[field], start - a.start), shiftedPolynomial(b.fields[field], start - b.start), factor);
    pieces.push({ start, end, fields: { [field]: polynomial } as unknown as MemberPiece['fields'] });
  });
  return extremesOfField(pieces, field);
}
