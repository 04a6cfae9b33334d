/**
 * The client is built once per language (Angular's i18n: `localize` in angular.json writes
 * dist/conewise/browser/en-GB/, …/es/). Every language's app lives at the same addresses (`/`,
 * `/plans/42`): the server sends the index.html of the reader's language. Its scripts, styles and
 * fonts, though, have the same file names in every language and different contents, so each
 * language's files are served under their folder (`/es/main-….js`): a browser or service worker
 * that cached one language's file never hands it out for another's.
 *
 * This file finds the builds (runtime) and writes each build's own folder into its index.html and
 * ngsw.json (build time, server/client-build.ts).
 */
import { existsSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { languageOf, SOURCE_LANGUAGE } from '../../shared/i18n/languages';

export interface LocaleBuild {
  /** The language it is chosen for: "en", "es". */
  language: string;
  /** Its folder on disk. */
  dir: string;
  /** Where its hashed files are served: "/es" (or "" for a build without languages). */
  prefix: string;
}

/**
 * Files named with their content's hash: by esbuild, eight capitals or digits (`main-AB12CD34.js`,
 * `media/font-…-EF56GH78.woff2`); by Angular's chunk optimizer (server/client-build.ts), scripts
 * named with eight base64url characters (`chunk-Bx_9aQ-z.js`).
 */
export const HASHED_FILE =
  /(?:-[A-Z0-9]{8}\.(?:js|css|woff2?|svg|png|jpe?g|webp)|(?:^|\/)chunk-[A-Za-z0-9_-]{8}\.js)$/;

/**
 * The builds under the client folder: one per language folder holding an index.html (source
 * language first), or the folder itself when it was built without languages (a development build).
 */
export function localeBuilds(staticDir: string | null): LocaleBuild[] {
  if (!staticDir || !existsSync(staticDir)) return [];
  if (existsSync(join(staticDir, 'index.html')))
    return [{ language: SOURCE_LANGUAGE, dir: staticDir, prefix: '' }];
  return readdirSync(staticDir, { withFileTypes: true })
    .filter((entry) => entry.isDirectory() && existsSync(join(staticDir, entry.name, 'index.html')))
    .map((entry) => ({
      language: languageOf(entry.name),
      dir: join(staticDir, entry.name),
      prefix: `/${entry.name}`,
    }))
    .sort((a, b) => Number(b.language === SOURCE_LANGUAGE) - Number(a.language === SOURCE_LANGUAGE));
}

/** A built file's address under its language's folder, when it is one of the hashed files. */
function underFolder(url: string, prefix: string): string {
  if (!prefix || /^(?:[a-z]+:|\/\/|#|data:)/i.test(url)) return url;
  const path = url.startsWith('/') ? url.slice(1) : url;
  return HASHED_FILE.test(path) && !path.startsWith(`${prefix.slice(1)}/`) ? `${prefix}/${path}` : url;
}

/** index.html with its scripts, styles and preload hints fetched from the language's folder. */
export function htmlUnderFolder(html: string, prefix: string): string {
  return html.replace(
    /\b(src|href)="([^"]+)"/g,
    (whole, attribute: string, url: string) => `${attribute}="${underFolder(url, prefix)}"`,
  );
}

interface WorkerManifest {
  assetGroups?: { urls: string[] }[];
  hashTable: Record<string, string>;
  [key: string]: unknown;
}

/** The service worker's manifest with the same addresses as index.html: the worker caches those. */
export function manifestUnderFolder<M extends WorkerManifest>(manifest: M, prefix: string): M {
  return {
    ...manifest,
    assetGroups: manifest.assetGroups?.map((group) => ({
      ...group,
      urls: group.urls.map((url) => underFolder(url, prefix)),
    })),
    hashTable: Object.fromEntries(
      Object.entries(manifest.hashTable).map(([url, hash]) => [underFolder(url, prefix), hash]),
    ),
  };
}
