/**
 * The extremes of one diagram of fixed loads plus factor x a train, from the two analyses, without
 * solving the member again: superposition (the member is linear elastic). The two piece lists are
 * merged at every node of either, each polynomial moved to the start of the merged piece by a Taylor
 * shift, summed, and searched as the analysis searches its own (ends of pieces and roots of the
 * derivative). Used where the search of a moving load asks one diagram at many train positions.
 */

import { extremesOfField } from '../analysis/field-extremes.js';
import type { DiagramField, FieldExtremes, MemberAnalysis, MemberPiece, Polynomial } from '../analysis/result.js';

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

export function superposedFieldExtremes(fixed: MemberAnalysis, train: MemberAnalysis, factor: number, field: DiagramField): FieldExtremes {
  const pieces: MemberPiece[] = [];
  let i = 0;
  let j = 0;
  while (i < fixed.pieces.length && j < train.pieces.length) {
    const a = fixed.pieces[i] as MemberPiece;
    const b = train.pieces[j] as MemberPiece;
    const start = Math.max(a.start, b.start);
    const end = Math.min(a.end, b.end);
    if (end > start) {
      const polynomial = sumOf(shiftedPolynomial(a.fields[field], start - a.start), shiftedPolynomial(b.fields[field], start - b.start), factor);
      pieces.push({ start, end, fields: { [field]: polynomial } as unknown as MemberPiece['fields'] });
    }
    if (a.end <= b.end) i++;
    else j++;
  }
  return extremesOfField(pieces, field);
}
