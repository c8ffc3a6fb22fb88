/**
 * examples/python/check_member.py against the real server (listening on a free port): it prints the
 * verdict and governing mode that POST /v1/member-checks answers, exits 1 when nothing listens and 2
 * with the problem's title and pointer when the service refuses the request. Skipped with a message
 * where no python3 is on the PATH.
 */

import { execFile, execFileSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { createServer } from 'node:net';
import { fileURLToPath } from 'node:url';
import { promisify } from 'node:util';
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { listeningApp } from '../support/test-app.js';

const SCRIPT = fileURLToPath(new URL('../../examples/python/check_member.py', import.meta.url));

function python3Found(): boolean {
  try {
    execFileSync('python3', ['--version'], { stdio: 'ignore' });
    return true;
  } catch {
    return false;
  }
}

const hasPython = python3Found();
if (!hasPython) console.warn('Python example test skipped: no python3 on the PATH (Debian: apt-get install python3).');

/** The script's outcome; the server runs in this process, so the child must not block it (execFile, not execFileSync). */
async function runScript(baseUrl: string): Promise<{ code: number; stdout: string; stderr: string }> {
  try {
    const { stdout, stderr } = await promisify(execFile)('python3', [SCRIPT, baseUrl], { encoding: 'utf8', timeout: 30000 });
    return { code: 0, stdout, stderr };
  } catch (error) {
    const failed = error as { code?: number; stdout?: string; stderr?: string };
    return { code: failed.code ?? -1, stdout: failed.stdout ?? '', stderr: failed.stderr ?? '' };
  }
}

/** The request the script sends, read from the script itself as JSON (Python's True spelt true). */
function scriptRequest(): unknown {
  const source = readFileSync(SCRIPT, 'utf8');
  const literal = /^REQUEST = (\{[\s\S]*?^\})$/m.exec(source)?.[1];
  if (literal === undefined) throw new Error('no REQUEST literal in check_member.py');
  return JSON.parse(literal.replace(/\bTrue\b/g, 'true').replace(/,(\s*[}\]])/g, '$1'));
}

describe.skipIf(!hasPython)('examples/python/check_member.py', () => {
  const server = listeningApp();

  it('prints the verdict and governing mode that POST /v1/member-checks answers, and exits 0', async () => {
    const direct = await request(server.app.server).post('/v1/member-checks').send(scriptRequest() as object);
    expect(direct.status).toBe(200);

    const { code, stdout } = await runScript(server.baseUrl);
    expect(code).toBe(0);
    expect(stdout).toContain(`verdict: ${direct.body.verdict}`);
    expect(stdout).toContain(`governing: ${direct.body.governing.mode} at utilization ${direct.body.governing.utilization.toFixed(3)}`);
    expect(stdout).toMatch(/Screening calculation/);
  });

  it('prints the problem title, detail and pointer of a refused request, and exits 2', async () => {
    // A base URL under a path the service does not have: it answers 404 not-found as problem+json.
    const { code, stderr } = await runScript(`${server.baseUrl}/no-such-prefix`);
    expect(code).toBe(2);
    expect(stderr).toContain('HTTP 404 No such resource');
  });

  it('exits 1 when nothing listens', async () => {
    const server = createServer();
    await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
    const address = server.address();
    await new Promise<void>((resolve) => server.close(() => resolve()));
    if (address === null || typeof address === 'string') throw new Error('no TCP address');

    const { code, stderr } = await runScript(`http://127.0.0.1:${address.port}`);
    expect(code).toBe(1);
    expect(stderr).toContain('cannot reach Memberproof');
  });
});
