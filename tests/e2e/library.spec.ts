/**
 * The activity library end to end: the U12 coach filters it, opens an activity, pins it for the
 * U12 team and finds it in the next plan made in the wizard; the head of coaching adds a club
 * activity through the form (a field message fixed, the live diagram seen), saves it to the
 * draft, publishes, and finds it in the library marked as the club's.
 */
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { AuthResponse, RuleSetDocument, RuleSetDto, SessionPlanDto, TeamDto } from '../../shared/types';
import { ClubSession, LEAD, U12_COACH } from './support/club-session';
import {
  DESKTOP,
  launchBrowser,
  PHONE,
  planDrawn,
  screenSettled,
  screenshot,
  seriousAccessibilityViolations,
  type TestBrowser,
} from './support/browser';

const TEAM = 'U12 Otters';
/** A passing-and-finishing practice for U9–U13 that the U12 warm-up does not choose unasked. */
const PINNED = 'pf-triangle-drive';
const CLUB_TITLE = 'Fence-line rondo';

/** Logs what the browser saw when a step fails. */
function listen(page: Page): void {
  page.on('pageerror', (error) => console.log(`[page error] ${error.message}`));
  page.on('response', (r) => {
    if (r.status() >= 400) console.log(`[http ${r.status()}] ${r.request().method()} ${r.url()}`);
  });
}

/** Full-page pictures start at the top of the scrolling content, so the toolbar stays at the top. */
async function picture(page: Page, name: string): Promise<void> {
  await page.evaluate(() => {
    document.querySelector('mat-sidenav-content')?.scrollTo(0, 0);
    window.scrollTo(0, 0);
  });
  await screenshot(page, name);
}

/** Picks an option of a Material select found by a locator. */
async function choose(page: Page, selector: string, option: string): Promise<void> {
  await page.locator(selector).click();
  await page.getByRole('option', { name: option, exact: true }).click();
}

