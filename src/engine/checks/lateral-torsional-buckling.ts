/**
 * Lateral-torsional buckling of open sections bent about their strong axis (momentZ).
 *
 * Elastic critical moment: the three-factor formula with load height and monosymmetry,
 *   M_cr = C1 pi^2 E Iy / L^2 { sqrt[Iw / Iy + L^2 G J / (pi^2 E Iy) + (C2 zg - C3 zj)^2] - (C2 zg - C3 zj) }
 * (ENV 1993-1-1:1992 Annex F / NCCI SN003, from memory; lateral-torsional-critical-moment.ts), which is
 * the classic C1 (pi / L) sqrt(E Iy G J) sqrt(1 + pi^2 E Iw / (G J L^2)) of Timoshenko & Gere (2nd ed.,
 * ch. 6) for a load through the shear centre of a doubly symmetric section. The load height zg is
 * destabilising for a load that acts towards the shear centre (gravity on the top flange), stabilising
 * for one that acts away from it; by default the load acts on the top flange (lateralTorsional.loadHeight).
 *
 * Resistance: the inelastic reduction of EN 1993-1-1:2005 6.3.2.2 (general case, from memory),
 *   M_b = chi_LT W fy, chi_LT from lambda_LT = sqrt(W fy / M_cr) and the curve of Table 6.4,
 * with the elastic modulus W (no plastic reserve is counted on). No partial factor is applied: the
 * required safety factor of the mode is.
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
import { fieldAt } from '../analysis/field-values.js';
import { extremesOfField } from '../analysis/field-extremes.js';
import { evaluatePolynomial } from '../analysis/polynomial.js';
import { criticalMomentFactors, generalCriticalMoment, teeMonosymmetryParameter, teeShearCentreHeight } from './lateral-torsional-critical-moment.js';
import { lateralTorsionalResistance, ltbCurve, type LateralTorsionalCurve } from './lateral-torsional-reduction.js';
import { fourSignificantText } from './number-texts.js';
import { isStructuralSteel } from './structural-steel.js';

/** Common practice: a solid rectangle at least twice as deep as wide counts as a narrow, deep beam. */
export const NARROW_RECTANGLE_DEPTH_RATIO = 2;

/**
 * Why the check does not apply to this section, or null when it does. Custom sections are checked with
 * the doubly symmetric formula from the It, Iw and Iy given (Iw = 0 when not given, which lowers M_cr).
 */
export function lateralTorsionalExclusion(section: SectionProperties): string | null {
  if (section.closed) return 'closed section: it does not buckle laterally-torsionally in practice';
  if (section.secondMomentZ <= section.secondMomentY) return 'bending about z is not the strong axis of this section';
  if (section.shape === 'rectangle' && section.depth < NARROW_RECTANGLE_DEPTH_RATIO * section.width) {
    return `a rectangle less than ${NARROW_RECTANGLE_DEPTH_RATIO} times as deep as wide does not buckle laterally before it yields (common practice)`;
  }
  return null;
}

/** Shapes whose elastic critical moment this check cannot give: monosymmetric and unsymmetric open sections. */
const UNEVALUATED_SHAPES = new Set(['angle']);

/** Where the transverse load acts, relative to the shear centre. */
export type LoadHeight = 'shear-centre' | 'top-flange' | 'bottom-flange' | { readonly aboveShearCentre: number };

/** A load height farther than this many section depths from the shear centre is refused. */
const MAX_LOAD_HEIGHT_DEPTHS = 10;

/** Default: the top flange, the destabilising side for gravity loads (the safe side). */
export const DEFAULT_LOAD_HEIGHT: LoadHeight = 'top-flange';

/** m above the shear centre (negative below) of the point where the load acts. */
export function loadPointHeight(section: SectionProperties, dimensions: CheckContext['input']['dimensions'], height: LoadHeight): number {
  if (height === 'shear-centre') return 0;
  if (typeof height === 'object') return height.aboveShearCentre;
  if (section.shape === 'tee' && dimensions?.shape === 'tee') {
    const shearCentre = teeShearCentreHeight(dimensions);
    return height === 'top-flange' ? dimensions.depth - shearCentre : -shearCentre;
  }
  // Doubly symmetric: the shear centre at mid-depth.
  return height === 'top-flange' ? section.depth / 2 : -section.depth / 2;
}

