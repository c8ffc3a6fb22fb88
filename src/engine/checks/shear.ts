/** Transverse shear: the largest V Q / (I b) against the shear strength. */

import type { CheckContext, CheckFindings } from './check-context.js';
import { failureCheck } from './failure-check.js';
import { fourDecimalText } from './number-texts.js';

export function shearChecks(context: CheckContext): CheckFindings {
  const { input, strengths, criteria } = context;
  const peak = context.peaks.transverseShear;
  const direction =
    input.section.bendingCombination === 'resultant'
      ? 'V the resultant of Vy and Vz'
      : 'the larger of the y and z directions';
  const strength =
    strengths.shear.symbol === 'Ssy'
      ? `Ssy = ${fourDecimalText(criteria.shearYieldRatio)} Sy`
      : `${strengths.shear.symbol} (modified Mohr in pure shear)`;
  return {
    checks: [
      failureCheck({
        mode: 'shear',
        quantity: 'stress',
        demand: peak.value,
        capacity: strengths.shear.value,
        requiredSafetyFactor: criteria.requiredSafetyFactor.shear,
        position: peak.position,
        location: peak.location,
        basis: `tau = V Q / (I b), ${direction} (Shigley 10th ed., eq. 3-30, from memory) against ${strength}`,
      }),
    ],
    notApplicable: [],
  };
}
