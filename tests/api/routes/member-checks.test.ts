/** POST /v1/member-checks through the real server: units, mechanisms, bad input. */

import fc from 'fast-check';
import type { FastifyInstance } from 'fastify';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { PROBLEMS } from '../../../src/api/problems.js';
import { testApp } from '../../support/test-app.js';

let app: FastifyInstance;
beforeAll(async () => {
  app = await testApp();
});
afterAll(async () => {
  await app.close();
});

const post = (body: unknown) => request(app.server).post('/v1/member-checks').send(body as object);

/** A 2.4 m shelf beam of a fictional shelving maker, 40 x 80 mm bar, in SI numbers. */
const shelfBeam = {
  member: { length: 2.4, supports: [{ position: 0, type: 'pinned' }, { position: 2.4, type: 'roller' }] },
  section: { shape: 'rectangle', width: 0.04, depth: 0.08 },
  material: { elasticModulus: 200e9, yieldStrength: 250e6, ultimateStrength: 400e6 },
  loads: [{ type: 'distributed', from: 0, to: 2.4, qy: -3000 }],
  // The hand values below leave the bar's own weight out.
  selfWeight: false,
};

describe('units at the boundary', () => {
  it('gives the same answer for SI numbers and unit strings', async () => {
    const si = await post(shelfBeam);
    const withUnits = await post({
      ...shelfBeam,
      member: { length: '2400 mm', supports: [{ position: '0 m', type: 'pinned' }, { position: '240 cm', type: 'roller' }] },
      section: { shape: 'rectangle', width: '40 mm', depth: '80 mm' },
      material: { elasticModulus: '200 GPa', yieldStrength: '250 MPa', ultimateStrength: '400 MPa' },
      loads: [{ type: 'distributed', from: '0 mm', to: '2.4 m', qy: '-3 kN/m' }],
    });
    expect(si.status).toBe(200);
    expect(withUnits.status).toBe(200);
    // Simple span, UDL (AISC Manual 15th ed., Table 3-23, case 1): R = wL/2 = 3600 N, M = wL^2/8 = 2160 N*m.
    expect(si.body.reactions[0].fy).toBeCloseTo(3600, 6);
    expect(si.body.extremes.momentZ.max.value).toBeCloseTo(2160, 6);
    expect(withUnits.body.reactions[0].fy).toBeCloseTo(si.body.reactions[0].fy, 6);
    expect(withUnits.body.extremes.deflectionY.min.value).toBeCloseTo(si.body.extremes.deflectionY.min.value, 12);
  });

  it('presents the requested units and echoes them', async () => {
    const response = await post({ ...shelfBeam, output: { units: { force: 'kN', moment: 'kN*m', deflection: 'mm' } } });
    expect(response.body.units).toMatchObject({ force: 'kN', moment: 'kN*m', deflection: 'mm', length: 'm' });
    expect(response.body.reactions[0].fy).toBeCloseTo(3.6, 9);
    expect(response.body.extremes.momentZ.max.value).toBeCloseTo(2.16, 9);
    // 5 w L^4 / (384 E I), I = 0.04 x 0.08^3 / 12 (Roark 8th ed., Table 8.1, case 2e).
    const I = (0.04 * 0.08 ** 3) / 12;
    expect(response.body.extremes.deflectionY.min.value).toBeCloseTo((-5 * 3000 * 2.4 ** 4) / (384 * 200e9 * I) * 1000, 9);
  });

  it('presents US customary units (1 kip = 4448.2216152605 N, NIST SP 811)', async () => {
    const response = await post({ ...shelfBeam, output: { units: 'US' } });
    expect(response.body.units.force).toBe('kip');
    expect(response.body.reactions[0].fy).toBeCloseTo(3600 / 4448.2216152605, 12);
  });

  it('presents derived quantities in units made from the base units asked for: SI, mm/kN and US', async () => {
    // The 40 x 80 mm steel bar weighs 0.04 x 0.08 m^2 x 7850 kg/m^3 x 9.80665 m/s^2 = 246.34 N/m; the
    // torsional shear per torque is compared with the SI answer, only its unit changing (1 m^-3 = 1e-9 mm^-3).
    const bar = { ...shelfBeam, material: { ...shelfBeam.material, density: 7850 }, selfWeight: true };
    const weightSI = 0.04 * 0.08 * 7850 * 9.80665;
    const si = (await post(bar)).body;
    expect(si.units).toMatchObject({ forcePerLength: 'N/m', translationalStiffness: 'N/m', torsionalShearPerTorque: 'm^-3' });
    expect(si.selfWeight.intensity).toBeCloseTo(weightSI, 9);
    const metric = (await post({ ...bar, output: { units: { length: 'mm', force: 'kN', moment: 'kN*m', stress: 'MPa' } } })).body;
    expect(metric.units).toMatchObject({ forcePerLength: 'kN/mm', translationalStiffness: 'kN/mm', momentPerLength: 'kN*m/mm', rotationalStiffness: 'kN*m/rad', torsionalShearPerTorque: 'mm^-3' });
    expect(metric.selfWeight.intensity).toBeCloseTo(weightSI / 1e6, 15);
    expect(metric.section.properties.torsionalShearPerTorque).toBeCloseTo(si.section.properties.torsionalShearPerTorque * 1e-9, 12);
    const us = (await post({ ...bar, output: { units: 'US' } })).body;
    expect(us.units).toMatchObject({ forcePerLength: 'kip/ft', torsionalShearPerTorque: 'in^-3' });
    // 1 kip/ft = 4448.2216152605 N / 0.3048 m (NIST SP 811).
    expect(us.selfWeight.intensity).toBeCloseTo(weightSI / (4448.2216152605 / 0.3048), 12);
    expect(us.section.properties.torsionalShearPerTorque).toBeCloseTo(si.section.properties.torsionalShearPerTorque * 0.0254 ** 3, 9);
    const named = (await post({ ...bar, output: { units: { length: 'mm', force: 'kN', forcePerLength: 'kN/m' } } })).body;
    expect(named.units.forcePerLength).toBe('kN/m');
    expect(named.selfWeight.intensity).toBeCloseTo(weightSI / 1000, 12);
  });

  it('samples as asked, with every node, and doubles x at a jump', async () => {
    const response = await post({ ...shelfBeam, loads: [{ type: 'point', position: 1.0, fy: -1000 }], output: { samples: 5 } });
    const x: number[] = response.body.diagrams.x;
    expect(x.filter((value) => value === 1.0)).toHaveLength(2);
    const i = x.indexOf(1.0);
    // Shear jumps by the point load: R_left = P b / L = 1000 x 1.4 / 2.4.
    expect(response.body.diagrams.shearY[i]).toBeCloseTo((1000 * 1.4) / 2.4, 9);
    expect(response.body.diagrams.shearY[i + 1]).toBeCloseTo((1000 * 1.4) / 2.4 - 1000, 9);
    for (const value of [0, 0.6, 1.2, 1.8, 2.4]) expect(x.some((sample) => Math.abs(sample - value) < 1e-12)).toBe(true);
  });
});

