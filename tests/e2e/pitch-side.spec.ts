/**
 * Pitch-side end to end: a late arrival re-plans the rest of the session, and when they leave
 * early they count as came (never "not here yet"); "too easy" steps the station and the team's
 * next plan starts that activity smaller, the why panel saying so; a hot training session's drinks break
 * counts down as a phase of its own; offline, a verdict waits in the queue and is
 * stored exactly once when the connection returns.
 */
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { AuthResponse, FeedbackDto, Plan, PlayerDto, SessionPlanDto, TeamDto } from '../../shared/types';
import {
  DESKTOP,
  launchBrowser,
  PHONE,
  screenshot,
  seriousAccessibilityViolations,
  type TestBrowser,
} from './support/browser';
import { ClubSession, U8_COACH } from './support/club-session';

/** Every present player in exactly one station of every phase. */
function eachPlayerOncePerPhase(plan: Plan): boolean {
  const present = plan.request.players.map((p) => p.id).sort();
  return plan.phases.every((phase) => {
    const placed = phase.stations.flatMap((s) => s.playerIds).sort();
    return JSON.stringify(placed) === JSON.stringify(present);
  });
}

/** The widest area any station of this activity has in the plan. */
const activityWidth = (plan: Plan, activityId: string) =>
  Math.max(
    ...plan.phases
      .flatMap((p) => p.stations)
      .filter((s) => s.activityId === activityId)
      .map((s) => s.area.width),
  );

