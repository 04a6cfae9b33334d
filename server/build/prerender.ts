/**
 * The sign-in page drawn at build time, so a phone on a weak link shows it as soon as the HTML and
 * the stylesheet have arrived instead of after ~190 kB of script have been fetched and run.
 *
 * The built app is opened in Debian's Chromium (playwright-core) with every request answered from
 * the build folder and the API answering 401 (signed out), and the page it draws is written into a
 * copy of index.html: its title, the component styles Angular wrote into <head> (marked with
 * Angular's `ng-app-id`, so the starting app takes them over instead of adding them twice) and
 * the markup inside <cw-root>. When the app starts it draws the same page in place of the copy
 * (src/app/core/startup/first-paint.ts carries over anything typed meanwhile). Until then the
 * submit buttons are disabled: a form sent without the app would put the password in the address.
 *
 * The page holds nothing about anyone (signed out, no API data), and nothing that runs: scripts
 * stay the build's own files, so the strict CSP is unchanged.
 */
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import type { LocaleBuild } from './locale-builds';
import { CHROMIUM_ARGS, CHROMIUM_PATH } from './chromium';

/** Client routes served drawn in advance, and the file beside index.html that holds each. */
export const PRERENDERED_PAGES: Readonly<Record<string, string>> = { '/sign-in': 'sign-in.html' };

/** What the app drew: the document's title, the styles it added to <head>, the root's markup, and the fonts it used. */
export interface DrawnPage {
  title: string;
  styles: string[];
  root: string;
  /** Paths of the font files the page was drawn with (/en-GB/media/…woff2). */
  fonts: string[];
}

/** Angular's default application id: its styles host takes over `<style ng-app-id="ng">`. */
const APP_ID = 'ng';

function escapeText(text: string): string {
  return text.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;');
}

/**
 * index.html with the drawn page inside <cw-root>, its styles in <head> and its submit buttons off.
 * The page is on screen without its scripts, so on a weak link the stylesheet and the fonts it is
 * drawn with come first: the fonts are preloaded beside the stylesheet (no late swap of the text's
 * font, which would move the page) and the scripts and their preloads are fetched at low priority.
 */
export function pageWithFirstPaint(indexHtml: string, drawn: DrawnPage): string {
  if (!indexHtml.includes('<cw-root></cw-root>')) throw new Error('index.html has no empty <cw-root>');
  if (!indexHtml.includes('</head>')) throw new Error('index.html has no </head>');
  const styles = drawn.styles
    .map((css) => `<style ng-app-id="${APP_ID}">${css.replace(/<\/style/gi, '<\\/style')}</style>`)
    .join('');
  const root = drawn.root.replace(/<button([^>]*\btype="submit"[^>]*)>/g, (whole, attributes: string) =>
    /\sdisabled\b/.test(attributes) ? whole : `<button${attributes} disabled="">`,
  );
  const fonts = drawn.fonts
    .map((href) => `<link rel="preload" href="${href}" as="font" type="font/woff2" crossorigin>`)
    .join('');
  return indexHtml
    .replace(/<title>[^<]*<\/title>/, `<title>${escapeText(drawn.title)}</title>`)
    .replace(/<link rel="stylesheet"/, (link) => `${fonts}${link}`)
    .replace('</head>', `${styles}</head>`)
    .replace(/<link rel="modulepreload" /g, '<link rel="modulepreload" fetchpriority="low" ')
    .replace(/<script src="([^"]+)" type="module">/g, '<script src="$1" type="module" fetchpriority="low">')
    .replace('<cw-root></cw-root>', `<cw-root data-prerendered="">${root}</cw-root>`);
}

const ORIGIN = 'http://conewise.build';

/** Draws each of PRERENDERED_PAGES in each build and writes it beside the build's index.html. */
export async function prerenderPages(builds: readonly LocaleBuild[]): Promise<string[]> {
  const { chromium } = await import('playwright-core');
  const browser = await chromium.launch({ executablePath: CHROMIUM_PATH, args: CHROMIUM_ARGS });
  const written: string[] = [];
  try {
    for (const build of builds) {
      const index = readFileSync(join(build.dir, 'index.html'), 'utf8');
      for (const [path, file] of Object.entries(PRERENDERED_PAGES)) {
        const context = await browser.newContext({ serviceWorkers: 'block', locale: build.language });
        const page = await context.newPage();
        await page.route('**/*', async (route) => {
          const url = new URL(route.request().url());
          if (url.origin !== ORIGIN) return route.abort();
          if (url.pathname.startsWith('/api/'))
            return route.fulfill({ status: 401, contentType: 'application/problem+json', body: '{}' });
          const local =
            build.prefix && url.pathname.startsWith(`${build.prefix}/`)
              ? url.pathname.slice(build.prefix.length)
              : url.pathname;
          // A client route gets the app shell; a file its own bytes, typed by Playwright from its name.
          if (!/\.[a-z0-9]+$/.test(local))
            return route.fulfill({ status: 200, contentType: 'text/html', body: index });
          const onDisk = join(build.dir, local);
          return existsSync(onDisk)
            ? route.fulfill({ path: onDisk })
            : route.fulfill({ status: 404, body: '' });
        });
        await page.goto(`${ORIGIN}${path}`);
        await page.locator('cw-root button[type="submit"]').first().waitFor();
        // Two frames: whatever the first render scheduled has been drawn too.
        await page.evaluate(
          () => new Promise((done) => requestAnimationFrame(() => requestAnimationFrame(done))),
        );
        const drawn = await page.evaluate(
          (before: number) => {
            const added = Array.from(document.head.querySelectorAll('style')).slice(before);
            return {
              title: document.title,
              styles: added.map((style) => style.textContent ?? ''),
              root: document.querySelector('cw-root')?.innerHTML ?? '',
              fonts: performance
                .getEntriesByType('resource')
                .map((entry) => new URL(entry.name).pathname)
                .filter((path) => path.endsWith('.woff2')),
            };
          },
          (index.match(/<style[\s>]/g) ?? []).length,
        );
        await context.close();
        writeFileSync(join(build.dir, file), pageWithFirstPaint(index, drawn));
        written.push(join(build.prefix || '/', file));
      }
    }
  } finally {
    await browser.close();
  }
  return written;
}
