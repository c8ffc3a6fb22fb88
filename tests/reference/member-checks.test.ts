/**
 * Runs every failure-check reference case (tests/reference/member-checks/*.json, each naming the
 * formula and source its expected numbers were derived from by hand) through POST /v1/member-checks
 * and compares the checks, the governing failure, the verdict, buckling and the stresses.
 * The format and the comparison rule are in tests/reference/README.md.
 */

import { readdirSync, readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import type { FastifyInstance } from 'fastify';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FAILURE_MODES, type FailureMode } from '../../src/engine/checks/failure-mode.js';
import { testApp } from '../support/test-app.js';

interface ExpectedCheck {
  demand?: number;
  capacity?: number;
  utilization?: number;
  /** null: the response leaves it out (no demand). */
  safetyFactor?: number | null;
  passes?: boolean;
  /** m; null: the response leaves it out. */
  position?: number | null;
}

const BUCKLING_NUMBERS = ['slendernessRatio', 'transitionSlendernessRatio', 'criticalLoad', 'criticalStress', 'effectiveLengthFactor'] as const;
type BucklingNumber = (typeof BUCKLING_NUMBERS)[number];
type ExpectedBucklingAxis = Partial<Record<BucklingNumber, number>> & { regime?: 'euler' | 'johnson' | 'none' };

const LATERAL_TORSIONAL_NUMBERS = ['criticalMoment', 'momentGradientFactor', 'unbracedLength', 'effectiveLength'] as const;
type LateralTorsionalNumber = (typeof LATERAL_TORSIONAL_NUMBERS)[number];

interface ReferenceCase {
  name: string;
  source: string;
  derivation: string;
  tolerance: number;
  request: Record<string, unknown>;
  expected: {
    verdict?: 'pass' | 'fail' | 'not-verified';
    /** The modes that apply but are not evaluated, in order. */
    unchecked?: FailureMode[];
    /** null: no check has any demand, the response has no governing failure. */
    governing?: { mode: FailureMode; utilization?: number } | null;
    checks?: Partial<Record<FailureMode, ExpectedCheck>>;
    /** The governing axis; `axis` names it, `axes` gives other axes by name. */
    buckling?: ExpectedBucklingAxis & { axis?: string; axes?: Record<string, ExpectedBucklingAxis> };
    lateralTorsionalBuckling?: Partial<Record<LateralTorsionalNumber, number>>;
    notApplicable?: FailureMode[];
    stresses?: Record<string, number>;
  };
}

interface ResponseCheck {
  mode: FailureMode;
  quantity: string;
  demand: number;
  capacity: number;
  safetyFactor?: number;
  requiredSafetyFactor: number;
  utilization: number;
  passes: boolean;
  position?: number;
}
type ResponseBucklingAxis = Record<BucklingNumber, number> & { axis: string; regime: string };
interface CheckResponse {
  member: { length: number };
  checks: ResponseCheck[];
  notApplicable: { mode: FailureMode; reason: string }[];
  governing?: { mode: FailureMode; utilization: number };
  verdict: 'pass' | 'fail' | 'not-verified';
  unchecked: { mode: FailureMode; reason: string }[];
  buckling: { governing: ResponseBucklingAxis; axes: ResponseBucklingAxis[] };
  lateralTorsionalBuckling?: Record<LateralTorsionalNumber, number>;
  stresses: Record<string, { value: number }>;
}

const folder = fileURLToPath(new URL('./member-checks/', import.meta.url));
const cases = readdirSync(folder)
  .filter((name) => name.endsWith('.json'))
  .sort()
  .map((file) => ({ file, reference: JSON.parse(readFileSync(folder + file, 'utf8')) as ReferenceCase }));

/** |actual - expected| <= tolerance * scale. */
function within(actual: unknown, expected: number, tolerance: number, scale: number, what: string): void {
  expect(typeof actual, `${what}: missing (expected ${expected})`).toBe('number');
  expect(Math.abs((actual as number) - expected), `${what}: got ${actual}, expected ${expected}`).toBeLessThanOrEqual(tolerance * scale);
}

/** Relative: the scale is |expected|, or zeroScale when the expected value is 0. */
function close(actual: unknown, expected: number, tolerance: number, zeroScale: number, what: string): void {
  within(actual, expected, tolerance, expected === 0 ? zeroScale : Math.abs(expected), what);
}

function compareCheck(actual: ResponseCheck, expected: ExpectedCheck, tolerance: number, length: number): void {
  const mode = actual.mode;
  const capacityScale = expected.capacity ?? actual.capacity;
  for (const field of ['demand', 'capacity'] as const) {
    const value = expected[field];
    if (value !== undefined) close(actual[field], value, tolerance, capacityScale, `${mode} ${field}`);
  }
  // A zero utilization is compared at the scale of a demand of tolerance * capacity.
  if (expected.utilization !== undefined) close(actual.utilization, expected.utilization, tolerance, actual.requiredSafetyFactor, `${mode} utilization`);
  if (expected.safetyFactor === null) expect(actual.safetyFactor, `${mode} safetyFactor`).toBeUndefined();
  else if (expected.safetyFactor !== undefined) close(actual.safetyFactor, expected.safetyFactor, tolerance, 0, `${mode} safetyFactor`);
  if (expected.passes !== undefined) expect(actual.passes, `${mode} passes`).toBe(expected.passes);
  if (expected.position === null) expect(actual.position, `${mode} position`).toBeUndefined();
  else if (expected.position !== undefined) within(actual.position, expected.position, tolerance, length, `${mode} position`);
}

