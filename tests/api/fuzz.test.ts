/**
 * Fuzzing every route through inject (fast-check): random JSON and mutations of each route's own
 * example. Whatever is sent, the answer is never a 5xx; a 4xx is application/problem+json with a type,
 * and an invalid-input problem names its fields by JSON pointer; a 2xx JSON answer holds no null and
 * only finite numbers. FUZZ_RUNS sets the runs a route (default 40; e.g. FUZZ_RUNS=100000 for a long run).
 */

import type { FastifyInstance } from 'fastify';
import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { routeContracts } from '../../src/app.js';
import { PROBLEMS } from '../../src/api/problems.js';
import { testApp } from '../support/test-app.js';

const RUNS = Number(process.env.FUZZ_RUNS ?? 40);

let app: FastifyInstance;
beforeAll(async () => {
  // No answer cache: every body is computed.
  app = await testApp({ answerCacheBytes: 0 });
});
afterAll(async () => {
  await app.close();
});

/** Values a field may be given: of every JSON type, with the awkward ones weighted in. */
const awkward = fc.oneof(
  fc.constantFrom(null, true, false, 0, -0, -1, 1e308, -1e308, 5e-324, '', ' ', '1e999 m', '-0 mm', 'NaN', 'Infinity kN', '3.6 m', '12 kN', 'IPE 200', 'S355', '__proto__', 'constructor', '\u0000', '{}'),
  fc.double(),
  fc.integer(),
  fc.string({ maxLength: 12 }),
  fc.array(fc.jsonValue({ maxDepth: 1 }), { maxLength: 3 }),
  fc.dictionary(fc.string({ maxLength: 6 }), fc.jsonValue({ maxDepth: 1 }), { maxKeys: 3 }),
);

type Json = null | boolean | number | string | Json[] | { [key: string]: Json };

/** Every path to a value inside a JSON document. */
function paths(value: Json, prefix: (string | number)[] = []): (string | number)[][] {
  const here = [prefix];
  if (Array.isArray(value)) return [...here, ...value.flatMap((item, i) => paths(item, [...prefix, i]))];
  if (value !== null && typeof value === 'object') return [...here, ...Object.entries(value).flatMap(([key, item]) => paths(item, [...prefix, key]))];
  return here;
}

/** A copy of `document` with one mutation at `path`: replaced, removed, or given an unknown sibling. */
function mutated(document: Json, path: readonly (string | number)[], kind: 'replace' | 'remove' | 'add', value: unknown): unknown {
  const copy = structuredClone(document) as Json;
  if (path.length === 0) return kind === 'replace' ? value : copy;
  const parent = path.slice(0, -1).reduce<Json>((node, key) => (node as Record<string, Json>)[key as string] as Json, copy) as Record<string | number, unknown>;
  const last = path[path.length - 1] as string | number;
  if (kind === 'replace') parent[last] = value;
  else if (kind === 'remove') {
    if (Array.isArray(parent)) parent.splice(last as number, 1);
    else delete parent[last];
  } else if (!Array.isArray(parent)) parent['unexpectedField'] = value;
  return copy;
}

function assertAnswer(status: number, contentType: string, body: string, sent: unknown): void {
  const context = `${status} for ${JSON.stringify(sent)?.slice(0, 300)}: ${body.slice(0, 300)}`;
  expect(status, context).toBeLessThan(500);
  if (status >= 400) {
    expect(contentType, context).toMatch(/^application\/problem\+json/);
    const problem = JSON.parse(body) as { type: string; status: number; errors?: { pointer: string }[] };
    expect(Object.values(PROBLEMS).map((p) => p.type), context).toContain(problem.type);
    expect(problem.status, context).toBe(status);
    if (problem.type === PROBLEMS.invalidInput.type && problem.errors) {
      for (const error of problem.errors) expect(error.pointer, context).toMatch(/^(\/.*)?$/);
    }
    return;
  }
  if (!contentType.startsWith('application/json')) return;
  const walk = (value: unknown): void => {
    expect(value, context).not.toBeNull();
    if (typeof value === 'number') expect(Number.isFinite(value), context).toBe(true);
    else if (Array.isArray(value)) value.forEach(walk);
    else if (typeof value === 'object') Object.values(value as object).forEach(walk);
  };
  walk(JSON.parse(body));
}

const posts = routeContracts().filter((contract) => contract.method === 'post' && contract.exampleBody !== undefined);

/** Each route with each of its published examples (the load-combination ones included). */
const fuzzed = posts.flatMap((contract) => [
  { path: contract.path, name: 'example', contract, example: contract.exampleBody as Json },
  ...Object.entries(contract.moreExamples ?? {}).map(([name, example]) => ({ path: contract.path, name, contract, example: example.value as Json })),
]);

describe.each(fuzzed)('fuzzing POST $path ($name)', ({ contract, example }) => {
  const examplePaths = paths(example);

  it('answers random JSON with a problem, never a 5xx', async () => {
    await fc.assert(
      fc.asyncProperty(fc.jsonValue({ maxDepth: 3 }), async (body) => {
        const response = await app.inject({ method: 'POST', url: contract.path, payload: JSON.stringify(body), headers: { 'content-type': 'application/json' } });
        assertAnswer(response.statusCode, String(response.headers['content-type'] ?? ''), response.body, body);
      }),
      { numRuns: RUNS },
    );
  }, 120_000);

  it('answers every mutation of its example without a 5xx, NaN, Infinity or null', async () => {
    await fc.assert(
      fc.asyncProperty(fc.constantFrom(...examplePaths), fc.constantFrom('replace', 'remove', 'add') as fc.Arbitrary<'replace' | 'remove' | 'add'>, awkward, async (path, kind, value) => {
        const body = mutated(example, path, kind, value);
        const response = await app.inject({ method: 'POST', url: contract.path, payload: JSON.stringify(body), headers: { 'content-type': 'application/json' } });
        assertAnswer(response.statusCode, String(response.headers['content-type'] ?? ''), response.body, body);
      }),
      { numRuns: RUNS * 2 },
    );
  }, 240_000);
});

describe('fuzzing raw bodies', () => {
  it('answers bytes that are not JSON with a problem', async () => {
    await fc.assert(
      fc.asyncProperty(fc.string({ maxLength: 40 }), fc.constantFrom(...posts.map((contract) => contract.path)), async (text, url) => {
        const response = await app.inject({ method: 'POST', url, payload: text, headers: { 'content-type': 'application/json' } });
        assertAnswer(response.statusCode, String(response.headers['content-type'] ?? ''), response.body, text);
      }),
      { numRuns: RUNS },
    );
  });
});
