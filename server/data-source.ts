import 'reflect-metadata';
import { DataSource, type DataSourceOptions } from 'typeorm';
import { ENTITIES } from './entities';
import { MIGRATIONS } from './migrations';

export interface DataSourceSettings {
  url: string;
  /** Throwaway test databases only: build the schema from the entities instead of migrations. */
  synchronize?: boolean;
  /** Connection pool size per instance. */
  poolSize?: number;
}

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
    extra: { max: settings.poolSize ?? 10, connectionTimeoutMillis: 5_000 },
  };
  return new DataSource(options);
}

/** Any fixed number: instances starting together take turns to migrate. */
const MIGRATION_LOCK = 7_402_115;

/** Connects and applies pending migrations; returns the names applied. */
export async function connectAndMigrate(dataSource: DataSource): Promise<string[]> {
  if (!dataSource.isInitialized) await dataSource.initialize();
  const lock = dataSource.createQueryRunner();
  await lock.connect();
  try {
    await lock.query('SELECT pg_advisory_lock($1)', [MIGRATION_LOCK]);
    const applied = await dataSource.runMigrations({ transaction: 'each' });
    return applied.map((migration) => migration.name);
  } finally {
    await lock.query('SELECT pg_advisory_unlock($1)', [MIGRATION_LOCK]).catch(() => undefined);
    await lock.release();
  }
}
