/** What every check reads: the input, the scanned member, its stress peaks, the resolved criteria and the strengths. */

import type { MemberCheckInput } from './check-input.js';
import type { FailureCheck, NotApplicableCheck, StressSummary } from './check-outcome.js';
import type { ResolvedCriteria } from './criteria.js';
import type { MemberScan } from './critical-positions.js';
import type { MaterialStrengths } from './strengths.js';

export interface CheckContext {
  readonly input: MemberCheckInput;
  readonly scan: MemberScan;
  readonly peaks: StressSummary;
  readonly criteria: ResolvedCriteria;
  readonly strengths: MaterialStrengths;
}

/** The checks a module made and the modes it found not to apply. */
export interface CheckFindings {
  readonly checks: readonly FailureCheck[];
  readonly notApplicable: readonly NotApplicableCheck[];
}
