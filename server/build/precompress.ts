import { existsSync, readdirSync, readFileSync, unlinkSync, writeFileSync } from 'node:fs';
import { extname, join } from 'node:path';
import { brotliCompressSync, constants as zlib, gzipSync } from 'node:zlib';
import { CLIENT_DIST } from '../config';

/** Built files worth compressing: text. Fonts (woff2) and images are compressed already. */
const TEXT_EXTENSIONS = new Set(['.js', '.mjs', '.css', '.html', '.json', '.webmanifest', '.svg', '.txt']);
/** Below this, the headers cost more than compression saves (the `compression` package's own default). */
const MIN_BYTES = 1024;
const COMPRESSED = ['.br', '.gz'];

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
