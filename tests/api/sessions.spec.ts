/**
 * Sessions a person can end: sign out (this device), sign out everywhere, a new password. Each is
 * checked against the real PostgreSQL through the running API, including a second instance that
 * shares the database, since the check lives in the per-request membership read.
 */
import jwt from 'jsonwebtoken';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AuthResponse } from '../../shared/types/api';
import {
  registerClub,
  startTwoInstances,
  TEST_PASSWORD,
  type SignedIn,
  type TestApp,
} from '../support/api-test-app';

describe('sessions: sign out, sign out everywhere, change password', () => {
  let app: TestApp;
  let second: TestApp;
  let instances: Awaited<ReturnType<typeof startTwoInstances>>;
  beforeAll(async () => {
    instances = await startTwoInstances();
    ({ app, second } = instances);
  });
  afterAll(() => instances.close());

  const signIn = async (lead: SignedIn, password = TEST_PASSWORD): Promise<string> => {
    const response = await app.api.post('/api/auth/login', { email: lead.user.email, password });
    expect(response.status, response.text).toBe(200);
    return (response.body as AuthResponse).token;
  };
  const me = (token: string, on: TestApp = app) =>
    on.api.get('/api/auth/me', { token }).then((r) => r.status);

  it('signing out ends that session only, on every instance, and the token carries an id and a version', async () => {
    const lead = await registerClub(app, 'Signout Town');
    const phone = await signIn(lead);
    const tablet = await signIn(lead);
    const claims = jwt.decode(phone) as jwt.JwtPayload;
    expect(claims.jti).toMatch(/^[0-9a-f-]{36}$/);
    expect(claims['ver']).toBe(0);
    expect(await me(phone, second)).toBe(200);

    const out = await app.api.post('/api/auth/sign-out', {}, { token: phone });
    expect(out.status, out.text).toBe(204);
    expect(await me(phone)).toBe(401);
    expect(await me(phone, second)).toBe(401);
    // The tablet and the first session are untouched.
    expect(await me(tablet)).toBe(200);
    expect(await me(lead.token, second)).toBe(200);
    // Signing out twice is not an error the coach sees: the token is already refused.
    expect((await app.api.post('/api/auth/sign-out', {}, { token: phone })).status).toBe(401);
  });

  it('signing out everywhere ends every session of that person and no one else’s', async () => {
    const lead = await registerClub(app, 'Everywhere Vale');
    const other = await registerClub(app, 'Untouched Rovers');
    const phone = await signIn(lead);
    const out = await second.api.post('/api/auth/sign-out-everywhere', {}, { token: phone });
    expect(out.status, out.text).toBe(204);
    expect(await me(phone)).toBe(401);
    expect(await me(lead.token)).toBe(401);
    expect(await me(other.token)).toBe(200);
    // Signing in again works, with the new version.
    const fresh = await signIn(lead);
    expect((jwt.decode(fresh) as jwt.JwtPayload)['ver']).toBe(1);
    expect(await me(fresh, second)).toBe(200);
  });

  it('a new password needs the current one, ends every session, and only the new one signs in', async () => {
    const lead = await registerClub(app, 'Password Park');
    const tablet = await signIn(lead);

    const wrong = await app.api.post(
      '/api/auth/password',
      { currentPassword: 'not-my-password', newPassword: 'a-brand-new-secret-9' },
      { token: lead.token },
    );
    expect(wrong.status).toBe(400);
    expect(wrong.body.errors).toEqual([
      { field: 'currentPassword', message: 'is not your current password' },
    ]);
    expect(await me(tablet)).toBe(200);

    const short = await app.api.post(
      '/api/auth/password',
      { currentPassword: TEST_PASSWORD, newPassword: 'short' },
      { token: lead.token },
    );
    expect(short.status).toBe(400);
    expect(short.body.errors.map((e: { field: string }) => e.field)).toEqual(['newPassword']);

    const same = await app.api.post(
      '/api/auth/password',
      { currentPassword: TEST_PASSWORD, newPassword: TEST_PASSWORD },
      { token: lead.token },
    );
    expect(same.status).toBe(400);
    expect(same.body.errors[0].field).toBe('newPassword');

    const changed = await app.api.post(
      '/api/auth/password',
      { currentPassword: TEST_PASSWORD, newPassword: 'a-brand-new-secret-9' },
      { token: lead.token },
    );
    expect(changed.status, changed.text).toBe(204);
    expect(await me(lead.token)).toBe(401);
    expect(await me(tablet, second)).toBe(401);
    expect(
      (await app.api.post('/api/auth/login', { email: lead.user.email, password: TEST_PASSWORD })).status,
    ).toBe(401);
    expect(await me(await signIn(lead, 'a-brand-new-secret-9'))).toBe(200);
  });

  it('a token signed before token ids is still honoured, and signing it out ends every session', async () => {
    const lead = await registerClub(app, 'Old Token Athletic');
    const old = jwt.sign({ club: lead.user.clubId }, app.config.jwtSecret, {
      algorithm: 'HS256',
      subject: lead.user.id,
      expiresIn: 600,
    });
    expect(await me(old)).toBe(200);
    expect((await app.api.post('/api/auth/sign-out', {}, { token: old })).status).toBe(204);
    expect(await me(old)).toBe(401);
    expect(await me(lead.token)).toBe(401);
  });

  it('a signed-out token is kept only until it would have expired', async () => {
    const lead = await registerClub(app, 'Tidy Tables');
    const token = await signIn(lead);
    const { jti } = jwt.decode(token) as jwt.JwtPayload;
    await app.dataSource.query(
      `INSERT INTO revoked_token (jti, "expiresAt") VALUES (gen_random_uuid(), now() - interval '1 minute')`,
    );
    expect((await app.api.post('/api/auth/sign-out', {}, { token })).status).toBe(204);
    const rows = (await app.dataSource.query(
      `SELECT jti, "expiresAt" > now() AS live FROM revoked_token WHERE "expiresAt" < now() OR jti = $1`,
      [jti],
    )) as { jti: string; live: boolean }[];
    expect(rows).toEqual([{ jti, live: true }]);
  });
});
