import { describe, expect, it } from 'vitest';
import { torsionChecks } from '../../../src/engine/checks/torsion.js';
import { analysisFrom } from './fixtures/analyses.js';
import { contextOf } from './fixtures/inputs.js';
import { steel } from './fixtures/materials.js';
import { round } from './fixtures/sections.js';

describe('torsionChecks', () => {
  it('gives 16 T / (pi d^3) against the shear yield strength', () => {
    // d = 40 mm, T = 800 N*m: tau = 63.66 MPa; Ssy = 204.96 MPa: SF 3.220.
    const analysis = analysisFrom(1, [{ start: 0, end: 1, fields: { torque: [800] } }]);
    const [check] = torsionChecks(contextOf({ analysis, section: round(0.04), material: steel })).checks;
    expect((check?.demand ?? 0) / 1e6).toBeCloseTo(63.66, 2);
    expect(check?.safetyFactor).toBeCloseTo(204.96 / 63.662, 3);
  });
});
