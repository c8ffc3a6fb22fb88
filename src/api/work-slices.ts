/**
 * Long work done in slices, the event loop let in between: a batch of a thousand checks takes most of
 * a second, and done in one stretch it would hold back the health probes and every other request, and
 * leave the overload monitor (src/api/overload.ts) a loop that looked stalled, so that the next request
 * was shed.
 */

import { setImmediate as nextTurn } from 'node:timers/promises';

/** Work done before other requests are let in, ms: well under the overload threshold's sample. */
export const SLICE_MS = 20;

export interface SlicedResults<R> {
  readonly results: R[];
  /** Time spent in `work` alone, s (the turns given away are not counted). */
  readonly computeSeconds: number;
}

/** `work` over `items` in order, yielding to the event loop after each SLICE_MS of it. */
export async function checkInSlices<T, R>(
  items: readonly T[],
  work: (item: T, index: number) => R,
  clock: () => number = () => performance.now(),
  yieldTurn: () => Promise<unknown> = nextTurn,
): Promise<SlicedResults<R>> {
  const results: R[] = [];
  let computeMs = 0;
  let sliceStart = clock();
  for (let index = 0; index < items.length; index++) {
    results.push(work(items[index] as T, index));
    const now = clock();
    if (now - sliceStart >= SLICE_MS && index < items.length - 1) {
      computeMs += now - sliceStart;
      await yieldTurn();
      sliceStart = clock();
    }
  }
  computeMs += clock() - sliceStart;
  return { results, computeSeconds: computeMs / 1000 };
}
