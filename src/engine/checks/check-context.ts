/**
 * What every check reads: the input, the scanned member, its stress peaks, the resolved criteria, the
 * strengths and the column axes.
 */

import type { MemberCheckInput } from './check-input.js';
import { columnAxesOf, type ColumnAxis } from './column-buckling.js';
import type { FailureCheck, NotApplicableCheck, StressSummary, UncheckedMode } from './check-outcome.js';
import { resolveCriteria, type ResolvedCriteria } from './criteria.js';
import { scanMember, type MemberScan } from './critical-positions.js';
import { materialStrengths, type MaterialStrengths } from './strengths.js';
import { stressPeaks } from './stress-peaks.js';

export interface CheckContext {
  readonly input: MemberCheckInput;
  readonly scan: MemberScan;
  readonly peaks: StressSummary;
  readonly criteria: ResolvedCriteria;
  readonly strengths: MaterialStrengths;
  /** The axes buckling is checked about, each with its K L. */
  readonly columnAxes: readonly ColumnAxis[];
}

/** The checks a module made, the modes it found not to apply, and those that apply but it could not evaluate. */
export interface CheckFindings {
  readonly checks: readonly FailureCheck[];
  readonly notApplicable: readonly NotApplicableCheck[];
  readonly unchecked?: readonly UncheckedMode[];
}

/** Resolves the criteria, finds the critical positions and the stress peaks, and the column axes. */
export function buildCheckContext(input: MemberCheckInput): CheckContext {
  const criteria = resolveCriteria(input.criteria, input.material);
  const scan = scanMember(input.analysis, input.section);
  return {
    input,
    scan,
    peaks: stressPeaks(input, scan),
    criteria,
    strengths: materialStrengths(input.material, criteria.shearYieldRatio),
    columnAxes: columnAxesOf(input),
  };
}
