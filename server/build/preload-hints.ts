/**
 * Preload hints for every chunk the first screen needs, written into the built index.html.
 *
 * Angular's build writes `<link rel="modulepreload">` for at most ten of main.js's static
 * imports. The app has more, and the one left out is the framework's core (the largest): the
 * browser only finds it after main.js has arrived and been read, a whole extra round trip and a
 * late 70 kB download on a mobile link. This adds a hint for each static import left out, first
 * in the list so the largest download starts first, and updates the service worker's hash of
 * index.html, which would otherwise refuse the changed file.
 */
import { createHash } from 'node:crypto';
import { APP_ENTRY, type BuildMetafile, chunkOf, filesNeededBy } from './offline-groups';

/** index.html with a modulepreload hint for every static import of the app's entry. */
export function completePreloadHints(html: string, meta: BuildMetafile): { html: string; added: string[] } {
  const main = chunkOf(meta, APP_ENTRY);
  if (!main) throw new Error(`the build has no chunk for ${APP_ENTRY}`);
  const hinted = new Set(
    [...html.matchAll(/<link rel="modulepreload" href="([^"]+)">/g)].map((match) => match[1]!),
  );
  const added = [...filesNeededBy(meta, [APP_ENTRY], 'static')]
    .map((url) => url.slice(1))
    .filter((file) => file !== main && !hinted.has(file))
    .sort((a, b) => a.localeCompare(b));
  if (!added.length) return { html, added };
  const links = added.map((file) => `<link rel="modulepreload" href="${file}">`).join('');
  const first = html.indexOf('<link rel="modulepreload"');
  const at = first >= 0 ? first : html.indexOf(`<script src="${main}"`);
  if (at < 0) throw new Error(`index.html loads no ${main}`);
  return { html: html.slice(0, at) + links + html.slice(at), added };
}

/** The service worker manifest's hash for a file (ngsw.json's hashTable holds SHA-1, hex). */
export function serviceWorkerHash(contents: string): string {
  return createHash('sha1').update(contents, 'utf8').digest('hex');
}
