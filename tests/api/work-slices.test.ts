import { describe, expect, it } from 'vitest';
import { checkInSlices, SLICE_MS } from '../../src/api/work-slices.js';

describe('checkInSlices', () => {
  it('gives the event loop a turn after each slice of work, and counts only the work', async () => {
    // A clock that the work moves on by 7 ms an item: with 20 ms slices a turn comes after every third item.
    let now = 0;
    const turns: number[] = [];
    const done: number[] = [];
    const sliced = await checkInSlices(
      [10, 20, 30, 40, 50, 60, 70],
      (item, index) => {
        now += 7;
        done.push(index);
        return item * 2;
      },
      () => now,
      async () => {
        turns.push(done.length);
        now += 1000;
      },
    );
    expect(SLICE_MS).toBe(20);
    expect(sliced.results).toEqual([20, 40, 60, 80, 100, 120, 140]);
    expect(turns).toEqual([3, 6]);
    expect(sliced.computeSeconds).toBeCloseTo((7 * 7) / 1000, 12);
  });

  it('never yields after the last item, nor for quick work', async () => {
    let turns = 0;
    const sliced = await checkInSlices([1, 2, 3], (item) => item, () => 0, async () => void turns++);
    expect(sliced.results).toEqual([1, 2, 3]);
    expect(turns).toBe(0);
  });

  it('lets another task run while a long batch is worked through', async () => {
    const order: string[] = [];
    const slow = (item: number) => {
      const until = performance.now() + 2 * SLICE_MS;
      while (performance.now() < until);
      order.push(`item ${item}`);
      return item;
    };
    const batch = checkInSlices([1, 2, 3], slow);
    setImmediate(() => order.push('other'));
    await batch;
    expect(order.indexOf('other')).toBeGreaterThan(0);
    expect(order.indexOf('other')).toBeLessThan(3);
  });
});
