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

describe('GET /v1/materials', () => {
  it('lists every grade with its source', async () => {
    const response = await request(app.server).get('/v1/materials');
    expect(response.status).toBe(200);
    expect(response.body.total).toBeGreaterThanOrEqual(17);
    const grades = response.body.items.map((item: { grade: string }) => item.grade);
    for (const grade of ['S235', 'S275', 'S355']) expect(grades).toContain(grade);
    for (const item of response.body.items) expect(item.source).toMatch(/\w/);
  });
});

describe('GET /v1/materials/{grade}', () => {
  it('resolves a grade with its standard prefix, in MPa on request (EN 10025-2: S355 ReH 355 MPa up to 16 mm, from memory)', async () => {
    const response = await request(app.server).get('/v1/materials/EN%2010025-2%20s355');
    expect(response.status).toBe(200);
    expect(response.body.material.grade).toBe('S355');
    expect(response.body.material.elasticModulus).toBe(210e9);
    expect(response.body.material.thicknessBands[0].yieldStrength).toBe(355e6);
  });

  it('answers an unknown grade with 404 and suggestions', async () => {
    const response = await request(app.server).get('/v1/materials/S356');
    expect(response.status).toBe(404);
    expect(response.body.nearest).toContain('S355');
  });
});
