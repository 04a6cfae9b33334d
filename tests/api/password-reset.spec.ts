/**
 * Choosing a new password by e-mail, against the real PostgreSQL and the local SMTP catcher: the
 * same answer for any address, a single-use link valid 30 minutes kept only as a hash, its secret
 * in the link's fragment, the mail's body cleared once sent, and every session ended by its use.
 */
import { createHash } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mailSettingsFromEnv } from '../../server/mail/mail-settings';
import { OutboxWorker } from '../../server/mail/outbox-worker';
import { startFakeSmtp, type FakeSmtp } from '../../server/mail/fake-smtp';
import { CLEARED_BODY } from '../../server/services/mail-queue';
import { RESETS_PER_HOUR } from '../../server/services/password-reset-service';
import {
  registerClub,
  startTestApp,
  uniqueEmail,
  type SignedIn,
  type TestApp,
} from '../support/api-test-app';

interface OutboxRow {
  id: string;
  recipients: string[];
  textBody: string;
  status: string;
}

describe('password reset by e-mail', () => {
  let app: TestApp;
  let smtp: FakeSmtp;
  let worker: OutboxWorker;
  beforeAll(async () => {
    app = await startTestApp();
    smtp = await startFakeSmtp({ port: 0 });
    worker = new OutboxWorker({
      dataSource: app.dataSource,
      mail: mailSettingsFromEnv({
        host: '127.0.0.1',
        port: smtp.port,
        from: 'Conewise <no-reply@conewise.invalid>',
      }),
      baseDelayMs: 20,
      maxDelayMs: 50,
    });
  });
  afterAll(async () => {
    await worker.stop();
    await smtp.stop();
    await app.close();
  });

  const resetMails = (email: string) =>
    app.dataSource.query(
      `SELECT id, recipients, "textBody", status FROM outbox_message WHERE kind = 'password-reset' AND recipients @> $1::jsonb ORDER BY "createdAt"`,
      [JSON.stringify([email])],
    ) as Promise<OutboxRow[]>;
  const linkIn = (text: string) => /http:\/\/conewise\.test\/reset-password#([A-Za-z0-9_-]{43})/.exec(text);
  const ask = (email: string) => app.api.post('/api/auth/password-reset', { email });
  const me = async (token: string) => (await app.api.get('/api/auth/me', { token })).status;

  it('answers the same for an unknown address and a known one, and mails only the known one', async () => {
    const lead = await registerClub(app, 'Reset Rovers');
    const stranger = uniqueEmail('nobody');
    const unknown = await ask(stranger);
    const known = await ask(lead.user.email.toUpperCase());
    expect(unknown.status).toBe(202);
    expect(known.status).toBe(202);
    expect(known.body).toEqual(unknown.body);
    expect(known.body.message).toMatch(/If an account uses this address/);
    expect(await resetMails(stranger)).toEqual([]);
    const [mail] = await resetMails(lead.user.email);
    expect(mail).toBeDefined();
    // The secret is in the fragment: nothing after the path reaches a server's request log.
    const link = linkIn(mail!.textBody);
    expect(link, mail!.textBody).not.toBeNull();
    expect(mail!.textBody).not.toMatch(/reset-password\?/);
    // Only its hash is stored.
    const rows = (await app.dataSource.query(
      `SELECT "tokenHash", "expiresAt" - now() AS ttl FROM password_reset WHERE "userId" = $1`,
      [lead.user.id],
    )) as { tokenHash: string; ttl: { minutes?: number; seconds?: number } }[];
    expect(rows).toHaveLength(1);
    expect(rows[0]!.tokenHash).toBe(createHash('sha256').update(link![1]!).digest('hex'));
    expect(rows[0]!.tokenHash).not.toContain(link![1]!);
    expect(rows[0]!.ttl.minutes).toBe(29);
  });

  it('sends the mail, clears its body once sent, and the link sets a new password once, ending every session', async () => {
    const lead: SignedIn = await registerClub(app, 'Link Lane');
    expect((await ask(lead.user.email)).status).toBe(202);
    const [queued] = await resetMails(lead.user.email);
    const token = linkIn(queued!.textBody)![1]!;

    await worker.drainOnce();
    // The lead was also sent the link that confirms their address when the club was made.
    const delivered = await smtp.waitFor(
      (m) => m.to.includes(lead.user.email) && m.subject === 'Choose a new Conewise password',
    );
    expect(delivered.subject).toBe('Choose a new Conewise password');
    expect(delivered.text).toContain(`/reset-password#${token}`);
    const [sent] = await resetMails(lead.user.email);
    expect(sent).toMatchObject({ status: 'sent', textBody: CLEARED_BODY });

    const weak = await app.api.post('/api/auth/password-reset/confirm', { token, password: 'short' });
    expect(weak.status).toBe(400);
    expect(weak.body.errors.map((e: { field: string }) => e.field)).toEqual(['password']);

    const used = await app.api.post('/api/auth/password-reset/confirm', {
      token,
      password: 'reset-secret-42',
    });
    expect(used.status, used.text).toBe(204);
    expect(await me(lead.token)).toBe(401);
    expect(
      (await app.api.post('/api/auth/login', { email: lead.user.email, password: lead.password })).status,
    ).toBe(401);
    expect(
      (await app.api.post('/api/auth/login', { email: lead.user.email, password: 'reset-secret-42' })).status,
    ).toBe(200);

    const again = await app.api.post('/api/auth/password-reset/confirm', {
      token,
      password: 'another-secret-42',
    });
    expect(again.status).toBe(400);
    expect(again.body.errors).toEqual([{ field: 'token', message: 'is used or out of date' }]);
    expect(again.body.detail).toMatch(/Ask for a new one/);
  });

  it('refuses a link after 30 minutes, and an older link once a newer one was used', async () => {
    const lead = await registerClub(app, 'Late Link United');
    await ask(lead.user.email);
    await ask(lead.user.email);
    const [first, second] = (await resetMails(lead.user.email)).map((m) => linkIn(m.textBody)![1]!);
    await app.dataSource.query(
      `UPDATE password_reset SET "expiresAt" = now() - interval '1 second' WHERE "tokenHash" = $1`,
      [createHash('sha256').update(first!).digest('hex')],
    );
    const late = await app.api.post('/api/auth/password-reset/confirm', {
      token: first,
      password: 'late-secret-42',
    });
    expect(late.status).toBe(400);
    const third = await ask(lead.user.email);
    expect(third.status).toBe(202);
    const tokens = (await resetMails(lead.user.email)).map((m) => linkIn(m.textBody)![1]!);
    expect(
      (await app.api.post('/api/auth/password-reset/confirm', { token: second, password: 'new-secret-42' }))
        .status,
    ).toBe(204);
    const older = await app.api.post('/api/auth/password-reset/confirm', {
      token: tokens[2],
      password: 'other-secret-42',
    });
    expect(older.status).toBe(400);
  });

  it(`sends at most ${RESETS_PER_HOUR} reset e-mails to one address an hour, answering the same`, async () => {
    const lead = await registerClub(app, 'Quota Town');
    const answers = [];
    for (let i = 0; i < RESETS_PER_HOUR + 2; i++) answers.push(await ask(lead.user.email));
    expect(answers.map((a) => a.status)).toEqual(Array(RESETS_PER_HOUR + 2).fill(202));
    expect(new Set(answers.map((a) => JSON.stringify(a.body))).size).toBe(1);
    expect(await resetMails(lead.user.email)).toHaveLength(RESETS_PER_HOUR);
  });
});
