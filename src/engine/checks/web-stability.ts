/**
 * The web of an I-section or channel: shear buckling of a slender web, and the resistance of the web
 * to a concentrated transverse force on a flange (patch loading), by EN 1993-1-5:2006 clauses 5 and 6
 * (web-resistance.ts, from memory). The resistances are design curves that already allow for
 * imperfections, without partial factors: the service's own required safety factor applies.
 *
 * Assumptions (each on the safe side): no intermediate transverse stiffeners, a non-rigid end post, no
 * flange contribution to the shear resistance, and the stiff bearing length the request gives for each
 * support and point load (bearingLength), none (ss = 0) when it gives none. A force at a member end is type (c) with the load at the very end (c = 0), elsewhere type (a).
 * A channel's one-sided flange is taken through the same formulas with its width on one side.
 */

import type { BoxDimensions, ChannelDimensions, ISectionDimensions } from '../sections/dimensions.js';
import type { CheckContext, CheckFindings } from './check-context.js';
import type { FailureCheck, NotApplicableCheck, UncheckedMode } from './check-outcome.js';
import { largestMagnitudeOn } from './critical-positions.js';
import { failureCheck } from './failure-check.js';
import { fourSignificantText } from './number-texts.js';
import { isStructuralSteel } from './structural-steel.js';
import { slendernessEpsilon } from './outstand-slenderness.js';
import { patchLoadingResistance, webShearBucklingResistance, type PatchLoadingResult, type WebShearBucklingResult } from './web-resistance.js';

type FlangedDimensions = ISectionDimensions | ChannelDimensions;

/** A force closer than this to a member end (relative to the length) acts at the end. */
const END_TOLERANCE = 1e-9;

function flangedDimensions(context: CheckContext): FlangedDimensions | null {
  const dimensions = context.input.dimensions;
  return dimensions !== undefined && (dimensions.shape === 'i-section' || dimensions.shape === 'channel') ? dimensions : null;
}

/** The concentrated forces across the flange (along y): point loads and support reactions, where they act, with their stiff bearing lengths. */
function concentratedForces(context: CheckContext): { position: number; force: number; bearingLength: number; what: string }[] {
  const { model, analysis } = context.input;
  const forces: { position: number; force: number; bearingLength: number; what: string }[] = [];
  model.loads.forEach((load, i) => {
    if (load.kind === 'point' && load.fy !== 0) forces.push({ position: load.position, force: Math.abs(load.fy), bearingLength: load.bearingLength ?? 0, what: `load ${i + 1}` });
  });
  analysis.reactions.forEach((reaction, i) => {
    if (reaction.fy !== 0) forces.push({ position: reaction.position, force: Math.abs(reaction.fy), bearingLength: model.supports[i]?.bearingLength ?? 0, what: `support ${i}` });
  });
  return forces;
}

/**
 * A box's two walls along y are webs too. Shear buckling is checked on the pair (twice one wall's
 * resistance, the clear depth between the flanges less the corners, 3 t in all: common practice); patch
 * loading of a box is not evaluated, so where its walls are slender it is left unchecked.
 */
function boxWebChecks(context: CheckContext, box: BoxDimensions): CheckFindings {
  const { material, model, analysis } = context.input;
  const t = box.wallThickness;
  const webDepth = box.depth - 3 * t;
  const buckling = webShearBucklingResistance({ webDepth, webThickness: t, webYieldStrength: material.yieldStrength, elasticModulus: material.elasticModulus });
  const shear = largestMagnitudeOn(analysis, 'shearY', 0, model.length);
  const forces = concentratedForces(context);
  const stocky = `c/t = ${fourSignificantText(buckling.webSlendernessRatio)} within 72 eps / eta = ${fourSignificantText(buckling.shearBucklingSlendernessLimit)} (EN 1993-1-5:2006 5.1(2), from memory)`;
  const findings: { checks: FailureCheck[]; notApplicable: NotApplicableCheck[]; unchecked: UncheckedMode[] } = { checks: [], notApplicable: [], unchecked: [] };
  if (!buckling.shearBucklingCheckRequired) findings.notApplicable.push({ mode: 'web-shear-buckling', reason: `the box's walls yield in shear before they buckle: ${stocky}` });
  else if (shear.value > 0) {
    findings.checks.push(
      failureCheck({
        mode: 'web-shear-buckling',
        quantity: 'force',
        demand: shear.value,
        capacity: 2 * buckling.resistance,
        requiredSafetyFactor: context.criteria.requiredSafetyFactor['web-shear-buckling'],
        position: shear.position,
        location: `the two walls of the box, c/t = ${fourSignificantText(buckling.webSlendernessRatio)}`,
        basis: `largest |Vy| against 2 V_bw, V_bw = chi_w fyw hw t / sqrt(3) per wall with hw = h - 3t, chi_w = ${fourSignificantText(buckling.shearBucklingReductionFactor)} (EN 1993-1-5:2006 5.2-5.3, Table 5.1, non-rigid end post; from memory)`,
      }),
    );
  } else findings.notApplicable.push({ mode: 'web-shear-buckling', reason: 'no shear force along y anywhere along the member' });
  if (forces.length === 0) findings.notApplicable.push({ mode: 'patch-loading', reason: 'no concentrated force across the flange (a point load or a support reaction along y)' });
  else if (buckling.shearBucklingCheckRequired) findings.unchecked.push({ mode: 'patch-loading', reason: `a concentrated force on a box whose walls are slender (c/t = ${fourSignificantText(buckling.webSlendernessRatio)}): the crippling of its walls is not evaluated` });
  else findings.notApplicable.push({ mode: 'patch-loading', reason: `stocky walls: ${stocky}; their crippling under a point load is left to the connection design` });
  return findings;
}

