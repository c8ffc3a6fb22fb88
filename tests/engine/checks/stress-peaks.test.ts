import { describe, expect, it } from 'vitest';
import { scanMember } from '../../../src/engine/checks/critical-positions.js';
import { stressPeaks } from '../../../src/engine/checks/stress-peaks.js';
import { constantAxial, simpleSpanUniformLoad } from './fixtures/analyses.js';
import { simpleInput } from './fixtures/inputs.js';
import { steel } from './fixtures/materials.js';
import { rectangle, round } from './fixtures/sections.js';

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
