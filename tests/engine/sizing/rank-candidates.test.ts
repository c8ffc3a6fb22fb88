import { describe, expect, it } from 'vitest';
import { rankCandidates, type RankableCandidate } from '../../../src/engine/sizing/rank-candidates.js';

const candidate = (index: number, massPerLength: number, depth: number | undefined, utilization: number): RankableCandidate => ({
  index,
  massPerLength,
  depth,
  utilization,
  passes: utilization <= 1,
});

// Invented candidates: a heavy shallow one, a light deep one, a failing light one.
const candidates = [candidate(0, 30, 0.12, 0.7), candidate(1, 20, 0.2, 0.9), candidate(2, 10, 0.1, 1.4), candidate(3, 25, 0.16, 0.5), candidate(4, 12, 0.14, 1.1)];

describe('rankCandidates', () => {
  it('puts passing candidates first, lightest first by default', () => {
    expect(rankCandidates(candidates, 'lightest').map((c) => c.index)).toEqual([1, 3, 0, 4, 2]);
  });

  it('ranks by depth for the shallowest objective', () => {
    expect(rankCandidates(candidates, 'shallowest').map((c) => c.index)).toEqual([0, 3, 1, 4, 2]);
  });

  it('ranks by utilization for the least-utilization objective', () => {
    expect(rankCandidates(candidates, 'least-utilization').map((c) => c.index)).toEqual([3, 0, 1, 4, 2]);
  });

  it('orders failing candidates by how close they come to passing', () => {
    const failing = rankCandidates(candidates, 'lightest').filter((c) => !c.passes);
    expect(failing.map((c) => c.utilization)).toEqual([1.1, 1.4]);
  });

  it('breaks ties by mass, then by the order given', () => {
    const tied = [candidate(0, 20, 0.2, 0.5), candidate(1, 15, 0.2, 0.5), candidate(2, 15, 0.2, 0.5)];
    expect(rankCandidates(tied, 'shallowest').map((c) => c.index)).toEqual([1, 2, 0]);
  });

  it('ranks a candidate of unknown depth last among the passing ones when shallowest is asked', () => {
    const mixed = [candidate(0, 10, undefined, 0.5), candidate(1, 20, 0.3, 0.5)];
    expect(rankCandidates(mixed, 'shallowest').map((c) => c.index)).toEqual([1, 0]);
  });
});
