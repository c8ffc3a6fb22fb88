/**
 * Column buckling about each principal axis: Euler above the transition slenderness, Johnson's
 * parabola below it, with the compressive yield strength as Sy (the compressive ultimate strength
 * for a brittle material).
 */

import { EngineError } from '../engine-error.js';
import type { SectionProperties } from '../sections/section-properties.js';
import type { CheckContext, CheckFindings } from './check-context.js';
import type { MemberCheckInput } from './check-input.js';
import type { BucklingAxis, BucklingAxisResult, BucklingRegime, BucklingSummary } from './check-outcome.js';
import type { Peak } from './critical-positions.js';
import { resolveEffectiveLengthFactor, type EffectiveLengthFactor } from './effective-length.js';
import { failureCheck, safetyRatio } from './failure-check.js';
import { productMomentOf } from './section-stresses.js';

/** (l/k)_1 = sqrt(2 pi^2 E / Sy) (Shigley 10th ed., eq. 4-45, from memory). */
export function transitionSlendernessRatio(elasticModulus: number, yieldStrength: number): number {
  return Math.sqrt((2 * Math.PI ** 2 * elasticModulus) / yieldStrength);
}

/** sigma_cr = pi^2 E / (K L / r)^2 (Shigley 10th ed., eq. 4-44, from memory). */
export function eulerCriticalStress(elasticModulus: number, slendernessRatio: number): number {
  return (Math.PI ** 2 * elasticModulus) / slendernessRatio ** 2;
}

/** sigma_cr = Sy - (Sy (K L / r) / (2 pi))^2 / E (Shigley 10th ed., eq. 4-46, from memory). */
export function johnsonCriticalStress(elasticModulus: number, yieldStrength: number, slendernessRatio: number): number {
  return yieldStrength - ((yieldStrength * slendernessRatio) / (2 * Math.PI)) ** 2 / elasticModulus;
}

/** The formula the slenderness selects; at the transition both give Sy / 2. */
export function columnCriticalStress(
  elasticModulus: number,
  yieldStrength: number,
  slendernessRatio: number,
): { readonly regime: Exclude<BucklingRegime, 'none'>; readonly stress: number } {
  return slendernessRatio >= transitionSlendernessRatio(elasticModulus, yieldStrength)
    ? { regime: 'euler', stress: eulerCriticalStress(elasticModulus, slendernessRatio) }
    : { regime: 'johnson', stress: johnsonCriticalStress(elasticModulus, yieldStrength, slendernessRatio) };
}

/** A section whose principal axes are not y and z buckles about its minor principal axis. */
export function bucklesAboutMinorAxis(section: SectionProperties): boolean {
  return section.shape === 'angle' || productMomentOf(section) !== 0;
}

export interface ColumnAxis {
  readonly axis: BucklingAxis;
  readonly radiusOfGyration: number;
  readonly effectiveLengthFactor: EffectiveLengthFactor;
  /** K L, m */
  readonly effectiveLength: number;
}

/**
 * The axes to check, each with its K L. The unbraced length defaults to the member length; the minor
 * axis takes the larger of the two plane factors.
 */
export function columnAxesOf(input: MemberCheckInput): ColumnAxis[] {
  const { section, model, buckling = {} } = input;
  const unbracedLength = buckling.unbracedLength ?? model.length;
  const aboutZ = resolveEffectiveLengthFactor(buckling, model, 'z');
  const aboutY = resolveEffectiveLengthFactor(buckling, model, 'y');
  if (bucklesAboutMinorAxis(section)) {
    return [columnAxis('minor', section.radiusOfGyrationMinor, aboutZ.factor >= aboutY.factor ? aboutZ : aboutY, unbracedLength)];
  }
  return [
    columnAxis('z', section.radiusOfGyrationZ, aboutZ, unbracedLength),
    columnAxis('y', section.radiusOfGyrationY, aboutY, unbracedLength),
  ];
}

function columnAxis(axis: BucklingAxis, radiusOfGyration: number, factor: EffectiveLengthFactor, unbracedLength: number): ColumnAxis {
  return { axis, radiusOfGyration, effectiveLengthFactor: factor, effectiveLength: factor.factor * unbracedLength };
}

/** Euler load pi^2 E A r^2 / (K L)^2 about one axis, N (Shigley 10th ed., eq. 4-43, from memory). */
export function eulerLoad(context: CheckContext, axis: ColumnAxis): number {
  const { section, material } = context.input;
  return eulerCriticalStress(material.elasticModulus, axis.effectiveLength / axis.radiusOfGyration) * section.area;
}

export function columnBuckling(
  context: CheckContext,
  compression: Peak,
): { readonly summary: BucklingSummary; readonly findings: CheckFindings } {
  const { section, material } = context.input;
  const yieldStrength = context.strengths.compression.value;
  const compressiveForce = compression.value * section.area;
  const columns = context.columnAxes.map((axis) => {
    const slendernessRatio = axis.effectiveLength / axis.radiusOfGyration;
    const { regime, stress } = columnCriticalStress(material.elasticModulus, yieldStrength, slendernessRatio);
    return { axis, slendernessRatio, regime, stress, criticalLoad: stress * section.area };
  });
  const compressed = columns.every((column) => safetyRatio(column.criticalLoad, compressiveForce) !== null);
  const undetermined = columns.find((column) => column.axis.effectiveLengthFactor.undetermined !== undefined);
  if (compressed && undetermined) {
    throw new EngineError(
      'not-applicable',
      `The member is in compression and ${undetermined.axis.effectiveLengthFactor.undetermined}, so its effective length cannot be read from the supports: give buckling.effectiveLengthFactor (or per axis).`,
      ['buckling', 'effectiveLengthFactor'],
      { axis: undetermined.axis.axis },
    );
  }
  const axes: BucklingAxisResult[] = columns.map((column) => ({
    axis: column.axis.axis,
    regime: compressed ? column.regime : 'none',
    slendernessRatio: column.slendernessRatio,
    transitionSlendernessRatio: transitionSlendernessRatio(material.elasticModulus, yieldStrength),
    criticalStress: column.stress,
    criticalLoad: column.criticalLoad,
    effectiveLength: column.axis.effectiveLength,
    effectiveLengthFactor: column.axis.effectiveLengthFactor.factor,
    safetyFactor: compressed ? safetyRatio(column.criticalLoad, compressiveForce) : null,
  }));
  const governing = axes.reduce((worst, axis) => (axis.criticalLoad < worst.criticalLoad ? axis : worst));
  const summary = { governing, axes };
  if (!compressed) {
    return {
      summary,
      findings: { checks: [], notApplicable: [{ mode: 'buckling', reason: 'no compressive axial force anywhere along the member' }] },
    };
  }
  const formula =
    governing.regime === 'euler'
      ? 'Euler P_cr = pi^2 E I / (K L)^2 (Shigley 10th ed., eq. 4-43, from memory)'
      : 'Johnson sigma_cr = Sy - (Sy K L / (2 pi r))^2 / E (Shigley 10th ed., eq. 4-46, from memory)';
  return {
    summary,
    findings: {
      checks: [
        failureCheck({
          mode: 'buckling',
          quantity: 'force',
          demand: compressiveForce,
          capacity: governing.criticalLoad,
          requiredSafetyFactor: context.criteria.requiredSafetyFactor.buckling,
          position: compression.position,
          location: `about the ${governing.axis} axis (${governing.regime})`,
          basis: `largest compressive force against ${formula}, Euler above K L / r = sqrt(2 pi^2 E / Sy)`,
        }),
      ],
      notApplicable: [],
    },
  };
}
