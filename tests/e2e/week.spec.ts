/**
 * A week of sessions on a phone: a coach adds a term's training nights in one go on the team page,
 * turns on the team's calendar link, sees tomorrow's session on "This week", taps "Plan it", finds
 * the wizard filled in from the schedule, makes the plan, and "This week" then links that plan.
 */
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { AuthResponse, ScheduledSessionDto, SessionPlanDto, TeamDto } from '../../shared/types';
import { addDays } from '../../shared/types';
import {
  DESKTOP,
  launchBrowser,
  PHONE,
  screenshot,
  seriousAccessibilityViolations,
  type TestBrowser,
} from './support/browser';
import { ClubSession, U12_COACH } from './support/club-session';

/** Today as the browser and the club see it (both on the machine's clock; the club's zone is Europe/London). */
function today(): string {
  return new Intl.DateTimeFormat('en-CA', { timeZone: 'Europe/London' }).format(new Date());
}

describe('a week of sessions', () => {
  const baseUrl = inject('baseUrl');
  const club = new ClubSession(baseUrl);
  let browser: TestBrowser;
  let page: Page;
  let coach: AuthResponse;
  let team: TeamDto;
  const tomorrow = addDays(today(), 1);
  const teamName = `U9 Wrens ${Date.now() % 10_000}`;

  beforeAll(async () => {
    browser = await launchBrowser(baseUrl);
    page = await browser.newPage(PHONE);
    page.on('pageerror', (error) => console.log(`[page error] ${error.message}`));
    coach = await club.login(U12_COACH);
    const created = await club.api.post<TeamDto>(
      '/api/teams',
      { name: teamName, ageGroup: 'U9', level: 'beginner', usualSpace: { width: 30, length: 40 } },
      { token: coach.token },
    );
    if (created.status !== 201) throw new Error(`team: ${created.status} ${created.text}`);
    team = created.body;
    for (const displayName of [
      'Ines K.',
      'Bram O.',
      'Lotte V.',
      'Yusuf A.',
      'Maja R.',
      'Teo L.',
      'Nell P.',
      'Rafi D.',
    ]) {
      await club.api.post(
        `/api/teams/${team.id}/players`,
        { displayName, goalkeeper: false },
        { token: coach.token },
      );
    }
    await club.api.put(
      `/api/teams/${team.id}/kit`,
      { balls: 10, cones: 30, bibs: 8, goals: 2 },
      { token: coach.token },
    );
  });
  afterAll(async () => {
    await browser?.close();
  });

  const weekItem = () => page.getByTestId('week-sessions').locator('li', { hasText: teamName });

  it('adds four weekly training nights from the team page and turns on the calendar link', async () => {
    await club.open(page, coach, `/teams/${team.id}`);
    await page.getByRole('heading', { name: 'Schedule' }).waitFor();
    await page.getByTestId('add-weekly').click();
    await page.getByTestId('session-date').fill(tomorrow);
    await page.getByTestId('session-time').fill('18:30');
    await page.getByLabel('Place (optional)').fill('Meadow Lane, pitch 2');
    await page.getByTestId('session-until').fill(addDays(tomorrow, 21));
    await page.getByText('Adds 4 sessions, one a week.').waitFor();
    await screenshot(page, 'week-add-weekly');
    await page.getByTestId('session-save').click();
    await page.getByText('4 sessions added.').waitFor();
    await expect.poll(() => page.getByTestId('team-schedule').locator('li').count()).toBe(4);

    const listed = (
      await club.api.get<ScheduledSessionDto[]>(`/api/teams/${team.id}/schedule?days=60`, {
        token: coach.token,
      })
    ).body;
    expect(listed.map((s) => [s.date, s.startTime, s.kind, s.minutes, s.place])).toEqual(
      [0, 7, 14, 21].map((d) => [addDays(tomorrow, d), '18:30', 'training', 60, 'Meadow Lane, pitch 2']),
    );

    await page.getByTestId('calendar-on').click();
    const link = page.getByTestId('calendar-link');
    await link.waitFor();
    const url = await link.inputValue();
    expect(url).toMatch(/^http:\/\/[^/]+\/api\/calendar\/[A-Za-z0-9_-]{43}\.ics$/);
    const feed = await (await fetch(url)).text();
    expect(feed.match(/BEGIN:VEVENT/g)).toHaveLength(4);
    expect(feed).toContain(`DTSTART;TZID=Europe/London:${tomorrow.replace(/-/g, '')}T183000`);
    expect(feed).not.toContain('Ines K.');
    await page.getByRole('heading', { name: 'Schedule' }).scrollIntoViewIfNeeded();
    await screenshot(page, 'week-team-schedule');
    expect(await seriousAccessibilityViolations(page)).toEqual([]);
  });

  it('shows tomorrow’s session on "This week"; Plan it opens the wizard filled in from the schedule', async () => {
    await page.goto(`${baseUrl}/`);
    await page.getByRole('heading', { name: 'Next 7 days' }).waitFor();
    await expect.poll(() => weekItem().count()).toBe(1);
    expect(await weekItem().textContent()).toContain('Tomorrow · 18:30');
    await screenshot(page, 'week-home');
    expect(await seriousAccessibilityViolations(page)).toEqual([]);

    await weekItem().getByTestId('plan-it').click();
    await page.waitForURL(/\/plan\/new\?session=[0-9a-f-]{36}$/);
    await expect.poll(() => page.getByTestId('team-select').textContent()).toContain(teamName);
    expect(await page.getByTestId('from-session').textContent()).toContain(
      `${teamName}: training · Tomorrow · 18:30 · Meadow Lane, pitch 2`,
    );
    await expect.poll(() => page.locator('input[formcontrolname="kickOff"]').inputValue()).toBe('18:30');
    expect(await page.locator('input[formcontrolname="date"]').inputValue()).toBe(tomorrow);
    expect(await page.locator('input[formcontrolname="minutes"]').inputValue()).toBe('60');
    expect(await page.locator('mat-button-toggle.mat-button-toggle-checked').textContent()).toContain(
      'Training',
    );
    await expect.poll(() => page.getByTestId('present-count').textContent()).toContain('8 here');
    await screenshot(page, 'week-wizard-from-session');
  });

  it('makes the plan, and "This week" then links it', async () => {
    await page.getByRole('button', { name: 'Next: kit and space' }).click();
    await page.getByRole('button', { name: 'Next: time and aim' }).click();
    await page.getByRole('button', { name: 'Next: the plan' }).click();
    await page.getByTestId('make-plan').click();
    await page.waitForURL(/\/plans\/[0-9a-f-]{36}$/);
    const planId = page.url().split('/').pop()!;
    const plan = (await club.api.get<SessionPlanDto>(`/api/plans/${planId}`, { token: coach.token })).body;
    expect(plan).toMatchObject({
      teamId: team.id,
      date: tomorrow,
      kickOff: '18:30',
      kind: 'training',
      minutes: 60,
    });

    await page.goto(`${baseUrl}/`);
    await page.getByRole('heading', { name: 'Next 7 days' }).waitFor();
    const open = weekItem().getByTestId('open-plan');
    await open.waitFor();
    expect(await open.getAttribute('href')).toBe(`/plans/${planId}`);
    expect(await weekItem().getByTestId('plan-it').count()).toBe(0);
    await screenshot(page, 'week-home-planned');
    await page.setViewportSize(DESKTOP);
    await screenshot(page, 'week-home-planned');
    await page.setViewportSize(PHONE);
    await open.click();
    await page.waitForURL(new RegExp(`/plans/${planId}$`));
  });
});
