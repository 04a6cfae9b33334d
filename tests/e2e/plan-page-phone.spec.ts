/**
 * The plan page on a 390 × 844 phone: each station shows its title, area and diagram with the
 * rest folded away, a tap or Enter opens a station's details, the page is far shorter than with
 * everything open, print still shows everything, and the card comes on the paper the coach chose.
 * The same page on a desktop keeps every station open, and prints without the shell or controls.
 * A hot hour of training draws everyone where the engine starts them, runs drinks breaks as rows
 * of their own and lists a game's sides and keepers.
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { POSITION_STYLE, type AuthResponse, type SessionPlanDto } from '../../shared/types';
import {
  DESKTOP,
  launchBrowser,
  PHONE,
  planDrawn,
  screenshot,
  seriousAccessibilityViolations,
  type TestBrowser,
} from './support/browser';
import { ClubSession, U12_COACH } from './support/club-session';

const pageHeight = (page: Page) => page.evaluate(() => document.documentElement.scrollHeight);

/** Whether each station's details element is open, in page order. */
const openStates = (page: Page) =>
  page.getByTestId('station-details').evaluateAll((els) => els.map((el) => (el as HTMLDetailsElement).open));

/** Text of every control, toolbar or navigation block the current media shows. */
const visibleControls = (page: Page) =>
  page.evaluate(() =>
    Array.from(document.querySelectorAll('button, [role="button"], a.mat-mdc-button-base, mat-toolbar, nav'))
      .filter((el) => el.getBoundingClientRect().height > 0)
      .map((el) => `${el.tagName.toLowerCase()}: ${el.textContent?.trim() ?? ''}`),
  );

