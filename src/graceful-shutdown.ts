/**
 * Shutting down without cutting answers short. Node's server.close() also destroys idle keep-alive
 * connections, and a connection whose last response still sits in its write buffer counts as idle: a
 * large answer written just before the signal would be truncated. So: answer later requests with
 * "Connection: close", wait until every connection has flushed what it holds, then close.
 */

import type { Socket } from 'node:net';
import type { FastifyInstance } from 'fastify';

const FLUSH_POLL_MS = 20;

declare module 'fastify' {
  interface FastifyInstance {
    /** Finishes and flushes the answers in flight, then closes. */
    closeGracefully(): Promise<void>;
  }
}

/** Call while building the app, before it is ready. */
export function prepareGracefulShutdown(app: FastifyInstance): void {
  const sockets = new Set<Socket>();
  let closing = false;
  app.server.on('connection', (socket: Socket) => {
    sockets.add(socket);
    socket.once('close', () => sockets.delete(socket));
  });
  app.addHook('onSend', async (_request, reply, payload) => {
    if (closing) reply.header('connection', 'close');
    return payload;
  });
  app.decorate('closeGracefully', async () => {
    closing = true;
    while ([...sockets].some((socket) => socket.writableLength > 0)) {
      await new Promise((resolve) => setTimeout(resolve, FLUSH_POLL_MS));
    }
    await app.close();
  });
}
