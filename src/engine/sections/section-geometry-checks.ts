/**
 * Checks that a shape's dimensions describe a section that can exist. A failed check throws
 * EngineError('impossible-geometry') with the path ['section', field] of the offending dimension.
 */

import { EngineError } from '../engine-error.js';

export function impossibleGeometry(
  field: string,
  message: string,
  details: Readonly<Record<string, unknown>> = {},
): EngineError {
  return new EngineError('impossible-geometry', message, ['section', field], details);
}

/** A length, area or second moment that must be finite and greater than zero. */
export function requirePositive(value: number, field: string): void {
  if (!Number.isFinite(value) || value <= 0) {
    throw impossibleGeometry(field, `${field} must be a finite number greater than zero (got ${value}).`, { value });
  }
}

/** A radius or constant that may be zero but not negative; absent counts as zero. */
export function requireNonNegative(value: number | undefined, field: string): number {
  const given = value ?? 0;
  if (!Number.isFinite(given) || given < 0) {
    throw impossibleGeometry(field, `${field} must be a finite number of at least zero (got ${given}).`, { value: given });
  }
  return given;
}

/** value < limit, strictly: the named field is the one at fault when it fails. */
export function requireBelow(value: number, limit: number, field: string, what: string): void {
  if (!(value < limit)) {
    throw impossibleGeometry(field, `${field} (${value}) must be less than ${what} (${limit}).`, { value, limit });
  }
}

/** value <= limit: for radii that may just reach the edge they run to (rounding in the last bits allowed). */
export function requireAtMost(value: number, limit: number, field: string, what: string): void {
  if (!(value <= limit * (1 + 1e-12))) {
    throw impossibleGeometry(field, `${field} (${value}) must not exceed ${what} (${limit}).`, { value, limit });
  }
}

/** The plates of an I, channel or tee: each dimension positive; returns the root radius (0 if absent). */
export function requireFlangedDimensions(dimensions: {
  readonly depth: number;
  readonly flangeWidth: number;
  readonly webThickness: number;
  readonly flangeThickness: number;
  readonly rootRadius?: number;
}): number {
  requirePositive(dimensions.depth, 'depth');
  requirePositive(dimensions.flangeWidth, 'flangeWidth');
  requirePositive(dimensions.webThickness, 'webThickness');
  requirePositive(dimensions.flangeThickness, 'flangeThickness');
  return requireNonNegative(dimensions.rootRadius, 'rootRadius');
}
