/**
 * The coach's flow once in Spanish: a browser set to Spanish gets the Spanish build at the same
 * addresses, signs in, plans a session and reads the plan in Spanish; the coach then chooses
 * English and gets it, and back. Expected words are read from the Spanish translation file, so
 * the test follows the translators, not a copy of their words.
 */
import { readFileSync } from 'node:fs';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import defaultRules from '../../rules/default-rule-set.json';
import startingRulesInSpanish from '../../rules/words/es.json';
import { DEMO_PASSWORD } from '../../server/seed';
import { DESKTOP, launchBrowser, PHONE, planDrawn, screenshot, type TestBrowser } from './support/browser';

const TRANSLATIONS = readFileSync(new URL('../../src/locale/messages.es.xlf', import.meta.url), 'utf8');

/** The Spanish for an English message without placeholders, as the translation file says it. */
function spanish(english: string): string {
  const unescape = (s: string) =>
    s
      .replace(/&lt;/g, '<')
      .replace(/&gt;/g, '>')
      .replace(/&quot;/g, '"')
      .replace(/&amp;/g, '&');
  for (const [, body] of TRANSLATIONS.matchAll(/<trans-unit [^>]*>([\s\S]*?)<\/trans-unit>/g)) {
    const source = /<source>([\s\S]*?)<\/source>/.exec(body!)?.[1];
    const target = /<target[^>]*>([\s\S]*?)<\/target>/.exec(body!)?.[1];
    if (source !== undefined && unescape(source).trim() === english && target) return unescape(target).trim();
  }
  throw new Error(`no Spanish for "${english}" in messages.es.xlf`);
}

/** English words that must not be left on a Spanish screen (each is translated in the file). */
const ENGLISH = ['This week', 'Plan a session', 'Sign out', 'Coaching points', 'Make it easier'];

/** The starting rules' activity titles and coaching points, in English and in Spanish. */
const ACTIVITIES = defaultRules.parameters.activities;
const RULE_WORDS: Record<string, string> = startingRulesInSpanish;
const englishActivityWords = ACTIVITIES.flatMap((a) => [a.title, ...a.coachingPoints]);
const spanishTitles = ACTIVITIES.map((a) => RULE_WORDS[a.title]!);

describe('a coach in Spanish', () => {
  const baseUrl = inject('baseUrl');
  let browser: TestBrowser;
  let page: Page;

  beforeAll(async () => {
    browser = await launchBrowser(baseUrl, 'es-ES');
    page = await browser.newPage(PHONE);
    page.on('pageerror', (error) => console.log(`[page error] ${error.message}`));
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('gets the Spanish build at the same address and signs in', async () => {
    await page.goto(`${baseUrl}/sign-in`);
    expect(await page.locator('html').getAttribute('lang')).toBe('es');
    await page.getByRole('heading', { name: spanish('Sign in') }).waitFor();
    await page.locator('input[type="email"]').fill('coach.u12@fernmoor.example.org');
    await page.locator('input[type="password"]').fill(DEMO_PASSWORD);
    await page.locator('button[type="submit"]').click();
    await page.getByRole('heading', { name: spanish('This week') }).waitFor();
    await screenshot(page, 'spanish-home');
    // Scripts come from the Spanish build's own folder.
    const scripts = await page
      .locator('script[src]')
      .evaluateAll((els) => els.map((e) => e.getAttribute('src')));
    expect(scripts.every((src) => src!.startsWith('/es/'))).toBe(true);
  });

  it('plans a session through the wizard and reads the plan in Spanish', async () => {
    await page.getByTestId('plan-warm-up').click();
    await page.getByRole('heading', { name: spanish('Plan a session') }).waitFor();
    await page.getByTestId('team-select').click();
    await page.getByRole('option', { name: /U12 Otters/ }).click();
    await expect
      .poll(() => page.getByTestId('present-count').textContent(), { timeout: 15_000 })
      .toMatch(/14/);
    for (const step of ['Next: kit and space', 'Next: time and aim', 'Next: the plan']) {
      await page.getByRole('button', { name: spanish(step) }).click();
    }
    await page.getByTestId('make-plan').click();
    await page.waitForURL(/\/plans\/[0-9a-f-]{36}$/, { timeout: 30_000 });
    await planDrawn(page);
    await page.setViewportSize(DESKTOP);
    await screenshot(page, 'spanish-plan');
    const text = await page.locator('main').innerText();
    expect(text).toContain(spanish('Coaching points'));
    for (const english of ENGLISH) expect(text, english).not.toContain(english);
    // The activities come from the club's starting rules, read in Spanish.
    expect(spanishTitles.filter((title) => text.includes(title)).length).toBeGreaterThan(0);
    expect(englishActivityWords.filter((words) => text.includes(words))).toEqual([]);
  });

  it('switches to English on the account page, and back to Spanish', async () => {
    await page.goto(`${baseUrl}/account`);
    await page.getByTestId('language-en').click();
    await page.waitForFunction(() => document.documentElement.lang === 'en-GB', undefined, {
      timeout: 30_000,
    });
    await page.getByRole('heading', { name: 'Your account' }).waitFor({ timeout: 30_000 });
    await page.getByTestId('language-es').click();
    await page.waitForFunction(() => document.documentElement.lang === 'es', undefined, { timeout: 30_000 });
    await page.getByRole('heading', { name: spanish('Your account') }).waitFor({ timeout: 30_000 });
  });
});
