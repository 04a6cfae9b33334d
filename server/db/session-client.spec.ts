/**
 * A pooled connection whose session the server ended (as a restart or an administrator does) is
 * not lent out again: the request after it gets a new connection, on the real test database.
 */
import { describe, expect, inject, it } from 'vitest';
import { createDataSource } from '../data-source';

describe('a pooled connection whose session the server ended', () => {
  it('leaves the pool as it is given back, and the next query gets a new session', async () => {
    const dataSource = createDataSource({ url: inject('databaseUrl'), poolSize: 1 });
    await dataSource.initialize();
    try {
      const runner = dataSource.createQueryRunner();
      await runner.connect();
      const [{ pid: ended }] = (await runner.query('SELECT pg_backend_pid() AS pid')) as { pid: number }[];
      await expect(runner.query('SELECT pg_terminate_backend(pg_backend_pid())')).rejects.toMatchObject({
        code: '57P01',
      });
      await runner.release();
      // At once, before the closing socket's last event: the pool's only slot is free again.
      const [{ pid }] = (await dataSource.query('SELECT pg_backend_pid() AS pid')) as { pid: number }[];
      expect(pid).not.toBe(ended);
    } finally {
      await dataSource.destroy();
    }
  });
});
