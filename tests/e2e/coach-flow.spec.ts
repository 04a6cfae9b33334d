/**
 * A demo coach's whole job in headless Chromium: sign in, plan a warm-up for 13 of the squad with
 * 12 cones and 2 goals, check the groups, move a player, print the card and share it by e-mail.
 * Every screen is photographed on a phone and a desktop and checked with axe-core.
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { DEMO_PASSWORD } from '../../server/seed';
import type { SessionPlanDto } from '../../shared/types';
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

const COACH = 'coach.u12@fernmoor.example.org';
const TEAM = 'U12 Otters';
const ABSENT = 'Aaron F.';
const RECIPIENT = 'parent.helper@fernmoor.example.org';

interface CaughtMailSummary {
  id: string;
  to: string[];
  subject: string;
  attachments: { filename: string; contentType: string }[];
}

/** Photographs the screen at phone and desktop width and returns axe-core's serious findings at both. */
async function captureScreen(page: Page, name: string): Promise<string[]> {
  const findings: string[] = [];
  for (const viewport of [PHONE, DESKTOP]) {
    await page.setViewportSize(viewport);
    await screenSettled(page);
    await screenshot(page, name);
    findings.push(
      ...(await seriousAccessibilityViolations(page)).map((v) => `${name}@${viewport.width}: ${v}`),
    );
  }
  return findings;
}

