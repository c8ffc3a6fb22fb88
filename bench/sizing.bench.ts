/**
 * Sizing: time to check and rank catalogue candidates for one member (no HTTP), for 18 (IPE), about
 * 100 (IPE, HEA, HEB, SHS, RHS) and every I-shaped section (IPE, HEA, HEB, W), per request and per
 * candidate.
 */

import { Bench } from 'tinybench';
import { loadCatalogues } from '../src/api/load-catalogues.js';
import { runMemberSizing } from '../src/api/member-sizing.js';
import { memberSizingRequest } from '../src/api/schemas/member-sizing-exchange.js';
import { PLATFORM_JOIST } from './typical-checks.js';

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
    const request = memberSizingRequest.parse({ ...PLATFORM_JOIST, candidates: c.candidates });
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
