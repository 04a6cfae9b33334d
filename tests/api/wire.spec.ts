/**
 * What crosses the wire: compressed bodies (brotli where the browser asks, gzip otherwise) and
 * cache lifetimes, for the built client and for API answers. Read with node:http so the raw bytes
 * and Content-Encoding are seen as a browser receives them (fetch would decode them silently).
 */
import { mkdirSync, mkdtempSync, rmSync, writeFileSync, existsSync } from 'node:fs';
import { request } from 'node:http';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { brotliDecompressSync, gunzipSync } from 'node:zlib';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { precompressClient } from '../../server/build/precompress';
import { registerClub, startTestApp, type TestApp } from '../support/api-test-app';
import { createPlan, createSquad } from './fixtures/plan-helpers';

interface RawAnswer {
  status: number;
  headers: Record<string, string | string[] | undefined>;
  bytes: Buffer;
}

function raw(baseUrl: string, path: string, headers: Record<string, string> = {}): Promise<RawAnswer> {
  return new Promise((resolve, reject) => {
    const req = request(new URL(path, baseUrl), { headers }, (res) => {
      const chunks: Buffer[] = [];
      res.on('data', (chunk: Buffer) => chunks.push(chunk));
      res.on('end', () =>
        resolve({ status: res.statusCode!, headers: res.headers, bytes: Buffer.concat(chunks) }),
      );
      res.on('error', reject);
    });
    req.on('error', reject);
    req.end();
  });
}

function decoded(answer: RawAnswer): string {
  const encoding = answer.headers['content-encoding'];
  if (encoding === 'br') return brotliDecompressSync(answer.bytes).toString('utf8');
  if (encoding === 'gzip') return gunzipSync(answer.bytes).toString('utf8');
  return answer.bytes.toString('utf8');
}

/** A made-up build: the names follow ng build's pattern, the contents are repetitive like real bundles. */
const SCRIPT = `export const stations=[${Array.from({ length: 400 }, (_, i) => `{id:"s${i}",title:"Station ${i}",minutes:5}`).join(',')}];`;
const INDEX = `<!doctype html><html lang="en"><head><title>Conewise</title>${'<meta name="x" content="padding for a realistic size">'.repeat(30)}</head><body><cw-root></cw-root></body></html>`;

