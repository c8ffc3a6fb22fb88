import { describe, expect, it } from 'vitest';
import { gridIntervals, trainPositions } from '../../../src/engine/combinations/train-positions.js';
import { envelopePositions } from '../../../src/engine/combinations/diagram-envelope.js';

const train = { id: 't', category: 'imposed' as const, axles: [{ offset: 0, fy: -1, fz: 0 }, { offset: 0.5, fy: -1, fz: 0 }], from: 0, to: 2.5, step: 1 };

describe('trainPositions', () => {
  it('lays a grid no coarser than the step and adds every position that puts an axle on a node, and a hair either side', () => {
    expect(gridIntervals(train)).toBe(3);
    // Grid 0, 0.8333, 1.6667, 2.5; axle 1 on the support at 1.2 -> 1.2, axle 2 on it -> 0.7; axle 1 on
    // the start -> 0, axle 2 on the end 3 -> 2.5; each +-1e-7 x 3 m where it stays in the travel.
    const hair = 3e-7;
    const expected = [0, hair, 0.7 - hair, 0.7, 0.7 + hair, 2.5 / 3, 1.2 - hair, 1.2, 1.2 + hair, 5 / 3, 2.5 - hair, 2.5];
    const found = trainPositions(train, [0, 1.2, 3], 3);
    expect(found.length).toBe(expected.length);
    found.forEach((p, i) => expect(p).toBeCloseTo(expected[i] as number, 12));
  });
  it('is one position when the travel is a single point', () => {
    expect(trainPositions({ ...train, to: 0 }, [0, 3], 3)).toEqual([0]);
  });
});

describe('envelopePositions', () => {
  it('lists the samples and every fixed node, an interior node twice (left, then right)', () => {
    const positions = envelopePositions(4, 3, [0, 1, 4]);
    expect(positions.x).toEqual([0, 1, 1, 2, 4]);
    expect(positions.sides).toEqual(['right', 'left', 'right', 'right', 'left']);
  });
});
