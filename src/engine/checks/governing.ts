/**
 * The governing failure: the check with the highest utilization. Utilizations within 1e-9 of each
 * other (relative) tie, and a tie goes to the mode listed first in FAILURE_MODES, so a simpler mode
 * wins over one that adds nothing to it: pure bending governs as 'bending', not as 'combined'.
 */

import type { FailureCheck, GoverningFailure } from './check-outcome.js';
import { failureModeRank } from './failure-mode.js';

export const TIE_TOLERANCE = 1e-9;

/** null when no check has any demand. */
export function governingFailure(checks: readonly FailureCheck[]): GoverningFailure | null {
  // Math.max over 0 and every utilization, taken one at a time (the same largest, without an array).
  let highest = 0;
  for (const check of checks) highest = Math.max(highest, check.utilization);
  if (highest === 0) return null;
  let chosen: FailureCheck | null = null;
  for (const check of checks) {
    if (check.utilization < highest * (1 - TIE_TOLERANCE)) continue;
    if (chosen === null || failureModeRank(check.mode) < failureModeRank(chosen.mode)) chosen = check;
  }
  const governing = chosen as FailureCheck;
  return {
    mode: governing.mode,
    utilization: governing.utilization,
    safetyFactor: governing.safetyFactor as number,
    position: governing.position,
    location: governing.location,
  };
}
