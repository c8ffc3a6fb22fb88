/**
 * Shedding load politely: past a threshold of event-loop delay, heap or resident memory, a request is
 * answered at once with 503 and Retry-After (an overloaded problem) instead of queueing behind the
 * work already running (@fastify/under-pressure samples the process). Health and metrics routes are
 * never shed: an orchestrator must see the process alive, and a scrape must see why it sheds.
 */

import underPressure, { type FastifyUnderPressureOptions } from '@fastify/under-pressure';
import type { FastifyInstance, FastifyReply, FastifyRequest } from 'fastify';
import { PROBLEM_CONTENT_TYPE } from './error-handler.js';
import { ProblemError } from './problems.js';

export interface OverloadOptions {
  /** Mean event-loop delay over a sample, ms, past which requests are shed; 0 turns it off. Default 1000. */
  readonly maxEventLoopDelayMs?: number;
  /** Heap used, bytes; 0 (default) turns it off. */
  readonly maxHeapUsedBytes?: number;
  /** Resident set size, bytes; 0 (default) turns it off. */
  readonly maxRssBytes?: number;
  /** How often the process is sampled, ms. Default 1000. */
  readonly sampleIntervalMs?: number;
  /** The Retry-After of a shed request, seconds. Default 5. */
  readonly retryAfterSeconds?: number;
}

export const DEFAULT_OVERLOAD = {
  maxEventLoopDelayMs: 1000,
  maxHeapUsedBytes: 0,
  maxRssBytes: 0,
  sampleIntervalMs: 1000,
  retryAfterSeconds: 5,
} as const;

const NEVER_SHED = new Set(['/healthz', '/readyz', '/metrics']);

const MEASURES: Record<string, string> = {
  eventLoopDelay: 'event-loop delay (ms)',
  heapUsedBytes: 'heap used (bytes)',
  rssBytes: 'resident memory (bytes)',
};

export async function registerOverload(app: FastifyInstance, options: OverloadOptions = {}): Promise<void> {
  const settings = { ...DEFAULT_OVERLOAD, ...options };
  await app.register(underPressure, {
    maxEventLoopDelay: settings.maxEventLoopDelayMs,
    maxHeapUsedBytes: settings.maxHeapUsedBytes,
    maxRssBytes: settings.maxRssBytes,
    sampleInterval: settings.sampleIntervalMs,
    retryAfter: settings.retryAfterSeconds,
    exposeStatusRoute: false,
    // Returning nothing lets the request through; returning a body answers it with that body (the
    // plugin's code does so; its types only admit void).
    pressureHandler: ((request: FastifyRequest, reply: FastifyReply, type: string, value: number | undefined) => {
      if (NEVER_SHED.has(request.url.split('?')[0] as string)) return undefined;
      // The monitor reports an infinite delay when the loop did not turn once in its last sample.
      const measured = Number.isFinite(value) ? `${MEASURES[type] ?? type} ${Math.round(Number(value))}` : 'the event loop did not turn in the last sample';
      const problem = new ProblemError('overloaded', `The service is overloaded (${measured}); retry in ${settings.retryAfterSeconds} s.`, [], { retryAfter: settings.retryAfterSeconds });
      if (request.observed) request.observed.problem = problem.problem;
      reply.code(503).header('retry-after', String(settings.retryAfterSeconds)).type(PROBLEM_CONTENT_TYPE);
      return problem.body(request.url);
    }) as unknown as FastifyUnderPressureOptions['pressureHandler'],
  });
}
