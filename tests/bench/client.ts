/**
 * `npm run -s bench:client`: a production build of the client, then the initial JavaScript a
 * browser must fetch before the first screen (gzip), then in headless Chromium against the served
 * app the median of 10 runs from submitting the plan wizard to the plan being on screen.
 * The last line is JSON: {"initialKbGzip":…,"planVisibleMedianMs":…}.
 * Targets: initial ≤ 300 kB gzip, plan visible ≤ 500 ms (median), on this machine.
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { gzipSync } from 'node:zlib';
import { chromium } from 'playwright-core';
import { CLIENT_DIST, PROJECT_ROOT } from '../../server/config';
import { DEMO_PASSWORD } from '../../server/seed';
import { CHROMIUM_ARGS } from '../e2e/support/browser';
import { setup, teardown } from '../support/e2e-global-setup';

const RUNS = 10;
const COACH = 'coach.u12@fernmoor.example.org';

/**
 * The JavaScript loaded before the first screen: the scripts index.html loads or preloads, and
 * everything they import statically (index.html preloads only some of them). Lazy chunks, reached
 * only through import(), are left out.
 */
function initialKbGzip(): { kb: number; files: string[] } {
  const html = readFileSync(join(CLIENT_DIST, 'index.html'), 'utf8');
  const pending: string[] = [];
  for (const match of html.matchAll(/<script[^>]+src="([^"]+\.js)"/g)) pending.push(match[1]!);
  for (const match of html.matchAll(/<link[^>]+rel="modulepreload"[^>]+href="([^"]+\.js)"/g))
    pending.push(match[1]!);
  const files = new Set<string>();
  let bytes = 0;
  while (pending.length) {
    const file = pending.pop()!;
    if (files.has(file)) continue;
    files.add(file);
    const code = readFileSync(join(CLIENT_DIST, file));
    bytes += gzipSync(code, { level: 9 }).length;
    for (const match of code.toString('utf8').matchAll(/(?:from|import)\s*["']\.\/([\w.-]+\.js)["']/g)) {
      pending.push(match[1]!);
    }
  }
  return { kb: Math.round((bytes / 1024) * 10) / 10, files: [...files] };
}

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = Math.floor(sorted.length / 2);
  return sorted.length % 2 ? sorted[mid]! : (sorted[mid - 1]! + sorted[mid]!) / 2;
}

async function main(): Promise<void> {
  console.log('Building the client for production…');
  execFileSync(join(PROJECT_ROOT, 'node_modules', '.bin', 'ng'), ['build', '--configuration', 'production'], {
    cwd: PROJECT_ROOT,
    stdio: ['ignore', 'ignore', 'inherit'],
  });
  const initial = initialKbGzip();
  console.log(`Initial JavaScript: ${initial.files.length} files, ${initial.kb} kB gzip (target ≤ 300)`);

  // The same throwaway stack as the e2e suite: database with the demo club, server, fake SMTP.
  process.env['SKIP_CLIENT_BUILD'] = '1';
  const provided = new Map<string, string>();
  await setup({ provide: (key: string, value: string) => provided.set(key, value) } as never);
  const baseUrl = provided.get('baseUrl')!;
  const profile = mkdtempSync(join(tmpdir(), 'conewise-bench-'));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: '/usr/bin/chromium',
    args: CHROMIUM_ARGS,
    headless: true,
    viewport: { width: 1440, height: 900 },
  });
  const times: number[] = [];
  try {
    const login = await fetch(`${baseUrl}/api/auth/login`, {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify({ email: COACH, password: DEMO_PASSWORD }),
    });
    const session = (await login.json()) as { token: string };
    const teams = (await (
      await fetch(`${baseUrl}/api/teams`, { headers: { authorization: `Bearer ${session.token}` } })
    ).json()) as { id: string; name: string }[];
    const team = teams.find((t) => t.name === 'U12 Otters') ?? teams[0]!;

    const page = await context.newPage();
    await page.goto(`${baseUrl}/status`);
    await page.evaluate((value) => localStorage.setItem('conewise.session', value), JSON.stringify(session));

    for (let run = 0; run <= RUNS; run++) {
      await page.goto(`${baseUrl}/plan/new?teamId=${team.id}`);
      await page
        .getByTestId('present-count')
        .filter({ hasText: /[1-9]\d* here/ })
        .waitFor();
      await page.getByRole('button', { name: 'Next: kit and space' }).click();
      await page.getByRole('button', { name: 'Next: time and aim' }).click();
      await page.getByRole('button', { name: 'Next: the plan' }).click();
      // Timed inside the page: from the click on "Make the plan" to the first phase on screen.
      const measuring = page.evaluate(
        () =>
          new Promise<number>((resolve) => {
            const button = document.querySelector('[data-testid="make-plan"]')!;
            let start = 0;
            button.addEventListener('click', () => (start = performance.now()), {
              capture: true,
              once: true,
            });
            const observer = new MutationObserver(() => {
              if (start && document.querySelector('[data-testid="phase"]')) {
                observer.disconnect();
                requestAnimationFrame(() => resolve(performance.now() - start));
              }
            });
            observer.observe(document.body, { childList: true, subtree: true });
          }),
      );
      await page.getByTestId('make-plan').click();
      const ms = await measuring;
      // The first run also loads the plan page's code; it warms up like a coach's first visit and is not counted.
      if (run > 0) times.push(Math.round(ms * 10) / 10);
      console.log(`run ${run}${run === 0 ? ' (warm-up)' : ''}: ${ms.toFixed(1)} ms`);
    }
  } finally {
    await context.close();
    rmSync(profile, { recursive: true, force: true });
    await teardown();
  }
  const planVisibleMedianMs = Math.round(median(times) * 10) / 10;
  console.log(
    `Plan visible after submit: median ${planVisibleMedianMs} ms of ${times.length} runs (target ≤ 500)`,
  );
  console.log(JSON.stringify({ initialKbGzip: initial.kb, planVisibleMedianMs }));
}

main().catch((error: unknown) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
