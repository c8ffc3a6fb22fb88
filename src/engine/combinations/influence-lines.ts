/**
 * Influence lines of a member for a unit point load that travels along it: for every fixed envelope
 * position and every diagram, and for every reaction, the value as a function of the load position a.
 *
 * The member is linear elastic and prismatic with supports, springs and hinges at its nodes, so by
 * Maxwell-Betti reciprocity (Muller-Breslau's principle) each influence line is a cubic in a between the
 * member's structural nodes (ends, supports, hinges) and the point read; it is zero off the member.
 * Each cubic is fixed by four analyses at Chebyshev points inside its piece. One analysis carries fy =
 * 1 N and fz = 1 N together: the two bending planes are uncoupled, so the vertical diagrams and fy, mz
 * reactions answer to fy and the horizontal ones to fz. Axles carry no fx or torque: axial force,
 * torque and twist have no influence here.
 */

import { analyseMember } from '../analysis/analyse-member.js';
import { pieceIndexAt } from '../analysis/field-values.js';
import { evaluatePolynomial } from '../analysis/polynomial.js';
import { DIAGRAM_FIELDS, type DiagramField, type MemberAnalysis, type MemberPiece } from '../analysis/result.js';
import { POSITION_TOLERANCE } from '../analysis/tolerances.js';
import type { MemberModel } from '../member/model.js';
import type { EnvelopePositions } from './diagram-envelope.js';

/** Which axle force drives a field or reaction component; null for the ones no axle reaches. */
export type Plane = 'y' | 'z' | null;

export const FIELD_PLANE: Readonly<Record<DiagramField, Plane>> = {
  axial: null,
  shearY: 'y',
  momentZ: 'y',
  shearZ: 'z',
  momentY: 'z',
  torque: null,
  deflectionY: 'y',
  slopeZ: 'y',
  deflectionZ: 'z',
  slopeY: 'z',
  twist: null,
};

export const REACTION_COMPONENTS = ['fx', 'fy', 'fz', 'mx', 'my', 'mz'] as const;
export type ReactionComponent = (typeof REACTION_COMPONENTS)[number];

export const REACTION_PLANE: Readonly<Record<ReactionComponent, Plane>> = { fx: null, fy: 'y', fz: 'z', mx: null, my: 'z', mz: 'y' };

/** Chebyshev points of the first kind on [0, 1]: a well-conditioned cubic fit. */
const FIT_POINTS = [1, 3, 5, 7].map((k) => 0.5 - 0.5 * Math.cos((k * Math.PI) / 8)) as [number, number, number, number];

/**
 * An influence line: pieces [starts[i], starts[i + 1]] in load position, each a cubic in t = (a -
 * start) / width with coefficients cubics[4 i .. 4 i + 3], ascending; zero off the member.
 */
export interface InfluenceLine {
  readonly starts: readonly number[];
  readonly cubics: Float64Array;
  /**
   * For a diagram read at one position: that position, and the value with the load exactly on it, which
   * may be neither one-sided limit (the shear just right of a free end holds a load standing on the end,
   * no load beside it). NaN for a reaction.
   */
  readonly readAt: number;
  readonly valueOnIt: number;
}

export interface InfluenceLines {
  readonly length: number;
  /** Ends, supports and hinges, ascending. */
  readonly structuralNodes: readonly number[];
  /** lines[f][k]: field DIAGRAM_FIELDS[f] at envelope position k; null for a field no axle reaches. */
  readonly fields: readonly (readonly InfluenceLine[] | null)[];
  /** reactions[s][component], null for a component no axle reaches. */
  readonly reactions: readonly Readonly<Record<ReactionComponent, InfluenceLine | null>>[];
  readonly analyses: number;
}

/** Ascending coefficients of the cubic through the values at the four fit points of [0, 1]. */
function cubicThrough(y0: number, y1: number, y2: number, y3: number, out: Float64Array, at: number): void {
  const [t0, t1, t2, t3] = FIT_POINTS;
  // Newton's divided differences, then the monomial form.
  const d01 = (y1 - y0) / (t1 - t0);
  const d12 = (y2 - y1) / (t2 - t1);
  const d23 = (y3 - y2) / (t3 - t2);
  const d012 = (d12 - d01) / (t2 - t0);
  const d123 = (d23 - d12) / (t3 - t1);
  const c3 = (d123 - d012) / (t3 - t0);
  out[at] = y0 - d01 * t0 + d012 * t0 * t1 - c3 * t0 * t1 * t2;
  out[at + 1] = d01 - d012 * (t0 + t1) + c3 * (t0 * t1 + t0 * t2 + t1 * t2);
  out[at + 2] = d012 - c3 * (t0 + t1 + t2);
  out[at + 3] = c3;
}

/** Ends, supports and hinges, ascending, nodes closer than the node tolerance merged: where every influence line breaks. */
export function structuralNodesOf(member: Pick<MemberModel, 'length' | 'supports' | 'hinges'>): number[] {
  const tolerance = POSITION_TOLERANCE * member.length;
  const all = [0, member.length, ...member.supports.map((support) => support.position), ...member.hinges.map((hinge) => hinge.position)]
    .map((x) => Math.min(member.length, Math.max(0, x)))
    .sort((a, b) => a - b);
  const nodes: number[] = [];
  for (const x of all) if (nodes.length === 0 || x - (nodes[nodes.length - 1] as number) > tolerance) nodes.push(x);
  nodes[nodes.length - 1] = member.length;
  return nodes;
}

