/** One app and one set of catalogues per test file, built the way main.ts builds them. */

import type { FastifyInstance } from 'fastify';
import { buildApp, type AppOptions } from '../../src/app.js';
import { loadCatalogues, type LoadedCatalogues } from '../../src/api/load-catalogues.js';

let catalogues: Promise<LoadedCatalogues> | undefined;

export function embeddedCatalogues(): Promise<LoadedCatalogues> {
  catalogues ??= loadCatalogues({});
  return catalogues;
}

export async function testApp(options: AppOptions = {}): Promise<FastifyInstance> {
  return buildApp({ catalogues: await embeddedCatalogues(), ...options });
}
