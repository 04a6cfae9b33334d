/**
 * Ending sessions from the account menu, on a phone: a new password (this device stays signed
 * in, another session ends), and signing out on a shared tablet, which clears the device (the
 * session, pitch-side's copies and queue, cached API answers) and ends the token on the server;
 * and a forgotten password, from the sign-in page to the e-mailed link and a new password.
 */
import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { CaughtMail } from '../../server/mail/fake-smtp';
import type { AuthResponse } from '../../shared/types';
import {
  launchBrowser,
  PHONE,
  screenshot,
  seriousAccessibilityViolations,
  type TestBrowser,
} from './support/browser';
import { ClubSession } from './support/club-session';

const PASSWORD = 'first-secret-42';

describe('ending sessions from the account menu (phone)', () => {
  const baseUrl = inject('baseUrl');
  const mailUrl = inject('mailUrl');
  const club = new ClubSession(baseUrl);
  let browser: TestBrowser;

  beforeAll(async () => {
    browser = await launchBrowser(baseUrl);
  });
  afterAll(async () => {
    await browser?.close();
  });

  /** A club of its own, so changing its lead's password touches no other test. */
  async function freshLead(): Promise<AuthResponse> {
    const response = await club.api.post<AuthResponse>('/api/auth/register', {
      clubName: 'Hazelbrook Colts',
      name: 'Robin Lead',
      email: `robin-${randomUUID().slice(0, 8)}@example.org`,
      password: PASSWORD,
    });
    expect(response.status, response.text).toBe(201);
    return response.body;
  }
  const me = async (token: string) => (await club.api.get('/api/auth/me', { token })).status;

  it('a new password keeps this phone signed in and signs every other session out', async () => {
    const lead = await freshLead();
    const otherDevice = (
      await club.api.post<AuthResponse>('/api/auth/login', { email: lead.user.email, password: PASSWORD })
    ).body;
    const page = await browser.newPage(PHONE);
    await club.open(page, lead, '/teams');
    await page.getByRole('button', { name: 'Account menu' }).click();
    await page.getByTestId('menu-change-password').click();
    await page.getByLabel('Current password').fill('not-the-password');
    await page.getByLabel('New password').fill('second-secret-42');
    await page.getByTestId('change-password').click();
    await expect
      .poll(() => page.locator('mat-dialog-container').textContent(), { timeout: 15_000 })
      .toContain('Current password is not your current password.');
    expect(await me(otherDevice.token)).toBe(200);

    await page.getByLabel('Current password').fill(PASSWORD);
    await page.getByTestId('change-password').click();
    await page.getByTestId('password-changed').waitFor();
    await screenshot(page, 'password-changed');
    expect(await seriousAccessibilityViolations(page)).toEqual([]);
    expect(await me(otherDevice.token)).toBe(401);
    // This phone carries on with the session it signed in again with.
    const stored = await page.evaluate(
      () => JSON.parse(localStorage.getItem('conewise.session')!) as AuthResponse,
    );
    expect(stored.token).not.toBe(lead.token);
    expect(await me(stored.token)).toBe(200);
    await page.getByRole('button', { name: 'Done' }).click();
    await page.reload();
    await page.getByRole('heading', { name: 'Teams' }).waitFor();
    await page.close();
  });

  it('signing out warns of unsent pitch-side changes, clears the device and ends the token', async () => {
    const lead = await freshLead();
    const page = await browser.newPage(PHONE);
    await club.open(page, lead, '/teams');
    // What a coach's day leaves on a tablet: a pitch-side copy, a change waiting for a signal, a
    // cached API answer, and the paper size (a setting of the device, which stays).
    await page.evaluate(async () => {
      localStorage.setItem('conewise.pitch-side.plan.p1', JSON.stringify({ roster: ['Ada K.'] }));
      localStorage.setItem('conewise.pitch-side.queue', JSON.stringify([{ clientId: 'a1', planId: 'p1' }]));
      localStorage.setItem('conewise.paper', 'letter');
      const cache = await caches.open('ngsw:/:1:data:api-read:cache');
      await cache.put('/api/teams', new Response('[{"name":"U9 Wrens"}]'));
    });
    await page.getByRole('button', { name: 'Account menu' }).click();
    await page.getByTestId('menu-sign-out').click();
    await expect
      .poll(() => page.getByTestId('unsent-warning').textContent(), { timeout: 15_000 })
      .toContain('1 pitch-side change has not reached the server yet');
    await page.locator('.mat-mdc-menu-panel').waitFor({ state: 'detached' });
    await screenshot(page, 'sign-out-unsent');
    expect(await seriousAccessibilityViolations(page)).toEqual([]);
    await page.getByTestId('confirm-sign-out').click();
    await page.waitForURL(/\/sign-in$/);
    await page.getByRole('button', { name: 'Sign in' }).waitFor();

    const left = await page.evaluate(async () => ({
      keys: Object.keys(localStorage).filter((k) => k.startsWith('conewise.')),
      caches: (await caches.keys()).filter((name) => name.includes(':data:')),
    }));
    expect(left).toEqual({ keys: ['conewise.paper'], caches: [] });
    expect(await me(lead.token)).toBe(401);
    await page.close();
  });

  it('a forgotten password: ask from the sign-in page, open the e-mailed link, choose a new one', async () => {
    const lead = await freshLead();
    const page = await browser.newPage(PHONE);
    await page.goto(`${baseUrl}/sign-in`);
    await page.getByRole('link', { name: 'Forgot your password?' }).click();
    await page.getByRole('heading', { name: 'Forgot your password?' }).waitFor();
    await page.getByLabel('E-mail').fill(lead.user.email);
    await page.getByTestId('reset-ask').click();
    await expect
      .poll(() => page.getByTestId('reset-asked').textContent(), { timeout: 15_000 })
      .toContain('If an account uses this address');
    await screenshot(page, 'reset-asked');

    let mail: CaughtMail | undefined;
    await expect
      .poll(
        async () => {
          const list = (await (await fetch(`${mailUrl}/`)).json()) as CaughtMail[];
          mail = list.find((m) => m.to.includes(lead.user.email) && /new Conewise password/.test(m.subject));
          return Boolean(mail);
        },
        { timeout: 20_000, interval: 300 },
      )
      .toBe(true);
    const link = /(https?:\/\/\S+\/reset-password#[\w-]+)/.exec(mail!.text)?.[1];
    expect(link, mail!.text).toBeDefined();
    // The link names the public address; open it on this server, fragment and all.
    const opened = `${baseUrl}${new URL(link!).pathname}${new URL(link!).hash}`;
    const requested: string[] = [];
    page.on('request', (request) => requested.push(request.url()));
    await page.goto(opened);
    await page.getByLabel('New password').waitFor();
    // The secret left the address bar at once, and no request carried it in its address.
    expect(page.url()).toBe(`${baseUrl}/reset-password`);
    const secret = new URL(link!).hash.slice(1);
    expect(requested.filter((url) => url.includes(secret))).toEqual([]);
    await page.getByLabel('New password').fill('reset-by-mail-42');
    await page.getByTestId('reset-choose').click();
    await page.getByTestId('reset-done').waitFor();
    await screenshot(page, 'reset-done');
    expect(await seriousAccessibilityViolations(page)).toEqual([]);
    expect(await me(lead.token)).toBe(401);

    await page.getByRole('link', { name: 'Back to sign in' }).click();
    await page.getByRole('heading', { name: 'Sign in' }).waitFor();
    await page.getByLabel('E-mail').fill(lead.user.email);
    await page.getByLabel('Password').fill('reset-by-mail-42');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'));
    await page.close();
  });
});
