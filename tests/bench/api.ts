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
import { readFileSync } from 'node:fs';
import autocannon from 'autocannon';
import { startThrowawayCluster } from '../../server/db/pg-cluster';
import { freePort } from '../../server/db/free-port';
import { PROJECT_ROOT } from '../../server/config';

const DURATION_S = Number(process.env['BENCH_SECONDS'] ?? 20);
const CONNECTIONS = 10;

interface Figures {
  rps: number;
  p50Ms: number;
  p99Ms: number;
}

/** CPU seconds (user + system) the process has used so far, from /proc (Linux clock ticks of 10 ms). */
function cpuSeconds(pid: number): number {
  const fields = readFileSync(`/proc/${pid}/stat`, 'utf8').split(') ')[1]!.split(' ');
  return (Number(fields[11]) + Number(fields[12])) / 100;
}

function nodeFlags(): string[] {
  return (process.env['BENCH_API_NODE_FLAGS'] ?? '').split(/\s+/).filter(Boolean);
}

async function startApi(databaseUrl: string, port: number): Promise<ChildProcess> {
  // node itself (tsx as a loader), so child.pid is the API's own process and its CPU time can be read.
  const child = spawn(process.execPath, ['--import', 'tsx', ...nodeFlags(), 'server/main.ts'], {
    cwd: PROJECT_ROOT,
    env: {
      ...process.env,
      TSX_TSCONFIG_PATH: 'tsconfig.server.json',
      DATABASE_URL: databaseUrl,
      PORT: String(port),
      SEND_MAIL: 'false',
      LOG_LEVEL: 'warn',
      JWT_SECRET: 'bench-secret-0123456789abcdef0123456789',
      AUTH_RATE_MAX: '100000',
    },
    stdio: ['ignore', 'inherit', 'inherit'],
  });
  const deadline = Date.now() + 60_000;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`API exited with ${child.exitCode}`);
    try {
      if ((await fetch(`http://127.0.0.1:${port}/api/health`)).ok) return child;
    } catch {
      // not listening yet
    }
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
  child.kill('SIGTERM');
  throw new Error('API did not become healthy within 60 s');
}

async function json(url: string, method: string, body: unknown, token?: string) {
  const response = await fetch(url, {
    method,
    headers: { 'content-type': 'application/json', ...(token ? { authorization: `Bearer ${token}` } : {}) },
    body: JSON.stringify(body),
  });
  if (!response.ok) throw new Error(`${method} ${url}: ${response.status} ${await response.text()}`);
  return response.json();
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
  api = await startApi(cluster.url, port);
  const base = `http://127.0.0.1:${port}`;
  const { token } = await json(`${base}/api/auth/register`, 'POST', {
    clubName: 'Bench Park Juniors',
    name: 'Bea Bench',
    email: 'bea.bench@example.org',
    password: 'bench-password-1',
  });
  const team = await json(
    `${base}/api/teams`,
    'POST',
    {
      name: 'U10 Bench Larks',
      ageGroup: 'U10',
      level: 'intermediate',
      usualSpace: { width: 40, length: 30 },
    },
    token,
  );
  const players: { id: string }[] = [];
  for (let i = 0; i < 16; i++) {
    players.push(
      await json(
        `${base}/api/teams/${team.id}/players`,
        'POST',
        { displayName: `Player ${String.fromCharCode(65 + i)}.` },
        token,
      ),
    );
  }
  const planBody = JSON.stringify({
    teamId: team.id,
    date: '2026-12-05',
    kickOff: '10:30',
    request: {
      ageGroup: 'U10',
      level: 'intermediate',
      players: players.map((p) => ({ id: p.id })),
      coaches: 2,
      equipment: { balls: 18, cones: 40, bibs: 12, goals: 4 },
      space: { width: 40, length: 30 },
      minutes: 25,
      kind: 'match-warm-up',
    },
  });
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
