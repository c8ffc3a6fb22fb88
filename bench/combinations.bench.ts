/**
 * Load combinations and moving loads: one request end to end without the socket (normalise, every
 * combination and train position, present, serialise), for the contract's aisle-beam example and for
 * the sizing of the feature: 10 load cases x 20 combinations x 100 train positions on a
 * two-bay platform beam (an invented member of a work-platform maker).
 */

import { Bench } from 'tinybench';
import { finiteJson } from '../src/api/answer-json.js';
import { loadCatalogues } from '../src/api/load-catalogues.js';
import { checkRequest, presentCheck } from '../src/api/member-check.js';
import { MEMBER_CHECK_COMBINATIONS_EXAMPLE, memberCheckRequest } from '../src/api/schemas/member-check-request.js';

const CATEGORIES = ['permanent', 'permanent', 'imposed', 'imposed', 'imposed', 'imposed', 'snow', 'wind', 'other', 'accidental'] as const;

/** A 7.2 m beam over two bays of 3.6 m: ten load cases, a two-axle trolley, twenty combinations. */
function largeCase(movingSteps: boolean) {
  const loadCases = CATEGORIES.map((category, i) => ({
    id: `case-${i + 1}`,
    category,
    loads: [
      { type: 'distributed', from: 0.3 * i, to: 7.2 - 0.2 * i, qy: -(400 + 150 * i) },
      { type: 'point', position: 0.5 + 0.6 * i, fy: -(1500 + 300 * i), fz: category === 'wind' ? 800 : 0 },
    ],
  }));
  const combinations = Array.from({ length: 20 }, (_, c) => ({
    id: `combination-${c + 1}`,
    purpose: c < 14 ? 'strength' : 'serviceability',
    factors: Object.fromEntries([...loadCases.map((loadCase, i) => [loadCase.id, ((c + i) % 3) * 0.5]), ...(movingSteps ? [['trolley', 1 + (c % 4) * 0.1]] : [])]),
  }));
  return {
    member: {
      length: 7.2,
      supports: [
        { position: 0, type: 'pinned' },
        { position: 3.6, type: 'roller' },
        { position: 7.2, type: 'roller' },
      ],
    },
    section: { designation: 'IPE 270' },
    material: { grade: 'S355' },
    loadCases,
    ...(movingSteps ? { movingLoads: [{ id: 'trolley', category: 'imposed', axles: [{ offset: 0, fy: -4000 }, { offset: 0.9, fy: -4000 }], step: 0.063 }] } : {}),
    combinations,
  };
}

export async function run(): Promise<string> {
  const catalogues = await loadCatalogues({});
  const cases = [
    { name: 'aisle beam example (default set: 7 combinations, 4 with the trolley)', body: MEMBER_CHECK_COMBINATIONS_EXAMPLE },
    { name: '10 cases x 20 combinations, no moving load', body: largeCase(false) },
    { name: '10 cases x 20 combinations x 100 trolley positions', body: largeCase(true) },
  ];
  const bench = new Bench({ time: 3000, warmupTime: 500, iterations: 3 });
  const facts = new Map<string, { states: number; bytes: number }>();
  for (const c of cases) {
    const request = memberCheckRequest.parse(c.body);
    const once = () => {
      const { check, checked } = checkRequest(request, catalogues);
      return { check, text: finiteJson(presentCheck(check, checked)) };
    };
    const { check, text } = once();
    facts.set(c.name, { states: check.combinations?.loadStates ?? 1, bytes: text.length });
    bench.add(c.name, () => {
      once();
    });
  }
  await bench.run();
  const lines = ['| request | load states | answer (kB) | mean per request (ms) | per load state (us) | samples |', '| --- | ---: | ---: | ---: | ---: | ---: |'];
  for (const task of bench.tasks) {
    const result = task.result as { latency: { mean: number; samplesCount?: number }; samples?: number[] } | undefined;
    const mean = result?.latency.mean ?? Number.NaN;
    const fact = facts.get(task.name) as { states: number; bytes: number };
    lines.push(`| ${task.name} | ${fact.states} | ${(fact.bytes / 1024).toFixed(0)} | ${mean.toFixed(1)} | ${((mean * 1000) / fact.states).toFixed(1)} | ${result?.latency.samplesCount ?? result?.samples?.length ?? ''} |`);
  }
  return lines.join('\n');
}
