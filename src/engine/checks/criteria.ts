/**
 * Acceptance criteria: the safety factor each check must reach and the serviceability limits, with the
 * defaults that stand in when a request gives none. Every default is common practice, not taken from a
 * code; the governing local code replaces them in a real design.
 */

import { DISTORTION_ENERGY_SHEAR_RATIO, type Material } from '../materials/material.js';
import { FAILURE_MODES, type FailureMode } from './failure-mode.js';

/** A required safety factor is set per failure mode, or with 'ultimate' for checks against an ultimate strength. */
export type SafetyFactorKey = FailureMode | 'ultimate';

export interface CriteriaInput {
  /**
   * One number for every strength and stability check (deflection and twist keep their own factor), or
   * factors by mode. A single number never lowers a mode below its default (buckling keeps 2.5 when 1.5
   * is given); factors by mode set each mode as given. 'ultimate' applies to the checks made against an ultimate strength: tension-ultimate
   * and, for a brittle material, every strength check whose mode is not given explicitly.
   */
  readonly requiredSafetyFactor?: number | Partial<Record<SafetyFactorKey, number>>;
  /** Span / allowed deflection for spans between supports (dimensionless, e.g. 250 for L/250). */
  readonly deflectionLimitRatio?: number;
  /** Overhang length / allowed deflection for cantilevers and overhangs (dimensionless). */
  readonly cantileverDeflectionLimitRatio?: number;
  /** Largest allowed angle of twist anywhere along the member, rad. */
  readonly allowedTwist?: number;
  /** Shear yield strength / tensile yield strength for ductile materials; overrides the material's. */
  readonly shearYieldRatio?: number;
}

/** The criteria actually used, every value filled in. */
export interface ResolvedCriteria {
  readonly requiredSafetyFactor: Readonly<Record<SafetyFactorKey, number>>;
  readonly deflectionLimitRatio: number;
  readonly cantileverDeflectionLimitRatio: number;
  /** rad */
  readonly allowedTwist: number;
  readonly shearYieldRatio: number;
  /** The criteria taken from the defaults rather than from the request. */
  readonly defaulted: readonly (keyof CriteriaInput)[];
  /** Modes whose default stayed because a single requiredSafetyFactor was lower than it. */
  readonly keptDefaults?: readonly SafetyFactorKey[];
}

/**
 * Common practice: 1.5 against yield and against design-curve resistances that allow for imperfections
 * (lateral-torsional buckling, web buckling), 2.0 against ultimate, 2.5 against elastic or idealised
 * instability loads (Euler and Johnson columns), 1.0 for serviceability.
 */
const DEFAULT_REQUIRED_SAFETY_FACTOR: Readonly<Record<SafetyFactorKey, number>> = {
  tension: 1.5,
  'tension-ultimate': 2.0,
  compression: 1.5,
  bending: 1.5,
  shear: 1.5,
  torsion: 1.5,
  buckling: 2.5,
  // Against M_b = chi_LT W fy, a design curve that already allows for imperfections: the yield factor.
  'lateral-torsional-buckling': 1.5,
  combined: 1.5,
  'beam-column': 1.5,
  'eccentric-column': 2.5,
  deflection: 1.0,
  twist: 1.0,
  'pin-shear': 1.5,
  'pin-bearing': 1.5,
  'pin-bending': 1.5,
  'flexural-torsional-buckling': 2.5,
  'local-buckling': 2.5,
  // Design curves that already allow for imperfections (EN 1993-1-5): the factor against yield.
  'web-shear-buckling': 1.5,
  'patch-loading': 1.5,
  fatigue: 1.0,
  ultimate: 2.0,
};

export const DEFAULT_CRITERIA = {
  requiredSafetyFactor: DEFAULT_REQUIRED_SAFETY_FACTOR,
  /** Common practice: L/250 for the total deflection of a span (floors often use L/360 for imposed load). */
  deflectionLimitRatio: 250,
  /** Common practice: L/180 for a cantilever or overhang. */
  cantileverDeflectionLimitRatio: 180,
  /** Common practice: 1 degree of twist. */
  allowedTwist: Math.PI / 180,
  /** Distortion-energy theory, Shigley 10th ed., eq. 5-21 (from memory). */
  shearYieldRatio: DISTORTION_ENERGY_SHEAR_RATIO,
} as const;

/** Serviceability limits are compared directly: a single-number factor does not apply to them. */
const SERVICEABILITY_MODES: readonly FailureMode[] = ['deflection', 'twist'];

/** For a brittle material these checks are made against an ultimate strength. */
export const STRENGTH_MODES_AGAINST_ULTIMATE_WHEN_BRITTLE: readonly FailureMode[] = [
  'tension',
  'compression',
  'bending',
  'shear',
  'torsion',
  'combined',
  'beam-column',
];

