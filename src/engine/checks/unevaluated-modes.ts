/**
 * Modes that can govern a member but that no check of this service evaluates. Each one found here is
 * listed in `unchecked`, which keeps the verdict from 'pass' (verdict.ts): a screening service must not
 * answer "pass" for a member it has not checked in every way it can fail.
 */

import type { CheckContext, CheckFindings } from './check-context.js';

/** Rotating members: a support that holds the member in place but lets it turn (a bearing) marks a shaft. */
function isShaft(context: CheckContext): boolean {
  return context.input.model.supports.some(
    (support) => support.restraints.rx === 'free' && support.restraints.uy === 'rigid' && support.restraints.uz === 'rigid',
  );
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
