/** GET /metrics: the service's metrics in the Prometheus text format. */

import type { FastifyInstance } from 'fastify';
import type { ServiceMetrics } from '../metrics.js';
import type { RouteContract } from '../route-contract.js';
import { z } from '../schemas/zod.js';

export const metricsContract: RouteContract = {
  method: 'get',
  path: '/metrics',
  operationId: 'metrics',
  summary: 'Metrics for Prometheus',
  description:
    'Prometheus text format: memberproof_http_requests_total and memberproof_http_request_duration_seconds by route, method and status; memberproof_engine_duration_seconds by route; memberproof_batch_items; memberproof_verdicts_total by route and verdict; memberproof_problems_total by problem type; memberproof_answer_cache_hits_total by route; and, in the service process, the Node process metrics (memberproof_process_*, memberproof_nodejs_*). Never shed under load.',
  tag: 'operations',
  response: z.string().openapi('PrometheusText', { description: 'Metrics in the Prometheus text exposition format, version 0.0.4.' }),
  responseMediaType: 'text/plain',
  responseDescription: 'The metrics.',
  problems: [],
};

export function metricsRoutes(metrics: ServiceMetrics) {
  return async function register(app: FastifyInstance): Promise<void> {
    app.get('/metrics', async (_request, reply) => reply.type(metrics.contentType).send(await metrics.text()));
  };
}
