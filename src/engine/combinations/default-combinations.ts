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
 *   G + 0.75 (Q1 + Q2 ...)  every variable action together, when there are two or more
 *                           (one such combination per moving load: a combination moves one train)
 *   0.6 G + W               each wind action against reduced permanent actions (uplift, overturning)
 *   G + A                   each accidental action in turn
 * Serviceability (unfactored):
 *   G                       when there is no variable action
 *   G + Q                   each variable action in turn
 *   G + Q1 + Q2 ...         every variable action together, when there are two or more (one per moving load)
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

/** Every variable action together: the fixed ones with each moving load in turn, or the fixed ones alone. */
function togetherSets(variable: readonly ActionSummary[]): ActionSummary[][] {
  const fixed = variable.filter((action) => !action.moving);
  const moving = variable.filter((action) => action.moving);
  if (moving.length === 0) return [fixed];
  return moving.map((train) => [...fixed, train]);
}

export function defaultCombinations(actions: readonly ActionSummary[]): CombinationModel[] {
  const permanent = actions.filter((action) => action.category === 'permanent');
  const variable = actions.filter((action) => VARIABLE.includes(action.category));
  const accidental = actions.filter((action) => action.category === 'accidental');
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
  if (variable.length >= 2) {
    for (const set of togetherSets(variable)) {
      if (set.length < 2) continue;
      strength.push(withPermanent(1, set.map((action): [string, number] => [action.id, DEFAULT_COMBINATION_FACTORS.together])));
      serviceability.push(withPermanent(1, set.map((action): [string, number] => [action.id, 1])));
    }
  }
  if (permanent.length > 0) {
    for (const action of variable.filter((candidate) => candidate.category === 'wind')) {
      strength.push(withPermanent(DEFAULT_COMBINATION_FACTORS.permanentAgainstWind, [[action.id, 1]]));
    }
  }
  for (const action of accidental) strength.push(withPermanent(1, [[action.id, 1]]));
  return [
    ...strength.map((factors, i) => combination('strength', i + 1, factors)),
    ...serviceability.map((factors, i) => combination('serviceability', i + 1, factors)),
  ];
}
