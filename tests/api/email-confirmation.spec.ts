import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  clubWithStaff,
  linkTokenFor,
  newestMail,
  registerClub,
  startTestApp,
  TEST_PASSWORD,
  uniqueEmail,
  type TestApp,
} from '../support/api-test-app';
import { createPlan, createSquad } from './fixtures/plan-helpers';

const CONFIRM = { kind: 'email-verification', path: '/confirm-email' } as const;

describe('confirming a new account’s e-mail address', () => {
  let app: TestApp;
  beforeAll(async () => {
    app = await startTestApp();
  });
  afterAll(() => app.close());

  const confirmToken = (email: string) => linkTokenFor(app, email, CONFIRM.kind, CONFIRM.path);

  it('a new lead can plan but not invite or share until the mailed link is opened', async () => {
    const email = uniqueEmail('new-lead');
    const lead = await registerClub(app, 'Unconfirmed Rovers', { confirmed: false, email });
    expect(lead.user.emailVerified).toBe(false);
    expect((await app.api.get('/api/auth/me', { token: lead.token })).body.emailVerified).toBe(false);

    const mail = await newestMail(app, email, CONFIRM.kind);
    expect(mail.textBody).toContain(`${app.config.publicUrl}/confirm-email#`);
    expect(mail.textBody).not.toMatch(/[?&]token=/);
    const stored = (await app.dataSource.query(
      `SELECT "tokenHash" FROM email_verification v JOIN app_user u ON u.id = v."userId" WHERE u.email = $1`,
      [email],
    )) as { tokenHash: string }[];
    const token = await confirmToken(email);
    // Only a hash is kept, never the token itself.
    expect(stored).toHaveLength(1);
    expect(stored[0]!.tokenHash).toMatch(/^[0-9a-f]{64}$/);
    expect(stored[0]!.tokenHash).not.toBe(token);

    // Planning works.
    const squad = await createSquad(app, lead.token, 10, 'U9 Finches');
    const plan = await createPlan(app, lead.token, squad);
    // Mail to others does not.
    const invite = await app.api.post(
      '/api/invitations',
      { email: uniqueEmail('friend'), role: 'coach' },
      { token: lead.token },
    );
    expect(invite.status).toBe(403);
    expect(invite.body.type).toBe('/problems/email-not-confirmed');
    expect(invite.body.detail).toContain(email);
    const share = await app.api.post(
      `/api/plans/${plan.id}/share`,
      { recipients: ['a.parent@example.org'] },
      { token: lead.token },
    );
    expect(share.status).toBe(403);
    expect(share.body.type).toBe('/problems/email-not-confirmed');

    expect((await app.api.post('/api/auth/email-confirmation', { token })).status).toBe(204);
    expect((await app.api.get('/api/auth/me', { token: lead.token })).body.emailVerified).toBe(true);
    const invited = await app.api.post(
      '/api/invitations',
      { email: uniqueEmail('friend'), role: 'coach' },
      { token: lead.token },
    );
    expect(invited.status).toBe(201);

    // The link works once.
    const again = await app.api.post('/api/auth/email-confirmation', { token });
    expect(again.status).toBe(400);
    expect(again.body.errors).toEqual([{ field: 'token', message: 'is used or out of date' }]);
  });

  it('a link out of date is refused; another can be asked for, three an hour at most', async () => {
    const email = uniqueEmail('slow-lead');
    const lead = await registerClub(app, 'Slow Readers FC', { confirmed: false, email });
    const first = await confirmToken(email);
    await app.dataSource.query(
      `UPDATE email_verification SET "expiresAt" = now() - interval '1 minute'
        WHERE "userId" = $1`,
      [lead.user.id],
    );
    expect((await app.api.post('/api/auth/email-confirmation', { token: first })).status).toBe(400);

    // Registering sent one; two more this hour, then the newest has to do.
    const outcomes: string[] = [];
    for (let i = 0; i < 3; i++) {
      const asked = await app.api.post('/api/auth/email-confirmation/resend', {}, { token: lead.token });
      outcomes.push(`${asked.status} ${asked.body.outcome}`);
    }
    expect(outcomes).toEqual(['202 sent', '202 sent', '200 wait']);
    const newest = await confirmToken(email);
    expect(newest).not.toBe(first);
    expect((await app.api.post('/api/auth/email-confirmation', { token: newest })).status).toBe(204);

    const done = await app.api.post('/api/auth/email-confirmation/resend', {}, { token: lead.token });
    expect(done.status).toBe(200);
    expect(done.body).toMatchObject({ outcome: 'confirmed', message: `${email} is confirmed already.` });
    expect((await app.api.post('/api/auth/email-confirmation/resend', {})).status).toBe(401);
  });

  it('choosing a new password through a mailed link confirms the address too', async () => {
    const email = uniqueEmail('forgetful');
    const lead = await registerClub(app, 'Forgetful FC', { confirmed: false, email });
    expect((await app.api.post('/api/auth/password-reset', { email })).status).toBe(202);
    const token = await linkTokenFor(app, email, 'password-reset', '/reset-password');
    const newPassword = `${TEST_PASSWORD}-new`;
    expect(
      (await app.api.post('/api/auth/password-reset/confirm', { token, password: newPassword })).status,
    ).toBe(204);
    const login = await app.api.post('/api/auth/login', { email, password: newPassword });
    expect(login.body.user).toMatchObject({ id: lead.user.id, emailVerified: true });
  });

  it('someone else’s unconfirmed registration of an address does not block inviting its owner', async () => {
    const club = await clubWithStaff(app, 'Rightful Owners FC');
    const email = uniqueEmail('owner');
    // A stranger registers the coach's address first and never confirms it.
    const squatter = await registerClub(app, 'Squatters United', { confirmed: false, email });
    const squatterTeam = await createSquad(app, squatter.token, 3, 'U8 Squat');

    const invited = await app.api.post(
      '/api/invitations',
      { email, role: 'coach' },
      { token: club.lead.token },
    );
    expect(invited.status).toBe(201);
    const token = await linkTokenFor(app, email, 'invitation', '/join');
    const joined = await app.api.post('/api/invitations/accept', {
      token,
      name: 'Olive Owner',
      password: TEST_PASSWORD,
    });
    expect(joined.status, joined.text).toBe(201);
    expect(joined.body.user).toMatchObject({
      email,
      clubId: club.lead.user.clubId,
      role: 'coach',
      emailVerified: true,
    });

    // The unconfirmed account, its club and what was made in it are gone.
    expect((await app.api.get('/api/auth/me', { token: squatter.token })).status).toBe(401);
    const left = (await app.dataSource.query(
      `SELECT (SELECT count(*)::int FROM club WHERE id = $1) AS clubs,
              (SELECT count(*)::int FROM team WHERE id = $2) AS teams,
              (SELECT count(*)::int FROM player WHERE "teamId" = $2) AS players`,
      [squatter.user.clubId, squatterTeam.teamId],
    )) as { clubs: number; teams: number; players: number }[];
    expect(left[0]).toEqual({ clubs: 0, teams: 0, players: 0 });
    const login = await app.api.post('/api/auth/login', { email, password: TEST_PASSWORD });
    expect(login.body.user).toMatchObject({ name: 'Olive Owner', clubId: club.lead.user.clubId });
  });
});

