import type { FastifyInstance } from 'fastify';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AnswerCache } from '../../src/api/answer-cache.js';
import { TYPICAL_CHECK } from '../../bench/typical-checks.js';
import { testApp } from '../support/test-app.js';

describe('AnswerCache', () => {
  it('gives back what it was given, and nothing for an unknown key', () => {
    const cache = new AnswerCache(1000);
    cache.set('a', 'answer a');
    expect(cache.get('a')).toBe('answer a');
    expect(cache.get('b')).toBeUndefined();
    expect(cache.stats).toEqual({ entries: 1, bytes: 2 * ('a'.length + 'answer a'.length), hits: 1, misses: 1 });
  });

  it('lets the least recently used answers go once the budget is passed', () => {
    // Each entry: key 1 + text 49 characters = 100 bytes; the budget of 1000 holds ten.
    const text = (key: string) => `answer ${key}`.padEnd(49, '.');
    const cache = new AnswerCache(1000);
    for (const key of ['0', '1', '2', '3', '4', '5', '6', '7', '8', '9']) cache.set(key, text(key));
    expect(cache.stats).toMatchObject({ entries: 10, bytes: 1000 });
    expect(cache.get('0')).toBe(text('0'));
    cache.set('a', text('a'));
    expect(cache.get('1')).toBeUndefined();
    expect(cache.get('0')).toBe(text('0'));
    expect(cache.get('a')).toBe(text('a'));
    expect(cache.stats).toMatchObject({ entries: 10, bytes: 1000 });
  });

  it('does not keep an answer larger than an eighth of the budget, and keeps nothing with a budget of 0', () => {
    const cache = new AnswerCache(800);
    cache.set('big', 'x'.repeat(60));
    expect(cache.get('big')).toBeUndefined();
    const off = new AnswerCache(0);
    expect(off.enabled).toBe(false);
    off.set('a', 'b');
    expect(off.get('a')).toBeUndefined();
  });
});

describe('answers through the cache', () => {
  let cached: FastifyInstance;
  let uncached: FastifyInstance;
  beforeAll(async () => {
    cached = await testApp();
    uncached = await testApp({ answerCacheBytes: 0 });
  });
  afterAll(async () => {
    await Promise.all([cached.close(), uncached.close()]);
  });

  const send = (app: FastifyInstance, url: string, body: unknown) =>
    app.inject({ method: 'POST', url, payload: typeof body === 'string' ? body : JSON.stringify(body), headers: { 'content-type': 'application/json' } });

  it('a repeated body gets the bytes, status and headers the computed answer has', async () => {
    const computed = await send(uncached, '/v1/member-checks', TYPICAL_CHECK);
    const first = await send(cached, '/v1/member-checks', TYPICAL_CHECK);
    const again = await send(cached, '/v1/member-checks', TYPICAL_CHECK);
    expect(computed.statusCode).toBe(200);
    for (const answer of [first, again]) {
      expect(answer.statusCode).toBe(200);
      expect(answer.body).toBe(computed.body);
      expect(answer.headers['content-type']).toBe('application/json; charset=utf-8');
      expect(answer.headers['content-length']).toBe(computed.headers['content-length']);
    }
  });

  it('tells bodies apart by every byte, and routes apart', async () => {
    const text = JSON.stringify(TYPICAL_CHECK);
    const other = text.replace('"fy":-4000', '"fy":-4001');
    const a = JSON.parse((await send(cached, '/v1/member-checks', text)).body) as { reactions: { fy: number }[] };
    const b = JSON.parse((await send(cached, '/v1/member-checks', other)).body) as { reactions: { fy: number }[] };
    // Statics: 1 N more at 1 m of a 4 m span adds 0.75 N at the left support.
    expect((b.reactions[0] as { fy: number }).fy - (a.reactions[0] as { fy: number }).fy).toBeCloseTo(0.75, 9);
    const sized = await send(cached, '/v1/section-properties', { section: TYPICAL_CHECK.section });
    expect(sized.statusCode).toBe(200);
    expect(sized.body).not.toBe((await send(cached, '/v1/member-checks', text)).body);
  });

  it('finds a remembered answer when the body arrives, and counts it', async () => {
    const cache = new AnswerCache(1024 * 1024);
    const app = await testApp({ answerCache: cache });
    try {
      const first = await send(app, '/v1/member-checks', TYPICAL_CHECK);
      expect(cache.stats).toMatchObject({ entries: 1, hits: 0, misses: 1 });
      const again = await send(app, '/v1/member-checks', TYPICAL_CHECK);
      expect(cache.stats).toMatchObject({ entries: 1, hits: 1, misses: 1 });
      expect(again.body).toBe(first.body);
      // The same body to another route is another answer.
      const other = await send(app, '/v1/section-properties', { section: TYPICAL_CHECK.section });
      await send(app, '/v1/section-properties', { section: TYPICAL_CHECK.section });
      expect(other.statusCode).toBe(200);
      expect(cache.stats).toMatchObject({ entries: 2, hits: 2, misses: 2 });
      // Batches are not remembered, so their bodies are neither kept nor looked up.
      const batch = await send(app, '/v1/member-checks/batch', { items: [TYPICAL_CHECK] });
      expect(batch.statusCode).toBe(200);
      expect(cache.stats).toMatchObject({ entries: 2, hits: 2, misses: 2 });
    } finally {
      await app.close();
    }
  });

  it('does not remember problems: a bad body is answered afresh each time', async () => {
    const bad = { ...TYPICAL_CHECK, member: { ...TYPICAL_CHECK.member, length: '4 kg' } };
    for (let i = 0; i < 2; i++) {
      const answer = await send(cached, '/v1/member-checks', bad);
      expect(answer.statusCode).toBe(400);
      expect(answer.headers['content-type']).toBe('application/problem+json; charset=utf-8');
      expect(JSON.parse(answer.body).errors[0].pointer).toBe('/member/length');
    }
  });
});
