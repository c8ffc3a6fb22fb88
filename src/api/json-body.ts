/**
 * JSON bodies parsed as Fastify parses them by default (secure-json-parse; "__proto__" and
 * "constructor.prototype" keys refused), with the text kept on the request for the answer cache.
 */

import type { FastifyInstance } from 'fastify';

declare module 'fastify' {
  interface FastifyRequest {
    /** The JSON body as received, when it is at most MAX_KEPT_BODY_TEXT characters; '' otherwise. */
    bodyText: string;
  }
}

/** Larger bodies (batches) are not kept: they would double what a request holds and are not cached. */
export const MAX_KEPT_BODY_TEXT = 64 * 1024;

export function registerJsonBody(app: FastifyInstance): void {
  const parse = app.getDefaultJsonParser('error', 'error');
  app.decorateRequest('bodyText', '');
  app.removeContentTypeParser('application/json');
  app.addContentTypeParser('application/json', { parseAs: 'string' }, (request, body, done) => {
    const text = body as string;
    if (text.length <= MAX_KEPT_BODY_TEXT) request.bodyText = text;
    parse(request, text, done);
  });
}
