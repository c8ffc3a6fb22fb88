/** The audit of every answer: an input digest equal for equal inputs however they are written, pinned for the contract's example. */

import { readFileSync } from 'node:fs';
import type { FastifyInstance } from 'fastify';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { MEMBER_CHECK_EXAMPLE } from '../../../src/api/schemas/member-check-request.js';
import { SERVICE_VERSION } from '../../../src/api/service-version.js';
import { testApp } from '../../support/test-app.js';

let app: FastifyInstance;
beforeAll(async () => {
  app = await testApp({ answerCacheBytes: 0 });
});
afterAll(async () => {
  await app.close();
});

const post = async (body: object) => (await request(app.server).post('/v1/member-checks').send(body)).body as { audit: { engineVersion: string; inputDigest: string } };

/** A shelf beam of a fictional shelving maker, written three ways. */
const inMetres = {
  member: { length: 2.7, supports: [{ position: 0, type: 'pinned' }, { position: 2.7, type: 'roller' }] },
  section: { designation: 'IPE 120' },
  material: { grade: 'S275' },
  loads: [{ type: 'distributed', from: 0, to: 2.7, qy: -5000 }],
};
const inMillimetres = {
  loads: [{ qy: '-5 kN/m', to: '2700 mm', from: '0 mm', type: 'distributed' }],
  material: { grade: 's 275' },
  section: { designation: 'ipe120' },
  member: { supports: [{ type: 'pinned', position: 0 }, { type: 'roller', position: '2700 mm' }], length: '2.7 m' },
};

describe('audit', () => {
  it('names the engine version, which is the package version', async () => {
    const packageVersion = (JSON.parse(readFileSync(new URL('../../../package.json', import.meta.url), 'utf8')) as { version: string }).version;
    expect(SERVICE_VERSION).toBe(packageVersion);
    expect((await post(MEMBER_CHECK_EXAMPLE)).audit.engineVersion).toBe(packageVersion);
  });

  it('pins the digest of the contract example (a change of the canonical form or of the embedded catalogues changes it: update deliberately)', async () => {
    expect((await post(MEMBER_CHECK_EXAMPLE)).audit.inputDigest).toBe(PINNED_EXAMPLE_DIGEST);
  });

  it('gives one digest for one input however it is written: units, key order, designation spelling', async () => {
    const a = await post(inMetres);
    const b = await post(inMillimetres);
    expect(a.audit.inputDigest).toMatch(/^[0-9a-f]{64}$/);
    expect(b.audit.inputDigest).toBe(a.audit.inputDigest);
  });

  it('gives another digest when a number, the output or a default changes', async () => {
    const base = (await post(inMetres)).audit.inputDigest;
    const heavier = (await post({ ...inMetres, loads: [{ ...inMetres.loads[0], qy: -5001 }] })).audit.inputDigest;
    const fewerSamples = (await post({ ...inMetres, output: { samples: 11 } })).audit.inputDigest;
    // Self-weight is on by default for a catalogue section: leaving it out changes the input, saying true does not.
    const withoutSelfWeight = (await post({ ...inMetres, selfWeight: false })).audit.inputDigest;
    expect(new Set([base, heavier, fewerSamples, withoutSelfWeight]).size).toBe(4);
    expect((await post({ ...inMetres, selfWeight: true })).audit.inputDigest).toBe(base);
  });

  it('is carried by batch items, sizing and section properties too', async () => {
    const batch = await request(app.server).post('/v1/member-checks/batch').send({ items: [inMetres] });
    expect(batch.body.results[0].result.audit.inputDigest).toBe((await post(inMetres)).audit.inputDigest);
    const sizing = await request(app.server).post('/v1/member-sizing').send({ ...inMetres, section: undefined, candidates: { family: 'IPE' } });
    expect(sizing.body.audit.inputDigest).toMatch(/^[0-9a-f]{64}$/);
    expect(sizing.body.selected.result.audit.inputDigest).toMatch(/^[0-9a-f]{64}$/);
    const properties = await request(app.server).post('/v1/section-properties').send({ section: { designation: 'IPE 120' } });
    const again = await request(app.server).post('/v1/section-properties').send({ section: { designation: 'ipe 120' } });
    expect(properties.body.audit.inputDigest).toBe(again.body.audit.inputDigest);
  });
});

/** Written from this service on 2026-12-02 and checked equal over two separate runs. */
const PINNED_EXAMPLE_DIGEST = '796918783d808bf54a891157f0fc4d5fc99b46f8986867765ab4e233795340ac';
