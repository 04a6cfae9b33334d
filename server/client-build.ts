import { spawnSync } from 'node:child_process';
import { existsSync, readdirSync, readFileSync, statSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import {
  type BuildMetafile,
  prefetchOfflineScreens,
  type ServiceWorkerManifest,
} from './build/offline-groups';
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

/** Whether dist/conewise/browser/index.html is missing or older than any client source. */
export function clientIsStale(): boolean {
  const index = join(CLIENT_DIST, 'index.html');
  if (!existsSync(index)) return true;
  const built = statSync(index).mtimeMs;
  const sources = [...CLIENT_SOURCES, ...CONFIG_FILES].map((p) => newestMtime(join(PROJECT_ROOT, p)));
  return Math.max(...sources) > built;
}

/**
 * `ng build` (production, with esbuild's metafile), then the service worker's prefetch list (the
 * shell and the screens needed offline), then the compressed copies. False when the build failed.
 */
export function buildClient(log: (m: string) => void = console.log): boolean {
  const result = spawnSync('npx', ['ng', 'build', '--stats-json'], {
    cwd: PROJECT_ROOT,
    stdio: 'inherit',
    env: { ...process.env, NG_CLI_ANALYTICS: 'false' },
  });
  if (result.status !== 0) return false;
  const manifestPath = join(CLIENT_DIST, 'ngsw.json');
  const indexPath = join(CLIENT_DIST, 'index.html');
  const meta = JSON.parse(readFileSync(join(CLIENT_DIST, '..', 'stats.json'), 'utf8')) as BuildMetafile;
  const { manifest, moved } = prefetchOfflineScreens(
    JSON.parse(readFileSync(manifestPath, 'utf8')) as ServiceWorkerManifest,
    meta,
  );
  const built = readFileSync(indexPath, 'utf8');
  const hashes = manifest['hashTable'] as Record<string, string>;
  if (hashes['/index.html'] !== serviceWorkerHash(built))
    throw new Error('ngsw.json hashes index.html differently than expected: cannot update it');
  const { html, added } = completePreloadHints(built, meta);
  writeFileSync(indexPath, html);
  hashes['/index.html'] = serviceWorkerHash(html);
  writeFileSync(manifestPath, JSON.stringify(manifest, null, 2));
  log(`[conewise] the service worker prefetches ${moved} chunks for the shell, the plan page and pitch-side`);
  log(`[conewise] index.html preloads ${added.length} more chunks the first screen imports`);
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
