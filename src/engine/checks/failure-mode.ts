/**
 * The failure modes the checks report. The order is the tie-break for the governing failure: when two
 * checks reach the same utilization, the one listed first wins, so a simpler mode (bending) is named
 * rather than a combined one that adds nothing to it (von Mises with no shear).
 */
export const FAILURE_MODES = [
  'tension',
  'tension-ultimate',
  'compression',
  'bending',
  'shear',
  'torsion',
  'buckling',
  'lateral-torsional-buckling',
  'combined',
  'beam-column',
  'eccentric-column',
  'deflection',
  'twist',
  'pin-shear',
  'pin-bearing',
  'pin-bending',
  'flexural-torsional-buckling',
  'local-buckling',
  'web-shear-buckling',
  'patch-loading',
  'fatigue',
] as const;

export type FailureMode = (typeof FAILURE_MODES)[number];

/** Position of a mode in the tie-break order (lower wins). */
export function failureModeRank(mode: FailureMode): number {
  return FAILURE_MODES.indexOf(mode);
}
