/**
 * The JWT secret: a short JWT_SECRET stops the start instead of a warning; none makes one kept on
 * disk, but only for a server that listens on this machine alone (HOST a loopback address).
 */
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { bindHostFromEnv, isLoopbackHost, loadJwtSecret, MIN_JWT_SECRET_LENGTH } from '../../server/config';

describe('loadJwtSecret', () => {
  const saved = process.env['JWT_SECRET'];
  const savedHost = process.env['HOST'];
  const dirs: string[] = [];
  const dataDir = () => {
    const dir = mkdtempSync(join(tmpdir(), 'conewise-secret-'));
    dirs.push(dir);
    return dir;
  };
  afterEach(() => {
    if (saved === undefined) delete process.env['JWT_SECRET'];
    else process.env['JWT_SECRET'] = saved;
    if (savedHost === undefined) delete process.env['HOST'];
    else process.env['HOST'] = savedHost;
    for (const dir of dirs.splice(0)) rmSync(dir, { recursive: true, force: true });
  });

  it('refuses a JWT_SECRET shorter than the floor, saying how long it must be', () => {
    process.env['JWT_SECRET'] = 'short-secret-16ch';
    expect(() => loadJwtSecret(dataDir())).toThrow(`needs at least ${MIN_JWT_SECRET_LENGTH}`);
  });

  it('uses a long enough JWT_SECRET as given', () => {
    process.env['JWT_SECRET'] = 'x'.repeat(MIN_JWT_SECRET_LENGTH);
    expect(loadJwtSecret(dataDir())).toBe('x'.repeat(MIN_JWT_SECRET_LENGTH));
  });

  it('without one, makes a random secret readable by its owner only and keeps it across starts', () => {
    delete process.env['JWT_SECRET'];
    const dir = dataDir();
    const first = loadJwtSecret(dir);
    expect(first.length).toBeGreaterThanOrEqual(64);
    expect(loadJwtSecret(dir)).toBe(first);
    expect(readFileSync(join(dir, 'jwt-secret'), 'utf8').trim()).toBe(first);
    expect(statSync(join(dir, 'jwt-secret')).mode & 0o777).toBe(0o600);
  });

  it('without one, refuses to start a server that other machines can reach, saying what to set', () => {
    delete process.env['JWT_SECRET'];
    for (const host of ['0.0.0.0', '::', '192.0.2.10', 'conewise.example.org']) {
      const dir = dataDir();
      expect(() => loadJwtSecret(dir, host)).toThrow(
        `JWT_SECRET is not set, and HOST=${host} lets other machines reach this server. Set JWT_SECRET to at least ${MIN_JWT_SECRET_LENGTH} random characters`,
      );
      // Nothing was made up and left on disk.
      expect(existsSync(join(dir, 'jwt-secret'))).toBe(false);
    }
    // HOST from the environment is what counts when none is given.
    process.env['HOST'] = '0.0.0.0';
    expect(() => loadJwtSecret(dataDir())).toThrow('HOST=127.0.0.1 to serve this machine only');
  });

  it('without one, a server on a loopback address still makes its own', () => {
    delete process.env['JWT_SECRET'];
    for (const host of ['127.0.0.1', '127.0.0.2', '::1', '[::1]', 'localhost', 'LOCALHOST']) {
      expect(loadJwtSecret(dataDir(), host).length, host).toBeGreaterThanOrEqual(64);
    }
  });

  it('a server reachable from other machines uses a JWT_SECRET it is given', () => {
    process.env['JWT_SECRET'] = 'y'.repeat(MIN_JWT_SECRET_LENGTH);
    expect(loadJwtSecret(dataDir(), '0.0.0.0')).toBe('y'.repeat(MIN_JWT_SECRET_LENGTH));
  });

  it('listens on this machine only unless HOST says otherwise; a blank HOST counts as unset', () => {
    delete process.env['HOST'];
    expect(bindHostFromEnv()).toBe('127.0.0.1');
    process.env['HOST'] = '  ';
    expect(bindHostFromEnv()).toBe('127.0.0.1');
    process.env['HOST'] = '0.0.0.0';
    expect(bindHostFromEnv()).toBe('0.0.0.0');
    expect(isLoopbackHost('127.255.0.9')).toBe(true);
    expect(isLoopbackHost('::ffff:127.0.0.1')).toBe(true);
    for (const host of ['0.0.0.0', '::', '', '128.0.0.1', '127.0.0.1.example.org', 'localhost.example.org'])
      expect(isLoopbackHost(host), host).toBe(false);
  });

  it('a bare instance (server/main.ts) on HOST=0.0.0.0 without JWT_SECRET stops at once with that message', () => {
    const root = resolve(__dirname, '../..');
    const env: NodeJS.ProcessEnv = { ...process.env, HOST: '0.0.0.0', PORT: '0' };
    delete env['JWT_SECRET'];
    // Never reached: the secret is checked before the database is opened.
    env['DATABASE_URL'] = 'postgres://nobody@127.0.0.1:1/none';
    const run = spawnSync(
      join(root, 'node_modules/.bin/tsx'),
      ['--tsconfig', 'tsconfig.server.json', 'server/main.ts'],
      { cwd: root, env, encoding: 'utf8', timeout: 60_000 },
    );
    expect(run.status, run.stderr).toBe(2);
    expect(run.stderr).toContain(
      '[conewise] JWT_SECRET is not set, and HOST=0.0.0.0 lets other machines reach',
    );
    expect(run.stderr).not.toMatch(/\n\s+at /);
    // Starting tsx and the server's imports took over vitest's 5 s default on a busy CI machine.
  }, 60_000);
});
