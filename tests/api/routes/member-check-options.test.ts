/** The check options of POST /v1/member-checks reach the engine: criteria, buckling, lateral-torsional, pins. */

import type { FastifyInstance } from 'fastify';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { testApp } from '../../support/test-app.js';

let app: FastifyInstance;
beforeAll(async () => {
  app = await testApp();
});
afterAll(async () => {
  await app.close();
});

/** A 2 m hanger bar of a fictional work-platform maker, 20 x 60 mm in S275, pinned at its top. */
const hanger = {
  member: { length: 2, supports: [{ position: 0, type: 'pinned' }, { position: 2, type: 'roller' }] },
  section: { shape: 'rectangle', width: '20 mm', depth: '60 mm' },
  material: { grade: 'S275' },
  loads: [{ type: 'point', position: 1, fy: '-4 kN' }],
  // The hand values leave the bar's own weight out.
  selfWeight: false,
};
const post = (body: object) => request(app.server).post('/v1/member-checks').send({ ...hanger, ...body });
interface CheckAnswer {
  mode: string;
  demand: number;
  capacity: number;
  utilization: number;
}
const checkOf = (body: { checks: CheckAnswer[] }, mode: string) => body.checks.find((check) => check.mode === mode) as CheckAnswer;

describe('criteria', () => {
  it('echoes the defaults used, and says they are defaults', async () => {
    const response = await post({});
    expect(response.status).toBe(200);
    expect(response.body.criteria.deflectionLimitRatio).toBe(250);
    expect(response.body.criteria.requiredSafetyFactor.tension).toBe(1.5);
    expect(response.body.criteria.defaulted).toEqual(expect.arrayContaining(['requiredSafetyFactor', 'deflectionLimitRatio']));
    expect(response.body.notices.some((notice: string) => /Default criteria/.test(notice))).toBe(true);
  });

  it('takes a factor per mode and a twist limit with a unit', async () => {
    const response = await post({ criteria: { requiredSafetyFactor: { bending: 2.2 }, allowedTwist: '0.5 deg', deflectionLimitRatio: 360 } });
    expect(response.body.criteria.requiredSafetyFactor.bending).toBe(2.2);
    expect(response.body.criteria.requiredSafetyFactor.shear).toBe(1.5);
    expect(response.body.criteria.allowedTwist).toBeCloseTo((0.5 * Math.PI) / 180, 15);
    // M = P L / 4 = 2000 N*m; sigma = 6 M / (b d^2) = 166.67 MPa against S275 at 20 mm: 265 MPa (EN 10025-2, from memory).
    const bending = checkOf(response.body, 'bending');
    expect(bending.demand).toBeCloseTo((6 * 2000) / (0.02 * 0.06 ** 2), 0);
    expect(bending.utilization).toBeCloseTo((bending.demand * 2.2) / bending.capacity, 12);
    expect(checkOf(response.body, 'deflection').capacity).toBeCloseTo(2 / 360, 15);
  });

  it('names a bad factor by its pointer', async () => {
    const response = await post({ criteria: { requiredSafetyFactor: { bending: -1 } } });
    expect(response.status).toBe(400);
    expect(response.body.errors[0].pointer).toBe('/criteria/requiredSafetyFactor/bending');
  });
});

describe('buckling options', () => {
  const column = {
    member: { length: 2, supports: [{ position: 0, type: 'fixed' }] },
    loads: [{ type: 'point', position: 2, fx: '-10 kN' }],
  };

  it('reads a fixed-free column from its supports (K = 2) and takes the recommended design value on request (K = 2.1, AISC commentary Table C-A-7.1)', async () => {
    const theoretical = await post(column);
    expect(theoretical.status).toBe(200);
    expect(theoretical.body.buckling.governing.effectiveLengthFactor).toBe(2);
    const design = await post({ ...column, buckling: { endConditions: 'fixed-free', recommendedDesignValues: true } });
    expect(design.body.buckling.governing.effectiveLengthFactor).toBe(2.1);
    // Euler about the weak axis: pi^2 E I / (K L)^2 with I = 0.06 x 0.02^3 / 12 and E = 210 GPa (EN 1993-1-1 3.2.6).
    const I = (0.06 * 0.02 ** 3) / 12;
    expect(design.body.buckling.governing.regime).toBe('euler');
    expect(design.body.buckling.governing.criticalLoad).toBeCloseTo((Math.PI ** 2 * 210e9 * I) / (2.1 * 2) ** 2, 3);
  });

  it('takes an unbraced length and an eccentricity with units', async () => {
    const response = await post({ ...column, buckling: { effectiveLengthFactor: 1, unbracedLength: '1000 mm', eccentricity: '5 mm' } });
    expect(response.status).toBe(200);
    expect(response.body.buckling.governing.effectiveLength).toBeCloseTo(1, 12);
    expect(response.body.checks.some((check: { mode: string }) => check.mode === 'eccentric-column')).toBe(true);
  });
});

