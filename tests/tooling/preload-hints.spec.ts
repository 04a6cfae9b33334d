/** index.html preloads every chunk the first screen imports, not only the ten Angular hints. */
import { createHash } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import type { BuildMetafile } from '../../server/build/offline-groups';
import { completePreloadHints, serviceWorkerHash } from '../../server/build/preload-hints';

const meta: BuildMetafile = {
  outputs: {
    'main-AAAA0001.js': {
      entryPoint: 'src/main.ts',
      imports: [
        { path: 'chunk-ONE00001.js', kind: 'import-statement' },
        { path: 'chunk-CORE0001.js', kind: 'import-statement' },
        { path: 'chunk-PLAN0001.js', kind: 'dynamic-import' },
      ],
    },
    'chunk-ONE00001.js': { imports: [{ path: 'chunk-DEEP0001.js', kind: 'import-statement' }] },
    'chunk-DEEP0001.js': { imports: [] },
    'chunk-CORE0001.js': { imports: [] },
    'chunk-PLAN0001.js': { entryPoint: 'src/app/features/plans/plan-page.ts', imports: [] },
  },
};

const built =
  '<head><link rel="stylesheet" href="styles-X.css"></head><body><cw-root></cw-root>' +
  '<link rel="modulepreload" href="chunk-ONE00001.js"><script src="main-AAAA0001.js" type="module"></script></body>';

describe('completePreloadHints', () => {
  it('adds a hint for each static import left out, before the others, and none for lazy screens', () => {
    const { html, added } = completePreloadHints(built, meta);
    expect(added).toEqual(['chunk-CORE0001.js', 'chunk-DEEP0001.js']);
    const hints = [...html.matchAll(/<link rel="modulepreload" href="([^"]+)">/g)].map((m) => m[1]);
    expect(hints).toEqual(['chunk-CORE0001.js', 'chunk-DEEP0001.js', 'chunk-ONE00001.js']);
    expect(html).not.toContain('chunk-PLAN0001.js');
    expect(html).not.toContain('href="main-AAAA0001.js"');
    expect(html.endsWith('<script src="main-AAAA0001.js" type="module"></script></body>')).toBe(true);
  });

  it('leaves a page that already hints everything as it is', () => {
    const once = completePreloadHints(built, meta).html;
    expect(completePreloadHints(once, meta)).toEqual({ html: once, added: [] });
  });

  it('puts the hints before main.js when Angular wrote none', () => {
    const bare = '<body><script src="main-AAAA0001.js" type="module"></script></body>';
    const { html } = completePreloadHints(bare, meta);
    expect(html.indexOf('chunk-ONE00001.js')).toBeLessThan(html.indexOf('<script src="main-AAAA0001.js"'));
    expect(html.match(/modulepreload/g)).toHaveLength(3);
  });

  it('hashes a file as the service worker manifest does (SHA-1 of the bytes, hex)', () => {
    // The hash of the empty string, as published for SHA-1 (FIPS 180 test vectors).
    expect(serviceWorkerHash('')).toBe('da39a3ee5e6b4b0d3255bfef95601890afd80709');
    expect(serviceWorkerHash('<p>Zoë</p>')).toBe(
      createHash('sha1').update(Buffer.from('<p>Zoë</p>', 'utf8')).digest('hex'),
    );
  });
});
