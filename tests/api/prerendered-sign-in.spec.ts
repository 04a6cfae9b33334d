/**
 * The sign-in page drawn at build time (server/build/prerender.ts): how the drawn page is written
 * into a copy of index.html, and that the server sends that copy for /sign-in only, in the
 * reader's language and with the same security headers as any page. Drawing itself runs Chromium
 * on the real build and is checked end to end (tests/e2e/sign-in-first-paint.spec.ts).
 */
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { pageWithFirstPaint, PRERENDERED_PAGES } from '../../server/build/prerender';
import { startTestApp, type TestApp } from '../support/api-test-app';

/** The shape of the built index.html (after server/build/locale-builds.ts moved it under /en-GB). */
const INDEX = [
  '<!doctype html><html lang="en-GB"><head><title>Conewise</title>',
  '<link rel="stylesheet" href="/en-GB/styles-AB12CD34.css"></head>',
  '<body><cw-root></cw-root>',
  '<link rel="modulepreload" href="/en-GB/chunk-EF56GH78.js">',
  '<script src="/en-GB/main-IJ90KL12.js" type="module"></script></body></html>',
].join('');

const DRAWN = {
  title: 'Sign in · Conewise',
  styles: ['.cw-auth[_ngcontent-ng-c1]{display:grid}', 'h1{margin:0}'],
  root: '<section class="cw-auth"><h1>Sign in</h1><form><input name="email"><button _ngcontent-ng-c1="" type="submit" class="cw-submit">Sign in</button><button type="button">Español</button></form></section>',
  fonts: ['/en-GB/media/roboto-condensed-latin-400-normal-OJ3A7MQ4.woff2'],
};

describe('the sign-in page written in advance', () => {
  const page = pageWithFirstPaint(INDEX, DRAWN);

  it('puts the drawn markup in <cw-root>, marked, and the page title in <title>', () => {
    expect(page).toContain(`<cw-root data-prerendered=""><section class="cw-auth"><h1>Sign in</h1>`);
    expect(page).toContain('<title>Sign in · Conewise</title>');
    expect(page).not.toContain('<title>Conewise</title>');
  });

  it("writes the component styles into <head> for Angular's styles host to take over", () => {
    const head = page.slice(0, page.indexOf('</head>'));
    expect(head).toContain('<style ng-app-id="ng">.cw-auth[_ngcontent-ng-c1]{display:grid}</style>');
    expect(head).toContain('<style ng-app-id="ng">h1{margin:0}</style>');
  });

  it('turns off the submit button until the app runs (a form sent without it would put the password in the address)', () => {
    expect(page).toContain('<button _ngcontent-ng-c1="" type="submit" class="cw-submit" disabled="">');
    expect(page).toContain('<button type="button">Español</button>');
  });

  it('preloads the fonts before the stylesheet and fetches the scripts at low priority', () => {
    expect(page.indexOf('<link rel="preload" href="/en-GB/media/roboto-condensed')).toBeLessThan(
      page.indexOf('<link rel="stylesheet"'),
    );
    expect(page).toContain('as="font" type="font/woff2" crossorigin>');
    expect(page).toContain('<link rel="modulepreload" fetchpriority="low" href="/en-GB/chunk-EF56GH78.js">');
    expect(page).toContain('<script src="/en-GB/main-IJ90KL12.js" type="module" fetchpriority="low">');
  });

  it('keeps the page free of anything that runs: the scripts are the build’s own files', () => {
    const scripts = [...page.matchAll(/<script\b[^>]*>([\s\S]*?)<\/script>/g)];
    expect(scripts.map((m) => m[1])).toEqual(['']);
    expect(page).not.toMatch(/\son[a-z]+=/i);
  });

  it('refuses an index.html it cannot place the page in', () => {
    expect(() => pageWithFirstPaint(INDEX.replace('<cw-root></cw-root>', ''), DRAWN)).toThrow(/cw-root/);
  });
});

describe('serving the sign-in page written in advance', () => {
  const dir = mkdtempSync(join(tmpdir(), 'conewise-prerendered-'));
  let app: TestApp;
  const english = pageWithFirstPaint(INDEX, DRAWN);
  const spanish = pageWithFirstPaint(INDEX.replace(/en-GB/g, 'es'), { ...DRAWN, title: 'Entrar · Conewise' });

  async function get(path: string, headers: Record<string, string> = {}) {
    const response = await fetch(new URL(path, app.http.url), {
      headers: { accept: 'text/html', ...headers },
    });
    return { status: response.status, headers: response.headers, text: await response.text() };
  }

  beforeAll(async () => {
    for (const [folder, html] of [
      ['en-GB', english],
      ['es', spanish],
    ] as const) {
      mkdirSync(join(dir, folder));
      writeFileSync(join(dir, folder, 'index.html'), INDEX.replace(/en-GB/g, folder));
      writeFileSync(join(dir, folder, PRERENDERED_PAGES['/sign-in']!), html);
    }
    app = await startTestApp({ staticDir: dir });
  });
  afterAll(async () => {
    await app?.close();
    rmSync(dir, { recursive: true, force: true });
  });

  it('sends the drawn copy for /sign-in (query and all) and the plain app shell for every other page', async () => {
    expect((await get('/sign-in')).text).toBe(english);
    expect((await get('/sign-in?returnTo=%2Fteams')).text).toBe(english);
    for (const path of ['/', '/teams/42', '/reset-password', '/sign-in/other'])
      expect((await get(path)).text, path).toBe(INDEX);
  });

  it('sends it in the reader’s language', async () => {
    const answer = await get('/sign-in', { 'accept-language': 'es-ES,es;q=0.9' });
    expect(answer.text).toBe(spanish);
    expect(answer.headers.get('content-language')).toBe('es');
  });

  it("sends it with a page's security headers and asks browsers to check for a newer one each time", async () => {
    const answer = await get('/sign-in');
    expect(answer.headers.get('content-security-policy')).toContain("script-src 'self'");
    expect(answer.headers.get('x-frame-options')).toBe('SAMEORIGIN');
    expect(answer.headers.get('cache-control')).toBe('no-cache');
  });

  it('never sends the copy as a plain file without those headers', async () => {
    for (const path of ['/sign-in.html', '/en-GB/sign-in.html', '/es/sign-in.html', '/es/index.html']) {
      const answer = await get(path);
      expect(answer.headers.get('content-security-policy'), path).toContain("default-src 'self'");
      expect(answer.text, path).not.toBe(english);
      expect(answer.text, path).not.toBe(spanish);
    }
  });

  it('sends the plain app shell for /sign-in when the build has no drawn copy', async () => {
    rmSync(join(dir, 'en-GB', PRERENDERED_PAGES['/sign-in']!));
    expect((await get('/sign-in')).text).toBe(INDEX);
  });
});