interface WebResistances {
  readonly buckling: WebShearBucklingResult;
  /** Why the web need not be checked for shear buckling, made once. */
  readonly stockyReason: string;
  readonly patchInSpan: (flangeWidth: number, stiffBearingLength: number) => PatchLoadingResult;
  readonly patchAtEnd: (flangeWidth: number, stiffBearingLength: number) => PatchLoadingResult;
}

/**
 * The resistances depend only on the plates and the material, not on the loads (no stiff bearing
 * length is taken): a sizing checks the same catalogue sections again and again, so they are kept per
 * dimensions object and material, a few each.
 */
const resistancesByDimensions = new WeakMap<FlangedDimensions, Map<string, WebResistances>>();

function webResistancesOf(dimensions: FlangedDimensions, web: { webDepth: number; webThickness: number; webYieldStrength: number; elasticModulus: number }): WebResistances {
  const key = `${web.webYieldStrength}|${web.elasticModulus}`;
  let known = resistancesByDimensions.get(dimensions);
  const found = known?.get(key);
  if (found !== undefined) return found;
  const buckling = webShearBucklingResistance({ ...web, flangeWidth: dimensions.flangeWidth, flangeThickness: dimensions.flangeThickness });
  const patch = (loadType: 'type-a' | 'type-c') => {
    let last: { width: number; bearing: number; result: PatchLoadingResult } | undefined;
    return (flangeWidth: number, stiffBearingLength: number) => {
      if (last?.width === flangeWidth && last.bearing === stiffBearingLength) return last.result;
      const common = { ...web, flangeWidth, flangeThickness: dimensions.flangeThickness, stiffBearingLength };
      const result = patchLoadingResistance(loadType === 'type-c' ? { ...common, loadType, endDistance: 0 } : { ...common, loadType });
      last = { width: flangeWidth, bearing: stiffBearingLength, result };
      return result;
    };
  };
  const made: WebResistances = {
    buckling,
    stockyReason: `hw / tw = ${fourSignificantText(buckling.webSlendernessRatio)} is within 72 eps / eta = ${fourSignificantText(buckling.shearBucklingSlendernessLimit)}: the web yields in shear before it buckles (EN 1993-1-5:2006 5.1(2), from memory)`,
    patchInSpan: patch('type-a'),
    patchAtEnd: patch('type-c'),
  };
  if (known === undefined) {
    known = new Map();
    resistancesByDimensions.set(dimensions, known);
  }
  if (known.size < 8) known.set(key, made);
  return made;
}

export function webStabilityChecks(context: CheckContext): CheckFindings {
  const { material } = context.input;
  const plated = context.input.dimensions?.shape === 'box' || flangedDimensions(context) !== null;
  if (plated && !isStructuralSteel(material)) {
    const reason = "EN 1993-1-5's web rules are for steel: the web of a member of another material is not evaluated";
    return { checks: [], notApplicable: [], unchecked: [{ mode: 'web-shear-buckling', reason }, { mode: 'patch-loading', reason }] };
  }
  if (context.input.dimensions?.shape === 'box') return boxWebChecks(context, context.input.dimensions);
  const dimensions = flangedDimensions(context);
  if (dimensions === null) {
    const reason = 'not an I-section, channel or box with a known web';
    return { checks: [], notApplicable: [{ mode: 'web-shear-buckling', reason }, { mode: 'patch-loading', reason }] };
  }
  const { model, analysis } = context.input;
  const required = context.criteria.requiredSafetyFactor;
  const webDepth = dimensions.depth - 2 * dimensions.flangeThickness;
  const web = { webDepth, webThickness: dimensions.webThickness, webYieldStrength: material.yieldStrength, elasticModulus: material.elasticModulus };
  const checks: FailureCheck[] = [];
  const notApplicable: NotApplicableCheck[] = [];
  const unchecked: UncheckedMode[] = [];

  const shear = largestMagnitudeOn(analysis, 'shearY', 0, model.length);
  const resistances = webResistancesOf(dimensions, web);
  const { buckling } = resistances;
  if (!buckling.shearBucklingCheckRequired) {
    notApplicable.push({ mode: 'web-shear-buckling', reason: resistances.stockyReason });
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
  const outstandLimit = 15 * slendernessEpsilon(material.yieldStrength) * dimensions.flangeThickness;
  const sides = dimensions.shape === 'i-section' ? 2 : 1;
  const bearingFlangeWidth = Math.min(dimensions.flangeWidth, dimensions.webThickness + sides * outstandLimit);
  if (forces.length === 0) {
    notApplicable.push({ mode: 'patch-loading', reason: 'no concentrated force across the flange (a point load or a support reaction along y)' });
    return { checks, notApplicable, unchecked };
  }
  let worst: FailureCheck | null = null;
  for (const { position, force, bearingLength, what } of forces) {
    const atEnd = position <= END_TOLERANCE * model.length || position >= model.length * (1 - END_TOLERANCE);
    const patch = atEnd ? resistances.patchAtEnd(bearingFlangeWidth, bearingLength) : resistances.patchInSpan(bearingFlangeWidth, bearingLength);
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
      basis: `F_R = fyw L_eff tw, L_eff = chi_F l_y, k_F = ${fourSignificantText(patch.bucklingCoefficient)} (EN 1993-1-5:2006 clause 6, load type ${atEnd ? '(c), c = 0' : '(a)'}, stiff bearing length ${fourSignificantText(bearingLength)} m, no stiffeners; from memory)`,
    });
    if (worst === null || check.utilization > worst.utilization) worst = check;
  }
  if (worst !== null) checks.push(worst);
  return { checks, notApplicable, unchecked };
}
