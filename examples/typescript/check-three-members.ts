/**
 * Checks three members of Fernhollow Racking, a fictional maker of steel shelving and work platforms,
 * with the typed client, and prints each verdict, governing failure mode and utilization.
 *
 *   npx tsx examples/typescript/check-three-members.ts [baseUrl]
 *
 * baseUrl: the first argument, else MEMBERPROOF_URL, else http://127.0.0.1:3000. Exit status: 0 when
 * every member was answered (a "fail" verdict is an answer too), 1 on a transport error (no service
 * there, connection refused), 2 when the service answered a member with a problem (RFC 9457).
 */

import { pathToFileURL } from 'node:url';
import {
  createMemberproofClient,
  type MemberCheckRequest,
  type MemberCheckResponse,
  type MemberproofFetch,
  type Problem,
} from '../../clients/typescript/index.js';

export const DEFAULT_BASE_URL = 'http://127.0.0.1:3000';

export interface Scenario {
  readonly name: string;
  readonly body: MemberCheckRequest;
}

/** Invented scenarios: the loads are illustrations, not anyone's design values. */
export const SCENARIOS: readonly Scenario[] = [
  {
    name: 'shelf beam, RHS 100x50x4 in S355 over 2.7 m',
    body: {
      member: {
        length: '2.7 m',
        supports: [
          { position: 0, type: 'pinned', label: 'left upright' },
          { position: '2.7 m', type: 'roller', label: 'right upright' },
        ],
      },
      section: { designation: 'RHS 100x50x4' },
      material: { grade: 'S355' },
      loads: [{ type: 'distributed', from: 0, to: '2.7 m', qy: '-3.2 kN/m', label: 'boxed stock' }],
      selfWeight: true,
      output: { samples: 11, units: { length: 'mm', force: 'kN', moment: 'kN*m', stress: 'MPa' } },
    },
  },
  {
    name: 'work-platform joist, IPE 140 in S275 over 3.0 m, with a point load',
    body: {
      member: {
        length: '3.0 m',
        supports: [
          { position: 0, type: 'pinned', label: 'edge beam' },
          { position: '3.0 m', type: 'roller', label: 'back beam' },
        ],
      },
      section: { designation: 'IPE 140' },
      material: { grade: 'S275' },
      loads: [
        { type: 'distributed', from: 0, to: '3.0 m', qy: '-1.8 kN/m', label: 'grating and foot traffic' },
        { type: 'point', position: '1.8 m', fy: '-4.5 kN', label: 'fitter with a parts cart' },
      ],
      selfWeight: true,
      output: { samples: 11, units: { length: 'mm', force: 'kN', moment: 'kN*m', stress: 'MPa' } },
    },
  },
  {
    // A post stands along x; gravity is -y in the member's axes, so its own weight is left out here.
    name: 'handrail post, NPS 1-1/2 SCH 40 in A500 Gr B, 42 in, US units',
    body: {
      member: { length: '42 in', supports: [{ position: 0, type: 'fixed', label: 'base plate' }] },
      section: { designation: 'NPS 1-1/2 SCH 40' },
      material: { grade: 'A500 Gr B (round)' },
      loads: [{ type: 'point', position: '42 in', fz: '200 lbf', label: 'outward push on the top rail' }],
      output: { samples: 11, units: 'US' },
    },
  },
];

export type MemberOutcome =
  | {
      readonly name: string;
      readonly kind: 'answer';
      readonly verdict: MemberCheckResponse['verdict'];
      /** Absent when nothing has any demand. */
      readonly governing?: NonNullable<MemberCheckResponse['governing']>;
      readonly notices: readonly string[];
    }
  | { readonly name: string; readonly kind: 'problem'; readonly status: number; readonly problem?: Problem };

export interface MainOptions {
  readonly fetchImpl?: MemberproofFetch;
  readonly log?: (line: string) => void;
}

/** The base URL: the first argument, else MEMBERPROOF_URL, else the local default. */
export function baseUrlFrom(args: readonly string[], environment: NodeJS.ProcessEnv): string {
  return args[0] || environment.MEMBERPROOF_URL || DEFAULT_BASE_URL;
}

function describeAnswer(outcome: Extract<MemberOutcome, { kind: 'answer' }>): string {
  if (outcome.governing === undefined) return `${outcome.verdict}, nothing has any demand`;
  const { mode, utilization } = outcome.governing;
  return `${outcome.verdict}, governing ${mode} at utilization ${utilization.toFixed(3)}`;
}

function describeProblem(outcome: Extract<MemberOutcome, { kind: 'problem' }>): string[] {
  const problem = outcome.problem;
  if (problem === undefined) return [`HTTP ${outcome.status}, no problem details in the answer`];
  const lines = [`HTTP ${outcome.status} ${problem.title}: ${problem.detail}`];
  for (const field of problem.errors ?? []) lines.push(`    at ${field.pointer}: ${field.message}`);
  if (problem.nearest !== undefined && problem.nearest.length > 0) lines.push(`    nearest: ${problem.nearest.join(', ')}`);
  return lines;
}

/**
 * Checks every scenario in turn and returns what the service answered for each. A transport error
 * (fetch rejects) is thrown as it is; a problem answer is returned, not thrown.
 */
export async function main(baseUrl: string, options: MainOptions = {}): Promise<MemberOutcome[]> {
  const log = options.log ?? ((line: string) => console.log(line));
  const client = createMemberproofClient(baseUrl, options.fetchImpl);
  const outcomes: MemberOutcome[] = [];
  for (const scenario of SCENARIOS) {
    const { data, error, response } = await client.POST('/v1/member-checks', { body: scenario.body });
    let outcome: MemberOutcome;
    if (data !== undefined) {
      outcome = {
        name: scenario.name,
        kind: 'answer',
        verdict: data.verdict,
        ...(data.governing === undefined ? {} : { governing: data.governing }),
        notices: data.notices,
      };
      log(`${scenario.name}: ${describeAnswer(outcome)}`);
    } else {
      // A proxy may answer a 5xx that is not JSON: openapi-fetch then hands over its text, or nothing.
      const problem = typeof error === 'object' && error !== null ? error : undefined;
      outcome = { name: scenario.name, kind: 'problem', status: response.status, ...(problem === undefined ? {} : { problem }) };
      log(`${scenario.name}: ${describeProblem(outcome).join('\n')}`);
    }
    outcomes.push(outcome);
  }
  const caution = outcomes.find((outcome) => outcome.kind === 'answer')?.notices[0];
  if (caution !== undefined) log(`\n${caution}`);
  return outcomes;
}

/** 0 when every member was answered, 2 when any came back as a problem. */
export function exitCodeFor(outcomes: readonly MemberOutcome[]): number {
  return outcomes.some((outcome) => outcome.kind === 'problem') ? 2 : 0;
}

async function runFromCommandLine(): Promise<void> {
  const baseUrl = baseUrlFrom(process.argv.slice(2), process.env);
  try {
    process.exitCode = exitCodeFor(await main(baseUrl));
  } catch (error) {
    const cause = error instanceof Error && error.cause instanceof Error ? ` (${error.cause.message})` : '';
    console.error(`cannot reach Memberproof at ${baseUrl}: ${error instanceof Error ? error.message : String(error)}${cause}`);
    process.exitCode = 1;
  }
}

if (process.argv[1] !== undefined && import.meta.url === pathToFileURL(process.argv[1]).href) {
  await runFromCommandLine();
}
