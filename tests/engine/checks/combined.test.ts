import { describe, expect, it } from 'vitest';
import { combinedChecks } from '../../../src/engine/checks/combined.js';
import { simpleSpanUniformLoad, uniformMoment } from './fixtures/analyses.js';
import { contextOf } from './fixtures/inputs.js';
import { castIron, steel } from './fixtures/materials.js';
import { rectangle, round } from './fixtures/sections.js';

describe('combinedChecks', () => {
  it('gives von Mises (16 / (pi d^3)) sqrt(4 M^2 + 3 T^2) for a shaft in bending and torsion', () => {
    // d = 40 mm, M = 1000 N*m, T = 800 N*m: sigma' = 79577.5 * sqrt(4e6 + 1.92e6) = 193.62 MPa (Shigley 10th ed.,
    // sec. 7-4, from memory); SF = 355 / 193.62 = 1.8335.
    const section = round(0.04);
    const analysis = uniformMoment(0.5, 1000, 1, { torque: [800] });
    const [check] = combinedChecks(contextOf({ analysis, section, material: steel })).checks;
    expect((check?.demand ?? 0) / 1e6).toBeCloseTo(193.62, 2);
    expect(check?.safetyFactor).toBeCloseTo(1.8335, 3);
    expect(check?.location).toBe('extreme fibre, tension side');
  });

  it('combines torsional and transverse shear at the neutral axis where they peak together', () => {
    // 100 x 200 mm, L = 0.4 m, w = 1 MN/m: support shear 200 kN gives 1.5 * 200e3 / 0.02 = 15 MPa; a torque of
    // 4920 N*m gives T / (0.246 h b^2) = 4920 / 4.92e-4 = 10 MPa. Neutral axis at the support: sqrt(3) * 25 = 43.30 MPa;
    // midspan fibre: M = w L^2 / 8 = 20 kN*m, 30 MPa, with 10 MPa torsion: sqrt(900 + 300) = 34.64 MPa.
    const section = rectangle(0.1, 0.2);
    const base = simpleSpanUniformLoad(0.4, 1e6, 1);
    const [piece] = base.pieces;
    const analysis = { ...base, pieces: [{ ...piece!, fields: { ...piece!.fields, torque: [4920] } }] };
    const [check] = combinedChecks(contextOf({ analysis, section, material: steel })).checks;
    expect((check?.demand ?? 0) / 1e6).toBeCloseTo(43.301, 2);
    expect(check?.location).toBe('neutral axis, shear along y');
    expect([0, 0.4]).toContain(check?.position);
  });

  it('uses modified Mohr against Sut for cast iron', () => {
    // The shaft above in cast iron: tension side sigma = 159.15, tau = 63.66 MPa, sigmaA = 181.50 MPa, sigmaB =
    // -22.35 MPa (> -sigmaA): Sut / n = sigmaA; SF = 214 / 181.50 = 1.179.
    const analysis = uniformMoment(0.5, 1000, 1, { torque: [800] });
    const [check] = combinedChecks(contextOf({ analysis, section: round(0.04), material: castIron })).checks;
    expect(check?.capacity).toBe(214e6);
    expect((check?.demand ?? 0) / 1e6).toBeCloseTo(181.5, 1);
    expect(check?.basis).toContain('modified Mohr');
  });
});
