/** Axial tension against the yield and the ultimate strength, and axial compression (squash). */

import type { CheckContext, CheckFindings } from './check-context.js';
import type { FailureCheck, NotApplicableCheck } from './check-outcome.js';
import { failureCheck } from './failure-check.js';

const UNIFORM_AXIAL_STRESS = 'sigma = N/A, uniform over the section (Shigley 10th ed., ch. 3, from memory)';

export function axialChecks(context: CheckContext): CheckFindings {
  const { criteria, strengths, input } = context;
  const required = criteria.requiredSafetyFactor;
  const tension = context.peaks.axialTension;
  const compression = context.peaks.axialCompression;
  const checks: FailureCheck[] = [
    failureCheck({
      mode: 'tension',
      quantity: 'stress',
      demand: tension.value,
      capacity: strengths.tension.value,
      requiredSafetyFactor: required.tension,
      position: tension.position,
      location: tension.location,
      basis: `${UNIFORM_AXIAL_STRESS} in tension against ${strengths.tension.symbol}`,
    }),
  ];
  const notApplicable: NotApplicableCheck[] = [];
  if (input.material.behaviour === 'ductile') {
    checks.push(
      failureCheck({
        mode: 'tension-ultimate',
        quantity: 'stress',
        demand: tension.value,
        capacity: input.material.ultimateStrength,
        requiredSafetyFactor: required['tension-ultimate'],
        position: tension.position,
        location: tension.location,
        basis: `${UNIFORM_AXIAL_STRESS} in tension against Sut`,
      }),
    );
  } else {
    notApplicable.push({
      mode: 'tension-ultimate',
      reason: 'brittle material: the tension check is already made against the ultimate strength',
    });
  }
  checks.push(
    failureCheck({
      mode: 'compression',
      quantity: 'stress',
      demand: compression.value,
      capacity: strengths.compression.value,
      requiredSafetyFactor: required.compression,
      position: compression.position,
      location: compression.location,
      basis: `${UNIFORM_AXIAL_STRESS} in compression against ${strengths.compression.symbol} (squash; buckling is checked apart)`,
    }),
  );
  return { checks, notApplicable };
}
