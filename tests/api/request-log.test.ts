import { Writable } from 'node:stream';
import { describe, expect, it } from 'vitest';
import { TYPICAL_CHECK } from '../../bench/typical-checks.js';
import { testApp } from '../support/test-app.js';

/** The app with its pino logger writing into an array of parsed lines. */
async function appWithLogLines() {
  const lines: Record<string, unknown>[] = [];
  const stream = new Writable({
    write(chunk: Buffer, _encoding, done) {
      for (const line of chunk.toString().split('\n')) if (line.trim() !== '') lines.push(JSON.parse(line) as Record<string, unknown>);
      done();
    },
  });
  const app = await testApp({ logger: { level: 'info', stream } });
  return { app, lines };
}

describe('request log', () => {
  it('writes one line per request when it is answered: method, url, status, time and the request id, no body', async () => {
    const { app, lines } = await appWithLogLines();
    try {
      const answer = await app.inject({ method: 'POST', url: '/v1/member-checks', payload: TYPICAL_CHECK, headers: { 'x-request-id': 'quote-12' } });
      expect(answer.statusCode).toBe(200);
      const requestLines = lines.filter((line) => line.reqId === 'quote-12');
      expect(requestLines).toHaveLength(1);
      expect(requestLines[0]).toMatchObject({ level: 30, msg: 'answered', method: 'POST', url: '/v1/member-checks', statusCode: 200 });
      expect(requestLines[0]?.responseTime).toBeGreaterThan(0);
      expect(JSON.stringify(requestLines)).not.toContain('elasticModulus');
    } finally {
      await app.close();
    }
  });

  it('logs problems on the same one line with their status', async () => {
    const { app, lines } = await appWithLogLines();
    try {
      await app.inject({ method: 'POST', url: '/v1/member-checks', payload: { member: {} }, headers: { 'x-request-id': 'quote-13' } });
      await app.inject({ method: 'GET', url: '/v1/nowhere', headers: { 'x-request-id': 'quote-14' } });
      expect(lines.filter((line) => line.reqId === 'quote-13').map((line) => line.statusCode)).toEqual([400]);
      expect(lines.filter((line) => line.reqId === 'quote-14').map((line) => line.statusCode)).toEqual([404]);
    } finally {
      await app.close();
    }
  });
});
