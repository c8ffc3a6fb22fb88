/** Building blocks of the benchmark members, in SI: supports as the presets define them, and loads. */

import type { Direction, LoadModel, Restraint, SupportModel } from '../src/engine/member/model.js';

function support(position: number, rigid: readonly Direction[]): SupportModel {
  const restraints: Record<Direction, Restraint> = { ux: 'free', uy: 'free', uz: 'free', rx: 'free', ry: 'free', rz: 'free' };
  for (const direction of rigid) restraints[direction] = 'rigid';
  return { position, restraints };
}

/** The request presets: pinned holds ux, uy, uz, rx; roller uy, uz, rx; fixed all six. */
export const pinned = (position: number) => support(position, ['ux', 'uy', 'uz', 'rx']);
export const roller = (position: number) => support(position, ['uy', 'uz', 'rx']);
export const fixed = (position: number) => support(position, ['ux', 'uy', 'uz', 'rx', 'ry', 'rz']);

export const point = (position: number, forces: Partial<Record<'fx' | 'fy' | 'fz' | 'mx' | 'my' | 'mz', number>>): LoadModel => ({
  kind: 'point',
  position,
  fx: 0,
  fy: 0,
  fz: 0,
  mx: 0,
  my: 0,
  mz: 0,
  ...forces,
});

/** A uniform load along y over [from, to]. */
export const uniform = (from: number, to: number, qy: number): LoadModel => ({
  kind: 'distributed',
  from,
  to,
  qx: [0, 0],
  qy: [qy, qy],
  qz: [0, 0],
  mx: [0, 0],
});
