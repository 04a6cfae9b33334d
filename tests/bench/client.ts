/**
 * `npm run -s bench:client`: a production build of the client (compressed as the server sends
 * it), then in headless Chromium against the served app:
 *   - the sign-in page opened cold: every byte that crossed the wire until the network was quiet
 *     (compressed bodies plus headers; scripts, styles, fonts and icons alike), by type;
 *   - the median of 10 runs from submitting the plan wizard to the plan being on screen.
 * The last line is JSON: {"signInWireKb":…,"signInScriptKb":…,"signInFontKb":…,"planVisibleMedianMs":…}.
 * Targets: sign-in ≤ 200 kB on the wire, plan visible ≤ 500 ms (median), on this machine.
 * `npm run -s bench:phone` times the same pages over a throttled mobile link.
 */
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium } from 'playwright-core';
import { buildClient } from '../../server/client-build';
import { DEMO_PASSWORD } from '../../server/seed';
import { CHROMIUM_ARGS, CHROMIUM_PATH } from '../../server/build/chromium';
import { setup, teardown } from '../support/e2e-global-setup';
import { byType, kilobytes, WireMeter } from './support/wire';

const RUNS = 10;
const COACH = 'coach.u12@fernmoor.example.org';

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = Math.floor(sorted.length / 2);
  return sorted.length % 2 ? sorted[mid]! : (sorted[mid - 1]! + sorted[mid]!) / 2;
}

async function main(): Promise<void> {
  console.log('Building the client for production…');
  if (!buildClient(() => undefined))
    throw new Error('The client build failed: run `npm run build` to see why.');

  // The same throwaway stack as the e2e suite: database with the demo club, server, fake SMTP.
  process.env['SKIP_CLIENT_BUILD'] = '1';
  const provided = new Map<string, string>();
  await setup({ provide: (key: string, value: string) => provided.set(key, value) } as never);
  const baseUrl = provided.get('baseUrl')!;
  const profile = mkdtempSync(join(tmpdir(), 'conewise-bench-'));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: CHROMIUM_PATH,
    args: CHROMIUM_ARGS,
    headless: true,
    viewport: { width: 1440, height: 900 },
  });
  const times: number[] = [];
  let signIn: { total: number; types: [string, number][] } = { total: 0, types: [] };
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

    const cold = await context.newPage();
    const cdp = await context.newCDPSession(cold);
    await cdp.send('Network.enable');
    const meter = new WireMeter(cdp);
    await cold.goto(`${baseUrl}/sign-in`);
    await cold.getByRole('button', { name: 'Sign in' }).waitFor();
    const wire = await meter.takeWhenQuiet();
    signIn = { total: kilobytes(wire), types: byType(wire) };
    await cold.close();
    console.log(
      `Sign-in page on the wire: ${signIn.total} kB (target ≤ 200): ${signIn.types.map(([t, kb]) => `${t} ${kb} kB`).join(', ')}`,
    );

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
  const kbOf = (type: string) => signIn.types.find(([t]) => t === type)?.[1] ?? 0;
  console.log(
    JSON.stringify({
      signInWireKb: signIn.total,
      signInScriptKb: kbOf('Script'),
      signInFontKb: kbOf('Font'),
      planVisibleMedianMs,
    }),
  );
}

main().catch((error: unknown) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
