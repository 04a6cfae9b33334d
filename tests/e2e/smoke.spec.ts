/** The walking skeleton end to end: the served client calls /api/health through HttpClient and shows it. */
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import {
  DESKTOP,
  launchBrowser,
  PHONE,
  screenshot,
  seriousAccessibilityViolations,
  type TestBrowser,
} from './support/browser';

describe('smoke: the served app on a closed network', () => {
  const baseUrl = inject('baseUrl');
  let browser: TestBrowser;

  beforeAll(async () => {
    browser = await launchBrowser(baseUrl);
  });
  afterAll(async () => {
    await browser?.close();
  });

  for (const [label, viewport] of [
    ['phone', PHONE],
    ['desktop', DESKTOP],
  ] as const) {
    it(`shows server and database health on a ${label}`, async () => {
      const page = await browser.newPage(viewport);
      await page.goto(`${baseUrl}/status`);
      const status = page.getByTestId('health-status');
      await status.waitFor();
      await expect.poll(() => status.textContent()).toContain('database up');
      expect(await page.title()).toContain('Conewise');
      await screenshot(page, 'status');
      expect(await seriousAccessibilityViolations(page)).toEqual([]);
      await page.close();
    });
  }

  it('answers a deep link with the client (history fallback), not a 404', async () => {
    const response = await fetch(`${baseUrl}/teams/some-team/plans`);
    expect(response.status).toBe(200);
    expect(response.headers.get('content-type')).toContain('text/html');
    expect(await response.text()).toContain('<cw-root>');
  });

  it('made no request to any host but the app itself', () => {
    expect(browser.outsideRequests).toEqual([]);
  });
});
