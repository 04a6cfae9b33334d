/**
 * Opening a plan again on the same phone: the page as the phone last drew it is on screen at once
 * (core/startup/drawn-copy.ts), before the app has started, and gives way to the app's own page;
 * it is never shown for another plan or another person, nothing in it can be used, and signing out
 * removes it from the phone.
 */
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { AuthResponse, SessionPlanDto } from '../../shared/types';
import { DRAWN_COPY_KEY, DRAWN_COPY_TAG } from '../../src/app/core/startup/drawn-copy';
import { holdBack, launchBrowser, PHONE, planDrawn, screenshot, type TestBrowser } from './support/browser';
import { ClubSession, U12_COACH, U8_COACH } from './support/club-session';

describe('a plan opened again on the same phone', () => {
  const baseUrl = inject('baseUrl');
  const club = new ClubSession(baseUrl);
  let browser: TestBrowser;
  let coach: AuthResponse;
  let plan: SessionPlanDto;
  let otherPlan: SessionPlanDto;

  beforeAll(async () => {
    // The service worker would answer the plan's read out of the tests' reach (see openHeldBack).
    browser = await launchBrowser(baseUrl, 'en-GB', 'block');
    coach = await club.login(U12_COACH);
    const { team, players } = await club.team(coach, 'U12 Otters');
    plan = await club.plan(coach, team, players.slice(0, 12));
    otherPlan = await club.plan(coach, team, players.slice(0, 10));
  });
  afterAll(async () => {
    await browser?.close();
  });

  /**
   * Opens plan `id` with its read from the API held back until `release` is called: the app has
   * started (the copy, if any, is up) but cannot draw the plan yet.
   */
  async function openHeldBack(id: string): Promise<{ page: Page; release: () => Promise<void> }> {
    const page = await browser.newPage(PHONE);
    const { asked, release } = await holdBack(page, new RegExp(`/api/plans/${id}$`));
    await page.goto(`${baseUrl}/plans/${id}`, { waitUntil: 'commit' });
    await asked;
    return { page, release };
  }

  const copyOnScreen = (page: Page) =>
    page.evaluate((tag) => {
      const host = document.querySelector(tag);
      const box = host?.getBoundingClientRect();
      return (
        !!box &&
        box.height > 0 &&
        getComputedStyle(document.querySelector('cw-root')!).visibility === 'hidden'
      );
    }, DRAWN_COPY_TAG);

  it('keeps the page as first drawn, under the device prefix', async () => {
    const page = await browser.newPage(PHONE);
    await club.open(page, coach, `/plans/${plan.id}`);
    await planDrawn(page);
    const kept = await page.evaluate((key) => localStorage.getItem(key), DRAWN_COPY_KEY);
    const copy = JSON.parse(kept!) as { path: string; userId: string; html: string };
    expect(copy.path).toBe(`/plans/${plan.id}`);
    expect(copy.userId).toBe(coach.user.id);
    expect(copy.html).toContain('Match warm-up · U12 Otters');
    // Kept once the first phase was drawn: the later ones were still waiting to be drawn.
    expect(copy.html).toContain('cw-stations-waiting');
    await page.close();
  });

  it('shows that page before the app has started, and the app’s own page once it has', async () => {
    const { page, release } = await openHeldBack(plan.id);
    expect(await copyOnScreen(page)).toBe(true);
    expect(await page.title()).toBe('Plan · Conewise');
    // Nothing in the copy can be reached: no title, button or phase to find, click or read out.
    expect(await page.getByTestId('plan-title').count()).toBe(0);
    expect(await page.getByRole('button').count()).toBe(0);
    await screenshot(page, 'plan-drawn-copy');

    await release();
    await page.getByTestId('plan-title').waitFor();
    expect(await page.locator(DRAWN_COPY_TAG).count()).toBe(0);
    expect(await page.getByTestId('plan-title').textContent()).toContain('Match warm-up · U12 Otters');
    await page.getByTestId('print').waitFor();
    await page.close();
  });

  it('shows nothing for another plan, or for another person signed in on the phone', async () => {
    const other = await openHeldBack(otherPlan.id);
    expect(await other.page.locator(DRAWN_COPY_TAG).count()).toBe(0);
    await other.release();
    await other.page.close();

    // The U8 coach on the same phone, at the U12 plan's address (which is not theirs to see).
    const u8 = await club.login(U8_COACH);
    const page = await browser.newPage(PHONE);
    await club.open(page, u8, '/');
    await page.getByRole('heading', { name: 'This week' }).waitFor();
    // The app asks for the plan once it has started, after any copy would have been laid out.
    const started = page.waitForRequest(new RegExp(`/api/plans/${plan.id}$`));
    await page.goto(`${baseUrl}/plans/${plan.id}`, { waitUntil: 'commit' });
    await started;
    expect(await page.locator(DRAWN_COPY_TAG).count()).toBe(0);
    await page.close();
  });

  it('is gone from the phone once the coach signs out', async () => {
    const page = await browser.newPage(PHONE);
    await club.open(page, coach, `/plans/${plan.id}`);
    await planDrawn(page);
    expect(await page.evaluate((key) => localStorage.getItem(key), DRAWN_COPY_KEY)).not.toBeNull();
    await page.getByRole('button', { name: 'Account menu' }).click();
    await page.getByTestId('menu-sign-out').click();
    await page.waitForURL(/\/sign-in$/);
    expect(await page.evaluate((key) => localStorage.getItem(key), DRAWN_COPY_KEY)).toBeNull();
    await page.close();
  });
});