describe('the plan page on a phone', () => {
  const baseUrl = inject('baseUrl');
  const club = new ClubSession(baseUrl);
  const workDir = mkdtempSync(join(tmpdir(), 'conewise-e2e-phone-'));
  let browser: TestBrowser;
  let coach: AuthResponse;
  let saved: SessionPlanDto;
  let squad: Awaited<ReturnType<ClubSession['team']>>;
  let page: Page;
  let stationCount: number;

  beforeAll(async () => {
    browser = await launchBrowser(baseUrl);
    coach = await club.login(U12_COACH);
    squad = await club.team(coach, 'U12 Otters');
    const { team, players } = squad;
    // The coach flow's evening: 13 of the squad, 12 cones and 2 goals.
    saved = await club.plan(coach, team, players.slice(0, 13), {
      equipment: { balls: 12, cones: 12, bibs: 12, goals: 2 },
    });
    stationCount = saved.plan.phases.reduce((n, phase) => n + phase.stations.length, 0);
    page = await browser.newPage(PHONE);
    page.on('pageerror', (error) => console.log(`[page error] ${error.message}`));
    await club.open(page, coach, `/plans/${saved.id}`);
    await planDrawn(page);
    await page.evaluate(() => document.fonts.ready.then(() => undefined));
  });
  afterAll(async () => {
    await browser?.close();
    rmSync(workDir, { recursive: true, force: true });
  });

  it('shows every station folded: title, area and diagram in view, the details behind a summary', async () => {
    expect(saved.plan.phases.length).toBeGreaterThan(1);
    expect(await openStates(page)).toEqual(Array(stationCount).fill(false));
    const first = page.locator('cw-station-card').first();
    expect(await first.locator('h4').isVisible()).toBe(true);
    expect(await first.locator('cw-station-diagram svg[role="img"]').isVisible()).toBe(true);
    expect(await first.locator('summary').isVisible()).toBe(true);
    expect(await first.locator('.cw-points').isVisible()).toBe(false);
    expect(await first.locator('.cw-group').isVisible()).toBe(false);
    await screenshot(page, 'plan-page-phone');
    expect(await seriousAccessibilityViolations(page)).toEqual([]);
  });

  it('opens a station on a tap and another with Enter from the keyboard, and closes it again', async () => {
    const cards = page.locator('cw-station-card');
    await cards.nth(0).locator('summary').click();
    await expect.poll(async () => (await openStates(page))[0]).toBe(true);
    // The body is drawn on the details' toggle event, a task after `open` is set: wait for it.
    await cards.nth(0).locator('.cw-points').waitFor({ state: 'visible', timeout: 5000 });
    await cards.nth(0).locator('[data-player]').first().waitFor({ state: 'visible', timeout: 5000 });

    const second = cards.nth(1).locator('summary');
    await second.focus();
    await page.keyboard.press('Enter');
    await expect.poll(async () => (await openStates(page))[1]).toBe(true);
    // The summary tells a screen reader which station it opens.
    const secondTitle = saved.plan.phases.flatMap((phase) => phase.stations)[1]!.title;
    expect(await second.textContent()).toContain(secondTitle);
    await page.keyboard.press('Enter');
    await expect.poll(async () => (await openStates(page))[1]).toBe(false);
    // Back to the top, so the full-page picture does not catch the sticky toolbar half-way down.
    await page.evaluate(() => window.scrollTo(0, 0));
    await screenshot(page, 'plan-page-phone-open');
    expect(await seriousAccessibilityViolations(page)).toEqual([]);
  });

  it('is far shorter folded than with every station open', async () => {
    await page.reload();
    await planDrawn(page);
    await page.evaluate(() => document.fonts.ready.then(() => undefined));
    const folded = await pageHeight(page);
    const summaries = page.locator('cw-station-card summary');
    for (let i = 0; i < stationCount; i++) await summaries.nth(i).click();
    await expect.poll(() => openStates(page)).toEqual(Array(stationCount).fill(true));
    const unfolded = await pageHeight(page);
    console.log(`[plan page at 390×844] scrollHeight folded ${folded} px, every station open ${unfolded} px`);
    expect(folded).toBeLessThan(unfolded * 0.6);
  });

  it('prints every station open, also those folded on screen', async () => {
    await page.reload();
    await planDrawn(page);
    const points = page.locator('cw-station-card .cw-points');
    // Folded on screen, a card's body is not even drawn.
    expect(await points.count()).toBe(0);
    await page.emulateMedia({ media: 'print' });
    try {
      // Folded cards draw their body for paper as the page switches to print media.
      const shown = () => points.evaluateAll((els) => els.map((el) => el.getBoundingClientRect().height > 0));
      await expect.poll(async () => (await shown()).length).toBe(stationCount);
      expect((await shown()).every(Boolean)).toBe(true);
      expect(await page.locator('cw-station-card summary').first().isVisible()).toBe(false);
      // Paper carries the plan only: no toolbar, navigation, buttons or button-styled links.
      expect(await visibleControls(page)).toEqual([]);
    } finally {
      await page.emulateMedia({ media: 'screen' });
    }
  });

  it('downloads the card on US Letter after the coach picks it, and keeps Letter after a reload', async () => {
    await page.getByRole('radio', { name: 'US Letter' }).click();
    const asked = page.waitForRequest((r) => r.url().includes(`/api/plans/${saved.id}/pdf`));
    const download = page.waitForEvent('download');
    await page.getByTestId('print').click();
    expect(new URL((await asked).url()).searchParams.get('paper')).toBe('letter');
    const file = join(workDir, 'card-letter.pdf');
    await (await download).saveAs(file);
    const info = execFileSync('pdfinfo', [file], { encoding: 'utf8' });
    // US Letter is 8.5 × 11 in: 612 × 792 PostScript points.
    expect(info).toMatch(/Page size:\s+612 x 792 pts/);

    await page.reload();
    await planDrawn(page);
    expect(await page.getByRole('radio', { name: 'US Letter' }).isChecked()).toBe(true);
    expect(await page.getByRole('radio', { name: 'A4' }).isChecked()).toBe(false);
  });

  it('keeps every station open on a desktop, with no summary to open', async () => {
    const desktop = await browser.newPage(DESKTOP);
    await club.open(desktop, coach, `/plans/${saved.id}`);
    await planDrawn(desktop);
    expect(await openStates(desktop)).toEqual(Array(stationCount).fill(true));
    expect(await desktop.locator('cw-station-card summary').first().isVisible()).toBe(false);
    expect(await desktop.locator('cw-station-card .cw-points').first().isVisible()).toBe(true);
    console.log(`[plan page at 1440×900] scrollHeight ${await pageHeight(desktop)} px`);
    await screenshot(desktop, 'plan-page-desktop');
    expect(await seriousAccessibilityViolations(desktop)).toEqual([]);
    await desktop.close();
  });

  it('prints the desktop page without the shell or any control, down to the last station', async () => {
    // The whole squad with a full bag: a plan long enough that a clipping shell lost its last
    // station's lines on paper.
    const full = await club.plan(coach, squad.team, squad.players, {
      equipment: { balls: 16, cones: 50, bibs: 16, goals: 4 },
    });
    const fullCount = full.plan.phases.reduce((n, phase) => n + phase.stations.length, 0);
    const desktop = await browser.newPage(DESKTOP);
    await club.open(desktop, coach, `/plans/${full.id}`);
    await planDrawn(desktop);
    await desktop.evaluate(() => document.fonts.ready.then(() => undefined));
    expect(await visibleControls(desktop)).not.toEqual([]);
    await desktop.emulateMedia({ media: 'print' });
    expect(await visibleControls(desktop)).toEqual([]);
    const file = join(workDir, 'browser-print.pdf');
    await desktop.pdf({ path: file, format: 'A4' });
    await desktop.close();
    const text = execFileSync('pdftotext', [file, '-'], { encoding: 'utf8' });
    // Each station card ends with its kit line: one per station means nothing was cut off.
    // (A kit line that opens a new sheet follows the form feed pdftotext puts there.)
    expect(text.match(/^\f?Kit: /gm)?.length).toBe(fullCount);
    expect(text).toContain(full.plan.phases.at(-1)!.name);
    for (const chrome of ['Swap activity', 'New groups', 'Print card', 'This week', 'Why this plan']) {
      expect(text).not.toContain(chrome);
    }
  });
});

