import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { analyseMember } from '../../../src/engine/analysis/analyse-member.js';
import { fieldExtremes } from '../../../src/engine/analysis/field-extremes.js';
import { evaluatePolynomial } from '../../../src/engine/analysis/polynomial.js';
import { DIAGRAM_FIELDS, type DiagramField, type MemberPiece, type Polynomial } from '../../../src/engine/analysis/result.js';
import { distributedLoad, memberModel, pinnedAt, pointLoad, rollerAt } from '../member/model-builders.js';

/** Pieces where every field but `field` is zero. */
function pieces(field: DiagramField, parts: readonly { start: number; end: number; p: Polynomial }[]): MemberPiece[] {
  return parts.map(({ start, end, p }) => {
    const fields = Object.fromEntries(DIAGRAM_FIELDS.map((f) => [f, f === field ? p : [0]])) as Record<DiagramField, Polynomial>;
    return { start, end, fields };
  });
}

describe('fieldExtremes', () => {
  it('reports a field that is zero on every piece as 0 at the start of the member, as the search finds it', () => {
    // Zeros of either sign evaluate to +0 everywhere: every candidate ties, and the first is at x = 0.5.
    const e = fieldExtremes(pieces('momentZ', [{ start: 0.5, end: 1, p: [0, -0, 0, -0] }, { start: 1, end: 2, p: [-0] }]));
    expect(e.momentZ).toEqual({ max: { value: 0, position: 0.5 }, min: { value: 0, position: 0.5 } });
    expect(Object.is(e.momentZ.max.value, 0) && Object.is(e.twist.min.value, 0)).toBe(true);
  });

  it('finds an interior maximum at the root of the derivative, not at a node', () => {
    // p = s (1 - s): p' = 1 - 2s vanishes at 1/2, where p = 1/4.
    const e = fieldExtremes(pieces('momentZ', [{ start: 0, end: 1, p: [0, 1, -1] }]));
    expect(e.momentZ.max).toEqual({ value: 0.25, position: 0.5 });
    // The minimum 0 is reached at both ends: the first position wins.
    expect(e.momentZ.min).toEqual({ value: 0, position: 0 });
  });

  it('reports the value on each side of a node and the first of equal extremes', () => {
    // Piece 1 ends at 2 (value 2 just left of x = 1), piece 2 starts at -1 and rises to 2 again.
    const e = fieldExtremes(
      pieces('shearY', [
        { start: 0, end: 1, p: [0, 2] },
        { start: 1, end: 2, p: [-1, 3] },
      ]),
    );
    expect(e.shearY.max).toEqual({ value: 2, position: 1 });
    expect(e.shearY.min).toEqual({ value: -1, position: 1 });
  });

  it('reports values at or below 1e-12 of the largest magnitude as exactly 0, never -0', () => {
    const e = fieldExtremes(pieces('deflectionY', [{ start: 0, end: 1, p: [-1e-15, -1] }]));
    expect(Object.is(e.deflectionY.max.value, 0)).toBe(true);
    expect(e.deflectionY.max.position).toBe(0);
    expect(e.deflectionY.min).toEqual({ value: -1 - 1e-15, position: 1 });
    const zero = fieldExtremes(pieces('twist', [{ start: 0, end: 1, p: [-0] }]));
    expect(Object.is(zero.twist.max.value, 0) && Object.is(zero.twist.min.value, 0)).toBe(true);
  });

  it('is never beaten by a dense sampling of random piecewise polynomials', () => {
    // 0 or 1e-3 to 10 of either sign: no subnormal numbers.
    const coefficient = fc.oneof(
      fc.constant(0),
      fc.tuple(fc.boolean(), fc.double({ min: 1e-3, max: 10, noNaN: true })).map(([negative, v]) => (negative ? -v : v)),
    );
    const piece = fc.record({
      length: fc.double({ min: 0.1, max: 3, noNaN: true }),
      p: fc.array(coefficient, { minLength: 1, maxLength: 6 }),
    });
    fc.assert(
      fc.property(fc.array(piece, { minLength: 1, maxLength: 4 }), (parts) => {
        let start = 0;
        const built = parts.map(({ length, p }) => {
          const part = { start, end: start + length, p };
          start += length;
          return part;
        });
        const e = fieldExtremes(pieces('slopeZ', built)).slopeZ;
        let sampledMax = Number.NEGATIVE_INFINITY;
        let sampledMin = Number.POSITIVE_INFINITY;
        for (const part of built) {
          for (let k = 0; k <= 400; k++) {
            const v = evaluatePolynomial(part.p, ((part.end - part.start) * k) / 400);
            sampledMax = Math.max(sampledMax, v);
            sampledMin = Math.min(sampledMin, v);
          }
        }
        const scale = Math.max(Math.abs(sampledMax), Math.abs(sampledMin));
        expect(e.max.value).toBeGreaterThanOrEqual(sampledMax - 1e-9 * scale);
        expect(e.min.value).toBeLessThanOrEqual(sampledMin + 1e-9 * scale);
        // And each reported extreme is a value the field takes at its position (on one side of a node).
        const valuesAt = (x: number) =>
          built.filter((b) => x >= b.start && x <= b.end).map((b) => evaluatePolynomial(b.p, x - b.start));
        for (const extreme of [e.max, e.min]) {
          const closest = Math.min(...valuesAt(extreme.position).map((v) => Math.abs(v - extreme.value)));
          expect(closest).toBeLessThanOrEqual(1e-9 * scale);
        }
      }),
      { numRuns: 200 },
    );
  });

  it('gives the analytic maximum of a member, e.g. P L / 4 under a central load', () => {
    // AISC Manual Table 3-23 case 7 (from memory): simple span, central load, M = PL/4 under the load.
    const a = analyseMember(memberModel(4, [pinnedAt(0), rollerAt(4)], [pointLoad(2, { fy: -1000 })]));
    expect(a.extremes.momentZ.max.value).toBeCloseTo(1000, 9);
    expect(a.extremes.momentZ.max.position).toBe(2);
    // A partial load's maximum sits inside a piece: uniform w on [0, 2] of a 4 m span gives
    // R_A = 3w/2 and the maximum moment R_A^2/(2w) = 9w/8 at x = R_A / w = 1.5 (statics).
    const b = analyseMember(memberModel(4, [pinnedAt(0), rollerAt(4)], [distributedLoad(0, 2, { qy: -1000 })]));
    expect(b.extremes.momentZ.max.value).toBeCloseTo(1125, 9);
    expect(b.extremes.momentZ.max.position).toBeCloseTo(1.5, 12);
  });
});
