/** The error handler: a failure we did not foresee is a 500 problem with no stack, logged with the request id. */

import { Writable } from 'node:stream';
import Fastify from 'fastify';
import { describe, expect, it } from 'vitest';
import { problemFromError, registerErrorHandler } from '../../src/api/error-handler.js';
import { PROBLEMS, ProblemError } from '../../src/api/problems.js';

describe('registerErrorHandler', () => {
  it('answers an unexpected error with a 500 problem that shows no stack, and logs it with the request id', async () => {
    const lines: string[] = [];
    const stream = new Writable({
      write(chunk, _encoding, done) {
        lines.push(String(chunk));
        done();
      },
    });
    const app = Fastify({ logger: { level: 'error', stream } });
    registerErrorHandler(app);
    app.get('/boom', async () => {
      throw new Error('secret internal detail at /srv/app/engine.js:12');
    });
    const response = await app.inject({ method: 'GET', url: '/boom', headers: { 'x-request-id': 'abc' } });
    expect(response.statusCode).toBe(500);
    expect(response.headers['content-type']).toMatch(/^application\/problem\+json/);
    const body = response.json();
    expect(body.type).toBe(PROBLEMS.internal.type);
    expect(body.detail).toMatch(/quote request id \S+/);
    expect(response.body).not.toMatch(/secret internal detail|engine\.js|at /);
    const logged = lines.map((line) => JSON.parse(line) as { reqId?: string; err?: { message: string } });
    expect(logged.some((line) => line.err?.message.includes('secret internal detail') && typeof line.reqId === 'string')).toBe(true);
    await app.close();
  });
});

describe('problemFromError', () => {
  it('passes our problems through and maps the framework\'s by code', () => {
    const ours = new ProblemError('notFound', 'x');
    expect(problemFromError(ours)).toBe(ours);
    expect(problemFromError(Object.assign(new Error('too big'), { code: 'FST_ERR_CTP_BODY_TOO_LARGE', statusCode: 413 }))?.problem).toBe('bodyTooLarge');
    expect(problemFromError(new Error('anything else'))).toBeUndefined();
  });
});