describe('a hot hour of training on the plan page', () => {
  const baseUrl = inject('baseUrl');
  const club = new ClubSession(baseUrl);
  let browser: TestBrowser;
  let coach: AuthResponse;
  let saved: SessionPlanDto;

  beforeAll(async () => {
    browser = await launchBrowser(baseUrl);
    coach = await club.login(U12_COACH);
    const { team, players } = await club.team(coach, 'U12 Otters');
    // Two keepers among the first 14, so the game can have one in each goal.
    const keepers = players.filter((p) => p.goalkeeper);
    const outfield = players.filter((p) => !p.goalkeeper);
    const squad = [...keepers.slice(0, 2), ...outfield]
      .slice(0, 14)
      .map((p, i) => ({ ...p, goalkeeper: i < 2 }));
    saved = await club.plan(coach, team, squad, {
      kind: 'training',
      minutes: 60,
      focus: ['finishing'],
      conditions: { temperatureC: 29 },
      equipment: { balls: 14, cones: 40, bibs: 10, goals: 2 },
      space: { width: 45, length: 60 },
      seed: 'e2e-hot-hour',
    });
  });
  afterAll(async () => {
    await browser?.close();
  });

  const stations = () => saved.plan.phases.flatMap((phase) => phase.stations);

  for (const [viewport, label] of [
    [PHONE, 'phone'],
    [DESKTOP, 'desktop'],
  ] as const) {
    it(`draws one circle per player in every diagram, in the role colours, and a drinks-break row (${label})`, async () => {
      const page = await browser.newPage(viewport);
      page.on('pageerror', (error) => console.log(`[page error] ${error.message}`));
      await club.open(page, coach, `/plans/${saved.id}`);
      await planDrawn(page);

      // Heat: drinks breaks are phases of their own, each a row with no stations.
      const breaks = saved.plan.phases.filter((phase) => phase.activityKind === 'break');
      expect(breaks.length).toBeGreaterThan(0);
      const rows = page.locator('[data-testid="phase"][data-kind="break"]');
      expect(await rows.count()).toBe(breaks.length);
      expect(await rows.first().textContent()).toContain(
        `${breaks[0]!.name} · ${breaks[0]!.endMinute - breaks[0]!.startMinute} min`,
      );
      expect(await rows.locator('cw-station-card').count()).toBe(0);

      // Every diagram draws exactly the group: its players and a coach who joins.
      const diagrams = page.locator('cw-station-card cw-station-diagram svg[role="img"]');
      expect(await diagrams.count()).toBe(stations().length);
      const drawn = await diagrams.evaluateAll((svgs) =>
        svgs.map((svg) =>
          Array.from(svg.querySelectorAll('g.cw-dot')).map((g) => ({
            role: g.getAttribute('data-role'),
            fill: g.querySelector('circle')!.getAttribute('fill'),
          })),
        ),
      );
      stations().forEach((station, i) => {
        expect(drawn[i]).toHaveLength(station.playerIds.length + station.coachJoins);
        expect(drawn[i]!.map((d) => d.role)).toEqual(station.positions.map((p) => p.role));
        for (const d of drawn[i]!)
          expect(d.fill).toBe(POSITION_STYLE[d.role as keyof typeof POSITION_STYLE].fill);
      });

      // The game with keepers lists its sides and who is in goal.
      const gameIndex = saved.plan.phases.findIndex((phase) =>
        phase.stations.some(
          (s) => (s.roles.teams ?? []).length === 2 && (s.roles.goalkeeper ?? []).length === 2,
        ),
      );
      expect(gameIndex, 'the hour has a game with a keeper in each goal').toBeGreaterThanOrEqual(0);
      const game = page.getByTestId('phase').nth(gameIndex).locator('cw-station-card').first();
      if (label === 'phone') await game.locator('summary').click();
      const roles = game.getByTestId('station-roles');
      await roles.waitFor();
      expect(await roles.locator('dt').allTextContents()).toEqual(['Side A (bibs)', 'Side B', 'Goalkeeper']);
      expect(await game.locator('cw-station-diagram g.cw-dot[data-role="goalkeeper"]').count()).toBe(2);

      await page.evaluate(() => window.scrollTo(0, 0));
      const full = await screenshot(page, 'plan-page-training');
      await game.scrollIntoViewIfNeeded();
      await game.screenshot({ path: full.replace('plan-page-training-', 'plan-page-training-game-') });
      expect(await seriousAccessibilityViolations(page)).toEqual([]);

      // The swap menu: the game's own kind first, each option with its line, ruled-out ones saying why.
      await page.getByTestId('phase').nth(gameIndex).getByRole('button', { name: 'Swap activity' }).click();
      const menu = page.locator('.cw-swap-menu');
      await menu.locator('[role="group"]').first().waitFor();
      expect(await menu.locator('[role="group"]').first().getAttribute('aria-label')).toBe(
        'Small-sided game',
      );
      const disabled = menu.locator(
        'button[mat-menu-item][disabled], button[mat-menu-item][aria-disabled="true"]',
      );
      expect(await disabled.count()).toBeGreaterThan(0);
      expect(await disabled.first().locator('.cw-swap-summary').textContent()).toContain(
        'Not for this plan:',
      );
      await page.screenshot({ path: full.replace('plan-page-training-', 'plan-page-training-swap-') });
      await page.keyboard.press('Escape');
      await page.close();
    });
  }
});
