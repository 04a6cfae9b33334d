/**
 * The account page on a phone: opened from the account menu after signing in, the role said in
 * words, a new name that the toolbar shows at once and the server keeps; and the join page opened
 * with a link that cannot be used, which offers a next step and no form.
 */
import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { AuthResponse, UserDto } from '../../shared/types';
import {
  DESKTOP,
  launchBrowser,
  PHONE,
  screenshot,
  seriousAccessibilityViolations,
  type TestBrowser,
} from './support/browser';
import { ClubSession } from './support/club-session';

const PASSWORD = 'account-secret-42';

describe('the account page and a join link that cannot be used', () => {
  const baseUrl = inject('baseUrl');
  const club = new ClubSession(baseUrl);
  let browser: TestBrowser;

  beforeAll(async () => {
    browser = await launchBrowser(baseUrl);
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('signs in, opens the account page from the menu and changes the name shown in the toolbar', async () => {
    // A club of its own, so the new name touches no other test.
    const email = `ash-${randomUUID().slice(0, 8)}@example.org`;
    const registered = await club.api.post<AuthResponse>('/api/auth/register', {
      clubName: 'Larchfield Juniors',
      name: 'Ash Lead',
      email,
      password: PASSWORD,
    });
    expect(registered.status, registered.text).toBe(201);

    const page = await browser.newPage(PHONE);
    await page.goto(`${baseUrl}/sign-in`);
    await page.getByLabel('E-mail').fill(email);
    await page.getByLabel('Password').fill(PASSWORD);
    await page.getByRole('button', { name: 'Sign in' }).click();
    // On a phone the toolbar keeps the name for the account button's text only (no room to show it).
    const toolbarName = () => page.locator('.cw-user-name').textContent();
    await expect.poll(toolbarName, { timeout: 15_000 }).toBe('Ash Lead');

    await page.getByRole('button', { name: 'Account menu' }).click();
    expect(await page.locator('.cw-menu-role').textContent()).toContain('Signed in as Head of coaching');
    await page.getByTestId('menu-account').click();
    await page.waitForURL(/\/account$/);
    await page.getByRole('heading', { name: 'Your account' }).waitFor();
    expect(await page.getByTestId('account-role').textContent()).toBe('Head of coaching');
    expect(await page.getByTestId('account-email').textContent()).toBe(email);
    expect(await page.getByTestId('account-club').textContent()).toBe('Larchfield Juniors');
    await page.locator('.mat-mdc-menu-panel').waitFor({ state: 'detached' });
    await screenshot(page, 'account');
    expect(await seriousAccessibilityViolations(page)).toEqual([]);

    // A blank name is refused beside the field, and nothing is sent.
    await page.getByLabel('Your name').fill('   ');
    await page.getByTestId('save-name').click();
    await page.getByText('Your name is needed.').waitFor();

    await page.getByLabel('Your name').fill('Ashley Okafor-Lind');
    await page.getByTestId('save-name').click();
    await page.getByTestId('name-saved').waitFor();
    expect(await toolbarName()).toBe('Ashley Okafor-Lind');
    const token = await page.evaluate(
      () => (JSON.parse(localStorage.getItem('conewise.session')!) as AuthResponse).token,
    );
    await expect
      .poll(async () => (await club.api.get<UserDto>('/api/auth/me', { token })).body.name, {
        timeout: 15_000,
      })
      .toBe('Ashley Okafor-Lind');
    // After a reload the session still carries the new name.
    await page.reload();
    await page.getByRole('heading', { name: 'Your account' }).waitFor();
    expect(await toolbarName()).toBe('Ashley Okafor-Lind');
    expect(await page.getByLabel('Your name').inputValue()).toBe('Ashley Okafor-Lind');

    await page.setViewportSize(DESKTOP);
    // A wide screen shows the name beside the account icon.
    await page.locator('.cw-user-name').getByText('Ashley Okafor-Lind').waitFor();
    await screenshot(page, 'account');
    await page.close();
  });

  it('a join link that was used, has expired or is cut short shows what to do, and no form', async () => {
    const page = await browser.newPage(PHONE);
    // Nobody signed in (the profile is shared with the test before), so "Sign in" leads to the form.
    await page.goto(`${baseUrl}/api/health`);
    await page.evaluate(() => localStorage.clear());
    await page.goto(`${baseUrl}/join#not-a-real-invitation-token`);
    await expect
      .poll(() => page.getByTestId('invitation-problem').textContent(), { timeout: 15_000 })
      .toContain('This invitation link has been used or has expired.');
    expect(await page.locator('form, input').count()).toBe(0);
    expect(await page.textContent('main, body')).toContain('Ask the person who invited you');
    await screenshot(page, 'join-bad-link');
    expect(await seriousAccessibilityViolations(page)).toEqual([]);
    await page.getByTestId('invitation-sign-in').click();
    await page.waitForURL(/\/sign-in$/);

    await page.goto(`${baseUrl}/join`);
    await page.getByTestId('invitation-problem').waitFor();
    expect(await page.getByTestId('invitation-problem').textContent()).toContain('not complete');
    expect(await page.locator('form, input').count()).toBe(0);
    await page.close();
  });
});
