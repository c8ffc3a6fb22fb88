/**
 * `npm run bench:http`: the request path against a bare Fastify route, over real sockets, on this
 * machine. It starts the built service (dist/main.js, default logging to /dev/null) twice, once as it
 * runs by default and once with the answer cache off, and the bare route of bench/bare-route.ts
 * sending the service's answer bytes; then loads them in turn with autocannon (16 connections, 5 s a
 * run, three rounds: bare, service, service without cache), and prints requests per second and the
 * ratios within each round. After that, on the service without cache: a batch of 1,000 typical checks
 * (11 samples each) and a sizing over 103 catalogue candidates through their routes (11 requests each,
 * median), the time per request as loads and spans grow tenfold, and the engine alone for the
 * typical check (median).
 *
 * BASELINE_DIR=<another checkout, built> adds that service to the same rounds and timings: the figures
 * before and after a change, side by side in one run.
 *
 * Targets (issue 9): typical check >= 0.8 x the bare route; batch <= 150 ms; sizing <= 15 ms;
 * engine <= 20 us. Ratios taken within a round share the machine's state, so they are what to compare.
 */

import { spawn, type ChildProcess } from 'node:child_process';
import { writeFileSync } from 'node:fs';
import { request as httpRequest } from 'node:http';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import autocannon from 'autocannon';
import { PLATFORM_JOIST, TYPICAL_CHECK } from './typical-checks.js';

const root = fileURLToPath(new URL('..', import.meta.url));
const SECONDS_PER_RUN = Number(process.env.BENCH_SECONDS ?? 5);
const ROUNDS = 3;

async function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const address = server.address();
      server.close(() => resolve(typeof address === 'object' && address ? address.port : 0));
    });
  });
}

interface Started {
  readonly name: string;
  readonly url: string;
  readonly child: ChildProcess;
}

