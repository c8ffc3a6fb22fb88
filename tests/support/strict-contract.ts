/**
 * The committed contract (openapi/openapi.json) as a strict JSON Schema 2020-12 validator reads it
 * (Ajv 2020), for the tests: validators of its schemas, and a record of every request a test app
 * accepted that the contract refuses, or answer it sent that the contract does not describe.
 */

import { readFileSync } from 'node:fs';
import { Ajv2020, type ValidateFunction } from 'ajv/dist/2020.js';

export type Schema = Record<string, unknown>;

interface Operation {
  readonly requestBody?: { readonly content: Record<string, { readonly schema: Schema }> };
  readonly responses: Record<string, { readonly content?: Record<string, { readonly schema: Schema }> }>;
}

export const contractDocument = JSON.parse(readFileSync(new URL('../../openapi/openapi.json', import.meta.url), 'utf8')) as {
  readonly components: { readonly schemas: Record<string, Schema> };
  readonly paths: Record<string, Record<string, Operation>>;
};

let ajv: Ajv2020 | undefined;

/** The contract's component schemas as the $defs of one schema, its references pointed there. */
function toDefinitions(schema: unknown): Schema {
  return JSON.parse(JSON.stringify(schema).replace(/"#\/components\/schemas\//g, '"contract#/$defs/')) as Schema;
}

/**
 * Strict, with OpenAPI's own annotation keywords (example, discriminator), which JSON Schema 2020-12
 * does not define: a oneOf is then validated as JSON Schema says, exactly one branch.
 */
function contractAjv(): Ajv2020 {
  if (ajv !== undefined) return ajv;
  ajv = new Ajv2020({ strict: true, allErrors: true, allowUnionTypes: true });
  ajv.addKeyword({ keyword: 'example' });
  ajv.addKeyword({ keyword: 'discriminator' });
  ajv.addSchema({ $id: 'contract', $defs: toDefinitions(contractDocument.components.schemas) });
  return ajv;
}

/** A schema of the document, its references resolved against the contract's components. */
export function validatorOf(schema: Schema): ValidateFunction {
  return contractAjv().compile(toDefinitions(schema));
}

const operationValidators = new Map<string, ValidateFunction | null>();

function cachedValidator(key: string, schema: Schema | undefined): ValidateFunction | undefined {
  if (!operationValidators.has(key)) operationValidators.set(key, schema === undefined ? null : validatorOf(schema));
  return operationValidators.get(key) ?? undefined;
}

/** The validator of an operation's JSON request body; undefined when it takes none. */
export function requestValidator(method: string, path: string): ValidateFunction | undefined {
  const operation = contractDocument.paths[path]?.[method.toLowerCase()];
  return cachedValidator(`${method} ${path} request`, operation?.requestBody?.content['application/json']?.schema);
}

/** The validator of an operation's JSON answer with this status; undefined when the contract gives none. */
export function responseValidator(method: string, path: string, status: number): ValidateFunction | undefined {
  const operation = contractDocument.paths[path]?.[method.toLowerCase()];
  const content = operation?.responses[String(status)]?.content;
  return cachedValidator(`${method} ${path} ${status}`, (content?.['application/json'] ?? content?.['application/problem+json'])?.schema);
}

/** Disagreements between the service and its contract seen by the test apps of this test file. */
export const contractViolations: string[] = [];

/** The document's path of a Fastify route ("/v1/sections/:designation" is "/v1/sections/{designation}"). */
function documentPath(routeUrl: string): string {
  return routeUrl.replace(/:(\w+)/g, '{$1}');
}

function describeErrors(validate: ValidateFunction): string {
  return JSON.stringify(validate.errors?.slice(0, 3));
}

/**
 * Checks one exchange of a test app against the contract: a request body the service took (any answer
 * but a 4xx about the request itself) must be valid under the contract, and a JSON answer must be what
 * the contract describes for its status. What disagrees is added to `contractViolations`.
 */
export function checkExchange(method: string, routeUrl: string | undefined, status: number, requestBody: unknown, answer: unknown): void {
  if (routeUrl === undefined) return;
  const path = documentPath(routeUrl);
  if (contractDocument.paths[path] === undefined) return;
  const validateAnswer = responseValidator(method, path, status);
  let parsed: unknown;
  if (typeof answer === 'string' && validateAnswer !== undefined) {
    try {
      parsed = JSON.parse(answer);
    } catch {
      contractViolations.push(`${method} ${path} ${status}: the answer is not JSON`);
      return;
    }
    if (!validateAnswer(parsed)) contractViolations.push(`${method} ${path} ${status}: the answer is not what the contract describes: ${describeErrors(validateAnswer)}`);
  }
  if (!taken(status)) return;
  const validateRequest = requestValidator(method, path);
  const body = path === BATCH_PATH ? itemsTaken(requestBody, parsed) : requestBody;
  if (validateRequest !== undefined && body !== undefined && !validateRequest(body)) {
    contractViolations.push(`${method} ${path} answered ${status} to a body the contract refuses: ${describeErrors(validateRequest)}`);
  }
}

/** Whether the service took the request: anything but a 4xx about the request itself. */
function taken(status: number): boolean {
  return status < 400 || status === 422 || status >= 500;
}

const BATCH_PATH = '/v1/member-checks/batch';

/**
 * A batch answers each item on its own, and a bad item gets its own problem without failing the batch
 * (as the contract says): the batch as the service took it holds only the items it did not refuse.
 */
function itemsTaken(requestBody: unknown, answer: unknown): unknown {
  const items = (requestBody as { items?: unknown } | undefined)?.items;
  const results = (answer as { results?: { index: number; status: number }[] } | undefined)?.results;
  if (!Array.isArray(items) || !Array.isArray(results)) return requestBody;
  const kept = results.filter((result) => taken(result.status)).map((result) => items[result.index]);
  return kept.length === 0 ? undefined : { ...(requestBody as object), items: kept };
}
