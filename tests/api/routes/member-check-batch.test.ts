/** POST /v1/member-checks/batch: each item as the single check answers it; a bad item fails alone. */

import type { FastifyInstance } from 'fastify';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { PROBLEMS } from '../../../src/api/problems.js';
import { MAX_BATCH_ITEMS } from '../../../src/api/schemas/batch-exchange.js';
import { testApp } from '../../support/test-app.js';

let app: FastifyInstance;
beforeAll(async () => {
  app = await testApp();
});
afterAll(async () => {
  await app.close();
});

/** Shelf beams of a fictional shelving maker, at three bay widths. */
const bay = (length: number, designation = 'IPE 120') => ({
  member: { length, supports: [{ position: 0, type: 'pinned' }, { position: length, type: 'roller' }] },
  section: { designation },
  material: { grade: 'S275' },
  loads: [{ type: 'distributed', from: 0, to: length, qy: -5000 }],
  output: { samples: 3 },
});

describe('POST /v1/member-checks/batch', () => {
  it('answers every item as the single check would, in order, with a summary', async () => {
    const items = [{ id: 'bay-1.8', ...bay(1.8) }, { id: 7, ...bay(2.7) }, bay(4.2)];
    const response = await request(app.server).post('/v1/member-checks/batch').send({ items });
    expect(response.status).toBe(200);
    expect(response.body.results.map((r: { index: number }) => r.index)).toEqual([0, 1, 2]);
    expect(response.body.results[0].id).toBe('bay-1.8');
    expect(response.body.results[1].id).toBe(7);
    for (const [i, item] of items.entries()) {
      const { id: _id, ...body } = item as typeof item & { id?: unknown };
      const single = await request(app.server).post('/v1/member-checks').send(body);
      expect(response.body.results[i].result).toEqual(single.body);
    }
    const verdicts = response.body.results.map((r: { result: { verdict: string } }) => r.result.verdict);
    const summary = response.body.summary;
    expect(summary.total).toBe(3);
    expect(summary.pass).toBe(verdicts.filter((v: string) => v === 'pass').length);
    expect(summary.fail).toBe(verdicts.filter((v: string) => v === 'fail').length);
    expect(summary.error).toBe(0);
    const utilizations = response.body.results.map((r: { result: { governing: { utilization: number } } }) => r.result.governing.utilization);
    expect(summary.worstUtilization).toBe(Math.max(...utilizations));
    expect(summary.worstIndex).toBe(utilizations.indexOf(Math.max(...utilizations)));
  });

  it('keeps a broken item in the middle to itself, with pointers rooted at its index', async () => {
    const broken = { ...bay(2.7), loads: [{ type: 'point', position: '9 m', fy: '-1 kN' }] };
    const unstable = { ...bay(2.7), member: { length: 2.7, supports: [{ position: 0, type: 'roller' }] } };
    const response = await request(app.server).post('/v1/member-checks/batch').send({ items: [bay(1.8), broken, 'not an object', unstable, bay(2.4)] });
    expect(response.status).toBe(200);
    const statuses = response.body.results.map((r: { status: number }) => r.status);
    expect(statuses).toEqual([200, 400, 400, 422, 200]);
    expect(response.body.results[1].error.errors[0].pointer).toBe('/items/1/loads/0/position');
    expect(response.body.results[3].error.type).toBe(PROBLEMS.unstableMember.type);
    expect(response.body.summary.error).toBe(3);
  });

  it(`refuses more than ${MAX_BATCH_ITEMS} items with a 413 problem`, async () => {
    const items = Array.from({ length: MAX_BATCH_ITEMS + 1 }, () => ({}));
    const response = await request(app.server).post('/v1/member-checks/batch').send({ items });
    expect(response.status).toBe(413);
    expect(response.body.type).toBe(PROBLEMS.tooManyItems.type);
  });

  it('refuses a batch whose diagrams would exceed 200,000 points in all, before any work', async () => {
    const items = Array.from({ length: 30 }, () => ({ ...bay(2.7), output: { samples: 10001 } }));
    const response = await request(app.server).post('/v1/member-checks/batch').send({ items });
    expect(response.status).toBe(413);
    expect(response.body.detail).toMatch(/300030 diagram points/);
  });

  it('refuses an empty or malformed envelope with a 400', async () => {
    const empty = await request(app.server).post('/v1/member-checks/batch').send({ items: [] });
    expect(empty.status).toBe(400);
    const wrong = await request(app.server).post('/v1/member-checks/batch').send({ checks: [] });
    expect(wrong.status).toBe(400);
  });
});
