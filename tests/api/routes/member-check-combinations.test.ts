/**
 * POST /v1/member-checks with load cases, moving loads and combinations: each combination is the single
 * check of its factored loads (superposition), the governing one is on top, bad input is a 400 with a
 * pointer and too much work a 422 naming the limit.
 */

import type { FastifyInstance } from 'fastify';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { PROBLEMS } from '../../../src/api/problems.js';
import { MEMBER_CHECK_COMBINATIONS_EXAMPLE } from '../../../src/api/schemas/member-check-request.js';
import { MAX_LOAD_STATES, MAX_TRAIN_INTERVALS } from '../../../src/api/schemas/load-combinations-input.js';
import { MAX_BATCH_LOAD_STATES } from '../../../src/api/routes/member-check-batch.js';
import { testApp } from '../../support/test-app.js';

let app: FastifyInstance;
beforeAll(async () => {
  app = await testApp();
});
afterAll(async () => {
  await app.close();
});

const post = (body: object) => request(app.server).post('/v1/member-checks').send(body);

/** A platform beam of a fictional work-platform maker: grating (permanent) and stored goods (imposed), 3.6 m simple span. */
const beam = {
  member: { length: 3.6, supports: [{ position: 0, type: 'pinned' }, { position: 3.6, type: 'roller' }] },
  section: { designation: 'IPE 200' },
  material: { grade: 'S355' },
  output: { samples: 5 },
  // The hand values leave the beam's own weight out.
  selfWeight: false,
};
/** A factored strength combination and its serviceability partner, so every mode is checked. */
const sizingCombinations = [
  { id: 'heavy', purpose: 'strength', factors: { grating: 1.35, goods: 1.5 } },
  { id: 'in service', purpose: 'serviceability', factors: { grating: 1, goods: 1 } },
];
const grating = { type: 'distributed', from: 0, to: 3.6, qy: -1200 };
const goods = { type: 'point', position: 1.2, fy: -8000 };
const cases = [
  { id: 'grating', category: 'permanent', loads: [grating] },
  { id: 'goods', category: 'imposed', loads: [goods] },
];

type Check = { mode: string; utilization: number; demand: number; combination?: string; loadPosition?: number; location?: string };
type Combination = { id: string; purpose: string; checks: Check[]; reactions: { fy: number }[]; extremes: Record<string, unknown>; governing?: { utilization: number }; movingLoad?: { loadPosition: number } };

