import { existsSync } from 'node:fs';
import type { ServerResponse } from 'node:http';
import { join } from 'node:path';
import compression from 'compression';
import express, { Router, type Request, type RequestHandler, type Response } from 'express';
import expressStaticGzip from 'express-static-gzip';
import { HASHED_FILE, type LocaleBuild } from '../build/locale-builds';
import { PRERENDERED_PAGES } from '../build/prerender';
import { languageFor } from './request-language';

/**
 * Files whose name carries a content hash (`chunk-PS7PETOW.js`, `media/…-OJ3A7MQ4.woff2`): a new
 * build gives new names, so a browser may keep these for a year without asking again.
 */
const HASHED = HASHED_FILE;

/** The build in the reader's language (server/middleware/request-language.ts), else the source's. */
export function buildFor(req: Request, builds: readonly LocaleBuild[]): LocaleBuild {
  const language = languageFor(
    req,
    builds.map((b) => b.language),
  );
  return builds.find((b) => b.language === language) ?? builds[0]!;
}

/** Files at the root (index.html, ngsw.json, the manifest) differ by language when there are several. */
function varyByLanguage(res: Response, builds: readonly LocaleBuild[]): void {
  if (builds.length > 1) res.vary('Cookie').vary('Accept-Language');
}

/** What a browser and any cache in between may keep. */
export const CACHE_CONTROL = {
  hashed: 'public, max-age=31536000, immutable',
  /** index.html, ngsw.json, the worker scripts and the manifest: asked again on every use. */
  revalidate: 'no-cache',
  /** Unhashed assets (the favicon): a day, then asked again. */
  assets: 'public, max-age=86400',
  /** API answers carry children's names: never stored by a browser or proxy. */
  api: 'no-store',
} as const;

function cacheControlFor(path: string): string {
  const file = path.replace(/\.(?:br|gz)$/, '');
  if (HASHED.test(file)) return CACHE_CONTROL.hashed;
  if (/[/\\]assets[/\\]/.test(file)) return CACHE_CONTROL.assets;
  return CACHE_CONTROL.revalidate;
}

/** `Cache-Control: no-store` on every API answer (the service worker keeps its own offline copy). */
export const noStore: RequestHandler = (_req, res, next) => {
  res.setHeader('Cache-Control', CACHE_CONTROL.api);
  next();
};

/**
 * Compresses what is built on each request (API JSON, the app shell's index.html): brotli where
 * the browser asks for it, gzip otherwise, by the `compression` package. Bodies under 1 kB and
 * types that are compressed already (PDF, fonts) pass as they are.
 */
export function compressAnswers(): RequestHandler {
  return compression();
}

/**
 * Scripts whose own response headers are their security policy: a service worker or web worker
 * runs under the CSP it is served with, so these go through helmet like the app shell.
 */
const WORKER_SCRIPTS = /^\/(?:ngsw-worker|safety-worker|worker-basic\.min)\.js$/;

/** Documents, served by clientShell with the security headers, never as plain files. */
const PAGES = new Set(['/index.html', ...Object.values(PRERENDERED_PAGES).map((file) => `/${file}`)]);

/**
 * The headers a built file needs. Helmet's set (the CSP, frame and referrer policies…) governs
 * documents and workers; on a script, stylesheet, font or image it does nothing but cost ~700
 * bytes a request, dozens of times on a first visit over a weak link. Files keep these two.
 */
function fileHeaders(res: ServerResponse): void {
  res.setHeader('X-Content-Type-Options', 'nosniff');
  res.setHeader('Cross-Origin-Resource-Policy', 'same-origin');
}

/**
 * The built client's files (mounted before helmet): the brotli or gzip copy made at build time
 * (server/build/precompress.ts) when the browser accepts one, by `express-static-gzip`; hashed
 * files cached for a year, the rest asked again. Worker scripts and pages pass on to clientShell.
 */
export function clientAssets(builds: readonly LocaleBuild[]): Router {
  const router = Router();
  const files = {
    index: false,
    cacheControl: false,
    setHeaders: (res: ServerResponse, path: string) => {
      fileHeaders(res);
      res.setHeader('Cache-Control', cacheControlFor(path));
    },
  };
  const served = (dir: string) => {
    const assets = Router();
    assets.use(
      expressStaticGzip(dir, {
        enableBrotli: true,
        orderPreference: ['br', 'gz'],
        index: false,
        serveStatic: files,
      }),
    );
    // express-static-gzip lists the compressed copies once, at start. A build made while the server
    // runs replaces them: such files are then read as they are (and compressed per answer), the
    // encoding announced for a copy that is gone taken back first.
    assets.use((_req, res, next) => {
      if (!res.headersSent) res.removeHeader('Content-Encoding');
      next();
    });
    assets.use(express.static(dir, files));
    return assets;
  };
  // Each language's hashed files under its folder (/es/main-….js): the same name in every language.
  for (const build of builds) {
    if (!build.prefix) continue;
    const files = served(build.dir);
    router.use(build.prefix, (req, res, next) => (PAGES.has(req.path) ? next() : files(req, res, next)));
  }
  // The rest (ngsw.json, the manifest, icons) from the reader's language.
  const atRoot = new Map(builds.map((b) => [b, served(b.dir)]));
  router.use((req, res, next) => {
    if (/^\/api(\/|$)/.test(req.path) || PAGES.has(req.path) || WORKER_SCRIPTS.test(req.path)) return next();
    const build = buildFor(req, builds);
    if (!HASHED.test(req.path)) varyByLanguage(res, builds);
    atRoot.get(build)!(req, res, next);
  });
  return router;
}

/**
 * After helmet: the worker scripts, and the app shell (index.html) for any client route such as
 * /teams/42 (history fallback) in the reader's language, both with the full security headers;
 * /sign-in gets its copy with the page already drawn.
 */
export function clientShell(builds: readonly LocaleBuild[]): Router {
  const router = Router();
  const workers = new Map(
    builds.map((b) => [
      b,
      express.static(b.dir, {
        index: false,
        cacheControl: false,
        setHeaders: (res: ServerResponse) => res.setHeader('Cache-Control', CACHE_CONTROL.revalidate),
      }),
    ]),
  );
  router.use((req, res, next) => {
    if (!WORKER_SCRIPTS.test(req.path)) return next();
    workers.get(buildFor(req, builds))!(req, res, next);
  });
  router.get(/^(?!\/api(\/|$)).*/, (req, res, next) => {
    if (!req.accepts('html')) return next();
    const build = buildFor(req, builds);
    res.setHeader('Cache-Control', CACHE_CONTROL.revalidate);
    varyByLanguage(res, builds);
    res.setHeader('Content-Language', build.language);
    // The helper's view of a plan is for one family's evening, not for search engines.
    if (req.path === '/helper') res.setHeader('X-Robots-Tag', 'noindex, nofollow');
    // The sign-in page drawn at build time (server/build/prerender.ts) when the build has it.
    const drawn = PRERENDERED_PAGES[req.path];
    const page = drawn && existsSync(join(build.dir, drawn)) ? drawn : 'index.html';
    res.sendFile(join(build.dir, page));
  });
  return router;
}
