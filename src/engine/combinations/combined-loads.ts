/** The loads of one combination: every load case scaled by its factor, and a train of axles placed at a position. */

import { POSITION_TOLERANCE } from '../analysis/tolerances.js';
import type { LinearIntensity, LoadModel, PointLoadModel } from '../member/model.js';
import type { CombinationModel, LoadCaseModel, MovingLoadModel } from './load-actions.js';

function scaled(pair: LinearIntensity, factor: number): LinearIntensity {
  return [pair[0] * factor, pair[1] * factor];
}

function scaledLoad(load: LoadModel, factor: number): LoadModel {
  if (factor === 1) return load;
  if (load.kind === 'point') {
    return { ...load, fx: load.fx * factor, fy: load.fy * factor, fz: load.fz * factor, mx: load.mx * factor, my: load.my * factor, mz: load.mz * factor };
  }
  return { ...load, qx: scaled(load.qx, factor), qy: scaled(load.qy, factor), qz: scaled(load.qz, factor), mx: scaled(load.mx, factor) };
}

/** Superposition: the fixed loads of a combination, each case's loads times its factor; a factor of 0 leaves the case out. */
export function combinedStaticLoads(cases: readonly LoadCaseModel[], combination: CombinationModel): LoadModel[] {
  const loads: LoadModel[] = [];
  for (const loadCase of cases) {
    const factor = combination.factors.get(loadCase.id) ?? 0;
    if (factor === 0) continue;
    for (const load of loadCase.loads) loads.push(scaledLoad(load, factor));
  }
  return loads;
}

/**
 * The axles of a train with its reference point at `position`, as point loads times `factor`. An axle
 * within POSITION_TOLERANCE x length of an end stands on it; one further off carries nothing.
 */
export function trainLoads(train: MovingLoadModel, position: number, factor: number, length: number): PointLoadModel[] {
  const tolerance = POSITION_TOLERANCE * length;
  const loads: PointLoadModel[] = [];
  for (const axle of train.axles) {
    const x = position + axle.offset;
    if (x < -tolerance || x > length + tolerance) continue;
    const at = Math.min(length, Math.max(0, x));
    loads.push({ kind: 'point', position: at, fx: 0, fy: axle.fy * factor, fz: axle.fz * factor, mx: 0, my: 0, mz: 0 });
  }
  return loads;
}