describe('load combinations', () => {
  it('checks each given combination as the single check of its factored loads (superposition)', async () => {
    const response = await post({
      ...beam,
      loadCases: cases,
      combinations: [
        { id: 'heavy', purpose: 'strength', factors: { grating: 1.35, goods: 1.5 } },
        { id: 'goods only', purpose: 'serviceability', factors: { goods: 1 } },
      ],
    });
    expect(response.status, JSON.stringify(response.body).slice(0, 400)).toBe(200);
    const combinations = response.body.loadCombinations.combinations as Combination[];
    expect(response.body.loadCombinations.set).toBe('given');
    const heavy = await post({ ...beam, loads: [{ ...grating, qy: -1200 * 1.35 }, { ...goods, fy: -8000 * 1.5 }] });
    const goodsOnly = await post({ ...beam, loads: [goods] });
    const strengthModes = (heavy.body.checks as Check[]).filter((check) => !['deflection', 'twist'].includes(check.mode));
    expect(combinations[0]!.checks.map((check) => check.mode)).toEqual(strengthModes.map((check) => check.mode));
    combinations[0]!.checks.forEach((check, i) => expect(check.utilization).toBeCloseTo(strengthModes[i]!.utilization, 12));
    expect(combinations[0]!.reactions.map((r) => r.fy)).toEqual(heavy.body.reactions.map((r: { fy: number }) => r.fy));
    expect(combinations[0]!.extremes).toEqual(heavy.body.extremes);
    const deflection = (goodsOnly.body.checks as Check[]).find((check) => check.mode === 'deflection')!;
    expect(combinations[1]!.checks.map((check) => check.mode)).toEqual(['deflection', 'twist']);
    expect(combinations[1]!.checks[0]!.utilization).toBeCloseTo(deflection.utilization, 12);
    // Hand check of the reactions: 1.35 x 1.2 kN/m x 3.6 m / 2 + 1.5 x 8 kN x 2.4 / 3.6 = 2.916 + 8 kN at x = 0.
    expect(combinations[0]!.reactions[0]!.fy).toBeCloseTo(2916 + 8000, 6);
    // The top: the governing combination's check, every check at its worst with where it comes from.
    expect(response.body.loadCombinations.governing).toBe('heavy');
    expect(response.body.governing.utilization).toBeCloseTo(Math.max(...strengthModes.map((check) => check.utilization), deflection.utilization), 12);
    const top = response.body.checks as Check[];
    expect(top.find((check) => check.mode === 'deflection')!.combination).toBe('goods only');
    expect(top.find((check) => check.mode === 'bending')!.combination).toBe('heavy');
    expect(response.body.reactions.map((r: { fy: number }) => r.fy)).toEqual(heavy.body.reactions.map((r: { fy: number }) => r.fy));
  });

  it('builds the default set from the categories and says so', async () => {
    const response = await post({ ...beam, selfWeight: true, loadCases: [...cases, { id: 'wind', category: 'wind', loads: [{ type: 'distributed', from: 0, to: 3.6, qz: 300 }] }] });
    expect(response.status).toBe(200);
    const result = response.body.loadCombinations;
    expect(result.set).toBe('default');
    expect(result.basis).toMatch(/placeholder/);
    const described = (result.combinations as (Combination & { description: string })[]).map((c) => `${c.id}: ${c.description}`);
    expect(described).toEqual([
      'strength-1: 1 selfWeight + 1 grating',
      'strength-2: 1 selfWeight + 1 grating + 1 goods',
      'strength-3: 1 selfWeight + 1 grating + 1 wind',
      'strength-4: 1 selfWeight + 1 grating + 0.75 goods + 0.75 wind',
      'strength-5: 0.6 selfWeight + 0.6 grating + 1 wind',
      'serviceability-1: 1 selfWeight + 1 grating + 1 goods',
      'serviceability-2: 1 selfWeight + 1 grating + 1 wind',
      'serviceability-3: 1 selfWeight + 1 grating + 1 goods + 1 wind',
    ]);
    expect(response.body.notices.some((notice: string) => notice.startsWith('The combinations are the default set'))).toBe(true);
    expect(result.envelope.strength.max.momentZ.length).toBe(result.envelope.strength.x.length);
    expect(result.actions.map((a: { id: string; kind: string }) => `${a.id}/${a.kind}`)).toEqual(['selfWeight/self-weight', 'grating/load-case', 'goods/load-case', 'wind/load-case']);
  });

  it('finds the worst position of a moving load and checks the combination there', async () => {
    // Two axles of 10 kN, 1 m apart, on a 6 m simple span: absolute largest moment
    // P / (2 L) (L - a / 2)^2 = 10 / 12 x 5.5^2 = 25.208 kN*m (AISC Manual, beam diagrams, case 43, from memory).
    const response = await post({
      ...beam,
      member: { length: 6, supports: [{ position: 0, type: 'pinned' }, { position: 6, type: 'roller' }] },
      section: { designation: 'IPE 240' },
      movingLoads: [{ id: 'hoist trolley', category: 'imposed', axles: [{ offset: 0, fy: -10000 }, { offset: 1, fy: -10000 }] }],
      combinations: [{ id: 'trolley', purpose: 'strength', factors: { 'hoist trolley': 1 } }],
    });
    expect(response.status).toBe(200);
    const combination = response.body.loadCombinations.combinations[0];
    expect(combination.movingLoad.extremes.momentZ.max.value).toBeCloseTo((10000 / 12) * 5.5 ** 2, 6);
    // The governing check is bending-type, largest where the moment is: the train at 2.75 m or, by symmetry, 2.25 m.
    expect(Math.min(Math.abs(combination.movingLoad.loadPosition - 2.25), Math.abs(combination.movingLoad.loadPosition - 2.75))).toBeLessThan(1e-5);
    // The same member checked with the train placed there answers the same governing utilization.
    const placed = await post({
      ...beam,
      member: { length: 6, supports: [{ position: 0, type: 'pinned' }, { position: 6, type: 'roller' }] },
      section: { designation: 'IPE 240' },
      loads: [
        { type: 'point', position: combination.movingLoad.loadPosition, fy: -10000 },
        { type: 'point', position: combination.movingLoad.loadPosition + 1, fy: -10000 },
      ],
    });
    expect(response.body.governing.utilization).toBeCloseTo(placed.body.governing.utilization, 9);
    // Largest end reaction: an axle over the support, 10 + 10 x 5 / 6 kN.
    expect(combination.movingLoad.reactions[0].max.fy.value).toBeCloseTo(10000 + (10000 * 5) / 6, 6);
  });

  it('answers the contract examples in an invented scenario', async () => {
    const response = await post(MEMBER_CHECK_COMBINATIONS_EXAMPLE);
    expect(response.status).toBe(200);
    expect(response.body.loadCombinations.combinations.length).toBe(7);
    expect(response.body.verdict).toBe('pass');
  });
});

