/**
 * Issue 2's first command, for real: `npm start` brings up a private PostgreSQL, migrates, seeds
 * the demo club and serves the API; SIGINT stops everything including PostgreSQL; a second
 * start reuses the data. (The client build is skipped here: the e2e suite covers the client.)
 */
import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { chmodSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { PROJECT_ROOT } from '../../server/config';
import { freePort } from '../../server/db/free-port';
import { DEMO_PASSWORD, DEMO_PEOPLE } from '../../server/seed';
import { ApiClient } from '../support/api-client';
import { TEST_PASSWORD } from '../support/api-test-app';

const dataDir = mkdtempSync(join(tmpdir(), 'conewise-start-spec-'));
chmodSync(dataDir, 0o755);

interface Started {
  child: ChildProcess;
  output: () => string;
  api: ApiClient;
}

async function npmStart(port: number): Promise<Started> {
  const child = spawn('npm', ['start'], {
    cwd: PROJECT_ROOT,
    env: {
      ...process.env,
      PORT: String(port),
      CONEWISE_DATA_DIR: dataDir,
      SKIP_CLIENT_BUILD: '1',
      LOG_LEVEL: 'warn',
    },
    stdio: ['ignore', 'pipe', 'pipe'],
    detached: true, // its own process group, like a terminal's foreground job
  });
  let output = '';
  child.stdout!.on('data', (chunk) => (output += chunk));
  child.stderr!.on('data', (chunk) => (output += chunk));
  // Compiling with tsx, initdb and the first migration take a while on a busy machine.
  const deadline = Date.now() + 150_000;
  while (Date.now() < deadline && !output.includes('Conewise is running at')) {
    if (child.exitCode !== null) break;
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
  if (!output.includes('Conewise is running at')) {
    process.kill(-child.pid!, 'SIGTERM');
    throw new Error(`npm start did not come up:\n${output}`);
  }
  return { child, output: () => output, api: new ApiClient(`http://127.0.0.1:${port}`) };
}

/** Like Ctrl-C in a terminal: SIGINT to the whole process group. */
function interrupt(started: Started): Promise<number | null> {
  return new Promise((resolve) => {
    started.child.once('exit', (code) => resolve(code));
    process.kill(-started.child.pid!, 'SIGINT');
  });
}

/** Waits for the group's processes to finish their cleanup (npm itself may exit first). */
async function waitUntilGone(folder: string): Promise<boolean> {
  for (let i = 0; i < 100 && postgresRunningIn(folder); i++) await new Promise((r) => setTimeout(r, 200));
  return !postgresRunningIn(folder);
}

/** The processes of PostgreSQL (or its tools) working on `folder`, as ps lists them. */
function postgresIn(folder: string): string[] {
  const ps = spawnSync('ps', ['-eo', 'pid,stat,etime,args'], { encoding: 'utf8' }).stdout;
  return ps.split('\n').filter((line) => line.includes('postgres') && line.includes(folder));
}

function postgresRunningIn(folder: string): boolean {
  return postgresIn(folder).length > 0;
}

describe('npm start', () => {
  afterAll(() => rmSync(dataDir, { recursive: true, force: true }));

  it('serves the API on a private cluster, stops it all on SIGINT, and reuses the data next time', async () => {
    const port = await freePort();
    const first = await npmStart(port);
    try {
      expect(first.output()).toContain(`http://127.0.0.1:${port}`);
      for (const person of DEMO_PEOPLE) expect(first.output()).toContain(person.email);
      const health = await first.api.get('/api/health');
      expect(health.body).toMatchObject({ status: 'ok', db: 'up' });
      const demo = await first.api.post('/api/auth/login', {
        email: DEMO_PEOPLE[0]!.email,
        password: DEMO_PASSWORD,
      });
      expect(demo.status).toBe(200);
      const registered = await first.api.post('/api/auth/register', {
        clubName: 'Second Start Club',
        name: 'Rhea Restart',
        email: 'rhea.restart@example.org',
        password: TEST_PASSWORD,
      });
      expect(registered.status).toBe(201);
      expect(postgresRunningIn(dataDir)).toBe(true);
    } finally {
      await interrupt(first);
    }
    expect(
      await waitUntilGone(dataDir),
      `still running:\n${postgresIn(dataDir).join('\n')}\n--- npm start said:\n${first.output()}`,
    ).toBe(true);
    expect(first.output()).toContain('SIGINT: stopping');

    const second = await npmStart(port);
    try {
      expect(second.output()).not.toContain('migrations applied');
      expect(second.output()).not.toContain('seeded');
      const login = await second.api.post('/api/auth/login', {
        email: 'rhea.restart@example.org',
        password: TEST_PASSWORD,
      });
      expect(login.status).toBe(200);
      expect(login.body.user.clubName).toBe('Second Start Club');
    } finally {
      await interrupt(second);
    }
    expect(await waitUntilGone(dataDir)).toBe(true);
  }, 360_000);
});
