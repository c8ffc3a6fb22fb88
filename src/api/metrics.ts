/**
 * Prometheus metrics (prom-client), one registry per app: requests and their durations by route,
 * method and status; engine time by route; batch sizes; verdicts; problems by type; answers served
 * from the cache; and, in the service process, Node's process metrics. Routes say what they saw by
 * writing `request.observed`; one onResponse hook records it, so a route never touches a metric.
 */

import type { Verdict } from '../engine/checks/check-outcome.js';
import type { FastifyInstance, FastifyRequest } from 'fastify';
import { collectDefaultMetrics, Counter, Histogram, Registry } from 'prom-client';

export interface Observed {
  /** The problem answered, by name. */
  problem?: string;
  /** Seconds spent computing the answer (normalise, engine, present, serialise). */
  engineSeconds?: number;
  /** Verdicts of the members checked. */
  verdicts?: readonly Verdict[];
  /** Items in a batch. */
  batchItems?: number;
  /** The answer came from the answer cache. */
  cacheHit?: boolean;
}

declare module 'fastify' {
  interface FastifyRequest {
    observed: Observed;
  }
}

/** Seconds: from a cached answer (tens of microseconds) to the largest batches (seconds). */
const DURATION_BUCKETS = [0.0001, 0.0003, 0.001, 0.003, 0.01, 0.03, 0.1, 0.3, 1, 3, 10];
const BATCH_BUCKETS = [1, 2, 5, 10, 20, 50, 100, 200, 500, 1000];

export class ServiceMetrics {
  readonly registry = new Registry();
  private readonly requests = new Counter({ name: 'memberproof_http_requests_total', help: 'Requests answered, by route, method and status.', labelNames: ['route', 'method', 'status'], registers: [this.registry] });
  private readonly durations = new Histogram({ name: 'memberproof_http_request_duration_seconds', help: 'Time from receiving a request to answering it, by route, method and status.', labelNames: ['route', 'method', 'status'], buckets: DURATION_BUCKETS, registers: [this.registry] });
  private readonly engine = new Histogram({ name: 'memberproof_engine_duration_seconds', help: 'Time computing an answer (normalise, analyse, check, present, serialise), by route; answers from the cache are not counted.', labelNames: ['route'], buckets: DURATION_BUCKETS, registers: [this.registry] });
  private readonly batchItems = new Histogram({ name: 'memberproof_batch_items', help: 'Items in a batch request.', buckets: BATCH_BUCKETS, registers: [this.registry] });
  private readonly verdicts = new Counter({ name: 'memberproof_verdicts_total', help: 'Members checked, by route and verdict (batch items one by one; answers from the cache are not counted).', labelNames: ['route', 'verdict'], registers: [this.registry] });
  private readonly problems = new Counter({ name: 'memberproof_problems_total', help: 'Problem answers (application/problem+json), by problem type.', labelNames: ['type'], registers: [this.registry] });
  private readonly cacheHits = new Counter({ name: 'memberproof_answer_cache_hits_total', help: 'Answers sent from the answer cache, by route.', labelNames: ['route'], registers: [this.registry] });

  constructor(options: { processMetrics?: boolean } = {}) {
    if (options.processMetrics) collectDefaultMetrics({ register: this.registry, prefix: 'memberproof_' });
  }

  /** Records every answered request; call while building the app, before the routes. */
  watch(app: FastifyInstance): void {
    app.decorateRequest('observed', null as unknown as Observed);
    app.addHook('onRequest', (request, _reply, done) => {
      request.observed = {};
      done();
    });
    app.addHook('onResponse', (request, reply, done) => {
      this.record(request, reply.statusCode, reply.elapsedTime / 1000);
      done();
    });
  }

  private record(request: FastifyRequest, statusCode: number, seconds: number): void {
    const route = request.routeOptions.url ?? 'unmatched';
    const labels = { route, method: request.method, status: String(statusCode) };
    this.requests.inc(labels);
    this.durations.observe(labels, seconds);
    const observed = request.observed ?? {};
    if (observed.engineSeconds !== undefined) this.engine.observe({ route }, observed.engineSeconds);
    if (observed.batchItems !== undefined) this.batchItems.observe(observed.batchItems);
    for (const verdict of observed.verdicts ?? []) this.verdicts.inc({ route, verdict });
    if (observed.problem !== undefined) this.problems.inc({ type: observed.problem });
    if (observed.cacheHit) this.cacheHits.inc({ route });
  }

  text(): Promise<string> {
    return this.registry.metrics();
  }

  get contentType(): string {
    return this.registry.contentType;
  }
}

/** Runs `compute`, noting its time on the request for the engine-duration metric. */
export function timedCompute<T>(request: FastifyRequest, compute: () => T): T {
  const start = performance.now();
  try {
    return compute();
  } finally {
    if (request.observed) request.observed.engineSeconds = (performance.now() - start) / 1000;
  }
}
