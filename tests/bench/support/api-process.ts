/**
 * The API as the benchmarks run it: server/main.ts in its own node process (tsx as a loader, so
 * the child's pid is the API's and its CPU time can be read) on a database the bench started,
 * and a bench club with a team of 16 and the plan request the benches send.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { PROJECT_ROOT } from '../../../server/config';

/** CPU seconds (user + system) the process has used so far, from /proc (Linux clock ticks of 10 ms). */
export function cpuSeconds(pid: number): number {
  const fields = readFileSync(`/proc/${pid}/stat`, 'utf8').split(') ')[1]!.split(' ');
  return (Number(fields[11]) + Number(fields[12])) / 100;
}

/** Resident memory of the process in MB, from /proc. */
export function residentMb(pid: number): number {
  const line = readFileSync(`/proc/${pid}/status`, 'utf8')
    .split('\n')
    .find((l) => l.startsWith('VmRSS:'));
  return Math.round(Number(/\d+/.exec(line ?? '')?.[0] ?? 0) / 1024);
}

/** Starts the API on `port` and waits until /api/health answers; `env` adds to the bench defaults. */
export async function startApi(
  databaseUrl: string,
  port: number,
  { nodeFlags = [], env = {} }: { nodeFlags?: string[]; env?: Record<string, string> } = {},
): Promise<ChildProcess> {
  const child = spawn(process.execPath, ['--import', 'tsx', ...nodeFlags, 'server/main.ts'], {
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
      ...env,
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

/** Stops the API and waits for it to exit. */
export async function stopApi(child: ChildProcess): Promise<void> {
  if (child.exitCode !== null) return;
  const exited = new Promise((resolve) => child.once('exit', resolve));
  child.kill('SIGTERM');
  await Promise.race([exited, new Promise((resolve) => setTimeout(resolve, 10_000))]);
}

/** A JSON request that must succeed; the answer's body. */
export async function json(url: string, method: string, body: unknown, token?: string) {
  const response = await fetch(url, {
    method,
    headers: { 'content-type': 'application/json', ...(token ? { authorization: `Bearer ${token}` } : {}) },
    body: JSON.stringify(body),
  });
  if (!response.ok) throw new Error(`${method} ${url}: ${response.status} ${await response.text()}`);
  return response.json();
}

/** A club registered through the API at `base`, a team of 16 and the body of a plan for them. */
export interface BenchClub {
  token: string;
  teamId: string;
  email: string;
  password: string;
  /** POST /api/plans body: a 25-minute match warm-up for the 16. */
  planBody: string;
}

export async function benchClub(base: string, label = 'bench'): Promise<BenchClub> {
  const email = `bea.${label}.${Date.now()}@example.org`;
  const password = 'bench-password-1';
  const { token } = await json(`${base}/api/auth/register`, 'POST', {
    clubName: 'Bench Park Juniors',
    name: 'Bea Bench',
    email,
    password,
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
  return { token, teamId: team.id, email, password, planBody };
}
