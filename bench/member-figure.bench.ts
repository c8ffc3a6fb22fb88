/**
 * Member figure: time of memberFigureSvg alone (no HTTP, no engine) on the answers of two checks run
 * through the service code, default output (101 samples): the typical check (elevation and three
 * panels) and the same member with loads in every direction (elevation, plan and all nine panels).
 */

import { Bench } from 'tinybench';
import { loadCatalogues } from '../src/api/load-catalogues.js';
import { runMemberCheck } from '../src/api/member-check.js';
import { memberCheckRequest } from '../src/api/schemas/member-check-request.js';
import type { FigureInput } from '../src/rendering/figure-input.js';
import { memberFigureSvg } from '../src/rendering/member-figure-svg.js';
import { TYPICAL_CHECK } from './typical-checks.js';

/** The typical check with a sideways load, an axial pull and a torque, so no diagram is zero. */
const EVERY_DIRECTION = {
  ...TYPICAL_CHECK,
  loads: [
    ...TYPICAL_CHECK.loads,
    { type: 'point', position: 2, fz: 800, mx: 150 },
    { type: 'point', position: 4, fx: 5000 },
  ],
};

/** Point and distributed loads as these benchmark requests give them: plain SI numbers, uniform intensities. */
interface PlainLoad {
  type: string;
  position?: number;
  from?: number;
  to?: number;
  fx?: number;
  fy?: number;
  fz?: number;
  mx?: number;
  my?: number;
  mz?: number;
  qy?: number;
  qz?: number;
}

/** A figure of an answer in SI, as a caller builds one: the member and loads from the request, the rest from the answer. */
async function figureInputOf(body: { member: { length: number; supports: { position: number; type: string }[] }; loads: readonly PlainLoad[] }): Promise<FigureInput> {
  const answer = runMemberCheck(memberCheckRequest.parse(body), await loadCatalogues({}));
  const loads = body.loads;
  return {
    title: 'Benchmark member',
    units: answer.units,
    length: body.member.length,
    supports: body.member.supports.map((s) => ({ position: s.position, kind: s.type as 'pinned' | 'roller' })),
    hinges: [],
    pointLoads: loads
      .filter((l) => l.type === 'point')
      .map((l) => ({ position: l.position ?? 0, fx: l.fx ?? 0, fy: l.fy ?? 0, fz: l.fz ?? 0, mx: l.mx ?? 0, my: l.my ?? 0, mz: l.mz ?? 0 })),
    distributedLoads: loads
      .filter((l) => l.type === 'distributed')
      .map((l) => ({ from: l.from ?? 0, to: l.to ?? 0, qy: [l.qy ?? 0, l.qy ?? 0] as const, qz: [l.qz ?? 0, l.qz ?? 0] as const })),
    diagrams: answer.diagrams as NonNullable<typeof answer.diagrams>,
    extremes: answer.extremes,
  };
}

export async function run(): Promise<string> {
  const cases = [
    { name: 'typical check', input: await figureInputOf(TYPICAL_CHECK) },
    { name: 'loads in every direction', input: await figureInputOf(EVERY_DIRECTION) },
  ];
  const bench = new Bench({ time: 1500, warmupTime: 300 });
  const shapes = new Map<string, string>();
  for (const c of cases) {
    const svg = memberFigureSvg(c.input);
    const panels = svg.split('<g class="panel"').length - 1;
    shapes.set(c.name, `| ${c.input.diagrams.x.length} | ${panels} | ${(svg.length / 1024).toFixed(1)}`);
    bench.add(c.name, () => {
      memberFigureSvg(c.input);
    });
  }
  await bench.run();
  const lines = ['| figure | positions | panels | SVG (kB) | mean (us) | p99 (us) | samples |', '| --- | ---: | ---: | ---: | ---: | ---: | ---: |'];
  for (const task of bench.tasks) {
    const latency = task.result && 'latency' in task.result ? task.result.latency : undefined;
    const mean = latency ? latency.mean * 1000 : Number.NaN;
    const p99 = latency?.p99 !== undefined ? latency.p99 * 1000 : Number.NaN;
    lines.push(`| ${task.name} ${shapes.get(task.name) ?? '| | |'} | ${mean.toFixed(1)} | ${p99.toFixed(1)} | ${latency?.samplesCount ?? 0} |`);
  }
  return lines.join('\n');
}
