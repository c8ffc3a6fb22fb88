/** The service process: configuration from the environment, listen, and a graceful shutdown. */

import { DEFAULT_BATCH_BODY_LIMIT } from './api/routes/member-check-batch.js';
import { buildApp, DEFAULT_BODY_LIMIT } from './app.js';

function positiveInteger(name: string, fallback: number): number {
  const raw = process.env[name];
  if (raw === undefined || raw === '') return fallback;
  const value = Number(raw);
  if (!Number.isInteger(value) || value <= 0) throw new Error(`${name} must be a positive integer, got "${raw}"`);
  return value;
}

async function main(): Promise<void> {
  const app = await buildApp({
    logger: { level: process.env.LOG_LEVEL ?? 'info' },
    bodyLimit: positiveInteger('BODY_LIMIT_BYTES', DEFAULT_BODY_LIMIT),
    batchBodyLimit: positiveInteger('BATCH_BODY_LIMIT_BYTES', DEFAULT_BATCH_BODY_LIMIT),
    companyCataloguePath: process.env.MEMBERPROOF_CATALOGUES || undefined,
  });
  const port = positiveInteger('PORT', 3000);
  const host = process.env.HOST ?? '127.0.0.1';

  let closing = false;
  const shutdown = (signal: string) => {
    if (closing) return;
    closing = true;
    app.log.info({ signal }, 'finishing the requests in flight, then exiting');
    app.close().then(
      () => process.exit(0),
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
