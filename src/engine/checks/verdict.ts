/**
 * The verdict of a set of checks. A member passes only when every check passes and nothing that can
 * govern it was left out: a mode the service could not evaluate makes the answer 'not-verified', never
 * 'pass', and a failed check makes it 'fail' whatever else is missing.
 */

import type { FailureCheck, UncheckedMode, Verdict } from './check-outcome.js';

export function verdictOf(checks: readonly Pick<FailureCheck, 'passes'>[], unchecked: readonly UncheckedMode[]): Verdict {
  for (const check of checks) if (!check.passes) return 'fail';
  return unchecked.length > 0 ? 'not-verified' : 'pass';
}
