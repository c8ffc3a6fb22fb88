/**
 * Sizing: time to check and rank catalogue candidates for one member (no HTTP), for 18 (IPE), about
 * 100 (IPE, HEA, HEB, SHS, RHS) and every I-shaped section (IPE, HEA, HEB, W), per request and per
 * candidate.
 */

import { Bench } from 'tinybench';
import { loadCatalogues } from '../src/api/load-catalogues.js';
import { runMemberSizing } from '../src/api/member-sizing.js';
import { memberSizingRequest } from '../src/api/schemas/member-sizing-exchange.js';

/** A 3 m work-platform joist of a fictional maker. */
const joist = {
  member: { length: 3, supports: [{ position: 0, type: 'pinned' }, { position: 3, type: 'roller' }] },
  material: { grade: 'S355' },
  loads: [
    { type: 'distributed', from: 0, to: 3, qy: -6000 },
    { type: 'point', position: 1.1, fy: -4000 },
  ],
  selfWeight: true,
  output: { samples: 11 },
};

export async function run(): Promise<string> {
  const catalogues = await loadCatalogues({});
  const cases = [
    { name: 'IPE family', candidates: { family: 'IPE' } },
    { name: 'IPE, HEA, HEB, SHS, RHS', candidates: { families: ['IPE', 'HEA', 'HEB', 'SHS', 'RHS'] } },
    { name: 'IPE, HEA, HEB, W', candidates: { families: ['IPE', 'HEA', 'HEB', 'W'] } },
  ];
  const bench = new Bench({ time: 1500, warmupTime: 300 });
  const counts = new Map<string, number>();
  for (const c of cases) {
    const request = memberSizingRequest.parse({ ...joist, candidates: c.candidates });
    counts.set(c.name, runMemberSizing(request, catalogues).candidates.length);
    bench.add(c.name, () => {
      runMemberSizing(request, catalogues);
    });
  }
  await bench.run();
  const lines = ['| candidates | count | mean per request (ms) | per candidate (us) | samples |', '| --- | ---: | ---: | ---: | ---: |'];
  for (const task of bench.tasks) {
    const mean = task.result && 'latency' in task.result ? task.result.latency.mean : Number.NaN;
    const count = counts.get(task.name) ?? 1;
    const samples = task.result && 'latency' in task.result ? task.result.latency.samplesCount : 0;
    lines.push(`| ${task.name} | ${count} | ${mean.toFixed(3)} | ${((mean * 1000) / count).toFixed(1)} | ${samples} |`);
  }
  return lines.join('\n');
}
