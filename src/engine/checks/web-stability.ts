/**
 * The web of an I-section or channel: shear buckling of a slender web, and the resistance of the web
 * to a concentrated transverse force on a flange (patch loading), by EN 1993-1-5:2006 clauses 5 and 6
 * (web-resistance.ts, from memory). The resistances are design curves that already allow for
 * imperfections, without partial factors: the service's own required safety factor applies.
 *
 * Assumptions (each on the safe side): no intermediate transverse stiffeners, a non-rigid end post, no
 * flange contribution to the shear resistance, and no stiff bearing length (ss = 0) under a load or at a
 * support. A force at a member end is type (c) with the load at the very end (c = 0), elsewhere type (a).
 * A channel's one-sided flange is taken through the same formulas with its width on one side.
 */

import type { ChannelDimensions, ISectionDimensions } from '../sections/dimensions.js';
import type { CheckContext, CheckFindings } from './check-context.js';
import type { FailureCheck, NotApplicableCheck, UncheckedMode } from './check-outcome.js';
import { largestMagnitudeOn } from './critical-positions.js';
import { failureCheck } from './failure-check.js';
import { fourSignificantText } from './number-texts.js';
import { patchLoadingResistance, steelEpsilon, webShearBucklingResistance } from './web-resistance.js';

type FlangedDimensions = ISectionDimensions | ChannelDimensions;

/** A force closer than this to a member end (relative to the length) acts at the end. */
const END_TOLERANCE = 1e-9;

function flangedDimensions(context: CheckContext): FlangedDimensions | null {
  const dimensions = context.input.dimensions;
  return dimensions !== undefined && (dimensions.shape === 'i-section' || dimensions.shape === 'channel') ? dimensions : null;
}

/** The concentrated forces across the flange (along y): point loads and support reactions, where they act. */
function concentratedForces(context: CheckContext): { position: number; force: number; what: string }[] {
  const { model, analysis } = context.input;
  const forces: { position: number; force: number; what: string }[] = [];
  model.loads.forEach((load, i) => {
    if (load.kind === 'point' && load.fy !== 0) forces.push({ position: load.position, force: Math.abs(load.fy), what: `load ${i + 1}` });
  });
  analysis.reactions.forEach((reaction, i) => {
    if (reaction.fy !== 0) forces.push({ position: reaction.position, force: Math.abs(reaction.fy), what: `support ${i}` });
  });
  return forces;
}

export function webStabilityChecks(context: CheckContext): CheckFindings {
  const dimensions = flangedDimensions(context);
  if (dimensions === null) {
    const reason = 'not an I-section or channel with a known web';
    return { checks: [], notApplicable: [{ mode: 'web-shear-buckling', reason }, { mode: 'patch-loading', reason }] };
  }
  const { material, model, analysis } = context.input;
  const required = context.criteria.requiredSafetyFactor;
  const webDepth = dimensions.depth - 2 * dimensions.flangeThickness;
  const web = { webDepth, webThickness: dimensions.webThickness, webYieldStrength: material.yieldStrength, elasticModulus: material.elasticModulus };
  const checks: FailureCheck[] = [];
  const notApplicable: NotApplicableCheck[] = [];
  const unchecked: UncheckedMode[] = [];

  const shear = largestMagnitudeOn(analysis, 'shearY', 0, model.length);
  const buckling = webShearBucklingResistance({ ...web, flangeWidth: dimensions.flangeWidth, flangeThickness: dimensions.flangeThickness });
  if (!buckling.shearBucklingCheckRequired) {
    notApplicable.push({
      mode: 'web-shear-buckling',
      reason: `hw / tw = ${fourSignificantText(buckling.webSlendernessRatio)} is within 72 eps / eta = ${fourSignificantText(buckling.shearBucklingSlendernessLimit)}: the web yields in shear before it buckles (EN 1993-1-5:2006 5.1(2), from memory)`,
    });
  } else if (!buckling.inRange) {
    unchecked.push({ mode: 'web-shear-buckling', reason: `the web is outside the range of EN 1993-1-5's method: ${buckling.outOfRangeReasons.join('; ')}` });
  } else if (shear.value > 0) {
    checks.push(
      failureCheck({
        mode: 'web-shear-buckling',
        quantity: 'force',
        demand: shear.value,
        capacity: buckling.resistance,
        requiredSafetyFactor: required['web-shear-buckling'],
        position: shear.position,
        location: `web, hw / tw = ${fourSignificantText(buckling.webSlendernessRatio)}`,
        basis: `largest |Vy| against V_bw = chi_w fyw hw tw / sqrt(3), lambda_w = ${fourSignificantText(buckling.webSlenderness)}, chi_w = ${fourSignificantText(buckling.shearBucklingReductionFactor)} (EN 1993-1-5:2006 5.2-5.3, Table 5.1, non-rigid end post, no intermediate stiffeners, no flange contribution; from memory)`,
      }),
    );
  } else notApplicable.push({ mode: 'web-shear-buckling', reason: 'no shear force along y anywhere along the member' });

  const forces = concentratedForces(context);
  // EN 1993-1-5:2006 6.5(1) (from memory): the flange counts at most 15 eps tf either side of the web.
  const outstandLimit = 15 * steelEpsilon(material.yieldStrength) * dimensions.flangeThickness;
  const sides = dimensions.shape === 'i-section' ? 2 : 1;
  const bearingFlangeWidth = Math.min(dimensions.flangeWidth, dimensions.webThickness + sides * outstandLimit);
  if (forces.length === 0) {
    notApplicable.push({ mode: 'patch-loading', reason: 'no concentrated force across the flange (a point load or a support reaction along y)' });
    return { checks, notApplicable, unchecked };
  }
  let worst: FailureCheck | null = null;
  for (const { position, force, what } of forces) {
    const atEnd = position <= END_TOLERANCE * model.length || position >= model.length * (1 - END_TOLERANCE);
    const patch = patchLoadingResistance({
      ...web,
      flangeWidth: bearingFlangeWidth,
      flangeThickness: dimensions.flangeThickness,
      stiffBearingLength: 0,
      ...(atEnd ? { loadType: 'type-c' as const, endDistance: 0 } : { loadType: 'type-a' as const }),
    });
    if (!patch.inRange) {
      unchecked.push({ mode: 'patch-loading', reason: `${what}: outside the range of EN 1993-1-5 clause 6: ${patch.outOfRangeReasons.join('; ')}` });
      continue;
    }
    const check = failureCheck({
      mode: 'patch-loading',
      quantity: 'force',
      demand: force,
      capacity: patch.resistance,
      requiredSafetyFactor: required['patch-loading'],
      position,
      location: `web under ${what}${atEnd ? ' at the member end' : ''}`,
      basis: `F_R = fyw L_eff tw, L_eff = chi_F l_y, k_F = ${fourSignificantText(patch.bucklingCoefficient)} (EN 1993-1-5:2006 clause 6, load type ${atEnd ? '(c), c = 0' : '(a)'}, no stiff bearing length, no stiffeners; from memory)`,
    });
    if (worst === null || check.utilization > worst.utilization) worst = check;
  }
  if (worst !== null) checks.push(worst);
  return { checks, notApplicable, unchecked };
}