/**
 * zg of the three-factor formula, positive when destabilising: a load that acts towards the shear centre
 * from where it is applied (a gravity load on the top flange) adds to the twist of a buckling beam,
 * one that acts away from it (a gravity load hung from the bottom flange) resists it, whichever flange
 * is in compression (ENV 1993-1-1 Annex F, from memory). The direction is that of the net transverse
 * load on the span; with none to read (or loads that cancel), the destabilising side is taken.
 */
function destabilisingLoadHeight(context: CheckContext, from: number, to: number, pointHeight: number, given: boolean): number {
  // Not given: the load may hang from either flange and act either way, so the destabilising side.
  if (!given) return Math.abs(pointHeight);
  const direction = Math.sign(netTransverseLoad(context, from, to));
  return direction === 0 ? Math.abs(pointHeight) : -direction * pointHeight;
}

/** The resultant of the loads along y on (from, to), N (positive up). */
function netTransverseLoad(context: CheckContext, from: number, to: number): number {
  let total = 0;
  for (const load of context.input.model.loads) {
    if (load.kind === 'point') {
      if (load.position > from && load.position < to) total += load.fy;
      continue;
    }
    const a = Math.max(from, load.from);
    const b = Math.min(to, load.to);
    if (!(b > a) || !(load.to > load.from)) continue;
    const at = (x: number) => load.qy[0] + ((load.qy[1] - load.qy[0]) * (x - load.from)) / (load.to - load.from);
    total += ((at(a) + at(b)) / 2) * (b - a);
  }
  return total;
}

/** The imperfection curve of EN 1993-1-1:2005 Table 6.4 (from memory). */
function curveOf(context: CheckContext): LateralTorsionalCurve {
  const { section, fabrication } = context.input;
  if (section.shape === 'i-section') return ltbCurve({ fabrication: fabrication ?? 'welded', depth: section.depth, width: section.width });
  return ltbCurve({ fabrication: 'other', depth: section.depth, width: section.width });
}

/**
 * What loads the span across the member, read from its shear diagram: a jump inside the span is a point
 * load (C2 = 0.630), a sloping shear a distributed load (C2 = 0.454), neither only end moments (C2 = 0)
 * (NCCI SN003 Table 3.2, from memory). A point load wins: its C2 is the larger, the safe side.
 */
function transverseLoading(context: CheckContext, from: number, to: number): 'central-point-load' | 'uniform-load' | null {
  const { pieces } = context.input.analysis;
  const scale = Math.max(largestMagnitudeOn(context.input.analysis, 'shearY', from, to).value, Number.MIN_VALUE);
  let distributed = false;
  for (let i = 0; i < pieces.length; i++) {
    const piece = pieces[i] as (typeof pieces)[number];
    if (piece.end <= from || piece.start >= to) continue;
    const shear = piece.fields.shearY;
    if (shear.slice(1).some((coefficient) => Math.abs(coefficient) * (piece.end - piece.start) > 1e-9 * scale)) distributed = true;
    const next = pieces[i + 1];
    if (next !== undefined && piece.end < to) {
      const jump = evaluatePolynomial(next.fields.shearY, 0) - evaluatePolynomial(shear, piece.end - piece.start);
      if (Math.abs(jump) > 1e-9 * scale) return 'central-point-load';
    }
  }
  return distributed ? 'uniform-load' : null;
}

interface UnbracedLength {
  readonly from: number;
  readonly to: number;
  readonly unbracedLength: number;
  readonly effectiveLength: number;
  readonly momentGradientFactor: number;
  /** The largest |momentZ| over [from, to] and where: the demand, also the Mmax of Cb. */
  readonly demand: { readonly value: number; readonly position: number | null };
  /** An overhang: its length is an effective cantilever length, and no load-height factor C2 is tabulated for it. */
  readonly overhang: boolean;
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
        overhang: false,
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
        overhang: false,
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
      overhang: true,
    };
  });
}

