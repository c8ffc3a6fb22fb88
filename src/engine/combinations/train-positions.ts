/**
 * Where a moving load's reference point is placed in the search: an even grid from `from` to `to` no
 * coarser than `step`, plus every position that puts an axle on an end, support or hinge, and a hair to
 * either side of it: every response of the member has a breakpoint there as a function of the train
 * position, and reactions and shears peak there. Between them the search is refined by Brent's method
 * (see check-combinations.ts).
 */

import { POSITION_TOLERANCE } from '../analysis/tolerances.js';
import type { MovingLoadModel } from './load-actions.js';

/** How far either side of a node the one-sided positions lie, relative to the length (well above POSITION_TOLERANCE, so off the node). */
export const ONE_SIDED_OFFSET = 1e-7;

/** The number of grid intervals the range and step make: at least 1 unless the range is a single point. */
export function gridIntervals(train: Pick<MovingLoadModel, 'from' | 'to' | 'step'>): number {
  const span = train.to - train.from;
  if (!(span > 0)) return 0;
  return Math.max(1, Math.ceil(span / train.step - 1e-9));
}

export function trainPositions(train: MovingLoadModel, structuralNodes: readonly number[], length: number): number[] {
  const tolerance = POSITION_TOLERANCE * length;
  const intervals = gridIntervals(train);
  const positions: number[] = [];
  for (let k = 0; k <= intervals; k++) positions.push(k === intervals ? train.to : train.from + ((train.to - train.from) * k) / Math.max(1, intervals));
  // On the node, and a hair to either side: a shear or reaction next to a support peaks with the axle
  // just off it (on the support the axle's load goes straight into the reaction).
  const hair = ONE_SIDED_OFFSET * length;
  for (const axle of train.axles) {
    for (const node of structuralNodes) {
      for (const position of [node - axle.offset - hair, node - axle.offset, node - axle.offset + hair]) {
        if (position >= train.from - tolerance && position <= train.to + tolerance) positions.push(Math.min(train.to, Math.max(train.from, position)));
      }
    }
  }
  positions.sort((a, b) => a - b);
  const distinct: number[] = [];
  for (const position of positions) {
    if (distinct.length === 0 || position - (distinct[distinct.length - 1] as number) > tolerance) distinct.push(position);
  }
  return distinct;
}
