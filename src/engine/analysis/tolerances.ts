/**
 * The analysis tolerances. Each is a fraction of a scale of the problem (member length, diagonal
 * stiffness, a field's largest magnitude), never an absolute number.
 */

/**
 * Ends, supports and hinges closer than this fraction of the member length are one node, and a
 * position this far outside [0, length] still counts as inside. Keeping structural nodes apart by
 * at least this much bounds the stiffness contrast of the elements between them.
 */
export const POSITION_TOLERANCE = 1e-9;

/**
 * A load position within this fraction of the length of another node shares it (rounding noise of
 * unit conversion is about 1e-15). Kept far below POSITION_TOLERANCE because moving a load changes
 * the result: the shift is at most 1e-12 x length, so a load of length l moves by 1e-12 L / l of itself.
 */
export const LOAD_POSITION_TOLERANCE = 1e-12;

/**
 * A pivot at or below this fraction of its degree of freedom's own diagonal stiffness marks a
 * mechanism. The rounding error of an LDL^T pivot is a few machine epsilons of that diagonal (the
 * terms subtracted from it never exceed it in a positive semi-definite matrix), so a pivot that is
 * zero in exact arithmetic lands near 1e-15 of it; a real pivot this small would leave fewer than
 * about six significant digits of stiffness in that direction.
 */
export const PIVOT_TOLERANCE = 1e-10;

/** A reported value at or below this fraction of its scale is rounding noise and reported as 0. */
export const ZERO_TOLERANCE = 1e-12;

/** A change across a node at or below this fraction of the field's largest magnitude is no jump. */
export const JUMP_TOLERANCE = 1e-9;

/** The same number with -0 turned into 0. */
export function withoutNegativeZero(value: number): number {
  return value === 0 ? 0 : value;
}

/** 0 where |value| <= ZERO_TOLERANCE x scale, else the value (never -0). */
export function roundedToZero(value: number, scale: number): number {
  return Math.abs(value) <= ZERO_TOLERANCE * scale ? 0 : value;
}
