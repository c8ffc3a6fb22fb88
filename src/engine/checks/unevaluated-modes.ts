/**
 * Modes that can govern a member but that no check of this service evaluates. Each one found here is
 * listed in `unchecked`, which keeps the verdict from 'pass' (verdict.ts): a screening service must not
 * answer "pass" for a member it has not checked in every way it can fail.
 */

import type { CheckContext, CheckFindings } from './check-context.js';

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

export function unevaluatedModes(context: CheckContext): CheckFindings {
  if (!isShaft(context)) return { checks: [], notApplicable: [{ mode: 'fatigue', reason: 'no support lets the member turn: not a rotating shaft (fatigue under repeated loads is for the governing code to judge)' }] };
  return {
    checks: [],
    notApplicable: [],
    unchecked: [
      {
        mode: 'fatigue',
        reason: 'a shaft that turns in its bearings reverses its bending stress every revolution: its endurance (fatigue, with the stress concentrations of its keyways and shoulders) must be checked, which this service does not do',
      },
    ],
  };
}
