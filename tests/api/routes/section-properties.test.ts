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

describe('POST /v1/section-properties', () => {
  it('gives a rectangle its closed forms in the units asked (Roark 8th ed., Table A.1, case 1: I = b d^3 / 12)', async () => {
    const response = await request(app.server)
      .post('/v1/section-properties')
      .send({ section: { shape: 'rectangle', width: '40 mm', depth: '120 mm' }, output: { units: { length: 'mm', area: 'mm^2', secondMoment: 'mm^4', sectionModulus: 'mm^3' } } });
    expect(response.status).toBe(200);
    const p = response.body.section.properties;
    expect(p.area).toBeCloseTo(4800, 9);
    expect(p.secondMomentZ).toBeCloseTo((40 * 120 ** 3) / 12, 6);
    expect(p.secondMomentY).toBeCloseTo((120 * 40 ** 3) / 12, 6);
    expect(p.sectionModulusZ).toBeCloseTo((40 * 120 ** 2) / 6, 6);
    expect(p.plasticModulusZ).toBeCloseTo((40 * 120 ** 2) / 4, 6);
    expect(response.body.units.secondMoment).toBe('mm^4');
  });

  it('gives mass per length from the material density (round 20 mm in S355: 7850 x pi 0.01^2 = 2.466 kg/m)', async () => {
    const response = await request(app.server).post('/v1/section-properties').send({ section: { shape: 'round', diameter: '20 mm' }, material: { grade: 'S355' } });
    expect(response.body.section.properties.massPerLength).toBeCloseTo(7850 * Math.PI * 0.01 ** 2, 9);
  });

  it('answers impossible geometry with a 422 naming the field', async () => {
    const response = await request(app.server).post('/v1/section-properties').send({ section: { shape: 'tube', outerDiameter: '50 mm', wallThickness: '25 mm' } });
    expect(response.status).toBe(422);
    expect(response.body.type).toBe(PROBLEMS.impossibleGeometry.type);
    expect(response.body.errors[0].pointer).toBe('/section/wallThickness');
  });

  it('answers zero and negative dimensions with a 400 naming the field', async () => {
    const response = await request(app.server).post('/v1/section-properties').send({ section: { shape: 'rectangle', width: 0, depth: '-5 mm' } });
    expect(response.status).toBe(400);
    expect(response.body.errors.map((e: { pointer: string }) => e.pointer)).toEqual(['/section/width', '/section/depth']);
  });

  it('answers an unknown designation with a 400 listing the nearest', async () => {
    const response = await request(app.server).post('/v1/section-properties').send({ section: { designation: 'SHS 100x100x55' } });
    expect(response.status).toBe(400);
    expect(response.body.type).toBe(PROBLEMS.unknownDesignation.type);
    expect(response.body.nearest.length).toBeGreaterThan(0);
    expect(response.body.errors[0].pointer).toBe('/section/designation');
  });
});

describe('custom sections', () => {
  it('need a fibre distance for each axis, since no stand-in for the bending stress is safe', async () => {
    const response = await request(app.server)
      .post('/v1/section-properties')
      .send({ section: { shape: 'custom', area: '28.5 cm^2', secondMomentZ: '1943 cm^4', secondMomentY: '142 cm^4', torsionConstant: '7 cm^4' } });
    expect(response.status).toBe(400);
    expect(response.body.errors.map((e: { pointer: string }) => e.pointer)).toEqual(['/section/depth', '/section/width']);
  });

  it('take the section moduli from depth and width (IPE 200 values, EN 10365 from memory: Wel = 1943 / 10 = 194.3 cm^3)', async () => {
    const response = await request(app.server)
      .post('/v1/section-properties')
      .send({ section: { shape: 'custom', area: '28.5 cm^2', secondMomentZ: '1943 cm^4', secondMomentY: '142 cm^4', torsionConstant: '7 cm^4', depth: '200 mm', width: '100 mm' } });
    expect(response.status).toBe(200);
    expect(response.body.section.properties.sectionModulusZ).toBeCloseTo(194.3e-6, 12);
    expect(response.body.section.properties.sectionModulusY).toBeCloseTo(28.4e-6, 12);
  });
});
