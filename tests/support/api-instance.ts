/**
 * API instances as separate processes (server/main.ts through tsx), for the suites that run more
 * than one on a database or that kill one: each in its own process group, so stopping or killing
 * it takes npx, tsx and the server together.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { PROJECT_ROOT } from '../../server/config';
import { freePort } from '../../server/db/free-port';
import { ApiClient } from './api-client';

/** A running instance: its client, its process group and its port. */
export interface ApiInstance {
  api: ApiClient;
  child: ChildProcess;
  port: number;
  /** What it has printed so far (LOG_LEVEL silent unless the env says otherwise). */
  output(): string;
}

/** Starts server/main.ts with `env` on a free port and waits until /api/health answers 200. */
export async function startInstance(env: Record<string, string>): Promise<ApiInstance> {
  const port = await freePort();
  const child = spawn('npx', ['tsx', '--tsconfig', 'tsconfig.server.json', 'server/main.ts'], {
    cwd: PROJECT_ROOT,
    env: { ...process.env, LOG_LEVEL: 'silent', ...env, PORT: String(port) },
    stdio: ['ignore', 'pipe', 'pipe'],
    // Its own process group: npx does not pass SIGTERM on to the server it starts, and a
    // server left running would keep taking later specs' e-mail from the shared outbox.
    detached: true,
  });
  let output = '';
  child.stdout!.on('data', (chunk) => (output += chunk));
  child.stderr!.on('data', (chunk) => (output += chunk));
  const api = new ApiClient(`http://127.0.0.1:${port}`);
  // tsx compiles on start; on a busy machine that can take a while.
  const deadline = Date.now() + 90_000;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`instance exited: ${output}`);
    const ok = await api.get('/api/health').then(
      (r) => r.status === 200,
      () => false,
    );
    if (ok) return { api, child, port, output: () => output };
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
  process.kill(-child.pid!, 'SIGTERM');
  throw new Error(`instance did not come up: ${output}`);
}

/** Stops the whole process group (npx, tsx and the server) and waits until it has gone. */
export async function stopInstance(child: ChildProcess): Promise<void> {
  try {
    process.kill(-child.pid!, 'SIGTERM');
  } catch {
    return; // the group has already gone
  }
  for (let waited = 0; waited < 10_000; waited += 100) {
    if (!groupAlive(child.pid!)) return;
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
  process.kill(-child.pid!, 'SIGKILL');
}

export function groupAlive(pgid: number): boolean {
  try {
    process.kill(-pgid, 0);
    return true;
  } catch {
    return false;
  }
}
