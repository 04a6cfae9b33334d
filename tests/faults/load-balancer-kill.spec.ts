/**
 * Two API instances behind nginx, coaches making and reading plans through it, and one instance
 * killed outright (SIGKILL to its whole process group) in the middle. Only the requests it was
 * working on may fail; everything after goes to the survivor; every plan answered 201 is there;
 * and an e-mail the dead instance had taken from the outbox is sent once, by the survivor, after
 * the dead one's lease on it has run out.
 */
import { randomBytes, randomUUID } from 'node:crypto';
import { connect } from 'node:net';
import type { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createDataSource } from '../../server/data-source';
import { startThrowawayCluster, type PgCluster } from '../../server/db/pg-cluster';
import { startFakeSmtp, type CaughtMail, type FakeSmtp } from '../../server/mail/fake-smtp';
import { createSquad, planRequest } from '../api/fixtures/plan-helpers';
import type { ApiResponse } from '../support/api-client';
import { groupAlive, startInstance, stopInstance, type ApiInstance } from '../support/api-instance';
import { TEST_PASSWORD, uniqueEmail } from '../support/api-test-app';
import { startLoadBalancer, UPSTREAM_HEADER, type LoadBalancer } from '../support/load-balancer';

/** How long a sender keeps a message it has taken; short, so the test sees it run out. */
const LEASE_MS = 3_000;
/** Concurrent coaches sending requests through nginx. */
const COACHES = 4;

/** One request sent through nginx and what became of it. */
interface Sent {
  method: string;
  path: string;
  /** Sent once the killed instance's port refused connections (not while it was dying). */
  startedAfterKill: boolean;
  done: boolean;
  status?: number;
  /** Which instance(s) nginx tried, from the answer's header. */
  upstream?: string | null;
  createdId?: string;
  error?: string;
}

const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

/** Polls until `ready()` holds; fails naming what it waited for. A hang guard, not a timing check. */
async function until(ready: () => boolean, what: string, timeoutMs = 60_000): Promise<void> {
  for (const deadline = Date.now() + timeoutMs; !ready(); await sleep(50)) {
    if (Date.now() > deadline) throw new Error(`gave up waiting for ${what} after ${timeoutMs} ms`);
  }
}

/** Whether nothing listens on the loopback port any more. */
function refused(port: number): Promise<boolean> {
  return new Promise((resolve) => {
    const socket = connect(port, '127.0.0.1');
    socket.once('connect', () => {
      socket.destroy();
      resolve(false);
    });
    socket.once('error', (error: NodeJS.ErrnoException) => resolve(error.code === 'ECONNREFUSED'));
  });
}

