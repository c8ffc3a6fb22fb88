/**
 * Writes clients/typescript/schema.d.ts from openapi/openapi.json through openapi-typescript's Node API,
 * byte for byte what `npx openapi-typescript openapi/openapi.json -o clients/typescript/schema.d.ts`
 * writes; with --check, fails when the committed file differs from a fresh generation.
 */

import { readFileSync, writeFileSync } from 'node:fs';
import { fileURLToPath, pathToFileURL } from 'node:url';
import openapiTS, { astToString, COMMENT_HEADER } from 'openapi-typescript';

const OPENAPI_URL = new URL('../openapi/openapi.json', import.meta.url);
export const CLIENT_SCHEMA_PATH = fileURLToPath(new URL('../clients/typescript/schema.d.ts', import.meta.url));

/** The text of schema.d.ts for the committed contract; the CLI's defaults, header included. */
export async function generatedClientSchemaText(): Promise<string> {
  const ast = await openapiTS(OPENAPI_URL, { silent: true });
  return `${COMMENT_HEADER}${astToString(ast)}`;
}

function committedClientSchemaText(): string {
  try {
    return readFileSync(CLIENT_SCHEMA_PATH, 'utf8');
  } catch {
    return '';
  }
}

async function run(check: boolean): Promise<void> {
  const generated = await generatedClientSchemaText();
  if (!check) {
    writeFileSync(CLIENT_SCHEMA_PATH, generated);
    console.log(`wrote ${CLIENT_SCHEMA_PATH}`);
    return;
  }
  if (committedClientSchemaText() !== generated) {
    console.error('clients/typescript/schema.d.ts is out of date: run `npx tsx scripts/generate-client.ts` and commit the result.');
    process.exitCode = 1;
    return;
  }
  console.log('clients/typescript/schema.d.ts matches openapi/openapi.json.');
}

// Run only as a script, so the test can import generatedClientSchemaText without writing anything.
if (process.argv[1] !== undefined && import.meta.url === pathToFileURL(process.argv[1]).href) {
  await run(process.argv.includes('--check'));
}
