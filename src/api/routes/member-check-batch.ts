/** POST /v1/member-checks/batch */

import type { FastifyInstance } from 'fastify';
import { SCREENING_CAUTION } from '../../engine/caution.js';
import type { Verdict } from '../../engine/checks/check-outcome.js';
import { problemFromError } from '../error-handler.js';
import { finiteJson, sendJsonText } from '../answer-json.js';
import { runMemberCheck, type Catalogues, type WorkBudget } from '../member-check.js';
import { PROBLEMS, ProblemError } from '../problems.js';
import type { RouteContract } from '../route-contract.js';
import { BATCH_EXAMPLE, batchEnvelope, batchItem, batchRequest, batchResponse, MAX_BATCH_ITEMS } from '../schemas/batch-exchange.js';
import { DEFAULT_SAMPLES } from '../schemas/output-options.js';
import { parseBody } from '../validation.js';
import { checkInSlices } from '../work-slices.js';

export const DEFAULT_BATCH_BODY_LIMIT = 16 * 1024 * 1024;

/** Load states over all items (one for an item without combinations): bounds the work of one batch. */
export const MAX_BATCH_LOAD_STATES = 20000;

export const memberCheckBatchContract: RouteContract = {
  method: 'post',
  path: '/v1/member-checks/batch',
  operationId: 'checkMembers',
  summary: 'Check many members in one request',
  description: `Up to ${MAX_BATCH_ITEMS} member checks, each answered as the single check would answer it; one bad item never fails the batch. The body may be up to 16 MiB by default, and the diagrams of all items together up to 200,000 points (413 beyond). Items with load combinations share a budget of ${MAX_BATCH_LOAD_STATES} load states (one per combination and train position searched; one for an item without combinations): an item beyond it is answered with a 422 too-much-work problem of its own.`,
  tag: 'members',
  body: batchRequest,
  response: batchResponse,
  responseDescription: 'One result per item, in order, and a summary.',
  problems: ['tooManyItems'],
  exampleBody: BATCH_EXAMPLE,
};

/** One item's outcome; a result is kept as its JSON text, serialised (and guarded) once. */
type BatchOutcome =
  | { index: number; id?: string | number; status: 200; resultJson: string; verdict: Verdict; utilization: number }
  | { index: number; id?: string | number; status: number; error: ReturnType<ProblemError['body']> };

/** Diagram points over all items bound the size of the answer (each point carries 12 numbers). */
export const MAX_BATCH_DIAGRAM_POINTS = 200000;

function requestedSamples(item: unknown): number {
  const samples = (item as { output?: { samples?: unknown } } | null)?.output?.samples;
  return typeof samples === 'number' && Number.isFinite(samples) ? Math.max(samples, 0) : DEFAULT_SAMPLES;
}

function itemId(item: unknown): string | number | undefined {
  if (item === null || typeof item !== 'object') return undefined;
  const id = (item as { id?: unknown }).id;
  return (typeof id === 'string' && id.length <= 128) || (typeof id === 'number' && Number.isInteger(id)) ? id : undefined;
}

function checkItem(item: unknown, index: number, catalogues: Catalogues, instance: string, budget: WorkBudget): BatchOutcome {
  const id = itemId(item);
  const withId = id === undefined ? { index } : { index, id };
  try {
    const { id: _id, ...body } = parseBody(batchItem, item, ['items', index]);
    const result = runMemberCheck(body, catalogues, ['items', index], budget);
    return { ...withId, status: 200, resultJson: finiteJson(result), verdict: result.verdict, utilization: result.governing?.utilization ?? 0 };
  } catch (error) {
    const problem = problemFromError(error);
    if (!problem) throw error;
    return { ...withId, status: PROBLEMS[problem.problem].status, error: problem.body(instance) };
  }
}

/** An outcome as JSON.stringify would write it (index, id, status, then result or error), the result's text spliced in. */
function outcomeJson(outcome: BatchOutcome): string {
  if (!('resultJson' in outcome)) return JSON.stringify(outcome);
  const id = outcome.id === undefined ? '' : `,"id":${JSON.stringify(outcome.id)}`;
  return `{"index":${outcome.index}${id},"status":200,"result":${outcome.resultJson}}`;
}

export function memberCheckBatchRoutes(catalogues: Catalogues, bodyLimit: number) {
  return async function register(app: FastifyInstance): Promise<void> {
    app.post('/v1/member-checks/batch', { bodyLimit }, async (request, reply) => {
      const { items } = parseBody(batchEnvelope, request.body);
      if (items.length > MAX_BATCH_ITEMS) {
        throw new ProblemError('tooManyItems', `The batch holds ${items.length} items; at most ${MAX_BATCH_ITEMS} are accepted.`, [{ pointer: '/items', message: `at most ${MAX_BATCH_ITEMS} items` }]);
      }
      const points = items.reduce<number>((sum, item) => sum + requestedSamples(item), 0);
      if (points > MAX_BATCH_DIAGRAM_POINTS) {
        throw new ProblemError('tooManyItems', `The batch asks for ${points} diagram points in all; at most ${MAX_BATCH_DIAGRAM_POINTS}: lower output.samples.`, [{ pointer: '/items', message: `at most ${MAX_BATCH_DIAGRAM_POINTS} diagram points in all` }]);
      }
      const budget: WorkBudget = { remaining: MAX_BATCH_LOAD_STATES, limit: MAX_BATCH_LOAD_STATES };
      request.observed.batchItems = items.length;
      const { results, computeSeconds } = await checkInSlices(items, (item, index) => checkItem(item, index, catalogues, request.url, budget));
      request.observed.engineSeconds = computeSeconds;
      request.observed.verdicts = results.flatMap((outcome) => ('verdict' in outcome ? [outcome.verdict] : []));
      let pass = 0;
      let fail = 0;
      let notVerified = 0;
      let worst: { utilization: number; index: number } | undefined;
      for (const outcome of results) {
        if (!('resultJson' in outcome)) continue;
        if (outcome.verdict === 'pass') pass++;
        else if (outcome.verdict === 'fail') fail++;
        else notVerified++;
        if (worst === undefined || outcome.utilization > worst.utilization) worst = { utilization: outcome.utilization, index: outcome.index };
      }
      const summary = {
        total: results.length,
        pass,
        fail,
        notVerified,
        error: results.length - pass - fail - notVerified,
        ...(worst === undefined ? {} : { worstUtilization: worst.utilization, worstIndex: worst.index }),
      };
      const resultsJson = results.map(outcomeJson).join(',');
      return sendJsonText(reply, `{"results":[${resultsJson}],"summary":${finiteJson(summary)},"notices":${JSON.stringify([SCREENING_CAUTION])}}`);
    });
  };
}
