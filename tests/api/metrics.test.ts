/** GET /metrics: what was answered, counted by route, status, verdict, problem and cache, in the Prometheus text format. */

import { describe, expect, it } from 'vitest';
import { MEMBER_CHECK_EXAMPLE } from '../../src/api/schemas/member-check-request.js';
import { testApp } from '../support/test-app.js';

/** The value of one sample line, e.g. metric{a="b"} 3. */
function sample(text: string, name: string, labels: string): number | undefined {
  const line = text.split('\n').find((candidate) => candidate.startsWith(`${name}{${labels}}`) || (labels === '' && candidate.startsWith(`${name} `)));
  return line === undefined ? undefined : Number(line.slice(line.lastIndexOf(' ') + 1));
}

/** A shelf beam of a fictional shelving maker that passes, and one item the batch cannot check. */
const shelf = {
  member: { length: 1.8, supports: [{ position: 0, type: 'pinned' }, { position: 1.8, type: 'roller' }] },
  section: { designation: 'IPE 120' },
  material: { grade: 'S275' },
  loads: [{ type: 'distributed', from: 0, to: 1.8, qy: -3000 }],
  output: { samples: 3 },
};

describe('GET /metrics', () => {
  it('counts requests, verdicts, batch sizes, problems and cache hits', async () => {
    const app = await testApp();
    try {
      await app.inject({ method: 'POST', url: '/v1/member-checks', payload: MEMBER_CHECK_EXAMPLE });
      await app.inject({ method: 'POST', url: '/v1/member-checks', payload: MEMBER_CHECK_EXAMPLE }); // from the cache
      await app.inject({ method: 'POST', url: '/v1/member-checks', payload: { ...MEMBER_CHECK_EXAMPLE, section: { designation: 'IPE 9999' } } });
      await app.inject({ method: 'POST', url: '/v1/member-checks/batch', payload: { items: [shelf, { ...shelf, member: { length: -1 } }] } });
      await app.inject({ method: 'GET', url: '/no/such/place' });
      const response = await app.inject({ method: 'GET', url: '/metrics' });
      expect(response.statusCode).toBe(200);
      expect(response.headers['content-type']).toMatch(/^text\/plain; version=0\.0\.4/);
      const text = response.body;
      expect(sample(text, 'memberproof_http_requests_total', 'route="/v1/member-checks",method="POST",status="200"')).toBe(2);
      expect(sample(text, 'memberproof_http_requests_total', 'route="/v1/member-checks",method="POST",status="400"')).toBe(1);
      expect(sample(text, 'memberproof_http_requests_total', 'route="unmatched",method="GET",status="404"')).toBe(1);
      expect(sample(text, 'memberproof_verdicts_total', 'route="/v1/member-checks",verdict="pass"')).toBe(1);
      expect(sample(text, 'memberproof_verdicts_total', 'route="/v1/member-checks/batch",verdict="pass"')).toBe(1);
      expect(sample(text, 'memberproof_answer_cache_hits_total', 'route="/v1/member-checks"')).toBe(1);
      expect(sample(text, 'memberproof_batch_items_count', '')).toBe(1);
      expect(sample(text, 'memberproof_batch_items_sum', '')).toBe(2);
      expect(sample(text, 'memberproof_problems_total', 'type="unknownDesignation"')).toBe(1);
      expect(sample(text, 'memberproof_problems_total', 'type="notFound"')).toBe(1);
      expect(sample(text, 'memberproof_engine_duration_seconds_count', 'route="/v1/member-checks"')).toBe(2);
      expect(sample(text, 'memberproof_http_request_duration_seconds_count', 'route="/v1/member-checks",method="POST",status="200"')).toBe(2);
    } finally {
      await app.close();
    }
  });

  it('adds Node process metrics in the service process', async () => {
    const app = await testApp({ processMetrics: true });
    try {
      const text = (await app.inject({ method: 'GET', url: '/metrics' })).body;
      expect(text).toMatch(/^memberproof_process_cpu_user_seconds_total \d/m);
      expect(text).toMatch(/^memberproof_process_resident_memory_bytes \d/m);
    } finally {
      await app.close();
    }
  });
});
