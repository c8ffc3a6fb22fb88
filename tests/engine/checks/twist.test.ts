import { describe, expect, it } from 'vitest';
import { twistChecks } from '../../../src/engine/checks/twist.js';
import { analysisFrom, FIXED, support } from './fixtures/analyses.js';
import { contextOf } from './fixtures/inputs.js';
import { steel } from './fixtures/materials.js';
import { round } from './fixtures/sections.js';

describe('twistChecks', () => {
  it('compares the largest twist T L / (G J) with the allowed twist (1 degree by default)', () => {
    // T = 100 N*m, G J = 1000 N*m^2, L = 0.5 m: 0.05 rad at the free end, against pi / 180: U = 2.865.
    const analysis = analysisFrom(0.5, [{ start: 0, end: 0.5, fields: { torque: [100], twist: [0, 0.1] } }]);
    const [check] = twistChecks(contextOf({ analysis, section: round(0.03), material: steel, supports: [support(0, FIXED)] })).checks;
    expect(check?.demand).toBeCloseTo(0.05, 15);
    expect(check?.position).toBe(0.5);
    expect(check?.utilization).toBeCloseTo(0.05 / (Math.PI / 180), 12);
    expect(check?.passes).toBe(false);
  });

  it('uses the requested allowed twist', () => {
    const analysis = analysisFrom(0.5, [{ start: 0, end: 0.5, fields: { twist: [0, 0.1] } }]);
    const [check] = twistChecks(contextOf({ analysis, section: round(0.03), material: steel, criteria: { allowedTwist: 0.1 } })).checks;
    expect(check?.utilization).toBeCloseTo(0.5, 12);
  });
});
