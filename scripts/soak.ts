/**
 * Soak: the built service (dist/main.js) under 64 connections for a while, as a configurator, a
 * quoting pipeline and a dashboard would load it together: repeated checks (answered from the cache),
 * fresh checks (a load that changes every request) and small batches. Reports throughput, errors,
 * non-2xx answers, latency percentiles and the resident memory over the run (its drift after the
 * warm-up), then stops the service with SIGTERM and reports how it exited.
 *
 *   npm run soak -- --duration 300 --connections 64
 */

import { spawn } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { createServer } from 'node:net';
import { fileURLToPath } from 'node:url';
import autocannon from 'autocannon';
import { PLATFORM_JOIST, TYPICAL_CHECK } from '../bench/typical-checks.js';

const root = fileURLToPath(new URL('..', import.meta.url));

function option(name: string, fallback: number): number {
  const i = process.argv.indexOf(`--${name}`);
  const value = i >= 0 ? Number(process.argv[i + 1]) : fallback;
  if (!Number.isFinite(value) || value <= 0) throw new Error(`--${name} must be a positive number`);
  return value;
}

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.listen(0, '127.0.0.1', () => {
      const address = server.address();
      server.close(() => (typeof address === 'object' && address ? resolve(address.port) : reject(new Error('no port'))));
    });
  });
}

/** Resident memory of a process, bytes (Linux /proc). */
function residentBytes(pid: number): number {
  const match = /VmRSS:\s+(\d+) kB/.exec(readFileSync(`/proc/${pid}/status`, 'utf8'));
  return match ? Number(match[1]) * 1024 : Number.NaN;
}

async function waitUntilReady(url: string): Promise<void> {
  for (let i = 0; i < 200; i++) {
    try {
      if ((await fetch(`${url}/readyz`)).ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
  throw new Error('the service did not become ready');
}

function median(values: readonly number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.floor(sorted.length / 2)] ?? Number.NaN;
}

const mib = (bytes: number) => `${(bytes / 1048576).toFixed(1)} MiB`;

async function main(): Promise<void> {
  const duration = option('duration', 60);
  const connections = option('connections', 64);
  const port = await freePort();
  const url = `http://127.0.0.1:${port}`;
  const child = spawn(process.execPath, ['dist/main.js'], { cwd: root, env: { ...process.env, PORT: String(port), HOST: '127.0.0.1', LOG_LEVEL: 'warn' }, stdio: ['ignore', 'inherit', 'inherit'] });
  const exited = new Promise<number | null>((resolve) => child.once('exit', (code) => resolve(code)));
  await waitUntilReady(url);
  const pid = child.pid as number;
  const rss: number[] = [];
  // Once a second: the resident memory, and how long /healthz takes while the load runs.
  const health: number[] = [];
  const sampler = setInterval(() => {
    rss.push(residentBytes(pid));
    const started = performance.now();
    fetch(`${url}/healthz`).then(
      () => health.push(performance.now() - started),
      () => health.push(Number.NaN),
    );
  }, 1000);
  rss.push(residentBytes(pid));

  let fresh = 0;
  const batch = JSON.stringify({ items: Array.from({ length: 20 }, (_, i) => ({ ...PLATFORM_JOIST, output: { samples: 11 }, loads: [{ type: 'distributed', from: 0, to: 2.7, qy: -6000 - i }] })) });
  const result = await autocannon({
    url,
    connections,
    duration,
    requests: [
      { method: 'POST', path: '/v1/member-checks', headers: { 'content-type': 'application/json' }, body: JSON.stringify(TYPICAL_CHECK) },
      {
        method: 'POST',
        path: '/v1/member-checks',
        headers: { 'content-type': 'application/json' },
        // A load that changes every request: never in the answer cache.
        setupRequest: (request) => ({ ...request, body: JSON.stringify({ ...TYPICAL_CHECK, loads: [{ type: 'point', position: 1.5, fy: -1000 - (fresh++ % 100000) }] }) }),
      },
      { method: 'POST', path: '/v1/member-checks/batch', headers: { 'content-type': 'application/json' }, body: batch },
    ],
  });
  clearInterval(sampler);
  rss.push(residentBytes(pid));
  child.kill('SIGTERM');
  const code = await exited;

  const warm = rss.slice(Math.min(rss.length - 1, 5));
  const statusCounts = Object.entries(result.statusCodeStats ?? {}).map(([status, stats]) => `${status}: ${(stats as { count: number }).count}`).join(', ');
  const lines = [
    `Soak: ${connections} connections, ${duration} s, node ${process.version}`,
    `requests: ${result.requests.total} (${result.requests.average.toFixed(0)} req/s on average)`,
    `answers by status: ${statusCounts}; non-2xx: ${result.non2xx}; errors (connection): ${result.errors}; timeouts: ${result.timeouts}`,
    `latency: p50 ${result.latency.p50} ms, p99 ${result.latency.p99} ms, max ${result.latency.max} ms`,
    `resident memory: start ${mib(rss[0] as number)}, after warm-up ${mib(warm[0] as number)}, end ${mib(rss[rss.length - 1] as number)}, largest ${mib(Math.max(...rss))}; drift after warm-up ${mib((rss[rss.length - 1] as number) - (warm[0] as number))}`,
    `/healthz under load: ${health.length} probes, median ${median(health).toFixed(1)} ms, slowest ${Math.max(...health).toFixed(1)} ms`,
    `SIGTERM: exited with code ${code}`,
  ];
  console.log(lines.join('\n'));
  if (result.errors > 0 || code !== 0) process.exitCode = 1;
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
