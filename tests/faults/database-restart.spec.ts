/**
 * PostgreSQL restarted under load: one API instance keeps taking new plans, a few in flight at all
 * times, while its database is stopped (fast shutdown: open sessions cut, committed work kept)
 * and started again on the same data folder and port. No committed plan is lost, every answer
 * comes within the hang guard, the outage answers 503 problem+json with Retry-After (never a 500
 * or a stack trace), /api/health says so, and the same instance serves again once the database is
 * back.
 */
import { randomBytes } from 'node:crypto';
import pg from 'pg';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startThrowawayCluster, type PgCluster } from '../../server/db/pg-cluster';
import { startFakeSmtp, type FakeSmtp } from '../../server/mail/fake-smtp';
import type { Loose } from '../support/api-client';
import { startInstance, stopInstance, type ApiInstance } from '../support/api-instance';
import { planBody, registerClubWithTeam, type ClubWithTeam } from '../support/club-with-team';

/** The longest any answer may take, and the longest the instance may take to serve again. */
const HANG_GUARD_MS = 5_000;
/** A request still unanswered after this counts as hung (and the test stops waiting for it). */
const GIVE_UP_MS = 30_000;
/** Plan requests in flight at all times. */
const IN_FLIGHT = 3;
/** How long the database stays down. */
const OUTAGE_MS = 3_000;

interface Outcome {
  started: number;
  ended: number;
  /** 0 when no answer came (refused, reset or given up). */
  status: number;
  contentType: string;
  retryAfter: string | null;
  text: string;
  body: Loose;
}

const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

async function until(what: string, done: () => boolean, ms: number): Promise<void> {
  for (const deadline = Date.now() + ms; !done(); await sleep(50)) {
    if (Date.now() > deadline) throw new Error(`gave up waiting: ${what}`);
  }
}

/** One request, timed, never thrown: a network failure or a hang comes back as status 0. */
async function timed(url: string, init: RequestInit): Promise<Outcome> {
  const started = Date.now();
  try {
    const response = await fetch(url, { ...init, signal: AbortSignal.timeout(GIVE_UP_MS) });
    const text = await response.text();
    const contentType = response.headers.get('content-type') ?? '';
    return {
      started,
      ended: Date.now(),
      status: response.status,
      contentType,
      retryAfter: response.headers.get('retry-after'),
      text,
      body: /json/.test(contentType) && text ? JSON.parse(text) : text,
    };
  } catch (error) {
    const text = (error as Error).message;
    return { started, ended: Date.now(), status: 0, contentType: '', retryAfter: null, text, body: null };
  }
}

const took = (o: Outcome) => o.ended - o.started;