describe('pitch-side', () => {
  const baseUrl = inject('baseUrl');
  const club = new ClubSession(baseUrl);
  let browser: TestBrowser;
  let coach: AuthResponse;
  let team: TeamDto;
  let roster: PlayerDto[];

  beforeAll(async () => {
    browser = await launchBrowser(baseUrl);
    coach = await club.login(U8_COACH);
    ({ team, players: roster } = await club.team(coach, 'U8 Foxes'));
  });
  afterAll(async () => {
    await browser?.close();
  });

  async function openPitchSide(page: Page, planId: string): Promise<void> {
    await club.open(page, coach, `/plans/${planId}/pitch-side`);
    await page.getByTestId('countdown').waitFor();
  }

  const storedPlan = async (id: string) =>
    (await club.api.get<SessionPlanDto>(`/api/plans/${id}`, { token: coach.token })).body;

  it('a late arrival joins with one tap: the rest of the session is re-planned and the screen says who moves', async () => {
    const late = roster.at(-1)!;
    const session = await club.plan(coach, team, roster.slice(0, -1));
    const page = await browser.newPage(PHONE);
    await openPitchSide(page, session.id);
    await screenshot(page, 'pitch-side');
    expect(await seriousAccessibilityViolations(page)).toEqual([]);

    await page.getByRole('button', { name: `${late.displayName} arrives` }).click();
    const moves = page.getByTestId('moves');
    await moves.waitFor();
    await expect.poll(() => moves.textContent(), { timeout: 10_000 }).toContain(late.displayName);
    await expect
      .poll(async () => (await storedPlan(session.id)).plan.request.players.length, { timeout: 10_000 })
      .toBe(roster.length);
    const replanned = (await storedPlan(session.id)).plan;
    expect(eachPlayerOncePerPhase(replanned)).toBe(true);
    // Players already in a valid group stay: at most the arrival and a few others change station.
    const before = session.plan.phases[0].stations.map((s) => new Set(s.playerIds));
    const after = replanned.phases[0].stations;
    const moved = roster
      .slice(0, -1)
      .filter((p) => !after.some((s, i) => s.playerIds.includes(p.id) && before[i]?.has(p.id))).length;
    expect(moved).toBeLessThanOrEqual(3);
    expect(await page.getByRole('button', { name: `${late.displayName} leaves early` }).count()).toBe(1);
    await screenshot(page, 'pitch-side-moves');

    // Into the next phase, the arrival goes home early: they came, so nobody waits for them.
    await page.getByRole('button', { name: 'Next phase' }).click();
    await page.getByRole('button', { name: `${late.displayName} leaves early` }).click();
    await expect.poll(() => page.getByTestId('left-early').textContent()).toContain(late.displayName);
    expect(await page.getByRole('button', { name: `${late.displayName} arrives` }).count()).toBe(0);
    // The register is filled in from pitch-side's record.
    const register = page.getByTestId('register');
    await register.locator('mat-expansion-panel-header').click();
    const row = register.getByTestId('register-row').filter({ hasText: late.displayName });
    await expect.poll(() => row.textContent()).toMatch(/left \d+ min early/);
    await screenshot(page, 'pitch-side-left-early');
    expect(await seriousAccessibilityViolations(page)).toEqual([]);
    await page.close();
  });

  it('"too easy" steps the station\'s area down and the next plan of the team starts that activity smaller', async () => {
    const request = { seed: 'feedback-seed' };
    const session = await club.plan(coach, team, roster, request);
    // The first phase with stations (a U8 warm-up opens with ball mastery; a drinks break has none).
    const phaseIndex = session.plan.phases.findIndex((p) => p.stations.length > 0);
    expect(phaseIndex).toBeGreaterThanOrEqual(0);
    const firstStation = session.plan.phases[phaseIndex].stations[0];
    const page = await browser.newPage(DESKTOP);
    await openPitchSide(page, session.id);
    for (let i = 0; i < phaseIndex; i++) await page.getByRole('button', { name: 'Next phase' }).click();
    await expect
      .poll(() => page.locator('#current-phase-name').textContent())
      .toContain(session.plan.phases[phaseIndex].name);
    const card = page.locator('cw-station-card').first();
    expect(await card.getByTestId('station-kind').textContent()).toContain(`${firstStation.area.width} × `);
    // The card draws the group where the engine starts it.
    expect(await card.locator('cw-station-diagram g.cw-dot').count()).toBe(
      firstStation.playerIds.length + firstStation.coachJoins,
    );

    await card.locator('[data-verdict=too-easy]').click();
    await expect.poll(() => card.textContent(), { timeout: 10_000 }).toContain('saved');
    const stepped = (await storedPlan(session.id)).plan.phases[phaseIndex].stations.find(
      (s) => s.id === firstStation.id,
    )!;
    expect(stepped.area.width).toBeLessThan(firstStation.area.width);
    const feedback = await club.api.get<FeedbackDto[]>(`/api/plans/${session.id}/feedback`, {
      token: coach.token,
    });
    expect(feedback.body.map((f) => f.verdict)).toEqual(['too-easy']);
    await screenshot(page, 'pitch-side');
    expect(await seriousAccessibilityViolations(page)).toEqual([]);

    // The verdict follows its activity: pinned so the next plan plays it again, it starts smaller.
    const next = await club.plan(coach, team, roster, {
      ...request,
      pinnedActivityIds: [firstStation.activityId],
    });
    expect(activityWidth(next.plan, firstStation.activityId)).toBeLessThan(
      activityWidth(session.plan, firstStation.activityId),
    );
    const why = next.plan.trace.map((t) => t.description ?? '');
    expect(
      why.some((line) =>
        line.startsWith(`Last time ‘${firstStation.title}’ was marked too easy for groups of `),
      ),
    ).toBe(true);
    await page.close();
  });

  it('a drinks break in a hot training session counts down as a phase of its own, with no stations', async () => {
    const session = await club.plan(coach, team, roster, {
      kind: 'training',
      minutes: 45,
      conditions: { temperatureC: 29 },
      seed: 'hot-evening',
    });
    const breakIndex = session.plan.phases.findIndex((p) => p.activityKind === 'break');
    expect(breakIndex, 'heat brings drinks breaks').toBeGreaterThan(0);
    const drinks = session.plan.phases[breakIndex];
    const page = await browser.newPage(PHONE);
    await openPitchSide(page, session.id);
    for (let i = 0; i < breakIndex; i++) await page.getByRole('button', { name: 'Next phase' }).click();
    await expect.poll(() => page.locator('#current-phase-name').textContent()).toContain('Drinks break');
    expect(await page.getByTestId('countdown').getAttribute('aria-label')).toBe(
      'Time left in the drinks break',
    );
    expect(await page.getByTestId('break-now').isVisible()).toBe(true);
    expect(await page.locator('cw-station-card').count()).toBe(0);
    expect(await page.locator('.cw-pitch__next').first().textContent()).toContain(
      `at minute ${drinks.endMinute}`,
    );
    await screenshot(page, 'pitch-side-break');
    expect(await seriousAccessibilityViolations(page)).toEqual([]);
    await page.close();
  });

  it('offline: a verdict is queued on the device and stored exactly once when the connection returns', async () => {
    const session = await club.plan(coach, team, roster.slice(0, 8), { seed: 'offline-seed' });
    const page = await browser.newPage(PHONE);
    await openPitchSide(page, session.id);
    // Let the service worker take over so the app and the plan are cached, then go offline. The app
    // registers it once stable or after 30 s at most, so this can take a while.
    await page.evaluate(async () => {
      await navigator.serviceWorker.ready;
    });
    await page.reload();
    await page.getByTestId('countdown').waitFor();
    await expect.poll(() => page.evaluate(() => !!navigator.serviceWorker.controller)).toBe(true);

    await browser.context.setOffline(true);
    await page.locator('cw-station-card').first().locator('[data-verdict=right]').click();
    const badge = page.getByTestId('offline-badge');
    await expect.poll(() => badge.textContent(), { timeout: 10_000 }).toContain('1 queued');

    // Reopening the screen without a network still shows the plan and the waiting action.
    await page.reload();
    await page.getByTestId('countdown').waitFor();
    await expect.poll(() => badge.textContent(), { timeout: 10_000 }).toContain('1 queued');
    await screenshot(page, 'pitch-side-offline');
    const beforeSync = await club.api.get<FeedbackDto[]>(`/api/plans/${session.id}/feedback`, {
      token: coach.token,
    });
    expect(beforeSync.body).toEqual([]);

    await browser.context.setOffline(false);
    await expect.poll(() => badge.count(), { timeout: 15_000 }).toBe(0);
    const stored = await club.api.get<FeedbackDto[]>(`/api/plans/${session.id}/feedback`, {
      token: coach.token,
    });
    expect(stored.body).toHaveLength(1);
    expect(stored.body[0]).toMatchObject({
      verdict: 'right',
      phaseIndex: 0,
      stationId: session.plan.phases[0].stations[0].id,
    });

    // A replay of the same action (an answer lost on the way back) is not stored again.
    const replay = await club.api.post(
      `/api/plans/${session.id}/progression`,
      {
        phaseIndex: 0,
        stationId: stored.body[0].stationId,
        verdict: 'right',
        clientId: stored.body[0].clientId,
      },
      { token: coach.token },
    );
    expect(replay.status).toBeLessThan(300);
    const again = await club.api.get<FeedbackDto[]>(`/api/plans/${session.id}/feedback`, {
      token: coach.token,
    });
    expect(again.body).toHaveLength(1);
    await page.close();
  }, 150_000);
});
