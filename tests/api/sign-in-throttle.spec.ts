/**
 * Guessing one account's password: wrong passwords are counted per address in PostgreSQL, so two
 * instances share the count; the lock looks the same for an address with no account; the right
 * password clears the count, and a new password chosen by e-mail lifts a lock at once.
 */
import { createHash } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { LOCK_MINUTES, MAX_FAILURES } from '../../server/services/sign-in-throttle';
import {
  registerClub,
  startTwoInstances,
  TEST_PASSWORD,
  uniqueEmail,
  type TestApp,
} from '../support/api-test-app';

describe('sign-in throttle per account, across instances', () => {
  let app: TestApp;
  let second: TestApp;
  let instances: Awaited<ReturnType<typeof startTwoInstances>>;
  beforeAll(async () => {
    instances = await startTwoInstances();
    ({ app, second } = instances);
  });
  afterAll(() => instances.close());

  const login = (on: TestApp, email: string, password: string) =>
    on.api.post('/api/auth/login', { email, password });

  it(`locks an address after ${MAX_FAILURES} wrong passwords spread over two instances, even for the right one`, async () => {
    const lead = await registerClub(app, 'Guarded Gate');
    for (let i = 0; i < MAX_FAILURES; i++) {
      const wrong = await login(i % 2 ? second : app, lead.user.email, `guess-${i}-password`);
      expect(wrong.status).toBe(401);
    }
    const right = await login(second, lead.user.email.toUpperCase(), TEST_PASSWORD);
    expect(right.status).toBe(429);
    expect(right.body.detail).toMatch(new RegExp(`Try again in ${LOCK_MINUTES} minutes`));
    expect(right.body.detail).toContain('Forgot your password?');
    // Retry-After says when, in seconds (RFC 9110 10.2.3): within the lock's length.
    const retryAfter = Number(right.headers.get('retry-after'));
    expect(retryAfter).toBeGreaterThan((LOCK_MINUTES - 1) * 60);
    expect(retryAfter).toBeLessThanOrEqual(LOCK_MINUTES * 60);
    // Sessions already open are not touched by someone guessing.
    expect((await app.api.get('/api/auth/me', { token: lead.token })).status).toBe(200);

    // Once the lock has passed, the right password works and the count starts again.
    await app.dataSource.query(
      `UPDATE sign_in_throttle SET "lockedUntil" = now() - interval '1 second' WHERE email = $1`,
      [lead.user.email],
    );
    expect((await login(app, lead.user.email, TEST_PASSWORD)).status).toBe(200);
    const rows = (await app.dataSource.query('SELECT 1 FROM sign_in_throttle WHERE email = $1', [
      lead.user.email,
    ])) as unknown[];
    expect(rows).toEqual([]);
  });

  it('answers an address with no account the same way, so the lock reveals nothing', async () => {
    const nobody = uniqueEmail('nobody');
    const statuses: number[] = [];
    for (let i = 0; i <= MAX_FAILURES; i++) statuses.push((await login(app, nobody, `guess-${i}-pw`)).status);
    expect(statuses).toEqual([...Array(MAX_FAILURES).fill(401), 429]);
  });

  it('a right password clears the count, so a coach who mistypes now and then is never locked', async () => {
    const lead = await registerClub(app, 'Fumble Fingers FC');
    for (let round = 0; round < 3; round++) {
      for (let i = 0; i < MAX_FAILURES - 1; i++) await login(app, lead.user.email, 'typo-password');
      expect((await login(second, lead.user.email, TEST_PASSWORD)).status).toBe(200);
    }
  });

  it('a new password chosen by e-mail lifts the lock at once', async () => {
    const lead = await registerClub(app, 'Locked Out Lions');
    for (let i = 0; i < MAX_FAILURES; i++) await login(app, lead.user.email, `guess-${i}-password`);
    expect((await login(app, lead.user.email, TEST_PASSWORD)).status).toBe(429);
    // A reset link of known secret stands in for the e-mailed one (the password-reset suite
    // covers the e-mail itself).
    const token = 'k'.repeat(43);
    await app.dataSource.query(
      `INSERT INTO password_reset ("userId", "tokenHash", "expiresAt") VALUES ($1, $2, now() + interval '30 minutes')`,
      [lead.user.id, createHash('sha256').update(token).digest('hex')],
    );
    const reset = await app.api.post('/api/auth/password-reset/confirm', {
      token,
      password: 'unlocked-secret-42',
    });
    expect(reset.status, reset.text).toBe(204);
    expect((await login(second, lead.user.email, 'unlocked-secret-42')).status).toBe(200);
  });
});
