/** One app and one set of catalogues per test file, built the way main.ts builds them. */

import type { FastifyInstance } from 'fastify';
import { afterAll, beforeAll } from 'vitest';
import { buildApp, type AppOptions } from '../../src/app.js';
import { loadCatalogues, type LoadedCatalogues } from '../../src/api/load-catalogues.js';
import { checkExchange } from './strict-contract.js';

let catalogues: Promise<LoadedCatalogues> | undefined;

export function embeddedCatalogues(): Promise<LoadedCatalogues> {
  catalogues ??= loadCatalogues({});
  return catalogues;
}

/**
 * An app as main.ts builds it, every exchange of which is checked against the committed contract
 * (tests/support/strict-contract.ts); tests/support/contract-setup.ts fails a test file that saw a
 * disagreement.
 */
export async function testApp(options: AppOptions = {}): Promise<FastifyInstance> {
  return buildApp({
    catalogues: await embeddedCatalogues(),
    // A busy test machine can stall the event loop past the shedding threshold and turn a test's
    // request into a 503; load shedding is tested on its own (tests/api/overload.test.ts passes its own).
    overload: { maxEventLoopDelayMs: 0 },
    observeExchange: (request, statusCode, payload) => checkExchange(request.method, request.routeOptions.url, statusCode, request.body, payload),
    ...options,
  });
}

/** An app listening on a free local port for the describe block it is called in: for clients that need a URL. */
export function listeningApp(): { readonly app: FastifyInstance; readonly baseUrl: string } {
  const state = {} as { app: FastifyInstance; baseUrl: string };
  beforeAll(async () => {
    state.app = await testApp();
    state.baseUrl = await state.app.listen({ port: 0, host: '127.0.0.1' });
  });
  afterAll(async () => {
    await state.app?.close();
  });
  return state;
}
