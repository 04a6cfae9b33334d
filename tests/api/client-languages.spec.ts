/**
 * One client build per language, served at the same addresses: the reader's choice (a cookie)
 * first, then their browser's languages, then English. Each language's scripts sit under its own
 * folder, because the file names are the same in every language and the contents are not.
 */
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { htmlUnderFolder, localeBuilds, manifestUnderFolder } from '../../server/build/locale-builds';
import { startTestApp, type TestApp } from '../support/api-test-app';

const BUILDS = {
  'en-GB': {
    index: '<html lang="en-GB"><body>Plan a session</body></html>',
    main: 'export const w="Plan a session";',
  },
  es: {
    index: '<html lang="es"><body>Planificar una sesión</body></html>',
    main: 'export const w="Planificar una sesión";',
  },
};

async function get(app: TestApp, path: string, headers: Record<string, string> = {}) {
  const response = await fetch(new URL(path, app.http.url), { headers });
  return { status: response.status, headers: response.headers, text: await response.text() };
}

describe('the client in the reader’s language', () => {
  const dir = mkdtempSync(join(tmpdir(), 'conewise-languages-'));
  let app: TestApp;

  beforeAll(async () => {
    for (const [folder, build] of Object.entries(BUILDS)) {
      mkdirSync(join(dir, folder));
      writeFileSync(join(dir, folder, 'index.html'), build.index);
      writeFileSync(join(dir, folder, 'main-AB12CD34.js'), build.main);
      writeFileSync(join(dir, folder, 'ngsw.json'), JSON.stringify({ language: folder, hashTable: {} }));
    }
    app = await startTestApp({ staticDir: dir });
  });
  afterAll(async () => {
    await app?.close();
    rmSync(dir, { recursive: true, force: true });
  });

  it('finds one build per language folder, English first', () => {
    expect(localeBuilds(dir).map((b) => [b.language, b.prefix])).toEqual([
      ['en', '/en-GB'],
      ['es', '/es'],
    ]);
  });

  it("sends the page in the browser's language, English when none of its languages is built", async () => {
    const cases: [string, string][] = [
      ['es-ES,es;q=0.9,en;q=0.8', 'Planificar una sesión'],
      ['es-MX', 'Planificar una sesión'],
      ['en-US,en;q=0.9', 'Plan a session'],
      ['fr-FR,fr;q=0.9', 'Plan a session'],
    ];
    for (const [accept, words] of cases) {
      const page = await get(app, '/plans/42', { accept: 'text/html', 'accept-language': accept });
      expect(page.text, accept).toContain(words);
      expect(page.headers.get('vary'), accept).toMatch(/Cookie/);
      expect(page.headers.get('vary'), accept).toMatch(/Accept-Language/);
      expect(page.headers.get('cache-control')).toBe('no-cache');
    }
    const signedOut = await get(app, '/sign-in', { accept: 'text/html' });
    expect(signedOut.text).toContain('Plan a session');
  });

  it('lets the chosen language (the cookie) win over the browser’s', async () => {
    const english = await get(app, '/', {
      accept: 'text/html',
      'accept-language': 'es-ES',
      cookie: 'other=1; cw-lang=en',
    });
    expect(english.text).toContain('Plan a session');
    expect(english.headers.get('content-language')).toBe('en');
    const spanish = await get(app, '/', {
      accept: 'text/html',
      'accept-language': 'en-GB',
      cookie: 'cw-lang=es',
    });
    expect(spanish.text).toContain('Planificar una sesión');
    expect(spanish.headers.get('content-language')).toBe('es');
    // A language that is not built is ignored.
    const unknown = await get(app, '/', {
      accept: 'text/html',
      'accept-language': 'es',
      cookie: 'cw-lang=de',
    });
    expect(unknown.text).toContain('Planificar una sesión');
  });

  it("serves each language's scripts from its folder, kept a year, and its own service worker manifest", async () => {
    const es = await get(app, '/es/main-AB12CD34.js');
    expect(es.text).toBe(BUILDS.es.main);
    expect(es.headers.get('cache-control')).toBe('public, max-age=31536000, immutable');
    const en = await get(app, '/en-GB/main-AB12CD34.js');
    expect(en.text).toBe(BUILDS['en-GB'].main);
    const manifest = await get(app, '/ngsw.json', { cookie: 'cw-lang=es' });
    expect(JSON.parse(manifest.text).language).toBe('es');
    expect(manifest.headers.get('vary')).toMatch(/Accept-Language/);
  });
});

describe('each language fetches its files from its folder', () => {
  it('rewrites hashed scripts, styles and hints in index.html, and leaves the rest', () => {
    const html =
      '<base href="/"><link rel="modulepreload" href="chunk-AB12CD34.js"><link rel="stylesheet" href="styles-ZZ99YY88.css">' +
      '<link rel="manifest" href="manifest.webmanifest"><link rel="icon" href="favicon.svg">' +
      '<script src="main-QW12ER34.js" type="module"></script><a href="https://example.org/x-AB12CD34.js">';
    expect(htmlUnderFolder(html, '/es')).toBe(
      '<base href="/"><link rel="modulepreload" href="/es/chunk-AB12CD34.js"><link rel="stylesheet" href="/es/styles-ZZ99YY88.css">' +
        '<link rel="manifest" href="manifest.webmanifest"><link rel="icon" href="favicon.svg">' +
        '<script src="/es/main-QW12ER34.js" type="module"></script><a href="https://example.org/x-AB12CD34.js">',
    );
    expect(htmlUnderFolder(html, '')).toBe(html);
  });

  it("moves the service worker's addresses with them, index.html and unhashed files staying at the root", () => {
    const manifest = {
      index: '/index.html',
      assetGroups: [
        {
          urls: [
            '/index.html',
            '/main-QW12ER34.js',
            // The chunk optimizer's names: base64url hashes.
            '/chunk-Bx_9aQ-z.js',
            '/media/font-EF56GH78.woff2',
            '/favicon.svg',
            '/ngsw-worker.js',
          ],
        },
      ],
      hashTable: {
        '/index.html': 'a',
        '/main-QW12ER34.js': 'b',
        '/chunk-Bx_9aQ-z.js': 'd',
        '/media/font-EF56GH78.woff2': 'c',
      },
    };
    const placed = manifestUnderFolder(manifest, '/es');
    expect(placed.assetGroups![0]!.urls).toEqual([
      '/index.html',
      '/es/main-QW12ER34.js',
      '/es/chunk-Bx_9aQ-z.js',
      '/es/media/font-EF56GH78.woff2',
      '/favicon.svg',
      '/ngsw-worker.js',
    ]);
    expect(Object.keys(placed.hashTable)).toEqual([
      '/index.html',
      '/es/main-QW12ER34.js',
      '/es/chunk-Bx_9aQ-z.js',
      '/es/media/font-EF56GH78.woff2',
    ]);
    expect(placed.index).toBe('/index.html');
    // Done twice (a second build step), nothing moves further.
    expect(manifestUnderFolder(placed, '/es')).toEqual(placed);
  });
});
