/**
 * The envelope of the diagrams over several load states: the largest and smallest value of each field
 * at fixed positions. The positions are the same for every state (evenly spaced samples and the nodes
 * every state shares), so envelopes of different combinations merge point by point.
 */

import { evaluatePolynomial } from '../analysis/polynomial.js';
import { DIAGRAM_FIELDS, type DiagramField, type MemberAnalysis, type MemberPiece } from '../analysis/result.js';
import type { Side } from '../analysis/field-values.js';
import { POSITION_TOLERANCE } from '../analysis/tolerances.js';

export interface EnvelopePositions {
  readonly x: readonly number[];
  /** Which side of a node each value is read on: an interior fixed node appears twice, left then right. */
  readonly sides: readonly Side[];
}

export interface DiagramEnvelope {
  readonly x: readonly number[];
  readonly max: Readonly<Record<DiagramField, number[]>>;
  readonly min: Readonly<Record<DiagramField, number[]>>;
}

/**
 * `samples` evenly spaced points from 0 to the length and every fixed node (ends, supports, hinges,
 * load-case load points and ends); a sample within POSITION_TOLERANCE x length of a node is that node.
 */
export function envelopePositions(length: number, samples: number, fixedNodes: readonly number[]): EnvelopePositions {
  const tolerance = POSITION_TOLERANCE * length;
  const count = Math.max(2, Math.floor(samples));
  const nodes = [...new Set(fixedNodes.map((node) => Math.min(length, Math.max(0, node))))].sort((a, b) => a - b);
  const candidates: number[] = [];
  for (let k = 0; k < count; k++) candidates.push(k === count - 1 ? length : (k * length) / (count - 1));
  const x: number[] = [];
  const sides: Side[] = [];
  let n = 0;
  for (const sample of candidates) {
    while (n < nodes.length && (nodes[n] as number) < sample - tolerance) pushNode(nodes[n++] as number);
    if (n < nodes.length && Math.abs((nodes[n] as number) - sample) <= tolerance) pushNode(nodes[n++] as number);
    else {
      x.push(sample);
      sides.push('right');
    }
  }
  while (n < nodes.length) pushNode(nodes[n++] as number);
  return { x, sides };

  function pushNode(node: number): void {
    if (x.length > 0 && Math.abs((x[x.length - 1] as number) - node) <= tolerance) return;
    if (node <= tolerance) {
      x.push(0);
      sides.push('right');
    } else if (node >= length - tolerance) {
      x.push(length);
      sides.push('left');
    } else {
      x.push(node, node);
      sides.push('left', 'right');
    }
  }
}

function emptyColumns(count: number, fill: number): Record<DiagramField, number[]> {
  const columns = {} as Record<DiagramField, number[]>;
  for (const field of DIAGRAM_FIELDS) columns[field] = new Array<number>(count).fill(fill);
  return columns;
}

export function emptyEnvelope(positions: EnvelopePositions): DiagramEnvelope {
  return { x: positions.x, max: emptyColumns(positions.x.length, -Infinity), min: emptyColumns(positions.x.length, Infinity) };
}

/** Widens the envelope by one load state: every field at every position, walking the pieces once. */
export function widenEnvelope(envelope: DiagramEnvelope, positions: EnvelopePositions, analysis: MemberAnalysis): void {
  const { pieces } = analysis;
  const last = pieces.length - 1;
  let i = 0;
  for (let k = 0; k < positions.x.length; k++) {
    const x = positions.x[k] as number;
    const right = positions.sides[k] === 'right';
    while (i < last && (right ? x >= (pieces[i] as MemberPiece).end : x > (pieces[i] as MemberPiece).end)) i++;
    // A left-side value at a node is read on the piece that ends there, which the walk may have passed.
    while (i > 0 && !right && x <= (pieces[i - 1] as MemberPiece).end) i--;
    const piece = pieces[i] as MemberPiece;
    const s = x - piece.start;
    for (const field of DIAGRAM_FIELDS) {
      const value = evaluatePolynomial(piece.fields[field], s);
      const max = envelope.max[field];
      const min = envelope.min[field];
      if (value > (max[k] as number)) max[k] = value;
      if (value < (min[k] as number)) min[k] = value;
    }
  }
}

/** Merges `other` into `into`, both at the same positions. */
export function mergeEnvelope(into: DiagramEnvelope, other: DiagramEnvelope): void {
  for (const field of DIAGRAM_FIELDS) {
    const max = into.max[field];
    const min = into.min[field];
    other.max[field].forEach((value, k) => {
      if (value > (max[k] as number)) max[k] = value;
    });
    other.min[field].forEach((value, k) => {
      if (value < (min[k] as number)) min[k] = value;
    });
  }
}
