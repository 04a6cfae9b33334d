/**
 * Headless Chromium for end-to-end tests: Debian's /usr/bin/chromium driven by playwright-core,
 * a fresh profile each time, and a record of every request so a test can prove the app made none
 * to outside hosts.
 */
import { mkdtempSync, mkdirSync, readFileSync, rmSync } from 'node:fs';
import { createRequire } from 'node:module';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium, type BrowserContext, type Page, type Route } from 'playwright-core';
import { CHROMIUM_ARGS, CHROMIUM_PATH } from '../../../server/build/chromium';

export const PHONE = { width: 390, height: 844 };
export const DESKTOP = { width: 1440, height: 900 };

const SCREENSHOT_DIR = new URL('../../../test-results/screenshots/', import.meta.url).pathname;

/** A browser with its own profile, and the URLs it requested outside the app's origin. */
export interface TestBrowser {
  context: BrowserContext;
  /** Requests to anything but the app's origin (data: and blob: URLs are local and not counted). */
  outsideRequests: string[];
  newPage(viewport?: { width: number; height: number }): Promise<Page>;
  close(): Promise<void>;
}

/**
 * Launches Chromium with a fresh user-data-dir for one suite. The browser's locale (dates, clock
 * times, first day of the week) is British unless a suite asks for another; a suite that holds
 * back the app's requests blocks the service worker, which would answer them out of sight.
 */
export async function launchBrowser(
  baseUrl: string,
  locale = 'en-GB',
  serviceWorkers: 'allow' | 'block' = 'allow',
): Promise<TestBrowser> {
  const profile = mkdtempSync(join(tmpdir(), 'conewise-chromium-'));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: CHROMIUM_PATH,
    args: CHROMIUM_ARGS,
    headless: true,
    viewport: DESKTOP,
    acceptDownloads: true,
    locale,
    serviceWorkers,
  });
  const origin = new URL(baseUrl).origin;
  const outsideRequests: string[] = [];
  context.on('request', (request) => {
    const url = request.url();
    if (/^(data|blob|about|chrome-extension):/.test(url)) return;
    if (new URL(url).origin !== origin) outsideRequests.push(url);
  });
  return {
    context,
    outsideRequests,
    async newPage(viewport = DESKTOP) {
      const page = await context.newPage();
      await page.setViewportSize(viewport);
      return page;
    },
    async close() {
      await context.close();
      rmSync(profile, { recursive: true, force: true });
    },
  };
}

/** Saves a full-page screenshot to test-results/screenshots/<name>-<width>.png and returns its path. */
export async function screenshot(page: Page, name: string): Promise<string> {
  mkdirSync(SCREENSHOT_DIR, { recursive: true });
  const width = page.viewportSize()?.width ?? 0;
  const path = join(SCREENSHOT_DIR, `${name}-${width}.png`);
  // Wait for the web fonts (Roboto Condensed) so the picture shows the text as a phone draws it.
  await page.evaluate(() => document.fonts.ready.then(() => undefined));
  await page.screenshot({ path, fullPage: true });
  return path;
}

interface AxeViolation {
  id: string;
  impact: string | null;
  help: string;
  nodes: { target: string[] }[];
}

const axeSource = readFileSync(createRequire(import.meta.url).resolve('axe-core/axe.min.js'), 'utf8');

/**
 * Waits until nothing on the page is mid-animation (a dialog opening, a field's message fading
 * in); endless ones (a spinner) do not count.
 */
export async function animationsSettled(page: Page): Promise<void> {
  await page.waitForFunction(
    () =>
      document
        .getAnimations()
        .every((a) => a.playState !== 'running' || a.effect?.getTiming().iterations === Infinity),
    null,
    { timeout: 10_000 },
  );
}

/**
 * Waits until the screen is still after a change of size or a dialog opening: nothing mid-animation
 * and two frames drawn since, so a photograph shows the settled layout (instead of a fixed pause).
 */
export async function screenSettled(page: Page): Promise<void> {
  await animationsSettled(page);
  await page.evaluate(
    () => new Promise<void>((resolve) => requestAnimationFrame(() => requestAnimationFrame(() => resolve()))),
  );
}

/** Runs axe-core in the page and returns the serious and critical violations, described for a failure message. */
export async function seriousAccessibilityViolations(page: Page): Promise<string[]> {
  // Colours are measured once nothing is mid-transition (a message fading in reads as low contrast).
  await animationsSettled(page);
  // Evaluated through the DevTools protocol, so the app's Content-Security-Policy does not block it.
  await page.evaluate(axeSource);
  const violations = await page.evaluate(async () => {
    const axe = (
      globalThis as unknown as {
        axe: { run: (context: Document) => Promise<{ violations: AxeViolation[] }> };
      }
    ).axe;
    const result = await axe.run(document);
    return result.violations;
  });
  return violations
    .filter((v) => v.impact === 'serious' || v.impact === 'critical')
    .map((v) => `${v.impact} ${v.id}: ${v.help} — ${v.nodes.map((n) => n.target.join(' ')).join(', ')}`);
}

/**
 * Waits for a plan page to be wholly drawn: its first phase shows with the page, the later phases
 * and the panels follow one quiet moment at a time.
 */
export async function planDrawn(page: Page): Promise<void> {
  await page.getByTestId('phase').first().waitFor();
  await page.locator('.cw-stations-waiting, .cw-panels-waiting').first().waitFor({ state: 'detached' });
}

/**
 * Holds back the page's first request matching `url` (an app script, an API read) until `release`
 * is called: what a slow link does, on demand. `asked` resolves once the page has made it.
 */
export async function holdBack(
  page: Page,
  url: RegExp,
): Promise<{ asked: Promise<void>; release: () => Promise<void> }> {
  let held: Route | null = null;
  let arrived!: () => void;
  const asked = new Promise<void>((resolve) => (arrived = resolve));
  await page.route(url, (route) => {
    held = route;
    arrived();
  });
  return {
    asked,
    release: async () => {
      await asked;
      await held!.continue();
    },
  };
}
