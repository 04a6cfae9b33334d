/**
 * `npm run -s bench:phone`: a coach's cold first visit on a phone over a weak mobile link.
 *
 * The profile is Lighthouse's mobile throttle as DevTools applies it (150 ms added to every
 * request, 1.6 Mbit/s down, 750 kbit/s up, CPU slowed 4×), a 390×844 touch screen, an empty
 * cache and the service worker blocked so every byte counts. Against a throwaway server with the
 * demo club (the e2e stack), a coach:
 *   1. opens /sign-in              → timed until the Sign in button is on screen (drawn at build
 *                                     time), and until it can be pressed (the app has started);
 *   2. signs in                    → timed from the tap until "This week" lists the newest plan;
 *   3. taps the newest plan        → timed from the tap until its first phase is on screen.
 * Bytes are what crossed the wire (compressed bodies plus headers, fonts and icons included), from
 * the step's start until the network has been quiet for a second.
 *
 * Then a second visit with the service worker allowed: once it has installed, the same plan is
 * opened in a new tab online and again offline, each timed until its first phase is on screen
 * (the copy of the page this device last drew, core/startup/drawn-copy.ts, or the app's own page)
 * and until the app has drawn it itself (the copy gone, its buttons live).
 *
 * Goals (issue 12): sign-in ≤ 2.0 s, home ≤ 2.5 s, plan ≤ 2.5 s, the three ≤ 400 kB; the second
 * visit ≤ 1 s online and offline. The last line is JSON:
 * {"signInVisibleMs":…,"signInReadyMs":…,"signInKb":…,"homeVisibleMs":…,"homeKb":…,"planVisibleMs":…,"planKb":…,
 *  "totalKb":…,"repeatOnlineMs":…,"repeatOfflineMs":…,"repeatOnlineAppMs":…,"repeatOfflineAppMs":…}
 */
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium, type BrowserContext, type CDPSession, type Page } from 'playwright-core';
import { DEMO_PASSWORD } from '../../server/seed';
import { CHROMIUM_ARGS, CHROMIUM_PATH } from '../../server/build/chromium';
import { DRAWN_COPY_TAG } from '../../src/app/core/startup/drawn-copy';
import { startBenchStack, teardown } from './support/stack';
import { byType, kilobytes, WireMeter, type WireRecord } from './support/wire';

const COACH = 'coach.u12@fernmoor.example.org';

/** Lighthouse 12's mobile profile (its `mobileSlow4G` throttling and 4× CPU slowdown). */
const PROFILE = {
  latencyMs: 150,
  downloadBytesPerSecond: (1.6 * 1024 * 1024) / 8,
  uploadBytesPerSecond: (750 * 1024) / 8,
  cpuSlowdown: 4,
} as const;

const PHONE_CONTEXT = {
  viewport: { width: 390, height: 844 },
  deviceScaleFactor: 3,
  isMobile: true,
  hasTouch: true,
} as const;

async function throttle(page: Page): Promise<CDPSession> {
  const cdp = await page.context().newCDPSession(page);
  await cdp.send('Network.enable');
  await cdp.send('Network.setCacheDisabled', { cacheDisabled: false });
  await cdp.send('Network.emulateNetworkConditions', {
    offline: false,
    latency: PROFILE.latencyMs,
    downloadThroughput: PROFILE.downloadBytesPerSecond,
    uploadThroughput: PROFILE.uploadBytesPerSecond,
  });
  await cdp.send('Emulation.setCPUThrottlingRate', { rate: PROFILE.cpuSlowdown });
  return cdp;
}

/** Resolves with performance.now() at the first animation frame where `selector` is laid out. */
function visibleAt(page: Page, selector: string): Promise<number> {
  return page
    .waitForFunction(
      (css) => {
        const element = document.querySelector(css);
        if (!element) return false;
        const box = element.getBoundingClientRect();
        return box.width > 0 && box.height > 0 ? performance.now() : false;
      },
      selector,
      { polling: 'raf', timeout: 60_000 },
    )
    .then((handle) => handle.jsonValue() as Promise<number>);
}

/** Milliseconds from a tap (performance.now() in the page, just before it) to `selector` on screen. */
async function tapUntilVisible(page: Page, tap: () => Promise<void>, selector: string): Promise<number> {
  const start = await page.evaluate(() => performance.now());
  await tap();
  const end = await visibleAt(page, selector);
  return end - start;
}

