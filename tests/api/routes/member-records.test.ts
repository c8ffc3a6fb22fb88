/** POST /v1/member-reports and /v1/member-diagrams: the member check rendered, escaped, deterministic; problems stay JSON. */

import type { FastifyInstance } from 'fastify';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { MEMBER_CHECK_EXAMPLE } from '../../../src/api/schemas/member-check-request.js';
import { testApp } from '../../support/test-app.js';
import { asText } from '../../support/text-body.js';

let app: FastifyInstance;
beforeAll(async () => {
  app = await testApp();
});
afterAll(async () => {
  await app.close();
});

const report = { title: 'Work platform WP-12, joist J3', reference: 'Q-2026-0412', preparedBy: 'A. Engineer' };
const hostile = { title: '<script>alert("x")</script> & \'quotes\'', reference: '<img src=x onerror=alert(1)>', preparedBy: '"><svg onload=alert(2)>' };

describe('POST /v1/member-reports', () => {
  it('answers one HTML page with the job, the verdict, a row for every check, the notices and the audit of the JSON answer', async () => {
    const json = await request(app.server).post('/v1/member-checks').send(MEMBER_CHECK_EXAMPLE);
    const response = await request(app.server).post('/v1/member-reports').send({ ...MEMBER_CHECK_EXAMPLE, report });
    expect(response.status).toBe(200);
    expect(response.headers['content-type']).toBe('text/html; charset=utf-8');
    const html = response.text;
    expect(html.startsWith('<!DOCTYPE html>')).toBe(true);
    expect(html).toContain('<h1>Work platform WP-12, joist J3</h1>');
    expect(html).toContain('Reference Q-2026-0412, prepared by A. Engineer');
    expect(html).toContain(`<p class="word">${json.body.verdict === 'pass' ? 'PASS' : 'FAIL'}</p>`);
    const rows = html.slice(html.indexOf('<table class="checks">')).split('</table>')[0]!.match(/<tr[ >]/g) ?? [];
    expect(rows.length).toBe(json.body.checks.length + 1);
    for (const check of json.body.checks as { basis: string }[]) expect(html).toContain(check.basis.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;').replace(/'/g, '&#39;'));
    for (const notice of json.body.notices as string[]) expect(html).toContain(notice.replace(/&/g, '&amp;').replace(/'/g, '&#39;').replace(/"/g, '&quot;'));
    expect(html).toContain(json.body.audit.inputDigest);
    expect(html).toContain(`engine version ${json.body.audit.engineVersion}`);
    // Self-contained: no script, no link, no remote reference.
    expect(html).not.toMatch(/<script|<link|src="http|href="http|@import/i);
    expect(html).toContain('@page { size: A4');
  });

  it('escapes every text of the request: a title holding a script and quotes is shown, never run', async () => {
    const response = await request(app.server).post('/v1/member-reports').send({ ...MEMBER_CHECK_EXAMPLE, report: hostile });
    expect(response.status).toBe(200);
    expect(response.text).not.toMatch(/<script|<img|<svg onload|onerror=alert\(1\)>/);
    expect(response.text).toContain('&lt;script&gt;alert(&quot;x&quot;)&lt;/script&gt; &amp; &#39;quotes&#39;');
  });

  it('gives the same bytes for the same request', async () => {
    const first = await request(app.server).post('/v1/member-reports').send({ ...MEMBER_CHECK_EXAMPLE, report });
    const second = await request(app.server).post('/v1/member-reports').send({ ...MEMBER_CHECK_EXAMPLE, report });
    expect(second.text).toBe(first.text);
  });

  it('answers problems as JSON with pointers: a missing title, an unstable member', async () => {
    const missing = await request(app.server).post('/v1/member-reports').send({ ...MEMBER_CHECK_EXAMPLE, report: { reference: 'Q-1' } });
    expect(missing.status).toBe(400);
    expect(missing.headers['content-type']).toMatch(/application\/problem\+json/);
    expect(missing.body.errors.map((e: { pointer: string }) => e.pointer)).toContain('/report/title');
    const unstable = await request(app.server)
      .post('/v1/member-reports')
      .send({ ...MEMBER_CHECK_EXAMPLE, member: { length: '3.6 m', supports: [{ position: 0, type: 'roller' }] }, report });
    expect(unstable.status).toBe(422);
    expect(unstable.headers['content-type']).toMatch(/application\/problem\+json/);
  });
});

describe('POST /v1/member-diagrams', () => {
  it('answers one SVG figure with the vertical-plane panels of a member loaded in the vertical plane only', async () => {
    const response = await request(app.server).post('/v1/member-diagrams').send(MEMBER_CHECK_EXAMPLE).buffer(true).parse(asText);
    expect(response.status).toBe(200);
    expect(response.headers['content-type']).toBe('image/svg+xml; charset=utf-8');
    const svg = response.body as string;
    expect(svg.startsWith('<svg ')).toBe(true);
    expect(svg).toContain('xmlns="http://www.w3.org/2000/svg"');
    const fields = [...svg.matchAll(/class="panel" data-field="(\w+)"/g)].map((match) => match[1]);
    expect(fields).toEqual(['shearY', 'momentZ', 'deflectionY']);
    expect(svg).not.toMatch(/NaN|Infinity|<script/);
    // The largest moment, labelled in the requested units: the joist's momentZ max in kN*m.
    const json = await request(app.server).post('/v1/member-checks').send(MEMBER_CHECK_EXAMPLE);
    const max = json.body.extremes.momentZ.max.value as number;
    expect(svg).toContain(`${Number(max.toPrecision(4))} kN*m`);
  });

  it('escapes the labels of loads and supports drawn in the figure', async () => {
    const body = {
      ...MEMBER_CHECK_EXAMPLE,
      member: { ...MEMBER_CHECK_EXAMPLE.member, supports: [{ position: 0, type: 'pinned', label: '<script>alert(1)</script>' }, { position: '3.6 m', type: 'roller', label: '"B" & \'C\'' }] },
      loads: [{ type: 'point', position: '1.2 m', fy: '-6 kN', label: '</text><script>x()</script>' }],
    };
    const response = await request(app.server).post('/v1/member-diagrams').send(body).buffer(true).parse(asText);
    expect(response.status).toBe(200);
    const svg = response.body as string;
    expect(svg).not.toMatch(/<script/);
    expect(svg).toContain('&lt;script&gt;alert(1)&lt;/script&gt;');
    expect(svg).toContain('&quot;B&quot; &amp; &#39;C&#39;');
    expect(svg).toContain('&lt;/text&gt;&lt;script&gt;x()&lt;/script&gt;');
  });
});
