/**
 * A batch of 1,000 typical checks through the real route (Fastify inject: parsing, checks,
 * serialisation; no socket), and one single check through the route, for comparison; then the same
 * batch at 190 samples a diagram, in full and as summaries (output.detail), for the answer's size.
 */

import { Bench } from 'tinybench';
import { buildApp } from '../src/app.js';

/** Shelf beams of a fictional shelving maker: bay widths, catalogue sections and loads vary. */
function typicalCheck(i: number) {
  const length = 1.8 + (i % 10) * 0.3;
  return {
    id: `config-${i}`,
    member: { length: `${length} m`, supports: [{ position: 0, type: 'pinned' }, { position: `${length} m`, type: 'roller' }] },
    section: { designation: ['IPE 120', 'IPE 140', 'IPE 160', 'HEA 120', 'SHS 100x100x5'][i % 5] },
    material: { grade: i % 2 === 0 ? 'S355' : 'S275' },
    loads: [
      { type: 'distributed', from: 0, to: `${length} m`, qy: `${-2 - (i % 7)} kN/m` },
      { type: 'point', position: `${length / 3} m`, fy: '-3 kN' },
    ],
    selfWeight: true,
    output: { samples: 11 },
  };
}

export async function run(): Promise<string> {
  // The answer cache off; overload shedding on, as in service: a batch worked in slices must not get the next request shed.
  const app = await buildApp({ answerCacheBytes: 0 });
  const items = Array.from({ length: 1000 }, (_, i) => typicalCheck(i));
  const batchBody = JSON.stringify({ items });
  const { id: _id, ...singleCheck } = typicalCheck(3);
  const singleBody = JSON.stringify(singleCheck);
  const send = async (url: string, payload: string) => {
    const response = await app.inject({ method: 'POST', url, payload, headers: { 'content-type': 'application/json' } });
    if (response.statusCode !== 200) throw new Error(`${url}: ${response.statusCode} ${response.body.slice(0, 200)}`);
    return response;
  };
  const sample = await send('/v1/member-checks/batch', batchBody);
  const withOutput = (output: object) => JSON.stringify({ items: items.map((item) => ({ ...item, output })) });
  const detailedBodies = {
    'batch of 1,000, 190 samples, full': withOutput({ samples: 190 }),
    'batch of 1,000, 190 samples, summary': withOutput({ samples: 190, detail: 'summary' }),
  };
  const answerSizes = new Map<string, number>([['batch of 1,000 checks', sample.body.length]]);
  const batch = new Bench({ time: 4000, warmupTime: 500, iterations: 3 });
  batch.add('batch of 1,000 checks', async () => {
    await send('/v1/member-checks/batch', batchBody);
  });
  for (const [name, body] of Object.entries(detailedBodies)) {
    answerSizes.set(name, (await send('/v1/member-checks/batch', body)).body.length);
    batch.add(name, async () => {
      await send('/v1/member-checks/batch', body);
    });
  }
  const single = new Bench({ time: 2000, warmupTime: 300 });
  single.add('one check', async () => {
    await send('/v1/member-checks', singleBody);
  });
  await batch.run();
  await single.run();
  await app.close();
  const lines = ['| request | mean (ms) | checks per second | body in / out (kB) |', '| --- | ---: | ---: | ---: |'];
  for (const task of [...batch.tasks, ...single.tasks]) {
    if (task.result && 'error' in task.result) throw task.result.error;
    const mean = task.result && 'latency' in task.result ? task.result.latency.mean : Number.NaN;
    const checks = task.name.startsWith('batch') ? 1000 : 1;
    const body = (detailedBodies as Record<string, string>)[task.name] ?? batchBody;
    const sizes = task.name.startsWith('batch') ? `${(body.length / 1024).toFixed(0)} / ${((answerSizes.get(task.name) ?? 0) / 1024).toFixed(0)}` : `${(singleBody.length / 1024).toFixed(1)} / -`;
    lines.push(`| ${task.name} | ${mean.toFixed(2)} | ${((checks * 1000) / mean).toFixed(0)} | ${sizes} |`);
  }
  lines.push(`\nHeap used after the runs: ${(process.memoryUsage().heapUsed / 2 ** 20).toFixed(0)} MiB.`);
  return lines.join('\n');
}