describe('moving loads: the whole pass and every check at its worst', () => {
  const span = {
    ...beam,
    member: { length: 6, supports: [{ position: 0, type: 'pinned' }, { position: 6, type: 'roller' }] },
    section: { designation: 'IPE 300' },
    lateralTorsional: { braced: true },
  };
  // A 100 kN wheel with a 10 kN wheel 5 m behind it: alone at midspan the heavy wheel gives P L / 4 =
  // 150 kN*m, more than any position with both wheels on the span (AISC Manual, beam diagrams, case 7).
  const lorry = { id: 'lorry', category: 'imposed', axles: [{ offset: 0, fy: -100000 }, { offset: 5, fy: -10000 }] };

  it('searches the whole pass by default, the train entering and leaving the member', async () => {
    const response = await post({ ...span, movingLoads: [lorry] });
    expect(response.status).toBe(200);
    const moving = response.body.loadCombinations.combinations[0].movingLoad;
    expect(moving.extremes.momentZ.max.value).toBeCloseTo(150000, 4);
    expect(moving.extremes.momentZ.max.position).toBeCloseTo(3, 6);
    // A travel given far beyond the member is cut to where an axle stands on it: the same answer.
    const wide = await post({ ...span, movingLoads: [{ ...lorry, from: -700, to: 700 }] });
    expect(wide.status).toBe(200);
    expect(wide.body.governing.utilization).toBeCloseTo(response.body.governing.utilization, 9);
    expect(wide.body.loadCombinations.combinations[0].movingLoad.extremes.momentZ.max.value).toBeCloseTo(150000, 4);
  });

  it('finds the shear check at its worst with a wheel just off a support, although bending governs', async () => {
    // One 50 kN wheel: the end shear tends to 50 kN as the wheel nears the support.
    const response = await post({ ...span, movingLoads: [{ id: 'wheel', category: 'imposed', axles: [{ offset: 0, fy: -50000 }], step: 1.5 }] });
    const shear = (response.body.checks as Check[]).find((check) => check.mode === 'shear')!;
    const single = await post({ ...span, loads: [{ type: 'point', position: 1e-6, fy: -50000 }] });
    const shearThere = (single.body.checks as Check[]).find((check) => check.mode === 'shear')!;
    expect(shear.utilization).toBeCloseTo(shearThere.utilization, 5);
    // One entry a mode: the checks without demand at some positions do not come back beside it.
    const modes = (response.body.checks as Check[]).map((check) => check.mode);
    expect(new Set(modes).size).toBe(modes.length);
  });

  it('shows the strength state at the top when a serviceability combination governs, and says what was not checked', async () => {
    const response = await post({
      ...span,
      member: { length: 9, supports: [{ position: 0, type: 'pinned' }, { position: 9, type: 'roller' }] },
      loadCases: cases,
      combinations: [
        { id: 'factored', purpose: 'strength', factors: { grating: 1.35, goods: 1.5 } },
        { id: 'characteristic', purpose: 'serviceability', factors: { grating: 1, goods: 1 } },
      ],
      criteria: { deflectionLimitRatio: 1000 },
    });
    expect(response.status).toBe(200);
    expect(response.body.loadCombinations.governing).toBe('characteristic');
    expect(response.body.loadCombinations.shown).toBe('factored');
    // The reactions at the top are the factored ones: 1.35 x 1.2 kN/m x 3.6 m x 7.2 / 9 + 1.5 x 8 kN x 7.8 / 9 at x = 0.
    expect(response.body.reactions[0].fy).toBeCloseTo((1.35 * 1200 * 3.6 * 7.2) / 9 + (1.5 * 8000 * 7.8) / 9, 6);
    expect(response.body.loadCombinations.reactions[0].max.fy.combination).toBe('factored');
    const onlyStrength = await post({ ...span, loadCases: cases, combinations: [{ id: 'factored', purpose: 'strength', factors: { grating: 1.35, goods: 1.5 } }] });
    // Deflection applies to the member but no combination checked it: unchecked, and the verdict is not 'pass'.
    const gaps = onlyStrength.body.unchecked as { mode: string; reason: string }[];
    expect(gaps.find((gap) => gap.mode === 'deflection')?.reason).toMatch(/no serviceability combination/);
    expect(onlyStrength.body.verdict).toBe('not-verified');
    // Twist does not apply (no torque): it stays not applicable.
    expect((onlyStrength.body.notApplicable as { mode: string }[]).some((reason) => reason.mode === 'twist')).toBe(true);
    expect(onlyStrength.body.notices.some((notice: string) => notice.startsWith('No serviceability combination was given'))).toBe(true);
  });
});

