/**
 * The committed contract as a strict JSON Schema 2020-12 validator (Ajv 2020) reads it: every request
 * example and every answer the routes give to them validate against the document, and unknown fields
 * are refused, as the service refuses them.
 */

import type { FastifyInstance } from 'fastify';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { routeContracts } from '../../../src/app.js';
import { checkExchange, contractDocument as document, contractViolations, validatorOf, type Schema } from '../../support/strict-contract.js';
import { testApp } from '../../support/test-app.js';

const posts = routeContracts().filter((contract) => contract.method === 'post' && contract.exampleBody !== undefined);
const examples = posts.flatMap((contract) => [
  { path: contract.path, name: 'example', body: contract.exampleBody, json: (contract.responseMediaType ?? 'application/json') === 'application/json' },
  ...Object.entries(contract.moreExamples ?? {}).map(([name, example]) => ({ path: contract.path, name, body: example.value, json: true })),
]);

let app: FastifyInstance;
beforeAll(async () => {
  app = await testApp();
});
afterAll(async () => {
  await app.close();
});

describe('the contract under a strict JSON Schema 2020-12 validator', () => {
  it.each(examples)('accepts the $name request of $path and its answer', async ({ path, body, json }) => {
    const operation = document.paths[path]?.post;
    const requestSchema = operation?.requestBody?.content['application/json']?.schema as Schema;
    const validateRequest = validatorOf(requestSchema);
    expect(validateRequest(body), JSON.stringify(validateRequest.errors)).toBe(true);
    if (!json) return;
    const answer = await request(app.server).post(path).send(body as object);
    expect(answer.status).toBe(200);
    const validateAnswer = validatorOf(operation?.responses['200']?.content?.['application/json']?.schema as Schema);
    expect(validateAnswer(answer.body), JSON.stringify(validateAnswer.errors?.slice(0, 3))).toBe(true);
  });

  it.each(examples)('refuses an unknown field in the $name request of $path, as the service does', async ({ path, body }) => {
    const validateRequest = validatorOf(document.paths[path]?.post?.requestBody?.content['application/json']?.schema as Schema);
    const withUnknown = { ...(body as object), unexpected: true };
    expect(validateRequest(withUnknown)).toBe(false);
    expect((await request(app.server).post(path).send(withUnknown)).status).toBe(400);
  });

  it('accepts a batch whose items carry ids and members (the BatchItem composition)', () => {
    const validate = validatorOf({ $ref: '#/components/schemas/BatchRequest' });
    const item = (posts.find((contract) => contract.path === '/v1/member-checks')?.exampleBody ?? {}) as object;
    expect(validate({ items: [{ id: 'line-1', ...item }, { id: 7, ...item }] }), JSON.stringify(validate.errors?.slice(0, 3))).toBe(true);
    expect(validate({ items: [{ id: 'line-1', ...item, colour: 'red' }] })).toBe(false);
  });
});

describe('every exchange of the test apps is checked against the contract', () => {
  const example = posts.find((contract) => contract.path === '/v1/member-checks')?.exampleBody as Record<string, unknown>;

  it('records a body the service took that the contract refuses, and a refused body is no disagreement', () => {
    const before = contractViolations.length;
    checkExchange('POST', '/v1/member-checks', 400, { ...example, colour: 'red' }, undefined);
    expect(contractViolations).toHaveLength(before);
    checkExchange('POST', '/v1/member-checks', 200, { ...example, colour: 'red' }, undefined);
    expect(contractViolations).toHaveLength(before + 1);
    expect(contractViolations.at(-1)).toMatch(/^POST \/v1\/member-checks answered 200 to a body the contract refuses: .*colour/);
    contractViolations.splice(before);
  });

  it('records an answer that is not what the contract describes for its status', () => {
    const before = contractViolations.length;
    checkExchange('POST', '/v1/member-checks', 200, example, JSON.stringify({ verdict: 'pass' }));
    expect(contractViolations.at(-1)).toMatch(/^POST \/v1\/member-checks 200: the answer is not what the contract describes/);
    contractViolations.splice(before);
  });

  it('holds a batch to the items the service took: a refused item is answered on its own', () => {
    const before = contractViolations.length;
    const body = { items: [example, { ...example, colour: 'red' }] };
    checkExchange('POST', '/v1/member-checks/batch', 200, body, JSON.stringify({ results: [{ index: 0, status: 200 }, { index: 1, status: 400 }] }));
    // The made-up answer above is not a whole batch answer; only the request side is looked at here.
    expect(contractViolations.slice(before).filter((line) => line.includes('body the contract refuses'))).toEqual([]);
    checkExchange('POST', '/v1/member-checks/batch', 200, body, JSON.stringify({ results: [{ index: 0, status: 200 }, { index: 1, status: 200 }] }));
    expect(contractViolations.slice(before).filter((line) => line.includes('body the contract refuses'))).toHaveLength(1);
    contractViolations.splice(before);
  });
});
