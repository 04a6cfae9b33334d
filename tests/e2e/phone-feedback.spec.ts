/**
 * Answers where the thumb is, on a 390 × 844 phone: "Larger area" tapped until the limit greys
 * the button and says the limit right under it, inside the screen; the plan's notices fold so
 * the first activity is on the first screen with the safety line still in view; the wizard
 * refuses nobody ticked and text in a number field at the step where it happens.
 */
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import type { Locator, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { AuthResponse, SessionPlanDto } from '../../shared/types';
import {
  launchBrowser,
  PHONE,
  planDrawn,
  screenshot,
  seriousAccessibilityViolations,
  type TestBrowser,
} from './support/browser';
import { ClubSession, U12_COACH } from './support/club-session';

const SHOTS = new URL('../../test-results/screenshots/', import.meta.url).pathname;

/** What the phone's screen shows right now (not the whole page). */
async function screenShot(page: Page, name: string): Promise<void> {
  mkdirSync(SHOTS, { recursive: true });
  // Messages fade in: wait until they have, so the picture shows what the coach reads.
  await page.waitForFunction(() =>
    document
      .getAnimations()
      .every((a) => a.playState !== 'running' || a.effect?.getTiming().iterations === Infinity),
  );
  await page.evaluate(() => document.fonts.ready.then(() => undefined));
  await page.screenshot({ path: join(SHOTS, `${name}-${PHONE.width}.png`) });
}

/** Whether a locator's box lies wholly inside the viewport. */
async function onScreen(page: Page, locator: Locator): Promise<boolean> {
  const box = await locator.boundingBox();
  const view = page.viewportSize()!;
  return (
    !!box && box.y >= 0 && box.y + box.height <= view.height && box.x >= 0 && box.x + box.width <= view.width
  );
}

/** Waits until the open menu has finished appearing, so its picture is not half faded. */
async function settledMenu(page: Page): Promise<void> {
  await page.waitForFunction(() => {
    const panel = document.querySelector('.mat-mdc-menu-panel');
    return !!panel && getComputedStyle(panel).opacity === '1' && !panel.getAnimations().length;
  });
}

describe('answers beside the control on a phone', () => {
  const baseUrl = inject('baseUrl');
  const club = new ClubSession(baseUrl);
  let browser: TestBrowser;
  let coach: AuthResponse;
  let saved: SessionPlanDto;
  let page: Page;

  beforeAll(async () => {
    browser = await launchBrowser(baseUrl);
    coach = await club.login(U12_COACH);
    const { team, players } = await club.team(coach, 'U12 Otters');
    // A hot evening on a small patch: a safety caution, a few warnings, areas near their limits.
    saved = await club.plan(coach, team, players.slice(0, 13), {
      space: { width: 30, length: 40 },
      conditions: { temperatureC: 29 },
      minutes: 30,
      kind: 'training',
    });
    page = await browser.newPage(PHONE);
    page.on('pageerror', (error) => console.log(`[page error] ${error.message}`));
    await club.open(page, coach, `/plans/${saved.id}`);
    await planDrawn(page);
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('folds the notices: the first activity is on the first screen, the safety line in view', async () => {
    expect(saved.plan.cautions.length).toBeGreaterThan(0);
    const folded = page.getByTestId('notices-folded');
    await folded.waitFor();
    expect(await folded.evaluate((el) => (el as HTMLDetailsElement).open)).toBe(false);
    await screenShot(page, 'phone-feedback-first-screen');
    await screenshot(page, 'phone-feedback-plan');
    const safety = page.getByTestId('safety-line');
    expect(await onScreen(page, safety)).toBe(true);
    expect(await safety.textContent()).toContain('Safety:');
    const firstStation = page.locator('cw-station-card h4').first();
    expect(await onScreen(page, firstStation)).toBe(true);
    // A tap opens every notice, each once.
    await folded.locator('summary').click();
    const items = await folded.locator('li').allTextContents();
    expect(new Set(items.map((t) => t.trim())).size).toBe(items.length);
    await screenShot(page, 'phone-feedback-notices-open');
    await folded.locator('summary').click();
    expect(await seriousAccessibilityViolations(page)).toEqual([]);
  });

  it('greys "Larger area" at its limit and says the limit under it, on screen', async () => {
    // The first station that can still grow. On a phone the area buttons are inside each card's
    // fold, drawn when it is opened (which also fetches the engine that greys them): open them all.
    await page.locator('.cw-stations-waiting').first().waitFor({ state: 'detached' });
    const cards = page.locator('cw-station-card');
    const count = await cards.count();
    for (let i = 0; i < count; i++) await cards.nth(i).locator('summary').click();
    await expect.poll(() => cards.getByTestId('area-larger').count()).toBe(count);
    await page.waitForLoadState('networkidle');
    let card: Locator | null = null;
    for (let i = 0; i < count && !card; i++) {
      const candidate = cards.nth(i);
      const larger = candidate.getByTestId('area-larger');
      if ((await larger.count()) && !(await larger.isDisabled())) card = candidate;
    }
    expect(card, 'a station whose area can still grow').not.toBeNull();
    const larger = card!.getByTestId('area-larger');
    const note = card!.locator('.cw-area-note');
    // While an edit is saved every edit control waits, "Larger area" too; "New groups" says when
    // the page is idle. Only a button still grey on an idle page, with the limit said, is at its limit.
    // A station steps a few times before its limit; 20 taps is far more than any needs.
    const idle = () => page.getByTestId('regenerate').isEnabled();
    const atLimit = async () =>
      (await idle()) &&
      (await larger.isDisabled()) &&
      /Largest area|No room/.test((await note.textContent()) ?? '');
    let taps = 0;
    for (let round = 0; round < 60 && taps < 20; round++) {
      await expect.poll(idle, { timeout: 15_000 }).toBe(true);
      if (await atLimit()) break;
      if (await larger.isDisabled()) continue;
      await larger.scrollIntoViewIfNeeded();
      await larger.click();
      taps++;
    }
    expect(taps).toBeGreaterThan(0);
    await expect.poll(atLimit, { timeout: 15_000 }).toBe(true);
    await expect
      .poll(async () => (await note.textContent()) ?? '', { timeout: 15_000 })
      .toMatch(/Largest area|No room/);
    const words = (await note.textContent()) ?? '';
    expect(words).toMatch(/Largest area|No room/);
    expect(words).not.toMatch(/p\d+-s\d+|beginner|intermediate|advanced|progression\./);
    await larger.scrollIntoViewIfNeeded();
    expect(await onScreen(page, larger)).toBe(true);
    expect(await onScreen(page, note)).toBe(true);
    const gap =
      (await note.boundingBox())!.y -
      ((await larger.boundingBox())!.y + (await larger.boundingBox())!.height);
    expect(gap).toBeLessThan(120);
    await screenShot(page, 'phone-feedback-area-limit');
  });

  it('names move destinations by station number and title, none alike', async () => {
    const phase = page
      .getByTestId('phase')
      .filter({ has: page.locator('cw-station-card:nth-of-type(2)') })
      .first();
    const card = phase.locator('cw-station-card').first();
    if (!(await card.locator('details').evaluate((d) => (d as HTMLDetailsElement).open))) {
      await card.locator('summary').click();
    }
    await card.locator('button.cw-move').first().click();
    await settledMenu(page);
    const labels = (await page.locator('.cw-move-to').allTextContents()).map((t) => t.trim());
    expect(labels.length).toBeGreaterThan(0);
    expect(new Set(labels).size).toBe(labels.length);
    for (const label of labels) expect(label).toMatch(/^To Station \d+ · /);
    await screenShot(page, 'phone-feedback-move-menu');
    await page.keyboard.press('Escape');
  });

  it('shows each activity with its one-line summary in the swap menu', async () => {
    await page.evaluate(() => window.scrollTo(0, 0));
    await page.getByRole('button', { name: /Swap/ }).first().click();
    const option = page.locator('.cw-swap-option').first();
    await option.waitFor();
    await settledMenu(page);
    expect(((await option.locator('.cw-swap-summary').textContent()) ?? '').trim().length).toBeGreaterThan(
      10,
    );
    await screenShot(page, 'phone-feedback-swap-menu');
    await page.keyboard.press('Escape');
  });
});

describe('the wizard checks each step on a phone', () => {
  const baseUrl = inject('baseUrl');
  const club = new ClubSession(baseUrl);
  let browser: TestBrowser;
  let page: Page;

  beforeAll(async () => {
    browser = await launchBrowser(baseUrl);
    const coach = await club.login(U12_COACH);
    const { team } = await club.team(coach, 'U12 Otters');
    page = await browser.newPage(PHONE);
    page.on('pageerror', (error) => console.log(`[page error] ${error.message}`));
    await club.open(page, coach, `/plan/new?teamId=${team.id}`);
    await page.getByRole('heading', { name: 'Plan a session' }).waitFor();
    await page.waitForFunction(
      () =>
        !/^0 here/.test(
          document.querySelector('[data-testid="present-count"]')?.textContent?.trim() ?? '0 here',
        ),
    );
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('refuses nobody ticked at the first step, and says so by the button', async () => {
    await page.getByRole('button', { name: 'Clear' }).click();
    await expect
      .poll(async () => ((await page.getByTestId('present-count').textContent()) ?? '').trim())
      .toMatch(/^0 here/);
    const next = page.getByTestId('next-who');
    await next.click();
    const problem = page.getByTestId('step-problem');
    await problem.waitFor();
    expect(await problem.textContent()).toContain('Tick at least one player who is here, or add a guest.');
    expect(await page.getByTestId('no-players').isVisible()).toBe(true);
    expect(await onScreen(page, problem)).toBe(true);
    // Still on the first step: the kit fields are not shown.
    expect(await page.locator('input[formcontrolname="cones"]').isVisible()).toBe(false);
    await screenShot(page, 'phone-feedback-wizard-nobody');
    await page.getByRole('button', { name: 'Tick all' }).click();
  });

  it('refuses text in a number field visibly and keeps it as typed', async () => {
    const adults = page.locator('input[formcontrolname="coaches"]');
    await adults.fill('two');
    await page.getByTestId('next-who').click();
    const field = adults.locator('xpath=ancestor::mat-form-field');
    await expect.poll(() => field.textContent()).toContain('Adults must be a number');
    expect(await adults.inputValue()).toBe('two');
    expect(await page.locator('input[formcontrolname="cones"]').isVisible()).toBe(false);
    await screenShot(page, 'phone-feedback-wizard-text');
    await adults.fill('2');
    await page.getByTestId('next-who').click();
    await page.locator('input[formcontrolname="cones"]').waitFor({ state: 'visible' });
    // The kit step holds the schema's limits: a negative width stays on the step.
    await page.locator('input[formcontrolname="width"]').fill('-10');
    await page.getByTestId('next-kit').click();
    const width = page.locator('input[formcontrolname="width"]').locator('xpath=ancestor::mat-form-field');
    await expect.poll(() => width.textContent()).toContain('Width must be more than 0.');
    await screenShot(page, 'phone-feedback-wizard-width');
    expect(await seriousAccessibilityViolations(page)).toEqual([]);
  });
});
