import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { derivative, realRootsIn } from '../../../src/engine/analysis/polynomial.js';
import type { Polynomial } from '../../../src/engine/analysis/result.js';
import {
  criticalCoordinates,
  largestMagnitudeOn,
  peakOf,
  scanMember,
  stressMeasurePolynomials,
} from '../../../src/engine/checks/critical-positions.js';
import { analysisFrom } from './fixtures/analyses.js';
import { iSection, rectangle, round, tee } from './fixtures/sections.js';

describe('criticalCoordinates', () => {
  it('holds the piece ends and the interior roots of each derivative', () => {
    // Mz = 10 s - s^2 on [0, 8] peaks at s = 5; (s - 2)^3 has a flat point at s = 2.
    const [piece] = analysisFrom(8, [{ start: 0, end: 8, fields: {} }]).pieces;
    const coordinates = criticalCoordinates(piece!, [
      [0, 10, -1],
      [-8, 12, -6, 1],
    ]);
    expect(coordinates[0]).toBe(0);
    expect(coordinates[coordinates.length - 1]).toBe(8);
    expect(coordinates.some((s) => Math.abs(s - 5) < 1e-12)).toBe(true);
    expect(coordinates.some((s) => Math.abs(s - 2) < 1e-6)).toBe(true);
  });

  it('solves a repeated derivative once: p and p + 7 have the same critical coordinates as p alone', () => {
    const [piece] = analysisFrom(8, [{ start: 0, end: 8, fields: {} }]).pieces;
    const p = [0, 10, -1];
    expect(criticalCoordinates(piece!, [p, [7, 10, -1], [3]])).toStrictEqual(criticalCoordinates(piece!, [p]));
  });

  it('gives the coordinates of solving every derivative, repeated or constant (property)', () => {
    // The reference solves each derivative, sorts, and drops a coordinate within 1e-12 L of the one before.
    const reference = (length: number, polynomials: readonly Polynomial[]) => {
      const all = [0, length, ...polynomials.flatMap((p) => realRootsIn(derivative(p), 0, length))].sort((a, b) => a - b);
      return all.filter((s, i) => i === 0 || s - (all[i - 1] as number) > 1e-12 * length);
    };
    const polynomial = fc.array(fc.double({ min: -1e3, max: 1e3, noNaN: true }), { minLength: 1, maxLength: 5 });
    fc.assert(
      fc.property(fc.array(polynomial, { maxLength: 6 }), fc.double({ min: 0.1, max: 10, noNaN: true }), (distinct, length) => {
        const polynomials = [...distinct, ...distinct.map((p) => [-(p[0] as number), ...p.slice(1)])];
        const [piece] = analysisFrom(length, [{ start: 0, end: length, fields: {} }]).pieces;
        expect(criticalCoordinates(piece!, polynomials)).toStrictEqual(reference(length, polynomials));
      }),
      { numRuns: 300 },
    );
  });
});

describe('scanMember', () => {
  it('gives each piece the critical coordinates of its stress measure polynomials (property)', () => {
    // The scan forms the measures in reused buffers; the plain path makes every polynomial anew.
    const coefficient = fc.oneof(fc.constantFrom(0, -0, 1, -1), fc.double({ min: -1e6, max: 1e6, noNaN: true }));
    const field = fc.array(coefficient, { minLength: 1, maxLength: 4 });
    const forces = fc.record({ axial: field, shearY: field, shearZ: field, momentZ: field, momentY: field, torque: field });
    const sections = [rectangle(0.05, 0.15), round(0.04), iSection(0.2, 0.1, 0.0056, 0.0085), tee()];
    fc.assert(
      fc.property(fc.array(forces, { minLength: 1, maxLength: 3 }), fc.constantFrom(...sections), (fields, section) => {
        const analysis = analysisFrom(
          fields.length,
          fields.map((pieceFields, i) => ({ start: i, end: i + 1, fields: pieceFields })),
        );
        const scan = scanMember(analysis, section);
        analysis.pieces.forEach((piece, i) => {
          const expected = criticalCoordinates(piece, stressMeasurePolynomials(piece, section));
          const found = scan.coordinates[i] as readonly number[];
          expect(found.length).toBe(expected.length);
          found.forEach((s, k) => expect(Object.is(s, expected[k])).toBe(true));
        });
      }),
      { numRuns: 500 },
    );
  });
});

