/**
 * Children's data, in the browser: the privacy page reached before signing in; the head of
 * coaching downloads the club's data as a ZIP and sets how long records are kept; a member deletes
 * their own account; the last head of coaching is told to hand over first; the club goes once its
 * name is typed. Each test works on a club of its own, so the demo club stays as other suites need.
 */
import { randomUUID } from 'node:crypto';
import { readFileSync } from 'node:fs';
import JSZip from 'jszip';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { AuthResponse, PlayerDto, TeamDto } from '../../shared/types';
import {
  animationsSettled,
  DESKTOP,
  launchBrowser,
  PHONE,
  screenshot,
  seriousAccessibilityViolations,
  type TestBrowser,
} from './support/browser';
import { ClubSession } from './support/club-session';

const PASSWORD = 'quarry-lantern-58';

interface CaughtMail {
  to: string[];
  text: string;
}

describe("children's data", () => {
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

  /** The secret of the first link of `kind` ("join", "confirm-email") mailed to `email`. */
  async function mailedSecret(email: string, kind: string): Promise<string> {
    const link = new RegExp(`/${kind}#([\\w-]+)`);
    let secret: string | undefined;
    await expect
      .poll(
        async () => {
          const list = (await (await fetch(`${mailUrl}/`)).json()) as CaughtMail[];
          const mail = list.find((m) => m.to.includes(email) && link.test(m.text));
          secret = mail && link.exec(mail.text)?.[1];
          return Boolean(secret);
        },
        { timeout: 20_000, interval: 300 },
      )
      .toBe(true);
    return secret!;
  }

  /** A new club with its head of coaching, signed in through the API; `confirmed` as from the e-mail. */
  async function newClub(clubName: string, { confirmed = false } = {}): Promise<AuthResponse> {
    const email = `rowan-${randomUUID().slice(0, 8)}@example.org`;
    const registered = await club.api.post<AuthResponse>('/api/auth/register', {
      clubName,
      name: 'Rowan Lead',
      email,
      password: PASSWORD,
    });
    expect(registered.status, registered.text).toBe(201);
    if (confirmed) {
      const token = await mailedSecret(email, 'confirm-email');
      const answer = await club.api.post('/api/auth/email-confirmation', { token });
      expect(answer.status, answer.text).toBe(204);
    }
    return registered.body;
  }

  it('the privacy page opens from the sign-in page, signed out, and says who sees what and for how long', async () => {
    const page = await club.newPage(browser, null, PHONE, '/sign-in');
    await page.getByRole('link', { name: "Children's data and privacy" }).click();
    await page.waitForURL(/\/privacy$/);
    await page.getByRole('heading', { name: "Children's data in Conewise", level: 1 }).waitFor();
    for (const heading of [
      'Who in the club can see it',
      'How long it is kept',
      'How to take it out or erase it',
    ]) {
      await page.getByRole('heading', { name: heading, level: 2 }).waitFor();
    }
    await screenshot(page, 'privacy-phone');
    expect(await seriousAccessibilityViolations(page)).toEqual([]);
    await page.close();
  });

  it("the head of coaching downloads the club's data and keeps records for two seasons", async () => {
    const lead = await newClub(`Hollin Vale ${randomUUID().slice(0, 4)}`);
    const team = await club.api.post<TeamDto>(
      '/api/teams',
      { name: 'U9 Wrens', ageGroup: 'U9', level: 'beginner', usualSpace: { width: 25, length: 30 } },
      { token: lead.token },
    );
    expect(team.status).toBe(201);
    const player = await club.api.post<PlayerDto>(
      `/api/teams/${team.body.id}/players`,
      { displayName: 'Marit S.' },
      { token: lead.token },
    );
    expect(player.status).toBe(201);

    const page = await club.newPage(browser, lead, PHONE, '/club/members');
    const button = page.getByRole('button', { name: 'Download the club’s data' });
    await button.scrollIntoViewIfNeeded();
    const [download] = await Promise.all([page.waitForEvent('download'), button.click()]);
    expect(download.suggestedFilename()).toMatch(/\.zip$/);
    const zip = await JSZip.loadAsync(readFileSync(await download.path()));
    expect(Object.keys(zip.files)).toEqual(
      expect.arrayContaining(['README.txt', 'players.csv', 'plans.json']),
    );
    expect(await zip.file('players.csv')!.async('string')).toContain('Marit S.');
    expect(await zip.file('README.txt')!.async('string')).toContain('players.csv');

    const field = page.locator('mat-form-field', { has: page.getByTestId('club-retention-seasons') });
    await field.evaluate((el) => el.scrollIntoView({ block: 'center' }));
    expect(await field.textContent()).toContain('3 seasons');
    await field.click();
    await page.getByRole('option', { name: '2 seasons', exact: true }).click();
    await page.getByTestId('club-retention-saved').waitFor();
    await animationsSettled(page);
    await screenshot(page, 'club-data-phone');
    expect(await seriousAccessibilityViolations(page)).toEqual([]);
    const kept = await club.api.get<{ seasons: number }>('/api/club/retention', { token: lead.token });
    expect(kept.body).toEqual({ seasons: 2 });
    await page.close();
  });

  it('a coach deletes their account; the last head of coaching must hand over; the club goes once its name is typed', async () => {
    const clubName = `Brackenfold ${randomUUID().slice(0, 4)}`;
    // Inviting needs a confirmed address.
    const lead = await newClub(clubName, { confirmed: true });
    const email = `sol-${randomUUID().slice(0, 8)}@example.org`;
    const invited = await club.api.post('/api/invitations', { email, role: 'coach' }, { token: lead.token });
    expect(invited.status, invited.text).toBe(201);
    const token = await mailedSecret(email, 'join');
    const joined = await club.api.post<AuthResponse>('/api/invitations/accept', {
      token,
      name: 'Sol Coach',
      password: PASSWORD,
    });
    expect(joined.status, joined.text).toBe(201);

    // The coach: password, the last question, then signed out.
    const page = await club.newPage(browser, joined.body, DESKTOP, '/account');
    await page.getByRole('heading', { name: 'Delete my account' }).waitFor();
    await page.getByTestId('delete-account-password').fill(PASSWORD);
    await page.getByTestId('delete-account').click();
    const dialog = page.getByRole('dialog', { name: 'Delete your account for good?' });
    await dialog.waitFor();
    await animationsSettled(page);
    await screenshot(page, 'delete-account-desktop');
    expect(await seriousAccessibilityViolations(page)).toEqual([]);
    await dialog.getByTestId('confirm-delete-account').click();
    await page.waitForURL(/\/sign-in$/);
    const gone = await club.api.post('/api/auth/login', { email, password: PASSWORD });
    expect(gone.status).toBe(401);
    const members = await club.api.get<{ email: string }[]>('/api/members', { token: lead.token });
    expect(members.body.map((m) => m.email)).not.toContain(email);

    // The head of coaching is the club's last: the refusal says what to do, and nothing goes.
    await club.open(page, lead, '/account');
    await page.getByTestId('delete-account-password').fill(PASSWORD);
    await page.getByTestId('delete-account').click();
    await page.getByTestId('confirm-delete-account').click();
    await expect
      .poll(() => page.getByTestId('delete-account-error').textContent())
      .toContain('Make someone else head of coaching on the Members page first');
    expect((await club.api.get('/api/auth/me', { token: lead.token })).status).toBe(200);

    // The club: the button wakes only for the exact name.
    await page.goto(`${baseUrl}/club/members`);
    const name = page.getByTestId('delete-club-name');
    await name.scrollIntoViewIfNeeded();
    await name.fill(clubName.toUpperCase());
    expect(await page.getByTestId('delete-club').isDisabled()).toBe(true);
    await name.fill(clubName);
    await animationsSettled(page);
    await screenshot(page, 'delete-club-desktop');
    expect(await seriousAccessibilityViolations(page)).toEqual([]);
    await page.getByTestId('delete-club').click();
    await page.waitForURL(/\/sign-in$/);
    const after = await club.api.post('/api/auth/login', { email: lead.user.email, password: PASSWORD });
    expect(after.status).toBe(401);
    await page.close();
  });
});
