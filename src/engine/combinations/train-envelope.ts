/**
 * The exact envelope of a moving load on its own (factor 1): at each fixed position, the largest and
 * smallest value of every diagram over every train position, and the same for every reaction.
 *
 * Why it is exact: the member is linear elastic and prismatic, so the response at a fixed point to a unit
 * point load at a is, by Maxwell-Betti reciprocity and the cubic (Hermite) displacement of each element,
 * a cubic in a between the member's nodes and the point itself (Timoshenko & Gere, Theory of Elastic
 * Stability, and any text on influence lines: Muller-Breslau's principle). A train's response is a sum of
 * such cubics, so between breakpoints (an axle on an end, support, hinge or fixed position) it is a cubic
 * in the train position: four analyses inside each interval fix it, and its largest value lies at an end
 * of the interval (a one-sided limit), where its derivative vanishes, or at a breakpoint itself.
 *
 * Combinations use it by superposition: fixed loads plus factor x train.
 */

import { analyseMember } from '../analysis/analyse-member.js';
import { evaluatePolynomial } from '../analysis/polynomial.js';
import { DIAGRAM_FIELDS, type DiagramField, type MemberAnalysis, type MemberPiece } from '../analysis/result.js';
import { POSITION_TOLERANCE } from '../analysis/tolerances.js';
import type { MemberModel } from '../member/model.js';
import { trainLoads } from './combined-loads.js';
import type { EnvelopePositions } from './diagram-envelope.js';
import type { MovingLoadModel } from './load-actions.js';

export const REACTION_COMPONENTS = ['fx', 'fy', 'fz', 'mx', 'my', 'mz'] as const;
export type ReactionComponent = (typeof REACTION_COMPONENTS)[number];

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
  /** Train analyses made. */
  readonly analyses: number;
}

/** Chebyshev points of the first kind on [0, 1]: a well-conditioned cubic fit. */
const FIT_POINTS = [1, 3, 5, 7].map((k) => 0.5 - 0.5 * Math.cos((k * Math.PI) / 8));

/** Breakpoints of the train position: where some axle meets an end, support, hinge or fixed position. */
export function trainBreakpoints(train: MovingLoadModel, member: Omit<MemberModel, 'loads'>, positions: EnvelopePositions): number[] {
  const tolerance = POSITION_TOLERANCE * member.length;
  const targets = [0, member.length, ...member.supports.map((support) => support.position), ...member.hinges.map((hinge) => hinge.position), ...positions.x];
  const points = [train.from, train.to];
  for (const axle of train.axles) {
    for (const target of targets) {
      const p = target - axle.offset;
      if (p > train.from + tolerance && p < train.to - tolerance) points.push(p);
    }
  }
  points.sort((a, b) => a - b);
  const distinct: number[] = [];
  for (const p of points) if (distinct.length === 0 || p - (distinct[distinct.length - 1] as number) > tolerance) distinct.push(p);
  return distinct;
}

/** The fields at every fixed position, field after field: out[f * count + k]. */
function fieldsAtPositions(analysis: MemberAnalysis, positions: EnvelopePositions, out: Float64Array): void {
  const { pieces } = analysis;
  const count = positions.x.length;
  const last = pieces.length - 1;
  let i = 0;
  for (let k = 0; k < count; k++) {
    const x = positions.x[k] as number;
    const right = positions.sides[k] === 'right';
    while (i < last && (right ? x >= (pieces[i] as MemberPiece).end : x > (pieces[i] as MemberPiece).end)) i++;
    while (i > 0 && !right && x <= (pieces[i - 1] as MemberPiece).end) i--;
    const piece = pieces[i] as MemberPiece;
    const s = x - piece.start;
    for (let f = 0; f < DIAGRAM_FIELDS.length; f++) out[f * count + k] = evaluatePolynomial(piece.fields[DIAGRAM_FIELDS[f] as DiagramField], s);
  }
}

/** Where a fitted cubic is largest and smallest on [0, 1], and its values there: written by cubicRange. */
interface CubicRange {
  max: number;
  tMax: number;
  min: number;
  tMin: number;
}

/**
 * The largest and smallest value on [0, 1] of the cubic through (t_i, y_i) at the four fit points:
 * at 0, at 1, or where its derivative vanishes inside. Writes into `range` (no allocation: it runs for
 * every field at every position of every interval).
 */
function cubicRange(y0: number, y1: number, y2: number, y3: number, range: CubicRange): void {
  const t0 = FIT_POINTS[0] as number;
  const t1 = FIT_POINTS[1] as number;
  const t2 = FIT_POINTS[2] as number;
  const t3 = FIT_POINTS[3] as number;
  // Newton's divided differences, then the monomial coefficients c0 + c1 t + c2 t^2 + c3 t^3.
  const d01 = (y1 - y0) / (t1 - t0);
  const d12 = (y2 - y1) / (t2 - t1);
  const d23 = (y3 - y2) / (t3 - t2);
  const d012 = (d12 - d01) / (t2 - t0);
  const d123 = (d23 - d12) / (t3 - t1);
  const c3 = (d123 - d012) / (t3 - t0);
  const c2 = d012 - c3 * (t0 + t1 + t2);
  const c1 = d01 - d012 * (t0 + t1) + c3 * (t0 * t1 + t0 * t2 + t1 * t2);
  const c0 = y0 - d01 * t0 + d012 * t0 * t1 - c3 * t0 * t1 * t2;
  const at1 = c0 + c1 + c2 + c3;
  range.max = c0;
  range.tMax = 0;
  range.min = c0;
  range.tMin = 0;
  consider(range, 1, at1);
  // p'(t) = 3 c3 t^2 + 2 c2 t + c1 = a t^2 + b t + c1
  const a = 3 * c3;
  const b = 2 * c2;
  const scale = Math.abs(a) + Math.abs(b) + Math.abs(c1);
  if (scale === 0) return;
  if (Math.abs(a) <= 1e-12 * scale) {
    if (Math.abs(b) > 1e-12 * scale) considerRoot(range, -c1 / b, c0, c1, c2, c3);
    return;
  }
  const discriminant = b * b - 4 * a * c1;
  if (discriminant < 0) return;
  const root = Math.sqrt(discriminant);
  // The numerically stable pair of roots.
  const q = -0.5 * (b + (b >= 0 ? root : -root));
  considerRoot(range, q / a, c0, c1, c2, c3);
  if (q !== 0) considerRoot(range, c1 / q, c0, c1, c2, c3);
}

