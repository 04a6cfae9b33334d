import { expect } from 'vitest';
import { createDataSource } from '../../server/data-source';

/**
 * Asserts that the database at `url` has every migration applied and nothing left for the
 * entities to change (every entity change has its migration).
 */
export async function expectSchemaMatchesEntities(url: string): Promise<void> {
  const dataSource = createDataSource({ url, poolSize: 1 });
  await dataSource.initialize();
  try {
    const pending = await dataSource.driver.createSchemaBuilder().log();
    expect(pending.upQueries.map((q) => q.query)).toEqual([]);
    expect(await dataSource.showMigrations()).toBe(false);
  } finally {
    await dataSource.destroy();
  }
}
