/**
 * The TypeScript client and its example: the committed schema.d.ts is what openapi-typescript makes of
 * the committed contract today, the example and the client compile against it, and the example, run
 * against the real server, reports what POST /v1/member-checks answers for the same bodies.
 */

import { execFileSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { createServer } from 'node:net';
import { fileURLToPath } from 'node:url';
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { CLIENT_SCHEMA_PATH, generatedClientSchemaText } from '../../scripts/generate-client.js';
import {
  baseUrlFrom,
  DEFAULT_BASE_URL,
  exitCodeFor,
  main,
  SCENARIOS,
  type MemberOutcome,
} from '../../examples/typescript/check-three-members.js';
import { createMemberproofClient } from '../../clients/typescript/index.js';
import { listeningApp } from '../support/test-app.js';

const REPOSITORY = fileURLToPath(new URL('../../', import.meta.url));
const TSC = fileURLToPath(new URL('../../node_modules/.bin/tsc', import.meta.url));

/** A port on the loopback with nothing listening: taken, then given back. */
async function closedPort(): Promise<number> {
  const server = createServer();
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const address = server.address();
  await new Promise<void>((resolve) => server.close(() => resolve()));
  if (address === null || typeof address === 'string') throw new Error('no TCP address');
  return address.port;
}

describe('clients/typescript/schema.d.ts', () => {
  it('equals a fresh generation from openapi/openapi.json (else: npx tsx scripts/generate-client.ts)', async () => {
    const committed = readFileSync(CLIENT_SCHEMA_PATH, 'utf8');
    const generated = await generatedClientSchemaText();
    expect(committed === generated, 'clients/typescript/schema.d.ts is stale: run `npx tsx scripts/generate-client.ts` and commit it').toBe(true);
  });
});

describe('the example and the client against the generated types', () => {
  it('compile with tsc -p examples/tsconfig.json (strict, NodeNext)', () => {
    let output = '';
    try {
      execFileSync(TSC, ['-p', 'examples/tsconfig.json'], { cwd: REPOSITORY, encoding: 'utf8', stdio: 'pipe', timeout: 55000 });
    } catch (error) {
      const failed = error as { stdout?: string; stderr?: string; message: string };
      output = `${failed.stdout ?? ''}${failed.stderr ?? ''}` || failed.message;
    }
    expect(output).toBe('');
  }, 60000);
});

describe('examples/typescript/check-three-members.ts against the real server', () => {
  const server = listeningApp();

  it('reports for each member the verdict, governing mode and utilization that POST /v1/member-checks answers', async () => {
    const lines: string[] = [];
    const outcomes = await main(server.baseUrl, { log: (line) => lines.push(line) });

    expect(outcomes).toHaveLength(3);
    for (const [index, scenario] of SCENARIOS.entries()) {
      const direct = await request(server.app.server).post('/v1/member-checks').send(scenario.body);
      expect(direct.status).toBe(200);
      const outcome = outcomes[index];
      expect(outcome?.kind).toBe('answer');
      if (outcome?.kind !== 'answer') continue;
      expect(outcome.name).toBe(scenario.name);
      expect(outcome.verdict).toBe(direct.body.verdict);
      expect(outcome.governing?.mode).toBe(direct.body.governing.mode);
      expect(outcome.governing?.utilization).toBe(direct.body.governing.utilization);
      expect(lines.join('\n')).toContain(`${scenario.name}: ${direct.body.verdict}, governing ${direct.body.governing.mode}`);
    }
    // The screening caution, first of every answer's notices, closes the printout.
    expect(lines.at(-1)).toMatch(/Screening calculation/);
    expect(exitCodeFor(outcomes)).toBe(0);
  });

  it('returns a problem answer typed by the client, with its title, detail and pointers printed', async () => {
    // The joist's designation misspelt on the way out: the service answers 400 unknown-designation.
    const misspelling = async (outgoing: Request): Promise<Response> => {
      const text = (await outgoing.text()).replace('"IPE 140"', '"IPE 145"');
      return fetch(outgoing.url, { method: outgoing.method, headers: outgoing.headers, body: text });
    };
    const lines: string[] = [];
    const outcomes = await main(server.baseUrl, { fetchImpl: misspelling, log: (line) => lines.push(line) });

    const joist = outcomes[1] as Extract<MemberOutcome, { kind: 'problem' }>;
    expect(joist.kind).toBe('problem');
    expect(joist.status).toBe(400);
    expect(joist.problem?.type).toBe('https://memberproof.dev/problems/unknown-designation');
    expect(joist.problem?.errors?.[0]?.pointer).toBe('/section/designation');
    expect(lines.join('\n')).toContain('at /section/designation');
    expect(outcomes[0]?.kind).toBe('answer');
    expect(exitCodeFor(outcomes)).toBe(2);
  });

  it('throws on a transport error (nothing listening), so the script exits 1', async () => {
    const port = await closedPort();
    await expect(main(`http://127.0.0.1:${port}`, { log: () => undefined })).rejects.toThrow();
  });

  it('types the client by the contract: GET /healthz through createMemberproofClient', async () => {
    const { data, error } = await createMemberproofClient(`${server.baseUrl}/`).GET('/healthz');
    expect(error).toBeUndefined();
    expect(data?.status).toBe('alive');
  });
});

describe('baseUrlFrom', () => {
  it('takes the argument, else MEMBERPROOF_URL, else the local default', () => {
    expect(baseUrlFrom(['http://a:1'], { MEMBERPROOF_URL: 'http://b:2' })).toBe('http://a:1');
    expect(baseUrlFrom([], { MEMBERPROOF_URL: 'http://b:2' })).toBe('http://b:2');
    expect(baseUrlFrom([], {})).toBe(DEFAULT_BASE_URL);
  });
});
