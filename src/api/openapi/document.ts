/** The OpenAPI 3.1 document, generated from the route contracts and their zod schemas. */

import { OpenApiGeneratorV31, OpenAPIRegistry, type RouteConfig } from '@asteasolutions/zod-to-openapi';
import { PROBLEMS, type ProblemName } from '../problems.js';
import type { RouteContract } from '../route-contract.js';
import { problemOutput } from '../schemas/problem.js';
import { SERVICE_VERSION } from '../service-version.js';

/** Problems any route can answer with. */
const EVERY_ROUTE: readonly ProblemName[] = ['internal'];
const EVERY_BODY_ROUTE: readonly ProblemName[] = ['invalidInput', 'malformedJson', 'bodyTooLarge', 'unsupportedMediaType'];

function problemResponses(names: readonly ProblemName[]): RouteConfig['responses'] {
  const byStatus = new Map<number, ProblemName[]>();
  for (const name of names) {
    const { status } = PROBLEMS[name];
    byStatus.set(status, [...(byStatus.get(status) ?? []), name]);
  }
  const responses: RouteConfig['responses'] = {};
  for (const [status, problems] of [...byStatus].sort(([a], [b]) => a - b)) {
    responses[String(status)] = {
      description: problems.map((name) => `${PROBLEMS[name].title} (${PROBLEMS[name].type})`).join('; '),
      content: { 'application/problem+json': { schema: problemOutput } },
    };
  }
  return responses;
}

export function buildOpenApiDocument(contracts: readonly RouteContract[]) {
  const registry = new OpenAPIRegistry();
  registry.register('Problem', problemOutput);
  for (const contract of contracts) {
    const problems = [...new Set([...contract.problems, ...(contract.body ? EVERY_BODY_ROUTE : []), ...EVERY_ROUTE])];
    registry.registerPath({
      method: contract.method,
      path: contract.path,
      operationId: contract.operationId,
      summary: contract.summary,
      description: contract.description,
      tags: [contract.tag],
      request: {
        ...(contract.body
          ? {
              body: {
                required: true,
                content: {
                  'application/json': {
                    schema: contract.body,
                    ...(contract.exampleBody === undefined
                      ? {}
                      : contract.moreExamples === undefined
                        ? { example: contract.exampleBody }
                        : { examples: { default: { summary: 'The example of the schema', value: contract.exampleBody }, ...contract.moreExamples } }),
                  },
                },
              },
            }
          : {}),
        ...(contract.query ? { query: contract.query } : {}),
        ...(contract.params ? { params: contract.params } : {}),
      },
      responses: {
        200: { description: contract.responseDescription, content: { [contract.responseMediaType ?? 'application/json']: { schema: contract.response } } },
        ...problemResponses(problems),
      },
    });
  }
  const generator = new OpenApiGeneratorV31(registry.definitions);
  return withExactTuples(generator.generateDocument({
    openapi: '3.1.0',
    info: {
      title: 'Memberproof',
      version: SERVICE_VERSION,
      description:
        'Screening calculations for straight structural and machine members: reactions, shear-force, bending-moment and deflection diagrams, stresses, column buckling (Euler or Johnson), every failure check with its utilization, the governing failure, and the lightest catalogue section that passes. Quantities are numbers in SI units or strings with a unit ("250 mm", "12 kN"). Axes: x along the member, y up, z horizontal. CAUTION: screening calculations for qualified people; the design must be verified to the governing local code by a licensed engineer.',
    },
    servers: [{ url: '/' }],
  }));
}

export type OpenApiDocument = ReturnType<typeof buildOpenApiDocument>;

/**
 * A tuple (a linear intensity [at from, at to]) is published as prefixItems alone, which JSON Schema
 * 2020-12 reads as "at least these, then anything": the service takes exactly the tuple's length, so
 * the document says so (items false, min and max items).
 */
function withExactTuples<T>(document: T): T {
  const visit = (node: unknown): void => {
    if (Array.isArray(node)) {
      node.forEach(visit);
      return;
    }
    if (node === null || typeof node !== 'object') return;
    const schema = node as Record<string, unknown>;
    if (Array.isArray(schema.prefixItems) && schema.items === undefined) {
      schema.items = false;
      schema.minItems = schema.prefixItems.length;
      schema.maxItems = schema.prefixItems.length;
    }
    Object.values(schema).forEach(visit);
  };
  visit(document);
  return document;
}
