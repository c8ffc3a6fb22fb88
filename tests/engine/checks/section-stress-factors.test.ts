import { describe, expect, it } from 'vitest';
import type { SectionForces } from '../../../src/engine/checks/section-forces.js';
import {
  RESULTANT_FIBRE_LABELS,
  fibreBendingStresses,
  fibreCount,
  sectionStressFactors,
} from '../../../src/engine/checks/section-stress-factors.js';
import { bendingStresses, transverseShearPerForce } from '../../../src/engine/checks/section-stresses.js';
import { iSection, rectangle, round, tee } from './fixtures/sections.js';

const forces = (momentZ: number, momentY: number): SectionForces => ({ axial: 0, shearY: 0, shearZ: 0, momentZ, momentY, torque: 0 });

describe('sectionStressFactors', () => {
  it('gives 6 M / (b h^2) at the corners of a rectangle (Roark 8th ed., Table A.1: c = h / 2, I = b h^3 / 12)', () => {
    // 50 x 100 mm, Mz = 1 kN*m sagging: 6 * 1000 / (0.05 * 0.1^2) = 12 MPa, compression on top.
    const factors = sectionStressFactors(rectangle(0.05, 0.1));
    const out = new Float64Array(fibreCount(factors));
    fibreBendingStresses(factors, 1000, 0, out);
    const top = factors.fibreLabels.findIndex((label) => label.startsWith('top'));
    const bottom = factors.fibreLabels.findIndex((label) => label.startsWith('bottom'));
    expect(out[top]).toBeCloseTo(-12e6, 3);
    expect(out[bottom]).toBeCloseTo(12e6, 3);
  });

  it('gives a round bar the two sides of the resultant moment, 32 M / (pi d^3) (Roark 8th ed., Table A.1)', () => {
    // Mz = 300, My = 400: M = 500 N*m on a 40 mm bar.
    const factors = sectionStressFactors(round(0.04));
    expect(factors.fibreLabels).toEqual(RESULTANT_FIBRE_LABELS);
    const out = new Float64Array(fibreCount(factors));
    fibreBendingStresses(factors, 300, 400, out);
    expect(out[0]).toBeCloseTo((32 * 500) / (Math.PI * 0.04 ** 3), 3);
    expect(out[1]).toBe(-(out[0] as number));
  });

  it('gives the very numbers of bendingStresses and transverseShearPerForce, fibre for fibre', () => {
    for (const section of [rectangle(0.05, 0.1), round(0.06), iSection(0.2, 0.1, 0.0056, 0.0085), tee()]) {
      const factors = sectionStressFactors(section);
      const out = new Float64Array(fibreCount(factors));
      fibreBendingStresses(factors, 1234.5, -678.9, out);
      const reference = bendingStresses(section, forces(1234.5, -678.9));
      expect([...out]).toStrictEqual(reference.map((stress) => stress.value));
      expect(factors.fibreLabels).toStrictEqual(reference.map((stress) => stress.location));
      const perForce = transverseShearPerForce(section);
      expect([factors.shearPerForceY, factors.shearPerForceZ]).toStrictEqual([perForce.alongY, perForce.alongZ]);
    }
  });
});
