/**
 * The sign-in page arrives drawn (server/build/prerender.ts): on a weak link it is on screen before
 * the app's scripts have arrived, it cannot be sent half-started, and what a quick coach types
 * before the app runs is still there when it does.
 */
import type { Page } from 'playwright-core';
import { afterEach, beforeEach, describe, expect, inject, it } from 'vitest';
import { holdBack, launchBrowser, PHONE, screenshot, type TestBrowser } from './support/browser';
import { DEMO_PASSWORD, U12_COACH } from './support/club-session';

const APP_ENTRY = /\/main-[A-Z0-9]{8}\.js$/;

describe('the sign-in page before the app has started', () => {
  const baseUrl = inject('baseUrl');
  let browser: TestBrowser | undefined;

  // A new browser for each visit: once the app has run, its service worker answers /sign-in.
  beforeEach(async () => {
    browser = await launchBrowser(baseUrl);
  });
  afterEach(async () => {
    await browser?.close();
  });

  /** A phone page whose app entry script is held back until `release` is called. */
  async function heldBack(): Promise<{ page: Page; release: () => Promise<void> }> {
    const page = await browser!.newPage(PHONE);
    const { release } = await holdBack(page, APP_ENTRY);
    return { page, release };
  }

  it('shows the whole sign-in page with no script run, its button off until the app starts', async () => {
    const { page, release } = await heldBack();
    await page.goto(`${baseUrl}/sign-in`, { waitUntil: 'commit' });
    // (The document never finishes loading meanwhile: module scripts run before DOMContentLoaded.)
    await page.getByRole('heading', { name: 'Sign in' }).waitFor();
    expect(await page.title()).toBe('Sign in · Conewise');
    expect(await page.getByLabel('E-mail').isVisible()).toBe(true);
    expect(await page.getByLabel('Password').isVisible()).toBe(true);
    expect(await page.getByRole('button', { name: 'Sign in' }).isDisabled()).toBe(true);
    // The component styles came with the page: the card is laid out, not unstyled markup.
    const card = await page.locator('.cw-auth-card').boundingBox();
    expect(card!.width).toBeLessThanOrEqual(PHONE.width);
    await screenshot(page, 'sign-in-before-the-app');
    // Pressing Enter in a field sends nothing while the button is off: still here, nothing in the address.
    await page.getByLabel('E-mail').fill('someone@club.example');
    await page.getByLabel('Password').fill('not-in-the-address');
    await page.getByLabel('Password').press('Enter');
    expect(page.url()).toBe(`${baseUrl}/sign-in`);

    await release();
    await expect.poll(() => page.getByRole('button', { name: 'Sign in' }).isEnabled()).toBe(true);
    expect(await page.locator('cw-root[data-prerendered]').count()).toBe(0);
    await page.close();
  });

  it('keeps what was typed before the app started, and signs in with it', async () => {
    const { page, release } = await heldBack();
    await page.goto(`${baseUrl}/sign-in`, { waitUntil: 'commit' });
    await page.getByLabel('E-mail').waitFor();
    await page.getByLabel('E-mail').fill(U12_COACH);
    await page.getByLabel('Password').fill(DEMO_PASSWORD);

    await release();
    const button = page.getByRole('button', { name: 'Sign in' });
    await expect.poll(() => button.isEnabled()).toBe(true);
    expect(await page.getByLabel('E-mail').inputValue()).toBe(U12_COACH);
    expect(await page.getByLabel('Password').inputValue()).toBe(DEMO_PASSWORD);
    // The cursor stayed in the field it was in.
    expect(await page.evaluate(() => (document.activeElement as HTMLInputElement | null)?.name)).toBe(
      'password',
    );
    await button.click();
    await page.waitForURL(`${baseUrl}/`);
    await page.getByRole('heading', { name: 'This week' }).waitFor();
    await page.close();
  });
});
