import { spawnSync } from 'node:child_process';
import { chmodSync, existsSync, mkdtempSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import pg from 'pg';
import { afterAll, describe, expect, inject, it } from 'vitest';
import { resolveDataDir, startCluster } from '../../server/db/pg-cluster';
import { isRoot } from '../../server/db/system-packages';
import { expectSchemaMatchesEntities } from '../support/schema-check';

describe('migrations', () => {
  it('leave nothing for the entities to change (every entity change has a migration)', async () => {
    await expectSchemaMatchesEntities(inject('databaseUrl'));
  });
});

describe('private PostgreSQL cluster', () => {
  const base = mkdtempSync(join(tmpdir(), 'conewise-cluster-spec-'));
  chmodSync(base, 0o755);
  afterAll(() => rmSync(base, { recursive: true, force: true }));

  function postgresRunningFor(dataDir: string): boolean {
    const ps = spawnSync('ps', ['-eo', 'args'], { encoding: 'utf8' }).stdout;
    return ps.split('\n').some((line) => line.includes('postgres') && line.includes(`-D ${dataDir}`));
  }

  it('listens on 127.0.0.1 only, asks for a password, keeps data across a stop and a start, and stops its server', async () => {
    const dataDir = join(base, 'pg');
    const first = await startCluster({ dataDir, log: () => undefined });
    try {
      const client = new pg.Client(first.url);
      await client.connect();
      await client.query('CREATE TABLE kept (note text)');
      await client.query("INSERT INTO kept VALUES ('still here')");
      const settings = await client.query(
        "SELECT name, setting FROM pg_settings WHERE name IN ('listen_addresses', 'unix_socket_directories')",
      );
      expect(Object.fromEntries(settings.rows.map((r) => [r['name'], r['setting']]))).toEqual({
        listen_addresses: '127.0.0.1',
        unix_socket_directories: '',
      });
      await client.end();
      const wrong = new pg.Client(first.url.replace(/:[^:@]+@/, ':wrong-password@'));
      await expect(wrong.connect()).rejects.toThrow(/password/);
    } finally {
      await first.stop();
    }
    expect(postgresRunningFor(first.dataDir)).toBe(false);

    const second = await startCluster({ dataDir, log: () => undefined });
    try {
      const client = new pg.Client(second.url);
      await client.connect();
      const rows = await client.query('SELECT note FROM kept');
      expect(rows.rows).toEqual([{ note: 'still here' }]);
      await client.end();
    } finally {
      await second.stop();
    }
    expect(postgresRunningFor(second.dataDir)).toBe(false);
  });

  it.runIf(isRoot())(
    'as root, a project under a 0700 folder keeps its data where the postgres user can reach',
    () => {
      const locked = mkdtempSync(join(tmpdir(), 'conewise-locked-'));
      chmodSync(locked, 0o700);
      try {
        const wanted = join(locked, 'project', '.data', 'pg');
        const chosen = resolveDataDir(wanted, () => undefined);
        expect(chosen).not.toBe(wanted);
        expect(chosen).toMatch(/^\/(var\/)?tmp\/conewise-pg-[0-9a-f]{16}\/pg$/);
        expect(resolveDataDir(wanted, () => undefined)).toBe(chosen);
        const open = join(base, 'open-project', '.data', 'pg');
        expect(resolveDataDir(open, () => undefined)).toBe(open);
      } finally {
        rmSync(locked, { recursive: true, force: true });
      }
    },
  );

  it('keeps the generated password beside the data folder, readable by its owner only', () => {
    const file = join(base, 'pg.password');
    expect(existsSync(file)).toBe(true);
    expect(statSync(file).mode & 0o077).toBe(0);
  });
});