async function start(name: string, args: string[], env: Record<string, string>, cwd = root): Promise<Started> {
  const port = await freePort();
  const child = spawn(process.execPath, args, { cwd, env: { ...process.env, ...env, PORT: String(port) }, stdio: ['ignore', 'ignore', 'inherit'] });
  const url = `http://127.0.0.1:${port}`;
  for (let attempt = 0; attempt < 200; attempt++) {
    const ready = await fetch(`${url}/healthz`).then(
      () => true,
      () => false,
    );
    if (ready) return { name, url, child };
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
  child.kill();
  throw new Error(`${name} did not start`);
}

/**
 * One POST over a fresh loopback connection, timed until the last byte of the answer has arrived; the
 * answer is decoded only when asked for, so the client's own work stays out of the time.
 */
async function post(url: string, body: string, decode = true): Promise<{ status: number; text: string; bytes: number; ms: number }> {
  return new Promise((resolve, reject) => {
    const began = performance.now();
    const request = httpRequest(url, { method: 'POST', headers: { 'content-type': 'application/json', 'content-length': Buffer.byteLength(body) }, agent: false }, (response) => {
      const chunks: Buffer[] = [];
      let bytes = 0;
      response.on('data', (chunk: Buffer) => {
        bytes += chunk.length;
        if (decode) chunks.push(chunk);
      });
      response.on('end', () => {
        const ms = performance.now() - began;
        resolve({ status: response.statusCode ?? 0, text: decode ? Buffer.concat(chunks).toString('utf8') : '', bytes, ms });
      });
      response.on('error', reject);
    });
    request.on('error', reject);
    request.end(body);
  });
}

async function load(target: Started, body: string): Promise<{ rps: number; p99: number; errors: number }> {
  const result = await autocannon({
    url: `${target.url}/v1/member-checks`,
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body,
    connections: 16,
    duration: SECONDS_PER_RUN,
  });
  return { rps: result.requests.average, p99: result.latency.p99, errors: result.errors + result.non2xx };
}

async function medianMs(url: string, body: string, runs = 11): Promise<{ median: number; bytes: number }> {
  const first = await post(url, body);
  if (first.status !== 200) throw new Error(`${url}: ${first.status} ${first.text.slice(0, 300)}`);
  const times: number[] = [];
  for (let i = 0; i < runs; i++) times.push((await post(url, body, false)).ms);
  times.sort((a, b) => a - b);
  return { median: times[Math.floor(runs / 2)] as number, bytes: first.bytes };
}

function batchBody(): string {
  const items = Array.from({ length: 1000 }, (_, i) => ({
    id: `bay-${i}`,
    ...TYPICAL_CHECK,
    loads: [{ ...TYPICAL_CHECK.loads[0], fy: -4000 - i }, ...TYPICAL_CHECK.loads.slice(1)],
    output: { samples: 11 },
  }));
  return JSON.stringify({ items });
}

const SIZING = JSON.stringify({ ...PLATFORM_JOIST, candidates: { families: ['IPE', 'HEA', 'HEB', 'SHS', 'RHS'] } });

/** The typical check with n point loads spread over the span. */
function withPointLoads(n: number): string {
  const loads = Array.from({ length: n }, (_, i) => ({ type: 'point', position: (4 * (i + 0.5)) / n, fy: -1000 - i }));
  return JSON.stringify({ ...TYPICAL_CHECK, loads });
}

/** The typical section on n spans of 4 m under a uniform load. */
function withSpans(n: number): string {
  const supports = Array.from({ length: n + 1 }, (_, i) => ({ position: 4 * i, type: i === 0 ? 'pinned' : 'roller' }));
  return JSON.stringify({ ...TYPICAL_CHECK, member: { length: 4 * n, supports }, loads: [{ type: 'distributed', from: 0, to: 4 * n, qy: -1500 }] });
}

/** End to end through the route: time per request as loads or spans grow tenfold (median of 11); 1,000 supports at most, so 100 spans. */
async function growth(url: string): Promise<string[]> {
  const rows: [string, number][] = [];
  for (const n of [10, 100, 1000]) rows.push([`${n} point loads`, (await medianMs(`${url}/v1/member-checks`, withPointLoads(n))).median]);
  for (const n of [10, 100]) rows.push([`${n} spans`, (await medianMs(`${url}/v1/member-checks`, withSpans(n))).median]);
  const lines = ['| member (101 samples, every node added) | ms per request | x the row above |', '| --- | ---: | ---: |'];
  rows.forEach(([name, ms], i) => {
    const growthFactor = i === 0 || i === 3 ? '' : (ms / (rows[i - 1] as [string, number])[1]).toFixed(1);
    lines.push(`| ${name} | ${ms.toFixed(2)} | ${growthFactor} |`);
  });
  return lines;
}

async function engineMicros(): Promise<number> {
  const { checkRequest } = await import(join(root, 'dist/api/member-check.js'));
  const { loadCatalogues } = await import(join(root, 'dist/api/load-catalogues.js'));
  const { memberCheckRequest } = await import(join(root, 'dist/api/schemas/member-check-request.js'));
  const { analyseMember } = await import(join(root, 'dist/engine/analysis/analyse-member.js'));
  const { checkMember } = await import(join(root, 'dist/engine/checks/check-member.js'));
  const { check, checked } = checkRequest(memberCheckRequest.parse(TYPICAL_CHECK), await loadCatalogues({}));
  const engine = () => {
    const analysis = analyseMember(checked.model);
    return checkMember({ analysis, model: checked.model, section: checked.section.properties, material: checked.material, criteria: check.criteria, buckling: check.buckling, lateralTorsional: check.lateralTorsional, pins: check.pins });
  };
  for (let i = 0; i < 5000; i++) engine();
  const times: number[] = [];
  for (let round = 0; round < 401; round++) {
    const began = process.hrtime.bigint();
    for (let i = 0; i < 25; i++) engine();
    times.push(Number(process.hrtime.bigint() - began) / 25 / 1000);
  }
  times.sort((a, b) => a - b);
  return times[200] as number;
}

const started: Started[] = [];
async function startTracked(name: string, args: string[], env: Record<string, string>, cwd = root): Promise<Started> {
  const one = await start(name, args, env, cwd);
  started.push(one);
  return one;
}

try {
  // The engine first, in this process before it carries any load.
  const engine = await engineMicros();
  const body = JSON.stringify(TYPICAL_CHECK);
  const service = await startTracked('service', ['dist/main.js'], {});
  const uncached = await startTracked('service, answer cache off', ['dist/main.js'], { ANSWER_CACHE_BYTES: '0' });
  const answer = await post(`${uncached.url}/v1/member-checks`, body);
  const cachedAnswer = await post(`${service.url}/v1/member-checks`, body);
  if (answer.status !== 200 || cachedAnswer.text !== answer.text) throw new Error('the two services answer differently');
  const answerFile = join(tmpdir(), `memberproof-bench-answer-${process.pid}.json`);
  writeFileSync(answerFile, answer.text);
  const bare = await startTracked('bare Fastify route', ['--import', 'tsx', 'bench/bare-route.ts'], { ANSWER_FILE: answerFile });
  const bareAnswer = await post(`${bare.url}/v1/member-checks`, body);
  if (bareAnswer.text !== answer.text) throw new Error('the bare route does not send the same bytes');
  // Another checkout's built service (BASELINE_DIR), measured in the same rounds: before and after side by side.
  const baselineDir = process.env.BASELINE_DIR;
  const baseline = baselineDir === undefined ? undefined : await startTracked(`baseline (${baselineDir})`, ['dist/main.js'], {}, baselineDir);
  if (baseline && (await post(`${baseline.url}/v1/member-checks`, body)).text !== answer.text) throw new Error('the baseline answers differently');

  const contenders = [service, uncached, ...(baseline ? [baseline] : [])];
  const lines = [
    `Typical check, ${(answer.text.length / 1024).toFixed(1)} kB answer; autocannon 16 connections, ${SECONDS_PER_RUN} s a run, ${ROUNDS} rounds, each loading the bare route and then every service in turn.`,
    `Services: ${contenders.map((one) => one.name).join('; ')}.`,
    '',
    `| round | bare route (req/s) | ${contenders.map((one) => `${one.name} (req/s) | ratio`).join(' | ')} | p99 (ms), same order |`,
    `| --- | ---: | ${contenders.map(() => '---: | ---:').join(' | ')} | ---: |`,
  ];
  const ratios = contenders.map((): number[] => []);
  for (let round = 1; round <= ROUNDS; round++) {
    const bareLoad = await load(bare, body);
    const loads = [];
    for (const one of contenders) loads.push(await load(one, body));
    const errors = [bareLoad, ...loads].reduce((sum, one) => sum + one.errors, 0);
    if (errors > 0) throw new Error(`${errors} errors under load`);
    loads.forEach((one, i) => ratios[i]?.push(one.rps / bareLoad.rps));
    const cells = loads.map((one) => `${one.rps.toFixed(0)} | ${(one.rps / bareLoad.rps).toFixed(2)}`).join(' | ');
    lines.push(`| ${round} | ${bareLoad.rps.toFixed(0)} | ${cells} | ${[bareLoad, ...loads].map((one) => one.p99).join(' / ')} |`);
  }
  const median = (values: number[]) => [...values].sort((x, y) => x - y)[Math.floor(values.length / 2)] as number;
  const batch = await medianMs(`${uncached.url}/v1/member-checks/batch`, batchBody());
  const sizing = await medianMs(`${uncached.url}/v1/member-sizing`, SIZING);
  const baselineBatch = baseline ? await medianMs(`${baseline.url}/v1/member-checks/batch`, batchBody()) : undefined;
  const baselineSizing = baseline ? await medianMs(`${baseline.url}/v1/member-sizing`, SIZING) : undefined;
  const growthLines = await growth(uncached.url);
  const was = (value: { median: number } | undefined) => (value ? ` (baseline ${value.median.toFixed(1)} ms)` : '');

  lines.push(
    '',
    '| target | measured | goal |',
    '| --- | ---: | ---: |',
    `| typical check, service / bare route (median of rounds) | ${median(ratios[0] ?? []).toFixed(2)} | >= 0.80 |`,
    `| typical check, service with the answer cache off / bare route | ${median(ratios[1] ?? []).toFixed(2)} | (every request computed) |`,
    ...(baseline ? [`| typical check, baseline / bare route | ${median(ratios[2] ?? []).toFixed(2)} | (before) |`] : []),
    `| batch of 1,000 typical checks, 11 samples each, through the route (median of 11, cache off) | ${batch.median.toFixed(1)} ms${was(baselineBatch)} (${(batch.bytes / 2 ** 20).toFixed(1)} MiB answer) | <= 150 ms |`,
    `| sizing over 103 catalogue candidates through the route (median of 11, cache off) | ${sizing.median.toFixed(1)} ms${was(baselineSizing)} | <= 15 ms |`,
    `| engine alone (analyseMember + checkMember), typical check, median | ${engine.toFixed(1)} us | <= 20 us |`,
    '',
    'Growth end to end (service with the answer cache off; goal: 10 x the loads or spans costs at most 11 x):',
    '',
    ...growthLines,
    '',
    `Node ${process.version}, ${process.platform} ${process.arch}.`,
  );
  console.log(lines.join('\n'));
} finally {
  for (const one of started) one.child.kill('SIGTERM');
}