describe('bad load combinations', () => {
  const expectProblem = async (body: object, status: number, pointer: string) => {
    const response = await post({ ...beam, ...body });
    expect(response.status, JSON.stringify(response.body)).toBe(status);
    expect(response.headers['content-type']).toMatch(/application\/problem\+json/);
    expect(response.body.errors.map((error: { pointer: string }) => error.pointer)).toContain(pointer);
    return response.body;
  };

  it('names a factor for an unknown action', async () => {
    const body = await expectProblem({ loadCases: cases, combinations: [{ id: 'c', purpose: 'strength', factors: { grating: 1, pallets: 1.5 } }] }, 400, '/combinations/0/factors/pallets');
    expect(body.detail).toMatch(/"grating", "goods"/);
  });
  it('refuses an empty combination', () => expectProblem({ loadCases: cases, combinations: [{ id: 'c', purpose: 'strength', factors: {} }] }, 400, '/combinations/0/factors'));
  it('refuses a moving load that is permanent', () => expectProblem({ movingLoads: [{ id: 't', category: 'permanent', axles: [{ offset: 0, fy: -1 }] }] }, 400, '/movingLoads/0/category'));
  it('refuses a combination whose factors are all 0', () => expectProblem({ loadCases: cases, combinations: [{ id: 'c', purpose: 'strength', factors: { grating: 0 } }] }, 400, '/combinations/0/factors'));
  it('refuses a travel on which no axle ever stands on the member', () =>
    expectProblem({ movingLoads: [{ id: 't', category: 'imposed', axles: [{ offset: 0, fy: -1 }], from: 5, to: 9 }] }, 400, '/movingLoads/0/from'));
  it('refuses a train longer than the member with no range', () =>
    expectProblem({ movingLoads: [{ id: 't', category: 'imposed', axles: [{ offset: 0, fy: -1000 }, { offset: 4, fy: -1000 }] }] }, 400, '/movingLoads/0/axles'));
  it('accepts that train with a range, axles off the member carrying nothing', async () => {
    const response = await post({ ...beam, movingLoads: [{ id: 't', category: 'imposed', axles: [{ offset: 0, fy: -1000 }, { offset: 4, fy: -1000 }], from: -4, to: 3.6 }] });
    expect(response.status).toBe(200);
    expect(response.body.loadCombinations.combinations[0].movingLoad.reactions[0].max.fy.value).toBeCloseTo(1000, 6);
  });
  it('refuses loads beside load cases', () => expectProblem({ loads: [goods], loadCases: cases }, 400, '/loads'));
  it('refuses two actions with one id, and the reserved id', async () => {
    await expectProblem({ loadCases: [cases[0], { ...cases[1], id: 'grating' }] }, 400, '/loadCases/1/id');
    await expectProblem({ loadCases: [{ ...cases[0], id: 'selfWeight' }] }, 400, '/loadCases/0/id');
  });
  it('refuses a combination that moves two trains', () =>
    expectProblem(
      {
        movingLoads: [
          { id: 'a', category: 'imposed', axles: [{ offset: 0, fy: -1000 }] },
          { id: 'b', category: 'imposed', axles: [{ offset: 0, fy: -1000 }] },
        ],
        combinations: [{ id: 'both', purpose: 'strength', factors: { a: 1, b: 1 } }],
      },
      400,
      '/combinations/0/factors',
    ));
  it('names a load of a case that lies off the member', () => expectProblem({ loadCases: [{ id: 'g', category: 'imposed', loads: [{ type: 'point', position: 5, fy: -1 }] }] }, 400, '/loadCases/0/loads/0/position'));
  it('refuses a travel from beyond its end', () => expectProblem({ movingLoads: [{ id: 't', category: 'imposed', axles: [{ offset: 0, fy: -1 }], from: 3, to: 1 }] }, 400, '/movingLoads/0/to'));
  it('refuses a unit that is not a length, with its pointer', () => expectProblem({ movingLoads: [{ id: 't', category: 'imposed', axles: [{ offset: '2 kN', fy: -1 }] }] }, 400, '/movingLoads/0/axles/0/offset'));
});

