/** Sending the pinned requests through the real app and reading their answers as the bytes sent. */

import { createHash } from 'node:crypto';
import type { FastifyInstance } from 'fastify';
import type { PinnedRequest } from './cases.js';

export interface PinnedAnswer {
  readonly status: number;
  readonly contentType: string;
  readonly sha256: string;
  readonly body: string;
}

export async function answerOf(app: FastifyInstance, pinned: PinnedRequest): Promise<PinnedAnswer> {
  const response =
    pinned.body === undefined
      ? await app.inject({ method: 'GET', url: pinned.url })
      : await app.inject({ method: 'POST', url: pinned.url, payload: JSON.stringify(pinned.body), headers: { 'content-type': 'application/json' } });
  return {
    status: response.statusCode,
    contentType: String(response.headers['content-type']),
    sha256: createHash('sha256').update(response.rawPayload).digest('hex'),
    body: response.body,
  };
}

export const PINS_FOLDER = new URL('./', import.meta.url);
