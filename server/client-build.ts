import { spawnSync } from 'node:child_process';
import { existsSync, readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';
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

/** Runs `npx ng build` when the bundle is stale. Returns false when the build failed. */
export function buildClientIfStale(log: (m: string) => void = console.log): boolean {
  if (!clientIsStale()) return true;
  log('[conewise] the client build is missing or older than its sources: running ng build');
  const result = spawnSync('npx', ['ng', 'build'], {
    cwd: PROJECT_ROOT,
    stdio: 'inherit',
    env: { ...process.env, NG_CLI_ANALYTICS: 'false' },
  });
  return result.status === 0;
}