describe('activity library', () => {
  const baseUrl = inject('baseUrl');
  const club = new ClubSession(baseUrl);
  let browser: TestBrowser;
  let lead: AuthResponse;
  let coach: AuthResponse;
  let team: TeamDto;

  beforeAll(async () => {
    browser = await launchBrowser(baseUrl);
    lead = await club.login(LEAD);
    coach = await club.login(U12_COACH);
    team = (await club.team(coach, TEAM)).team;
  });
  afterAll(async () => {
    await browser?.close();
    // Leave the club as the other suites expect it: the starting rules and no pins.
    if (lead) await club.api.post('/api/rule-sets/rollback', { to: 'default' }, { token: lead.token });
    if (team)
      await club.api.put(
        `/api/teams/${team.id}/pinned-activities`,
        { activityIds: [] },
        { token: lead.token },
      );
  });

  it('the U12 coach filters the library, opens an activity, pins it, and the next plan uses it', async () => {
    const rules = (await club.api.get<RuleSetDto>('/api/rule-sets/published', { token: coach.token })).body
      .body as RuleSetDocument;
    const activity = rules.parameters.activities.find((a) => a.id === PINNED)!;
    expect(activity.kind).toBe('passing-finishing');

    const accessibility: string[] = [];
    const page = await browser.newPage(PHONE);
    listen(page);
    await club.open(page, coach, '/library');
    const count = page.getByTestId('library-count');
    // The coach's first team is the U12s: the library starts at their age group.
    await expect.poll(() => count.textContent()).toContain('for U12');
    const all = rules.parameters.activities.filter((a) => !a.retired).length;
    expect(await count.textContent()).not.toContain(`${all} of ${all}`);
    await picture(page, 'library');
    accessibility.push(...(await seriousAccessibilityViolations(page)).map((v) => `library@390: ${v}`));

    await choose(page, '[data-testid=filter-kind]', 'Passing and finishing');
    await page.getByRole('searchbox', { name: 'Search' }).fill(activity.title.split(' ')[0]!);
    const card = page.locator(`article[data-activity="${PINNED}"]`);
    await card.waitFor();
    const kinds = await page.locator('cw-activity-card .cw-activity__kind').allTextContents();
    expect(kinds.length).toBeGreaterThan(0);
    expect(new Set(kinds.map((k) => k.trim()))).toEqual(new Set(['Passing and finishing']));
    expect(await card.locator('svg[role=img]').getAttribute('aria-label')).toContain('Passing and finishing');

    await card.getByRole('button', { name: /^Details/ }).click();
    const details = card.getByTestId('activity-details');
    await details.waitFor();
    expect(await details.textContent()).toContain(activity.coachingPoints[0]);
    expect(await details.textContent()).toContain(activity.harder[0]);
    await picture(page, 'library-open');

    await card.getByRole('button', { name: /^Pin for next plan/ }).click();
    await expect
      .poll(() => card.locator('.cw-activity__message').textContent())
      .toContain(`Pinned for ${TEAM}`);
    expect(await card.getByTestId('pinned-by').textContent()).toContain(TEAM);
    const teams = await club.api.get<TeamDto[]>('/api/teams', { token: coach.token });
    expect(teams.body.find((t) => t.id === team.id)!.pinnedActivityIds).toContain(PINNED);

    await page.setViewportSize(DESKTOP);
    await screenSettled(page);
    await picture(page, 'library-open');
    accessibility.push(...(await seriousAccessibilityViolations(page)).map((v) => `library@1440: ${v}`));

    // The next plan, made in the wizard, takes the team's pin.
    await page.goto(`${baseUrl}/plan/new`);
    await page.getByRole('heading', { name: 'Plan a session' }).waitFor();
    await page.getByTestId('team-select').click();
    await page.getByRole('option', { name: new RegExp(TEAM) }).click();
    // The squad arrives after the team is chosen: the first step is only complete with it.
    await expect
      .poll(() => page.getByTestId('present-count').textContent(), { timeout: 15_000 })
      .toMatch(/\b(1[0-9]|[1-9]) here/);
    await page.getByRole('button', { name: 'Next: kit and space' }).click();
    await page.getByRole('button', { name: 'Next: time and aim' }).click();
    await page.getByRole('button', { name: 'Next: the plan' }).click();
    const created = page.waitForResponse(
      (r) => r.url().endsWith('/api/plans') && r.request().method() === 'POST',
    );
    await page.getByTestId('make-plan').click();
    const response = await created;
    expect(response.status()).toBe(201);
    await page.waitForURL(/\/plans\/[0-9a-f-]{36}$/);
    await planDrawn(page);
    // Read back as stored (the page's network log may not keep the body once it has moved on).
    const id = new URL(page.url()).pathname.split('/').pop()!;
    const saved = await page.evaluate(async (planId) => {
      const { token } = JSON.parse(localStorage.getItem('conewise.session')!) as { token: string };
      const answer = await fetch(`/api/plans/${planId}`, { headers: { authorization: `Bearer ${token}` } });
      return (await answer.json()) as SessionPlanDto;
    }, id);
    expect(saved.request.pinnedActivityIds).toContain(PINNED);
    const used = saved.plan.phases.flatMap((p) => p.stations).filter((s) => s.activityId === PINNED);
    expect(used.length).toBeGreaterThan(0);
    expect(await page.locator('main').textContent()).toContain(activity.title);
    await page.close();
    expect(accessibility).toEqual([]);
  });

  it('the lead adds a club activity, fixes a field, sees the diagram, publishes, and finds it in the library', async () => {
    const accessibility: string[] = [];
    const page = await browser.newPage(PHONE);
    listen(page);
    await club.open(page, lead, '/club/rules');
    const start = page.getByRole('button', { name: 'Start editing' });
    const state = page.getByTestId('draft-state');
    await Promise.race([start.waitFor(), state.waitFor()]);
    if (await start.isVisible()) await start.click();
    await state.waitFor();

    await page.getByRole('tab', { name: 'Our activities' }).click();
    await page.getByRole('button', { name: 'Add a club activity' }).click();
    const form = page.getByTestId('activity-form');
    await form.waitFor();

    await form.locator('[data-field=title]').fill(CLUB_TITLE);
    await form
      .locator('[data-field=summary]')
      .fill('Four keep the ball from one along the fence, which plays as a team-mate.');
    await form
      .locator('[data-field=description]')
      .fill(
        'Mark a square against the fence. Four attackers keep the ball from one defender and may pass off the fence; ten passes scores, a win swaps the defender.',
      );
    await choose(page, '[data-field=kind]', 'Keep-ball');
    await form.locator('[data-line="coachingPoints.0"]').fill('Open up to see the fence and a team-mate');
    await form.locator('[data-field="players.min"]').fill('8');
    await form.locator('[data-field="players.max"]').fill('4');
    await form.locator('[data-field="players.max"]').press('Tab');
    const maxField = form.locator('mat-form-field', { has: page.locator('[data-field="players.max"]') });
    await expect
      .poll(() => maxField.locator('mat-error').textContent())
      .toContain('Most players must be at least the fewest players.');
    await form.getByRole('button', { name: 'Save to draft' }).click();
    await form.getByTestId('form-problems').waitFor();
    await picture(page, 'activity-form-error');

    await form.locator('[data-field="players.min"]').fill('5');
    await form.locator('[data-field="players.max"]').fill('6');
    await form.locator('[data-field="players.max"]').press('Tab');
    await expect.poll(() => maxField.locator('mat-error').count()).toBe(0);
    const preview = form.getByTestId('activity-preview').locator('svg[role=img]');
    await preview.waitFor();
    expect(await preview.getAttribute('aria-label')).toContain('Keep-ball');
    expect(
      await form.getByTestId('activity-preview').locator('[data-role=defender]').count(),
    ).toBeGreaterThan(0);
    await picture(page, 'activity-form');
    accessibility.push(...(await seriousAccessibilityViolations(page)).map((v) => `activity-form@390: ${v}`));
    await page.setViewportSize(DESKTOP);
    await screenSettled(page);
    await picture(page, 'activity-form');
    accessibility.push(
      ...(await seriousAccessibilityViolations(page)).map((v) => `activity-form@1440: ${v}`),
    );

    await form.getByRole('button', { name: 'Save to draft' }).click();
    const row = page.getByTestId('club-activity-list').locator('li', { hasText: CLUB_TITLE });
    await expect.poll(() => row.textContent()).toContain('Saved');
    await expect.poll(() => state.getAttribute('data-unsaved')).toBe('0');
    await picture(page, 'club-activities');
    const draftId = (await club.api.get<RuleSetDto[]>('/api/rule-sets', { token: lead.token })).body.find(
      (v) => v.status === 'draft',
    )!.id;
    const draft = (await club.api.get<RuleSetDto>(`/api/rule-sets/${draftId}`, { token: lead.token })).body
      .body as RuleSetDocument;
    const added = draft.parameters.activities.find((a) => a.title === CLUB_TITLE)!;
    expect(added).toMatchObject({ origin: 'club', kind: 'keep-ball', players: { min: 5, max: 6 } });
    expect(added.id).toMatch(/^club-/);

    await page.getByRole('button', { name: 'Publish' }).click();
    // Publishing asks first (how many teams it changes); then it publishes.
    await page.getByTestId('confirm-publish').click();
    // Published once the club's published rules hold it (the page's heading may say "version" before).
    await expect
      .poll(async () => {
        const published = await club.api.get<RuleSetDto>('/api/rule-sets/published', { token: lead.token });
        return (published.body.body as RuleSetDocument).parameters.activities.map((a) => a.id);
      })
      .toContain(added.id);

    // Every member now finds it in the library, marked as the club's own.
    const library = await browser.newPage(PHONE);
    listen(library);
    await club.open(library, coach, '/library');
    await library.getByRole('searchbox', { name: 'Search' }).fill('fence');
    const card = library.locator(`article[data-activity="${added.id}"]`);
    await card.waitFor();
    expect(await card.getByTestId('club-mark').textContent()).toContain('Our club');
    expect(await card.locator('svg[role=img]').getAttribute('aria-label')).toContain('Keep-ball');
    await picture(library, 'library-club');
    await library.close();
    await page.close();
    expect(accessibility).toEqual([]);
  });
});
