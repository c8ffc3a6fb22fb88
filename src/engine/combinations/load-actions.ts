/**
 * The actions a member carries and how they are combined: load cases (fixed loads of one origin),
 * moving loads (a train of axles of fixed spacing that travels along the member) and combinations
 * (a factor for each action, for strength or for serviceability). SI units: m, N.
 */

import type { LoadModel } from '../member/model.js';

/** Where an action comes from; it decides its factors in the default combinations. */
export const ACTION_CATEGORIES = ['permanent', 'imposed', 'snow', 'wind', 'accidental', 'other'] as const;
export type ActionCategory = (typeof ACTION_CATEGORIES)[number];

export interface LoadCaseModel {
  readonly id: string;
  readonly category: ActionCategory;
  readonly loads: readonly LoadModel[];
}

/** One axle of a train: its offset from the train's reference point, m, and its forces, N. */
export interface AxleModel {
  readonly offset: number;
  readonly fy: number;
  readonly fz: number;
}

/**
 * A train of axles whose reference point travels from `from` to `to` (m, positions of the reference
 * point along the member) in steps of at most `step`. An axle that stands off the member carries nothing.
 */
export interface MovingLoadModel {
  readonly id: string;
  readonly category: ActionCategory;
  readonly axles: readonly AxleModel[];
  readonly from: number;
  readonly to: number;
  readonly step: number;
}

/** Strength combinations are checked against every strength and stability mode, serviceability ones against deflection and twist. */
export type CombinationPurpose = 'strength' | 'serviceability';

export interface CombinationModel {
  readonly id: string;
  readonly purpose: CombinationPurpose;
  /** Factor by action id (a load case or a moving load); an action not named is left out. */
  readonly factors: ReadonlyMap<string, number>;
  readonly description: string;
}
