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

describe('GET /v1/sections', () => {
  it('lists a family sorted by mass, with the full count (EN 10365 has 18 IPE sizes, 80 to 600)', async () => {
    const response = await request(app.server).get('/v1/sections').query({ family: 'ipe', limit: 5 });
    expect(response.status).toBe(200);
    expect(response.body.total).toBe(18);
    expect(response.body.items.map((item: { designation: string }) => item.designation)).toEqual(['IPE 80', 'IPE 100', 'IPE 120', 'IPE 140', 'IPE 160']);
    expect(response.body.notices[0]).toMatch(/licensed engineer/);
  });

  it('filters by depth and mass given with units, and pages', async () => {
    const response = await request(app.server).get('/v1/sections').query({ family: 'IPE', maxDepth: '300 mm', maxMassPerLength: '30 kg/m', offset: 1, limit: 2 });
    expect(response.status).toBe(200);
    // IPE 80 to IPE 220 weigh up to 26.2 kg/m (EN 10365, from memory); IPE 240 weighs 30.7 kg/m.
    expect(response.body.total).toBe(8);
    expect(response.body.items).toHaveLength(2);
    expect(response.body.items[0].designation).toBe('IPE 100');
    for (const item of response.body.items) expect(item.depth).toBeLessThanOrEqual(0.3);
  });

  it('refuses a bound of the wrong dimension, naming it', async () => {
    const response = await request(app.server).get('/v1/sections').query({ maxDepth: '3 kN' });
    expect(response.status).toBe(400);
    expect(response.body.errors[0].pointer).toBe('/maxDepth');
  });
});

describe('GET /v1/sections/{designation}', () => {
  it('resolves any spacing and case, with computed beside tabulated (EN 10365 IPE 200: A = 28.5 cm^2, Iy = 1943 cm^4, from memory)', async () => {
    const response = await request(app.server).get('/v1/sections/ipe200');
    expect(response.status).toBe(200);
    expect(response.body.section.designation).toBe('IPE 200');
    expect(response.body.section.properties.area).toBeCloseTo(28.5e-4, 5);
    expect(response.body.section.properties.secondMomentZ / 1943e-8).toBeCloseTo(1, 2);
    expect(response.body.tabulated.secondMomentZ).toBeCloseTo(1943e-8, 12);
  });

  it('answers an unknown designation with 404 and the nearest ones', async () => {
    const response = await request(app.server).get('/v1/sections/IPE%20250');
    expect(response.status).toBe(404);
    expect(response.body.nearest).toContain('IPE 240');
  });

  it('presents US units on request (IPE 200 depth 200 mm = 7.874 in)', async () => {
    const response = await request(app.server).get('/v1/sections/IPE%20200').query({ units: 'US' });
    expect(response.body.units.length).toBe('in');
    expect(response.body.section.properties.depth).toBeCloseTo(200 / 25.4, 9);
  });
});
