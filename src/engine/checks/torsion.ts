/** Torsional shear: the largest |T| * torsionalShearPerTorque against the shear strength. */

import type { CheckContext, CheckFindings } from './check-context.js';
import { failureCheck } from './failure-check.js';

export function torsionChecks(context: CheckContext): CheckFindings {
  const { strengths, criteria } = context;
  const peak = context.peaks.torsionalShear;
  return {
    checks: [
      failureCheck({
        mode: 'torsion',
        quantity: 'stress',
        demand: peak.value,
        capacity: strengths.shear.value,
        requiredSafetyFactor: criteria.requiredSafetyFactor.torsion,
        position: peak.position,
        location: peak.location,
        basis: `tau = T * (largest shear per unit torque of the section; T r / J for a circle, Shigley 10th ed., eq. 3-37, from memory) against ${strengths.shear.symbol}`,
      }),
    ],
    notApplicable: [],
  };
}
