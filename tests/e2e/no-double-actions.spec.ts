/**
 * No double actions, on a phone: a double tap on "Make the plan" makes one plan and a double tap on
 * "Add" in the player dialog adds one player; a plan is deleted from its page and from the past
 * plans, each time after a confirmation that says what goes, and a snack-bar says what went.
 */
import type { Page, Request } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type {
  AuthResponse,
  Page as ListPage,
  PlanSummaryDto,
  PlayerDto,
  SessionPlanDto,
} from '../../shared/types';
import {
  launchBrowser,
  PHONE,
  planDrawn,
  screenSettled,
  screenshot,
  seriousAccessibilityViolations,
  type TestBrowser,
} from './support/browser';
import { ClubSession, U8_COACH } from './support/club-session';

const TEAM = 'U8 Foxes';

describe('no double actions, and plans can be deleted (phone)', () => {
  const baseUrl = inject('baseUrl');
  const club = new ClubSession(baseUrl);
  let browser: TestBrowser;
  let coach: AuthResponse;

  beforeAll(async () => {
    browser = await launchBrowser(baseUrl);
    coach = await club.login(U8_COACH);
  });
  afterAll(async () => {
    await browser?.close();
  });

  /** A phone page signed in as the coach, counting the POSTs it sends to `path`. */
  async function phonePage(path: string, counted: RegExp): Promise<{ page: Page; posts: Request[] }> {
    const page = await browser.newPage(PHONE);
    const posts: Request[] = [];
    page.on('request', (request) => {
      if (request.method() === 'POST' && counted.test(new URL(request.url()).pathname)) posts.push(request);
    });
    page.on('pageerror', (error) => console.log(`[page error] ${error.message}`));
    await club.open(page, coach, path);
    return { page, posts };
  }

  const plansOfTeam = async (teamId: string) =>
    (await club.api.get<ListPage<PlanSummaryDto>>(`/api/plans?teamId=${teamId}`, { token: coach.token })).body
      .total;

  it('a double tap on "Make the plan" makes one plan, sent once with an Idempotency-Key', async () => {
    const { team } = await club.team(coach, TEAM);
    const before = await plansOfTeam(team.id);
    const { page, posts } = await phonePage(`/plan/new?teamId=${team.id}`, /^\/api\/plans$/);
    await page.getByRole('heading', { name: 'Plan a session' }).waitFor();
    await expect.poll(() => page.getByTestId('present-count').textContent()).not.toContain(' 0 here');
    await page.getByRole('button', { name: 'Next: kit and space' }).click();
    await page.getByRole('button', { name: 'Next: time and aim' }).click();
    await page.getByRole('button', { name: 'Next: the plan' }).click();
    const make = page.getByTestId('make-plan');
    await make.waitFor();
    await make.dblclick();
    await page.waitForURL(/\/plans\/[0-9a-f-]{36}$/);
    await planDrawn(page);
    await screenshot(page, 'double-tap-plan');

    expect(posts).toHaveLength(1);
    expect(posts[0]!.headers()['idempotency-key']).toMatch(/^[0-9a-f-]{36}$/);
    expect(await plansOfTeam(team.id)).toBe(before + 1);
    await page.close();
  });

  it('a double tap on "Add" in the player dialog adds the player once; the button says it is saving', async () => {
    const { team } = await club.team(coach, TEAM);
    const name = `Rue ${String.fromCharCode(65 + (Date.now() % 26))}.`;
    const { page, posts } = await phonePage(`/teams/${team.id}`, /\/players$/);
    const dialog = page.getByRole('dialog');
    // Hold the answer back, to see the button while the request is under way. Requests that the
    // app's service worker makes are out of the page's reach, so this page goes without it.
    const devtools = await browser.context.newCDPSession(page);
    await devtools.send('Network.enable');
    await devtools.send('Network.setBypassServiceWorker', { bypass: true });
    await page.reload();
    await page.getByRole('button', { name: 'Add a player' }).click();
    await dialog.getByLabel('Name shown on plans').fill(name);
    let release: () => void = () => undefined;
    const held = new Promise<void>((resolve) => (release = resolve));
    await page.route('**/api/teams/*/players', async (route) => {
      if (route.request().method() !== 'POST') return route.continue();
      await held;
      await route.continue();
    });
    await dialog.getByTestId('save-player').dblclick();
    await expect.poll(() => dialog.getByTestId('save-player').textContent()).toContain('Saving…');
    expect(await dialog.getByTestId('save-player').isDisabled()).toBe(true);
    await screenshot(page, 'player-saving');
    expect(await page.getByText(`${name} added.`).count()).toBe(0);
    release();
    await dialog.waitFor({ state: 'detached' });
    await page.getByText(`${name} added.`).waitFor();

    expect(posts).toHaveLength(1);
    const players = (
      await club.api.get<PlayerDto[]>(`/api/teams/${team.id}/players?includeInactive=true`, {
        token: coach.token,
      })
    ).body;
    expect(players.filter((p) => p.displayName === name)).toHaveLength(1);
    await page.close();
  });

  it('deletes a plan from its page after a confirmation, then shows the past plans and says what went', async () => {
    const { team, players } = await club.team(coach, TEAM);
    const plan = await club.plan(coach, team, players.slice(0, 6));
    const { page } = await phonePage(`/plans/${plan.id}`, /^$/);
    await planDrawn(page);
    await page.getByTestId('delete-plan').click();
    const dialog = page.getByRole('dialog');
    await dialog.getByText('Who came and how each station went').waitFor();
    await screenSettled(page);
    await screenshot(page, 'delete-plan-confirm');
    expect(await seriousAccessibilityViolations(page)).toEqual([]);

    // Keeping it changes nothing.
    await dialog.getByRole('button', { name: 'Keep plan' }).click();
    await dialog.waitFor({ state: 'detached' });
    expect((await club.api.get(`/api/plans/${plan.id}`, { token: coach.token })).status).toBe(200);

    await page.getByTestId('delete-plan').click();
    await page.getByTestId('confirm-delete-plan').click();
    await page.waitForURL(`**/teams/${team.id}/plans`);
    await page.getByText(`Match warm-up for ${TEAM} deleted.`).waitFor();
    await screenshot(page, 'delete-plan-done');
    expect((await club.api.get(`/api/plans/${plan.id}`, { token: coach.token })).status).toBe(404);
    await page.close();
  });

  it('deletes a plan from the past plans, and the row goes', async () => {
    const { team, players } = await club.team(coach, TEAM);
    const created = await club.api.post<SessionPlanDto>(
      '/api/plans',
      {
        teamId: team.id,
        date: '2027-03-14',
        request: {
          ageGroup: team.ageGroup,
          level: team.level,
          players: players.slice(0, 6).map((p) => ({ id: p.id })),
          coaches: 1,
          equipment: { balls: 12, cones: 40, bibs: 12, goals: 4 },
          space: team.usualSpace,
          minutes: 20,
          kind: 'training',
          seed: 'e2e-delete-from-history',
        },
      },
      { token: coach.token },
    );
    expect(created.status).toBe(201);
    const plan = created.body;
    const { page } = await phonePage(`/teams/${team.id}/plans`, /^$/);
    const row = page.locator('tr', { has: page.locator(`a[href="/plans/${plan.id}"]`) });
    await row.waitFor();
    await row.getByTestId('delete-plan').click();
    const dialog = page.getByRole('dialog');
    await dialog.getByText(`Training session of Sun 14 Mar for ${TEAM}`).waitFor();
    await page.getByTestId('confirm-delete-plan').click();
    await page.getByText(`Training session of Sun 14 Mar for ${TEAM} deleted.`).waitFor();
    await row.waitFor({ state: 'detached' });
    await screenshot(page, 'delete-plan-history');
    expect((await club.api.get(`/api/plans/${plan.id}`, { token: coach.token })).status).toBe(404);
    await page.close();
  });
});
