/** Angle of twist: the largest |twist| along the member against the allowed twist. */

import type { CheckContext, CheckFindings } from './check-context.js';
import { largestMagnitudeOn } from './critical-positions.js';
import { failureCheck } from './failure-check.js';

export function twistChecks(context: CheckContext): CheckFindings {
  const { analysis } = context.input;
  const { criteria } = context;
  const peak = largestMagnitudeOn(analysis, 'twist', 0, analysis.length);
  return {
    checks: [
      failureCheck({
        mode: 'twist',
        quantity: 'angle',
        demand: peak.value,
        capacity: criteria.allowedTwist,
        requiredSafetyFactor: criteria.requiredSafetyFactor.twist,
        position: peak.position,
        location: 'member axis',
        basis: 'largest |twist| from GJ dtwist/dx = T against the allowed twist (common practice or as given)',
      }),
    ],
    notApplicable: [],
  };
}
