/**
 * The fields of an analysed member at evenly spaced points plus every node, ready to draw.
 *
 * sampleDiagrams(analysis, 101) -> { x, values }: x holds 101 points from 0 to the length and every
 * node (a point within POSITION_TOLERANCE x length of a node is that node). Where some field jumps at
 * a node (point load, support, point moment, hinge), x holds the node twice, with the values just
 * left of it and then just right of it; elsewhere once. Values at or below ZERO_TOLERANCE of the
 * field's largest magnitude are 0, and no value is -0.
 *
 * Every answer carries its diagrams, so this runs on every request: the positions are laid out
 * first, then each field is evaluated into a column of its own. The pieces' coefficients are packed
 * into one typed array first, because the engine's polynomials come in several array kinds (a shared
 * frozen zero among them) and reading them in one loop is several times slower than reading one kind.
 * Everything else is a plain array: Node 20 allocates a typed array of more than eight entries off the
 * heap, several hundred nanoseconds each, and JSON.stringify writes packed plain arrays fastest.
 */

import { DIAGRAM_FIELDS, type DiagramField, type MemberAnalysis, type MemberPiece, type Polynomial } from './result.js';
import { JUMP_TOLERANCE, POSITION_TOLERANCE, ZERO_TOLERANCE } from './tolerances.js';

export interface SampledDiagrams {
  readonly x: readonly number[];
  readonly values: Readonly<Record<DiagramField, readonly number[]>>;
}

const FIELD_COUNT = DIAGRAM_FIELDS.length;

/**
 * Every piece's coefficients in one typed array, field after field in DIAGRAM_FIELDS order:
 * polynomial j = piece x FIELD_COUNT + field takes the entries from starts[j] to starts[j + 1].
 */
interface PackedCoefficients {
  readonly values: Float64Array;
  readonly starts: readonly number[];
}

function packCoefficients(pieces: readonly MemberPiece[]): PackedCoefficients {
  const starts: number[] = [];
  let size = 0;
  for (let i = 0; i < pieces.length; i++) {
    const fields = (pieces[i] as MemberPiece).fields;
    for (let f = 0; f < FIELD_COUNT; f++) {
      starts.push(size);
      size += fields[DIAGRAM_FIELDS[f] as DiagramField].length;
    }
  }
  starts.push(size);
  // One typed array: all doubles whatever kinds the polynomials came in.
  const values = new Float64Array(size);
  for (let i = 0; i < pieces.length; i++) {
    const fields = (pieces[i] as MemberPiece).fields;
    for (let f = 0; f < FIELD_COUNT; f++) {
      const polynomial = fields[DIAGRAM_FIELDS[f] as DiagramField] as Polynomial;
      const start = starts[i * FIELD_COUNT + f] as number;
      for (let c = 0; c < polynomial.length; c++) values[start + c] = polynomial[c] as number;
    }
  }
  return { values, starts };
}

/** Horner's rule on polynomial j (the same operations in the same order as evaluatePolynomial). */
function evaluate(packed: PackedCoefficients, j: number, s: number): number {
  const { values, starts } = packed;
  const first = starts[j] as number;
  let value = 0;
  for (let i = (starts[j + 1] as number) - 1; i >= first; i--) value = value * s + (values[i] as number);
  return value;
}

/** True when some field changes across the node between pieces `piece - 1` and `piece` by more than JUMP_TOLERANCE of its scale. */
function jumpsAt(packed: PackedCoefficients, piece: number, leftEnd: number, scales: readonly number[]): boolean {
  for (let f = 0; f < FIELD_COUNT; f++) {
    const before = evaluate(packed, (piece - 1) * FIELD_COUNT + f, leftEnd);
    const after = evaluate(packed, piece * FIELD_COUNT + f, 0);
    if (Math.abs(after - before) > JUMP_TOLERANCE * (scales[f] as number)) return true;
  }
  return false;
}

/** Sample k of `count` evenly spaced from 0 to the length; the last is the length itself, not (count - 1) x step with its rounding. */
function sampleAt(k: number, count: number, length: number): number {
  return k === count - 1 ? length : (k * length) / (count - 1);
}

/** `samples` is rounded down and raised to at least 2 (both ends). */
export function sampleDiagrams(analysis: MemberAnalysis, samples: number): SampledDiagrams {
  const { length, nodes, pieces } = analysis;
  const count = Math.max(2, Math.floor(Number.isFinite(samples) ? samples : 2));
  const tolerance = POSITION_TOLERANCE * length;
  const scales: number[] = [];
  for (let f = 0; f < FIELD_COUNT; f++) {
    const { max, min } = analysis.extremes[DIAGRAM_FIELDS[f] as DiagramField];
    scales.push(Math.max(Math.abs(max.value), Math.abs(min.value)));
  }
  const packed = packCoefficients(pieces);

  // Where each value is taken: position x, on piece `pieceOf`, at local coordinate `local`.
  const x: number[] = [];
  const pieceOf: number[] = [];
  const local: number[] = [];
  let sample = 0;
  let samplePosition = sampleAt(0, count, length);
  for (let i = 0; i < nodes.length; i++) {
    const node = nodes[i] as number;
    const left = pieces[i - 1];
    const right = pieces[i];
    while (sample < count && samplePosition <= node + tolerance) samplePosition = sampleAt(++sample, count, length);
    if (left && right && jumpsAt(packed, i, left.end - left.start, scales)) {
      x.push(node, node);
      pieceOf.push(i - 1, i);
      local.push(left.end - left.start, 0);
    } else if (right) {
      x.push(node);
      pieceOf.push(i);
      local.push(0);
    } else if (left) {
      x.push(node);
      pieceOf.push(i - 1);
      local.push(left.end - left.start);
    }
    if (!right) break;
    const next = nodes[i + 1] as number;
    for (; sample < count && samplePosition < next - tolerance; samplePosition = sampleAt(++sample, count, length)) {
      x.push(samplePosition);
      pieceOf.push(i);
      local.push(samplePosition - right.start);
    }
  }

  // Positions come piece by piece, in order: each field is evaluated a run of positions at a time.
  const runEnds: number[] = [];
  for (let k = 1; k <= x.length; k++) if (k === x.length || pieceOf[k] !== pieceOf[k - 1]) runEnds.push(k);
  const { values: coefficients, starts } = packed;
  const values = {} as Record<DiagramField, number[]>;
  for (let f = 0; f < FIELD_COUNT; f++) {
    const column: number[] = [];
    const zeroBelow = ZERO_TOLERANCE * (scales[f] as number);
    let k = 0;
    for (const end of runEnds) {
      const j = (pieceOf[k] as number) * FIELD_COUNT + f;
      const first = starts[j] as number;
      const last = (starts[j + 1] as number) - 1;
      for (; k < end; k++) {
        const s = local[k] as number;
        // Horner's rule, as evaluatePolynomial does it.
        let value = 0;
        for (let i = last; i >= first; i--) value = value * s + (coefficients[i] as number);
        // Rounding noise of the field's scale is 0, and -0 is 0.
        column.push(Math.abs(value) <= zeroBelow ? 0 : value);
      }
    }
    values[DIAGRAM_FIELDS[f] as DiagramField] = column;
  }
  return { x, values };
}
