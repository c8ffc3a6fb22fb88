/** Every error as an RFC 9457 problem: ours by name, the framework's by code, the rest as a logged 500. */

import type { FastifyError, FastifyInstance, FastifyReply, FastifyRequest } from 'fastify';
import { PROBLEMS, ProblemError, type ProblemName } from './problems.js';

export const PROBLEM_CONTENT_TYPE = 'application/problem+json';

const FRAMEWORK_PROBLEMS: Record<string, { problem: ProblemName; detail: (error: FastifyError) => string }> = {
  FST_ERR_CTP_BODY_TOO_LARGE: { problem: 'bodyTooLarge', detail: () => 'The request body is larger than the service accepts.' },
  FST_ERR_CTP_INVALID_MEDIA_TYPE: { problem: 'unsupportedMediaType', detail: () => 'Send the body as application/json.' },
  FST_ERR_CTP_INVALID_CONTENT_LENGTH: { problem: 'invalidInput', detail: () => 'The Content-Length header does not match the body.' },
  FST_ERR_CTP_EMPTY_JSON_BODY: { problem: 'malformedJson', detail: () => 'The body is empty; send a JSON object.' },
  FST_ERR_CTP_INVALID_JSON_BODY: { problem: 'malformedJson', detail: () => 'The body is not valid JSON.' },
};

export function sendProblem(reply: FastifyReply, error: ProblemError): FastifyReply {
  const status = PROBLEMS[error.problem].status;
  if (reply.request.observed) reply.request.observed.problem = error.problem;
  return reply.code(status).type(PROBLEM_CONTENT_TYPE).send(error.body(reply.request.url));
}

export function problemFromError(error: unknown): ProblemError | undefined {
  if (error instanceof ProblemError) return error;
  const framework = error as Partial<FastifyError>;
  const known = framework.code === undefined ? undefined : FRAMEWORK_PROBLEMS[framework.code];
  if (known) return new ProblemError(known.problem, known.detail(framework as FastifyError));
  if (error instanceof SyntaxError && framework.statusCode === 400) {
    // secure-json-parse refuses "__proto__" and "constructor.prototype" keys with a SyntaxError.
    return new ProblemError('malformedJson', `The body could not be accepted: ${error.message}.`);
  }
  if (typeof framework.statusCode === 'number' && framework.statusCode >= 400 && framework.statusCode < 500) {
    return new ProblemError('invalidInput', framework.message ?? 'The request is not valid.');
  }
  return undefined;
}

export function registerErrorHandler(app: FastifyInstance): void {
  app.setErrorHandler((error: unknown, request: FastifyRequest, reply: FastifyReply) => {
    const problem = problemFromError(error);
    if (problem) return sendProblem(reply, problem);
    request.log.error({ err: error, reqId: request.id }, 'request failed');
    return sendProblem(reply, new ProblemError('internal', `The service failed to answer; quote request id ${request.id} when reporting it.`));
  });
}