describe('a coach plans, adjusts, prints and shares a warm-up', () => {
  const baseUrl = inject('baseUrl');
  const mailUrl = inject('mailUrl');
  let browser: TestBrowser;
  let page: Page;
  let saved: SessionPlanDto;
  const accessibility: string[] = [];
  const workDir = mkdtempSync(join(tmpdir(), 'conewise-e2e-'));

  /**
   * The plan as stored, read by the page with its own session. (Once the service worker controls
   * the page it answers the page's writes, and the page's own network log may no longer hold their
   * bodies.)
   */
  const storedPlan = (on: Page, planId: string) =>
    on.evaluate(async (id) => {
      const { token } = JSON.parse(localStorage.getItem('conewise.session')!) as { token: string };
      const answer = await fetch(`/api/plans/${id}`, { headers: { authorization: `Bearer ${token}` } });
      return (await answer.json()) as SessionPlanDto;
    }, planId);

  beforeAll(async () => {
    browser = await launchBrowser(baseUrl);
    page = await browser.newPage(DESKTOP);
    // Said out loud when a step fails, so a red run tells what the browser saw.
    page.on('pageerror', (error) => console.log(`[page error] ${error.message}`));
    page.on('console', (message) => {
      if (message.type() === 'error') console.log(`[console] ${message.text()}`);
    });
    page.on('response', (r) => {
      if (r.status() >= 400) console.log(`[http ${r.status()}] ${r.request().method()} ${r.url()}`);
    });
  });
  afterAll(async () => {
    await browser?.close();
    rmSync(workDir, { recursive: true, force: true });
  });

  it('signs in as the demo coach and lands on this week', async () => {
    await page.goto(`${baseUrl}/sign-in`);
    await page.getByRole('heading', { name: 'Sign in' }).waitFor();
    accessibility.push(...(await captureScreen(page, 'sign-in')));
    await page.getByLabel('E-mail').fill(COACH);
    await page.getByLabel('Password').fill(DEMO_PASSWORD);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('heading', { name: 'This week' }).waitFor();
    await page.getByText(TEAM).first().waitFor();
    accessibility.push(...(await captureScreen(page, 'home')));
  });

  it('plans a match warm-up for 13 present players with 12 cones and 2 goals', async () => {
    await page.getByTestId('plan-warm-up').click();
    await page.getByRole('heading', { name: 'Plan a session' }).waitFor();
    await page.getByTestId('team-select').click();
    await page.getByRole('option', { name: new RegExp(TEAM) }).click();
    await expect.poll(() => page.getByTestId('present-count').textContent()).toContain('14 here');
    await page.getByTestId('roster').getByRole('option', { name: ABSENT }).click();
    await expect.poll(() => page.getByTestId('present-count').textContent()).toContain('13 here');
    accessibility.push(...(await captureScreen(page, 'wizard-who')));

    await page.getByRole('button', { name: 'Next: kit and space' }).click();
    await page.locator('input[formcontrolname="cones"]').fill('12');
    await page.locator('input[formcontrolname="goals"]').fill('2');
    accessibility.push(...(await captureScreen(page, 'wizard-kit')));

    await page.getByRole('button', { name: 'Next: time and aim' }).click();
    await page.locator('input[formcontrolname="minutes"]').fill('20');
    await page.locator('input[formcontrolname="kickOff"]').fill('10:30');
    accessibility.push(...(await captureScreen(page, 'wizard-time')));

    await page.getByRole('button', { name: 'Next: the plan' }).click();
    const created = page.waitForResponse(
      (r) => r.url().endsWith('/api/plans') && r.request().method() === 'POST',
    );
    await page.getByTestId('make-plan').click();
    const response = await created;
    expect(response.status()).toBe(201);
    await page.waitForURL(/\/plans\/[0-9a-f-]{36}$/);
    await planDrawn(page);
    saved = await storedPlan(page, new URL(page.url()).pathname.split('/').pop()!);
    expect(saved.request.players).toHaveLength(13);
    expect(saved.request.equipment).toMatchObject({ cones: 12, goals: 2 });
  });

  it('shows every present player exactly once in each phase, with the cautions on top', async () => {
    const present = saved.request.players.map((p) => p.id).sort();
    const phases = page.getByTestId('phase');
    expect(await phases.count()).toBe(saved.plan.phases.length);
    for (let i = 0; i < saved.plan.phases.length; i++) {
      const ids = await phases
        .nth(i)
        .locator('[data-player]')
        .evaluateAll((els) => els.map((e) => e.getAttribute('data-player')));
      // A drinks break is a phase of its own with no stations, so nobody is listed in it.
      expect(ids.sort()).toEqual(saved.plan.phases[i]!.activityKind === 'break' ? [] : present);
    }
    // Each diagram draws the group where the engine starts it: one circle per player (and a joining coach).
    const drawn = await page
      .locator('cw-station-card cw-station-diagram svg[role="img"]')
      .evaluateAll((svgs) => svgs.map((svg) => svg.querySelectorAll('g.cw-dot').length));
    expect(drawn).toEqual(
      saved.plan.phases.flatMap((p) => p.stations.map((s) => s.playerIds.length + s.coachJoins)),
    );
    // The absent player is in no phase; only the register lists the whole squad.
    expect(await page.getByTestId('phase').getByText(ABSENT).count()).toBe(0);
    // The register panel is drawn after the phases, then reads the roster; its rows when opened.
    await page.locator('cw-register-panel mat-expansion-panel-header').click();
    await expect
      .poll(() => page.locator('cw-register-panel').getByText(ABSENT).count(), { timeout: 15_000 })
      .toBe(1);
    await expect
      .poll(() => page.getByTestId('cautions').textContent())
      .toContain(saved.plan.cautions[0]!.message);
    // Kick-off 10:30 after 20 minutes: the timeline starts at 10:10.
    expect(await page.locator('cw-phase-timeline').textContent()).toContain('10:10');
    accessibility.push(...(await captureScreen(page, 'plan')));
  });

  it('drags a player to another station; the move is re-checked, announced and saved', async () => {
    await page.setViewportSize(DESKTOP);
    const phaseIndex = saved.plan.phases.findIndex((p) => p.stations.length > 1);
    expect(phaseIndex).toBeGreaterThanOrEqual(0);
    const [from, to] = saved.plan.phases[phaseIndex]!.stations;
    const playerId = from!.playerIds[0]!;
    const phase = page.getByTestId('phase').nth(phaseIndex);
    const chip = phase.locator(`[data-player="${playerId}"]`);
    const target = phase.locator(`[data-station="${to!.id}"]`);
    await chip.scrollIntoViewIfNeeded();
    const start = (await chip.boundingBox())!;
    const saveResponse = page.waitForResponse(
      (r) => r.url().endsWith(`/api/plans/${saved.id}`) && r.request().method() === 'PATCH',
    );
    await page.mouse.move(start.x + 30, start.y + start.height / 2);
    await page.mouse.down();
    await page.mouse.move(start.x + 40, start.y + start.height / 2 + 10, { steps: 5 });
    await target.scrollIntoViewIfNeeded();
    const end = (await target.boundingBox())!;
    await page.mouse.move(end.x + end.width / 2, end.y + end.height / 2, { steps: 20 });
    // Let go once the drop preview shows in the target, as a coach would: on a busy machine the
    // drag can lag the pointer, and letting go earlier drops on a station passed on the way.
    await expect.poll(() => target.locator('.cdk-drag-placeholder').count(), { timeout: 10_000 }).toBe(1);
    await page.mouse.up();
    const patched = await saveResponse;
    expect(patched.status()).toBe(200);
    const stored = await storedPlan(page, saved.id);
    const holder = stored.plan.phases[phaseIndex]!.stations.find((s) => s.playerIds.includes(playerId));
    expect(holder?.id).toBe(to!.id);
    expect(patched.request().postDataJSON()).toEqual({
      edit: { type: 'move-player', playerId, toStationId: to!.id, phaseIndex },
    });
    await expect.poll(() => page.getByTestId('plan-announcement').textContent()).toContain('Re-checked');
    await expect.poll(() => target.locator(`[data-player="${playerId}"]`).count()).toBe(1);

    // Saved: a fresh load shows the player where they were dragged.
    await page.reload();
    await planDrawn(page);
    const reloaded = page.getByTestId('phase').nth(phaseIndex).locator(`[data-station="${to!.id}"]`);
    expect(await reloaded.locator(`[data-player="${playerId}"]`).count()).toBe(1);
  });

  it('downloads the printed card as a PDF whose text names the team, the players and kick-off', async () => {
    const download = page.waitForEvent('download');
    await page.getByTestId('print').click();
    const file = join(workDir, 'card.pdf');
    await (await download).saveAs(file);
    const text = execFileSync('pdftotext', ['-layout', file, '-'], { encoding: 'utf8' });
    expect(text).toContain(TEAM);
    expect(text).toContain('10:30');
    for (const player of saved.request.players) expect(text).toContain(player.name!);
    expect(text).not.toContain(ABSENT);
  });

  it('shares the card by e-mail; the message with the PDF reaches the inbox', async () => {
    await page.getByTestId('share').click();
    await page.getByRole('heading', { name: 'Share the plan' }).waitFor();
    await page.getByTestId('share-recipients').fill(RECIPIENT);
    accessibility.push(...(await captureScreen(page, 'share-dialog')));
    const shared = page.waitForResponse((r) => r.url().endsWith(`/api/plans/${saved.id}/share`));
    await page.getByTestId('share-send').click();
    expect((await shared).status()).toBe(202);
    await page.getByText('1 e-mail queued for sending').waitFor();
    let mail: CaughtMailSummary | undefined;
    await expect
      .poll(
        async () => {
          const list = (await (await fetch(`${mailUrl}/`)).json()) as CaughtMailSummary[];
          mail = list.find((m) => m.to.includes(RECIPIENT));
          return Boolean(mail);
        },
        { timeout: 20_000, interval: 300 },
      )
      .toBe(true);
    expect(mail!.attachments.some((a) => a.contentType === 'application/pdf')).toBe(true);
  });

  it('shows the team, its players and past plans, where a coach finds insight and reuse', async () => {
    await page.goto(`${baseUrl}/teams`);
    await page.getByRole('link', { name: new RegExp(TEAM) }).waitFor();
    accessibility.push(...(await captureScreen(page, 'teams')));
    await page.getByRole('link', { name: new RegExp(TEAM) }).click();
    await page.getByRole('heading', { name: TEAM }).waitFor();
    await page.getByRole('cell', { name: ABSENT, exact: true }).waitFor();
    expect(await page.getByRole('link', { name: 'Team insight' }).count()).toBeGreaterThan(0);
    accessibility.push(...(await captureScreen(page, 'team')));
    await page.getByRole('link', { name: 'Past plans' }).click();
    await page.getByRole('heading', { name: /Past plans/ }).waitFor();
    await page
      .getByRole('link', { name: /again today/ })
      .first()
      .waitFor();
    accessibility.push(...(await captureScreen(page, 'plan-history')));
  });

  it('has no serious or critical accessibility problem on any screen', () => {
    expect(accessibility).toEqual([]);
  });

  it('signed-out screens: create a club, accept an invitation', async () => {
    const fresh = await browser.newPage(DESKTOP);
    await fresh.goto(`${baseUrl}/status`);
    await fresh.evaluate(() => localStorage.clear());
    await fresh.goto(`${baseUrl}/create-club`);
    await fresh.getByRole('heading', { name: 'Create a club' }).waitFor();
    expect(await captureScreen(fresh, 'create-club')).toEqual([]);
    // An invitation link that was never issued says so in plain words.
    await fresh.goto(`${baseUrl}/join#${'x'.repeat(32)}`);
    await fresh.getByRole('heading', { name: 'Join your club' }).waitFor();
    await fresh.getByText('has been used or has expired').waitFor();
    expect(await captureScreen(fresh, 'accept-invitation')).toEqual([]);
    await fresh.close();
  });

  it('made no request to any host but the app itself', () => {
    expect(browser.outsideRequests).toEqual([]);
  });
});
