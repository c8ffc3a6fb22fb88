/**
 * JSON bodies parsed as Fastify parses them by default (secure-json-parse; "__proto__" and
 * "constructor.prototype" keys refused), with the text kept on the request for the answer cache.
 * A body whose answer is already remembered is not parsed at all: the same text was parsed, checked
 * and answered before, and parsing is a tenth of what such a request costs.
 */

import type { FastifyInstance } from 'fastify';
import { answerKey, type AnswerCache } from './answer-cache.js';

declare module 'fastify' {
  interface FastifyContextConfig {
    /** The route's answers are remembered by body (answer-cache.ts); only its bodies are kept and looked up. */
    answerCache?: boolean;
  }
  interface FastifyRequest {
    /** The JSON body as received, on a route whose answers are remembered and at most MAX_KEPT_BODY_TEXT characters; '' otherwise. */
    bodyText: string;
    /** The remembered answer to this route and body, found when the body arrived; '' when there is none. */
    knownAnswer: string;
  }
}

/** Larger bodies are not kept: they would double what a request holds, and few are sent twice. */
const MAX_KEPT_BODY_TEXT = 64 * 1024;

export function registerJsonBody(app: FastifyInstance, answers: AnswerCache): void {
  const parse = app.getDefaultJsonParser('error', 'error');
  app.decorateRequest('bodyText', '');
  app.decorateRequest('knownAnswer', '');
  app.removeContentTypeParser('application/json');
  app.addContentTypeParser('application/json', { parseAs: 'string' }, (request, body, done) => {
    const text = body as string;
    if (request.routeOptions.config.answerCache === true && text.length <= MAX_KEPT_BODY_TEXT) {
      request.bodyText = text;
      const known = answers.enabled ? answers.get(answerKey(request.url, text)) : undefined;
      if (known !== undefined) {
        request.knownAnswer = known;
        done(null, undefined);
        return;
      }
    }
    parse(request, text, done);
  });
}
