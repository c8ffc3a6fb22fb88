/** What the failure checks return. SI units: Pa, N, N*m, m, rad. */

import type { ResolvedCriteria } from './criteria.js';
import type { FailureMode } from './failure-mode.js';

/** The kind of quantity a check compares, which fixes its unit: Pa, N, N*m, m or rad. */
export type CheckQuantity = 'stress' | 'force' | 'moment' | 'length' | 'angle';

export interface FailureCheck {
  readonly mode: FailureMode;
  readonly quantity: CheckQuantity;
  /** The largest load effect found, >= 0, in the unit of `quantity`. */
  readonly demand: number;
  /** The resistance it is compared with, > 0, same unit. */
  readonly capacity: number;
  /** capacity / demand; null when the demand is zero. */
  readonly safetyFactor: number | null;
  readonly requiredSafetyFactor: number;
  /** demand * requiredSafetyFactor / capacity; 0 when the demand is zero. */
  readonly utilization: number;
  /** utilization <= 1 */
  readonly passes: boolean;
  /** Where along the member the demand peaks, m; null for no demand or a member-wide check. */
  readonly position: number | null;
  /** Where on the section or which part of the member: "bottom fibre (tension side)", "span 0 m to 4 m". */
  readonly location: string | null;
  /** The formula and its source, in one line. */
  readonly basis: string;
}

export interface NotApplicableCheck {
  readonly mode: FailureMode;
  readonly reason: string;
}

/** A mode that can govern this member but that the service did not evaluate, and why. */
export interface UncheckedMode {
  readonly mode: FailureMode;
  readonly reason: string;
}

/**
 * 'pass' only when every check passes and every mode that can govern was checked; 'fail' when any
 * check fails; otherwise 'not-verified': nothing checked fails, but a mode in `unchecked` might.
 */
export type Verdict = 'pass' | 'fail' | 'not-verified';

/** 'minor' is the minor principal axis of a section whose principal axes are not y and z (angles). */
export type BucklingAxis = 'y' | 'z' | 'minor';

/** 'none': nothing along the member is in compression. */
export type BucklingRegime = 'euler' | 'johnson' | 'none';

export interface BucklingAxisResult {
  readonly axis: BucklingAxis;
  readonly regime: BucklingRegime;
  /** K L / r */
  readonly slendernessRatio: number;
  /** sqrt(2 pi^2 E / Sy): Euler above it, Johnson below. */
  readonly transitionSlendernessRatio: number;
  /** Pa; from the formula the slenderness selects, also when regime is 'none'. */
  readonly criticalStress: number;
  /** N */
  readonly criticalLoad: number;
  /** K L, m */
  readonly effectiveLength: number;
  readonly effectiveLengthFactor: number;
  /** criticalLoad / largest compressive force; null with no compression. */
  readonly safetyFactor: number | null;
}

export interface BucklingSummary {
  /** The axis with the lowest critical load. */
  readonly governing: BucklingAxisResult;
  readonly axes: readonly BucklingAxisResult[];
}

export interface LateralTorsionalSummary {
  /** The unbraced length that governs, m, and where it lies. */
  readonly from: number;
  readonly to: number;
  readonly unbracedLength: number;
  /** Effective length used in the formula, m (the unbraced length, or twice it for an overhang on a fork). */
  readonly effectiveLength: number;
  readonly momentGradientFactor: number;
  /** Elastic critical moment, N*m. */
  readonly criticalMoment: number;
  /** lambda_LT = sqrt(W fy / M_cr). */
  readonly relativeSlenderness: number;
  /** chi_LT (EN 1993-1-1 6.3.2.2). */
  readonly reductionFactor: number;
  /** M_b = chi_LT W fy, N*m: the capacity of the check. */
  readonly resistance: number;
  /** The imperfection curve, EN 1993-1-1 Table 6.4; absent for a material other than steel (elastic M_cr). */
  readonly curve?: 'a' | 'b' | 'c' | 'd';
  /** zg, m: the load's distance from the shear centre, positive when destabilising, negative when stabilising. */
  readonly loadHeight: number;
}

/** A stress extreme: its value (>= 0, Pa), where along the member and where on the section. */
export interface StressExtreme {
  readonly value: number;
  readonly position: number | null;
  readonly location: string | null;
}

export interface StressSummary {
  /** Largest N / A in tension and in compression (magnitude). */
  readonly axialTension: StressExtreme;
  readonly axialCompression: StressExtreme;
  /** Largest fibre stress from bending alone on the tension and on the compression side (magnitude). */
  readonly bendingTension: StressExtreme;
  readonly bendingCompression: StressExtreme;
  /** Largest V Q / (I b) and, beside it, the largest average V / A (V the resultant of Vy and Vz). */
  readonly transverseShear: StressExtreme;
  readonly averageShear: StressExtreme;
  /** Largest T * torsionalShearPerTorque. */
  readonly torsionalShear: StressExtreme;
  /** Largest von Mises stress (ductile) or modified-Mohr equivalent tensile stress (brittle). */
  readonly equivalent: StressExtreme;
}

export interface GoverningFailure {
  readonly mode: FailureMode;
  readonly utilization: number;
  readonly safetyFactor: number;
  readonly position: number | null;
  readonly location: string | null;
}

export interface MemberCheckOutcome {
  readonly checks: readonly FailureCheck[];
  readonly notApplicable: readonly NotApplicableCheck[];
  /** Modes that apply but were not evaluated: the verdict cannot be 'pass' while any is listed. */
  readonly unchecked: readonly UncheckedMode[];
  /** The check with the highest utilization; null when no check has any demand. */
  readonly governing: GoverningFailure | null;
  readonly verdict: Verdict;
  readonly buckling: BucklingSummary;
  /** null when lateral-torsional buckling does not apply. */
  readonly lateralTorsionalBuckling: LateralTorsionalSummary | null;
  readonly stresses: StressSummary;
  readonly criteria: ResolvedCriteria;
  readonly notices: readonly string[];
}
