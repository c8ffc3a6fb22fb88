/** The service process: configuration from the environment, listen, and a graceful shutdown. */

import { DEFAULT_ANSWER_CACHE_BYTES } from './api/answer-cache.js';
import { DEFAULT_BATCH_BODY_LIMIT } from './api/routes/member-check-batch.js';
import { DEFAULT_OVERLOAD } from './api/overload.js';
import { buildApp, DEFAULT_BODY_LIMIT, DEFAULT_CONNECTION_TIMEOUT_MS, DEFAULT_REQUEST_TIMEOUT_MS } from './app.js';

function integerFromEnvironment(name: string, fallback: number, least: number, most = Number.MAX_SAFE_INTEGER): number {
  const raw = process.env[name];
  if (raw === undefined || raw === '') return fallback;
  const value = Number(raw);
  if (!Number.isInteger(value) || value < least || value > most) throw new Error(`${name} must be an integer from ${least} to ${most}, got "${raw}"`);
  return value;
}

/** How long the requests in flight get after SIGTERM or SIGINT. */
const SHUTDOWN_GRACE_MS = 30000;

async function main(): Promise<void> {
  const app = await buildApp({
    logger: { level: process.env.LOG_LEVEL ?? 'info' },
    bodyLimit: integerFromEnvironment('BODY_LIMIT_BYTES', DEFAULT_BODY_LIMIT, 1),
    batchBodyLimit: integerFromEnvironment('BATCH_BODY_LIMIT_BYTES', DEFAULT_BATCH_BODY_LIMIT, 1),
    answerCacheBytes: integerFromEnvironment('ANSWER_CACHE_BYTES', DEFAULT_ANSWER_CACHE_BYTES, 0),
    companyCataloguePath: process.env.MEMBERPROOF_CATALOGUES || undefined,
    processMetrics: true,
    overload: {
      maxEventLoopDelayMs: integerFromEnvironment('MAX_EVENT_LOOP_DELAY_MS', DEFAULT_OVERLOAD.maxEventLoopDelayMs, 0),
      maxHeapUsedBytes: integerFromEnvironment('MAX_HEAP_USED_BYTES', DEFAULT_OVERLOAD.maxHeapUsedBytes, 0),
      maxRssBytes: integerFromEnvironment('MAX_RSS_BYTES', DEFAULT_OVERLOAD.maxRssBytes, 0),
      retryAfterSeconds: integerFromEnvironment('RETRY_AFTER_SECONDS', DEFAULT_OVERLOAD.retryAfterSeconds, 1, 3600),
    },
    requestTimeoutMs: integerFromEnvironment('REQUEST_TIMEOUT_MS', DEFAULT_REQUEST_TIMEOUT_MS, 0),
    connectionTimeoutMs: integerFromEnvironment('CONNECTION_TIMEOUT_MS', DEFAULT_CONNECTION_TIMEOUT_MS, 0),
  });
  // PORT=0 takes any free port (the tests use it).
  const port = integerFromEnvironment('PORT', 3000, 0, 65535);
  const host = process.env.HOST ?? '127.0.0.1';

  let closing = false;
  const shutdown = (signal: string) => {
    if (closing) return;
    closing = true;
    app.log.info({ signal }, 'finishing the requests in flight, then exiting');
    // Leave by letting the event loop drain, so the last responses are flushed; a stuck connection
    // cannot hold the process longer than the grace period.
    setTimeout(() => process.exit(1), SHUTDOWN_GRACE_MS).unref();
    app.closeGracefully().then(
      () => {
        process.exitCode = 0;
      },
      (error: unknown) => {
        app.log.error({ err: error }, 'shutdown failed');
        process.exit(1);
      },
    );
  };
  process.on('SIGTERM', () => shutdown('SIGTERM'));
  process.on('SIGINT', () => shutdown('SIGINT'));

  await app.listen({ port, host });
}

main().catch((error: unknown) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
