import 'reflect-metadata';
import { DataSource, MigrationExecutor, type DataSourceOptions } from 'typeorm';
import { ENTITIES } from './entities';
import { SessionClient } from './db/session-client';
import { MIGRATIONS } from './migrations';

export interface DataSourceSettings {
  url: string;
  /** Throwaway test databases only: build the schema from the entities instead of migrations. */
  synchronize?: boolean;
  /** Connection pool size per instance. */
  poolSize?: number;
}

/**
 * How long a request waits for a pooled connection, or for a new one to be made, before it is
 * answered 503: long enough for a busy pool, short enough that nobody waits on a database that
 * has gone away.
 */
export const CONNECTION_TIMEOUT_MS = 3_000;
/**
 * The longest one statement may run (PostgreSQL's statement_timeout for every pooled session).
 * A request's statements take milliseconds; this only ends one stuck behind a lock or a fault.
 * The migrations lift it on their own session; the retention purge allows its transaction longer.
 */
export const STATEMENT_TIMEOUT_MS = 15_000;

/** The TypeORM DataSource for a PostgreSQL URL. Entities and migrations are listed explicitly. */
export function createDataSource(settings: DataSourceSettings): DataSource {
  const options: DataSourceOptions = {
    type: 'postgres',
    url: settings.url,
    entities: ENTITIES,
    migrations: MIGRATIONS,
    migrationsTableName: 'migrations',
    synchronize: settings.synchronize ?? false,
    // gen_random_uuid() is built into PostgreSQL 13+, so no extension is needed.
    uuidExtension: 'pgcrypto',
    logging: false,
    // A connection the server ends (a restart, an administrator) leaves the pool, and the next
    // request opens a new one: no instance restart is needed.
    extra: {
      Client: SessionClient,
      max: settings.poolSize ?? 10,
      connectionTimeoutMillis: CONNECTION_TIMEOUT_MS,
      statement_timeout: STATEMENT_TIMEOUT_MS,
    },
  };
  return new DataSource(options);
}

/** The advisory lock key (any fixed number) instances starting together take turns on to migrate. */
export const MIGRATION_LOCK = 7_402_115;

/**
 * Connects and applies pending migrations; returns the names applied. The migrations run on the
 * session that holds the advisory lock, so instances starting together on one database apply
 * each migration once: the others wait, then find nothing pending. That session has no statement
 * timeout: it may wait for another instance's migrations, and a migration may take long.
 */
export async function connectAndMigrate(dataSource: DataSource): Promise<string[]> {
  if (!dataSource.isInitialized) await dataSource.initialize();
  const session = dataSource.createQueryRunner();
  await session.connect();
  try {
    await session.query('SET statement_timeout = 0');
    await session.query('SELECT pg_advisory_lock($1)', [MIGRATION_LOCK]);
    const migrations = new MigrationExecutor(dataSource, session);
    migrations.transaction = 'each';
    const applied = await migrations.executePendingMigrations();
    return applied.map((migration) => migration.name);
  } finally {
    await session.query('SELECT pg_advisory_unlock($1)', [MIGRATION_LOCK]).catch(() => undefined);
    await session.query('RESET statement_timeout').catch(() => undefined);
    await session.release();
  }
}
