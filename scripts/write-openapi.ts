/**
 * Writes openapi/openapi.json from the route contracts; with --check, fails when the committed file
 * differs from what the code generates.
 */

import { readFileSync, writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { routeContracts } from '../src/app.js';
import { buildOpenApiDocument } from '../src/api/openapi/document.js';

export const OPENAPI_PATH = fileURLToPath(new URL('../openapi/openapi.json', import.meta.url));

export function generatedOpenApiText(): string {
  return `${JSON.stringify(buildOpenApiDocument(routeContracts()), null, 2)}\n`;
}

const generated = generatedOpenApiText();
if (process.argv.includes('--check')) {
  let committed = '';
  try {
    committed = readFileSync(OPENAPI_PATH, 'utf8');
  } catch {
    committed = '';
  }
  if (committed !== generated) {
    console.error('openapi/openapi.json is out of date: run `npm run openapi` and commit the result.');
    process.exit(1);
  }
  console.log('openapi/openapi.json matches the code.');
} else {
  writeFileSync(OPENAPI_PATH, generated);
  console.log(`wrote ${OPENAPI_PATH}`);
}
