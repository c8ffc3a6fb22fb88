/**
 * The application factory: the service with its catalogues, routes, contract and error handling.
 * Tests build it directly; main.ts adds only the environment, listening and shutdown.
 */

import { randomUUID } from 'node:crypto';
import Fastify, { type FastifyInstance, type FastifyRequest, type FastifyServerOptions } from 'fastify';
import { AnswerCache, DEFAULT_ANSWER_CACHE_BYTES } from './api/answer-cache.js';
import { problemFromError, registerErrorHandler, sendProblem } from './api/error-handler.js';
import { registerJsonBody } from './api/json-body.js';
import { OneLinePerRequest } from './api/request-log.js';
import { RouteTable } from './api/method-not-allowed.js';
import { buildOpenApiDocument } from './api/openapi/document.js';
import { ProblemError } from './api/problems.js';
import type { RouteContract } from './api/route-contract.js';
import { docsRoutes } from './api/routes/docs.js';
import { healthContracts, healthRoutes } from './api/routes/health.js';
import { materialContracts, materialRoutes } from './api/routes/materials.js';
import { DEFAULT_BATCH_BODY_LIMIT, memberCheckBatchContract, memberCheckBatchRoutes } from './api/routes/member-check-batch.js';
import { memberCheckContract, memberCheckRoutes } from './api/routes/member-checks.js';
import { memberDiagramsContract, memberRecordRoutes, memberReportContract } from './api/routes/member-records.js';
import { memberSizingContract, memberSizingRoutes } from './api/routes/member-sizing.js';
import { sectionPropertiesContract, sectionPropertiesRoutes } from './api/routes/section-properties.js';
import { sectionContracts, sectionRoutes } from './api/routes/sections.js';
import { loadCatalogues, type LoadedCatalogues } from './api/load-catalogues.js';
import { ServiceMetrics } from './api/metrics.js';
import { registerOverload, type OverloadOptions } from './api/overload.js';
import { metricsContract, metricsRoutes } from './api/routes/metrics.js';
import { prepareGracefulShutdown } from './graceful-shutdown.js';

export interface AppOptions {
  /** Catalogues already loaded (tests); otherwise the embedded ones plus `companyCataloguePath`. */
  readonly catalogues?: LoadedCatalogues;
  /** A company catalogue file or folder of JSON files, added to the embedded catalogues. */
  readonly companyCataloguePath?: string;
  /** Largest accepted request body, bytes; default 1 MiB. */
  readonly bodyLimit?: number;
  /** Largest accepted batch body, bytes; default 16 MiB. */
  readonly batchBodyLimit?: number;
  readonly logger?: FastifyServerOptions['logger'];
  /** What remembered answers may take, bytes; 0 turns the answer cache off. Default 32 MiB. */
  readonly answerCacheBytes?: number;
  /** An answer cache to use instead of a new one (tests read its counts). */
  readonly answerCache?: AnswerCache;
  /** Metrics to record into instead of new ones (tests read them). */
  readonly metrics?: ServiceMetrics;
  /** Add Node's process metrics to /metrics (the service process does; tests need not). */
  readonly processMetrics?: boolean;
  /** When to shed load with 503 (see src/api/overload.ts); the defaults hold without it. */
  readonly overload?: OverloadOptions;
  /** Longest time to receive a whole request, ms (Node's requestTimeout). Default 60 s. */
  readonly requestTimeoutMs?: number;
  /** Longest a socket may stay idle, ms (Fastify's connectionTimeout). Default 120 s. */
  readonly connectionTimeoutMs?: number;
  /** Shown every exchange as it is sent: the request, the status and the payload (the tests check each against the contract). */
  readonly observeExchange?: (request: FastifyRequest, statusCode: number, payload: unknown) => void;
}

export const DEFAULT_REQUEST_TIMEOUT_MS = 60_000;
export const DEFAULT_CONNECTION_TIMEOUT_MS = 120_000;

export const DEFAULT_BODY_LIMIT = 1024 * 1024;

