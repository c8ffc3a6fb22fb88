/**
 * Answers pinned byte for byte: speed work on the request path (presentation, serialisation, caches)
 * must not change one byte of what the service sends. The pins were written by
 * scripts/write-answer-pins.ts; a deliberate change of an answer rewrites them in its own commit.
 */

import { readFileSync } from 'node:fs';
import type { FastifyInstance } from 'fastify';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { testApp } from '../support/test-app.js';
import { answerOf, PINS_FOLDER } from './answer-pins/answers.js';
import { digestRequests, WHOLE_ANSWERS } from './answer-pins/cases.js';

const digests = JSON.parse(readFileSync(new URL('digests.json', PINS_FOLDER), 'utf8')) as Record<string, { status: number; contentType: string; sha256: string }>;

let app: FastifyInstance;
beforeAll(async () => {
  app = await testApp();
});
afterAll(async () => {
  await app.close();
});

describe('whole answers', () => {
  it.each(WHOLE_ANSWERS.map((pinned) => [pinned.name, pinned] as const))('%s is sent byte for byte as pinned', async (name, pinned) => {
    const answer = await answerOf(app, pinned);
    expect(answer.body).toBe(readFileSync(new URL(`${name}.answer.json`, PINS_FOLDER), 'utf8'));
    expect({ status: answer.status, contentType: answer.contentType, sha256: answer.sha256 }).toEqual(digests[name]);
  });

  it('pins answers of every kind: success, a problem, a batch with an error item', () => {
    expect(WHOLE_ANSWERS.map((pinned) => digests[pinned.name]?.status)).toEqual([200, 200, 200, 200, 200, 200, 400]);
  });

  it('the same request sent twice gets the same bytes', async () => {
    const pinned = WHOLE_ANSWERS[0]!;
    const first = await answerOf(app, pinned);
    const second = await answerOf(app, pinned);
    expect(second.body).toBe(first.body);
  });
});

describe('digests of every route example and reference case', () => {
  const requests = digestRequests();

  it('covers every pinned request and nothing else', () => {
    expect(Object.keys(digests).sort()).toEqual([...WHOLE_ANSWERS, ...requests].map((pinned) => pinned.name).sort());
    expect(requests.length).toBeGreaterThan(50);
  });

  it.each(requests.map((pinned) => [pinned.name, pinned] as const))('%s', async (name, pinned) => {
    const { body: _body, ...answer } = await answerOf(app, pinned);
    expect(answer).toEqual(digests[name]);
  });
});