function compareBucklingAxis(actual: ResponseBucklingAxis, expected: ExpectedBucklingAxis, tolerance: number, what: string): void {
  if (expected.regime !== undefined) expect(actual.regime, `${what} regime`).toBe(expected.regime);
  for (const field of BUCKLING_NUMBERS) {
    const value = expected[field];
    if (value !== undefined) close(actual[field], value, tolerance, 0, `${what} ${field}`);
  }
}

describe('member-check reference cases', () => {
  let app: FastifyInstance;
  beforeAll(async () => {
    app = await testApp();
  });
  afterAll(async () => {
    await app.close();
  });

  it('holds at least 12 cases, each with a source, a derivation, a tolerance and known modes', () => {
    expect(cases.length).toBeGreaterThanOrEqual(12);
    for (const { file, reference } of cases) {
      expect(reference.source, file).toMatch(/\w{3,}/);
      expect(reference.derivation, file).toMatch(/\w{3,}/);
      expect(reference.tolerance, file).toBeGreaterThan(0);
      const modes = [
        ...Object.keys(reference.expected.checks ?? {}),
        ...(reference.expected.notApplicable ?? []),
        ...(reference.expected.governing ? [reference.expected.governing.mode] : []),
      ];
      for (const mode of modes) expect(FAILURE_MODES, `${file}: ${mode}`).toContain(mode);
    }
  });

  describe.each(cases)('$file', ({ reference }) => {
    it(reference.name, async () => {
      const response = await request(app.server).post('/v1/member-checks').send(reference.request);
      expect(response.status, JSON.stringify(response.body)).toBe(200);
      const body = response.body as CheckResponse;
      const { expected, tolerance } = reference;
      const length = body.member.length;

      if (expected.verdict !== undefined) expect(body.verdict, 'verdict').toBe(expected.verdict);
      expect(body.unchecked.map((gap) => gap.mode), 'unchecked').toEqual(expected.unchecked ?? []);
      if (expected.governing === null) expect(body.governing, 'governing').toBeUndefined();
      else if (expected.governing !== undefined) {
        expect(body.governing?.mode, 'governing mode').toBe(expected.governing.mode);
        if (expected.governing.utilization !== undefined) {
          close(body.governing?.utilization, expected.governing.utilization, tolerance, 0, 'governing utilization');
        }
      }

      for (const [mode, check] of Object.entries(expected.checks ?? {}) as [FailureMode, ExpectedCheck][]) {
        const found = body.checks.filter((candidate) => candidate.mode === mode);
        expect(found, `checks of mode ${mode}`).toHaveLength(1);
        compareCheck(found[0] as ResponseCheck, check, tolerance, length);
      }

      for (const mode of expected.notApplicable ?? []) {
        expect(body.notApplicable.map((entry) => entry.mode), `${mode} not applicable`).toContain(mode);
        expect(body.checks.map((check) => check.mode), `${mode} not checked`).not.toContain(mode);
      }

      if (expected.buckling !== undefined) {
        const { axis, axes, ...governing } = expected.buckling;
        if (axis !== undefined) expect(body.buckling.governing.axis, 'buckling governing axis').toBe(axis);
        compareBucklingAxis(body.buckling.governing, governing, tolerance, 'buckling');
        for (const [name, other] of Object.entries(axes ?? {})) {
          const found = body.buckling.axes.find((candidate) => candidate.axis === name);
          expect(found, `buckling axis ${name}`).toBeDefined();
          compareBucklingAxis(found as ResponseBucklingAxis, other, tolerance, `buckling axis ${name}`);
        }
      }

      if (expected.lateralTorsionalBuckling !== undefined) {
        expect(body.lateralTorsionalBuckling, 'lateralTorsionalBuckling').toBeDefined();
        for (const field of LATERAL_TORSIONAL_NUMBERS) {
          const value = expected.lateralTorsionalBuckling[field];
          if (value !== undefined) close(body.lateralTorsionalBuckling?.[field], value, tolerance, 0, `lateralTorsionalBuckling ${field}`);
        }
      }

      // An expected zero stress is compared at the scale of the case's strengths (its stress checks' capacities).
      const strengthScale = Math.max(0, ...body.checks.filter((check) => check.quantity === 'stress').map((check) => check.capacity));
      for (const [name, value] of Object.entries(expected.stresses ?? {})) {
        close(body.stresses[name]?.value, value, tolerance, strengthScale, `stresses ${name}`);
      }
    });
  });
});
