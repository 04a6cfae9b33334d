/**
 * `npm run -s bench:lighthouse`: Lighthouse 12.2.3 (mobile: its default config, simulated slow 4G
 * and 4× CPU) driving Debian's Chromium against a throwaway server with the demo club, on the
 * sign-in page (cold, signed out) and on a coach's newest plan (signed in, cache emptied first).
 * Prints the four category scores per page; the last line is JSON
 * {"signIn":{"performance":…,"accessibility":…,"best-practices":…,"seo":…},"plan":{…}}.
 * Goals (issue 12): performance ≥ 95 on sign-in and ≥ 90 on the plan, accessibility 100 and
 * best practices 100 on both. The full reports go to test-results/lighthouse-<page>.json.
 *
 * Simulated throttling scales what this machine did, so one run swings by tens of points when the
 * two cores are busy; each page is run LIGHTHOUSE_RUNS times (3 unless set) and the run with the
 * median performance score is the one reported, as Lighthouse's own guidance on variability says.
 * ONLY_SIGN_IN=1 runs the sign-in page alone. Every plan run starts with an empty cache and no
 * service worker: a cold visit, like the sign-in page's (storage is kept only for the session).
 *
 * The plan page is measured twice: from the app's own server (plain HTTP/1.1 on loopback, where
 * the browser opens at most six connections and each file waits its turn) and, as `planHttps`,
 * through nginx serving HTTPS and HTTP/2 as a deployment does (tests/support/load-balancer.ts, a
 * certificate made for the run and accepted by this browser only). DIRECT_ONLY=1 skips the second.
 */
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import lighthouse from 'lighthouse';
import { chromium } from 'playwright-core';
import { PROJECT_ROOT } from '../../server/config';
import { DEMO_PASSWORD } from '../../server/seed';
import type { Page, PlanSummaryDto } from '../../shared/types/api';
import { CHROMIUM_ARGS, CHROMIUM_PATH } from '../../server/build/chromium';
import { DRAWN_COPY_KEY } from '../../src/app/core/startup/drawn-copy';
import { startLoadBalancer, type LoadBalancer } from '../support/load-balancer';
import { startBenchStack, teardown } from './support/stack';

const COACH = 'coach.u12@fernmoor.example.org';
const REPORTS = join(PROJECT_ROOT, 'test-results');
const CATEGORIES = ['performance', 'accessibility', 'best-practices', 'seo'] as const;
const RUNS = Math.max(1, Number(process.env['LIGHTHOUSE_RUNS'] ?? 3) || 3);
type Scores = Record<(typeof CATEGORIES)[number], number>;

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.listen(0, '127.0.0.1', () => {
      const { port } = server.address() as { port: number };
      server.close(() => resolve(port));
    });
    server.on('error', reject);
  });
}

async function newestPlan(baseUrl: string): Promise<{ session: string; planId: string }> {
  const login = await fetch(`${baseUrl}/api/auth/login`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email: COACH, password: DEMO_PASSWORD }),
  });
  const session = (await login.json()) as { token: string };
  const auth = { authorization: `Bearer ${session.token}` };
  const page = (await (
    await fetch(`${baseUrl}/api/plans`, { headers: auth })
  ).json()) as Page<PlanSummaryDto>;
  const list = page.items;
  if (!list[0]) throw new Error('the demo coach has no plan to open');
  return { session: JSON.stringify(session), planId: list[0].id };
}

