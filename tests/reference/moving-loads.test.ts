/**
 * Runs every moving-load reference case (tests/reference/moving-loads/*.json, each naming its handbook
 * table and case) through the engine and through POST /v1/member-checks, and compares the extremes over
 * every train position (value, where on the member, where the train stood) and the reaction bounds.
 * The format and the comparison rule are in tests/reference/README.md.
 */

import type { FastifyInstance } from 'fastify';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { checkRequest } from '../../src/api/member-check.js';
import { memberCheckRequest } from '../../src/api/schemas/member-check-request.js';
import type { DiagramField } from '../../src/engine/analysis/result.js';
import { closeOnScale, COMPONENT_KIND, FIELD_KIND, readReferenceCases, scalesByKind, type Component, type Kind } from '../support/reference-cases.js';
import { embeddedCatalogues, testApp } from '../support/test-app.js';

type End = 'max' | 'min';
/** One place where an extreme is reached; an extreme reached at several equally correct places lists each. */
interface Location {
  position?: number;
  loadPosition?: number;
}
interface ExpectedBound {
  value: number;
  /** Absent: the extreme holds on a stretch (of the member or of the travel), only the value is compared. */
  at?: Location[];
}
interface ReferenceCase {
  name: string;
  source: string;
  derivation: string;
  tolerance: number;
  request: Record<string, unknown> & { member: { length: number } };
  expected: {
    combination: string;
    extremes?: Partial<Record<DiagramField, Partial<Record<End, ExpectedBound>>>>;
    reactions?: Partial<Record<End, Partial<Record<Component, ExpectedBound>>>>[];
  };
}

/** What the engine and the route both give for a combination with a moving load. */
interface MovingLoadView {
  id: string;
  extremes: Record<DiagramField, Record<End, { value: number; position: number; loadPosition: number }>>;
  reactions: readonly Record<End, Record<Component, { value: number; loadPosition: number }>>[];
}

const cases = readReferenceCases<ReferenceCase>('moving-loads', import.meta.url);

const ENDS: readonly End[] = ['max', 'min'];

const expectedExtremes = (reference: ReferenceCase) => Object.entries(reference.expected.extremes ?? {}) as [DiagramField, Partial<Record<End, ExpectedBound>>][];

/** The comparison scales of tests/reference/README.md: by kind, from the case's own expected numbers. */
function scales(reference: ReferenceCase): Record<Kind, number> {
  const largest: Record<Kind, number> = { force: 0, moment: 0, length: 0, rotation: 0 };
  const note = (kind: Kind, value: number) => (largest[kind] = Math.max(largest[kind], Math.abs(value)));
  for (const [field, bounds] of expectedExtremes(reference)) {
    for (const end of ENDS) if (bounds[end]) note(FIELD_KIND[field], (bounds[end] as ExpectedBound).value);
  }
  for (const reaction of reference.expected.reactions ?? []) {
    for (const end of ENDS) {
      for (const [component, bound] of Object.entries(reaction[end] ?? {}) as [Component, ExpectedBound][]) note(COMPONENT_KIND[component], bound.value);
    }
  }
  return scalesByKind(largest, reference.request.member.length);
}

const close = closeOnScale;

/** The actual place matches one of the expected places: every coordinate it gives within tolerance * L. */
function closeToOneOf(actual: Location, expected: readonly Location[], tolerance: number, L: number, what: string): void {
  const matches = (location: Location) =>
    (['position', 'loadPosition'] as const).every((key) => location[key] === undefined || Math.abs((actual[key] as number) - (location[key] as number)) <= tolerance * L);
  expect(expected.some(matches), `${what}: got ${JSON.stringify(actual)}, expected one of ${JSON.stringify(expected)}`).toBe(true);
}

