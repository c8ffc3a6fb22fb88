/**
 * Combined stresses: the normal and shear stresses at the same point of the section, through von Mises
 * for a ductile material and modified Mohr for a brittle one (see section-stresses.ts for the points).
 */

import type { CheckContext, CheckFindings } from './check-context.js';
import { failureCheck } from './failure-check.js';

export function combinedChecks(context: CheckContext): CheckFindings {
  const { input, strengths, criteria } = context;
  const peak = context.peaks.equivalent;
  const brittle = input.material.behaviour === 'brittle';
  const basis = brittle
    ? 'modified Mohr (Shigley 10th ed., eqs. 5-32a to 5-32c, from memory): equivalent tensile stress against Sut, with Suc'
    : "von Mises sigma' = sqrt(sigma^2 + 3 tau^2) (Shigley 10th ed., eq. 5-15, from memory) against Sy";
  return {
    checks: [
      failureCheck({
        mode: 'combined',
        quantity: 'stress',
        demand: peak.value,
        capacity: brittle ? strengths.tension.value : input.material.yieldStrength,
        requiredSafetyFactor: criteria.requiredSafetyFactor.combined,
        position: peak.position,
        location: peak.location,
        basis: `${basis}; extreme fibres with torsional shear, neutral axis with N/A and torsional plus transverse shear`,
      }),
    ],
    notApplicable: [],
  };
}