function notApplicable(reason: string): { readonly summary: null; readonly findings: CheckFindings } {
  return { summary: null, findings: { checks: [], notApplicable: [{ mode: 'lateral-torsional-buckling', reason }] } };
}

function unevaluated(reason: string): { readonly summary: null; readonly findings: CheckFindings } {
  return { summary: null, findings: { checks: [], notApplicable: [], unchecked: [{ mode: 'lateral-torsional-buckling', reason }] } };
}

export function lateralTorsionalChecks(context: CheckContext): {
  readonly summary: LateralTorsionalSummary | null;
  readonly findings: CheckFindings;
} {
  const { section, material, lateralTorsional = {} } = context.input;
  const mode = 'lateral-torsional-buckling' as const;
  if (lateralTorsional.braced) return notApplicable('the compression flange is braced continuously (lateralTorsional.braced)');
  const strongAboutY = !section.closed && section.secondMomentY > section.secondMomentZ && !(section.shape === 'rectangle' && section.width < NARROW_RECTANGLE_DEPTH_RATIO * section.depth);
  if (strongAboutY && largestMagnitudeOn(context.input.analysis, 'momentY', 0, context.input.model.length).value > 0) {
    return unevaluated('bending about y, the strong axis of this section: its lateral-torsional buckling is not evaluated (this check is made for bending about z); turn the section so that z is its strong axis, or brace it (lateralTorsional.braced)');
  }
  const exclusion = lateralTorsionalExclusion(section);
  if (exclusion !== null) return notApplicable(exclusion);
  if (UNEVALUATED_SHAPES.has(section.shape)) {
    if (largestMagnitudeOn(context.input.analysis, 'momentZ', 0, context.input.model.length).value <= 0) {
      return notApplicable('no strong-axis bending moment (momentZ) anywhere along the member');
    }
    return unevaluated(`the elastic critical moment of a ${section.shape} (a monosymmetric or unsymmetric section) is not evaluated by this service; brace the compression side continuously (lateralTorsional.braced) if it is`);
  }
  const curve = curveOf(context);
  const height = lateralTorsional.loadHeight ?? DEFAULT_LOAD_HEIGHT;
  const steel = isStructuralSteel(material);
  const pointHeight = loadPointHeight(section, context.input.dimensions, height);
  if (Math.abs(pointHeight) > MAX_LOAD_HEIGHT_DEPTHS * section.depth) {
    throw new EngineError('not-applicable', `The load height is ${MAX_LOAD_HEIGHT_DEPTHS} depths or more from the shear centre: a load that far off the section is not a load on this member.`, ['lateralTorsional', 'loadHeight', 'aboveShearCentre']);
  }
  const modulus = section.sectionModulusZ;
  let worst: { length: UnbracedLength; moment: number; position: number | null; criticalMoment: number; zg: number; resistance: ReturnType<typeof lateralTorsionalResistance> } | null = null;
  for (const length of unbracedLengths(context)) {
    const { demand } = length;
    if (demand.value <= 0) continue;
    const loading = length.overhang ? null : transverseLoading(context, length.from, length.to);
    const tabulated = loading === null ? null : criticalMomentFactors({ kind: loading });
    const zg = destabilisingLoadHeight(context, length.from, length.to, pointHeight, lateralTorsional.loadHeight !== undefined);
    let monosymmetry = 0;
    if (section.shape === 'tee' && context.input.dimensions?.shape === 'tee') {
      // sigma = -Mz y / Iz: a positive Mz compresses the top, where a tee's flange is. Where the moment
      // takes both signs along the length the stem tip is in compression somewhere, and that governs
      // (AISC 360-16 F9, from memory).
      const pieces = context.input.analysis.pieces.filter((piece) => piece.end > length.from && piece.start < length.to);
      const range = extremesOfField(pieces, 'momentZ');
      const flangeInCompression = range.min.value >= 0 && (demand.position === null || fieldAt(context.input.analysis, 'momentZ', demand.position) >= 0);
      monosymmetry = teeMonosymmetryParameter(context.input.dimensions, flangeInCompression);
    }
    const criticalMoment = generalCriticalMoment({
      elasticModulus: material.elasticModulus,
      shearModulus: material.shearModulus,
      secondMomentY: section.secondMomentY,
      torsionConstant: section.torsionConstant,
      warpingConstant: section.warpingConstant,
      unbracedLength: length.effectiveLength,
      factors: { c1: length.momentGradientFactor, c2: tabulated?.c2 ?? 0, c3: tabulated?.c3 ?? 1 },
      loadHeight: zg,
      monosymmetryParameter: monosymmetry,
    });
    if (!(criticalMoment > 0) || !Number.isFinite(criticalMoment)) {
      // Loads or lengths past the range of finite arithmetic (the moment diagram overflows C1): no number to check against.
      throw new EngineError('not-applicable', 'The lateral-torsional buckling check has no positive, finite critical moment: the loads, the unbraced length or the load height are beyond what it can take.', ['lateralTorsional']);
    }
    // EN 1993-1-1's curves are for steel: another material is checked against the elastic M_cr with the
    // factor against elastic instability.
    const resistance = steel
      ? lateralTorsionalResistance({ sectionModulus: modulus, yieldStrength: material.yieldStrength, criticalMoment, curve })
      : { lambdaBar: Math.sqrt((modulus * material.yieldStrength) / criticalMoment), chi: 1, resistance: criticalMoment };
    if (worst === null || demand.value / resistance.resistance > worst.moment / worst.resistance.resistance) {
      worst = { length, moment: demand.value, position: demand.position, criticalMoment, zg, resistance };
    }
  }
  if (worst === null) return notApplicable('no strong-axis bending moment (momentZ) anywhere along the member');
  const { length, resistance } = worst;
  const { zg } = worst;
  const side = zg > 0 ? 'destabilising' : 'stabilising';
  const heightText = height === 'shear-centre' ? 'load through the shear centre' : `load ${fourSignificantText(Math.abs(zg))} m from the shear centre, ${side} (${typeof height === 'object' ? 'given' : height})`;
  return {
    summary: {
      from: length.from,
      to: length.to,
      unbracedLength: length.unbracedLength,
      effectiveLength: length.effectiveLength,
      momentGradientFactor: length.momentGradientFactor,
      criticalMoment: worst.criticalMoment,
      relativeSlenderness: resistance.lambdaBar,
      reductionFactor: resistance.chi,
      resistance: resistance.resistance,
      ...(steel ? { curve } : {}),
      loadHeight: zg,
    },
    findings: {
      checks: [
        failureCheck({
          mode,
          quantity: 'moment',
          demand: worst.moment,
          capacity: resistance.resistance,
          requiredSafetyFactor: steel ? context.criteria.requiredSafetyFactor[mode] : context.criteria.requiredSafetyFactor.buckling,
          position: worst.position,
          location: `unbraced length ${rangeLabel(length.from, length.to)}`,
          basis: steel ? `largest |Mz| against M_b = chi_LT W fy (EN 1993-1-1:2005 6.3.2.2, curve ${curve}, from memory), chi_LT = ${fourSignificantText(resistance.chi)} at lambda_LT = ${fourSignificantText(resistance.lambdaBar)}, from the elastic M_cr = ${fourSignificantText(worst.criticalMoment)} N*m of the three-factor formula (ENV 1993-1-1 Annex F / SN003, from memory), C1 = ${fourSignificantText(length.momentGradientFactor)} (AISC 360-16 eq. F1-1 for spans, from memory), ${heightText}` : `largest |Mz| against the elastic M_cr of the three-factor formula (ENV 1993-1-1 Annex F / SN003, from memory), with the factor against elastic instability: EN 1993-1-1's reduction curves are for steel; C1 = ${fourSignificantText(length.momentGradientFactor)}, ${heightText}`,
        }),
      ],
      notApplicable: [],
    },
  };
}
