/**
 * Answers leave as JSON text serialised once, with the finite guard folded into that pass:
 * JSON.stringify writes NaN and +-Infinity as null, and no answer holds a null of its own (absent
 * values are left out), so text without "null" in it carries no non-finite number. Text that has it
 * (a label may say "null") is walked number by number before it may leave.
 */

import type { FastifyReply } from 'fastify';
import { assertFinite } from './finite-guard.js';

const JSON_CONTENT_TYPE = 'application/json; charset=utf-8';

/** The answer's JSON text; throws NonFiniteResultError (a 500) where a number is NaN or infinite. */
export function finiteJson(answer: unknown): string {
  const text = JSON.stringify(answer);
  if (text.includes('null')) assertFinite(answer);
  return text;
}

/** Sends JSON text as it is: Fastify does not serialise it again. */
export function sendJsonText(reply: FastifyReply, text: string): FastifyReply {
  return reply.type(JSON_CONTENT_TYPE).send(text);
}
