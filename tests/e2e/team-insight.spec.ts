/** Team insight end to end: attendance and estimated touches from the team's past sessions, as charts with words. */
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { TeamInsightDto } from '../../shared/types/plan-api';
import {
  DESKTOP,
  launchBrowser,
  PHONE,
  screenshot,
  seriousAccessibilityViolations,
  type TestBrowser,
} from './support/browser';
import { ClubSession, U8_COACH } from './support/club-session';

describe('team insight', () => {
  const baseUrl = inject('baseUrl');
  const club = new ClubSession(baseUrl);
  let browser: TestBrowser;

  beforeAll(async () => {
    browser = await launchBrowser(baseUrl);
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('shows attendance and touches per player as charts beside a text summary', async () => {
    const coach = await club.login(U8_COACH);
    const { team } = await club.team(coach, 'U8 Foxes');
    const insight = (
      await club.api.get<TeamInsightDto>(`/api/teams/${team.id}/insight`, { token: coach.token })
    ).body;
    expect(insight.sessions.length).toBeGreaterThan(0);
    for (const viewport of [PHONE, DESKTOP]) {
      const page = await browser.newPage(viewport);
      await club.open(page, coach, `/teams/${team.id}/insight`);
      const summary = page.getByTestId('insight-summary');
      await summary.waitFor();
      expect(await summary.textContent()).toContain(`${insight.sessions.length} session`);
      expect(await page.locator('canvas[role=img]').count()).toBe(2);
      const label = await page.locator('canvas[role=img]').first().getAttribute('aria-label');
      expect(label).toMatch(/on average/i);
      await screenshot(page, 'team-insight');
      expect(await seriousAccessibilityViolations(page)).toEqual([]);
      await page.close();
    }
  });
});
