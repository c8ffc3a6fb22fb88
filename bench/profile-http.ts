/**
 * `npm run bench:profile`: where the request path's time goes under load. Starts the built service
 * with `node --cpu-prof` (answer cache off unless PROFILE_CACHE=on, so every request is computed),
 * loads it with autocannon (16 connections, PROFILE_SECONDS, default 8 s) with the typical check,
 * stops it and sums the profile's self time by component: each sampled function is put in the
 * component its file belongs to. SERVICE_DIR points at another checkout's built service to profile
 * it the same way (before and after a change).
 */

import { spawn } from 'node:child_process';
import { mkdtempSync, readdirSync, readFileSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import autocannon from 'autocannon';
import { TYPICAL_CHECK } from './typical-checks.js';

const serviceDir = resolve(process.env.SERVICE_DIR ?? fileURLToPath(new URL('..', import.meta.url)));
const seconds = Number(process.env.PROFILE_SECONDS ?? 8);

interface ProfileNode {
  readonly id: number;
  readonly callFrame: { readonly functionName: string; readonly url: string };
}
interface Profile {
  readonly startTime: number;
  readonly nodes: readonly ProfileNode[];
  readonly samples: readonly number[];
  readonly timeDeltas: readonly number[];
}

/** Components in the order the table lists them; the first rule that matches a frame wins. */
const COMPONENTS: readonly [string, (name: string, url: string) => boolean][] = [
  ['idle', (name) => name === '(idle)'],
  ['garbage collection', (name) => name === '(garbage collector)'],
  ['logging (pino)', (_name, url) => /node_modules\/(pino|sonic-boom|thread-stream|fast-redact|quick-format)/.test(url) || url.endsWith('request-log.js')],
  ['body parsing (secure-json-parse)', (_name, url) => url.includes('node_modules/secure-json-parse') || url.endsWith('json-body.js')],
  ['serialisation and finite guard', (name, url) => (url.includes('node_modules/fastify/lib/reply.js') && name === 'serialize') || /finite-guard\.js|answer-json\.js/.test(url)],
  ['answer cache', (_name, url) => url.endsWith('answer-cache.js')],
  ['fastify (routing, hooks, reply)', (_name, url) => /node_modules\/(fastify|find-my-way|avvio|@fastify|fast-json-stringify|light-my-request|process-warning|toad-cache|rfdc)/.test(url)],
  ['zod (request shape)', (_name, url) => url.includes('node_modules/zod') || url.endsWith('validation.js')],
  ['unit parsing (mathjs)', (_name, url) => /node_modules\/(mathjs|typed-function|fraction\.js|decimal\.js|complex\.js)/.test(url) || url.endsWith('quantities.js')],
  ['normalisation', (_name, url) => url.includes('/api/normalise/') || url.endsWith('output-units.js') || url.includes('/catalogues/')],
  ['sampling', (_name, url) => url.endsWith('sample-diagrams.js')],
  ['engine: analysis', (_name, url) => url.includes('/engine/analysis/') || url.includes('/engine/member/')],
  ['engine: sections', (_name, url) => url.includes('/engine/sections/')],
  ['engine: checks', (_name, url) => url.includes('/engine/checks/') || url.includes('/engine/materials/')],
  ['presentation', (_name, url) => url.includes('/api/present/') || url.includes('/api/schemas/') || url.endsWith('member-check.js') || url.includes('/api/routes/')],
  ['V8 outside JavaScript (program)', (name) => name === '(program)'],
  ['node: http, sockets and streams', (_name, url) => url.startsWith('node:') || url === ''],
];

function componentOf(name: string, url: string): string {
  for (const [component, matches] of COMPONENTS) if (matches(name, url)) return component;
  return `other (${url.replace(/.*node_modules\//, '').split('/')[0] || name})`;
}

async function freePort(): Promise<number> {
  return new Promise((done) => {
    const server = createServer();
    server.listen(0, '127.0.0.1', () => {
      const address = server.address();
      server.close(() => done(typeof address === 'object' && address ? address.port : 0));
    });
  });
}

const profileDir = mkdtempSync(join(tmpdir(), 'memberproof-profile-'));
const port = await freePort();
const cacheBytes = process.env.PROFILE_CACHE === 'on' ? {} : { ANSWER_CACHE_BYTES: '0' };
const spawnedAt = performance.now();
const child = spawn(process.execPath, ['--cpu-prof', `--cpu-prof-dir=${profileDir}`, join(serviceDir, 'dist/main.js')], {
  cwd: serviceDir,
  env: { ...process.env, ...cacheBytes, PORT: String(port) },
  stdio: ['ignore', 'ignore', 'inherit'],
});
const url = `http://127.0.0.1:${port}/v1/member-checks`;
for (let attempt = 0; ; attempt++) {
  const up = await fetch(url, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify(TYPICAL_CHECK) }).then(
    (response) => response.status === 200,
    () => false,
  );
  if (up) break;
  if (attempt > 200) throw new Error('the service did not start');
  await new Promise((done) => setTimeout(done, 100));
}
// Samples before the load began (start-up, module loading) are left out.
const loadFromMicros = (performance.now() - spawnedAt) * 1000;
const load = await autocannon({ url, method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify(TYPICAL_CHECK), connections: 16, duration: seconds });
child.kill('SIGINT');
await new Promise((done) => child.once('exit', done));

const file = readdirSync(profileDir).find((name) => name.endsWith('.cpuprofile'));
if (!file) throw new Error('no profile written');
const profile = JSON.parse(readFileSync(join(profileDir, file), 'utf8')) as Profile;
const byId = new Map(profile.nodes.map((node) => [node.id, node]));
const microsByComponent = new Map<string, number>();
let elapsed = 0;
for (let i = 0; i < profile.samples.length; i++) {
  elapsed += profile.timeDeltas[i] ?? 0;
  if (elapsed < loadFromMicros) continue;
  const node = byId.get(profile.samples[i] as number);
  if (!node) continue;
  const component = componentOf(node.callFrame.functionName, node.callFrame.url);
  microsByComponent.set(component, (microsByComponent.get(component) ?? 0) + (profile.timeDeltas[i] ?? 0));
}
const busy = [...microsByComponent].filter(([name]) => name !== 'idle').reduce((sum, [, micros]) => sum + micros, 0);
const requests = load.requests.total;
const lines = [
  `Service in ${serviceDir}; ${requests} requests in ${seconds} s (${load.requests.average.toFixed(0)} req/s), answer cache ${process.env.PROFILE_CACHE === 'on' ? 'on' : 'off'}.`,
  'Self time of the sampled functions by the component their file belongs to, from when the load began; JSON.stringify counts where it is called.',
  '',
  '| component | share of busy time | us per request |',
  '| --- | ---: | ---: |',
];
for (const [component, micros] of [...microsByComponent].filter(([name]) => name !== 'idle').sort((a, b) => b[1] - a[1])) {
  lines.push(`| ${component} | ${((100 * micros) / busy).toFixed(1)} % | ${(micros / requests).toFixed(1)} |`);
}
lines.push(`| all busy time | 100 % | ${(busy / requests).toFixed(1)} |`);
console.log(lines.join('\n'));
