import { spawnSync } from 'node:child_process';
import { existsSync, readdirSync, readFileSync, statSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import {
  type BuildMetafile,
  prefetchOfflineScreens,
  type ServiceWorkerManifest,
} from './build/offline-groups';
import { htmlUnderFolder, localeBuilds, manifestUnderFolder } from './build/locale-builds';
import { completePreloadHints, serviceWorkerHash } from './build/preload-hints';
import { precompressClient } from './build/precompress';
import { CLIENT_DIST, PROJECT_ROOT } from './config';

/** Folders whose files end up in the client bundle. */
const CLIENT_SOURCES = ['src', 'engine', 'shared', 'rules'];
const CONFIG_FILES = [
  'angular.json',
  'tsconfig.json',
  'tsconfig.app.json',
  'package-lock.json',
  'ngsw-config.json',
];

function newestMtime(path: string): number {
  if (!existsSync(path)) return 0;
  const stat = statSync(path);
  if (!stat.isDirectory()) return stat.mtimeMs;
  let newest = stat.mtimeMs;
  for (const entry of readdirSync(path)) newest = Math.max(newest, newestMtime(join(path, entry)));
  return newest;
}

/** Whether a language's index.html (dist/conewise/browser/en-GB/…) is missing or older than any client source. */
export function clientIsStale(): boolean {
  const builds = localeBuilds(CLIENT_DIST);
  if (!builds.length) return true;
  const built = Math.min(...builds.map((b) => statSync(join(b.dir, 'index.html')).mtimeMs));
  const sources = [...CLIENT_SOURCES, ...CONFIG_FILES].map((p) => newestMtime(join(PROJECT_ROOT, p)));
  return Math.max(...sources) > built;
}

/**
 * `ng build` (production, with esbuild's metafile), then the service worker's prefetch list (the
 * shell and the screens needed offline), the pages drawn in advance, then the compressed copies.
 * False when the build failed.
 */
export function buildClient(log: (m: string) => void = console.log): boolean {
  const result = spawnSync('npx', ['ng', 'build', '--stats-json'], {
    cwd: PROJECT_ROOT,
    stdio: 'inherit',
    // Angular's chunk optimizer merges the many small chunks esbuild splits the app into: on a
    // phone link each file costs a round trip (issue 12).
    env: { ...process.env, NG_CLI_ANALYTICS: 'false', NG_BUILD_OPTIMIZE_CHUNKS: 'true' },
  });
  if (result.status !== 0) return false;
  const meta = JSON.parse(readFileSync(join(CLIENT_DIST, '..', 'stats.json'), 'utf8')) as BuildMetafile;
  const builds = localeBuilds(CLIENT_DIST);
  if (!builds.length) throw new Error(`ng build wrote no index.html under ${CLIENT_DIST}`);
  for (const build of builds) {
    const manifestPath = join(build.dir, 'ngsw.json');
    const indexPath = join(build.dir, 'index.html');
    const { manifest, moved } = prefetchOfflineScreens(
      JSON.parse(readFileSync(manifestPath, 'utf8')) as ServiceWorkerManifest,
      meta,
    );
    const built = readFileSync(indexPath, 'utf8');
    const hashes = manifest['hashTable'] as Record<string, string>;
    if (hashes['/index.html'] !== serviceWorkerHash(built))
      throw new Error('ngsw.json hashes index.html differently than expected: cannot update it');
    const { html, added } = completePreloadHints(built, meta);
    // Each language's scripts and styles are fetched from its own folder (server/build/locale-builds.ts).
    const final = htmlUnderFolder(html, build.prefix);
    const placed = manifestUnderFolder({ ...manifest, hashTable: hashes }, build.prefix);
    placed.hashTable['/index.html'] = serviceWorkerHash(final);
    writeFileSync(indexPath, final);
    writeFileSync(manifestPath, JSON.stringify(placed, null, 2));
    const name = build.prefix || 'the app';
    log(
      `[conewise] ${name}: the service worker prefetches ${moved} chunks for the shell, the plan page and pitch-side`,
    );
    log(`[conewise] ${name}: index.html preloads ${added.length} more chunks the first screen imports`);
  }
  // The sign-in page drawn in advance (a browser is async; the build stays one synchronous call).
  const drawn = spawnSync('npx', ['tsx', '--tsconfig', 'tsconfig.server.json', 'server/cli/prerender.ts'], {
    cwd: PROJECT_ROOT,
    stdio: 'inherit',
    env: process.env,
  });
  if (drawn.status !== 0) return false;
  const { files, bytes, brotliBytes } = precompressClient();
  log(
    `[conewise] compressed ${files} built files: ${Math.round(bytes / 1024)} kB → ${Math.round(brotliBytes / 1024)} kB brotli`,
  );
  return true;
}

/** Builds the client when the bundle is stale. Returns false when the build failed. */
export function buildClientIfStale(log: (m: string) => void = console.log): boolean {
  if (!clientIsStale()) return true;
  log('[conewise] the client build is missing or older than its sources: running ng build');
  return buildClient(log);
}
