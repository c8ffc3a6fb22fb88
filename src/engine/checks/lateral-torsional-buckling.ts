/**
 * Lateral-torsional buckling of open sections bent about their strong axis (momentZ), elastic:
 *   M_cr = C1 (pi / L) sqrt(E Iy G J) sqrt(1 + pi^2 E Iw / (G J L^2))
 * with Iy the minor-axis second moment (secondMomentY for an upright section) and Iw the warping
 * constant (Timoshenko & Gere, Theory of Elastic Stability, 2nd ed., ch. 6, I-beam in pure bending
 * between fork supports, from memory). The capacity is this elastic M_cr: inelastic lateral-torsional
 * buckling (M_cr near the yield moment) is not covered, and yielding is the bending check's concern.
 */

import { EngineError } from '../engine-error.js';
import type { SupportModel } from '../member/model.js';
import type { SectionProperties } from '../sections/section-properties.js';
import type { CheckContext, CheckFindings } from './check-context.js';
import type { LateralTorsionalSummary } from './check-outcome.js';
import { largestMagnitudeOn } from './critical-positions.js';
import { failureCheck } from './failure-check.js';
import { rangeLabel } from './labels.js';
import { segmentsBetweenSupports } from './member-segments.js';
import { momentGradientFactorOn } from './moment-gradient-factor.js';
import { fourSignificantText } from './number-texts.js';

/** Common practice: a solid rectangle at least twice as deep as wide counts as a narrow, deep beam. */
export const NARROW_RECTANGLE_DEPTH_RATIO = 2;

export interface CriticalMomentInput {
  readonly elasticModulus: number;
  readonly shearModulus: number;
  /** Minor-axis second moment, m^4. */
  readonly secondMomentY: number;
  readonly torsionConstant: number;
  /** m^6 */
  readonly warpingConstant: number;
  /** m */
  readonly effectiveLength: number;
  readonly momentGradientFactor: number;
}

/** Elastic critical moment, N*m (formula above). */
export function elasticCriticalMoment(input: CriticalMomentInput): number {
  const { elasticModulus: e, shearModulus: g, effectiveLength: l } = input;
  const torsionalRigidity = g * input.torsionConstant;
  return (
    input.momentGradientFactor *
    (Math.PI / l) *
    Math.sqrt(e * input.secondMomentY * torsionalRigidity) *
    Math.sqrt(1 + (Math.PI ** 2 * e * input.warpingConstant) / (torsionalRigidity * l ** 2))
  );
}

/** Why the check does not apply to this section, or null when it does. */
export function lateralTorsionalExclusion(section: SectionProperties): string | null {
  if (section.closed) return 'closed section: it does not buckle laterally-torsionally in practice';
  if (section.secondMomentZ <= section.secondMomentY) return 'bending about z is not the strong axis of this section';
  if (section.shape === 'i-section' || section.shape === 'channel') return null;
  if (section.shape === 'rectangle') {
    return section.depth >= NARROW_RECTANGLE_DEPTH_RATIO * section.width
      ? null
      : `a rectangle less than ${NARROW_RECTANGLE_DEPTH_RATIO} times as deep as wide does not buckle laterally before it yields (common practice)`;
  }
  return `not covered for ${section.shape} sections (monosymmetric, unsymmetric or of unknown shape)`;
}

interface UnbracedLength {
  readonly from: number;
  readonly to: number;
  readonly unbracedLength: number;
  readonly effectiveLength: number;
  readonly momentGradientFactor: number;
  /** The largest |momentZ| over [from, to] and where: the demand, also the Mmax of Cb. */
  readonly demand: { readonly value: number; readonly position: number | null };
}

const isRigid = (support: SupportModel, direction: 'uz' | 'rx' | 'ry') => support.restraints[direction] === 'rigid';

/** A fork: the support holds the member rigidly against lateral movement (uz) and twist (rx). */
const isFork = (support: SupportModel) => isRigid(support, 'uz') && isRigid(support, 'rx');

/**
 * The unbraced lengths between forks. Spans between forks take Cb from their moment diagram. An
 * overhang takes Cb = 1 and twice its length when its root is also fixed against lateral bending (ry):
 * the end-couple cantilever, M_cr = (pi / 2 L) sqrt(E Iy G J) (Timoshenko & Gere 2nd ed., ch. 6, from
 * memory), which bounds tip loads and uniform loads from below; three times it on a fork root (common
 * practice, conservative: the overhang may swing on plan about the fork).
 */