describe('daily limits on mail a club sends to others', () => {
  let app: TestApp;
  beforeAll(async () => {
    app = await startTestApp({ dailyMailLimits: { invitations: 2, shares: 3 } });
  });
  afterAll(() => app.close());

  it('invitations stop at the limit with 429, Retry-After and words; other clubs are unaffected', async () => {
    const club = await clubWithStaff(app, 'Busy Inviters');
    const other = await clubWithStaff(app, 'Quiet Inviters');
    const invite = (token: string) =>
      app.api.post('/api/invitations', { email: uniqueEmail('guest'), role: 'assistant' }, { token });
    expect((await invite(club.lead.token)).status).toBe(201);
    expect((await invite(club.lead.token)).status).toBe(201);
    const refused = await invite(club.lead.token);
    expect(refused.status).toBe(429);
    const retryAfter = Number(refused.headers.get('retry-after'));
    expect(retryAfter).toBeGreaterThan(23 * 3600);
    expect(retryAfter).toBeLessThanOrEqual(24 * 3600);
    expect(refused.body.detail).toBe(
      'Your club can send 2 invitations in any 24 hours, and has sent them all. Try again in 24 hours.',
    );
    expect((await invite(other.lead.token)).status).toBe(201);

    // A day later the oldest have aged out.
    await app.dataSource.query(
      `UPDATE outbox_message SET "createdAt" = now() - interval '25 hours'
        WHERE "clubId" = $1 AND kind = 'invitation'`,
      [club.lead.user.clubId],
    );
    expect((await invite(club.lead.token)).status).toBe(201);
  });

  it('plan e-mails count one per recipient', async () => {
    const club = await clubWithStaff(app, 'Busy Sharers');
    const squad = await createSquad(app, club.coach.token, 10, 'U10 Sharers');
    const plan = await createPlan(app, club.coach.token, squad);
    const share = (recipients: string[]) =>
      app.api.post(`/api/plans/${plan.id}/share`, { recipients }, { token: club.coach.token });
    expect((await share(['one@example.org', 'two@example.org'])).status).toBe(202);
    const tooMany = await share(['three@example.org', 'four@example.org']);
    expect(tooMany.status).toBe(429);
    expect(tooMany.body.detail).toMatch(/^Your club can send 3 plan e-mails in any 24 hours and has 1 left/);
    expect((await share(['three@example.org'])).status).toBe(202);
  });
});
