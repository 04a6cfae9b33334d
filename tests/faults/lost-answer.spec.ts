/**
 * A phone saves a plan, the server saves it, and the answer is lost on the way back (the
 * connection drops). The phone sends the same request again with the same Idempotency-Key: it gets
 * the plan that was saved, and the team has that one plan, not two. A copy sent while the first is
 * still being made is told to wait (409 with Retry-After) and, sent again, gets the first answer.
 */
import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { connectAndMigrate, createDataSource } from '../../server/data-source';
import { startThrowawayCluster, type PgCluster } from '../../server/db/pg-cluster';
import { createSquad, planRequest, type Squad } from '../api/fixtures/plan-helpers';
import { ApiClient } from '../support/api-client';
import { registerClub, startTestApp, type SignedIn, type TestApp } from '../support/api-test-app';
import { startLossyProxy, type LossyProxy } from '../support/lossy-proxy';

describe('a plan whose answer was lost, sent again', () => {
  let cluster: PgCluster;
  let app: TestApp;
  let proxy: LossyProxy;
  /** The phone: every request goes through the proxy. */
  let phone: ApiClient;
  let lead: SignedIn;
  let squad: Squad;

  beforeAll(async () => {
    cluster = await startThrowawayCluster(() => undefined);
    // Two connections: one holds the migration lock while the other migrates.
    const migrating = createDataSource({ url: cluster.url, poolSize: 2 });
    await connectAndMigrate(migrating);
    await migrating.destroy();
    app = await startTestApp({}, cluster.url);
    proxy = await startLossyProxy(app.http.port);
    phone = new ApiClient(proxy.url);
    lead = await registerClub(app, 'Millbrook Rovers');
    squad = await createSquad(app, lead.token, 8, 'U10 Swifts');
  });

  afterAll(async () => {
    await proxy?.stop();
    await app?.close();
    await cluster?.stop();
  });

  const planBody = (date: string) => ({
    teamId: squad.teamId,
    date,
    kickOff: '10:00',
    request: planRequest(squad.playerIds, { seed: `lost-${date}` }),
  });
  const save = (body: unknown, key: string) =>
    phone.post('/api/plans', body, { token: lead.token, headers: { 'Idempotency-Key': key } });
  const carries = (key: string) => (head: string) => head.toLowerCase().includes(`idempotency-key: ${key}`);
  const plansOn = async (date: string) =>
    (
      (await app.dataSource.query('SELECT id FROM session_plan WHERE "teamId" = $1 AND date = $2', [
        squad.teamId,
        date,
      ])) as { id: string }[]
    ).map((row) => row.id);
  const recordOf = async (key: string) =>
    (
      (await app.dataSource.query('SELECT status FROM idempotency_record WHERE key = $1', [key])) as {
        status: number | null;
      }[]
    )[0];

  it('the copy gets the plan the server saved, and the team has one plan from it', async () => {
    const key = randomUUID();
    const body = planBody('2027-01-09');
    const lost = proxy.loseAnswerTo(carries(key));
    await expect(save(body, key)).rejects.toThrow();
    await lost;
    // The server finished the job: the plan is there though the phone never heard.
    const saved = await plansOn('2027-01-09');
    expect(saved).toHaveLength(1);

    const again = await save(body, key);
    expect(again.status).toBe(201);
    expect(again.headers.get('idempotent-replayed')).toBe('true');
    expect(again.body.id).toBe(saved[0]);
    expect(again.headers.get('location')).toBe(`/api/plans/${saved[0]}`);
    const read = await phone.get(`/api/plans/${saved[0]}`, { token: lead.token });
    expect(read.status).toBe(200);
    expect(again.body.plan).toEqual(read.body.plan);
    expect(again.headers.get('etag')).toBe(read.headers.get('etag'));
    expect(await plansOn('2027-01-09')).toEqual(saved);
  });

  it('a copy sent while the first is still being made is told to wait, then gets the first answer', async () => {
    const key = randomUUID();
    const body = planBody('2027-01-16');
    // The team row locked, so the first request's INSERT waits: it is still being made.
    const lock = app.dataSource.createQueryRunner();
    await lock.connect();
    let first: Promise<unknown>;
    const lost = proxy.loseAnswerTo(carries(key));
    await lock.startTransaction();
    try {
      await lock.query('SELECT 1 FROM team WHERE id = $1 FOR UPDATE', [squad.teamId]);
      first = save(body, key).then(
        () => 'answered',
        () => 'connection lost',
      );
      await expect.poll(() => recordOf(key), { timeout: 30_000, interval: 20 }).toEqual({ status: null });

      const meanwhile = await save(body, key);
      expect(meanwhile.status).toBe(409);
      expect(meanwhile.headers.get('retry-after')).toBe('1');
      expect(meanwhile.headers.get('content-type')).toMatch(/application\/problem\+json/);
      expect(meanwhile.body.type).toBe('/problems/request-in-progress');
      expect(await plansOn('2027-01-16')).toEqual([]);
    } finally {
      await lock.commitTransaction();
      await lock.release();
    }
    await lost;
    expect(await first).toBe('connection lost');
    const saved = await plansOn('2027-01-16');
    expect(saved).toHaveLength(1);

    // As Retry-After asks: a second later, the same request with the same key.
    await new Promise((resolve) => setTimeout(resolve, 1_000));
    const later = await save(body, key);
    expect(later.status).toBe(201);
    expect(later.headers.get('idempotent-replayed')).toBe('true');
    expect(later.body.id).toBe(saved[0]);
    expect(await plansOn('2027-01-16')).toEqual(saved);
  });
});
