/**
 * Global setup of the `api` project: a throwaway PostgreSQL cluster on a free loopback port,
 * migrated, its URL provided to the tests as inject('databaseUrl'). Removed afterwards, also
 * when tests fail.
 */
import type { TestProject } from 'vitest/node';
import { connectAndMigrate, createDataSource } from '../../server/data-source';
import { startThrowawayCluster, type PgCluster } from '../../server/db/pg-cluster';

declare module 'vitest' {
  export interface ProvidedContext {
    databaseUrl: string;
  }
}

let cluster: PgCluster | null = null;

export async function setup(project: TestProject): Promise<void> {
  cluster = await startThrowawayCluster(() => undefined);
  const dataSource = createDataSource({ url: cluster.url, poolSize: 2 });
  try {
    await connectAndMigrate(dataSource);
  } catch (error) {
    await cluster.stop();
    throw error;
  } finally {
    if (dataSource.isInitialized) await dataSource.destroy();
  }
  project.provide('databaseUrl', cluster.url);
}

export async function teardown(): Promise<void> {
  await cluster?.stop();
  cluster = null;
}