async function main(): Promise<void> {
  const baseUrl = await startBenchStack();
  const profile = mkdtempSync(join(tmpdir(), 'conewise-lighthouse-'));
  const port = await freePort();
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: CHROMIUM_PATH,
    // The HTTPS proxy's certificate is made for the run: this browser, and only it, accepts it.
    args: [...CHROMIUM_ARGS, '--ignore-certificate-errors', `--remote-debugging-port=${port}`],
    headless: true,
  });
  const results: Record<string, Scores> = {};
  let proxy: LoadBalancer | null = null;
  try {
    const { session, planId } = await newestPlan(baseUrl);
    const once = async (url: string, signedIn: boolean) => {
      if (signedIn) {
        // Signed in without loading the app first (a file of the same origin); then an empty
        // cache and no service worker, as after the sign-in page's own run.
        const origin = new URL(url).origin;
        const page = await context.newPage();
        await page.goto(`${origin}/assets/favicon.svg`);
        await page.evaluate(
          ([value, copy]) => {
            localStorage.setItem('conewise.session', value);
            // The page as the previous run drew it would be on screen at once: not a cold visit.
            localStorage.removeItem(copy);
          },
          [session, DRAWN_COPY_KEY] as const,
        );
        const cdp = await context.newCDPSession(page);
        await cdp.send('Network.clearBrowserCache');
        // The previous run's service worker would serve every file from its cache: a second visit,
        // not the cold one this page is measured on (storage is not reset, to keep the session).
        await cdp.send('Storage.clearDataForOrigin', {
          origin,
          storageTypes: 'service_workers,cache_storage',
        });
        await page.close();
      }
      const result = await lighthouse(url, {
        port,
        output: 'json',
        logLevel: 'error',
        onlyCategories: [...CATEGORIES],
        // Signed in, the run must keep the session Lighthouse would otherwise clear.
        disableStorageReset: signedIn,
      });
      if (!result) throw new Error(`Lighthouse gave no result for ${url}`);
      if (result.lhr.runtimeError) throw new Error(`Lighthouse: ${result.lhr.runtimeError.message}`);
      return result.lhr;
    };
    const run = async (name: string, url: string, signedIn: boolean) => {
      const runs: Awaited<ReturnType<typeof once>>[] = [];
      for (let i = 0; i < RUNS; i++) runs.push(await once(url, signedIn));
      const performance = (lhr: (typeof runs)[number]) => lhr.categories['performance']?.score ?? 0;
      runs.sort((a, b) => performance(a) - performance(b));
      const lhr = runs[Math.floor((runs.length - 1) / 2)]!;
      // The whole report of the median run, for reading what the scores are made of.
      mkdirSync(REPORTS, { recursive: true });
      writeFileSync(join(REPORTS, `lighthouse-${name}.json`), JSON.stringify(lhr, null, 1));
      const scores = Object.fromEntries(
        CATEGORIES.map((c) => [c, Math.round((lhr.categories[c]?.score ?? 0) * 100)]),
      ) as Scores;
      results[name] = scores;
      const metrics = [
        'first-contentful-paint',
        'largest-contentful-paint',
        'total-blocking-time',
        'cumulative-layout-shift',
        'speed-index',
      ]
        .map((id) => `${id.replace(/-/g, ' ')} ${lhr.audits[id]?.displayValue ?? '?'}`)
        .join(', ');
      const spread = runs.map((r) => Math.round(performance(r) * 100)).join(', ');
      console.log(`${name.padEnd(9)} ${CATEGORIES.map((c) => `${c} ${scores[c]}`).join(' · ')}`);
      console.log(`          median of ${RUNS} runs (performance ${spread}): ${metrics}`);
      const failing = Object.values(lhr.audits).filter(
        (a) =>
          a.score !== null &&
          a.score < 1 &&
          a.scoreDisplayMode !== 'informative' &&
          a.scoreDisplayMode !== 'manual',
      );
      for (const audit of failing.slice(0, 12))
        console.log(`          – ${audit.id}: ${audit.title} (${audit.displayValue ?? audit.score})`);
    };
    if (!process.env['ONLY_PLAN']) await run('signIn', `${baseUrl}/sign-in`, false);
    if (!process.env['ONLY_SIGN_IN']) {
      await run('plan', `${baseUrl}/plans/${planId}`, true);
      if (!process.env['DIRECT_ONLY']) {
        proxy = await startLoadBalancer([Number(new URL(baseUrl).port)], { tls: true });
        await run('planHttps', `${proxy.url}/plans/${planId}`, true);
      }
    }
  } finally {
    await proxy?.stop();
    await context.close();
    rmSync(profile, { recursive: true, force: true });
    await teardown();
  }
  console.log(JSON.stringify(results));
}

main().catch((error: unknown) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