/** Every field at one position on one side, into `out` in DIAGRAM_FIELDS order. */
function fieldsAt(analysis: MemberAnalysis, x: number, right: boolean, out: Float64Array): void {
  const piece = analysis.pieces[pieceIndexAt(analysis, x, right ? 'right' : 'left')] as MemberPiece;
  for (let f = 0; f < DIAGRAM_FIELDS.length; f++) out[f] = evaluatePolynomial(piece.fields[DIAGRAM_FIELDS[f] as DiagramField], x - piece.start);
}

export function influenceLines(member: Omit<MemberModel, 'loads'>, positions: EnvelopePositions): InfluenceLines {
  const { length } = member;
  const tolerance = POSITION_TOLERANCE * length;
  const nodes = structuralNodesOf(member);
  const fieldCount = DIAGRAM_FIELDS.length;
  const count = positions.x.length;
  let analyses = 0;
  const unitAt = (a: number): MemberAnalysis => {
    analyses++;
    return analyseMember({ ...member, loads: [{ kind: 'point', position: a, fx: 0, fy: 1, fz: 1, mx: 0, my: 0, mz: 0 }] });
  };
  const scratch = new Float64Array(fieldCount);

  // Between structural nodes: four analyses an interval, read at every position (and every reaction).
  const intervals = nodes.length - 1;
  const shared: Float64Array[] = []; // shared[j][(i * fieldCount + f) * count + k]
  const reactionFits: Float64Array[] = []; // reactionFits[j][(i * supports + s) * 6 + component]
  const supports = member.supports.length;
  for (let j = 0; j < intervals; j++) {
    const u = nodes[j] as number;
    const width = (nodes[j + 1] as number) - u;
    const values = new Float64Array(4 * fieldCount * count);
    const reactions = new Float64Array(4 * supports * 6);
    FIT_POINTS.forEach((t, i) => {
      const analysis = unitAt(u + t * width);
      for (let k = 0; k < count; k++) {
        fieldsAt(analysis, positions.x[k] as number, positions.sides[k] === 'right', scratch);
        for (let f = 0; f < fieldCount; f++) values[(i * fieldCount + f) * count + k] = scratch[f] as number;
      }
      analysis.reactions.forEach((reaction, s) => {
        REACTION_COMPONENTS.forEach((component, c) => (reactions[(i * supports + s) * 6 + c] = reaction[component]));
      });
    });
    shared.push(values);
    reactionFits.push(reactions);
  }

  const fields: (InfluenceLine[] | null)[] = DIAGRAM_FIELDS.map((field) => (FIELD_PLANE[field] === null ? null : []));
  // Inside the interval that holds a position the line breaks at the position itself: four analyses on
  // each side and one with the load on it, made once for a position listed twice (left and right).
  let splitX = Number.NaN;
  let splitAnalyses: MemberAnalysis[] = [];
  let onIt: MemberAnalysis | null = null;
  const splitValues = [new Float64Array(4 * fieldCount), new Float64Array(4 * fieldCount)];
  const onItValues = new Float64Array(fieldCount);
  for (let k = 0; k < count; k++) {
    const x = positions.x[k] as number;
    const right = positions.sides[k] === 'right';
    let j = 0;
    while (j < intervals - 1 && x >= (nodes[j + 1] as number) - tolerance) j++;
    const u = nodes[j] as number;
    const v = nodes[j + 1] as number;
    const inside = x > u + tolerance && x < v - tolerance;
    const starts = inside ? [...nodes.slice(0, j + 1), x, ...nodes.slice(j + 1)] : nodes;
    if (x !== splitX) {
      splitX = x;
      splitAnalyses = inside ? [...FIT_POINTS.map((t) => unitAt(u + t * (x - u))), ...FIT_POINTS.map((t) => unitAt(x + t * (v - x)))] : [];
      onIt = unitAt(x);
    }
    splitAnalyses.forEach((analysis, n) => {
      fieldsAt(analysis, x, right, scratch);
      const values = splitValues[n < 4 ? 0 : 1] as Float64Array;
      for (let f = 0; f < fieldCount; f++) values[(n % 4) * fieldCount + f] = scratch[f] as number;
    });
    fieldsAt(onIt as MemberAnalysis, x, right, onItValues);
    for (let f = 0; f < fieldCount; f++) {
      const lines = fields[f];
      if (lines === null || lines === undefined) continue;
      const cubics = new Float64Array(4 * (starts.length - 1));
      let piece = 0;
      for (let jj = 0; jj < intervals; jj++) {
        if (inside && jj === j) {
          for (const values of splitValues) cubicThrough(values[f] as number, values[fieldCount + f] as number, values[2 * fieldCount + f] as number, values[3 * fieldCount + f] as number, cubics, 4 * piece++);
          continue;
        }
        const values = shared[jj] as Float64Array;
        const at = (i: number) => values[(i * fieldCount + f) * count + k] as number;
        cubicThrough(at(0), at(1), at(2), at(3), cubics, 4 * piece++);
      }
      lines.push({ starts, cubics, readAt: x, valueOnIt: onItValues[f] as number });
    }
  }

  const reactions = member.supports.map((_, s) => {
    const lines = {} as Record<ReactionComponent, InfluenceLine | null>;
    REACTION_COMPONENTS.forEach((component, c) => {
      if (REACTION_PLANE[component] === null) {
        lines[component] = null;
        return;
      }
      const cubics = new Float64Array(4 * intervals);
      for (let j = 0; j < intervals; j++) {
        const fits = reactionFits[j] as Float64Array;
        const at = (i: number) => fits[(i * supports + s) * 6 + c] as number;
        cubicThrough(at(0), at(1), at(2), at(3), cubics, 4 * j);
      }
      lines[component] = { starts: nodes, cubics, readAt: Number.NaN, valueOnIt: Number.NaN };
    });
    return lines;
  });
  return { length, structuralNodes: nodes, fields, reactions, analyses };
}
