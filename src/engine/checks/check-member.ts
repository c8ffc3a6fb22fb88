/**
 * The failure checks of an analysed member and its governing failure.
 *
 * checkMember({ analysis, model, section, material }) returns every applicable check (strength,
 * stability, serviceability, pins) with its demand, capacity, safety factor and utilization, the modes
 * that do not apply and why, the governing failure, the buckling results per axis, the largest
 * stresses and the criteria used. SI units in and out; every number finite.
 */

import { EngineError } from '../engine-error.js';
import type { SectionProperties } from '../sections/section-properties.js';
import { axialChecks } from './axial.js';
import { beamColumnChecks } from './beam-column.js';
import { bendingChecks } from './bending.js';
import { buildCheckContext, type CheckFindings } from './check-context.js';
import type { MemberCheckInput } from './check-input.js';
import type { FailureCheck, MemberCheckOutcome, NotApplicableCheck, UncheckedMode } from './check-outcome.js';
import { columnBuckling } from './column-buckling.js';
import { combinedChecks } from './combined.js';
import { deflectionChecks } from './deflection.js';
import { governingFailure } from './governing.js';
import { lateralTorsionalChecks } from './lateral-torsional-buckling.js';
import { memberNotices } from './notices.js';
import { pinChecks } from './pins.js';
import { shearChecks } from './shear.js';
import { torsionChecks } from './torsion.js';
import { twistChecks } from './twist.js';
import { unevaluatedModes } from './unevaluated-modes.js';
import { flexuralTorsionalChecks, localBucklingChecks } from './flexural-torsional-check.js';
import { warpingStressChecks } from './warping-stresses.js';
import { webStabilityChecks } from './web-stability.js';
import { verdictOf } from './verdict.js';

/** The section properties every stress formula divides by must be positive. */
const DIVISOR_PROPERTIES = [
  'area',
  'secondMomentZ',
  'secondMomentY',
  'radiusOfGyrationZ',
  'radiusOfGyrationY',
  'radiusOfGyrationMinor',
] as const satisfies readonly (keyof SectionProperties)[];

function assertUsableSection(section: SectionProperties): void {
  for (const property of DIVISOR_PROPERTIES) {
    const value = section[property];
    if (!(value > 0) || !Number.isFinite(value)) {
      throw new EngineError('impossible-geometry', `The section's ${property} must be positive and finite (${value}).`, [
        'section',
        property,
      ]);
    }
  }
}

export function checkMember(input: MemberCheckInput): MemberCheckOutcome {
  assertUsableSection(input.section);
  const context = buildCheckContext(input);
  const buckling = columnBuckling(context, context.peaks.axialCompression);
  const lateralTorsional = lateralTorsionalChecks(context);
  const findings: CheckFindings[] = [
    axialChecks(context),
    bendingChecks(context),
    shearChecks(context),
    torsionChecks(context),
    combinedChecks(context),
    buckling.findings,
    beamColumnChecks(context, context.peaks.axialCompression),
    lateralTorsional.findings,
    deflectionChecks(context),
    twistChecks(context),
    pinChecks(context),
    webStabilityChecks(context),
    warpingStressChecks(context),
    flexuralTorsionalChecks(context),
    localBucklingChecks(context),
    unevaluatedModes(context),
  ];
  const checks: FailureCheck[] = [];
  const notApplicable: NotApplicableCheck[] = [];
  const unchecked: UncheckedMode[] = [];
  for (const finding of findings) {
    for (const check of finding.checks) checks.push(check);
    for (const reason of finding.notApplicable) notApplicable.push(reason);
    for (const gap of finding.unchecked ?? []) unchecked.push(gap);
  }
  return {
    checks,
    notApplicable,
    unchecked,
    governing: governingFailure(checks),
    verdict: verdictOf(checks, unchecked),
    buckling: buckling.summary,
    lateralTorsionalBuckling: lateralTorsional.summary,
    stresses: context.peaks,
    criteria: context.criteria,
    notices: memberNotices(context, checks),
  };
}
