import { spawnSync } from 'node:child_process';
import { existsSync, readdirSync, readFileSync, statSync, unlinkSync, writeFileSync } from 'node:fs';
import { extname, join } from 'node:path';
import { brotliCompressSync, constants as zlib, gzipSync } from 'node:zlib';
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

/** Built files worth compressing: text. Fonts (woff2) and images are compressed already. */
const TEXT_EXTENSIONS = new Set(['.js', '.mjs', '.css', '.html', '.json', '.webmanifest', '.svg', '.txt']);
/** Below this, the headers cost more than compression saves (the `compression` package's own default). */
const MIN_BYTES = 1024;
const COMPRESSED = ['.br', '.gz'];

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

function filesUnder(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((entry) =>
    entry.isDirectory() ? filesUnder(join(dir, entry.name)) : [join(dir, entry.name)],
  );
}

/**
 * Writes a brotli (.br, quality 11) and a gzip (.gz, level 9) copy beside every text file of the
 * build, so the server sends them without compressing on each request (express-static-gzip picks
 * the copy the browser accepts). Copies left from an earlier build are removed. Returns the
 * number of files compressed and their bytes before and after brotli.
 */
export function precompressClient(dir = CLIENT_DIST): { files: number; bytes: number; brotliBytes: number } {
  let files = 0;
  let bytes = 0;
  let brotliBytes = 0;
  for (const file of filesUnder(dir)) {
    if (COMPRESSED.includes(extname(file))) {
      if (!existsSync(file.slice(0, -3))) unlinkSync(file);
      continue;
    }
    if (!TEXT_EXTENSIONS.has(extname(file))) continue;
    const content = readFileSync(file);
    if (content.length < MIN_BYTES) continue;
    const brotli = brotliCompressSync(content, {
      params: {
        [zlib.BROTLI_PARAM_QUALITY]: zlib.BROTLI_MAX_QUALITY,
        [zlib.BROTLI_PARAM_MODE]: zlib.BROTLI_MODE_TEXT,
        [zlib.BROTLI_PARAM_SIZE_HINT]: content.length,
      },
    });
    writeFileSync(`${file}.br`, brotli);
    writeFileSync(`${file}.gz`, gzipSync(content, { level: 9 }));
    files += 1;
    bytes += content.length;
    brotliBytes += brotli.length;
  }
  return { files, bytes, brotliBytes };
}

/** `ng build` (production) then the compressed copies. Returns false when the build failed. */
export function buildClient(log: (m: string) => void = console.log): boolean {
  const result = spawnSync('npx', ['ng', 'build'], {
    cwd: PROJECT_ROOT,
    stdio: 'inherit',
    env: { ...process.env, NG_CLI_ANALYTICS: 'false' },
  });
  if (result.status !== 0) return false;
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
