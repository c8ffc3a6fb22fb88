import { describe, expect, it } from 'vitest';
import { axialChecks } from '../../../src/engine/checks/axial.js';
import { constantAxial } from './fixtures/analyses.js';
import { contextOf } from './fixtures/inputs.js';
import { castIron, steel } from './fixtures/materials.js';
import { rectangle } from './fixtures/sections.js';

const section = rectangle(0.02, 0.04);

describe('axialChecks', () => {
  it('checks tension against Sy with 1.5 and against Sut with 2.0', () => {
    // N = 100 kN on 20 x 40 mm = 8e-4 m^2: sigma = 125 MPa. Sy 355: SF 2.84, U = 125 * 1.5 / 355 = 0.5282;
    // Sut 470: SF 3.76, U = 125 * 2 / 470 = 0.5319.
    const { checks } = axialChecks(contextOf({ analysis: constantAxial(2, 100e3), section, material: steel }));
    const tension = checks.find((c) => c.mode === 'tension');
    const ultimate = checks.find((c) => c.mode === 'tension-ultimate');
    expect(tension?.demand).toBeCloseTo(125e6, 3);
    expect(tension?.safetyFactor).toBeCloseTo(2.84, 10);
    expect(tension?.utilization).toBeCloseTo(0.52817, 5);
    expect(ultimate?.capacity).toBe(470e6);
    expect(ultimate?.utilization).toBeCloseTo(0.53191, 5);
    expect(checks.find((c) => c.mode === 'compression')?.demand).toBe(0);
  });

  it('checks compression against the compressive yield strength', () => {
    const { checks } = axialChecks(contextOf({ analysis: constantAxial(2, -100e3), section, material: { ...steel, compressiveYieldStrength: 250e6 } }));
    const compression = checks.find((c) => c.mode === 'compression');
    expect(compression?.capacity).toBe(250e6);
    expect(compression?.safetyFactor).toBeCloseTo(2, 10);
    expect(checks.find((c) => c.mode === 'tension')?.utilization).toBe(0);
  });

  it('has no separate ultimate check for a brittle material, whose tension check already uses Sut', () => {
    const { checks, notApplicable } = axialChecks(contextOf({ analysis: constantAxial(2, 100e3), section, material: castIron }));
    expect(checks.find((c) => c.mode === 'tension')?.capacity).toBe(214e6);
    expect(checks.find((c) => c.mode === 'tension')?.requiredSafetyFactor).toBe(2);
    expect(checks.some((c) => c.mode === 'tension-ultimate')).toBe(false);
    expect(notApplicable.map((n) => n.mode)).toEqual(['tension-ultimate']);
  });
});
