/**
 * The request path of one member check, stage by stage, without the socket: where the time of a
 * request goes between Fastify handing over the body and the bytes leaving. Each stage is timed on
 * its own over the same input (median of many runs), so the rows add up to the path's cost with the
 * answer cache off. Fastify, the socket and logging are measured over HTTP by bench/http.ts and
 * bench/profile-http.ts.
 * The typical check is the one configurators send most: a simple span, a plain section, explicit
 * steel, two point loads and a uniform load, default output (101 samples).
 */

import { finiteJson } from '../src/api/answer-json.js';
import { checkRequest, normaliseCheck, presentCheck } from '../src/api/member-check.js';
import { QuantityReader } from '../src/api/normalise/quantity-reader.js';
import { resolveSection } from '../src/api/normalise/section.js';
import { loadCatalogues } from '../src/api/load-catalogues.js';
import { assertFinite } from '../src/api/finite-guard.js';
import { memberCheckRequest } from '../src/api/schemas/member-check-request.js';
import { parseBody } from '../src/api/validation.js';
import { analyseMember } from '../src/engine/analysis/analyse-member.js';
import { sampleDiagrams } from '../src/engine/analysis/sample-diagrams.js';
import { checkMember } from '../src/engine/checks/check-member.js';
import { TYPICAL_CHECK, CATALOGUE_CHECK } from './typical-checks.js';

/** Median time of `work` in microseconds, after a warm-up; `rounds` runs of `inner` calls each. */
function medianMicros(work: () => unknown, rounds = 400, inner = 25): number {
  for (let i = 0; i < 2000; i++) work();
  const times: number[] = [];
  for (let r = 0; r < rounds; r++) {
    const start = process.hrtime.bigint();
    for (let i = 0; i < inner; i++) work();
    times.push(Number(process.hrtime.bigint() - start) / inner / 1000);
  }
  times.sort((a, b) => a - b);
  return times[Math.floor(times.length / 2)] as number;
}

async function stages(name: string, body: unknown): Promise<string[]> {
  const catalogues = await loadCatalogues({});
  const text = JSON.stringify(body);
  const parsed = memberCheckRequest.parse(JSON.parse(text));
  const { check, checked } = checkRequest(parsed, catalogues);
  const { model, analysis, section, material } = checked;
  const answer = presentCheck(check, checked);
  const json = finiteJson(answer);
  const parse = medianMicros(() => JSON.parse(text));
  const sampling = medianMicros(() => sampleDiagrams(analysis, check.samples));
  const rows: [string, number][] = [
    ['JSON.parse of the body (as Fastify parses it)', parse],
    ['zod: shape and plain-number checks', medianMicros(() => parseBody(memberCheckRequest, JSON.parse(text))) - parse],
    [
      'normalisation: units to SI, catalogue look-ups, section properties',
      medianMicros(() => {
        const reader = new QuantityReader();
        const resolved = resolveSection(parsed.section, catalogues.sections, reader, ['section']);
        normaliseCheck(parsed, catalogues, [], reader);
        return resolved();
      }),
    ],
    ['engine: analysis (analyseMember)', medianMicros(() => analyseMember(model))],
    [
      'engine: checks (checkMember)',
      medianMicros(() =>
        checkMember({ analysis, model, section: section.properties, material, criteria: check.criteria, buckling: check.buckling, lateralTorsional: check.lateralTorsional, pins: check.pins }),
      ),
    ],
    ['sampling (sampleDiagrams)', sampling],
    ['presentation in the output units (presentCheck less sampling)', medianMicros(() => presentCheck(check, checked)) - sampling],
    ['serialisation with the finite guard folded in (finiteJson)', medianMicros(() => finiteJson(answer))],
  ];
  const total = rows.reduce((sum, [, micros]) => sum + micros, 0);
  const lines = [`### ${name} (answer ${(json.length / 1024).toFixed(1)} kB)`, '', '| stage | median (us) |', '| --- | ---: |'];
  for (const [stage, micros] of rows) lines.push(`| ${stage} | ${micros.toFixed(1)} |`);
  lines.push(`| all stages | ${total.toFixed(1)} |`);
  lines.push(`| (the finite guard as a walk over the answer, now only when its text holds "null") | ${medianMicros(() => assertFinite(answer)).toFixed(1)} |`);
  return lines;
}

export async function run(): Promise<string> {
  const lines = [
    ...(await stages('typical check: rectangle 50 x 150, explicit steel, 3 loads, 101 samples', TYPICAL_CHECK)),
    '',
    ...(await stages('batch item: IPE 160, S355, self-weight, 11 samples', CATALOGUE_CHECK)),
  ];
  return lines.join('\n');
}
