/**
 * The largest and smallest value of every field over the member, found analytically: the candidates
 * are the values on both sides of every node and the values at the roots of the field's derivative
 * inside every piece. Among equal values (within ZERO_TOLERANCE of the field's largest magnitude)
 * the first position wins; a value that small is reported as exactly 0.
 */

import { derivative, evaluatePolynomial, realRootsIn } from './polynomial.js';
import { DIAGRAM_FIELDS, type DiagramField, type Extreme, type FieldExtremes, type MemberPiece, type Polynomial } from './result.js';
import { roundedToZero, ZERO_TOLERANCE } from './tolerances.js';

/**
 * Candidate values and positions of one field, in ascending position. Plain arrays kept from call to
 * call: a Float64Array of this size is allocated outside the heap, which cost more than the search.
 */
class Candidates {
  readonly values: number[] = [];
  readonly positions: number[] = [];
  count = 0;

  push(value: number, position: number): void {
    if (this.count === this.values.length) {
      this.values.push(value);
      this.positions.push(position);
    } else {
      this.values[this.count] = value;
      this.positions[this.count] = position;
    }
    this.count++;
  }
}

/** One field is gathered and reduced at a time, synchronously, so every call shares these arrays. */
const fieldCandidates = new Candidates();

/** Candidate i, its value rounded to 0 at or below ZERO_TOLERANCE of the scale. */
function extremeAt(candidates: Candidates, i: number, scale: number): Extreme {
  return { value: roundedToZero(candidates.values[i] as number, scale), position: candidates.positions[i] as number };
}

function extremesOf(candidates: Candidates): FieldExtremes {
  const { values, count } = candidates;
  let largest = Number.NEGATIVE_INFINITY;
  let smallest = Number.POSITIVE_INFINITY;
  for (let i = 0; i < count; i++) {
    const v = values[i] as number;
    if (v > largest) largest = v;
    if (v < smallest) smallest = v;
  }
  const scale = Math.max(Math.abs(largest), Math.abs(smallest));
  const tie = ZERO_TOLERANCE * scale;
  let max = -1;
  let min = -1;
  for (let i = 0; i < count && (max < 0 || min < 0); i++) {
    const v = values[i] as number;
    if (max < 0 && v >= largest - tie) max = i;
    if (min < 0 && v <= smallest + tie) min = i;
  }
  return { max: extremeAt(candidates, max, scale), min: extremeAt(candidates, min, scale) };
}

/**
 * Adds the values of p at the roots of p' inside (0, length). A quadratic p has one candidate, found
 * directly; higher degrees go through realRootsIn.
 */
function pushInteriorStationary(candidates: Candidates, p: Polynomial, start: number, length: number): void {
  if (p.length < 3) return;
  if (p.length === 3) {
    const c2 = p[2] as number;
    const s = -(p[1] as number) / (2 * c2);
    if (c2 !== 0 && s > 0 && s < length) candidates.push(evaluatePolynomial(p, s), start + s);
    return;
  }
  for (const s of realRootsIn(derivative(p), 0, length)) candidates.push(evaluatePolynomial(p, s), start + s);
}

export function fieldExtremes(pieces: readonly MemberPiece[]): Record<DiagramField, FieldExtremes> {
  const result = {} as Record<DiagramField, FieldExtremes>;
  const candidates = fieldCandidates;
  for (const field of DIAGRAM_FIELDS) {
    candidates.count = 0;
    for (const piece of pieces) {
      const p = piece.fields[field];
      const length = piece.end - piece.start;
      candidates.push(evaluatePolynomial(p, 0), piece.start);
      pushInteriorStationary(candidates, p, piece.start, length);
      candidates.push(evaluatePolynomial(p, length), piece.end);
    }
    result[field] = extremesOf(candidates);
  }
  return result;
}
