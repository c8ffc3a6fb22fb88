/**
 * One log line per request, written when it is answered: method, url, status and time, with the
 * request id (never the body). Fastify's default writes a line when a request comes in and another
 * when it is answered; one is what operators read, and logging is part of every request's cost.
 */

import { LogController, type FastifyReply, type FastifyRequest } from 'fastify';

export class OneLinePerRequest extends LogController {
  override incomingRequest(): void {}

  override requestCompleted(error: Error | null | undefined, request: FastifyRequest, reply: FastifyReply): void {
    const line = { method: request.method, url: request.url, statusCode: reply.statusCode, responseTime: reply.elapsedTime };
    if (error) request.log.error({ ...line, err: error }, 'answered with an error');
    else request.log.info(line, 'answered');
  }
}
