import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { Polynomial } from '../../../src/engine/analysis/result.js';
import type { MemberCheckInput } from '../../../src/engine/checks/check-input.js';
import type { StressSummary } from '../../../src/engine/checks/check-outcome.js';
import { peakOf, scanMember, type MemberScan } from '../../../src/engine/checks/critical-positions.js';
import { equivalentStressAt } from '../../../src/engine/checks/equivalent-stress.js';
import { averageShearStress, bendingStresses, torsionalShearStress, transverseShearStress } from '../../../src/engine/checks/section-stresses.js';
import { stressPeaks } from '../../../src/engine/checks/stress-peaks.js';
import type { Material } from '../../../src/engine/materials/material.js';
import type { SectionProperties } from '../../../src/engine/sections/section-properties.js';
import { analysisFrom, constantAxial, simpleSpanUniformLoad } from './fixtures/analyses.js';
import { simpleInput } from './fixtures/inputs.js';
import { castIron, steel } from './fixtures/materials.js';
import { iSection, rectangle, round, tee } from './fixtures/sections.js';

describe('stressPeaks', () => {
  it('summarises a simple span: 30 MPa each side at midspan, 1.5 MPa shear (1.0 MPa average) at the supports', () => {
    // w = 10 kN/m, L = 4 m, 100 x 200 mm: M = 20 kN*m, M c / I = 30 MPa; V = 20 kN: 1.5 V / A and V / A.
    const input = simpleInput(simpleSpanUniformLoad(4, 10e3, 1), rectangle(0.1, 0.2), steel);
    const peaks = stressPeaks(input, scanMember(input.analysis, input.section));
    expect(peaks.bendingTension.value).toBeCloseTo(30e6, 3);
    expect(peaks.bendingTension.location).toMatch(/^bottom/);
    expect(peaks.bendingCompression.location).toMatch(/^top/);
    expect(peaks.transverseShear.value).toBeCloseTo(1.5e6, 3);
    expect(peaks.averageShear.value).toBeCloseTo(1e6, 3);
    expect(peaks.equivalent.value).toBeCloseTo(30e6, 3);
    expect(peaks.axialTension).toEqual({ value: 0, position: null, location: null });
    expect(peaks.torsionalShear.value).toBe(0);
  });

  it('separates axial tension from compression and searches the round-bar equivalent stress', () => {
    // N = -50 kN on a 40 mm bar: 39.79 MPa in compression; with no bending, von Mises is the same.
    const input = simpleInput(constantAxial(1, -50e3), round(0.04), steel);
    const peaks = stressPeaks(input, scanMember(input.analysis, input.section));
    expect(peaks.axialCompression.value).toBeCloseTo(50e3 / (Math.PI * 0.02 ** 2), 3);
    expect(peaks.axialTension.value).toBe(0);
    expect(peaks.equivalent.value).toBeCloseTo(peaks.axialCompression.value, 3);
  });
});

describe('stressPeaks against peakOf', () => {
  // The reference: each measure of section-stresses.ts and equivalent-stress.ts taken by peakOf on its
  // own. stressPeaks reads them all in one pass and must give the same numbers, positions and locations.
  function peaksByPeakOf(input: MemberCheckInput, scan: MemberScan): StressSummary {
    const { section, material } = input;
    const bendingSide = (sign: 1 | -1) =>
      peakOf(scan, (forces) => {
        let best = { value: 0, location: null as string | null };
        for (const stress of bendingStresses(section, forces)) {
          if (sign * stress.value > best.value) best = { value: sign * stress.value, location: stress.location };
        }
        return best;
      });
    return {
      axialTension: peakOf(scan, (forces) => ({ value: Math.max(forces.axial, 0) / section.area, location: 'whole section' })),
      axialCompression: peakOf(scan, (forces) => ({ value: Math.max(-forces.axial, 0) / section.area, location: 'whole section' })),
      bendingTension: bendingSide(1),
      bendingCompression: bendingSide(-1),
      transverseShear: peakOf(scan, (forces) => transverseShearStress(section, forces)),
      averageShear: peakOf(scan, (forces) => ({ value: averageShearStress(section, forces), location: 'whole section' })),
      torsionalShear: peakOf(scan, (forces) => ({ value: torsionalShearStress(section, forces), location: 'largest torsional shear point' })),
      equivalent: peakOf(scan, (forces) => equivalentStressAt(section, material, forces), {
        refine: section.bendingCombination === 'resultant' || material.behaviour === 'brittle',
      }),
    };
  }

  const coefficient = fc.double({ min: -1e6, max: 1e6, noNaN: true });
  const polynomial: fc.Arbitrary<Polynomial> = fc.array(coefficient, { minLength: 1, maxLength: 4 });
  const pieceFields = fc.record({ axial: polynomial, shearY: polynomial, shearZ: polynomial, momentZ: polynomial, momentY: polynomial, torque: polynomial });
  const sections: readonly SectionProperties[] = [rectangle(0.05, 0.1), round(0.06), iSection(0.2, 0.1, 0.0056, 0.0085), tee()];
  const materials: readonly Material[] = [steel, castIron];

  it('gives exactly the peaks peakOf finds measure by measure (property)', () => {
    fc.assert(
      fc.property(
        fc.array(pieceFields, { minLength: 1, maxLength: 3 }),
        fc.integer({ min: 0, max: sections.length - 1 }),
        fc.integer({ min: 0, max: materials.length - 1 }),
        (fields, sectionIndex, materialIndex) => {
          const analysis = analysisFrom(
            fields.length * 1.5,
            fields.map((piece, i) => ({ start: i * 1.5, end: (i + 1) * 1.5, fields: piece })),
          );
          const input = simpleInput(analysis, sections[sectionIndex] as SectionProperties, materials[materialIndex] as Material);
          const scan = scanMember(analysis, input.section);
          expect(stressPeaks(input, scan)).toStrictEqual(peaksByPeakOf(input, scan));
        },
      ),
      { numRuns: 200 },
    );
  });
});
