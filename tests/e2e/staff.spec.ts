/**
 * Staff on a phone: the lead invites an assistant to a team, the assistant opens the e-mailed link,
 * joins and sees that team and its plans at once; the lead puts them on a second team from the
 * team page, changes their role, is told in plain words why the club's last lead cannot step down,
 * and removes them. An assistant on no team is told whom to ask.
 */
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Page } from 'playwright-core';
import type { AuthResponse, MemberDto, TeamDto } from '../../shared/types';
import {
  animationsSettled,
  launchBrowser,
  PHONE,
  screenshot,
  seriousAccessibilityViolations,
  type TestBrowser,
} from './support/browser';
import { ClubSession, LEAD } from './support/club-session';

interface CaughtMail {
  to: string[];
  subject: string;
  text: string;
}

const TEAM = 'U8 Foxes';
const SECOND_TEAM = 'U12 Otters';

describe('staff', () => {
  const baseUrl = inject('baseUrl');
  const mailUrl = inject('mailUrl');
  const club = new ClubSession(baseUrl);
  let browser: TestBrowser;
  let lead: AuthResponse;
  const email = `helper.${Date.now().toString(36)}@fernmoor.example.org`;
  const name = 'Wren Ashdown';

  beforeAll(async () => {
    browser = await launchBrowser(baseUrl);
    lead = await club.login(LEAD);
  });
  afterAll(async () => {
    await browser?.close();
  });

  /** A page signed in as `auth` (or signed out), on a phone. */
  const phonePage = (auth: AuthResponse | null, path: string): Promise<Page> =>
    club.newPage(browser, auth, PHONE, path);

  async function pick(page: Page, testId: string, option: string): Promise<void> {
    // Mid-screen, clear of the sticky toolbar, as a thumb would bring it.
    const field = page.locator('mat-form-field', { has: page.getByTestId(testId) });
    await field.evaluate((el) => el.scrollIntoView({ block: 'center' }));
    await field.click();
    await page.getByRole('option', { name: option, exact: true }).click();
    await animationsSettled(page);
  }

  async function teamNamed(teamName: string): Promise<TeamDto> {
    const teams = (await club.api.get<TeamDto[]>('/api/teams', { token: lead.token })).body;
    const team = teams.find((t) => t.name === teamName);
    if (!team) throw new Error(`no team ${teamName}`);
    return team;
  }

  let invitee: MemberDto;

  it('the lead invites an assistant to a team; the assistant joins from the e-mail and sees the team and its plans', async () => {
    const team = await teamNamed(TEAM);
    const { players } = await club.team(lead, TEAM);
    const today = new Date().toISOString().slice(0, 10);
    const plan = await club.api.post<{ id: string }>(
      '/api/plans',
      {
        teamId: team.id,
        date: today,
        kickOff: '18:00',
        request: {
          ageGroup: team.ageGroup,
          level: team.level,
          players: players.map((p) => ({ id: p.id, name: p.displayName, goalkeeper: p.goalkeeper })),
          coaches: 1,
          equipment: { balls: 12, cones: 40, bibs: 12, goals: 4 },
          space: team.usualSpace,
          minutes: 20,
          kind: 'match-warm-up',
          seed: 'e2e-staff',
        },
      },
      { token: lead.token },
    );
    expect(plan.status).toBe(201);

    const page = await phonePage(lead, '/club/members');
    await page.getByTestId('member-table').waitFor();
    await page.getByLabel('E-mail').fill(email);
    await pick(page, 'invite-role', 'Assistant');
    await page.getByText('pick one so they land on it').waitFor();
    await pick(page, 'invite-team', TEAM);
    await page.getByRole('button', { name: 'Send invitation' }).click();
    await page.getByText(`Invitation sent to ${email} as an assistant for ${TEAM}.`).waitFor();
    const pending = page.getByTestId('pending-invitations');
    expect(await pending.textContent()).toContain(`for ${TEAM}`);
    await screenshot(page, 'staff-invite');
    expect(await seriousAccessibilityViolations(page)).toEqual([]);
    await page.close();

    let mail: CaughtMail | undefined;
    await expect
      .poll(
        async () => {
          const list = (await (await fetch(`${mailUrl}/`)).json()) as CaughtMail[];
          mail = list.find((m) => m.to.includes(email));
          return Boolean(mail);
        },
        { timeout: 20_000, interval: 300 },
      )
      .toBe(true);
    expect(mail!.text).toContain(`as an assistant with ${TEAM}`);
    const link = /(https?:\/\/\S+\/join#[\w-]+)/.exec(mail!.text)?.[1];
    expect(link).toBeDefined();

    const joining = await phonePage(null, new URL(link!).pathname + new URL(link!).hash);
    await joining.getByText(`to join as an assistant with ${TEAM}`).waitFor();
    // The secret left the address bar as soon as the page read it.
    expect(new URL(joining.url()).hash).toBe('');
    await joining.getByLabel('Your name').fill(name);
    await joining.getByLabel('Password').fill('wren-helps-42');
    await joining.getByRole('button', { name: 'Join' }).click();
    await joining.waitForURL(`${baseUrl}/`);
    // Home: the team at once, and no "not on a team" note.
    await joining.getByRole('link', { name: TEAM }).first().waitFor();
    expect(await joining.getByTestId('no-team-yet').count()).toBe(0);
    await screenshot(joining, 'staff-assistant-home');
    await joining.goto(`${baseUrl}/teams/${team.id}/plans`);
    await joining.locator(`a[href="/plans/${plan.body.id}"]`).waitFor();
    await screenshot(joining, 'staff-assistant-plans');
    await joining.close();

    const members = (await club.api.get<MemberDto[]>('/api/members', { token: lead.token })).body;
    invitee = members.find((m) => m.email === email)!;
    expect(invitee).toMatchObject({ name, role: 'assistant' });
  });

  it('an assistant on no team is told whom to ask, and offered no team to add', async () => {
    const second = await teamNamed(TEAM);
    await club.api.delete(`/api/teams/${second.id}/staff/${invitee.userId}`, { token: lead.token });
    try {
      const auth = await club.api.post<AuthResponse>('/api/auth/login', { email, password: 'wren-helps-42' });
      const page = await phonePage(auth.body, '/');
      // The note names the head of coaching once the member list has come (general words until then).
      await page.getByTestId('no-team-yet').getByText('Ask Morag Ellison to add you').waitFor();
      expect(await page.getByText('Add your first team').count()).toBe(0);
      await screenshot(page, 'staff-no-team');
      await page.goto(`${baseUrl}/teams`);
      await page.getByTestId('no-team-yet').waitFor();
      expect(await page.getByRole('button', { name: 'Add a team' }).count()).toBe(0);
      await page.close();
    } finally {
      // Back on the team, whatever happened above, so the next tests start where they expect.
      await club.api.put(`/api/teams/${second.id}/staff/${invitee.userId}`, undefined, { token: lead.token });
    }
  });

  it('the lead puts the assistant on a second team from its team page', async () => {
    const second = await teamNamed(SECOND_TEAM);
    const page = await phonePage(lead, `/teams/${second.id}`);
    await page.getByRole('heading', { name: 'Staff' }).waitFor();
    await pick(page, 'staff-pick', `${name} (Assistant)`);
    await page.getByRole('button', { name: 'Add to staff' }).click();
    await page.getByTestId('team-staff').getByText(name).waitFor();
    await page.getByRole('heading', { name: 'Staff' }).scrollIntoViewIfNeeded();
    await screenshot(page, 'staff-team-page');
    expect((await teamNamed(SECOND_TEAM)).coachIds).toContain(invitee.userId);

    await page.getByRole('button', { name: `Take ${name} off this team` }).click();
    await page.getByText(`Take ${name} off ${SECOND_TEAM}?`).waitFor();
    await page.getByRole('button', { name: 'Take off', exact: true }).click();
    await expect.poll(async () => (await teamNamed(SECOND_TEAM)).coachIds).not.toContain(invitee.userId);
    await page.close();
  });

  it('the lead changes a role, is told why the last lead cannot step down, and removes a member', async () => {
    const page = await phonePage(lead, '/club/members');
    const row = page.locator(`[data-member="${name}"]`);
    await row.waitFor();
    expect(await row.textContent()).toContain(TEAM);

    // Their teams, from the members page: tick one more, and it is saved at once.
    const second = await teamNamed(SECOND_TEAM);
    await page.getByRole('button', { name: `Choose ${name}’s teams` }).click();
    await page.getByRole('heading', { name: `${name}’s teams` }).waitFor();
    const ticked = page.waitForResponse((r) =>
      r.url().endsWith(`/api/teams/${second.id}/staff/${invitee.userId}`),
    );
    await page.getByRole('checkbox', { name: new RegExp(SECOND_TEAM) }).check();
    expect((await ticked).status()).toBe(200);
    await animationsSettled(page);
    await screenshot(page, 'staff-member-teams');
    await page.getByRole('button', { name: 'Done' }).click();
    await expect.poll(async () => await row.textContent()).toContain(SECOND_TEAM);

    await page.getByRole('button', { name: `Change ${name}’s role` }).click();
    await page.getByRole('heading', { name: `${name}’s role` }).waitFor();
    await page.locator('mat-radio-button[data-role=coach] input').check();
    await animationsSettled(page);
    await screenshot(page, 'staff-role-dialog');
    await page.getByRole('button', { name: 'Make a coach' }).click();
    await page.getByText(`${name} is now a coach.`).waitFor();
    expect(await row.locator('cw-role-chip').textContent()).toBe('Coach');

    await page.getByRole('button', { name: 'Change Morag Ellison’s role' }).click();
    await page.getByRole('heading', { name: 'Your role' }).waitFor();
    await page.locator('mat-radio-button[data-role=assistant] input').check();
    await page.getByRole('button', { name: 'Make an assistant' }).click();
    const refusal = page.locator('mat-dialog-container [role=alert]');
    await refusal.waitFor();
    expect(await refusal.textContent()).toContain(
      'needs at least one head of coaching. Make someone else head of coaching first',
    );
    await animationsSettled(page);
    await screenshot(page, 'staff-last-lead');
    await page.getByRole('button', { name: 'Keep as head of coaching' }).click();
    await animationsSettled(page);

    await page.getByRole('button', { name: `Remove ${name} from the club` }).click();
    await page.getByRole('heading', { name: new RegExp(`Remove ${name} from`) }).waitFor();
    await animationsSettled(page);
    await screenshot(page, 'staff-remove-dialog');
    await page.getByTestId('confirm-remove-member').click();
    await page.getByText(`${name} was removed from the club.`).waitFor();
    expect(await page.locator(`[data-member="${name}"]`).count()).toBe(0);
    await screenshot(page, 'staff-members');
    expect(await seriousAccessibilityViolations(page)).toEqual([]);
    const login = await club.api.post('/api/auth/login', { email, password: 'wren-helps-42' });
    expect(login.status).toBe(401);
    await page.close();
  });
});
