/**
 * `npm run -s bench:api`: a throwaway PostgreSQL cluster, the API in its own process, then
 * autocannon for 20 s at 10 connections against GET /api/health, GET /api/teams and
 * POST /api/plans (16 players). Prints req/s, p50 and p99 per route and each route's req/s as a
 * share of health's; the last line is the figures as JSON keyed by route.
 * Targets: POST /api/plans p99 ≤ 50 ms and its req/s ≥ 1/10 of GET /api/health's.
 * BENCH_SECONDS shortens the runs; BENCH_API_NODE_FLAGS passes flags to the API's node.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { randomUUID } from 'node:crypto';
import autocannon from 'autocannon';
import { startThrowawayCluster } from '../../server/db/pg-cluster';
import { freePort } from '../../server/db/free-port';
import { PROJECT_ROOT } from '../../server/config';
import { benchClub, cpuSeconds, startApi } from './support/api-process';

const DURATION_S = Number(process.env['BENCH_SECONDS'] ?? 20);
const CONNECTIONS = 10;

interface Figures {
  rps: number;
  p50Ms: number;
  p99Ms: number;
}

function nodeFlags(): string[] {
  return (process.env['BENCH_API_NODE_FLAGS'] ?? '').split(/\s+/).filter(Boolean);
}

function run(options: autocannon.Options): Promise<Figures> {
  return new Promise((resolve, reject) => {
    autocannon({ connections: CONNECTIONS, duration: DURATION_S, ...options }, (error, result) => {
      if (error) return reject(error);
      if (result.non2xx || result.errors) {
        return reject(new Error(`${options.url}: ${result.non2xx} non-2xx, ${result.errors} errors`));
      }
      resolve({
        rps: Math.round(result.requests.average),
        p50Ms: result.latency.p50,
        p99Ms: result.latency.p99,
      });
    });
  });
}

/**
 * A bare Express route measured the same way first: the targets were set on a machine where it
 * served about 4,600 req/s, so this line tells how this machine compares.
 */
async function bareExpressRps(): Promise<number> {
  const port = await freePort();
  const script = `const app = require('express')(); app.get('/', (q, r) => r.json({ ok: true })); app.listen(${port}, '127.0.0.1', () => console.log('up'));`;
  const bare = spawn(process.execPath, ['-e', script], {
    cwd: PROJECT_ROOT,
    stdio: ['ignore', 'pipe', 'inherit'],
  });
  await new Promise((resolve) => bare.stdout!.once('data', resolve));
  try {
    return (await run({ url: `http://127.0.0.1:${port}/`, duration: Math.min(DURATION_S, 10) })).rps;
  } finally {
    bare.kill('SIGTERM');
  }
}

const bareRps = await bareExpressRps();
const cluster = await startThrowawayCluster(() => undefined);
let api: ChildProcess | null = null;
try {
  const port = await freePort();
  api = await startApi(cluster.url, port, { nodeFlags: nodeFlags() });
  const base = `http://127.0.0.1:${port}`;
  const { token, planBody } = await benchClub(base);
  const auth = { authorization: `Bearer ${token}` };
  // Warm the engine's compiled rules and the JIT before measuring.
  await run({
    url: `${base}/api/plans`,
    method: 'POST',
    headers: { ...auth, 'content-type': 'application/json' },
    body: planBody,
    duration: 3,
  });

  const apiPid = api.pid!;
  const cpuMsPerRequest: Record<string, number> = {};
  // The API's own CPU time per request: unlike req/s, it hardly moves with what else the machine runs.
  async function measured(route: string, options: autocannon.Options): Promise<Figures> {
    const before = cpuSeconds(apiPid);
    const figures = await run(options);
    cpuMsPerRequest[route] = ((cpuSeconds(apiPid) - before) * 1000) / (figures.rps * DURATION_S || 1);
    return figures;
  }
  const results: Record<string, Figures> = {
    'GET /api/health': await measured('GET /api/health', { url: `${base}/api/health` }),
    'GET /api/teams': await measured('GET /api/teams', { url: `${base}/api/teams`, headers: auth }),
    'POST /api/plans': await measured('POST /api/plans', {
      url: `${base}/api/plans`,
      method: 'POST',
      headers: { ...auth, 'content-type': 'application/json' },
      body: planBody,
    }),
    // What the app sends: a new key on every plan, so each one is claimed and its answer kept.
    'POST /api/plans + key': await measured('POST /api/plans + key', {
      url: `${base}/api/plans`,
      method: 'POST',
      headers: { ...auth, 'content-type': 'application/json' },
      body: planBody,
      requests: [
        {
          setupRequest: (request) => ({
            ...request,
            headers: { ...request.headers, 'idempotency-key': randomUUID() },
          }),
        },
      ],
    }),
  };
  const health = results['GET /api/health'].rps || 1;
  console.log(
    `route                  req/s    p50 ms   p99 ms   share of health   API CPU ms/req   (${DURATION_S} s, ${CONNECTIONS} connections)`,
  );
  for (const [route, f] of Object.entries(results)) {
    console.log(
      `${route.padEnd(22)} ${String(f.rps).padStart(6)} ${String(f.p50Ms).padStart(9)} ${String(f.p99Ms).padStart(8)}   ${((f.rps / health) * 100).toFixed(1).padStart(14)} %   ${cpuMsPerRequest[route]!.toFixed(2).padStart(14)}`,
    );
  }
  console.log(
    `calibration: a bare Express route here serves ${bareRps} req/s (about 4,600 where the targets were set)`,
  );
  const post = results['POST /api/plans'];
  console.log(
    `targets: POST /api/plans p99 ${post.p99Ms} ms (≤ 50: ${post.p99Ms <= 50 ? 'met' : 'missed'}), ` +
      `req/s share ${((post.rps / health) * 100).toFixed(1)} % (≥ 10 %: ${post.rps * 10 >= health ? 'met' : 'missed'})`,
  );
  console.log(JSON.stringify(results));
} finally {
  // Let requests whose client autocannon has already dropped finish before the API stops.
  await new Promise((resolve) => setTimeout(resolve, 1_000));
  api?.kill('SIGTERM');
  await new Promise((resolve) => setTimeout(resolve, 500));
  await cluster.stop();
}