describe('PostgreSQL restarted under load', () => {
  let cluster: PgCluster;
  let smtp: FakeSmtp;
  let instance: ApiInstance;
  let club: ClubWithTeam;

  beforeAll(async () => {
    cluster = await startThrowawayCluster(() => undefined);
    smtp = await startFakeSmtp();
    // The instance applies the migrations to the empty database as it starts.
    instance = await startInstance({
      DATABASE_URL: cluster.url,
      JWT_SECRET: randomBytes(32).toString('hex'),
      SMTP_HOST: '127.0.0.1',
      SMTP_PORT: String(smtp.port),
    });
    club = await registerClubWithTeam(instance.api, 'Restart Rovers');
  });

  afterAll(async () => {
    if (instance) await stopInstance(instance.child);
    await smtp?.stop();
    await cluster?.stop();
  });

  it('loses no committed plan, answers 503 problems meanwhile and serves again on its own', async () => {
    const base = instance.api.baseUrl;
    const plans: Outcome[] = [];
    const health: Outcome[] = [];
    let running = true;

    const createPlan = () =>
      timed(`${base}/api/plans`, {
        method: 'POST',
        headers: { 'content-type': 'application/json', authorization: `Bearer ${club.token}` },
        body: JSON.stringify(planBody(club)),
      });
    const keepPlanning = async () => {
      while (running) {
        const outcome = await createPlan();
        plans.push(outcome);
        // An outage answers at once: a short pause keeps the loop from spinning on the CPU.
        if (outcome.status !== 201) await sleep(100);
      }
    };
    const keepAsking = async () => {
      while (running) {
        health.push(await timed(`${base}/api/health`, {}));
        await sleep(200);
      }
    };
    const load = [...Array.from({ length: IN_FLIGHT }, keepPlanning), keepAsking()];
    const created = () => plans.filter((o) => o.status === 201);

    let inSpanish: Outcome | undefined;
    let downAt = 0;
    let startAt = 0;
    let upAt = 0;
    try {
      await until('plans created before the restart', () => created().length >= 2 * IN_FLIGHT, 60_000);
      await cluster.shutdown();
      downAt = Date.now();
      const [spanish] = await Promise.all([
        timed(`${base}/api/teams`, {
          headers: { authorization: `Bearer ${club.token}`, 'accept-language': 'es-ES,es;q=0.9' },
        }),
        sleep(OUTAGE_MS),
      ]);
      inSpanish = spanish;
      startAt = Date.now();
      await cluster.start();
      upAt = Date.now();
      await until(
        'a plan created after the restart',
        () => plans.some((o) => o.status === 201 && o.started >= upAt),
        GIVE_UP_MS,
      );
      await until(
        'a healthy answer after the restart',
        () => health.some((o) => o.status === 200 && o.started >= upAt),
        GIVE_UP_MS,
      );
      // A little more traffic on the recovered pool.
      const afterRecovery = created().length;
      await until(
        'more plans after the restart',
        () => created().length >= afterRecovery + IN_FLIGHT,
        30_000,
      );
    } finally {
      running = false;
      await Promise.all(load);
    }

    // Nothing hung, nothing failed in another way than the outage explains.
    const slow = [...plans, ...health].filter((o) => o.status === 0 || took(o) >= HANG_GUARD_MS);
    expect(slow.map((o) => `${o.status} after ${took(o)} ms: ${o.text.slice(0, 200)}`)).toEqual([]);
    expect([...new Set(plans.map((o) => o.status))]).toEqual(expect.arrayContaining([201, 503]));
    expect(
      plans.filter((o) => o.status !== 201 && o.status !== 503).map((o) => `${o.status} ${o.text}`),
    ).toEqual([]);

    // While the database was down, every plan request was refused as a 503 problem.
    const duringOutage = plans.filter((o) => o.started >= downAt && o.ended <= startAt);
    expect(duringOutage.length).toBeGreaterThanOrEqual(IN_FLIGHT);
    expect(duringOutage.map((o) => o.status)).toEqual(duringOutage.map(() => 503));
    for (const refused of plans.filter((o) => o.status === 503)) {
      expect(refused.contentType).toMatch(/^application\/problem\+json/);
      expect(refused.retryAfter).toMatch(/^[1-9]\d*$/);
      expect(refused.body).toEqual({
        type: '/problems/database-unavailable',
        title: 'Service unavailable',
        status: 503,
        detail: expect.any(String),
        instance: '/api/plans',
      });
      expect(refused.text).not.toMatch(/\bat \S+ \(|node_modules|ECONN|terminat|postgres/i);
    }

    // Read in the reader's language, as every problem is.
    expect(inSpanish).toMatchObject({
      status: 503,
      contentType: expect.stringMatching(/^application\/problem\+json/),
      body: { type: '/problems/database-unavailable', title: 'Servicio no disponible' },
    });
    expect(inSpanish!.body.detail).toMatch(/base de datos/);

    // /api/health told of the outage, then of the recovery.
    const healthDown = health.filter((o) => o.started >= downAt && o.ended <= startAt);
    expect(healthDown.length).toBeGreaterThan(0);
    for (const o of healthDown) {
      expect(o.status).toBe(503);
      expect(o.body).toMatchObject({ status: 'degraded', db: 'down' });
    }
    const healthBack = health.find((o) => o.started >= upAt && o.status === 200);
    expect(healthBack?.body).toMatchObject({ status: 'ok', db: 'up' });
    expect(healthBack!.ended - upAt).toBeLessThan(HANG_GUARD_MS);

    // The same instance (never restarted) served again soon after the database was back.
    const firstServed = plans.find((o) => o.status === 201 && o.started >= upAt)!;
    expect(firstServed.ended - upAt).toBeLessThan(HANG_GUARD_MS);
    expect(instance.child.exitCode).toBeNull();

    // Every plan the instance said it created is in the database.
    const ids: string[] = created().map((o) => o.body.id);
    expect(ids.length).toBeGreaterThanOrEqual(3 * IN_FLIGHT);
    const db = new pg.Client({ connectionString: cluster.url });
    await db.connect();
    try {
      const found = await db.query('SELECT id FROM session_plan WHERE id = ANY($1::uuid[])', [ids]);
      expect(found.rows.map((row) => row['id']).sort()).toEqual([...ids].sort());
    } finally {
      await db.end();
    }
    // And readable through the API.
    const read = await instance.api.get(`/api/plans/${ids[0]}`, { token: club.token });
    expect(read.status).toBe(200);
  });
});
