/**
 * The combinations used when a request gives none, built from the actions' categories.
 *
 * Common practice, a placeholder for the governing code's combinations. They are in the
 * allowable-stress format, because every check of this service applies its required safety factor to
 * the resistance: the loads are combined at their characteristic (unfactored) values, as in the basic
 * allowable-stress combinations of ASCE/SEI 7 (section 2.4.1, from memory), with 0.75 on variable actions
 * that act together and 0.6 on permanent actions that resist wind uplift. Partial load factors
 * (EN 1990, 6.4.3.2, e.g. 1.35 G + 1.5 Q) belong with resistance factors near 1; a caller who works in
 * that format gives its own combinations and criteria.requiredSafetyFactor.
 *
 * Strength:
 *   G                       permanent actions alone
 *   G + Q                   each variable action (imposed, snow, wind, other; fixed or moving) in turn
 *   G + 0.75 (Q1 + Q2 ...)  the variable actions together, when there are two or more: every fixed
 *                           imposed, snow and other action, with at most one wind action and at most one
 *                           moving load (one such combination for each choice: wind cases are
 *                           directions of one wind, and a combination moves one train)
 *   0.6 G + W               each wind action against reduced permanent actions (uplift, overturning;
 *                           the wind given at its characteristic, service-level value)
 *   G + A + 0.5 L + 0.2 S   each accidental action with the imposed and other actions at 0.5 and snow at
 *                           0.2 (the companions of ASCE/SEI 7, 2.5.2, from memory), one moving load at a time
 * Serviceability (unfactored):
 *   G                       when there is no variable action
 *   G + Q                   each variable action in turn
 *   G + Q1 + Q2 ...         the variable actions together, chosen as for strength
 * A moving wind or snow load is not refused: it is treated as a train.
 */

import type { ActionCategory, CombinationModel } from './load-actions.js';

export interface ActionSummary {
  readonly id: string;
  readonly category: ActionCategory;
  readonly moving: boolean;
}

const VARIABLE: readonly ActionCategory[] = ['imposed', 'snow', 'wind', 'other'];

export const DEFAULT_COMBINATION_FACTORS = {
  /** ASCE/SEI 7, 2.4.1, combinations 4 and 6 (from memory): variable actions acting together. */
  together: 0.75,
  /** ASCE/SEI 7, 2.4.1, combination 7 (from memory): permanent actions that resist wind. */
  permanentAgainstWind: 0.6,
  /** ASCE/SEI 7, 2.5.2 (from memory): imposed actions beside an accidental one. */
  imposedWithAccidental: 0.5,
  /** ASCE/SEI 7, 2.5.2 (from memory): snow beside an accidental one. */
  snowWithAccidental: 0.2,
} as const;

function term(factor: number, id: string): string {
  return `${factor} ${id}`;
}

function combination(purpose: CombinationModel['purpose'], index: number, factors: [string, number][]): CombinationModel {
  return {
    id: `${purpose}-${index}`,
    purpose,
    factors: new Map(factors),
    description: factors.map(([id, factor]) => term(factor, id)).join(' + '),
  };
}

/** Every choice of at most one of each exclusive group beside the fixed actions: [] stands for none of a group. */
function choices(fixed: readonly ActionSummary[], groups: readonly (readonly ActionSummary[])[]): ActionSummary[][] {
  let sets: ActionSummary[][] = [[...fixed]];
  for (const group of groups) {
    if (group.length === 0) continue;
    sets = sets.flatMap((set) => group.map((action) => [...set, action]));
  }
  return sets;
}

export function defaultCombinations(actions: readonly ActionSummary[]): CombinationModel[] {
  const permanent = actions.filter((action) => action.category === 'permanent');
  const variable = actions.filter((action) => VARIABLE.includes(action.category));
  const accidental = actions.filter((action) => action.category === 'accidental');
  const winds = variable.filter((action) => action.category === 'wind' && !action.moving);
  const trains = variable.filter((action) => action.moving);
  const steady = variable.filter((action) => !action.moving && action.category !== 'wind');
  const withPermanent = (factor: number, others: [string, number][]): [string, number][] => [
    ...permanent.map((action): [string, number] => [action.id, factor]),
    ...others,
  ];
  const strength: [string, number][][] = [];
  const serviceability: [string, number][][] = [];
  if (permanent.length > 0) strength.push(withPermanent(1, []));
  if (permanent.length > 0 && variable.length === 0) serviceability.push(withPermanent(1, []));
  for (const action of variable) {
    strength.push(withPermanent(1, [[action.id, 1]]));
    serviceability.push(withPermanent(1, [[action.id, 1]]));
  }
  for (const set of choices(steady, [winds, trains])) {
    if (set.length < 2) continue;
    strength.push(withPermanent(1, set.map((action): [string, number] => [action.id, DEFAULT_COMBINATION_FACTORS.together])));
    serviceability.push(withPermanent(1, set.map((action): [string, number] => [action.id, 1])));
  }
  if (permanent.length > 0) {
    for (const action of winds) strength.push(withPermanent(DEFAULT_COMBINATION_FACTORS.permanentAgainstWind, [[action.id, 1]]));
  }
  const companion = (action: ActionSummary): [string, number] => [
    action.id,
    action.category === 'snow' ? DEFAULT_COMBINATION_FACTORS.snowWithAccidental : DEFAULT_COMBINATION_FACTORS.imposedWithAccidental,
  ];
  for (const action of accidental) {
    for (const set of choices(steady, [trains])) strength.push(withPermanent(1, [[action.id, 1], ...set.map(companion)]));
  }
  return [
    ...strength.map((factors, i) => combination('strength', i + 1, factors)),
    ...serviceability.map((factors, i) => combination('serviceability', i + 1, factors)),
  ];
}
