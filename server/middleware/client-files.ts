import type { ServerResponse } from 'node:http';
import { join } from 'node:path';
import compression from 'compression';
import express, { Router, type RequestHandler } from 'express';
import expressStaticGzip from 'express-static-gzip';

/**
 * Files whose name carries a content hash (`chunk-PS7PETOW.js`, `media/…-OJ3A7MQ4.woff2`): a new
 * build gives new names, so a browser may keep these for a year without asking again.
 */
const HASHED = /-[A-Z0-9]{8}\.(?:js|css|woff2?|svg|png|jpe?g|webp)$/;

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
 * The built client: the brotli or gzip copy made at build time (server/client-build.ts) when the
 * browser accepts one, by `express-static-gzip`; hashed files cached for a year, the rest asked
 * again; client routes such as /teams/42 answered with index.html (history fallback).
 */
export function clientFiles(staticDir: string): Router {
  const router = Router();
  const files = {
    index: false,
    cacheControl: false,
    setHeaders: (res: ServerResponse, path: string) => res.setHeader('Cache-Control', cacheControlFor(path)),
  };
  router.use(
    expressStaticGzip(staticDir, {
      enableBrotli: true,
      orderPreference: ['br', 'gz'],
      index: false,
      serveStatic: files,
    }),
  );
  // express-static-gzip lists the compressed copies once, at start. A build made while the server
  // runs replaces them: such files are then read as they are (and compressed per answer), the
  // encoding announced for a copy that is gone taken back first.
  router.use((_req, res, next) => {
    if (!res.headersSent) res.removeHeader('Content-Encoding');
    next();
  });
  router.use(express.static(staticDir, files));
  router.get(/^(?!\/api(\/|$)).*/, (req, res, next) => {
    if (!req.accepts('html')) return next();
    res.setHeader('Cache-Control', CACHE_CONTROL.revalidate);
    // The helper's view of a plan is for one family's evening, not for search engines.
    if (req.path === '/helper') res.setHeader('X-Robots-Tag', 'noindex, nofollow');
    res.sendFile(join(staticDir, 'index.html'));
  });
  return router;
}
