/** Reading the exact fields of an analysed member at any position. */

import { evaluatePolynomial } from './polynomial.js';
import { DIAGRAM_FIELDS, type DiagramField, type MemberAnalysis, type MemberPiece } from './result.js';

/** Which side of a jump to read at a node: just left of x or just right of it. */
export type Side = 'left' | 'right';

/** Index of the piece that holds x on the given side (binary search over the nodes). */
export function pieceIndexAt(analysis: MemberAnalysis, x: number, side: Side): number {
  const { pieces } = analysis;
  let lo = 0;
  let hi = pieces.length - 1;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    const piece = pieces[mid] as MemberPiece;
    const beyond = side === 'left' ? x > piece.end : x >= piece.end;
    if (beyond) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

export function fieldAt(analysis: MemberAnalysis, field: DiagramField, x: number, side: Side = 'right'): number {
  const piece = analysis.pieces[pieceIndexAt(analysis, x, side)] as MemberPiece;
  return evaluatePolynomial(piece.fields[field], x - piece.start);
}

export function fieldsAt(analysis: MemberAnalysis, x: number, side: Side = 'right'): Record<DiagramField, number> {
  const piece = analysis.pieces[pieceIndexAt(analysis, x, side)] as MemberPiece;
  const s = x - piece.start;
  const values = {} as Record<DiagramField, number>;
  for (const field of DIAGRAM_FIELDS) values[field] = evaluatePolynomial(piece.fields[field], s);
  return values;
}
