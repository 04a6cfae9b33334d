/**
 * A parent helper's view on a 390 × 844 phone: the coach makes a helper link from the plan page's
 * share dialog, a fresh browser with no account opens it and sees the plan with first names only
 * and no edit controls, the token never travels in an address, and once the coach stops the link
 * the page says in plain words that it no longer works.
 */
import type { Page, Request } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { AuthResponse, PlayerDto, SessionPlanDto } from '../../shared/types';
import {
  launchBrowser,
  PHONE,
  screenshot,
  seriousAccessibilityViolations,
  type TestBrowser,
} from './support/browser';
import { ClubSession, U12_COACH } from './support/club-session';

describe('a helper link on a phone', () => {
  const baseUrl = inject('baseUrl');
  const club = new ClubSession(baseUrl);
  let coachBrowser: TestBrowser;
  let helperBrowser: TestBrowser;
  let coach: AuthResponse;
  let players: PlayerDto[];
  let saved: SessionPlanDto;
  let coachPage: Page;
  let helperPage: Page;
  let link: string;
  const helperRequests: Request[] = [];

  beforeAll(async () => {
    coachBrowser = await launchBrowser(baseUrl);
    // A second profile: no session, no storage, as on a parent's own phone.
    helperBrowser = await launchBrowser(baseUrl);
    helperBrowser.context.on('request', (request) => helperRequests.push(request));
    coach = await club.login(U12_COACH);
    const squad = await club.team(coach, 'U12 Otters');
    players = squad.players.slice(0, 12);
    saved = await club.plan(coach, squad.team, players);
    coachPage = await coachBrowser.newPage(PHONE);
    helperPage = await helperBrowser.newPage(PHONE);
    for (const page of [coachPage, helperPage]) {
      page.on('pageerror', (error) => console.log(`[page error] ${error.message}`));
    }
  });
  afterAll(async () => {
    await coachBrowser?.close();
    await helperBrowser?.close();
  });

  it('the coach makes a helper link in the share dialog and sees it listed', async () => {
    await club.open(coachPage, coach, `/plans/${saved.id}`);
    await coachPage.getByTestId('share').click();
    await coachPage.getByTestId('helper-link-make').click();
    const field = coachPage.getByTestId('helper-link-url');
    await field.waitFor();
    link = await field.inputValue();
    expect(link).toMatch(/\/helper#[A-Za-z0-9_-]{43}$/);
    await coachPage.getByTestId('helper-link-copy').click();
    await coachPage.getByText('Copied.').waitFor();
    await coachPage.getByTestId('helper-link-item').first().waitFor();
    // An empty address field stays calm when the coach only wants a link.
    expect(await coachPage.getByText('Add at least one e-mail address').count()).toBe(0);
    await coachPage.getByTestId('helper-link-item').first().scrollIntoViewIfNeeded();
    await screenshot(coachPage, 'helper-link-made');
  });

  it('a fresh browser with no account opens it and sees the plan with first names only, read-only', async () => {
    const token = new URL(link).hash.slice(1);
    const response = await helperPage.goto(`${baseUrl}/helper#${token}`);
    expect(response!.headers()['x-robots-tag']).toMatch(/noindex/);
    expect(response!.headers()['referrer-policy']).toBe('no-referrer');
    await helperPage.getByTestId('phase').first().waitFor();
    await helperPage.getByTestId('cautions').waitFor();

    const text = (await helperPage.getByTestId('helper-view').innerText()).replace(/\s+/g, ' ');
    for (const player of players) {
      const [first] = player.displayName.split(' ') as [string];
      // The stored "Aaron F." never shows; "Aaron" does.
      expect(text).not.toContain(player.displayName);
      expect(text).toContain(first);
    }
    expect(await helperPage.locator('cw-station-card').count()).toBe(
      saved.plan.phases.reduce((n, phase) => n + phase.stations.length, 0),
    );
    expect(await helperPage.locator('cw-station-diagram svg').first().isVisible()).toBe(true);
    // No edit controls, no app navigation, nothing of the club but this plan.
    for (const label of ['Swap', 'New groups', 'Share', 'Print', 'Larger area', 'Smaller area', 'Move']) {
      expect(await helperPage.getByRole('button', { name: label }).count(), label).toBe(0);
    }
    expect(await helperPage.locator('mat-toolbar, mat-sidenav').count()).toBe(0);
    expect(await helperPage.locator('meta[name="robots"]').getAttribute('content')).toMatch(/noindex/);

    // The token went in a header, never in an address or a referrer.
    const api = helperRequests.find((r) => r.url().endsWith('/api/helper-view'));
    expect(api).toBeTruthy();
    expect((await api!.allHeaders())['helper-token']).toBe(token);
    for (const request of helperRequests) {
      expect(request.url()).not.toContain(token);
      expect((await request.allHeaders())['referer'] ?? '').not.toContain(token);
    }
    expect(await seriousAccessibilityViolations(helperPage)).toEqual([]);
    await screenshot(helperPage, 'helper-view');
  });

  it('a coach who reads yards and °F hands on a link that reads in them too', async () => {
    const me = (body: object) => club.api.patch('/api/auth/me', body, { token: coach.token });
    expect((await me({ distanceUnit: 'yards', temperatureUnit: 'fahrenheit' })).status).toBe(200);
    try {
      await helperPage.reload();
      const kind = helperPage.getByTestId('station-kind').first();
      await kind.waitFor();
      // The first station's stored metres, in whole yards.
      const area = saved.plan.phases.find((p) => p.stations.length)!.stations[0]!.area;
      const yards = (m: number) => Math.round(m / 0.9144);
      expect(await kind.innerText()).toContain(`${yards(area.width)} × ${yards(area.length)} yd`);
      const text = await helperPage.getByTestId('helper-view').innerText();
      expect(text).toContain(' yd');
      // No size, area or temperature left in metric words.
      expect(text).not.toMatch(/\d m(?![\w])|\d m²|°C/);
      await screenshot(helperPage, 'helper-view-yards');
    } finally {
      expect((await me({ distanceUnit: null, temperatureUnit: null })).status).toBe(200);
    }
  });

  it('once the coach stops the link, the helper’s page says it no longer works', async () => {
    await coachPage.getByTestId('helper-link-revoke').first().click();
    await coachPage.getByTestId('helper-link-url').waitFor({ state: 'detached' });

    await helperPage.reload();
    const ended = helperPage.getByTestId('helper-link-ended');
    await ended.waitFor();
    expect(await ended.innerText()).toContain('This link no longer works');
    expect(await ended.innerText()).toContain('The coach has stopped this link.');
    expect(await helperPage.locator('cw-station-card').count()).toBe(0);
    await screenshot(helperPage, 'helper-view-stopped');
  });
});
