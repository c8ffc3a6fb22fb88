/**
 * The largest stresses along the member, each with where it occurs: the demands of the stress checks.
 * The equivalent stress of a round section (a resultant moment with an axial force) or of a brittle
 * material is not a polynomial in x, so it is also searched between the critical positions.
 */

import type { MemberCheckInput } from './check-input.js';
import type { StressSummary } from './check-outcome.js';
import { peakOf, type MemberScan } from './critical-positions.js';
import { equivalentStressAt } from './equivalent-stress.js';
import { averageShearStress, bendingStresses, torsionalShearStress, transverseShearStress } from './section-stresses.js';

export function stressPeaks(input: MemberCheckInput, scan: MemberScan): StressSummary {
  const { section, material } = input;
  const area = section.area;
  const bendingSide = (sign: 1 | -1) =>
    peakOf(scan, (forces) => {
      let best = { value: 0, location: null as string | null };
      for (const stress of bendingStresses(section, forces)) {
        const value = sign * stress.value;
        if (value > best.value) best = { value, location: stress.location };
      }
      return best;
    });
  const refineEquivalent = section.bendingCombination === 'resultant' || material.behaviour === 'brittle';
  return {
    axialTension: peakOf(scan, (forces) => ({ value: Math.max(forces.axial, 0) / area, location: 'whole section' })),
    axialCompression: peakOf(scan, (forces) => ({ value: Math.max(-forces.axial, 0) / area, location: 'whole section' })),
    bendingTension: bendingSide(1),
    bendingCompression: bendingSide(-1),
    transverseShear: peakOf(scan, (forces) => transverseShearStress(section, forces)),
    averageShear: peakOf(scan, (forces) => ({ value: averageShearStress(section, forces), location: 'whole section' })),
    torsionalShear: peakOf(scan, (forces) => ({
      value: torsionalShearStress(section, forces),
      location: 'largest torsional shear point',
    })),
    equivalent: peakOf(scan, (forces) => equivalentStressAt(section, material, forces), { refine: refineEquivalent }),
  };
}
