/** The member cut at the supports that restrain one direction: spans between them and overhangs beyond. */

import type { MemberModel, SupportModel } from '../member/model.js';

export interface MemberSegment {
  /** m */
  readonly from: number;
  readonly to: number;
  /** A span lies between two supports; an overhang runs from one support to a free end. */
  readonly kind: 'span' | 'overhang';
  /** The supports at the segment's ends that satisfied the test (one for an overhang). */
  readonly supports: readonly SupportModel[];
}

function ascending(a: number, b: number): number {
  return a - b;
}

/** Positions in ascending order; those already in order (the usual case) are left as they are, as a stable sort would leave them. */
function inAscendingOrder(positions: number[]): number[] {
  for (let i = 1; i < positions.length; i++) {
    if (ascending(positions[i - 1] as number, positions[i] as number) > 0) return positions.sort(ascending);
  }
  return positions;
}

/** The supports within the tolerance of x, added to `at` (a new list by default). */
function supportsAt(holding: readonly SupportModel[], x: number, tolerance: number, at: SupportModel[] = []): SupportModel[] {
  for (const support of holding) if (Math.abs(support.position - x) <= tolerance) at.push(support);
  return at;
}

/**
 * Without any such support the whole member counts as one span. Support positions closer than the
 * tolerance to the position before them merge into it.
 */
export function segmentsBetweenSupports(model: MemberModel, holds: (support: SupportModel) => boolean): MemberSegment[] {
  const tolerance = 1e-9 * model.length;
  const holding: SupportModel[] = [];
  for (const support of model.supports) if (holds(support)) holding.push(support);
  if (holding.length === 0) return [{ from: 0, to: model.length, kind: 'span', supports: [] }];
  const positions = inAscendingOrder(holding.map((support) => support.position));
  const merged = [positions[0] as number];
  for (let i = 1; i < positions.length; i++) {
    const x = positions[i] as number;
    if (x - (positions[i - 1] as number) > tolerance) merged.push(x);
  }
  const segments: MemberSegment[] = [];
  const first = merged[0] as number;
  const last = merged[merged.length - 1] as number;
  if (first > tolerance) segments.push({ from: 0, to: first, kind: 'overhang', supports: supportsAt(holding, first, tolerance) });
  for (let i = 0; i + 1 < merged.length; i++) {
    const from = merged[i] as number;
    const to = merged[i + 1] as number;
    segments.push({ from, to, kind: 'span', supports: supportsAt(holding, to, tolerance, supportsAt(holding, from, tolerance)) });
  }
  if (last < model.length - tolerance) {
    segments.push({ from: last, to: model.length, kind: 'overhang', supports: supportsAt(holding, last, tolerance) });
  }
  return segments;
}