async function newestPlanForCoach(baseUrl: string): Promise<{ session: string; planId: string }> {
  const login = await fetch(`${baseUrl}/api/auth/login`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email: COACH, password: DEMO_PASSWORD }),
  });
  const session = (await login.json()) as { token: string };
  const token = session.token;
  const auth = { authorization: `Bearer ${token}`, 'content-type': 'application/json' };
  const teams = (await (await fetch(`${baseUrl}/api/teams`, { headers: auth })).json()) as {
    id: string;
    name: string;
    ageGroup: string;
    level: string;
  }[];
  const team = teams.find((t) => t.name === 'U12 Otters') ?? teams[0]!;
  const roster = (await (
    await fetch(`${baseUrl}/api/teams/${team.id}/players`, { headers: auth })
  ).json()) as {
    id: string;
  }[];
  // Saturday's warm-up, planned today: the newest plan of the week on the coach's home screen.
  const today = new Date().toISOString().slice(0, 10);
  const created = await fetch(`${baseUrl}/api/plans`, {
    method: 'POST',
    headers: auth,
    body: JSON.stringify({
      teamId: team.id,
      date: today,
      kickOff: '10:30',
      request: {
        ageGroup: team.ageGroup,
        level: team.level,
        players: roster.slice(0, 14).map((p) => ({ id: p.id })),
        coaches: 2,
        equipment: { balls: 14, cones: 40, bibs: 14, goals: 4 },
        space: { width: 40, length: 30 },
        minutes: 25,
        kind: 'match-warm-up',
      },
    }),
  });
  if (created.status !== 201)
    throw new Error(`creating the plan answered ${created.status}: ${await created.text()}`);
  const plan = (await created.json()) as { id: string };
  return { session: JSON.stringify(session), planId: plan.id };
}

interface ColdVisit {
  signInVisibleMs: number;
  signInReadyMs: number;
  signInKb: number;
  homeVisibleMs: number;
  homeKb: number;
  planVisibleMs: number;
  planKb: number;
}

async function coldVisit(
  context: BrowserContext,
  baseUrl: string,
  planId: string,
): Promise<{ figures: ColdVisit; records: Record<'signIn' | 'home' | 'plan', WireRecord[]> }> {
  const page = await context.newPage();
  const cdp = await throttle(page);
  const meter = new WireMeter(cdp);

  await page.goto(`${baseUrl}/sign-in`, { waitUntil: 'commit' });
  const signInVisibleMs = await visibleAt(page, 'button[type="submit"]');
  const signInReadyMs = await visibleAt(page, 'button[type="submit"]:enabled');
  const signIn = await meter.takeWhenQuiet();

  await page.getByLabel('E-mail').fill(COACH);
  await page.getByLabel('Password').fill(DEMO_PASSWORD);
  const homeVisibleMs = await tapUntilVisible(
    page,
    () => page.getByRole('button', { name: 'Sign in' }).click(),
    `a[href="/plans/${planId}"]`,
  );
  const home = await meter.takeWhenQuiet();

  const planVisibleMs = await tapUntilVisible(
    page,
    () => page.locator(`a[href="/plans/${planId}"]`).first().click(),
    '[data-testid="phase"]',
  );
  const plan = await meter.takeWhenQuiet();
  await page.close();
  return {
    figures: {
      signInVisibleMs: Math.round(signInVisibleMs),
      signInReadyMs: Math.round(signInReadyMs),
      signInKb: kilobytes(signIn),
      homeVisibleMs: Math.round(homeVisibleMs),
      homeKb: kilobytes(home),
      planVisibleMs: Math.round(planVisibleMs),
      planKb: kilobytes(plan),
    },
    records: { signIn, home, plan },
  };
}

/** The plan page in a new tab once the service worker has installed, online then offline. */
async function repeatVisit(
  context: BrowserContext,
  baseUrl: string,
  session: string,
  planId: string,
): Promise<
  Record<'repeatOnlineMs' | 'repeatOfflineMs' | 'repeatOnlineAppMs' | 'repeatOfflineAppMs', number>
