/** Builds a FailureCheck from its demand and capacity, keeping every number finite. */

import { EngineError } from '../engine-error.js';
import type { CheckQuantity, FailureCheck } from './check-outcome.js';
import type { FailureMode } from './failure-mode.js';

export interface FailureCheckSpec {
  readonly mode: FailureMode;
  readonly quantity: CheckQuantity;
  readonly demand: number;
  readonly capacity: number;
  readonly requiredSafetyFactor: number;
  readonly position: number | null;
  readonly location: string | null;
  readonly basis: string;
}

/**
 * safetyFactor = capacity / demand and utilization = demand * required / capacity; a zero demand gives
 * utilization 0, a null safety factor and no position or location, never a division by zero.
 */
export function failureCheck(spec: FailureCheckSpec): FailureCheck {
  const { mode, capacity, requiredSafetyFactor } = spec;
  if (!(capacity > 0) || !Number.isFinite(capacity)) {
    throw new EngineError('not-applicable', `The ${mode} check has no positive, finite capacity (${capacity}).`, [], {
      mode,
      capacity,
    });
  }
  if (!Number.isFinite(spec.demand) || !(requiredSafetyFactor > 0) || !Number.isFinite(requiredSafetyFactor)) {
    throw new EngineError('not-applicable', `The ${mode} check has no finite demand or required safety factor.`, [], {
      mode,
      demand: spec.demand,
      requiredSafetyFactor,
    });
  }
  const demand = Math.max(0, spec.demand);
  const safetyFactor = safetyRatio(capacity, demand);
  // Written out rather than spread from spec: in Node 20 `{ ...spec, more }` gives every result a new
  // hidden class (several microseconds a call, and garbage maps for the collector).
  const { quantity, basis } = spec;
  if (safetyFactor === null) {
    return {
      mode,
      quantity,
      demand: 0,
      capacity,
      requiredSafetyFactor,
      position: null,
      location: null,
      basis,
      safetyFactor: null,
      utilization: 0,
      passes: true,
    };
  }
  const utilization = (demand * requiredSafetyFactor) / capacity;
  return {
    mode,
    quantity,
    demand,
    capacity,
    requiredSafetyFactor,
    position: spec.position,
    location: spec.location,
    basis,
    safetyFactor,
    utilization,
    passes: utilization <= 1,
  };
}

/**
 * capacity / demand, or null when there is no demand: zero, or so small that the ratio overflows
 * (a subnormal residue, zero to every purpose).
 */
export function safetyRatio(capacity: number, demand: number): number | null {
  if (!(demand > 0)) return null;
  const ratio = capacity / demand;
  return Number.isFinite(ratio) ? ratio : null;
}
