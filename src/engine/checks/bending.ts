/** The largest fibre stress from bending alone, on the tension and on the compression side. */

import type { CheckContext, CheckFindings } from './check-context.js';
import { failureCheck } from './failure-check.js';

/** A resultant section's labels already name the side. */
function sideLabel(location: string | null, namesSide: boolean, tensionSide: boolean): string | null {
  if (location === null || namesSide) return location;
  return `${location} (${tensionSide ? 'tension' : 'compression'} side)`;
}

/**
 * One check: the side whose stress is the larger fraction of its own strength (the tension side of a
 * tee or of a cast-iron beam can govern with a smaller stress).
 */
export function bendingChecks(context: CheckContext): CheckFindings {
  const { strengths, criteria, input } = context;
  const { bendingTension: tension, bendingCompression: compression } = context.peaks;
  const tensionGoverns = tension.value / strengths.tension.value >= compression.value / strengths.compression.value;
  const peak = tensionGoverns ? tension : compression;
  const strength = tensionGoverns ? strengths.tension : strengths.compression;
  const formula =
    input.section.bendingCombination === 'resultant'
      ? 'sigma = sqrt(Mz^2 + My^2) c / I (Shigley 10th ed., sec. 7-4, from memory)'
      : 'sigma = -Mz y / Iz - My z / Iy at the stress points, the unsymmetric form where Iyz != 0 (Shigley 10th ed., sec. 3-10, from memory)';
  return {
    checks: [
      failureCheck({
        mode: 'bending',
        quantity: 'stress',
        demand: peak.value,
        capacity: strength.value,
        requiredSafetyFactor: criteria.requiredSafetyFactor.bending,
        position: peak.position,
        location: sideLabel(peak.location, input.section.bendingCombination === 'resultant', tensionGoverns),
        basis: `${formula} against ${strength.symbol}`,
      }),
    ],
    notApplicable: [],
  };
}