function unbracedLengths(context: CheckContext): UnbracedLength[] {
  const { model, analysis, lateralTorsional = {} } = context.input;
  const given = lateralTorsional.momentGradientFactor;
  if (lateralTorsional.unbracedLength !== undefined) {
    const length = lateralTorsional.unbracedLength;
    return [
      {
        from: 0,
        to: model.length,
        unbracedLength: length,
        effectiveLength: length,
        momentGradientFactor: given ?? 1,
        demand: largestMagnitudeOn(analysis, 'momentZ', 0, model.length),
      },
    ];
  }
  if (!model.supports.some(isFork) && largestMagnitudeOn(analysis, 'momentZ', 0, model.length).value > 0) {
    throw new EngineError(
      'not-applicable',
      'No support holds the member against both lateral movement (uz) and twist (rx), so its lateral-torsional buckling length cannot be read from the supports: give lateralTorsional.unbracedLength (with momentGradientFactor), or lateralTorsional.braced.',
      ['lateralTorsional', 'unbracedLength'],
    );
  }
  return segmentsBetweenSupports(model, isFork).map((segment) => {
    const length = segment.to - segment.from;
    const demand = largestMagnitudeOn(analysis, 'momentZ', segment.from, segment.to);
    if (segment.kind === 'span') {
      return {
        from: segment.from,
        to: segment.to,
        unbracedLength: length,
        effectiveLength: length,
        momentGradientFactor: given ?? momentGradientFactorOn(analysis, segment.from, segment.to, demand.value),
        demand,
      };
    }
    const fixedRoot = segment.supports.some((support) => isRigid(support, 'rx') && isRigid(support, 'ry'));
    return {
      from: segment.from,
      to: segment.to,
      unbracedLength: length,
      effectiveLength: (fixedRoot ? 2 : 3) * length,
      momentGradientFactor: given ?? 1,
      demand,
    };
  });
}

function notApplicable(reason: string): { readonly summary: null; readonly findings: CheckFindings } {
  return { summary: null, findings: { checks: [], notApplicable: [{ mode: 'lateral-torsional-buckling', reason }] } };
}

export function lateralTorsionalChecks(context: CheckContext): {
  readonly summary: LateralTorsionalSummary | null;
  readonly findings: CheckFindings;
} {
  const { section, material, lateralTorsional = {} } = context.input;
  const mode = 'lateral-torsional-buckling' as const;
  if (lateralTorsional.braced) return notApplicable('the compression flange is braced continuously (lateralTorsional.braced)');
  const exclusion = lateralTorsionalExclusion(section);
  if (exclusion !== null) return notApplicable(exclusion);
  let worst: { length: UnbracedLength; moment: number; position: number | null; criticalMoment: number } | null = null;
  for (const length of unbracedLengths(context)) {
    const { demand } = length;
    if (demand.value <= 0) continue;
    const criticalMoment = elasticCriticalMoment({
      elasticModulus: material.elasticModulus,
      shearModulus: material.shearModulus,
      secondMomentY: section.secondMomentY,
      torsionConstant: section.torsionConstant,
      warpingConstant: section.warpingConstant,
      effectiveLength: length.effectiveLength,
      momentGradientFactor: length.momentGradientFactor,
    });
    if (worst === null || demand.value / criticalMoment > worst.moment / worst.criticalMoment) {
      worst = { length, moment: demand.value, position: demand.position, criticalMoment };
    }
  }
  if (worst === null) return notApplicable('no strong-axis bending moment (momentZ) anywhere along the member');
  const { length } = worst;
  return {
    summary: {
      from: length.from,
      to: length.to,
      unbracedLength: length.unbracedLength,
      effectiveLength: length.effectiveLength,
      momentGradientFactor: length.momentGradientFactor,
      criticalMoment: worst.criticalMoment,
    },
    findings: {
      checks: [
        failureCheck({
          mode,
          quantity: 'moment',
          demand: worst.moment,
          capacity: worst.criticalMoment,
          requiredSafetyFactor: context.criteria.requiredSafetyFactor[mode],
          position: worst.position,
          location: `unbraced length ${rangeLabel(length.from, length.to)}`,
          basis: `largest |Mz| against the elastic M_cr = C1 (pi / L) sqrt(E Iy G J) sqrt(1 + pi^2 E Iw / (G J L^2)), C1 = ${fourSignificantText(length.momentGradientFactor)} (Timoshenko & Gere 2nd ed., ch. 6, from memory; Cb by AISC 360-16 eq. F1-1, from memory)`,
        }),
      ],
      notApplicable: [],
    },
  };
}
