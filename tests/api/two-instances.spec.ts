/**
 * Issue 4, scaling past one machine: two API processes (server/main.ts) on one database behind
 * no shared memory. What one writes the other reads, a token from one is good at the other,
 * and each queued e-mail is delivered exactly once although both run an outbox sender.
 */
import { randomBytes } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { inject } from 'vitest';
import { startFakeSmtp, type FakeSmtp } from '../../server/mail/fake-smtp';
import { startInstance, stopInstance, type ApiInstance } from '../support/api-instance';
import { TEST_PASSWORD, uniqueEmail } from '../support/api-test-app';

describe('two instances on one database', () => {
  let smtp: FakeSmtp;
  let a: ApiInstance;
  let b: ApiInstance;

  beforeAll(async () => {
    smtp = await startFakeSmtp();
    const env = {
      DATABASE_URL: inject('databaseUrl'),
      JWT_SECRET: randomBytes(32).toString('hex'),
      SMTP_HOST: '127.0.0.1',
      SMTP_PORT: String(smtp.port),
      AUTH_RATE_MAX: '10000',
    };
    [a, b] = await Promise.all([startInstance(env), startInstance(env)]);
  }, 200_000);

  afterAll(async () => {
    await Promise.all([a && stopInstance(a.child), b && stopInstance(b.child)]);
    await smtp?.stop();
  });

  it('a club, a team and a plan created through one are read through the other', async () => {
    const registered = await a.api.post('/api/auth/register', {
      clubName: 'Twin Instance Club',
      name: 'Tess Twin',
      email: uniqueEmail('twin'),
      password: TEST_PASSWORD,
    });
    expect(registered.status).toBe(201);
    const token = registered.body.token;
    const team = await a.api.post(
      '/api/teams',
      { name: 'U10 Twins', ageGroup: 'U10', level: 'beginner', usualSpace: { width: 30, length: 40 } },
      { token },
    );
    expect(team.status).toBe(201);
    const me = await b.api.get('/api/auth/me', { token });
    expect(me.body.id).toBe(registered.body.user.id);
    const read = await b.api.get(`/api/teams/${team.body.id}`, { token });
    expect(read.status).toBe(200);
    expect(read.body.name).toBe('U10 Twins');
    const playerIds: string[] = [];
    for (const displayName of ['Ana T.', 'Bo T.', 'Cy T.', 'Di T.', 'Ed T.', 'Flo T.', 'Gil T.', 'Hal T.']) {
      playerIds.push(
        (await a.api.post(`/api/teams/${team.body.id}/players`, { displayName }, { token })).body.id,
      );
    }
    const plan = await a.api.post(
      '/api/plans',
      {
        teamId: team.body.id,
        request: {
          ageGroup: 'U10',
          level: 'beginner',
          players: playerIds.map((id) => ({ id })),
          coaches: 1,
          equipment: { balls: 10, cones: 30, bibs: 8, goals: 2 },
          space: { width: 30, length: 40 },
          minutes: 15,
          kind: 'match-warm-up',
        },
      },
      { token },
    );
    expect(plan.status, plan.text).toBe(201);
    const planRead = await b.api.get(`/api/plans/${plan.body.id}`, { token });
    expect(planRead.status).toBe(200);
    expect(planRead.body.plan.phases).toEqual(plan.body.plan.phases);

    const login = await b.api.post('/api/auth/login', {
      email: registered.body.user.email,
      password: TEST_PASSWORD,
    });
    expect((await a.api.get('/api/teams', { token: login.body.token })).body).toHaveLength(1);
  });

  it('each invitation e-mail queued through either instance arrives exactly once', async () => {
    const leadEmail = uniqueEmail('mailtwin');
    const registered = await b.api.post('/api/auth/register', {
      clubName: 'Mail Twin Club',
      name: 'Milo Mail',
      email: leadEmail,
      password: TEST_PASSWORD,
    });
    const token = registered.body.token;
    // The lead confirms their address with the link that arrives by mail before inviting anyone.
    let link: RegExpExecArray | null = null;
    for (let waited = 0; !link && waited < 20_000; waited += 200) {
      const mail = smtp.messages().find((m) => m.to.includes(leadEmail));
      link = mail ? /\/confirm-email#([\w-]+)/.exec(mail.text) : null;
      if (!link) await new Promise((resolve) => setTimeout(resolve, 200));
    }
    expect(link, 'the confirmation e-mail arrived').not.toBeNull();
    expect((await a.api.post('/api/auth/email-confirmation', { token: link![1] })).status).toBe(204);
    const recipients = Array.from({ length: 8 }, (_, i) => uniqueEmail(`once${i}`));
    await Promise.all(
      recipients.map((email, i) =>
        (i % 2 ? a : b).api.post('/api/invitations', { email, role: 'assistant' }, { token }),
      ),
    );
    const mine = () => smtp.messages().filter((m) => m.to.some((to) => recipients.includes(to)));
    for (let waited = 0; mine().length < recipients.length && waited < 20_000; waited += 200) {
      await new Promise((resolve) => setTimeout(resolve, 200));
    }
    // Give a second sender the chance to send a duplicate before counting.
    await new Promise((resolve) => setTimeout(resolve, 2_500));
    const received = mine().flatMap((m) => m.to);
    expect(received.sort()).toEqual([...recipients].sort());
  });
});
