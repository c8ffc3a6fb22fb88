/** POST /v1/member-sizing: agrees with checking each candidate one by one; limits and objectives work. */

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

/** A 3 m work-platform joist of a fictional maker, in S355, braced laterally by its decking. */
const joist = {
  member: { length: '3 m', supports: [{ position: 0, type: 'pinned' }, { position: '3 m', type: 'roller' }] },
  material: { grade: 'S355' },
  loads: [{ type: 'distributed', from: 0, to: '3 m', qy: '-6 kN/m' }],
  selfWeight: true,
  lateralTorsional: { braced: true },
  output: { samples: 5 },
};

const size = (body: object) => request(app.server).post('/v1/member-sizing').send({ ...joist, ...body });
const check = (designation: string) => request(app.server).post('/v1/member-checks').send({ ...joist, section: { designation } });

describe('POST /v1/member-sizing', () => {
  it('selects the lightest passing IPE, and agrees with checking every candidate one by one', async () => {
    const response = await size({ candidates: { family: 'IPE' } });
    expect(response.status).toBe(200);
    const rows = response.body.candidates as { designation: string; massPerLength: number; utilization: number; verdict: string }[];
    expect(rows).toHaveLength(18);
    const singles = await Promise.all(rows.map((row) => check(row.designation)));
    rows.forEach((row, i) => {
      const single = singles[i]?.body;
      expect(row.verdict).toBe(single.verdict);
      expect(row.utilization).toBeCloseTo(single.governing.utilization, 12);
    });
    const passing = rows.filter((row) => row.verdict === 'pass');
    const lightest = passing.reduce((a, b) => (b.massPerLength < a.massPerLength ? b : a));
    expect(response.body.selected.designation).toBe(lightest.designation);
    expect(rows[0]?.designation).toBe(lightest.designation);
    // Everything lighter than the selected section fails.
    for (const row of rows) if (row.massPerLength < lightest.massPerLength) expect(row.verdict).toBe('fail');
    // The selected result is the single check's result.
    const single = await check(lightest.designation);
    expect(response.body.selected.result).toEqual(single.body);
  });

  it('leaves out candidates beyond the limits and says so', async () => {
    const response = await size({ candidates: { families: ['IPE', 'HEA'] }, limits: { maxDepth: '150 mm' } });
    expect(response.status).toBe(200);
    for (const row of response.body.candidates) expect(row.depth).toBeLessThanOrEqual(0.15);
    expect(response.body.excluded.length).toBeGreaterThan(0);
    expect(response.body.excluded[0].reason).toMatch(/maxDepth/);
  });

  it('chooses by depth with the shallowest objective', async () => {
    const response = await size({ candidates: { families: ['IPE', 'HEB'] }, objective: 'shallowest' });
    const passingDepths = response.body.candidates.filter((row: { verdict: string }) => row.verdict === 'pass').map((row: { depth: number }) => row.depth);
    expect(response.body.candidates[0].depth).toBe(Math.min(...passingDepths));
  });

  it('chooses the least utilized with that objective', async () => {
    const response = await size({ candidates: { designations: ['IPE 160', 'IPE 200', 'HEA 160'] }, objective: 'least-utilization' });
    const utilizations = response.body.candidates.map((row: { utilization: number }) => row.utilization);
    expect(utilizations).toEqual([...utilizations].sort((a: number, b: number) => a - b));
  });

  it('checks explicit shapes, named by their place in the list', async () => {
    const response = await size({
      candidates: {
        sections: [
          { shape: 'rectangle', width: '20 mm', depth: '60 mm' },
          { shape: 'rectangle', width: '30 mm', depth: '120 mm' },
        ],
      },
    });
    expect(response.status).toBe(200);
    expect(response.body.selected.designation).toBe('sections/1');
    // 7850 kg/m^3 x 0.03 x 0.12 m^2 (the S355 density, EN 1993-1-1 common practice).
    expect(response.body.candidates[0].massPerLength).toBeCloseTo(7850 * 0.03 * 0.12, 9);
  });

  it('answers 422 with the closest candidate when none passes', async () => {
    const response = await size({ candidates: { designations: ['IPE 80', 'IPE 100'] }, loads: [{ type: 'distributed', from: 0, to: '3 m', qy: '-60 kN/m' }] });
    expect(response.status).toBe(422);
    expect(response.body.type).toBe(PROBLEMS.noPassingCandidate.type);
    expect(response.body.closest.designation).toBe('IPE 100');
    expect(response.body.closest.governingMode).toBeDefined();
    expect(response.body.candidates).toHaveLength(2);
  });

  it('names an unknown family or designation', async () => {
    const family = await size({ candidates: { family: 'IPX' } });
    expect(family.status).toBe(400);
    expect(family.body.errors[0].pointer).toBe('/candidates/family');
    const designation = await size({ candidates: { designations: ['IPE 200', 'IPE 205'] } });
    expect(designation.status).toBe(400);
    expect(designation.body.errors[0].pointer).toBe('/candidates/designations/1');
  });

  it('refuses more work than one request may ask (candidates x loads), naming the candidates', async () => {
    const loads = Array.from({ length: 200 }, (_, i) => ({ type: 'point', position: 0.01 * (i + 1), fy: -10 }));
    const response = await size({ candidates: { families: ['IPE', 'HEA', 'HEB', 'W'] }, loads });
    expect(response.status).toBe(400);
    expect(response.body.errors[0].pointer).toBe('/candidates');
  });

  it('answers an unstable member as such, not as a failed sizing', async () => {
    const response = await size({ candidates: { family: 'IPE' }, member: { length: '3 m', supports: [{ position: 0, type: 'pinned' }] } });
    expect(response.status).toBe(422);
    expect(response.body.type).toBe(PROBLEMS.unstableMember.type);
  });
});