describe('limits on load combinations', () => {
  it(`refuses more than ${MAX_TRAIN_INTERVALS} intervals of travel with a 422 naming the step`, async () => {
    const response = await post({ ...beam, movingLoads: [{ id: 't', category: 'imposed', axles: [{ offset: 0, fy: -1 }], step: 0.001 }] });
    expect(response.status).toBe(422);
    expect(response.body.type).toBe(PROBLEMS.tooMuchWork.type);
    expect(response.body.errors[0].pointer).toBe('/movingLoads/0/step');
    expect(response.body.detail).toContain(String(MAX_TRAIN_INTERVALS));
  });
  it(`refuses more than ${MAX_LOAD_STATES} load states with a 422 naming the limit`, async () => {
    const combinations = Array.from({ length: 12 }, (_, i) => ({ id: `c${i}`, purpose: 'strength', factors: { t: 1 + i / 10 } }));
    const response = await post({ ...beam, movingLoads: [{ id: 't', category: 'imposed', axles: [{ offset: 0, fy: -1 }], step: 0.0036 }], combinations });
    expect(response.status).toBe(422);
    expect(response.body.type).toBe(PROBLEMS.tooMuchWork.type);
    expect(response.body.detail).toContain(String(MAX_LOAD_STATES));
  });
  it('refuses more envelope points than a moving load may have, naming output.samples', async () => {
    const response = await post({ ...beam, movingLoads: [{ id: 't', category: 'imposed', axles: [{ offset: 0, fy: -1 }] }], output: { samples: 5001 } });
    expect(response.status).toBe(422);
    expect(response.body.type).toBe(PROBLEMS.tooMuchWork.type);
    expect(response.body.errors[0].pointer).toBe('/output/samples');
    expect(response.body.detail).toContain('5001');
  });
  it(`shares ${MAX_BATCH_LOAD_STATES} load states among the items of a batch: an item beyond is a 422 of its own`, async () => {
    const item = { ...beam, movingLoads: [{ id: 't', category: 'imposed', axles: [{ offset: 0, fy: -1 }], step: 0.0036 }], combinations: Array.from({ length: 9 }, (_, i) => ({ id: `c${i}`, purpose: 'strength', factors: { t: 1 } })) };
    // 9 combinations x 1,001 positions + 11 envelope points = 9,020 load states an item: two fit in 20,000, the third does not.
    const response = await request(app.server).post('/v1/member-checks/batch').send({ items: [item, item, item, beam] });
    expect(response.status).toBe(200);
    expect(response.body.results.map((r: { status: number }) => r.status)).toEqual([200, 200, 422, 200]);
    expect(response.body.results[2].error.type).toBe(PROBLEMS.tooMuchWork.type);
    expect(response.body.results[2].error.errors[0].pointer).toBe('/items/2/combinations');
  }, 60_000);
});

describe('sizing with load combinations', () => {
  it('refuses to select a section that is not verified: a strength combination alone leaves deflection unchecked', async () => {
    const response = await request(app.server)
      .post('/v1/member-sizing')
      .send({ ...beam, section: undefined, loadCases: cases, combinations: [sizingCombinations[0]], candidates: { family: 'IPE' } });
    expect(response.status).toBe(422);
    expect(response.body.detail).toContain('It is not verified: deflection');
  });

  it('sizes against the governing combination', async () => {
    const response = await request(app.server)
      .post('/v1/member-sizing')
      .send({ ...beam, section: undefined, loadCases: cases, combinations: sizingCombinations, candidates: { family: 'IPE' } });
    expect(response.status, JSON.stringify(response.body).slice(0, 300)).toBe(200);
    const selected = response.body.selected;
    // The selected section checked on its own with the same combination answers the same utilization and passes.
    const single = await post({ ...beam, section: { designation: selected.designation }, loadCases: cases, combinations: sizingCombinations });
    expect(single.body.verdict).toBe('pass');
    expect(response.body.candidates[0].utilization).toBeCloseTo(single.body.governing.utilization, 12);
    expect(selected.result.loadCombinations.governing).toBe('heavy');
    // The next lighter IPE fails under the factored loads.
    const failing = (response.body.candidates as { verdict: string; massPerLength: number }[]).filter((c) => c.verdict === 'fail');
    expect(failing.length).toBeGreaterThan(0);
    expect(Math.max(...failing.map((c) => c.massPerLength))).toBeLessThan(response.body.candidates[0].massPerLength);
  });
});
