/**
 * A route's contract: the one description both the Fastify route and the OpenAPI document are built
 * from, so the published contract cannot drift from what the service does.
 */

import type { z } from 'zod';
import type { ProblemName } from './problems.js';

export interface RouteContract {
  readonly method: 'get' | 'post';
  /** OpenAPI path template, e.g. "/v1/sections/{designation}". */
  readonly path: string;
  readonly operationId: string;
  readonly summary: string;
  readonly description: string;
  readonly tag: string;
  readonly body?: z.ZodType;
  readonly query?: z.ZodObject;
  readonly params?: z.ZodObject;
  readonly response: z.ZodType;
  /** The 200 answer's media type; default application/json. */
  readonly responseMediaType?: 'application/json' | 'text/html' | 'image/svg+xml' | 'text/plain';
  readonly responseDescription: string;
  /** The problems this route can answer with, besides the ones every route can. */
  readonly problems: readonly ProblemName[];
  /** A request that the tests send and that must be answered 200. */
  readonly exampleBody?: unknown;
  /** Further requests, each named and answered 200, published beside exampleBody and sent by the tests. */
  readonly moreExamples?: Readonly<Record<string, { readonly summary: string; readonly value: unknown }>>;
}

/** "/v1/sections/{designation}" -> "/v1/sections/:designation" */
export function fastifyPath(openApiPath: string): string {
  return openApiPath.replace(/\{([^}]+)\}/g, ':$1');
}
