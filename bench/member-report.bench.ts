/**
 * Calculation record: time of memberReportHtml alone (the page around an already drawn figure) and of
 * the whole record of POST /v1/member-reports without the socket (check, answer, figure, page), for the
 * typical check (101 samples) and the aisle beam with load combinations and a trolley.
 */

import { Bench } from 'tinybench';
import { loadCatalogues } from '../src/api/load-catalogues.js';
import { memberReport, memberReportInput } from '../src/api/member-record.js';
import { MEMBER_CHECK_COMBINATIONS_EXAMPLE, memberCheckRequest } from '../src/api/schemas/member-check-request.js';
import { memberReportHtml } from '../src/rendering/member-report-html.js';
import { TYPICAL_CHECK } from './typical-checks.js';

const META = { title: 'Work platform WP-12, joist J3', reference: 'Q-2026-0412', preparedBy: 'A. Engineer' };

export async function run(): Promise<string> {
  const catalogues = await loadCatalogues({});
  const cases = [
    { name: 'typical check', request: memberCheckRequest.parse(TYPICAL_CHECK) },
    { name: 'aisle beam, 7 combinations with a trolley', request: memberCheckRequest.parse(MEMBER_CHECK_COMBINATIONS_EXAMPLE) },
  ];
  const bench = new Bench({ time: 1500, warmupTime: 300 });
  const sizes = new Map<string, number>();
  for (const c of cases) {
    const input = memberReportInput(c.request, META, catalogues);
    sizes.set(c.name, memberReportHtml(input).length);
    bench.add(`${c.name}: page alone`, () => {
      memberReportHtml(input);
    });
    bench.add(`${c.name}: whole record`, () => {
      memberReport(c.request, META, catalogues);
    });
  }
  await bench.run();
  const lines = ['| record | page (kB) | mean (ms) | p99 (ms) | samples |', '| --- | ---: | ---: | ---: | ---: |'];
  for (const task of bench.tasks) {
    const latency = task.result && 'latency' in task.result ? task.result.latency : undefined;
    const size = sizes.get(task.name.split(':')[0] as string) ?? 0;
    lines.push(`| ${task.name} | ${(size / 1024).toFixed(1)} | ${(latency?.mean ?? Number.NaN).toFixed(3)} | ${(latency?.p99 ?? Number.NaN).toFixed(3)} | ${latency?.samplesCount ?? 0} |`);
  }
  return lines.join('\n');
}
