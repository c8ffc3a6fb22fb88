/**
 * The calculation record and the figure in a real browser (the system's Chromium through
 * playwright-core): for three members of an invented work-platform maker, every check row and the
 * verdict are visible, the figure shows its panels, a title holding a script runs nothing, and the page
 * logs no error. Screenshots go to test-artifacts/screenshots (kept out of git).
 */

import { mkdirSync } from 'node:fs';
import type { FastifyInstance } from 'fastify';
import { chromium, type Browser, type Page } from 'playwright-core';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { MEMBER_CHECK_COMBINATIONS_EXAMPLE, MEMBER_CHECK_EXAMPLE } from '../../../src/api/schemas/member-check-request.js';
import { NO_BROWSER_MESSAGE, systemBrowserPath } from '../../support/system-browser.js';
import { testApp } from '../../support/test-app.js';
import { asText } from '../../support/text-body.js';

const executablePath = systemBrowserPath();
if (executablePath === undefined) console.warn(NO_BROWSER_MESSAGE);

const SCREENSHOTS = new URL('../../../test-artifacts/screenshots/', import.meta.url);

/** A handrail post of the same maker, overloaded sideways: it fails, in US units. */
const overloadedPost = {
  member: { length: '1.1 m', supports: [{ position: 0, type: 'fixed', label: 'base plate' }] },
  section: { designation: 'SHS 40x40x3' },
  material: { grade: 'S235' },
  loads: [{ type: 'point', position: '1.1 m', fz: '3 kN', label: 'crowd push on the rail' }],
  output: { samples: 21, units: 'US' },
};

const MEMBERS = [
  { name: 'joist', body: MEMBER_CHECK_EXAMPLE, report: { title: 'Work platform WP-12, joist J3', reference: 'Q-2026-0412', preparedBy: 'A. Engineer' } },
  { name: 'aisle-beam', body: MEMBER_CHECK_COMBINATIONS_EXAMPLE, report: { title: '<script>window.__ran = true</script> Aisle beam "A" & \'B\'', reference: 'Q-2026-0413' } },
  { name: 'handrail-post', body: overloadedPost, report: { title: 'Handrail post HP-2', reference: 'Q-2026-0414' } },
];

describe.skipIf(executablePath === undefined)('calculation records in a browser', () => {
  let app: FastifyInstance;
  let browser: Browser;
  beforeAll(async () => {
    app = await testApp();
    browser = await chromium.launch({ executablePath, args: ['--no-sandbox', '--disable-gpu'] });
    mkdirSync(SCREENSHOTS, { recursive: true });
  }, 60_000);
  afterAll(async () => {
    await browser?.close();
    await app?.close();
  });

  /** A page that records every console error and uncaught exception. */
  async function openPage(): Promise<{ page: Page; errors: string[] }> {
    const page = await browser.newPage({ viewport: { width: 900, height: 1200 } });
    const errors: string[] = [];
    page.on('console', (message) => {
      if (message.type() === 'error') errors.push(message.text());
    });
    page.on('pageerror', (error) => errors.push(error.message));
    return { page, errors };
  }

  it.each(MEMBERS)('shows every check and the verdict of the $name record, with no console error', async ({ name, body, report }) => {
    const json = await request(app.server).post('/v1/member-checks').send(body);
    expect(json.status).toBe(200);
    const html = await request(app.server).post('/v1/member-reports').send({ ...body, report });
    expect(html.status).toBe(200);
    expect(html.headers['content-type']).toMatch(/^text\/html/);
    const { page, errors } = await openPage();
    await page.setContent(html.text, { waitUntil: 'load' });
    // The verdict, as a word, and the title as text (a script in it is shown, never run).
    await expect(page.locator('.verdict .word').textContent()).resolves.toBe(json.body.verdict === 'pass' ? 'PASS' : 'FAIL');
    expect(await page.locator('.verdict .word').isVisible()).toBe(true);
    await expect(page.locator('h1').textContent()).resolves.toBe(report.title);
    expect(await page.evaluate(() => (globalThis as { __ran?: boolean }).__ran)).toBeUndefined();
    // One visible row a check, in the answer's order.
    const rows = page.locator('table.checks tr:not(:first-child)');
    expect(await rows.count()).toBe(json.body.checks.length);
    for (let i = 0; i < json.body.checks.length; i++) {
      const row = rows.nth(i);
      await row.scrollIntoViewIfNeeded();
      expect(await row.isVisible()).toBe(true);
      await expect(row.locator('td').first().textContent()).resolves.toContain(json.body.checks[i].mode);
    }
    // The figure is inlined and drawn.
    expect(await page.locator('.figure svg').count()).toBe(1);
    expect(await page.locator('.figure svg').boundingBox()).toMatchObject({ width: expect.any(Number) });
    expect((await page.locator('.figure svg').boundingBox())!.height).toBeGreaterThan(100);
    await expect(page.locator('footer .digest').textContent()).resolves.toBe(json.body.audit.inputDigest);
    await page.screenshot({ path: new URL(`${name}-report.png`, SCREENSHOTS).pathname, fullPage: true });
    expect(errors).toEqual([]);
    await page.close();
  }, 60_000);

  it.each(MEMBERS)('draws the $name figure as SVG with a panel for each diagram that is not zero', async ({ name, body }) => {
    const svg = await request(app.server).post('/v1/member-diagrams').send(body).buffer(true).parse(asText);
    expect(svg.status).toBe(200);
    expect(svg.headers['content-type']).toMatch(/^image\/svg\+xml/);
    const { page, errors } = await openPage();
    await page.setContent(`<!DOCTYPE html><html><body>${svg.body as string}</body></html>`, { waitUntil: 'load' });
    const panels = page.locator('svg .panel');
    expect(await panels.count()).toBeGreaterThanOrEqual(2);
    for (let i = 0; i < (await panels.count()); i++) expect(await panels.nth(i).isVisible()).toBe(true);
    await page.locator('svg').first().screenshot({ path: new URL(`${name}-figure.png`, SCREENSHOTS).pathname });
    expect(errors).toEqual([]);
    await page.close();
  }, 60_000);
});
