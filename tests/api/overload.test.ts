/** Overload: past a threshold a calculation is refused at once with 503, Retry-After and a problem; health and metrics still answer. */

import { describe, expect, it } from 'vitest';
import { DEFAULT_CONNECTION_TIMEOUT_MS, DEFAULT_REQUEST_TIMEOUT_MS } from '../../src/app.js';
import { PROBLEMS } from '../../src/api/problems.js';
import { MEMBER_CHECK_EXAMPLE } from '../../src/api/schemas/member-check-request.js';
import { testApp } from '../support/test-app.js';

describe('overload', () => {
  it('sheds a calculation with 503, Retry-After and an overloaded problem once the heap passes its threshold; /healthz, /readyz and /metrics still answer', async () => {
    // A threshold of one byte: every sample of the process is past it.
    const app = await testApp({ overload: { maxEventLoopDelayMs: 0, maxHeapUsedBytes: 1, sampleIntervalMs: 50, retryAfterSeconds: 7 } });
    try {
      await new Promise((resolve) => setTimeout(resolve, 200));
      const shed = await app.inject({ method: 'POST', url: '/v1/member-checks', payload: MEMBER_CHECK_EXAMPLE });
      expect(shed.statusCode).toBe(503);
      expect(shed.headers['retry-after']).toBe('7');
      expect(shed.headers['content-type']).toMatch(/^application\/problem\+json/);
      expect(shed.json()).toMatchObject({ type: PROBLEMS.overloaded.type, status: 503, retryAfter: 7 });
      expect(shed.json().detail).toMatch(/heap used/);
      for (const url of ['/healthz', '/readyz', '/metrics']) expect((await app.inject({ method: 'GET', url })).statusCode).toBe(200);
      const metrics = await app.inject({ method: 'GET', url: '/metrics' });
      expect(metrics.body).toMatch(/memberproof_problems_total\{type="overloaded"\} 1/);
    } finally {
      await app.close();
    }
  });

  it('answers as usual below the thresholds (the defaults: 1 s of event-loop delay, no memory limit)', async () => {
    // A sample interval well above the delay monitor's 10 ms resolution, so every sample holds delays.
    const app = await testApp({ overload: { sampleIntervalMs: 50 } });
    try {
      await new Promise((resolve) => setTimeout(resolve, 200));
      expect((await app.inject({ method: 'POST', url: '/v1/member-checks', payload: MEMBER_CHECK_EXAMPLE })).statusCode).toBe(200);
    } finally {
      await app.close();
    }
  });

  it('sets the request and connection timeouts on the server', async () => {
    const app = await testApp();
    try {
      expect(app.server.requestTimeout).toBe(DEFAULT_REQUEST_TIMEOUT_MS);
      expect(app.server.timeout).toBe(DEFAULT_CONNECTION_TIMEOUT_MS);
      expect(DEFAULT_REQUEST_TIMEOUT_MS).toBe(60_000);
    } finally {
      await app.close();
    }
  });
});
