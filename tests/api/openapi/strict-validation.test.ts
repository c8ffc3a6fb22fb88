/**
 * The committed contract as a strict JSON Schema 2020-12 validator (Ajv 2020) reads it: every request
 * example and every answer the routes give to them validate against the document, and unknown fields
 * are refused, as the service refuses them.
 */

import { readFileSync } from 'node:fs';
import { Ajv2020 } from 'ajv/dist/2020.js';
import type { FastifyInstance } from 'fastify';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { routeContracts } from '../../../src/app.js';
import { testApp } from '../../support/test-app.js';

type Schema = Record<string, unknown>;
const document = JSON.parse(readFileSync(new URL('../../../openapi/openapi.json', import.meta.url), 'utf8')) as {
  components: { schemas: Record<string, Schema> };
  paths: Record<string, Record<string, { requestBody?: { content: Record<string, { schema: Schema }> }; responses: Record<string, { content?: Record<string, { schema: Schema }> }> }>>;
};

/** Strict, with OpenAPI's own annotation keywords (example, discriminator), which JSON Schema 2020-12 does not define: a oneOf is then validated as JSON Schema says, exactly one branch. */
const ajv = new Ajv2020({ strict: true, allErrors: true, allowUnionTypes: true });
ajv.addKeyword({ keyword: 'example' });
ajv.addKeyword({ keyword: 'discriminator' });
/** The contract's component schemas as the $defs of one schema, its references pointed there. */
const toDefinitions = (schema: unknown) => JSON.parse(JSON.stringify(schema).replace(/"#\/components\/schemas\//g, '"contract#/$defs/')) as Schema;
ajv.addSchema({ $id: 'contract', $defs: toDefinitions(document.components.schemas) });

/** A schema of the document, its references resolved against the contract's components. */
function validatorOf(schema: Schema) {
  return ajv.compile(toDefinitions(schema));
}

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