> {
  const first = await context.newPage();
  await first.goto(`${baseUrl}/sign-in`);
  await first.evaluate((value) => localStorage.setItem('conewise.session', value), session);
  await first.goto(`${baseUrl}/plans/${planId}`);
  await visibleAt(first, '[data-testid="phase"]');
  // Installed: the worker is active (the app registers it once stable, 30 s at most), controls
  // the page after a reload (Chromium does not always hand an open page to a worker that claims
  // it) and has fetched every file it prefetches.
  await first.evaluate(async () => {
    await navigator.serviceWorker.ready;
  });
  await first.reload();
  await visibleAt(first, '[data-testid="phase"]');
  await first.waitForFunction(() => navigator.serviceWorker.controller !== null, undefined, {
    timeout: 60_000,
  });
  await first.waitForFunction(
    async () => {
      const state = await (await fetch('/ngsw/state')).text();
      return /Driver state: NORMAL/.test(state) && !/Last update check: never/.test(state);
    },
    undefined,
    { timeout: 60_000, polling: 500 },
  );
  await first.close();

  const timeOne = async (offline: boolean) => {
    const page = await context.newPage();
    await throttle(page);
    await context.setOffline(offline);
    await page.goto(`${baseUrl}/plans/${planId}`, { waitUntil: 'commit' });
    const shown = await visibleAt(page, `${DRAWN_COPY_TAG}, [data-testid="phase"]`);
    const drawn = await visibleAt(page, `body:not(:has(${DRAWN_COPY_TAG})) [data-testid="phase"]`);
    await page.close();
    await context.setOffline(false);
    return [Math.round(shown), Math.round(drawn)] as const;
  };
  const [repeatOnlineMs, repeatOnlineAppMs] = await timeOne(false);
  const [repeatOfflineMs, repeatOfflineAppMs] = await timeOne(true);
  return { repeatOnlineMs, repeatOfflineMs, repeatOnlineAppMs, repeatOfflineAppMs };
}

async function main(): Promise<void> {
  const baseUrl = await startBenchStack();
  const profiles: string[] = [];
  const launch = async (serviceWorkers: 'allow' | 'block') => {
    const profile = mkdtempSync(join(tmpdir(), 'conewise-phone-'));
    profiles.push(profile);
    return chromium.launchPersistentContext(profile, {
      executablePath: CHROMIUM_PATH,
      args: CHROMIUM_ARGS,
      headless: true,
      serviceWorkers,
      ...PHONE_CONTEXT,
    });
  };
  try {
    const { session, planId } = await newestPlanForCoach(baseUrl);

    const cold = await launch('block');
    const { figures: visit, records } = await coldVisit(cold, baseUrl, planId);
    await cold.close();

    const warm = await launch('allow');
    const repeat = await repeatVisit(warm, baseUrl, session, planId);
    await warm.close();

    const totalKb = Math.round((visit.signInKb + visit.homeKb + visit.planKb) * 10) / 10;
    const row = (step: string, ms: number, goalMs: number, kb?: number) =>
      `${step.padEnd(34)} ${String(ms).padStart(6)} ms ${ms <= goalMs ? '  ' : '✗ '}(≤ ${goalMs})  ${
        kb === undefined ? '' : `${kb.toFixed(1).padStart(7)} kB`
      }`;
    console.log(
      `Profile: ${PROFILE.latencyMs} ms per request, 1.6 Mbit/s down, 750 kbit/s up, CPU ×${PROFILE.cpuSlowdown}, 390×844`,
    );
    console.log(row('Sign-in visible (cold)', visit.signInVisibleMs, 2000, visit.signInKb));
    console.log(`${'Sign-in ready (app started)'.padEnd(34)} ${String(visit.signInReadyMs).padStart(6)} ms`);
    console.log(row('Home after signing in', visit.homeVisibleMs, 2500, visit.homeKb));
    console.log(row('Newest plan from home', visit.planVisibleMs, 2500, visit.planKb));
    console.log(
      `${'Moved for the three'.padEnd(34)} ${totalKb.toFixed(1).padStart(16)} kB ${totalKb <= 400 ? '' : '✗ '}(≤ 400)`,
    );
    for (const [step, rs] of Object.entries(records)) {
      console.log(
        `  ${step}: ${byType(rs)
          .map(([type, kb]) => `${type} ${kb} kB`)
          .join(', ')}`,
      );
    }
    console.log(row('Plan again, worker installed', repeat.repeatOnlineMs, 1000));
    console.log(row('Plan again, offline', repeat.repeatOfflineMs, 1000));
    const appRow = (step: string, ms: number) => `${step.padEnd(34)} ${String(ms).padStart(6)} ms`;
    console.log(appRow('  drawn by the app, worker installed', repeat.repeatOnlineAppMs));
    console.log(appRow('  drawn by the app, offline', repeat.repeatOfflineAppMs));
    console.log(JSON.stringify({ ...visit, totalKb, ...repeat }));
  } finally {
    await teardown();
    for (const profile of profiles) rmSync(profile, { recursive: true, force: true });
  }
}

main().catch((error: unknown) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
