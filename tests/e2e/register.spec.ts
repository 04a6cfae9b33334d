/**
 * The register on a phone: the team's assistant opens the plan, marks everyone here with one
 * tap, one player late and one leaving early, saves; the register keeps the minutes, and the
 * team insight counts both as came and names no child for coming least.
 */
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { AttendanceDto, SessionPlanDto } from '../../shared/types';
import {
  launchBrowser,
  PHONE,
  screenshot,
  seriousAccessibilityViolations,
  type TestBrowser,
} from './support/browser';
import { ClubSession, U8_COACH } from './support/club-session';

const ASSISTANT = 'assistant@fernmoor.example.org';

describe('the register', () => {
  const baseUrl = inject('baseUrl');
  const club = new ClubSession(baseUrl);
  let browser: TestBrowser;

  beforeAll(async () => {
    browser = await launchBrowser(baseUrl);
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('is taken on the plan page with one late and one early player, and insight counts them as came', async () => {
    const coach = await club.login(U8_COACH);
    const assistant = await club.login(ASSISTANT);
    const { team, players } = await club.team(coach, 'U8 Foxes');
    // A dated plan, so it is among the sessions the insight covers.
    const made = await club.api.post<SessionPlanDto>(
      '/api/plans',
      {
        teamId: team.id,
        date: '2026-12-19',
        request: {
          ageGroup: team.ageGroup,
          level: team.level,
          players: players.slice(0, -2).map((p) => ({ id: p.id })),
          coaches: 2,
          equipment: { balls: 12, cones: 40, bibs: 12, goals: 4 },
          space: team.usualSpace,
          minutes: 30,
          kind: 'training',
          seed: 'register-e2e',
        },
      },
      { token: coach.token },
    );
    expect(made.status, made.text).toBe(201);
    const plan = made.body;
    const [late, early] = players;

    const page = await browser.newPage(PHONE);
    await club.open(page, assistant, `/plans/${plan.id}`);
    const register = page.getByTestId('register');
    await register.waitFor();
    // The panel is drawn after the phases, then reads the register, the roster and the team.
    await expect
      .poll(() => register.getByTestId('register-headline').textContent(), { timeout: 15_000 })
      .toContain('Not taken yet');
    await register.locator('mat-expansion-panel-header').click();
    await register.getByTestId('register-all-here').click();
    await register.getByRole('button', { name: `${late.displayName} came late` }).click();
    await register
      .getByTestId('register-row')
      .filter({ hasText: late.displayName })
      .getByLabel('Minutes late')
      .fill('10');
    await register.getByRole('button', { name: `${early.displayName} left early` }).click();
    const earlyMinutes = register
      .getByTestId('register-row')
      .filter({ hasText: early.displayName })
      .getByLabel('Minutes left early');
    // Text is refused where it is typed, and Save waits until it is a number.
    await earlyMinutes.fill('a while');
    await expect
      .poll(() => register.getByTestId('register-row').filter({ hasText: early.displayName }).textContent())
      .toContain('Minutes left early: type a whole number');
    expect(await register.getByTestId('register-save').isDisabled()).toBe(true);
    await earlyMinutes.fill('15');
    await register.getByTestId('register-save').click();
    await expect
      .poll(() => register.getByTestId('register-status').textContent(), { timeout: 10_000 })
      .toContain(`Register saved: ${players.length} of ${players.length} came · 1 late · 1 left early`);
    await register.getByTestId('register-save').scrollIntoViewIfNeeded();
    await screenshot(page, 'register-plan-page');
    // What the thumb sees: the register itself, and the screen with Save in view.
    await register.screenshot({ path: 'test-results/screenshots/register-panel-390.png' });
    await page.screenshot({ path: 'test-results/screenshots/register-save-in-view-390.png' });
    expect(await seriousAccessibilityViolations(page)).toEqual([]);

    const stored = (
      await club.api.get<AttendanceDto>(`/api/plans/${plan.id}/attendance`, { token: coach.token })
    ).body;
    expect(stored.players).toEqual(
      expect.arrayContaining([
        { playerId: late.id, lateMinutes: 10 },
        { playerId: early.id, leftEarlyMinutes: 15 },
      ]),
    );
    expect(stored.playerIds).toHaveLength(players.length);

    // After a reload the panel shows the saved register in its headline.
    await page.reload();
    await expect
      .poll(() => page.getByTestId('register-headline').textContent(), { timeout: 10_000 })
      .toContain('1 late · 1 left early');
    await page.close();

    const insightPage = await browser.newPage(PHONE);
    await club.open(insightPage, coach, `/teams/${team.id}/insight`);
    const summary = insightPage.getByTestId('insight-summary');
    await summary.waitFor();
    const words = (await summary.textContent()) ?? '';
    expect(words).not.toContain('Came least');
    const regularity = (await insightPage.getByTestId('insight-regularity').textContent()) ?? '';
    for (const p of players) expect(regularity).not.toContain(p.displayName);
    expect(await insightPage.getByTestId('insight-part').textContent()).toMatch(
      /\d+ late arrivals? and \d+ early leavers?/,
    );
    await insightPage.getByText('Attendance as a table').click();
    const row = insightPage.locator('tr', { has: insightPage.locator(`a[href="/plans/${plan.id}"]`) });
    await expect.poll(() => row.textContent()).toContain(`${players.length}`);
    expect(await row.textContent()).toContain('1 late, 1 left early');
    await screenshot(insightPage, 'register-insight');
    await insightPage.close();
  });
});
