/**
 * The exact envelope of a moving load on its own (factor 1): at each fixed position, the largest and
 * smallest value of every diagram over every train position, and the same for every reaction.
 *
 * The train's response is a weighted sum of influence lines (see influence-lines.ts), each a cubic in
 * the load position between its breakpoints, so as a function of the train position it is a cubic
 * between the positions that put some axle on a breakpoint. On each such interval the sum is formed
 * exactly and its largest and smallest values found at the ends (one-sided limits) or where its
 * derivative vanishes; at each breakpoint itself the value is taken as it is (an axle standing exactly
 * on the point read may give neither limit). Combinations use it by superposition: fixed loads plus
 * factor x train.
 */

import { DIAGRAM_FIELDS, type DiagramField } from '../analysis/result.js';
import { POSITION_TOLERANCE } from '../analysis/tolerances.js';
import { FIELD_PLANE, REACTION_COMPONENTS, REACTION_PLANE, type InfluenceLine, type InfluenceLines, type Plane, type ReactionComponent } from './influence-lines.js';
import type { MovingLoadModel } from './load-actions.js';

export { REACTION_COMPONENTS, type ReactionComponent };

export interface ReactionBound {
  readonly value: number;
  readonly loadPosition: number;
}

export interface ReactionBounds {
  readonly max: Record<ReactionComponent, ReactionBound>;
  readonly min: Record<ReactionComponent, ReactionBound>;
}

export interface TrainEnvelope {
  readonly max: Readonly<Record<DiagramField, readonly number[]>>;
  readonly min: Readonly<Record<DiagramField, readonly number[]>>;
  /** One per support, in order. */
  readonly reactions: readonly ReactionBounds[];
}

/** Largest and smallest value found so far, and the train positions where. */
interface Range {
  max: number;
  pMax: number;
  min: number;
  pMin: number;
}

function note(range: Range, value: number, p: number): void {
  if (value > range.max) {
    range.max = value;
    range.pMax = p;
  }
  if (value < range.min) {
    range.min = value;
    range.pMin = p;
  }
}

/** Index of the piece of `starts` that holds x (the last piece for x at the end). */
function pieceOf(starts: readonly number[], x: number): number {
  let lo = 0;
  let hi = starts.length - 2;
  while (lo < hi) {
    const mid = (lo + hi + 1) >> 1;
    if ((starts[mid] as number) <= x) lo = mid;
    else hi = mid - 1;
  }
  return lo;
}

/** The line's value with the load exactly at a: zero off the member, the value on the point read, else its piece's cubic. */
function lineValue(line: InfluenceLine, a: number, length: number, tolerance: number): number {
  if (Math.abs(a - line.readAt) <= tolerance) return line.valueOnIt;
  if (a < -tolerance || a > length + tolerance) return 0;
  const x = Math.min(length, Math.max(0, a));
  const i = pieceOf(line.starts, x);
  const u = line.starts[i] as number;
  const t = Math.min(1, Math.max(0, (x - u) / ((line.starts[i + 1] as number) - u)));
  const c = line.cubics;
  return (((c[4 * i + 3] as number) * t + (c[4 * i + 2] as number)) * t + (c[4 * i + 1] as number)) * t + (c[4 * i] as number);
}

/** Largest and smallest value on [0, 1] of d0 + d1 s + d2 s^2 + d3 s^3, noted at p0 + s (p1 - p0). */
function noteCubicRange(range: Range, d0: number, d1: number, d2: number, d3: number, p0: number, p1: number): void {
  const at = (s: number) => ((d3 * s + d2) * s + d1) * s + d0;
  note(range, d0, p0);
  note(range, at(1), p1);
  const a = 3 * d3;
  const b = 2 * d2;
  const scale = Math.abs(a) + Math.abs(b) + Math.abs(d1);
  if (scale === 0) return;
  const inside = (s: number) => {
    if (s > 0 && s < 1) note(range, at(s), p0 + s * (p1 - p0));
  };
  if (Math.abs(a) <= 1e-12 * scale) {
    if (Math.abs(b) > 1e-12 * scale) inside(-d1 / b);
    return;
  }
  const discriminant = b * b - 4 * a * d1;
  if (discriminant < 0) return;
  const root = Math.sqrt(discriminant);
  const q = -0.5 * (b + (b >= 0 ? root : -root));
  inside(q / a);
  if (q !== 0) inside(d1 / q);
}

/** Train positions in [from, to] that put some axle on a breakpoint of the lines, with from and to. */
function trainBreakpoints(train: MovingLoadModel, starts: readonly number[], tolerance: number): number[] {
  const points = [train.from, train.to];
  for (const axle of train.axles) {
    for (const b of starts) {
      const p = b - axle.offset;
      if (p > train.from + tolerance && p < train.to - tolerance) points.push(p);
    }
  }
  points.sort((x, y) => x - y);
  const distinct: number[] = [];
  for (const p of points) if (distinct.length === 0 || p - (distinct[distinct.length - 1] as number) > tolerance) distinct.push(p);
  return distinct;
}

/**
 * The range over the travel of sum_i w_i line_i(p + offset_i) for several lines sharing their
 * breakpoints (`starts`), each with the axle weights of its plane.
 */
