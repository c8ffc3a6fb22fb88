/** output.detail and output.significantDigits: a short answer on request, rounded at presentation only. */

import type { FastifyInstance } from 'fastify';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { MEMBER_CHECK_COMBINATIONS_EXAMPLE, MEMBER_CHECK_EXAMPLE } from '../../src/api/schemas/member-check-request.js';
import { testApp } from '../support/test-app.js';

let app: FastifyInstance;
beforeAll(async () => {
  app = await testApp();
});
afterAll(async () => {
  await app.close();
});

const post = (url: string, body: object) => request(app.server).post(url).send(body);
const withOutput = (body: { output?: object }, output: object) => ({ ...body, output: { ...body.output, ...output } });

describe('output.detail "summary"', () => {
  it('leaves out the diagrams and the section table, and keeps verdict, governing, checks, reactions and extremes as the full answer has them', async () => {
    const full = await post('/v1/member-checks', MEMBER_CHECK_EXAMPLE);
    const summary = await post('/v1/member-checks', withOutput(MEMBER_CHECK_EXAMPLE, { detail: 'summary' }));
    expect(summary.status).toBe(200);
    expect(summary.body.diagrams).toBeUndefined();
    expect(summary.body.section).toBeUndefined();
    for (const key of ['verdict', 'governing', 'checks', 'reactions', 'extremes', 'notices', 'units', 'material']) expect(summary.body[key]).toEqual(full.body[key]);
    expect(summary.text.length).toBeLessThan(full.text.length);
    // At the default 101 samples the diagrams and the section table are more than half an answer.
    const { output: _output, ...defaultSamples } = MEMBER_CHECK_EXAMPLE;
    const fullDefault = await post('/v1/member-checks', defaultSamples);
    const summaryDefault = await post('/v1/member-checks', { ...defaultSamples, output: { detail: 'summary' } });
    expect(summaryDefault.text.length).toBeLessThan(fullDefault.text.length / 2);
    // A summary is another output: another digest; naming the default is the default.
    const explicitFull = await post('/v1/member-checks', withOutput(MEMBER_CHECK_EXAMPLE, { detail: 'full' }));
    expect(summary.body.audit.inputDigest).not.toBe(full.body.audit.inputDigest);
    expect(explicitFull.body.audit.inputDigest).toBe(full.body.audit.inputDigest);
  });

  it('leaves out the envelopes of load combinations, keeping every combination and its checks', async () => {
    const summary = await post('/v1/member-checks', withOutput(MEMBER_CHECK_COMBINATIONS_EXAMPLE, { detail: 'summary' }));
    expect(summary.status).toBe(200);
    expect(summary.body.loadCombinations.envelope).toBeUndefined();
    expect(summary.body.loadCombinations.combinations.length).toBe(7);
    for (const combination of summary.body.loadCombinations.combinations) expect(combination.movingLoad?.envelope).toBeUndefined();
    expect(summary.body.loadCombinations.combinations.some((combination: { movingLoad?: { extremes: unknown } }) => combination.movingLoad?.extremes !== undefined)).toBe(true);
  });

  it('is honoured by batch items and by sizing', async () => {
    const batch = await post('/v1/member-checks/batch', { items: [withOutput(MEMBER_CHECK_EXAMPLE, { detail: 'summary' })] });
    expect(batch.body.results[0].result.diagrams).toBeUndefined();
    expect(batch.body.results[0].result.verdict).toMatch(/pass|fail/);
    const { section: _section, ...sizingBody } = MEMBER_CHECK_EXAMPLE;
    const sizing = await post('/v1/member-sizing', { ...withOutput(sizingBody, { detail: 'summary' }), candidates: { family: 'IPE' } });
    expect(sizing.status).toBe(200);
    expect(sizing.body.selected.result.diagrams).toBeUndefined();
  });
});

describe('output.significantDigits', () => {
  it('rounds every presented quantity to the digits asked, never a utilization or safety factor', async () => {
    const full = await post('/v1/member-checks', MEMBER_CHECK_EXAMPLE);
    const rounded = await post('/v1/member-checks', withOutput(MEMBER_CHECK_EXAMPLE, { significantDigits: 3 }));
    expect(rounded.status).toBe(200);
    const threeDigits = (value: number) => Number(value.toPrecision(3)) === value;
    for (const reaction of rounded.body.reactions) expect(threeDigits(reaction.fy)).toBe(true);
    expect(rounded.body.reactions[0].fy).toBe(Number(full.body.reactions[0].fy.toPrecision(3)));
    expect((rounded.body.diagrams.momentZ as number[]).every(threeDigits)).toBe(true);
    expect(rounded.body.extremes.momentZ.max.value).toBe(Number(full.body.extremes.momentZ.max.value.toPrecision(3)));
    rounded.body.checks.forEach((check: { demand: number; utilization: number; safetyFactor?: number }, i: number) => {
      expect(threeDigits(check.demand)).toBe(true);
      expect(check.utilization).toBe(full.body.checks[i].utilization);
      expect(check.safetyFactor).toBe(full.body.checks[i].safetyFactor);
    });
    expect(rounded.body.verdict).toBe(full.body.verdict);
  });

  it('refuses digits outside 1 to 17 with a pointer', async () => {
    const response = await post('/v1/member-checks', withOutput(MEMBER_CHECK_EXAMPLE, { significantDigits: 0 }));
    expect(response.status).toBe(400);
    expect(response.body.errors[0].pointer).toBe('/output/significantDigits');
  });
});