/** The route contracts, in the order the document lists them. */
export function routeContracts(): RouteContract[] {
  return [memberCheckContract, memberCheckBatchContract, memberSizingContract, memberReportContract, memberDiagramsContract, sectionPropertiesContract, ...sectionContracts, ...materialContracts, ...healthContracts, metricsContract];
}

const REQUEST_ID = /^[\w.:-]{1,128}$/;

export async function buildApp(options: AppOptions = {}): Promise<FastifyInstance> {
  const app = Fastify({
    logger: options.logger ?? false,
    logController: new OneLinePerRequest(),
    bodyLimit: options.bodyLimit ?? DEFAULT_BODY_LIMIT,
    requestTimeout: options.requestTimeoutMs ?? DEFAULT_REQUEST_TIMEOUT_MS,
    connectionTimeout: options.connectionTimeoutMs ?? DEFAULT_CONNECTION_TIMEOUT_MS,
    requestIdHeader: false,
    genReqId: (request) => {
      const given = request.headers['x-request-id'];
      return typeof given === 'string' && REQUEST_ID.test(given) ? given : randomUUID();
    },
    onProtoPoisoning: 'error',
    onConstructorPoisoning: 'error',
    // While closing, a request that still reaches the server on an open connection is answered (with
    // Connection: close, see graceful-shutdown.ts) rather than refused with Fastify's own 503, whose
    // body is not a problem; new connections are refused by the closed server.
    return503OnClosing: false,
    // Errors Fastify raises before routing (a malformed URL, say) are problems too.
    frameworkErrors: (error, _request, reply) => {
      sendProblem(reply, problemFromError(error) ?? new ProblemError('invalidInput', error.message));
    },
  });
  app.addHook('onRequest', (request, reply, done) => {
    reply.header('x-request-id', request.id);
    done();
  });
  const observe = options.observeExchange;
  if (observe !== undefined) {
    app.addHook('onSend', async (request, reply, payload) => {
      observe(request, reply.statusCode, payload);
      return payload;
    });
  }
  // JSON only: without this Fastify would also take text/plain bodies.
  app.removeContentTypeParser('text/plain');
  const metrics = options.metrics ?? new ServiceMetrics({ processMetrics: options.processMetrics ?? false });
  metrics.watch(app);
  await registerOverload(app, options.overload);
  const answers = options.answerCache ?? new AnswerCache(options.answerCacheBytes ?? DEFAULT_ANSWER_CACHE_BYTES);
  registerJsonBody(app, answers);
  registerErrorHandler(app);
  prepareGracefulShutdown(app);

  const routes = new RouteTable();
  routes.watch(app);
  app.setNotFoundHandler((request, reply) => {
    const allowed = routes.allowedMethods(request.url);
    if (allowed.length > 0) {
      reply.header('allow', allowed.join(', '));
      return sendProblem(reply, new ProblemError('methodNotAllowed', `${request.method} is not accepted here; use ${allowed.join(' or ')}.`));
    }
    return sendProblem(reply, new ProblemError('notFound', `There is no resource at ${request.url.split('?')[0]}.`));
  });

  let ready = false;
  const catalogues = options.catalogues ?? (await loadCatalogues({ companyPath: options.companyCataloguePath }));
  const document = buildOpenApiDocument(routeContracts());

  await app.register(docsRoutes(document));
  await app.register(
    healthRoutes(() => ({
      status: ready ? 'ready' : 'loading',
      catalogues: [...catalogues.sources],
      sectionFamilies: catalogues.sectionFamilies,
    })),
  );
  await app.register(metricsRoutes(metrics));
  await app.register(memberCheckRoutes(catalogues, answers));
  await app.register(memberCheckBatchRoutes(catalogues, options.batchBodyLimit ?? DEFAULT_BATCH_BODY_LIMIT));
  await app.register(memberSizingRoutes(catalogues, answers));
  await app.register(memberRecordRoutes(catalogues));
  await app.register(sectionPropertiesRoutes(catalogues, answers));
  await app.register(sectionRoutes(catalogues));
  await app.register(materialRoutes(catalogues));
  await app.ready();
  ready = true;
  return app;
}
