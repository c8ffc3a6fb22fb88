import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { analyseMember } from '../../../src/engine/analysis/analyse-member.js';
import { evaluatePolynomial } from '../../../src/engine/analysis/polynomial.js';
import { DIAGRAM_FIELDS } from '../../../src/engine/analysis/result.js';
import { trainLoads } from '../../../src/engine/combinations/combined-loads.js';
import { shiftedPolynomial, superposedFieldExtremes } from '../../../src/engine/combinations/superposition.js';
import { distributedLoad, memberModel, pinnedAt, pointLoad, rollerAt } from '../member/model-builders.js';

describe('shiftedPolynomial', () => {
  it('gives the coefficients of p(s + d): 1 + 2 s + 3 s^2 at s + 2 is 17 + 14 s + 3 s^2', () => {
    expect(shiftedPolynomial([1, 2, 3], 2)).toEqual([17, 14, 3]);
  });
});

describe('superposedFieldExtremes', () => {
  it('equals the extremes of the member analysed with the fixed loads and the factored train together (property)', () => {
    // A two-bay platform beam of an invented maker: a uniform load and a point load fixed, a two-axle cart moving.
    const fixedLoads = [distributedLoad(0, 6, { qy: -1500, qz: 200 }), pointLoad(2.2, { fy: -4000 })];
    const supports = [pinnedAt(0), rollerAt(3.5), rollerAt(6)];
    const fixed = analyseMember(memberModel(6, supports, fixedLoads));
    fc.assert(
      fc.property(fc.double({ min: -0.8, max: 6, noNaN: true }), fc.double({ min: -2, max: 2, noNaN: true }), (p, factor) => {
        const train = { id: 'cart', category: 'imposed' as const, axles: [{ offset: 0, fy: -3000, fz: 150 }, { offset: 0.8, fy: -3000, fz: 150 }], from: -0.8, to: 6, step: 0.1 };
        const alone = analyseMember(memberModel(6, supports, trainLoads(train, p, 1, 6)));
        const together = analyseMember(memberModel(6, supports, [...fixedLoads, ...trainLoads(train, p, factor, 6)]));
        for (const field of DIAGRAM_FIELDS) {
          const superposed = superposedFieldExtremes(fixed, alone, factor, field);
          const exact = together.extremes[field];
          const scale = Math.max(1e-12, Math.abs(exact.max.value), Math.abs(exact.min.value));
          expect(Math.abs(superposed.max.value - exact.max.value)).toBeLessThanOrEqual(1e-9 * scale);
          expect(Math.abs(superposed.min.value - exact.min.value)).toBeLessThanOrEqual(1e-9 * scale);
          // The position found holds the value, on one side or the other where the diagram jumps.
          const x = superposed.max.position;
          const sides = together.pieces.filter((candidate) => x >= candidate.start && x <= candidate.end).map((piece) => evaluatePolynomial(piece.fields[field], x - piece.start));
          expect(Math.min(...sides.map((value) => Math.abs(value - exact.max.value)))).toBeLessThanOrEqual(1e-6 * scale);
        }
      }),
      { numRuns: 40 },
    );
  });
});

