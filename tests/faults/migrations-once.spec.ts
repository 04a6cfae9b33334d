/**
 * Three API instances started at once on one empty database: each waits its turn for the
 * migration lock, so every migration is applied and recorded once, all three come up healthy,
 * and the schema they leave is whole (nothing left for the entities to change, and a club, a team
 * and a plan made through each are read through another).
 */
import { randomBytes } from 'node:crypto';
import pg from 'pg';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { MIGRATION_LOCK } from '../../server/data-source';
import { startThrowawayCluster, type PgCluster } from '../../server/db/pg-cluster';
import { MIGRATIONS } from '../../server/migrations';
import { startInstance, stopInstance, type ApiInstance } from '../support/api-instance';
import { planBody, registerClubWithTeam } from '../support/club-with-team';
import { expectSchemaMatchesEntities } from '../support/schema-check';

const INSTANCES = 3;

/** Sessions waiting for the migration lock (a one-number advisory lock: its key in two halves). */
const WAITING_FOR_MIGRATION_LOCK = `
SELECT count(*)::int AS waiting FROM pg_locks
 WHERE locktype = 'advisory' AND NOT granted AND objsubid = 1
   AND ((classid::bigint << 32) | objid::bigint) = $1`;

describe('three instances starting together on an empty database', () => {
  let cluster: PgCluster;
  const instances: ApiInstance[] = [];

  beforeAll(async () => {
    cluster = await startThrowawayCluster(() => undefined);
  });

  afterAll(async () => {
    await Promise.all(instances.map((instance) => stopInstance(instance.child)));
    await cluster?.stop();
  });

  it('apply each migration once, all come up healthy, and the schema is whole', async () => {
    const db = new pg.Client({ connectionString: cluster.url });
    await db.connect();
    try {
      const env = {
        DATABASE_URL: cluster.url,
        JWT_SECRET: randomBytes(32).toString('hex'),
        SEND_MAIL: 'false',
        AUTH_RATE_MAX: '10000',
      };
      // The test holds the lock first, so the three reach it whatever their start-up times and
      // then all go at the same moment.
      await db.query('SELECT pg_advisory_lock($1)', [MIGRATION_LOCK]);
      const starting = Array.from({ length: INSTANCES }, () =>
        startInstance(env).then((instance) => {
          instances.push(instance);
          return instance;
        }),
      );
      const failed = Promise.race(starting.map((start) => start.then(() => new Promise<never>(() => {}))));
      const lined = (async () => {
        for (const deadline = Date.now() + 150_000; Date.now() < deadline; ) {
          const { rows } = await db.query(WAITING_FOR_MIGRATION_LOCK, [MIGRATION_LOCK]);
          if (rows[0]!['waiting'] === INSTANCES) return;
          await new Promise((resolve) => setTimeout(resolve, 100));
        }
        throw new Error(`the ${INSTANCES} instances did not all wait for the migration lock`);
      })();
      await Promise.race([lined, failed]);
      await db.query('SELECT pg_advisory_unlock($1)', [MIGRATION_LOCK]);
      await Promise.all(starting);
      expect(instances.map((instance) => instance.child.exitCode)).toEqual(starting.map(() => null));

      // Each migration recorded once, every one of them.
      const { rows } = await db.query(
        'SELECT name, count(*)::int AS times FROM migrations GROUP BY name ORDER BY name',
      );
      const expected = MIGRATIONS.map((Migration) => new Migration().name as string).sort();
      expect(rows).toEqual(expected.map((name) => ({ name, times: 1 })));
      expect((await db.query(WAITING_FOR_MIGRATION_LOCK, [MIGRATION_LOCK])).rows[0]!['waiting']).toBe(0);
    } finally {
      await db.end();
    }

    // Nothing left for the entities to change.
    await expectSchemaMatchesEntities(cluster.url);

    // Each instance serves a whole round trip; what one wrote the next one reads.
    for (const [i, instance] of instances.entries()) {
      const club = await registerClubWithTeam(instance.api, `Triplet Club ${i + 1}`);
      const plan = await instance.api.post('/api/plans', planBody(club), { token: club.token });
      expect(plan.status, plan.text).toBe(201);
      const reader = instances[(i + 1) % instances.length]!;
      const read = await reader.api.get(`/api/plans/${plan.body.id}`, { token: club.token });
      expect(read.status).toBe(200);
      expect(read.body.plan.phases).toEqual(plan.body.plan.phases);
    }
  });
});