describe('pins', () => {
  it('checks a declared pin in double shear and bearing under the resultant reaction', async () => {
    const response = await post({
      member: {
        length: 2,
        supports: [
          { position: 0, type: 'pinned', pin: { diameter: '16 mm', material: { grade: 'S355' }, shearPlanes: 2, plateThickness: '10 mm' } },
          { position: 2, type: 'roller' },
        ],
      },
    });
    expect(response.status).toBe(200);
    // R = 2 kN by statics; double shear R / (2 pi d^2 / 4); bearing R / (d t).
    const area = (Math.PI * 0.016 ** 2) / 4;
    expect(checkOf(response.body, 'pin-shear').demand).toBeCloseTo(2000 / (2 * area), 3);
    expect(checkOf(response.body, 'pin-bearing').demand).toBeCloseTo(2000 / (0.016 * 0.01), 3);
  });

  it('names a pin material that is not in the catalogue', async () => {
    const response = await post({
      member: { length: 2, supports: [{ position: 0, type: 'pinned', pin: { diameter: 0.016, material: { grade: 'S999' }, shearPlanes: 1, plateThickness: 0.01 } }, { position: 2, type: 'roller' }] },
    });
    expect(response.status).toBe(400);
    expect(response.body.errors[0].pointer).toBe('/member/supports/0/pin/material/grade');
  });
});

describe('lateral-torsional buckling', () => {
  it('does not apply when the member is braced', async () => {
    const response = await post({ section: { designation: 'IPE 160' }, lateralTorsional: { braced: true } });
    expect(response.body.notApplicable.map((entry: { mode: string }) => entry.mode)).toContain('lateral-torsional-buckling');
    expect(response.body.lateralTorsionalBuckling).toBeUndefined();
  });

  it('uses a given unbraced length', async () => {
    const response = await post({ section: { designation: 'IPE 160' }, lateralTorsional: { unbracedLength: '1 m', momentGradientFactor: 1 } });
    expect(response.body.lateralTorsionalBuckling.unbracedLength).toBeCloseTo(1, 12);
    expect(response.body.lateralTorsionalBuckling.momentGradientFactor).toBe(1);
  });
});

describe('pin errors', () => {
  it('name a zero diameter as the diameter', async () => {
    const response = await post({
      member: { length: 2, supports: [{ position: 0, type: 'pinned', pin: { diameter: 0, material: { grade: 'S355' }, shearPlanes: 1, plateThickness: 0.01 } }, { position: 2, type: 'roller' }] },
    });
    expect(response.status).toBe(400);
    expect(response.body.errors.map((e: { pointer: string }) => e.pointer)).toEqual(['/member/supports/0/pin/diameter']);
  });
});

describe('stability that cannot be read from the supports', () => {
  it('asks for an effective-length factor when a compressed member has an internal hinge', async () => {
    // Fixed at 0, hinge at mid-length, roller at the end: the upper half leans on a cantilever, K = 1.35
    // (tan(kL/2) = kL by equilibrium), beyond the fixed-pinned 0.7 the supports alone would suggest.
    const response = await post({
      section: { designation: 'HEA 200' },
      member: { length: 8, supports: [{ position: 0, type: 'fixed' }, { position: 8, type: 'roller' }], hinges: [{ position: 4 }] },
      loads: [{ type: 'point', position: 8, fx: '-150 kN' }],
    });
    expect(response.status).toBe(422);
    expect(response.body.errors[0].pointer).toBe('/buckling/effectiveLengthFactor');
    const given = await post({
      section: { designation: 'HEA 200' },
      member: { length: 8, supports: [{ position: 0, type: 'fixed' }, { position: 8, type: 'roller' }], hinges: [{ position: 4 }] },
      loads: [{ type: 'point', position: 8, fx: '-150 kN' }],
      buckling: { effectiveLengthFactor: 1.35 },
    });
    expect(given.status).toBe(200);
    expect(given.body.buckling.governing.effectiveLengthFactor).toBe(1.35);
  });

  it('asks for an unbraced length when no support holds the beam against lateral movement and twist', async () => {
    const response = await post({
      section: { designation: 'IPE 300' },
      member: { length: 6, supports: [{ position: 0, type: 'general', restrained: ['ux', 'uy', 'uz'] }, { position: 6, type: 'general', restrained: ['uy', 'uz'] }] },
      loads: [{ type: 'distributed', from: 0, to: 6, qy: '-10 kN/m' }],
    });
    expect(response.status).toBe(422);
    expect(response.body.errors[0].pointer).toBe('/lateralTorsional/unbracedLength');
  });
});