function trainRanges(train: MovingLoadModel, lines: readonly InfluenceLine[], planes: readonly Plane[], length: number, tolerance: number): Range[] {
  const ranges = lines.map((): Range => ({ max: -Infinity, pMax: train.from, min: Infinity, pMin: train.from }));
  if (lines.length === 0) return ranges;
  const starts = (lines[0] as InfluenceLine).starts;
  const weights = (plane: Plane) => train.axles.map((axle) => (plane === 'y' ? axle.fy : plane === 'z' ? axle.fz : 0));
  const byLine = planes.map(weights);
  const points = trainBreakpoints(train, starts, tolerance);
  const axles = train.axles.length;
  const pieceIndex = new Int32Array(axles);
  const alpha = new Float64Array(axles);
  const beta = new Float64Array(axles);
  for (let m = 0; m + 1 < points.length; m++) {
    const p0 = points[m] as number;
    const p1 = points[m + 1] as number;
    for (let i = 0; i < axles; i++) {
      const offset = (train.axles[i] as MovingLoadModel['axles'][number]).offset;
      const middle = 0.5 * (p0 + p1) + offset;
      if (middle < 0 || middle > length) {
        pieceIndex[i] = -1;
        continue;
      }
      const piece = pieceOf(starts, middle);
      const u = starts[piece] as number;
      const width = (starts[piece + 1] as number) - u;
      pieceIndex[i] = piece;
      alpha[i] = (p0 + offset - u) / width;
      beta[i] = (p1 - p0) / width;
    }
    lines.forEach((line, l) => {
      const w = byLine[l] as number[];
      let d0 = 0;
      let d1 = 0;
      let d2 = 0;
      let d3 = 0;
      for (let i = 0; i < axles; i++) {
        const piece = pieceIndex[i] as number;
        const weight = w[i] as number;
        if (piece < 0 || weight === 0) continue;
        const c = line.cubics;
        const c0 = c[4 * piece] as number;
        const c1 = c[4 * piece + 1] as number;
        const c2 = c[4 * piece + 2] as number;
        const c3 = c[4 * piece + 3] as number;
        const a = alpha[i] as number;
        const b = beta[i] as number;
        // c(a + b s): Taylor shift by a, then scale by powers of b.
        d0 += weight * (((c3 * a + c2) * a + c1) * a + c0);
        d1 += weight * b * ((3 * c3 * a + 2 * c2) * a + c1);
        d2 += weight * b * b * (3 * c3 * a + c2);
        d3 += weight * b * b * b * c3;
      }
      noteCubicRange(ranges[l] as Range, d0, d1, d2, d3, p0, p1);
    });
  }
  for (const p of points) {
    lines.forEach((line, l) => {
      const w = byLine[l] as number[];
      let value = 0;
      train.axles.forEach((axle, i) => {
        if (w[i] !== 0) value += (w[i] as number) * lineValue(line, p + axle.offset, length, tolerance);
      });
      note(ranges[l] as Range, value, p);
    });
  }
  return ranges;
}

export function trainEnvelope(lines: InfluenceLines, train: MovingLoadModel): TrainEnvelope {
  const { length } = lines;
  const tolerance = POSITION_TOLERANCE * length;
  const count = lines.fields.find((line) => line !== null)?.length ?? 0;
  const max = {} as Record<DiagramField, number[]>;
  const min = {} as Record<DiagramField, number[]>;
  for (const field of DIAGRAM_FIELDS) {
    max[field] = new Array<number>(count).fill(0);
    min[field] = new Array<number>(count).fill(0);
  }
  const reached = DIAGRAM_FIELDS.filter((field) => FIELD_PLANE[field] !== null);
  for (let k = 0; k < count; k++) {
    const atK = reached.map((field) => (lines.fields[DIAGRAM_FIELDS.indexOf(field)] as readonly InfluenceLine[])[k] as InfluenceLine);
    const ranges = trainRanges(train, atK, reached.map((field) => FIELD_PLANE[field]), length, tolerance);
    reached.forEach((field, i) => {
      const range = ranges[i] as Range;
      (max[field] as number[])[k] = range.max;
      (min[field] as number[])[k] = range.min;
    });
  }
  const components = REACTION_COMPONENTS.filter((component) => REACTION_PLANE[component] !== null);
  const reactions = lines.reactions.map((bySupport): ReactionBounds => {
    const ranges = trainRanges(train, components.map((component) => bySupport[component] as InfluenceLine), components.map((component) => REACTION_PLANE[component]), length, tolerance);
    const maxBounds = {} as Record<ReactionComponent, ReactionBound>;
    const minBounds = {} as Record<ReactionComponent, ReactionBound>;
    for (const component of REACTION_COMPONENTS) {
      maxBounds[component] = { value: 0, loadPosition: train.from };
      minBounds[component] = { value: 0, loadPosition: train.from };
    }
    components.forEach((component, i) => {
      const range = ranges[i] as Range;
      maxBounds[component] = { value: range.max, loadPosition: range.pMax };
      minBounds[component] = { value: range.min, loadPosition: range.pMin };
    });
    return { max: maxBounds, min: minBounds };
  });
  return { max, min, reactions };
}
