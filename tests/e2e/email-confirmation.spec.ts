/**
 * A new club's lead on a phone: a notice asks them to confirm their e-mail address; they ask for
 * the link again, open it from the caught e-mail, and the notice goes; inviting works after.
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

describe('confirming a new lead’s e-mail address (phone)', () => {
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

  async function confirmationMails(email: string): Promise<CaughtMail[]> {
    const list = (await (await fetch(`${mailUrl}/`)).json()) as CaughtMail[];
    return list.filter((m) => m.to.includes(email) && /Confirm your e-mail address/.test(m.subject));
  }

  it('the notice stays until the mailed link is opened; the secret never reaches a request address', async () => {
    const email = `new-lead-${randomUUID().slice(0, 8)}@example.org`;
    const registered = await club.api.post<AuthResponse>('/api/auth/register', {
      clubName: 'Thornfield Juniors',
      name: 'Sasha Lead',
      email,
      password: 'thornfield-secret-42',
    });
    expect(registered.status, registered.text).toBe(201);
    const lead = registered.body;
    expect(lead.user.emailVerified).toBe(false);

    const page = await browser.newPage(PHONE);
    await club.open(page, lead, '/');
    const notice = page.getByTestId('confirm-notice');
    await notice.waitFor();
    expect(await notice.textContent()).toContain(email);
    await page.getByTestId('confirm-resend').click();
    await expect
      .poll(() => page.getByTestId('confirm-notice-answer').textContent(), { timeout: 15_000 })
      .toContain(`A new link is on its way to ${email}`);
    await screenshot(page, 'confirm-notice');
    expect(await seriousAccessibilityViolations(page)).toEqual([]);

    // Two mails: the one sent on registering and the one asked for; the newest works.
    let mails: CaughtMail[] = [];
    await expect
      .poll(async () => (mails = await confirmationMails(email)).length, { timeout: 20_000, interval: 300 })
      .toBe(2);
    const links = mails.map((m) => /(https?:\/\/\S+\/confirm-email#[\w-]+)/.exec(m.text)?.[1]);
    expect(links.every(Boolean), mails.map((m) => m.text).join('\n---\n')).toBe(true);
    const link = new URL(links[links.length - 1]!);
    const requested: string[] = [];
    page.on('request', (request) => requested.push(request.url()));
    await page.goto(`${baseUrl}${link.pathname}${link.hash}`);
    await page.getByTestId('email-confirmed').waitFor();
    expect(page.url()).toBe(`${baseUrl}/confirm-email`);
    expect(requested.filter((url) => url.includes(link.hash.slice(1)))).toEqual([]);
    await screenshot(page, 'email-confirmed');
    expect(await seriousAccessibilityViolations(page)).toEqual([]);

    await page.getByRole('link', { name: 'Go to This week' }).click();
    await page.getByRole('heading', { name: 'This week' }).waitFor();
    expect(await page.getByTestId('confirm-notice').count()).toBe(0);
    const invited = await club.api.post(
      '/api/invitations',
      { email: `helper-${randomUUID().slice(0, 8)}@example.org`, role: 'assistant' },
      { token: lead.token },
    );
    expect(invited.status, invited.text).toBe(201);
    await page.close();
  });
});
