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

/** Without any such support the whole member counts as one span. */
export function segmentsBetweenSupports(model: MemberModel, holds: (support: SupportModel) => boolean): MemberSegment[] {
  const tolerance = 1e-9 * model.length;
  const holding = model.supports.filter(holds);
  const positions = [...new Set(holding.map((support) => support.position))].sort((a, b) => a - b);
  const merged = positions.filter((x, i) => i === 0 || x - (positions[i - 1] as number) > tolerance);
  const at = (x: number) => holding.filter((support) => Math.abs(support.position - x) <= tolerance);
  if (merged.length === 0) return [{ from: 0, to: model.length, kind: 'span', supports: [] }];
  const segments: MemberSegment[] = [];
  const first = merged[0] as number;
  const last = merged[merged.length - 1] as number;
  if (first > tolerance) segments.push({ from: 0, to: first, kind: 'overhang', supports: at(first) });
  for (let i = 0; i + 1 < merged.length; i++) {
    const from = merged[i] as number;
    const to = merged[i + 1] as number;
    segments.push({ from, to, kind: 'span', supports: [...at(from), ...at(to)] });
  }
  if (last < model.length - tolerance) segments.push({ from: last, to: model.length, kind: 'overhang', supports: at(last) });
  return segments;
}
