/**
 * Which errors mean "the database cannot serve just now" (answered 503) and which are about the
 * request (answered otherwise), told apart on errors the real driver raises against the test
 * database.
 */
import { describe, expect, inject, it } from 'vitest';
import type { DataSource } from 'typeorm';
import { createDataSource } from '../data-source';
import { freePort } from './free-port';
import { isDatabaseUnavailable } from './database-unavailable';

async function failureOf(work: () => Promise<unknown>): Promise<unknown> {
  try {
    await work();
  } catch (error) {
    return error;
  }
  throw new Error('expected the work to fail');
}

async function withDataSource<T>(poolSize: number, use: (dataSource: DataSource) => Promise<T>): Promise<T> {
  const dataSource = createDataSource({ url: inject('databaseUrl'), poolSize });
  await dataSource.initialize();
  try {
    return await use(dataSource);
  } finally {
    await dataSource.destroy();
  }
}

describe('a database that cannot serve just now', () => {
  it('is a refused connection', async () => {
    const url = new URL(inject('databaseUrl'));
    url.port = String(await freePort());
    const error = await failureOf(() => createDataSource({ url: url.toString() }).initialize());
    expect(isDatabaseUnavailable(error)).toBe(true);
  });

  it('is a session ended by the server (as a restart ends every session)', async () => {
    await withDataSource(1, async (dataSource) => {
      const runner = dataSource.createQueryRunner();
      await runner.connect();
      try {
        const error = await failureOf(() => runner.query('SELECT pg_terminate_backend(pg_backend_pid())'));
        expect((error as { code?: string }).code).toBe('57P01');
        expect(isDatabaseUnavailable(error)).toBe(true);
      } finally {
        await runner.release();
      }
    });
  });

  it('is a statement cut by the statement timeout', async () => {
    await withDataSource(1, async (dataSource) => {
      const error = await failureOf(() =>
        dataSource.transaction(async (manager) => {
          await manager.query("SET LOCAL statement_timeout = '50ms'");
          await manager.query('SELECT pg_sleep(2)');
        }),
      );
      expect((error as { code?: string }).code).toBe('57014');
      expect(isDatabaseUnavailable(error)).toBe(true);
    });
  });

  it('is a pool with no connection free in time', async () => {
    await withDataSource(1, async (dataSource) => {
      const holder = dataSource.createQueryRunner();
      await holder.connect();
      try {
        const error = await failureOf(() => dataSource.query('SELECT 1'));
        expect(isDatabaseUnavailable(error)).toBe(true);
      } finally {
        await holder.release();
      }
    });
  });
});

describe('an error about the request itself', () => {
  it('is not taken for an outage', async () => {
    await withDataSource(1, async (dataSource) => {
      const malformed = await failureOf(() => dataSource.query("SELECT 'not-a-uuid'::uuid"));
      expect((malformed as { code?: string }).code).toBe('22P02');
      const unknownTable = await failureOf(() => dataSource.query('SELECT * FROM no_such_table'));
      const duplicate = await failureOf(() =>
        dataSource.transaction(async (manager) => {
          await manager.query('CREATE TEMP TABLE once_only (id int PRIMARY KEY) ON COMMIT DROP');
          await manager.query('INSERT INTO once_only VALUES (1), (1)');
        }),
      );
      expect((duplicate as { code?: string }).code).toBe('23505');
      for (const error of [malformed, unknownTable, duplicate, new Error('plain'), null, 'text']) {
        expect(isDatabaseUnavailable(error)).toBe(false);
      }
    });
  });
});
