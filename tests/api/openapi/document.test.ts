/** The published contract: committed, valid OpenAPI 3.1, served, and its examples answered. */

import { readFileSync } from 'node:fs';
import { Validator } from '@seriousme/openapi-schema-validator';
import type { FastifyInstance } from 'fastify';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { routeContracts } from '../../../src/app.js';
import { buildOpenApiDocument } from '../../../src/api/openapi/document.js';
import { testApp } from '../../support/test-app.js';

const committedPath = new URL('../../../openapi/openapi.json', import.meta.url);

let app: FastifyInstance;
beforeAll(async () => {
  app = await testApp();
});
afterAll(async () => {
  await app.close();
});

describe('the OpenAPI document', () => {
  const generated = buildOpenApiDocument(routeContracts());

  it('is the committed openapi/openapi.json (run `npm run openapi` after changing a schema)', () => {
    expect(JSON.parse(readFileSync(committedPath, 'utf8'))).toEqual(JSON.parse(JSON.stringify(generated)));
  });

  it('validates against the OpenAPI 3.1 schema', async () => {
    const validator = new Validator();
    const result = await validator.validate(JSON.parse(JSON.stringify(generated)));
    expect(result.errors ?? []).toEqual([]);
    expect(result.valid).toBe(true);
    expect(validator.version).toBe('3.1');
  });

  it('is served at /openapi.json and browsable at /docs', async () => {
    const served = await request(app.server).get('/openapi.json');
    expect(served.status).toBe(200);
    expect(served.body.openapi).toBe('3.1.0');
    expect(served.body).toEqual(JSON.parse(JSON.stringify(generated)));
    const docs = await request(app.server).get('/docs/');
    expect(docs.status).toBe(200);
    expect(docs.text).toMatch(/swagger/i);
  });

  it('describes every field of every request and response body, following references', () => {
    const schemas = (generated.components?.schemas ?? {}) as Record<string, unknown>;
    const missing: string[] = [];
    const seen = new Set<unknown>();
    const visit = (schema: unknown, where: string) => {
      if (schema === null || typeof schema !== 'object' || seen.has(schema)) return;
      seen.add(schema);
      const node = schema as Record<string, unknown>;
      if (typeof node.$ref === 'string') return visit(schemas[node.$ref.replace('#/components/schemas/', '')], node.$ref);
      for (const [name, property] of Object.entries((node.properties ?? {}) as Record<string, Record<string, unknown>>)) {
        // Discriminators and labels explain themselves through their enum values and names.
        const selfExplaining = ['type', 'shape', 'label', 'name'].includes(name);
        const parts = [property, ...((property.allOf as Record<string, unknown>[] | undefined) ?? [])];
        const described = parts.some((part) => typeof part.description === 'string' || typeof part.$ref === 'string');
        if (!selfExplaining && !described) missing.push(`${where}.${name}`);
        visit(property, `${where}.${name}`);
      }
      for (const key of ['items', 'anyOf', 'oneOf', 'allOf', 'prefixItems', 'additionalProperties']) {
        const child = node[key];
        if (Array.isArray(child)) child.forEach((c, i) => visit(c, `${where}[${i}]`));
        else visit(child, where);
      }
    };
    for (const [path, item] of Object.entries(generated.paths ?? {})) {
      type Operation = { requestBody?: { content: Record<string, { schema: unknown }> }; responses: Record<string, { content?: Record<string, { schema: unknown }> }> };
      for (const operation of Object.values(item as Record<string, Operation>)) {
        const body = operation.requestBody?.content['application/json']?.schema;
        if (body) visit(body, `${path} request`);
        const answer = operation.responses['200']?.content?.['application/json']?.schema;
        if (answer) visit(answer, `${path} response`);
      }
    }
    expect(missing).toEqual([]);
  });

  describe.each(routeContracts().filter((contract) => contract.exampleBody !== undefined))('example of $operationId', (contract) => {
    it('is answered 200', async () => {
      const mediaType = contract.responseMediaType ?? 'application/json';
      const response = await request(app.server)[contract.method](contract.path).send(contract.exampleBody as object).buffer(true);
      expect(response.status, JSON.stringify(response.body).slice(0, 500)).toBe(200);
      expect(response.headers['content-type']).toMatch(new RegExp(`^${mediaType.replace('+', '\\+')}`));
      if (mediaType !== 'application/json') {
        // A rendering: a document of its kind, carrying the caution wherever it is shown.
        const text = Buffer.isBuffer(response.body) ? response.body.toString('utf8') : response.text;
        expect(text).toMatch(mediaType === 'text/html' ? /^<!DOCTYPE html>/ : /^<svg /);
        if (mediaType === 'text/html') expect(text).toMatch(/licensed engineer/);
        return;
      }
      expect(response.body.notices[0]).toMatch(/licensed engineer/);
      // The answer is what the response schema says: parsing strips undeclared fields, so equality fails on any.
      expect(contract.response.parse(response.body)).toEqual(response.body);
    });
  });

  const getSamples: Record<string, string> = {
    '/v1/sections': '/v1/sections?family=IPE&limit=3',
    '/v1/sections/{designation}': '/v1/sections/IPE%20200',
    '/v1/materials': '/v1/materials',
    '/v1/materials/{grade}': '/v1/materials/S355',
    '/healthz': '/healthz',
    '/readyz': '/readyz',
    '/metrics': '/metrics',
  };

  describe.each(routeContracts().filter((contract) => contract.method === 'get'))('GET $path', (contract) => {
    it('answers as its response schema says', async () => {
      const url = getSamples[contract.path];
      expect(url, `add a sample URL for ${contract.path}`).toBeDefined();
      const response = await request(app.server).get(url as string);
      expect(response.status).toBe(200);
      if (contract.responseMediaType === 'text/plain') {
        expect(response.headers['content-type']).toMatch(/^text\/plain/);
        expect(contract.response.parse(response.text)).toBe(response.text);
        return;
      }
      expect(contract.response.parse(response.body)).toEqual(response.body);
    });
  });
});
