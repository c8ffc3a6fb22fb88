/**
 * The largest and smallest value of every field over the member, found analytically: the candidates
 * are the values on both sides of every node and the values at the roots of the field's derivative
 * inside every piece. Among equal values (within ZERO_TOLERANCE of the field's largest magnitude)
 * the first position wins; a value that small is reported as exactly 0.
 */

import { derivativeCanVanish, evaluatePolynomial, isZeroPolynomial } from './polynomial.js';
import { type DiagramField, type Extreme, type FieldExtremes, type MemberPiece, type Polynomial } from './result.js';
import { solveStationaryPoints } from './stationary-points.js';
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
 * directly; higher degrees go through realRootsIn, once for the analysis and its checks
 * (stationary-points.ts). A p' that is constant has no root: realRootsIn trims it to nothing.
 */
function pushInteriorStationary(candidates: Candidates, p: Polynomial, start: number, length: number): void {
  if (p.length < 3) return;
  if (p.length === 3) {
    const c2 = p[2] as number;
    const s = -(p[1] as number) / (2 * c2);
    if (c2 !== 0 && s > 0 && s < length) candidates.push(evaluatePolynomial(p, s), start + s);
    return;
  }
  if (!derivativeCanVanish(p)) return;
  const roots = solveStationaryPoints(p, length);
  for (let i = 0; i < roots.length; i++) {
    const s = roots[i] as number;
    candidates.push(evaluatePolynomial(p, s), start + s);
  }
}

/** Whether the field is zero on every piece (an unloaded direction): common, and its extremes known. */
function isZeroField(pieces: readonly MemberPiece[], field: DiagramField): boolean {
  for (let j = 0; j < pieces.length; j++) if (!isZeroPolynomial((pieces[j] as MemberPiece).fields[field])) return false;
  return pieces.length > 0;
}

/**
 * The extremes of one field over the pieces. A field zero everywhere gives +0 at every candidate, so
 * both extremes are 0 at the first one, the start of the member, as the search would find them.
 */
export function extremesOfField(pieces: readonly MemberPiece[], field: DiagramField): FieldExtremes {
  if (isZeroField(pieces, field)) {
    const start = (pieces[0] as MemberPiece).start;
    return { max: { value: 0, position: start }, min: { value: 0, position: start } };
  }
  const candidates = fieldCandidates;
  candidates.count = 0;
  for (let j = 0; j < pieces.length; j++) {
    const piece = pieces[j] as MemberPiece;
    const p = piece.fields[field];
    const length = piece.end - piece.start;
    candidates.push(evaluatePolynomial(p, 0), piece.start);
    pushInteriorStationary(candidates, p, piece.start, length);
    candidates.push(evaluatePolynomial(p, length), piece.end);
  }
  return extremesOf(candidates);
}

/** Every field's extremes, in the order of DIAGRAM_FIELDS; written out, so that the result is made with its keys at once. */
export function fieldExtremes(pieces: readonly MemberPiece[]): Record<DiagramField, FieldExtremes> {
  return {
    axial: extremesOfField(pieces, 'axial'),
    shearY: extremesOfField(pieces, 'shearY'),
    momentZ: extremesOfField(pieces, 'momentZ'),
    shearZ: extremesOfField(pieces, 'shearZ'),
    momentY: extremesOfField(pieces, 'momentY'),
    torque: extremesOfField(pieces, 'torque'),
    deflectionY: extremesOfField(pieces, 'deflectionY'),
    slopeZ: extremesOfField(pieces, 'slopeZ'),
    deflectionZ: extremesOfField(pieces, 'deflectionZ'),
    slopeY: extremesOfField(pieces, 'slopeY'),
    twist: extremesOfField(pieces, 'twist'),
  };
}
