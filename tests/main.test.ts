/** The process: environment, listening, and a graceful shutdown that finishes the requests in flight. */

import { spawn, type ChildProcess } from 'node:child_process';
import { once } from 'node:events';
import { fileURLToPath } from 'node:url';
import { afterEach, describe, expect, it } from 'vitest';

const root = fileURLToPath(new URL('..', import.meta.url));
let child: ChildProcess | undefined;

afterEach(() => {
  if (child && child.exitCode === null) child.kill('SIGKILL');
});

/** Starts src/main.ts on a free port and waits for its "listening" log line. */
async function start(env: Record<string, string>): Promise<{ url: string; logs: string[] }> {
  child = spawn(process.execPath, ['--import', 'tsx', 'src/main.ts'], { cwd: root, env: { ...process.env, PORT: '0', LOG_LEVEL: 'info', ...env }, stdio: ['ignore', 'pipe', 'pipe'] });
  const logs: string[] = [];
  return new Promise((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error(`no listening line in: ${logs.join('\n')}`)), 30000);
    child?.stderr?.on('data', (chunk: Buffer) => logs.push(chunk.toString()));
    child?.stdout?.on('data', (chunk: Buffer) => {
      for (const line of chunk.toString().split('\n').filter(Boolean)) {
        logs.push(line);
        const match = /Server listening at (http:\/\/127\.0\.0\.1:\d+)/.exec(line);
        if (match?.[1]) {
          clearTimeout(timer);
          resolve({ url: match[1], logs });
        }
      }
    });
    child?.on('exit', (code) => reject(new Error(`exited with ${code}: ${logs.join('\n')}`)));
  });
}

/** Enough shelf-beam checks that the batch is still running when the signal arrives. */
function slowBatch(): string {
  const item = {
    member: { length: 3, supports: [{ position: 0, type: 'pinned' }, { position: 1.5, type: 'roller' }, { position: 3, type: 'roller' }] },
    section: { designation: 'IPE 160' },
    material: { grade: 'S275' },
    loads: [{ type: 'distributed', from: 0, to: 3, qy: -5000 }],
    output: { samples: 2 },
  };
  return JSON.stringify({ items: Array.from({ length: 1000 }, () => item) });
}

describe('main', () => {
  it('logs JSON with the request id and no body at info level', async () => {
    const { url, logs } = await start({});
    const response = await fetch(`${url}/healthz`, { headers: { 'x-request-id': 'quote-77' } });
    expect(response.status).toBe(200);
    child?.kill('SIGTERM');
    await once(child as ChildProcess, 'exit');
    const lines = logs.join('\n').split('\n').filter((line) => line.startsWith('{')).map((line) => JSON.parse(line) as Record<string, unknown>);
    expect(lines.some((line) => line.reqId === 'quote-77')).toBe(true);
    expect(logs.join('\n')).not.toMatch(/"body"/);
  });

  it('on SIGTERM finishes the request in flight, then exits 0', async () => {
    const { url } = await start({});
    const answer = fetch(`${url}/v1/member-checks/batch`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: slowBatch() });
    await new Promise((resolve) => setTimeout(resolve, 150));
    child?.kill('SIGTERM');
    const response = await answer;
    expect(response.status).toBe(200);
    const body = (await response.json()) as { summary: { total: number } };
    expect(body.summary.total).toBe(1000);
    const [code] = (await once(child as ChildProcess, 'exit')) as [number];
    expect(code).toBe(0);
  });

  it('on SIGTERM under load answers every request it had accepted, then exits 0', async () => {
    const { url } = await start({});
    // 32 clients checking shelf beams back to back, each a different load so nothing comes from the cache.
    const body = (i: number) => JSON.stringify({ ...JSON.parse(slowBatch()).items[0], loads: [{ type: 'distributed', from: 0, to: 3, qy: -5000 - i }] });
    type Outcome = { status: number; contentType: string; checks?: number } | { error: string };
    const sent: { at: number; outcome: Promise<Outcome> }[] = [];
    let stop = false;
    let counter = 0;
    const client = async () => {
      while (!stop) {
        const at = performance.now();
        const outcome: Promise<Outcome> = fetch(`${url}/v1/member-checks`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: body(counter++) }).then(
          async (response) => {
            const text = await response.text();
            const answer = response.status === 200 ? (JSON.parse(text) as { checks: unknown[] }) : undefined;
            return { status: response.status, contentType: response.headers.get('content-type') ?? '', ...(answer ? { checks: answer.checks.length } : {}) };
          },
          (error: unknown) => ({ error: String(error) }),
        );
        sent.push({ at, outcome });
        await outcome;
      }
    };
    const clients = Array.from({ length: 32 }, client);
    await new Promise((resolve) => setTimeout(resolve, 500));
    const killedAt = performance.now();
    child?.kill('SIGTERM');
    const [code] = (await once(child as ChildProcess, 'exit')) as [number];
    stop = true;
    await Promise.all(clients);
    const outcomes = await Promise.all(sent.map(async ({ at, outcome }) => ({ at, result: await outcome })));
    // Sent well before the signal (50 ms: the request had reached the server): answered in full.
    const accepted = outcomes.filter(({ at }) => at < killedAt - 50);
    expect(accepted.length).toBeGreaterThan(32);
    for (const { result } of accepted) expect(result).toMatchObject({ status: 200, checks: expect.any(Number) });
    // Sent after it: answered in full, refused politely (503 problem while closing), or refused at the
    // connection; never a cut answer.
    for (const { result } of outcomes) {
      if (!('status' in result)) continue;
      if (result.status === 200) expect(result.checks).toBeGreaterThan(0);
      else expect(result).toMatchObject({ status: 503, contentType: expect.stringMatching(/^application\/problem\+json/) });
    }
    expect(code).toBe(0);
  }, 60_000);

  it('refuses to start on a bad company catalogue, naming it', async () => {
    await expect(start({ MEMBERPROOF_CATALOGUES: '/no/such/catalogue.json' })).rejects.toThrow(/no\/such\/catalogue\.json/);
  });
});
