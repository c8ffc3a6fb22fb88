/** The service foundation through the real server: operations routes, problems, limits, request ids. */

import type { FastifyInstance } from 'fastify';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { PROBLEMS } from '../src/api/problems.js';
import { testApp } from './support/test-app.js';

let app: FastifyInstance;
beforeAll(async () => {
  app = await testApp({ bodyLimit: 64 * 1024 });
});
afterAll(async () => {
  await app.close();
});

const minimal = {
  member: { length: 2, supports: [{ position: 0, type: 'fixed' }] },
  section: { shape: 'rectangle', width: 0.05, depth: 0.1 },
  material: { elasticModulus: 200e9, yieldStrength: 250e6, ultimateStrength: 400e6 },
  loads: [{ type: 'point', position: 2, fy: -1000 }],
};

describe('operations', () => {
  it('GET /healthz answers alive', async () => {
    const response = await request(app.server).get('/healthz');
    expect(response.status).toBe(200);
    expect(response.body).toEqual({ status: 'alive' });
  });

  it('GET /readyz is ready and says what the catalogues hold', async () => {
    const response = await request(app.server).get('/readyz');
    expect(response.status).toBe(200);
    expect(response.body.status).toBe('ready');
    expect(response.body.catalogues[0]).toMatchObject({ name: 'embedded' });
    expect(response.body.catalogues[0].sections).toBeGreaterThan(300);
    expect(response.body.sectionFamilies.IPE).toBe(18);
  });

  it('returns the caller\'s X-Request-Id, or makes one', async () => {
    const given = await request(app.server).get('/healthz').set('x-request-id', 'quote-4711.line-3');
    expect(given.headers['x-request-id']).toBe('quote-4711.line-3');
    const made = await request(app.server).get('/healthz');
    expect(made.headers['x-request-id']).toMatch(/^[0-9a-f-]{36}$/);
    const unsafe = await request(app.server).get('/healthz').set('x-request-id', 'a b\tc');
    expect(unsafe.headers['x-request-id']).not.toBe('a b\tc');
  });
});

describe('problems', () => {
  it('an unknown route is a 404 problem', async () => {
    const response = await request(app.server).get('/v1/no-such-thing');
    expect(response.status).toBe(404);
    expect(response.headers['content-type']).toMatch(/^application\/problem\+json/);
    expect(response.body).toMatchObject({ type: PROBLEMS.notFound.type, status: 404 });
  });

  it('a known path with the wrong method is a 405 with Allow', async () => {
    const response = await request(app.server).get('/v1/member-checks');
    expect(response.status).toBe(405);
    expect(response.headers.allow).toBe('POST');
    expect(response.body.type).toBe(PROBLEMS.methodNotAllowed.type);
  });

  it('a body over the limit is a 413 problem', async () => {
    const loads = Array.from({ length: 3000 }, () => ({ type: 'point', position: 1, fy: -1 }));
    const response = await request(app.server).post('/v1/member-checks').send({ ...minimal, loads });
    expect(response.status).toBe(413);
    expect(response.body.type).toBe(PROBLEMS.bodyTooLarge.type);
  });

  it('a body that is not JSON is a 415 problem', async () => {
    const response = await request(app.server).post('/v1/member-checks').set('content-type', 'text/plain').send('length=2');
    expect(response.status).toBe(415);
    expect(response.body.type).toBe(PROBLEMS.unsupportedMediaType.type);
  });

  it('malformed JSON is a 400 problem', async () => {
    const response = await request(app.server).post('/v1/member-checks').set('content-type', 'application/json').send('{"member": ');
    expect(response.status).toBe(400);
    expect(response.body.type).toBe(PROBLEMS.malformedJson.type);
  });

  it('a "__proto__" key is refused with a 400, not a 500', async () => {
    const response = await request(app.server)
      .post('/v1/member-checks')
      .set('content-type', 'application/json')
      .send('{"member": {"length": 2, "__proto__": {"polluted": true}, "supports": []}}');
    expect(response.status).toBe(400);
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
  });

  it('deep nesting, huge numbers and odd values are 400s naming the field', async () => {
    const deep = '['.repeat(5000) + ']'.repeat(5000);
    const nested = await request(app.server).post('/v1/member-checks').set('content-type', 'application/json').send(`{"member": ${deep}}`);
    expect(nested.status).toBe(400);
    const huge = await request(app.server)
      .post('/v1/member-checks')
      .set('content-type', 'application/json')
      .send(JSON.stringify(minimal).replace('"length":2', '"length":1e400'));
    expect(huge.status).toBe(400);
    expect(huge.body.errors.map((e: { pointer: string }) => e.pointer)).toContain('/member/length');
  });

  it('a unit of the wrong dimension names the field', async () => {
    const response = await request(app.server)
      .post('/v1/member-checks')
      .send({ ...minimal, member: { ...minimal.member, length: '3 kN' } });
    expect(response.status).toBe(400);
    expect(response.body.errors).toEqual([{ pointer: '/member/length', message: expect.stringMatching(/not a length/) }]);
  });

  it('an unknown field is named, so a typo does not pass silently', async () => {
    const response = await request(app.server)
      .post('/v1/member-checks')
      .send({ ...minimal, loads: [{ type: 'point', position: 2, fY: -1000 }] });
    expect(response.status).toBe(400);
    expect(response.body.errors[0].pointer).toBe('/loads/0/fY');
  });
});

describe('errors before routing', () => {
  it('a malformed URL is a 400 problem', async () => {
    const response = await app.inject({ method: 'GET', url: '/v1/sections/%E0%A4%A' });
    expect(response.statusCode).toBe(400);
    expect(response.headers['content-type']).toMatch(/^application\/problem\+json/);
  });
});