function consider(range: CubicRange, t: number, value: number): void {
  if (value > range.max) {
    range.max = value;
    range.tMax = t;
  }
  if (value < range.min) {
    range.min = value;
    range.tMin = t;
  }
}

function considerRoot(range: CubicRange, t: number, c0: number, c1: number, c2: number, c3: number): void {
  if (t > 0 && t < 1) consider(range, t, ((c3 * t + c2) * t + c1) * t + c0);
}

function emptyBounds(supports: number): ReactionBounds[] {
  return Array.from({ length: supports }, () => {
    const max = {} as Record<ReactionComponent, ReactionBound>;
    const min = {} as Record<ReactionComponent, ReactionBound>;
    for (const component of REACTION_COMPONENTS) {
      max[component] = { value: -Infinity, loadPosition: 0 };
      min[component] = { value: Infinity, loadPosition: 0 };
    }
    return { max, min };
  });
}

export function trainEnvelope(member: Omit<MemberModel, 'loads'>, train: MovingLoadModel, positions: EnvelopePositions): TrainEnvelope {
  const count = positions.x.length;
  const fieldCount = DIAGRAM_FIELDS.length;
  const max = new Float64Array(fieldCount * count).fill(-Infinity);
  const min = new Float64Array(fieldCount * count).fill(Infinity);
  const reactions = emptyBounds(member.supports.length);
  const analyse = (p: number) => analyseMember({ ...member, loads: trainLoads(train, p, 1, member.length) });
  const note = (bounds: ReactionBounds, component: ReactionComponent, value: number, p: number) => {
    if (value > bounds.max[component].value) bounds.max[component] = { value, loadPosition: p };
    if (value < bounds.min[component].value) bounds.min[component] = { value, loadPosition: p };
  };
  const breakpoints = trainBreakpoints(train, member, positions);
  let analyses = 0;
  // At a breakpoint itself an axle stands on a node or fixed position: the value read there is one of
  // the two one-sided limits, but at the ends of the travel the other interval is missing, so every
  // breakpoint is analysed as it is.
  const values = new Float64Array(fieldCount * count);
  for (const p of breakpoints) {
    const analysis = analyse(p);
    analyses++;
    fieldsAtPositions(analysis, positions, values);
    for (let j = 0; j < values.length; j++) {
      max[j] = Math.max(max[j] as number, values[j] as number);
      min[j] = Math.min(min[j] as number, values[j] as number);
    }
    analysis.reactions.forEach((reaction, s) => {
      for (const component of REACTION_COMPONENTS) note(reactions[s] as ReactionBounds, component, reaction[component], p);
    });
  }
  const samples = FIT_POINTS.map(() => new Float64Array(fieldCount * count));
  const range: CubicRange = { max: 0, tMax: 0, min: 0, tMin: 0 };
  for (let b = 0; b + 1 < breakpoints.length; b++) {
    const start = breakpoints[b] as number;
    const width = (breakpoints[b + 1] as number) - start;
    const fits = FIT_POINTS.map((t, i) => {
      const analysis = analyse(start + t * width);
      fieldsAtPositions(analysis, positions, samples[i] as Float64Array);
      return analysis;
    });
    analyses += 4;
    const [s0, s1, s2, s3] = samples as [Float64Array, Float64Array, Float64Array, Float64Array];
    for (let j = 0; j < fieldCount * count; j++) {
      cubicRange(s0[j] as number, s1[j] as number, s2[j] as number, s3[j] as number, range);
      if (range.max > (max[j] as number)) max[j] = range.max;
      if (range.min < (min[j] as number)) min[j] = range.min;
    }
    const [a0, a1, a2, a3] = fits as [MemberAnalysis, MemberAnalysis, MemberAnalysis, MemberAnalysis];
    reactions.forEach((bounds, s) => {
      for (const component of REACTION_COMPONENTS) {
        const r = (analysis: MemberAnalysis) => (analysis.reactions[s] as MemberAnalysis['reactions'][number])[component];
        cubicRange(r(a0), r(a1), r(a2), r(a3), range);
        note(bounds, component, range.max, start + range.tMax * width);
        note(bounds, component, range.min, start + range.tMin * width);
      }
    });
  }
  const column = (values: Float64Array, f: number) => Array.from(values.subarray(f * count, (f + 1) * count));
  const maxColumns = {} as Record<DiagramField, number[]>;
  const minColumns = {} as Record<DiagramField, number[]>;
  DIAGRAM_FIELDS.forEach((field, f) => {
    maxColumns[field] = column(max, f);
    minColumns[field] = column(min, f);
  });
  return { max: maxColumns, min: minColumns, reactions, analyses };
}
