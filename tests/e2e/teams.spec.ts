/**
 * Teams: adding one from the team list (the form checks the name, then the new team's page opens),
 * taking a player off the squad, deleting a team once the lead has typed its name, and a coach of
 * another team seeing a squad read-only (the controls follow what the API allows).
 */
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Page } from 'playwright-core';
import type { PlayerDto, SessionPlanDto, TeamDto } from '../../shared/types';
import {
  animationsSettled,
  DESKTOP,
  launchBrowser,
  PHONE,
  screenshot,
  seriousAccessibilityViolations,
  type TestBrowser,
} from './support/browser';
import { ClubSession, LEAD, U12_COACH, U8_COACH } from './support/club-session';

describe('teams', () => {
  const baseUrl = inject('baseUrl');
  const club = new ClubSession(baseUrl);
  let browser: TestBrowser;

  beforeAll(async () => {
    browser = await launchBrowser(baseUrl);
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('a lead adds a team: a missing name is named, then the team is created with its defaults', async () => {
    const lead = await club.login(LEAD);
    const page = await browser.newPage(PHONE);
    await club.open(page, lead, '/teams');
    await page.getByRole('button', { name: 'Add a team' }).click();
    await page.getByRole('button', { name: 'Create team' }).click();
    await expect.poll(() => page.locator('mat-error').first().textContent()).toContain('Team name');
    await screenshot(page, 'team-add');
    expect(await seriousAccessibilityViolations(page)).toEqual([]);

    const name = `U10 Kites ${Date.now() % 10_000}`;
    await page.getByLabel('Team name').fill(name);
    await page.getByRole('button', { name: 'Create team' }).click();
    await page.waitForURL(/\/teams\/[0-9a-f-]{36}$/);
    await page.getByRole('heading', { name }).waitFor();

    const teams = (await club.api.get<TeamDto[]>('/api/teams', { token: lead.token })).body;
    const created = teams.find((t) => t.name === name);
    expect(created).toMatchObject({
      ageGroup: 'U10',
      level: 'beginner',
      usualSpace: { width: 30, length: 40 },
    });
    await page.close();
  });

  /** The "N active players" figure under the team's name. */
  async function activeCount(page: Page): Promise<number> {
    const text = (await page.locator('.cw-sub').textContent()) ?? '';
    const match = /(\d+) active players?/.exec(text);
    if (!match) throw new Error(`no active count in "${text}"`);
    return Number(match[1]);
  }

  for (const [label, viewport] of [
    ['phone', PHONE],
    ['desktop', DESKTOP],
  ] as const) {
    it(`a coach erases a player from Conewise and the count drops (${label})`, async () => {
      const coach = await club.login(U8_COACH);
      const { team, players: squad } = await club.team(coach, 'U8 Foxes');
      // A player of our own, so the demo squad other specs rely on stays as it was.
      const displayName = `Quin ${label === 'phone' ? 'P' : 'D'}.`;
      const created = await club.api.post<PlayerDto>(
        `/api/teams/${team.id}/players`,
        { displayName },
        { token: coach.token },
      );
      expect(created.status).toBe(201);
      // The dialog says old plans stay with a neutral label: a plan with the player in it, to check that.
      const past = await club.plan(coach, team, [...squad, created.body]);

      const page = await club.newPage(browser, coach, viewport, `/teams/${team.id}`);
      await page.getByRole('cell', { name: displayName, exact: true }).waitFor();
      const before = await activeCount(page);
      // The team's own coach may delete it, as the API allows (after typing its name).
      expect(await page.getByRole('button', { name: 'Delete team' }).count()).toBe(1);

      await page.getByRole('button', { name: `Erase ${displayName} from Conewise` }).click();
      const dialog = page.getByRole('dialog', { name: `Erase ${displayName} from Conewise?` });
      await dialog.waitFor();
      expect(await dialog.textContent()).toContain('Old plans stay and still print');
      await animationsSettled(page);
      await screenshot(page, 'team-remove-player');
      expect(await seriousAccessibilityViolations(page)).toEqual([]);

      await dialog.getByRole('button', { name: 'Erase from Conewise' }).click();
      await dialog.waitFor({ state: 'detached' });
      await page.getByRole('cell', { name: displayName, exact: true }).waitFor({ state: 'detached' });
      await expect.poll(() => activeCount(page)).toBe(before - 1);
      await page.getByText(`${displayName} erased from Conewise.`).first().waitFor();

      const players = await club.api.get<PlayerDto[]>(`/api/teams/${team.id}/players?includeInactive=true`, {
        token: coach.token,
      });
      expect(players.body.map((p) => p.id)).not.toContain(created.body.id);
      const plan = await club.api.get<SessionPlanDto>(`/api/plans/${past.id}`, { token: coach.token });
      // The old plan stays, with a neutral label where the name stood.
      expect(plan.body.request.players).not.toContainEqual(expect.objectContaining({ name: displayName }));
      expect(plan.body.request.players).toContainEqual(
        expect.objectContaining({ name: expect.stringMatching(/^Former player \d+$/) }),
      );
      await page.close();
    });

    it(`a coach of another team sees the squad read-only, with no control the API would refuse (${label})`, async () => {
      const u8 = await club.login(U8_COACH);
      const { team, players: squad } = await club.team(u8, 'U8 Foxes');
      const other = await club.login(U12_COACH);
      const page = await club.newPage(browser, other, viewport, `/teams/${team.id}`);
      await page.getByRole('heading', { name: 'U8 Foxes', level: 1 }).waitFor();
      await page.getByText('Only the head of coaching or this team’s coaches can change it.').waitFor();
      await page.getByRole('cell', { name: squad[0]!.displayName, exact: true }).waitFor();
      for (const name of ['Add a player', 'Delete team', `Remove ${squad[0]!.displayName} from the squad`]) {
        expect(await page.getByRole('button', { name }).count(), name).toBe(0);
      }
      // The only field left is the squad search; nothing that would change the team.
      expect(await page.getByRole('textbox').count()).toBe(1);
      await page.getByRole('textbox', { name: 'Find a player' }).waitFor();
      await screenshot(page, `team-read-only-${label}`);
      expect(await seriousAccessibilityViolations(page)).toEqual([]);
      // The API agrees: the same coach may not add a player to this team.
      const refused = await club.api.post(
        `/api/teams/${team.id}/players`,
        { displayName: 'Nope N.' },
        { token: other.token },
      );
      expect(refused.status).toBe(403);
      await page.close();
    });

    it(`the lead deletes a team after typing its name, and it leaves the team list (${label})`, async () => {
      const lead = await club.login(LEAD);
      const name = `U11 Larks ${label} ${Date.now() % 10_000}`;
      const created = await club.api.post<TeamDto>(
        '/api/teams',
        { name, ageGroup: 'U11', level: 'intermediate', usualSpace: { width: 35, length: 45 } },
        { token: lead.token },
      );
      expect(created.status).toBe(201);
      const team = created.body;
      await club.api.post(`/api/teams/${team.id}/players`, { displayName: 'Ivo N.' }, { token: lead.token });

      const page = await club.newPage(browser, lead, viewport, `/teams/${team.id}`);
      await page.getByRole('heading', { name, level: 1 }).waitFor();
      await page.getByRole('button', { name: 'Delete team' }).click();
      const dialog = page.getByRole('dialog', { name: `Delete ${name}?` });
      await dialog.waitFor();
      expect(await dialog.textContent()).toContain('its 1 player');

      // A name that does not match is refused in place, and nothing is deleted.
      const field = dialog.getByLabel('Type the team name to confirm');
      await field.fill('U11 Larks');
      await dialog.getByRole('button', { name: 'Delete team' }).click();
      await dialog.getByText(`Type ${name} to confirm.`).waitFor();
      await animationsSettled(page);
      await screenshot(page, 'team-delete');
      expect(await seriousAccessibilityViolations(page)).toEqual([]);
      expect((await club.api.get(`/api/teams/${team.id}`, { token: lead.token })).status).toBe(200);

      await field.fill(name);
      await dialog.getByRole('button', { name: 'Delete team' }).click();
      await page.waitForURL(/\/teams$/);
      await page.getByRole('heading', { name: 'Teams', level: 1 }).waitFor();
      await page.getByText('U8 Foxes').first().waitFor();
      expect(await page.locator('.cw-team-name', { hasText: name }).count()).toBe(0);
      expect((await club.api.get(`/api/teams/${team.id}`, { token: lead.token })).status).toBe(404);
      await page.close();
    });
  }
});
