/**
 * Engine time of analyseMember: one ordinary check, then growth with the number of spans and with the
 * number of point loads, per analysis and per node, so that linear growth shows as a flat time per
 * node. run() returns the table as text.
 */

import { Bench } from 'tinybench';
import { analyseMember } from '../src/engine/analysis/analyse-member.js';
import type { MemberModel } from '../src/engine/member/model.js';
import { pinned, point, roller, uniform } from './member-models.js';

const STIFFNESS = { axial: 4.2e8, bendingZ: 4.2e6, bendingY: 3.15e5, torsional: 5.67e3 };
/** A 6 m shelf beam: uniform load, a point load and a sideways point load. */
function simpleSpan(): MemberModel {
  return {
    length: 6,
    supports: [pinned(0), roller(6)],
    hinges: [],
    loads: [uniform(0, 6, -2e3), point(2.5, { fy: -5e3 }), point(4, { fz: 800 })],
    stiffness: STIFFNESS,
  };
}

/** n spans of 5 m on n + 1 supports under one uniform load. */
function continuousBeam(spans: number): MemberModel {
  const length = 5 * spans;
  return {
    length,
    supports: Array.from({ length: spans + 1 }, (_, i) => (i === 0 ? pinned(0) : roller(5 * i))),
    hinges: [],
    loads: [uniform(0, length, -2e3)],
    stiffness: STIFFNESS,
  };
}

/** A 10 m simple span with n equal point loads evenly spread. */
function manyPointLoads(count: number): MemberModel {
  return {
    length: 10,
    supports: [pinned(0), roller(10)],
    hinges: [],
    loads: Array.from({ length: count }, (_, i) => point((10 * (i + 0.5)) / count, { fy: -1e3 })),
    stiffness: STIFFNESS,
  };
}

interface Row {
  readonly name: string;
  readonly nodes: number;
  /** Median and mean time of one analysis. */
  readonly median: number;
  readonly mean: number;
}

async function timeOf(name: string, model: MemberModel): Promise<Row> {
  const nodes = analyseMember(model).nodes.length;
  const bench = new Bench({ time: 800, iterations: 5, warmupTime: 100, warmupIterations: 2 });
  bench.add(name, () => {
    analyseMember(model);
  });
  await bench.run();
  const result = bench.tasks[0]?.result;
  if (!result || !('latency' in result)) throw new Error(`benchmark ${name} did not complete`);
  return { name, nodes, median: result.latency.p50, mean: result.latency.mean };
}

export async function run(): Promise<string> {
  const rows: Row[] = [await timeOf('simple span, three loads', simpleSpan())];
  for (const n of [10, 100, 1000, 10000]) rows.push(await timeOf(`continuous beam, ${n} spans`, continuousBeam(n)));
  for (const n of [10, 100, 1000, 10000]) rows.push(await timeOf(`simple span, ${n} point loads`, manyPointLoads(n)));
  const header =
    `${'case'.padEnd(34)}${'nodes'.padStart(8)}${'median ms'.padStart(12)}${'mean ms'.padStart(12)}` +
    `${'median us / node'.padStart(18)}`;
  const lines = rows.map(
    (row) =>
      `${row.name.padEnd(34)}${String(row.nodes).padStart(8)}${row.median.toFixed(3).padStart(12)}` +
      `${row.mean.toFixed(3).padStart(12)}${((1000 * row.median) / row.nodes).toFixed(2).padStart(18)}`,
  );
  return ['analyseMember (engine only, one analysis per iteration)', header, ...lines].join('\n');
}