describe('mechanisms are 422 problems that say which direction is free', () => {
  it('rollers only, under an axial load, are free along x', async () => {
    const response = await post({
      ...shelfBeam,
      member: { length: 2.4, supports: [{ position: 0, type: 'roller' }, { position: 2.4, type: 'roller' }] },
      loads: [{ type: 'point', position: 1.2, fx: 500 }],
    });
    expect(response.status).toBe(422);
    expect(response.body.type).toBe(PROBLEMS.unstableMember.type);
    expect(response.body.mechanism.direction).toBe('ux');
  });

  it('one pin under a transverse load', async () => {
    const response = await post({ ...shelfBeam, member: { length: 2.4, supports: [{ position: 0, type: 'pinned' }] } });
    expect(response.status).toBe(422);
    expect(['uy', 'rz']).toContain(response.body.mechanism.direction);
  });

  it('a hinge in a simple span', async () => {
    const response = await post({ ...shelfBeam, member: { ...shelfBeam.member, hinges: [{ position: 1.2 }] } });
    expect(response.status).toBe(422);
    expect(response.body.type).toBe(PROBLEMS.unstableMember.type);
  });

  it('rollers only with no axial load are stable', async () => {
    const response = await post({ ...shelfBeam, member: { length: 2.4, supports: [{ position: 0, type: 'roller' }, { position: 2.4, type: 'roller' }] } });
    expect(response.status).toBe(200);
    expect(response.body.reactions[0].fx).toBe(0);
  });
});