const SAFETY_FACTOR_KEYS: readonly SafetyFactorKey[] = [...FAILURE_MODES, 'ultimate'];

/** The limit the request gives, else the default, noted in `defaulted`. */
function givenOrDefault(
  partial: CriteriaInput,
  key: 'deflectionLimitRatio' | 'cantileverDeflectionLimitRatio' | 'allowedTwist',
  defaulted: (keyof CriteriaInput)[],
): number {
  const value = partial[key];
  if (value !== undefined) return value;
  defaulted.push(key);
  return DEFAULT_CRITERIA[key];
}

/**
 * Fills the defaults. The material decides two things: its shear yield ratio stands in when the request
 * gives none, and a brittle material's strength checks take the 'ultimate' factor unless the request
 * names their mode.
 */
export function resolveCriteria(
  partial: CriteriaInput = {},
  material: Pick<Material, 'behaviour' | 'shearYieldRatio'> = {
    behaviour: 'ductile',
    shearYieldRatio: DEFAULT_CRITERIA.shearYieldRatio,
  },
): ResolvedCriteria {
  const givesNone =
    partial.requiredSafetyFactor === undefined &&
    partial.deflectionLimitRatio === undefined &&
    partial.cantileverDeflectionLimitRatio === undefined &&
    partial.allowedTwist === undefined;
  if (!givesNone) return criteriaFilledIn(partial, material);
  const known = allDefaultCriteria.get(material.behaviour);
  if (known !== undefined && Object.is(known.shearYieldRatio, partial.shearYieldRatio ?? material.shearYieldRatio)) return known;
  const made = frozenCriteria(criteriaFilledIn(partial, material));
  allDefaultCriteria.set(material.behaviour, made);
  return made;
}

/**
 * The criteria of a request that gives no factor and no limit, by material behaviour, with the shear
 * yield ratio they were made for: most requests give none, so these are filled in once, and frozen
 * since every such check shares them.
 */
const allDefaultCriteria = new Map<Material['behaviour'], ResolvedCriteria>();

function frozenCriteria(criteria: ResolvedCriteria): ResolvedCriteria {
  Object.freeze(criteria.requiredSafetyFactor);
  Object.freeze(criteria.defaulted);
  return Object.freeze(criteria);
}

function criteriaFilledIn(partial: CriteriaInput, material: Pick<Material, 'behaviour' | 'shearYieldRatio'>): ResolvedCriteria {
  const defaulted: (keyof CriteriaInput)[] = [];
  const given = partial.requiredSafetyFactor;
  if (given === undefined) defaulted.push('requiredSafetyFactor');
  const required = {} as Record<SafetyFactorKey, number>;
  const keptDefaults: SafetyFactorKey[] = [];
  if (typeof given === 'number') {
    // One number is a floor for every strength and stability mode, never a cut below a mode's default:
    // 1.5 given for yield must not take buckling from 2.5 to 1.5 unnoticed.
    for (const key of SAFETY_FACTOR_KEYS) {
      const fallback = DEFAULT_REQUIRED_SAFETY_FACTOR[key];
      if (SERVICEABILITY_MODES.includes(key as FailureMode)) required[key] = fallback;
      else {
        required[key] = Math.max(given, fallback);
        if (given < fallback) keptDefaults.push(key);
      }
    }
  } else {
    const byMode = given ?? {};
    required.ultimate = byMode.ultimate ?? DEFAULT_REQUIRED_SAFETY_FACTOR.ultimate;
    for (const mode of FAILURE_MODES) {
      const againstUltimate =
        mode === 'tension-ultimate' ||
        (material.behaviour === 'brittle' && STRENGTH_MODES_AGAINST_ULTIMATE_WHEN_BRITTLE.includes(mode));
      required[mode] = byMode[mode] ?? (againstUltimate ? required.ultimate : DEFAULT_REQUIRED_SAFETY_FACTOR[mode]);
    }
  }
  const deflectionLimitRatio = givenOrDefault(partial, 'deflectionLimitRatio', defaulted);
  const cantileverDeflectionLimitRatio = givenOrDefault(partial, 'cantileverDeflectionLimitRatio', defaulted);
  const allowedTwist = givenOrDefault(partial, 'allowedTwist', defaulted);
  return {
    requiredSafetyFactor: required,
    deflectionLimitRatio,
    cantileverDeflectionLimitRatio,
    allowedTwist,
    shearYieldRatio: partial.shearYieldRatio ?? material.shearYieldRatio,
    defaulted,
    ...(keptDefaults.length > 0 ? { keptDefaults } : {}),
  };
}