function compare(actual: MovingLoadView, reference: ReferenceCase): void {
  const scale = scales(reference);
  const L = reference.request.member.length;
  const { tolerance } = reference;
  for (const [field, bounds] of expectedExtremes(reference)) {
    for (const end of ENDS) {
      const expected = bounds[end];
      if (!expected) continue;
      const got = actual.extremes[field][end];
      close(got.value, expected.value, tolerance, scale[FIELD_KIND[field]], `${field} ${end}`);
      if (expected.at) closeToOneOf({ position: got.position, loadPosition: got.loadPosition }, expected.at, tolerance, L, `${field} ${end} place`);
    }
  }
  expect(actual.reactions.length).toBeGreaterThanOrEqual((reference.expected.reactions ?? []).length);
  (reference.expected.reactions ?? []).forEach((reaction, i) => {
    for (const end of ENDS) {
      for (const [component, expected] of Object.entries(reaction[end] ?? {}) as [Component, ExpectedBound][]) {
        const got = actual.reactions[i]?.[end][component] as { value: number; loadPosition: number };
        close(got.value, expected.value, tolerance, scale[COMPONENT_KIND[component]], `reaction ${i} ${component} ${end}`);
        if (expected.at) closeToOneOf({ loadPosition: got.loadPosition }, expected.at, tolerance, L, `reaction ${i} ${component} ${end} place`);
      }
    }
  });
}

function movingLoadIds(reference: ReferenceCase): string[] {
  return ((reference.request.movingLoads ?? []) as { id: string }[]).map((train) => train.id);
}

describe('moving-load reference cases', () => {
  let app: FastifyInstance;
  beforeAll(async () => {
    app = await testApp();
  });
  afterAll(async () => {
    await app.close();
  });

  it('holds at least 5 cases, each with a source, a derivation and one moving load', () => {
    expect(cases.length).toBeGreaterThanOrEqual(5);
    for (const { file, reference } of cases) {
      expect(reference.source, file).toMatch(/\w{3,}/);
      expect(reference.derivation, file).toMatch(/\w{3,}/);
      expect(movingLoadIds(reference), file).toHaveLength(1);
    }
  });

  describe.each(cases)('$file', ({ reference }) => {
    const combinationId = reference.expected.combination;

    it(`engine: ${reference.name}`, async () => {
      const { checked } = checkRequest(memberCheckRequest.parse(reference.request), await embeddedCatalogues());
      const result = checked.combinations?.results.find((candidate) => candidate.combination.id === combinationId);
      expect(result?.movingLoad, `combination ${combinationId} with a moving load`).toBeTruthy();
      const movingLoad = result?.movingLoad as NonNullable<NonNullable<typeof result>['movingLoad']>;
      expect(movingLoad.id).toBe(movingLoadIds(reference)[0]);
      compare(movingLoad, reference);
    });

    it(`route: ${reference.name}`, async () => {
      const response = await request(app.server).post('/v1/member-checks').send(reference.request);
      expect(response.status, JSON.stringify(response.body)).toBe(200);
      const body = response.body as {
        loadCombinations: {
          combinations: {
            id: string;
            movingLoad?: MovingLoadView & { loadPosition: number; envelope: { x: number[]; max: Record<DiagramField, number[]>; min: Record<DiagramField, number[]> } };
          }[];
        };
      };
      const movingLoad = body.loadCombinations.combinations.find((candidate) => candidate.id === combinationId)?.movingLoad;
      expect(movingLoad, `combination ${combinationId} with a moving load`).toBeTruthy();
      if (!movingLoad) return;
      expect(movingLoad.id).toBe(movingLoadIds(reference)[0]);
      expect(Number.isFinite(movingLoad.loadPosition)).toBe(true);
      compare(movingLoad, reference);

      // The envelope samples the positions searched: it never goes beyond the exact extremes.
      const scale = scales(reference);
      for (const [field, bounds] of expectedExtremes(reference)) {
        const slack = reference.tolerance * scale[FIELD_KIND[field]];
        expect(movingLoad.envelope.max[field]).toHaveLength(movingLoad.envelope.x.length);
        if (bounds.max) expect(Math.max(...movingLoad.envelope.max[field]), `${field} envelope max`).toBeLessThanOrEqual(bounds.max.value + slack);
        if (bounds.min) expect(Math.min(...movingLoad.envelope.min[field]), `${field} envelope min`).toBeGreaterThanOrEqual(bounds.min.value - slack);
      }
    });
  });
});
