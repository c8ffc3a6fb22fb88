/**
 * Modes that can govern a member but that no check of this service evaluates. Each one found here is
 * listed in `unchecked`, which keeps the verdict from 'pass' (verdict.ts): a screening service must not
 * answer "pass" for a member it has not checked in every way it can fail.
 */

import { channelShearCentreDistance } from '../sections/shear-centre.js';
import type { CheckContext, CheckFindings } from './check-context.js';
import type { NotApplicableCheck, UncheckedMode } from './check-outcome.js';
import { largestMagnitudeOn } from './critical-positions.js';

/**
 * Rotating members: a support that holds the member in place but lets it turn (a bearing), on a member
 * that carries torque or that nothing holds against turning. A beam whose twist is held at one end only
 * and that carries no torque is not taken for a shaft.
 */
function isShaft(context: CheckContext): boolean {
  const { supports } = context.input.model;
  const bearing = supports.some((support) => support.restraints.rx === 'free' && support.restraints.uy === 'rigid' && support.restraints.uz === 'rigid');
  const turnsFreely = supports.every((support) => support.restraints.rx === 'free');
  return bearing && (context.peaks.torsionalShear.value > 0 || turnsFreely);
}

/**
 * A channel loaded in the plane of its web: its shear centre lies e off the web (Roark / AISC Design
 * Guide 9, from memory), so the load twists it by q e, a torque the model does not hold unless the caller
 * gives it or states that the loads act through the shear centre.
 */
function eccentricChannelLoad(context: CheckContext): UncheckedMode | null {
  const { section, dimensions, loadsThroughShearCentre, analysis, model } = context.input;
  if (section.shape !== 'channel' || loadsThroughShearCentre === true) return null;
  if (!(largestMagnitudeOn(analysis, 'shearY', 0, model.length).value > 0)) return null;
  const offset = dimensions?.shape === 'channel' ? ` ${Number((channelShearCentreDistance(dimensions) * 1000).toPrecision(3))} mm` : '';
  return {
    mode: 'torsion',
    reason: `a channel loaded in the plane of its web is twisted by the load times the distance${offset} from its web to its shear centre, a torque not in this model: give that torque as loads (mx) and state loadsThroughShearCentre: true, or state it because the loads do act through the shear centre`,
  };
}

export function unevaluatedModes(context: CheckContext): CheckFindings {
  const notApplicable: NotApplicableCheck[] = [];
  const unchecked: UncheckedMode[] = [];
  if (isShaft(context)) {
    unchecked.push({
      mode: 'fatigue',
      reason: 'a shaft that turns in its bearings reverses its bending stress every revolution: its endurance (fatigue, with the stress concentrations of its keyways and shoulders) must be checked, which this service does not do',
    });
  } else notApplicable.push({ mode: 'fatigue', reason: 'no support lets the member turn: not a rotating shaft (fatigue under repeated loads is for the governing code to judge)' });
  const eccentric = eccentricChannelLoad(context);
  if (eccentric !== null) unchecked.push(eccentric);
  return { checks: [], notApplicable, unchecked };
}