describe('an API instance killed behind nginx', () => {
  let cluster: PgCluster;
  /** The mail server B sends to. */
  let smtp: FakeSmtp;
  /** The mail server A sends to: it hangs on recipients starting "held-". */
  let smtpA: FakeSmtp;
  let a: ApiInstance;
  let b: ApiInstance;
  let balancer: LoadBalancer;
  /** For looking at what was stored. */
  let db: DataSource;

  beforeAll(async () => {
    cluster = await startThrowawayCluster(() => undefined);
    smtp = await startFakeSmtp();
    smtpA = await startFakeSmtp({ stall: (recipient) => recipient.startsWith('held-') });
    const env = {
      DATABASE_URL: cluster.url,
      JWT_SECRET: randomBytes(32).toString('hex'),
      SMTP_HOST: '127.0.0.1',
      AUTH_RATE_MAX: '10000',
      // nginx on this machine: its X-Forwarded-For is believed.
      TRUST_PROXY: 'loopback',
      OUTBOX_LEASE_MS: String(LEASE_MS),
    };
    // A looks at the outbox far more often than B, so it is A that takes the mail queued through
    // it (the test checks that it did, and queues another when B was quicker).
    a = await startInstance({ ...env, SMTP_PORT: String(smtpA.port), OUTBOX_POLL_MS: '50' });
    b = await startInstance({ ...env, SMTP_PORT: String(smtp.port), OUTBOX_POLL_MS: '1000' });
    // An instance that failed is tried again after a second, so requests after the kill meet the
    // dead one too and must be passed on to the survivor.
    balancer = await startLoadBalancer([a.port, b.port], { failTimeoutSeconds: 1 });
    db = await createDataSource({ url: cluster.url, poolSize: 2 }).initialize();
  });

  afterAll(async () => {
    await db?.destroy();
    await balancer?.stop();
    await Promise.all([a && stopInstance(a.child), b && stopInstance(b.child)]);
    await Promise.all([smtp?.stop(), smtpA?.stop()]);
    await cluster?.stop();
  });

  /** What both mail servers caught for `email`. */
  const caughtFor = (email: string): CaughtMail[] =>
    [...smtp.messages(), ...smtpA.messages()].filter((m) => m.to.includes(email));

  it('fails only what the killed instance had in flight, keeps every 201, and sends its mail once', async () => {
    const aAddress = `127.0.0.1:${a.port}`;
    const bAddress = `127.0.0.1:${b.port}`;

    // A club and a squad, made through nginx; the lead confirms their address to invite people.
    const leadEmail = uniqueEmail('lead');
    const registered = await balancer.api.post('/api/auth/register', {
      clubName: 'Harbour Lights Juniors',
      name: 'Nell Harbour',
      email: leadEmail,
      password: TEST_PASSWORD,
    });
    expect(registered.status, registered.text).toBe(201);
    const token: string = registered.body.token;
    await until(() => caughtFor(leadEmail).length > 0, 'the confirmation e-mail');
    const link = /\/confirm-email#([\w-]+)/.exec(caughtFor(leadEmail)[0]!.text);
    expect(link, 'a confirmation link').not.toBeNull();
    expect((await balancer.api.post('/api/auth/email-confirmation', { token: link![1] })).status).toBe(204);
    const squad = await createSquad(balancer, token, 8, 'U10 Kites');

    // Coaches make plans and read them back, through nginx, until told to stop.
    const sent: Sent[] = [];
    // A kill takes a moment: from the signal until its port refuses connections, the dying
    // instance still takes them. A request in flight at the signal, or sent while it was dying,
    // was in flight at the kill.
    let dying = false;
    let killed = false;
    const inFlight = new Set<Sent>();
    let stopping = false;
    const send = async (method: string, path: string, body?: unknown): Promise<ApiResponse | null> => {
      const record: Sent = { method, path, startedAfterKill: killed, done: false };
      sent.push(record);
      if (dying && !killed) inFlight.add(record);
      try {
        const response = await balancer.api.call(method, path, { token, body });
        record.status = response.status;
        record.upstream = response.headers.get(UPSTREAM_HEADER);
        if (response.status === 201) record.createdId = response.body.id;
        return response;
      } catch (error) {
        record.error = String((error as Error & { cause?: unknown }).cause ?? error);
        return null;
      } finally {
        record.done = true;
      }
    };
    const coach = async (n: number) => {
      for (let round = 0; !stopping; round++) {
        const created = await send('POST', '/api/plans', {
          teamId: squad.teamId,
          date: '2027-03-06',
          request: planRequest(squad.playerIds, { seed: `load-${n}-${round}` }),
        });
        if (created?.status === 201) await send('GET', `/api/plans/${created.body.id}`);
        if (round % 3 === 0) await send('GET', '/api/teams');
      }
    };
    const coaches = Array.from({ length: COACHES }, (_, n) => coach(n));

    try {
      await until(
        () =>
          sent.filter((r) => r.status === 201).length >= 12 &&
          sent.some((r) => r.upstream === aAddress) &&
          sent.some((r) => r.upstream === bAddress),
        'plans answered by both instances',
        120_000,
      );

      // An invitation queued through A directly, until A is the sender that took one (its mail
      // server hangs on it, so A is stuck mid-send holding the lease).
      const invited: string[] = [];
      let held: string | null = null;
      for (let attempt = 0; !held && attempt < 10; attempt++) {
        const email = `held-${attempt}-${randomUUID().slice(0, 8)}@example.org`;
        invited.push(email);
        const invitation = await a.api.post('/api/invitations', { email, role: 'assistant' }, { token });
        expect(invitation.status, invitation.text).toBe(201);
        await until(
          () => smtpA.stalled().includes(email) || caughtFor(email).length > 0,
          `a sender taking the invitation to ${email}`,
        );
        if (smtpA.stalled().includes(email)) held = email;
      }
      expect(held, 'A took one of the invitations').not.toBeNull();

      // SIGKILL to A's whole process group, mid-load: no shutdown, no goodbyes.
      for (const r of sent) if (!r.done) inFlight.add(r);
      dying = true;
      process.kill(-a.child.pid!, 'SIGKILL');
      for (const deadline = Date.now() + 10_000; !(await refused(a.port)); await sleep(5)) {
        if (Date.now() > deadline) throw new Error("A's port still takes connections 10 s after SIGKILL");
      }
      killed = true;
      await until(() => !groupAlive(a.child.pid!), 'A and its process group gone', 10_000);

      // Carry on until plenty has been answered since, including requests nginx sent to the dead
      // instance first (it is tried again once its fail_timeout is up).
      const metDead = (r: Sent) => !!r.upstream?.includes(aAddress);
      await until(
        () => {
          const since = sent.filter((r) => r.startedAfterKill && r.done);
          return since.length >= 24 && since.some(metDead);
        },
        'requests answered after the kill, one of them sent to the dead instance first',
        120_000,
      );
      stopping = true;
      await Promise.all(coaches);

      const told = (r: Sent) => `${r.method} ${r.path}: ${r.status ?? r.error} via ${r.upstream}`;
      const failed = sent.filter((r) => r.error !== undefined || r.status! >= 300);
      for (const r of failed) {
        expect(inFlight.has(r), `${told(r)} failed but was not in flight at the kill`).toBe(true);
        // A POST the dead instance had received is not sent to another: it answers 502 from A alone.
        if (r.status !== undefined) expect([r.status, r.upstream], told(r)).toEqual([502, aAddress]);
      }
      expect(failed.length).toBeLessThanOrEqual(inFlight.size);
      // Everything sent after the kill is answered, what nginx tried on the dead instance too.
      const after = sent.filter((r) => r.startedAfterKill);
      expect(after.filter((r) => r.status === undefined || r.status >= 300).map(told)).toEqual([]);
      expect(after.filter(metDead).every((r) => r.upstream === `${aAddress}, ${bAddress}`)).toBe(true);

      // Every plan answered 201 is stored: each read through the survivor itself.
      const answered = sent.filter((r) => r.status === 201).map((r) => r.createdId!);
      for (const id of answered) {
        const read = await b.api.get(`/api/plans/${id}`, { token });
        expect(read.status, `plan ${id}`).toBe(200);
      }
      // And nothing more, apart from POSTs whose answers the kill cut off.
      const stored = (
        (await db.query('SELECT id FROM session_plan WHERE "teamId" = $1', [squad.teamId])) as {
          id: string;
        }[]
      ).map((row) => row.id);
      expect(stored).toEqual(expect.arrayContaining(answered));
      const unanswered = stored.filter((id) => !answered.includes(id));
      expect(unanswered.length).toBeLessThanOrEqual(failed.filter((r) => r.method === 'POST').length);

      // The invitation A was sending arrives from B once A's lease has run out, and only once.
      await smtp.waitFor((m) => m.to.includes(held!), 30_000);
      await sleep(LEASE_MS + 2_000);
      expect(smtp.messages().filter((m) => m.to.includes(held!))).toHaveLength(1);
      expect(smtpA.messages().filter((m) => m.to.includes(held!))).toHaveLength(0);
      const rows = await db.query('SELECT status, attempts FROM outbox_message WHERE recipients ? $1', [
        held,
      ]);
      // Taken twice: by A, and by B when the lease A held had run out.
      expect(rows).toEqual([{ status: 'sent', attempts: 2 }]);
      // Any invitation B took first was sent once too.
      for (const email of invited) expect(caughtFor(email), email).toHaveLength(1);
    } finally {
      stopping = true;
      await Promise.allSettled(coaches);
    }
  });
});
