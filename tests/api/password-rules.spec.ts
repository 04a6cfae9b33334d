/**
 * The rules for a chosen password, on the four routes where one is chosen (create a club, accept
 * an invitation, change it, choose a new one from an e-mailed link), against the real PostgreSQL:
 * at least 12 characters (OWASP ASVS 4.0 2.1.1), not one of the most common passwords ignoring
 * case (OWASP ASVS 4.0 2.1.7), each refusal a 400 problem naming the field with its reason; and
 * signing in still takes a password chosen under the older 8-character minimum.
 */
import { randomBytes } from 'node:crypto';
import { dictionary } from '@zxcvbn-ts/language-common';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { MIN_PASSWORD_LENGTH } from '../../shared/types/password-rules';
import { Invitation } from '../../server/entities/invitation';
import { Membership } from '../../server/entities/membership';
import { User } from '../../server/entities/user';
import { hashPassword } from '../../server/services/auth-service';
import { hashLinkToken } from '../../server/services/link-token';
import { commonPasswordMessage, isCommonPassword } from '../../server/services/password-policy';
import {
  registerClub,
  startTestApp,
  TEST_PASSWORD,
  uniqueEmail,
  type SignedIn,
  type TestApp,
} from '../support/api-test-app';

/** One character short of the minimum. */
const SHORT = 'kite-runner';
/** On the shipped list (asserted below), and long enough for the length rule. */
const COMMON = 'password1234';
/** The same, typed with capitals: still refused. */
const COMMON_CAPITALISED = 'PassWord1234';
const GOOD = 'seven-kites-over-wembley';

interface Problem {
  status: number;
  title: string;
  errors: { field: string; message: string }[];
}

function problem(response: { status: number; headers: Headers; text: string }): Problem {
  expect(response.status, response.text).toBe(400);
  expect(response.headers.get('content-type')).toMatch(/^application\/problem\+json/);
  return JSON.parse(response.text) as Problem;
}

/** The 400 for a too-short password names only that field, in words. */
function expectTooShort(response: { status: number; headers: Headers; text: string }, field: string) {
  expect(problem(response).errors).toEqual([
    { field, message: `needs at least ${MIN_PASSWORD_LENGTH} characters` },
  ]);
}

/** The 400 for a common password names only that field and says why. */
function expectCommon(response: { status: number; headers: Headers; text: string }, field: string) {
  const body = problem(response);
  expect(body.errors).toEqual([{ field, message: commonPasswordMessage() }]);
  expect(body.errors[0]!.message).toMatch(/most commonly used/);
}

