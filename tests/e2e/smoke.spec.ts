/**
 * The walking skeleton end to end: the served client calls /api/health through HttpClient and shows
 * it, in plain words, to the head of coaching (the only one whose menu has the page).
 */
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import {
  DESKTOP,
  launchBrowser,
  PHONE,
  screenshot,
  seriousAccessibilityViolations,
  type TestBrowser,
} from './support/browser';
import { ClubSession, LEAD } from './support/club-session';

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
    it(`tells the head of coaching Conewise is working, on a ${label}`, async () => {
      const page = await browser.newPage(viewport);
      const club = new ClubSession(baseUrl);
      await club.open(page, await club.login(LEAD), '/status');
      const status = page.getByTestId('health-status');
      await status.waitFor();
      await expect.poll(() => status.textContent()).toContain('Conewise is working normally.');
      expect(await page.title()).toContain('Conewise');
      await screenshot(page, 'status');
      expect(await seriousAccessibilityViolations(page)).toEqual([]);
      await page.close();
    });
  }

  it('sends someone signed out from the status page to sign in', async () => {
    const page = await browser.newPage(PHONE);
    // The pages above signed in on this profile: sign out of it first.
    await page.goto(`${baseUrl}/api/health`);
    await page.evaluate(() => localStorage.clear());
    await page.goto(`${baseUrl}/status`);
    await page.waitForURL(/\/sign-in\?returnTo=%2Fstatus/);
    expect(await page.getByTestId('health-status').count()).toBe(0);
    await page.close();
  });

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
