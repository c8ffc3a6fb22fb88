/**
 * The fields of an analysed member at evenly spaced points plus every node, ready to draw.
 *
 * sampleDiagrams(analysis, 101) -> { x, values }: x holds 101 points from 0 to the length and every
 * node (a point within POSITION_TOLERANCE x length of a node is that node). Where some field jumps at
 * a node (point load, support, point moment, hinge), x holds the node twice, with the values just
 * left of it and then just right of it; elsewhere once. Values at or below ZERO_TOLERANCE of the
 * field's largest magnitude are 0, and no value is -0.
 */

import { evaluatePolynomial } from './polynomial.js';
import { DIAGRAM_FIELDS, type DiagramField, type MemberAnalysis, type MemberPiece } from './result.js';
import { JUMP_TOLERANCE, POSITION_TOLERANCE, roundedToZero } from './tolerances.js';

export interface SampledDiagrams {
  readonly x: number[];
  readonly values: Record<DiagramField, number[]>;
}

/** `samples` is rounded down and raised to at least 2 (both ends). */
export function sampleDiagrams(analysis: MemberAnalysis, samples: number): SampledDiagrams {
  const { length, nodes, pieces } = analysis;
  const count = Math.max(2, Math.floor(Number.isFinite(samples) ? samples : 2));
  const tolerance = POSITION_TOLERANCE * length;
  const scale = {} as Record<DiagramField, number>;
  const values = {} as Record<DiagramField, number[]>;
  for (const field of DIAGRAM_FIELDS) {
    const { max, min } = analysis.extremes[field];
    scale[field] = Math.max(Math.abs(max.value), Math.abs(min.value));
    values[field] = [];
  }
  const x: number[] = [];
  const push = (position: number, piece: MemberPiece, s: number): void => {
    x.push(position);
    for (const field of DIAGRAM_FIELDS) {
      values[field].push(roundedToZero(evaluatePolynomial(piece.fields[field], s), scale[field]));
    }
  };
  const jumps = (left: MemberPiece, right: MemberPiece): boolean =>
    DIAGRAM_FIELDS.some((field) => {
      const before = evaluatePolynomial(left.fields[field], left.end - left.start);
      const after = evaluatePolynomial(right.fields[field], 0);
      return Math.abs(after - before) > JUMP_TOLERANCE * scale[field];
    });

  let sample = 0;
  const sampleAt = (k: number): number => (k === count - 1 ? length : (k * length) / (count - 1));
  for (let i = 0; i < nodes.length; i++) {
    const node = nodes[i] as number;
    const left = pieces[i - 1];
    const right = pieces[i];
    while (sample < count && sampleAt(sample) <= node + tolerance) sample++;
    if (left && right && jumps(left, right)) {
      push(node, left, left.end - left.start);
      push(node, right, 0);
    } else if (right) push(node, right, 0);
    else if (left) push(node, left, left.end - left.start);
    if (!right) break;
    const next = nodes[i + 1] as number;
    for (; sample < count && sampleAt(sample) < next - tolerance; sample++) {
      const position = sampleAt(sample);
      push(position, right, position - right.start);
    }
  }
  return { x, values };
}