describe('choosing a password', () => {
  let app: TestApp;
  let lead: SignedIn;
  beforeAll(async () => {
    app = await startTestApp();
    lead = await registerClub(app, 'Password Rules FC');
  });
  afterAll(() => app.close());

  const signsIn = async (email: string, password: string) =>
    (await app.api.post('/api/auth/login', { email, password })).status;

  it('the test passwords are what they claim: one short, one on the shipped list, one fine', () => {
    // OWASP ASVS 4.0 2.1.1: at least 12 characters.
    expect(MIN_PASSWORD_LENGTH).toBe(12);
    expect(SHORT).toHaveLength(MIN_PASSWORD_LENGTH - 1);
    expect(COMMON.length).toBeGreaterThanOrEqual(MIN_PASSWORD_LENGTH);
    expect(dictionary['passwords-common']).toContain(COMMON);
    expect(dictionary['passwords-common']).not.toContain(COMMON_CAPITALISED);
    expect(isCommonPassword(COMMON_CAPITALISED)).toBe(true);
    expect(isCommonPassword(GOOD)).toBe(false);
    expect(isCommonPassword(TEST_PASSWORD)).toBe(false);
  });

  it('creating a club: too short and common are refused under "password"; a good one makes the club', async () => {
    const body = (password: string, email = uniqueEmail('rules')) => ({
      clubName: 'Rules Rovers',
      name: 'Rhea Rules',
      email,
      password,
    });
    const shortEmail = uniqueEmail('short');
    expectTooShort(await app.api.post('/api/auth/register', body(SHORT, shortEmail)), 'password');
    const commonEmail = uniqueEmail('common');
    expectCommon(await app.api.post('/api/auth/register', body(COMMON, commonEmail)), 'password');
    expectCommon(await app.api.post('/api/auth/register', body(COMMON_CAPITALISED)), 'password');
    // Nothing was made for the refused ones.
    const made = await app.dataSource
      .getRepository(User)
      .countBy([{ email: shortEmail }, { email: commonEmail }]);
    expect(made).toBe(0);

    const good = await app.api.post('/api/auth/register', body(GOOD, commonEmail));
    expect(good.status, good.text).toBe(201);
    expect(await signsIn(commonEmail, GOOD)).toBe(200);
  });

  it('accepting an invitation: too short and common are refused under "password"; a good one joins', async () => {
    const token = randomBytes(32).toString('base64url');
    const email = uniqueEmail('invited');
    await app.dataSource.getRepository(Invitation).save({
      clubId: lead.user.clubId,
      email,
      role: 'coach',
      teamId: null,
      tokenHash: hashLinkToken(token),
      expiresAt: new Date(Date.now() + 60 * 60_000),
      acceptedAt: null,
      invitedById: lead.user.id,
    });
    const accept = (password: string) =>
      app.api.post('/api/invitations/accept', { token, name: 'Ivy Invited', password });
    expectTooShort(await accept(SHORT), 'password');
    expectCommon(await accept(COMMON), 'password');
    // The refusals used nothing up: the link still works.
    const joined = await accept(GOOD);
    expect(joined.status, joined.text).toBe(201);
    expect(joined.body.user).toMatchObject({ email, clubId: lead.user.clubId });
    expect(await signsIn(email, GOOD)).toBe(200);
  });

  it('changing a password: too short and common are refused under "newPassword"; a good one is set', async () => {
    const me = await registerClub(app, 'Change Rules FC');
    const change = (newPassword: string) =>
      app.api.post('/api/auth/password', { currentPassword: me.password, newPassword }, { token: me.token });
    expectTooShort(await change(SHORT), 'newPassword');
    expectCommon(await change(COMMON_CAPITALISED), 'newPassword');
    // Refused: the old password and the session are untouched.
    expect(await signsIn(me.user.email, me.password)).toBe(200);
    expect((await app.api.get('/api/auth/me', { token: me.token })).status).toBe(200);

    const changed = await change(GOOD);
    expect(changed.status, changed.text).toBe(204);
    expect(await signsIn(me.user.email, GOOD)).toBe(200);
    expect(await signsIn(me.user.email, me.password)).toBe(401);
  });

  it('choosing a new password from an e-mailed link: too short and common are refused under "password"; a good one is set', async () => {
    const me = await registerClub(app, 'Reset Rules FC');
    expect((await app.api.post('/api/auth/password-reset', { email: me.user.email })).status).toBe(202);
    const [mail] = (await app.dataSource.query(
      `SELECT "textBody" FROM outbox_message WHERE kind = 'password-reset' AND recipients @> $1::jsonb`,
      [JSON.stringify([me.user.email])],
    )) as { textBody: string }[];
    const token = /\/reset-password#([A-Za-z0-9_-]+)/.exec(mail!.textBody)![1]!;
    const confirm = (password: string) =>
      app.api.post('/api/auth/password-reset/confirm', { token, password });
    expectTooShort(await confirm(SHORT), 'password');
    expectCommon(await confirm(COMMON), 'password');
    expect(await signsIn(me.user.email, me.password)).toBe(200);

    const set = await confirm(GOOD);
    expect(set.status, set.text).toBe(204);
    expect(await signsIn(me.user.email, GOOD)).toBe(200);
  });

  it('signing in still takes a password chosen under the older 8-character minimum, and a common one', async () => {
    for (const old of ['kite-42!', 'password']) {
      expect(old).toHaveLength(8);
      const email = uniqueEmail('older');
      const user = await app.dataSource
        .getRepository(User)
        .save({ email, name: 'Olly Older', passwordHash: await hashPassword(old) });
      await app.dataSource
        .getRepository(Membership)
        .save({ clubId: lead.user.clubId, userId: user.id, role: 'coach' });
      const signedIn = await app.api.post('/api/auth/login', { email, password: old });
      expect(signedIn.status, signedIn.text).toBe(200);
      expect(signedIn.body.user.email).toBe(email);
    }
  });
});