describe('peakOf', () => {
  it('reads both sides of a node, each with its own piece', () => {
    // Mz = 10 x - x^2 on [0, 4] reaches 24 at x = 4-; a concentrated couple lifts it to 30 at x = 4+.
    const analysis = analysisFrom(6, [
      { start: 0, end: 4, fields: { momentZ: [0, 10, -1] } },
      { start: 4, end: 6, fields: { momentZ: [30, -15] } },
    ]);
    const scan = scanMember(analysis, rectangle(0.1, 0.2));
    const peak = peakOf(scan, (forces) => ({ value: Math.abs(forces.momentZ), location: null }));
    expect(peak).toEqual({ value: 30, position: 4, location: null });
    const leftSide = peakOf(scan, (forces) => ({ value: forces.momentZ < 25 ? forces.momentZ : 0, location: null }));
    expect(leftSide).toEqual({ value: 24, position: 4, location: null });
  });

  it('finds an interior extreme of a field exactly', () => {
    // Mz = 10 x - x^2 on [0, 8]: largest 25 at x = 5 (dMz/dx = 10 - 2 x = 0).
    const analysis = analysisFrom(8, [{ start: 0, end: 8, fields: { momentZ: [0, 10, -1] } }]);
    const peak = peakOf(scanMember(analysis, rectangle(0.1, 0.2)), (forces) => ({ value: forces.momentZ, location: null }));
    expect(peak.value).toBeCloseTo(25, 12);
    expect(peak.position).toBeCloseTo(5, 12);
  });

  it('returns value 0 with no position for a measure that is zero everywhere', () => {
    const analysis = analysisFrom(3, [{ start: 0, end: 3, fields: {} }]);
    const peak = peakOf(scanMember(analysis, rectangle(0.1, 0.2)), () => ({ value: 0, location: 'x' }));
    expect(peak).toEqual({ value: 0, position: null, location: null });
  });

  it('finds the peak of a non-polynomial measure by golden section between the critical positions', () => {
    // Mz = x on [0, 2]; g(Mz) = 1.5 Mz - Mz^2 + 0.1 sqrt(1 + Mz^2) is no polynomial and no field has an
    // extreme inside, so only the search finds its peak: g' = 1.5 - 2 x + 0.1 x / sqrt(1 + x^2) = 0 at
    // x = 0.780770 (by Newton's method: g'(0.780770) = 1.5 - 1.561540 + 0.061540 = 0).
    const analysis = analysisFrom(2, [{ start: 0, end: 2, fields: { momentZ: [0, 1] } }]);
    const scan = scanMember(analysis, round(0.05));
    const g = (x: number) => 1.5 * x - x * x + 0.1 * Math.sqrt(1 + x * x);
    const measure = (forces: { momentZ: number }) => ({ value: g(forces.momentZ), location: null });
    const peak = peakOf(scan, measure, { refine: true });
    expect(peak.position).toBeCloseTo(0.78077, 5);
    expect(peak.value).toBeCloseTo(g(0.78077), 9);
    expect(peakOf(scan, measure).value).toBeLessThan(peak.value);
  });
});

describe('largestMagnitudeOn', () => {
  it('finds the largest |field| inside a range only', () => {
    // deflection -x (4 - x) on [0, 4] peaks at x = 2 (value 4); on [0, 1] the largest is 3 at x = 1.
    const analysis = analysisFrom(4, [{ start: 0, end: 4, fields: { deflectionY: [0, -4, 1] } }]);
    expect(largestMagnitudeOn(analysis, 'deflectionY', 0, 4)).toEqual({ value: 4, position: 2 });
    expect(largestMagnitudeOn(analysis, 'deflectionY', 0, 1)).toEqual({ value: 3, position: 1 });
    expect(largestMagnitudeOn(analysis, 'twist', 0, 4)).toEqual({ value: 0, position: null });
  });
});
