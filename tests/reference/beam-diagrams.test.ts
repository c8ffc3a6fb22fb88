/**
 * Runs every beam-diagram reference case (tests/reference/beam-diagrams/*.json, each naming its
 * handbook table and case) through the engine and through POST /v1/member-checks.
 */

import type { FastifyInstance } from 'fastify';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { checkRequest } from '../../src/api/member-check.js';
import { memberCheckRequest } from '../../src/api/schemas/member-check-request.js';
import { fieldAt } from '../../src/engine/analysis/field-values.js';
import type { DiagramField, MemberAnalysis } from '../../src/engine/analysis/result.js';
import { closeOnScale, COMPONENT_KIND, FIELD_KIND, readReferenceCases, scalesByKind, type Component, type Kind } from '../support/reference-cases.js';
import { embeddedCatalogues, testApp } from '../support/test-app.js';

interface ExpectedExtreme {
  value: number;
  position?: number;
}
interface ReferenceCase {
  name: string;
  source: string;
  derivation: string;
  tolerance: number;
  request: Record<string, unknown> & { member: { length: number } };
  expected: {
    reactions?: Partial<Record<Component, number>>[];
    extremes?: Partial<Record<DiagramField, { max?: ExpectedExtreme; min?: ExpectedExtreme }>>;
    values?: { field: DiagramField; position: number; side?: 'left' | 'right'; value: number }[];
  };
}

const cases = readReferenceCases<ReferenceCase>('beam-diagrams', import.meta.url);


/** The comparison scales of tests/reference/README.md: by kind, from the case's own expected numbers. */
function scales(reference: ReferenceCase): Record<Kind, number> {
  const largest: Record<Kind, number> = { force: 0, moment: 0, length: 0, rotation: 0 };
  const note = (kind: Kind, value: number) => (largest[kind] = Math.max(largest[kind], Math.abs(value)));
  for (const reaction of reference.expected.reactions ?? []) {
    for (const [component, value] of Object.entries(reaction)) note(COMPONENT_KIND[component as Component], value as number);
  }
  for (const [field, extremes] of Object.entries(reference.expected.extremes ?? {})) {
    for (const extreme of [extremes?.max, extremes?.min]) if (extreme) note(FIELD_KIND[field as DiagramField], extreme.value);
  }
  for (const value of reference.expected.values ?? []) note(FIELD_KIND[value.field], value.value);
  return scalesByKind(largest, reference.request.member.length);
}

const close = closeOnScale;

async function analyseThroughEngine(body: unknown): Promise<MemberAnalysis> {
  return checkRequest(memberCheckRequest.parse(body), await embeddedCatalogues()).checked.analysis;
}

describe('beam-diagram reference cases', () => {
  let app: FastifyInstance;
  beforeAll(async () => {
    app = await testApp();
  });
  afterAll(async () => {
    await app.close();
  });

  it('holds at least 25 cases, each with a source and a derivation', () => {
    expect(cases.length).toBeGreaterThanOrEqual(25);
    for (const { file, reference } of cases) {
      expect(reference.source, file).toMatch(/\w{3,}/);
      expect(reference.derivation, file).toMatch(/\w{3,}/);
    }
  });

  describe.each(cases)('$file', ({ reference }) => {
    const scale = scales(reference);
    const L = reference.request.member.length;
    const tolerance = reference.tolerance;

    it(`engine: ${reference.name}`, async () => {
      const analysis = await analyseThroughEngine(reference.request);
      (reference.expected.reactions ?? []).forEach((expected, i) => {
        for (const [component, value] of Object.entries(expected) as [Component, number][]) {
          close(analysis.reactions[i]?.[component] as number, value, tolerance, scale[COMPONENT_KIND[component]], `reaction ${i} ${component}`);
        }
      });
      for (const [field, extremes] of Object.entries(reference.expected.extremes ?? {}) as [DiagramField, { max?: ExpectedExtreme; min?: ExpectedExtreme }][]) {
        for (const end of ['max', 'min'] as const) {
          const expected = extremes[end];
          if (!expected) continue;
          const actual = analysis.extremes[field][end];
          close(actual.value, expected.value, tolerance, scale[FIELD_KIND[field]], `${field} ${end}`);
          if (expected.position !== undefined) close(actual.position, expected.position, tolerance, L, `${field} ${end} position`);
        }
      }
      for (const value of reference.expected.values ?? []) {
        const actual = fieldAt(analysis, value.field, value.position, value.side ?? 'right');
        close(actual, value.value, tolerance, scale[FIELD_KIND[value.field]], `${value.field} at ${value.position} ${value.side ?? ''}`);
      }
      expect(analysis.equilibrium.force).toBeLessThanOrEqual(1e-9);
      expect(analysis.equilibrium.moment).toBeLessThanOrEqual(1e-9);
    });

    it(`route: ${reference.name}`, async () => {
      const response = await request(app.server).post('/v1/member-checks').send(reference.request);
      expect(response.status, JSON.stringify(response.body)).toBe(200);
      const body = response.body as {
        reactions: Record<Component, number>[];
        extremes: Record<DiagramField, { max: { value: number; position: number }; min: { value: number; position: number } }>;
      };
      (reference.expected.reactions ?? []).forEach((expected, i) => {
        for (const [component, value] of Object.entries(expected) as [Component, number][]) {
          close(body.reactions[i]?.[component] as number, value, tolerance, scale[COMPONENT_KIND[component]], `reaction ${i} ${component}`);
        }
      });
      for (const [field, extremes] of Object.entries(reference.expected.extremes ?? {}) as [DiagramField, { max?: ExpectedExtreme; min?: ExpectedExtreme }][]) {
        for (const end of ['max', 'min'] as const) {
          const expected = extremes[end];
          if (!expected) continue;
          close(body.extremes[field][end].value, expected.value, tolerance, scale[FIELD_KIND[field]], `${field} ${end}`);
          if (expected.position !== undefined) close(body.extremes[field][end].position, expected.position, tolerance, L, `${field} ${end} position`);
        }
      }
    });
  });
});
