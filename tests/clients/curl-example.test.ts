/**
 * examples/curl/check-member.sh: bash reads it without a syntax error; where curl is on the PATH it
 * also runs against the real server and reports the verdict POST /v1/member-checks gives.
 */

import { execFile, execFileSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { promisify } from 'node:util';
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { listeningApp } from '../support/test-app.js';

const SCRIPT = fileURLToPath(new URL('../../examples/curl/check-member.sh', import.meta.url));

/** The request the script sends: its single-quoted JSON literal. */
function scriptRequest(): object {
  const literal = /^request='(\{[\s\S]*?\})'$/m.exec(readFileSync(SCRIPT, 'utf8'))?.[1];
  if (literal === undefined) throw new Error('no request literal in check-member.sh');
  return JSON.parse(literal) as object;
}

function found(command: string): boolean {
  try {
    execFileSync(command, ['--version'], { stdio: 'ignore' });
    return true;
  } catch {
    return false;
  }
}

const hasCurl = found('curl');
if (!hasCurl) console.warn('curl example run skipped: no curl on the PATH (Debian: apt-get install curl).');

describe('examples/curl/check-member.sh', () => {
  it('is valid bash (bash -n)', () => {
    expect(() => execFileSync('bash', ['-n', SCRIPT], { stdio: 'pipe' })).not.toThrow();
  });

  describe.skipIf(!hasCurl)('against the real server', () => {
    const server = listeningApp();

    it('exits 0 and shows the verdict POST /v1/member-checks gives (jq), or the whole answer (no jq)', async () => {
      const direct = await request(server.app.server).post('/v1/member-checks').send(scriptRequest());
      expect(direct.status).toBe(200);

      // The server runs in this process: execFile, not execFileSync, so it can answer.
      const { stdout } = await promisify(execFile)('bash', [SCRIPT, server.baseUrl], { encoding: 'utf8', timeout: 30000 });
      expect(stdout).toMatch(new RegExp(`"?verdict"?:\\s*"?${direct.body.verdict}\\b`));
    });
  });
});