describe('the built client on the wire', () => {
  const dir = mkdtempSync(join(tmpdir(), 'conewise-wire-'));
  let app: TestApp;
  let compressed: ReturnType<typeof precompressClient>;

  beforeAll(async () => {
    mkdirSync(join(dir, 'assets'));
    mkdirSync(join(dir, 'media'));
    writeFileSync(join(dir, 'index.html'), INDEX);
    writeFileSync(join(dir, 'chunk-AB12CD34.js'), SCRIPT);
    writeFileSync(
      join(dir, 'ngsw.json'),
      JSON.stringify({ hashTable: { '/chunk-AB12CD34.js': 'x'.repeat(40) }, pad: 'y'.repeat(2000) }),
    );
    writeFileSync(join(dir, 'ngsw-worker.js'), 'self.addEventListener("fetch", () => undefined);');
    writeFileSync(join(dir, 'assets', 'favicon.svg'), '<svg xmlns="http://www.w3.org/2000/svg"/>');
    writeFileSync(join(dir, 'media', 'font-EF56GH78.woff2'), Buffer.alloc(4096, 7));
    // A copy left from an earlier build whose original is gone.
    writeFileSync(join(dir, 'chunk-OLD00000.js.br'), 'stale');
    compressed = precompressClient(dir);
    app = await startTestApp({ staticDir: dir });
  });
  afterAll(async () => {
    await app?.close();
    rmSync(dir, { recursive: true, force: true });
  });

  it('compresses the text files at build time, leaves fonts and tiny files alone, and removes stale copies', () => {
    expect(compressed.files).toBe(3); // index.html, the chunk, ngsw.json (the worker is under 1 kB)
    expect(compressed.brotliBytes).toBeLessThan(compressed.bytes / 5);
    expect(existsSync(join(dir, 'chunk-AB12CD34.js.br'))).toBe(true);
    expect(existsSync(join(dir, 'chunk-AB12CD34.js.gz'))).toBe(true);
    expect(existsSync(join(dir, 'media', 'font-EF56GH78.woff2.br'))).toBe(false);
    expect(existsSync(join(dir, 'assets', 'favicon.svg.br'))).toBe(false);
    expect(existsSync(join(dir, 'chunk-OLD00000.js.br'))).toBe(false);
  });

  it('sends the brotli copy to a browser that accepts it, cached for a year as immutable', async () => {
    const answer = await raw(app.http.url, '/chunk-AB12CD34.js', { 'accept-encoding': 'gzip, deflate, br' });
    expect(answer.status).toBe(200);
    expect(answer.headers['content-encoding']).toBe('br');
    expect(answer.headers['content-type']).toMatch(/javascript/);
    expect(answer.headers['vary']).toMatch(/Accept-Encoding/i);
    expect(answer.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    expect(answer.bytes.length).toBeLessThan(SCRIPT.length / 5);
    expect(decoded(answer)).toBe(SCRIPT);
  });

  it("gives built files two security headers, and pages and worker scripts helmet's whole set", async () => {
    const chunk = await raw(app.http.url, '/chunk-AB12CD34.js', { 'accept-encoding': 'br' });
    expect(chunk.headers['x-content-type-options']).toBe('nosniff');
    expect(chunk.headers['cross-origin-resource-policy']).toBe('same-origin');
    expect(chunk.headers['content-security-policy']).toBeUndefined();
    // A worker runs under the policy it is served with.
    const worker = await raw(app.http.url, '/ngsw-worker.js');
    expect(worker.status).toBe(200);
    expect(worker.headers['content-security-policy']).toContain("script-src 'self'");
    expect(worker.headers['cache-control']).toBe('no-cache');
    for (const path of ['/teams/42', '/index.html']) {
      const page = await raw(app.http.url, path, { accept: 'text/html' });
      expect(page.headers['content-security-policy'], path).toContain("default-src 'self'");
      expect(page.headers['x-frame-options'], path).toBe('SAMEORIGIN');
      expect(decoded(page), path).toBe(INDEX);
    }
  });

  it('sends gzip to a browser without brotli, and the plain file to one that accepts neither', async () => {
    const gzip = await raw(app.http.url, '/chunk-AB12CD34.js', { 'accept-encoding': 'gzip' });
    expect(gzip.headers['content-encoding']).toBe('gzip');
    expect(decoded(gzip)).toBe(SCRIPT);
    const plain = await raw(app.http.url, '/chunk-AB12CD34.js', { 'accept-encoding': 'identity' });
    expect(plain.headers['content-encoding']).toBeUndefined();
    expect(plain.bytes.toString('utf8')).toBe(SCRIPT);
  });

  it('still serves the right bytes when a build replaces the files while the server runs', async () => {
    // ng build empties the folder: the copies listed at start are gone, new chunks have none yet.
    rmSync(join(dir, 'ngsw.json.br'));
    rmSync(join(dir, 'ngsw.json.gz'));
    writeFileSync(join(dir, 'chunk-NEW00001.js'), SCRIPT);
    const ngsw = await raw(app.http.url, '/ngsw.json', { 'accept-encoding': 'br' });
    expect(ngsw.status).toBe(200);
    expect(JSON.parse(decoded(ngsw)).hashTable).toBeTruthy();
    const fresh = await raw(app.http.url, '/chunk-NEW00001.js', { 'accept-encoding': 'gzip, br' });
    expect(fresh.status).toBe(200);
    expect(fresh.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    expect(decoded(fresh)).toBe(SCRIPT);
    precompressClient(dir);
  });

  it('has the browser ask again for ngsw.json, the app shell on any client route, and fonts kept a year', async () => {
    const ngsw = await raw(app.http.url, '/ngsw.json', { 'accept-encoding': 'br' });
    expect(ngsw.headers['cache-control']).toBe('no-cache');
    expect(ngsw.headers['content-encoding']).toBe('br');
    expect(ngsw.headers['etag']).toBeTruthy();

    const shell = await raw(app.http.url, '/teams/42', { accept: 'text/html', 'accept-encoding': 'br' });
    expect(shell.status).toBe(200);
    expect(shell.headers['cache-control']).toBe('no-cache');
    expect(shell.headers['content-encoding']).toBe('br');
    expect(decoded(shell)).toBe(INDEX);

    const font = await raw(app.http.url, '/media/font-EF56GH78.woff2', { 'accept-encoding': 'br' });
    expect(font.headers['content-encoding']).toBeUndefined();
    expect(font.headers['cache-control']).toBe('public, max-age=31536000, immutable');

    const favicon = await raw(app.http.url, '/assets/favicon.svg');
    expect(favicon.headers['cache-control']).toBe('public, max-age=86400');
  });
});

describe('API answers on the wire', () => {
  let app: TestApp;
  beforeAll(async () => {
    app = await startTestApp();
  });
  afterAll(async () => {
    await app?.close();
  });

  it('compresses a plan with brotli to a fraction of its size and lets no cache store it', async () => {
    const lead = await registerClub(app, 'Wire Test FC');
    const squad = await createSquad(app, lead.token, 14);
    const plan = await createPlan(app, lead.token, squad);
    const auth = { authorization: `Bearer ${lead.token}` };

    const br = await raw(app.http.url, `/api/plans/${plan.id}`, { ...auth, 'accept-encoding': 'gzip, br' });
    const plain = await raw(app.http.url, `/api/plans/${plan.id}`, {
      ...auth,
      'accept-encoding': 'identity',
    });
    expect(br.status).toBe(200);
    expect(br.headers['content-encoding']).toBe('br');
    expect(br.headers['cache-control']).toBe('no-store');
    expect(plain.headers['content-encoding']).toBeUndefined();
    expect(JSON.parse(decoded(br))).toEqual(JSON.parse(plain.bytes.toString('utf8')));
    expect(br.bytes.length).toBeLessThan(plain.bytes.length / 3);

    const gzip = await raw(app.http.url, `/api/plans/${plan.id}`, { ...auth, 'accept-encoding': 'gzip' });
    expect(gzip.headers['content-encoding']).toBe('gzip');
    expect(JSON.parse(decoded(gzip))).toEqual(JSON.parse(plain.bytes.toString('utf8')));
  });

  it('sends no-store on refusals and on public answers too', async () => {
    const refused = await raw(app.http.url, '/api/teams', { 'accept-encoding': 'br' });
    expect(refused.status).toBe(401);
    expect(refused.headers['cache-control']).toBe('no-store');
    const health = await raw(app.http.url, '/api/health');
    expect(health.headers['cache-control']).toBe('no-store');
  });
});
