/** Adding a team from the team list: the form checks the name, then the new team's page opens. */
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { TeamDto } from '../../shared/types';
import {
  launchBrowser,
  PHONE,
  screenshot,
  seriousAccessibilityViolations,
  type TestBrowser,
} from './support/browser';
import { ClubSession, LEAD } from './support/club-session';

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
});
