/**
 * Errors the engine raises for input that is well formed but cannot be analysed as given.
 * The engine knows nothing of HTTP: the API layer maps each kind to its problem type.
 */

export type EngineErrorKind =
  /** The member can move without deforming in some direction (a mechanism). */
  | 'unstable-member'
  /** A load, support or hinge lies outside [0, length], or a range is empty. */
  | 'outside-member'
  /** Geometry that no real section can have (a wall at least half the outer size, ...). */
  | 'impossible-geometry'
  /** A check or option does not apply to the given member (for example no candidate passes). */
  | 'not-applicable';

/** Where in the input the trouble lies: a path of property names and array indices. */
export type InputPath = readonly (string | number)[];

export class EngineError extends Error {
  override readonly name = 'EngineError';

  constructor(
    readonly kind: EngineErrorKind,
    message: string,
    readonly path: InputPath = [],
    readonly details: Readonly<Record<string, unknown>> = {},
  ) {
    super(message);
  }
}