describe('bad input is a 400 naming the field', () => {
  const pointers = async (body: unknown) => {
    const response = await post(body);
    expect(response.status).toBe(400);
    expect(response.body.type).toBe(PROBLEMS.invalidInput.type);
    return response.body.errors.map((e: { pointer: string }) => e.pointer) as string[];
  };

  it('a load outside the member', async () => {
    expect(await pointers({ ...shelfBeam, loads: [{ type: 'point', position: 3, fy: -1 }] })).toEqual(['/loads/0/position']);
  });

  it('a support outside the member', async () => {
    expect(await pointers({ ...shelfBeam, member: { length: 2.4, supports: [{ position: 0, type: 'fixed' }, { position: -0.1, type: 'roller' }] } })).toEqual([
      '/member/supports/1/position',
    ]);
  });

  it('a distributed load with from >= to', async () => {
    expect(await pointers({ ...shelfBeam, loads: [{ type: 'distributed', from: 2, to: 1, qy: -1 }] })).toContain('/loads/0/to');
  });

  it('zero or negative length', async () => {
    expect(await pointers({ ...shelfBeam, member: { ...shelfBeam.member, length: 0 } })).toEqual(['/member/length']);
    expect(await pointers({ ...shelfBeam, member: { ...shelfBeam.member, length: '-2 m' } })).toEqual(['/member/length']);
  });

  it('no supports', async () => {
    expect(await pointers({ ...shelfBeam, member: { length: 2.4, supports: [] } })).toEqual(['/member/supports']);
  });

  it('every bad quantity at once', async () => {
    const list = await pointers({ ...shelfBeam, member: { ...shelfBeam.member, length: '2 kN' }, loads: [{ type: 'point', position: '1 furlongz', fy: '3 m' }] });
    expect(list).toEqual(expect.arrayContaining(['/member/length', '/loads/0/position', '/loads/0/fy']));
  });

  it('a spring on a rigidly restrained direction', async () => {
    const list = await pointers({
      ...shelfBeam,
      member: { length: 2.4, supports: [{ position: 0, type: 'general', restrained: ['ux', 'uy', 'uz', 'rx'], springs: { uy: '5 kN/mm' } }, { position: 2.4, type: 'roller' }] },
    });
    expect(list).toEqual(['/member/supports/0/springs/uy']);
  });
});

describe('no input gets a 5xx', () => {
  it('random JSON and random mutations of a valid request are answered below 500, with no null numbers', async () => {
    const quantity = fc.oneof(fc.double(), fc.string({ maxLength: 12 }), fc.constantFrom('1 m', '3 kN', '-2 mm', '0', '1e308 m', 'NaN m'));
    const mutated = fc.record({
      length: quantity,
      position: quantity,
      fy: quantity,
      type: fc.constantFrom('pinned', 'roller', 'fixed', 'general', 'spring'),
      width: quantity,
    });
    await fc.assert(
      fc.asyncProperty(fc.oneof(fc.jsonValue({ maxDepth: 4 }), mutated), async (value) => {
        const body =
          value !== null && typeof value === 'object' && 'width' in (value as object)
            ? (() => {
                const m = value as { length: unknown; position: unknown; fy: unknown; type: string; width: unknown };
                return {
                  ...shelfBeam,
                  member: { length: m.length, supports: [{ position: m.position, type: m.type }, { position: 2.4, type: 'roller' }] },
                  section: { shape: 'rectangle', width: m.width, depth: 0.08 },
                  loads: [{ type: 'point', position: m.position, fy: m.fy }],
                };
              })()
            : value;
        const response = await request(app.server).post('/v1/member-checks').set('content-type', 'application/json').send(JSON.stringify(body));
        expect(response.status).toBeLessThan(500);
        // JSON has no NaN or Infinity: a non-finite number would come out as null, and no answer has nulls.
        if (response.status === 200) expect(response.text).not.toMatch(/null/);
      }),
      { numRuns: 150 },
    );
  });
});
