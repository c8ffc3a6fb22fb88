/**
 * Deflection against span / ratio, in each bending plane apart: deflectionY between the supports that
 * restrain uy, deflectionZ between those that restrain uz (rigidly or by a spring). A span is checked
 * against its own length / deflectionLimitRatio; an overhang (a cantilever, or the overhang of a
 * continuous member) against its length / cantileverDeflectionLimitRatio. The deflection is the
 * absolute one, so a spring support's own movement counts. The worst segment is reported.
 */

import type { SupportModel } from '../member/model.js';
import type { CheckContext, CheckFindings } from './check-context.js';
import { largestMagnitudeOn } from './critical-positions.js';
import { failureCheck } from './failure-check.js';
import { rangeLabel } from './labels.js';
import { segmentsBetweenSupports, type MemberSegment } from './member-segments.js';

const PLANES: readonly {
  readonly field: 'deflectionY' | 'deflectionZ';
  readonly axis: string;
  /** The supports that restrain the plane's translation, rigidly or by a spring. */
  readonly holds: (support: SupportModel) => boolean;
}[] = [
  { field: 'deflectionY', axis: 'y', holds: (support) => support.restraints.uy !== 'free' },
  { field: 'deflectionZ', axis: 'z', holds: (support) => support.restraints.uz !== 'free' },
];

export function deflectionChecks(context: CheckContext): CheckFindings {
  const { model, analysis } = context.input;
  const { criteria } = context;
  let worst: {
    demand: number;
    capacity: number;
    position: number | null;
    segment: MemberSegment;
    axis: string;
    ratio: number;
  } | null = null;
  for (const plane of PLANES) {
    const segments = segmentsBetweenSupports(model, plane.holds);
    for (const segment of segments) {
      const ratio = segment.kind === 'span' ? criteria.deflectionLimitRatio : criteria.cantileverDeflectionLimitRatio;
      const capacity = (segment.to - segment.from) / ratio;
      const peak = largestMagnitudeOn(analysis, plane.field, segment.from, segment.to);
      if (worst === null || peak.value / capacity > worst.demand / worst.capacity) {
        worst = { demand: peak.value, capacity, position: peak.position, segment, axis: plane.axis, ratio };
      }
    }
  }
  const governing = worst as NonNullable<typeof worst>;
  const { segment } = governing;
  return {
    checks: [
      failureCheck({
        mode: 'deflection',
        quantity: 'length',
        demand: governing.demand,
        capacity: governing.capacity,
        requiredSafetyFactor: criteria.requiredSafetyFactor.deflection,
        position: governing.position,
        location: `${segment.kind} ${rangeLabel(segment.from, segment.to)}, deflection along ${governing.axis}`,
        basis: `largest |deflection| against length / ${governing.ratio} (limit ratio: common practice or as given)`,
      }),
    ],
    notApplicable: [],
  };
}
