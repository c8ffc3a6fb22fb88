/**
 * Effective-length factors K of a column, from the request or from the supports of the model.
 *
 * Tabulated K for the idealised ends (AISC 360-16 Commentary Table C-A-7.1, values from memory):
 *   theoretical 0.5 fixed-fixed, 0.7 fixed-pinned, 1.0 pinned-pinned, 2.0 fixed-free;
 *   recommended design values 0.65, 0.80, 1.0, 2.1 (ends are never perfectly fixed).
 */

import type { Direction, MemberModel, Restraint, SupportModel } from '../member/model.js';
import type { BucklingInput, EndConditions } from './check-input.js';

export const THEORETICAL_EFFECTIVE_LENGTH_FACTORS: Readonly<Record<EndConditions, number>> = {
  'fixed-fixed': 0.5,
  'fixed-pinned': 0.7,
  'pinned-pinned': 1.0,
  'fixed-free': 2.0,
};

export const RECOMMENDED_EFFECTIVE_LENGTH_FACTORS: Readonly<Record<EndConditions, number>> = {
  'fixed-fixed': 0.65,
  'fixed-pinned': 0.8,
  'pinned-pinned': 1.0,
  'fixed-free': 2.1,
};

export function effectiveLengthFactorFor(endConditions: EndConditions, recommendedDesignValues = false): number {
  return (recommendedDesignValues ? RECOMMENDED_EFFECTIVE_LENGTH_FACTORS : THEORETICAL_EFFECTIVE_LENGTH_FACTORS)[
    endConditions
  ];
}

/** The plane a column buckles in: about z it deflects along y (uy, rz); about y along z (uz, ry). */
export type BucklingPlane = 'y' | 'z';

const PLANE_DIRECTIONS: Readonly<Record<BucklingPlane, { translation: Direction; rotation: Direction }>> = {
  z: { translation: 'uy', rotation: 'rz' },
  y: { translation: 'uz', rotation: 'ry' },
};

export interface EffectiveLengthFactor {
  readonly factor: number;
  /** How it was chosen, for a notice. */
  readonly basis: string;
  /**
   * Why no safe K can be read from the supports (hinges, a spring across the plane, an end that
   * nothing holds): a compressed member then needs a K given in the request.
   */
  readonly undetermined?: string;
}

type EndRestraint = 'fixed' | 'pinned' | 'free';

const isRigid = (restraint: Restraint | undefined) => restraint === 'rigid';

/**
 * A rotational spring counts as a pin (the safe side). Several supports at one position act together.
 */
function endRestraint(supports: readonly SupportModel[], plane: BucklingPlane): EndRestraint {
  const { translation, rotation } = PLANE_DIRECTIONS[plane];
  let held = false;
  let fixed = false;
  for (const support of supports) {
    held ||= isRigid(support.restraints[translation]);
    fixed ||= isRigid(support.restraints[rotation]);
  }
  if (!held) return 'free';
  return fixed ? 'fixed' : 'pinned';
}

/** K = 2 stands in where the supports give none; the check asks for a factor if the member is compressed. */
function undeterminedFactor(undetermined: string): EffectiveLengthFactor {
  return {
    factor: 2.0,
    basis: `${undetermined}: K not read from the supports, give an effective-length factor`,
    undetermined,
  };
}

/**
 * K from the supports, over the member length:
 * - supports at the two ends only: the idealised end conditions they form;
 * - supports in between and both ends held laterally: K = 1 (bracing in between only shortens the
 *   buckled length, so this is conservative);
 * - a free (overhanging) end with supports in between: K = 2, a fixed-free column of the whole length
 *   (conservative; give unbracedLength and a factor to refine).
 */
export function effectiveLengthFactorFromSupports(
  model: MemberModel,
  plane: BucklingPlane,
  recommendedDesignValues = false,
): EffectiveLengthFactor {
  const tolerance = 1e-9 * model.length;
  const { translation } = PLANE_DIRECTIONS[plane];
  // A hinge makes part of the column lean on the rest: K can exceed every tabulated value.
  if (model.hinges.length > 0) return undeterminedFactor('the member has internal hinges');
  // A translational spring is neither a hold nor free: the critical load depends on its stiffness.
  if (model.supports.some((support) => typeof support.restraints[translation] === 'object')) {
    return undeterminedFactor(`a support is a spring along ${translation}`);
  }
  const atStart: SupportModel[] = [];
  const atEnd: SupportModel[] = [];
  let heldBetween = false;
  for (const support of model.supports) {
    if (support.position <= tolerance) atStart.push(support);
    if (support.position >= model.length - tolerance) atEnd.push(support);
    heldBetween ||=
      support.position > tolerance && support.position < model.length - tolerance && isRigid(support.restraints[translation]);
  }
  const startEnd = endRestraint(atStart, plane);
  const farEnd = endRestraint(atEnd, plane);
  if (heldBetween) {
    return startEnd === 'free' || farEnd === 'free'
      ? { factor: 2.0, basis: 'an overhanging free end beyond intermediate supports: K = 2 over the member length (conservative)' }
      : { factor: 1.0, basis: 'intermediate lateral supports: K = 1 over the member length (conservative)' };
  }
  // The pair in alphabetical order, as ENDS_TO_CONDITIONS lists it.
  const first = startEnd <= farEnd ? startEnd : farEnd;
  const second = startEnd <= farEnd ? farEnd : startEnd;
  const endConditions = ENDS_TO_CONDITIONS[first][second];
  if (endConditions === undefined) return undeterminedFactor(`ends ${first} and ${second} form no stable column in this plane`);
  return {
    factor: effectiveLengthFactorFor(endConditions, recommendedDesignValues),
    basis: BASIS_FROM_SUPPORTS[endConditions],
  };
}

/** Pairs of end restraints, the first before the second alphabetically, to the idealised end conditions. */
const ENDS_TO_CONDITIONS: Readonly<Record<EndRestraint, Readonly<Partial<Record<EndRestraint, EndConditions>>>>> = {
  fixed: { fixed: 'fixed-fixed', pinned: 'fixed-pinned', free: 'fixed-free' },
  pinned: { pinned: 'pinned-pinned' },
  free: {},
};

/** The basis of a K read from the supports, written once for each end condition. */
const BASIS_FROM_SUPPORTS: Readonly<Record<EndConditions, string>> = {
  'fixed-fixed': 'fixed-fixed ends read from the supports',
  'fixed-pinned': 'fixed-pinned ends read from the supports',
  'pinned-pinned': 'pinned-pinned ends read from the supports',
  'fixed-free': 'fixed-free ends read from the supports',
};

/** K for one plane: the per-axis factor, else the common factor, else the end conditions, else the supports. */
export function resolveEffectiveLengthFactor(
  buckling: BucklingInput,
  model: MemberModel,
  plane: BucklingPlane,
): EffectiveLengthFactor {
  const perAxis = plane === 'y' ? buckling.effectiveLengthFactorY : buckling.effectiveLengthFactorZ;
  if (perAxis !== undefined) return { factor: perAxis, basis: `effectiveLengthFactor${plane.toUpperCase()} as given` };
  if (buckling.effectiveLengthFactor !== undefined) {
    return { factor: buckling.effectiveLengthFactor, basis: 'effectiveLengthFactor as given' };
  }
  if (buckling.endConditions !== undefined) {
    return {
      factor: effectiveLengthFactorFor(buckling.endConditions, buckling.recommendedDesignValues),
      basis: `${buckling.endConditions} ends as given`,
    };
  }
  return effectiveLengthFactorFromSupports(model, plane, buckling.recommendedDesignValues);
}
