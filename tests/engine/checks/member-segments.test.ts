import { describe, expect, it } from 'vitest';
import { segmentsBetweenSupports } from '../../../src/engine/checks/member-segments.js';
import { FIXED, modelOf, PIN, ROLLER, support } from './fixtures/analyses.js';
import { steel } from './fixtures/materials.js';
import { rectangle } from './fixtures/sections.js';

const holdsUy = (s: { restraints: { uy: unknown } }) => s.restraints.uy !== 'free';
const model = (length: number, supports: Parameters<typeof modelOf>[1]) => modelOf(length, supports, rectangle(0.1, 0.2), steel);

describe('segmentsBetweenSupports', () => {
  it('cuts a continuous beam into spans and overhangs', () => {
    const segments = segmentsBetweenSupports(model(10, [support(1, PIN), support(5, ROLLER), support(9, ROLLER)]), holdsUy);
    expect(segments.map((s) => [s.kind, s.from, s.to])).toEqual([
      ['overhang', 0, 1],
      ['span', 1, 5],
      ['span', 5, 9],
      ['overhang', 9, 10],
    ]);
    expect(segments[0]?.supports).toHaveLength(1);
    expect(segments[1]?.supports).toHaveLength(2);
  });

  it('makes a cantilever one overhang and merges supports at one position', () => {
    expect(segmentsBetweenSupports(model(3, [support(0, FIXED)]), holdsUy).map((s) => s.kind)).toEqual(['overhang']);
    const doubled = segmentsBetweenSupports(model(3, [support(0, PIN), support(0, ['rz']), support(3, ROLLER)]), holdsUy);
    expect(doubled.map((s) => [s.kind, s.from, s.to])).toEqual([['span', 0, 3]]);
  });

  it('treats a member without such supports as one span', () => {
    expect(segmentsBetweenSupports(model(3, [support(0, ['ux'])]), holdsUy)).toEqual([{ from: 0, to: 3, kind: 'span', supports: [] }]);
  });
});
