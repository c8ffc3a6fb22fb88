import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { evaluatePolynomial } from '../../../src/engine/analysis/polynomial.js';
import type { Polynomial } from '../../../src/engine/analysis/result.js';
import {
  equivalentStressBound,
  modifiedMohrBoundFactor,
  polynomialMagnitudeBound,
} from '../../../src/engine/checks/equivalent-stress-bound.js';
import { equivalentStressAt } from '../../../src/engine/checks/equivalent-stress.js';
import { sectionForcesOnPiece } from '../../../src/engine/checks/section-forces.js';
import { sectionStressFactors } from '../../../src/engine/checks/section-stress-factors.js';
import type { Material } from '../../../src/engine/materials/material.js';
import type { SectionProperties } from '../../../src/engine/sections/section-properties.js';
import { analysisFrom } from './fixtures/analyses.js';
import { castIron, steel } from './fixtures/materials.js';
import { iSection, rectangle, round, tee } from './fixtures/sections.js';

const coefficient = fc.double({ min: -1e6, max: 1e6, noNaN: true });
const polynomial: fc.Arbitrary<Polynomial> = fc.array(coefficient, { minLength: 1, maxLength: 5 });
/** A stretch [a, b] of a 3 m piece and a point t in it, as fractions. */
const stretch = fc.tuple(fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: 0, max: 1, noNaN: true }));
const within = ([u, v, w]: [number, number, number]) => {
  const a = 3 * Math.min(u, v);
  const b = 3 * Math.max(u, v);
  return { a, b, t: a + (b - a) * w };
};

describe('polynomialMagnitudeBound', () => {
  it('is the Taylor bound about the middle: 1 + 2s - s^2 on [0, 2] is 2 - (s - 1)^2, at most 2 + 1 = 3 (plus the allowance)', () => {
    // About s = 1 with r = 1: |2| + 0 r + |-1| r^2 = 3; the allowance adds 1e-10 (1 + 2*2 + 4) = 9e-10.
    expect(polynomialMagnitudeBound([1, 2, -1], 0, 2)).toBeCloseTo(3 + 9e-10, 15);
    // A constant is bounded by itself (and its allowance).
    expect(polynomialMagnitudeBound([-5], 0, 2)).toBeCloseTo(5 * (1 + 1e-10), 15);
  });

  it('is at least |p(t)| anywhere in the stretch (property)', () => {
    fc.assert(
      fc.property(polynomial, stretch, (p, fractions) => {
        const { a, b, t } = within(fractions);
        expect(polynomialMagnitudeBound(p, a, b)).toBeGreaterThanOrEqual(Math.abs(evaluatePolynomial(p, t)));
      }),
      { numRuns: 500 },
    );
  });
});

describe('modifiedMohrBoundFactor', () => {
  it('is 1 when Suc >= Sut and grows when the compressive strength is the lower', () => {
    expect(modifiedMohrBoundFactor(castIron)).toBe(1);
    // Sut = 300, Suc = 200 MPa: max(1, (100 + 300) / 200, 300 / 200) = 2.
    expect(modifiedMohrBoundFactor({ ...castIron, ultimateStrength: 300e6, compressiveUltimateStrength: 200e6 })).toBe(2);
  });
});

describe('equivalentStressBound', () => {
  const sections: readonly SectionProperties[] = [rectangle(0.05, 0.1), round(0.06), iSection(0.2, 0.1, 0.0056, 0.0085), tee()];
  const materials: readonly Material[] = [steel, castIron, { ...castIron, ultimateStrength: 300e6, compressiveUltimateStrength: 200e6 }];
  const fields = fc.record({ axial: polynomial, shearY: polynomial, shearZ: polynomial, momentZ: polynomial, momentY: polynomial, torque: polynomial });

  it('is at least the equivalent stress anywhere in the stretch (property)', () => {
    fc.assert(
      fc.property(
        fields,
        fc.integer({ min: 0, max: sections.length - 1 }),
        fc.integer({ min: 0, max: materials.length - 1 }),
        stretch,
        (pieceFields, sectionIndex, materialIndex, fractions) => {
          const section = sections[sectionIndex] as SectionProperties;
          const material = materials[materialIndex] as Material;
          const [piece] = analysisFrom(3, [{ start: 0, end: 3, fields: pieceFields }]).pieces;
          const { a, b, t } = within(fractions);
          const bound = equivalentStressBound(sectionStressFactors(section), material, piece!, a, b);
          expect(bound).toBeGreaterThanOrEqual(equivalentStressAt(section, material, sectionForcesOnPiece(piece!, t)).value);
        },
      ),
      { numRuns: 500 },
    );
  });
});
