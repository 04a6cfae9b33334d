import fc from 'fast-check';
import jwt from 'jsonwebtoken';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { trustProxyFromEnv } from '../../server/config';
import {
  addMember,
  registerClub,
  startTestApp,
  TEST_PASSWORD,
  uniqueEmail,
  type SignedIn,
  type TestApp,
} from '../support/api-test-app';

describe('auth: register, login, me', () => {
  let app: TestApp;
  let lead: SignedIn;
  beforeAll(async () => {
    app = await startTestApp();
    lead = await registerClub(app, 'Auth Test Club');
  });
  afterAll(() => app.close());

  it('register creates a club and its lead and returns a token', async () => {
    const email = uniqueEmail('Founder');
    const response = await app.api.post('/api/auth/register', {
      clubName: '  Hollin Park Youth ',
      name: 'Founding Lead',
      email,
      password: TEST_PASSWORD,
    });
    expect(response.status).toBe(201);
    expect(response.body.user).toMatchObject({
      email: email.toLowerCase(),
      role: 'lead',
      clubName: 'Hollin Park Youth',
    });
    const claims = jwt.decode(response.body.token, { complete: true })!;
    expect(claims.header.alg).toBe('HS256');
    expect((claims.payload as jwt.JwtPayload).exp).toBeGreaterThan(Date.now() / 1000);
  });

  it('register keeps the time zone the browser gave for the club, and London for none or an unknown one', async () => {
    const zoneOf = async (timeZone?: string) => {
      const response = await app.api.post('/api/auth/register', {
        clubName: 'Lakeside Juniors',
        name: 'Zone Lead',
        email: uniqueEmail('zone'),
        password: TEST_PASSWORD,
        ...(timeZone === undefined ? {} : { timeZone }),
      });
      expect(response.status, response.text).toBe(201);
      const rows = (await app.dataSource.query('SELECT "timeZone" FROM club WHERE id = $1', [
        response.body.user.clubId,
      ])) as { timeZone: string }[];
      return rows[0]!.timeZone;
    };
    expect(await zoneOf('America/New_York')).toBe('America/New_York');
    expect(await zoneOf('Mars/Olympus_Mons')).toBe('Europe/London');
    expect(await zoneOf()).toBe('Europe/London');
    const bad = await app.api.post('/api/auth/register', {
      clubName: 'Lakeside Juniors',
      name: 'Zone Lead',
      email: uniqueEmail('zone'),
      password: TEST_PASSWORD,
      timeZone: '<script>',
    });
    expect(bad.status).toBe(400);
    expect(JSON.stringify(bad.body.errors)).toContain('timeZone');
  });

  it('register refuses an e-mail that is already taken (any case) with 409', async () => {
    const response = await app.api.post('/api/auth/register', {
      clubName: 'Another',
      name: 'Someone',
      email: lead.user.email.toUpperCase(),
      password: TEST_PASSWORD,
    });
    expect(response.status).toBe(409);
    expect(response.body.errors[0].field).toBe('email');
  });

  it('login answers a token for the right password and 401 otherwise', async () => {
    const ok = await app.api.post('/api/auth/login', { email: lead.user.email, password: TEST_PASSWORD });
    expect(ok.status).toBe(200);
    expect(ok.body.user.id).toBe(lead.user.id);
    const wrong = await app.api.post('/api/auth/login', {
      email: lead.user.email,
      password: 'not-the-password',
    });
    expect(wrong.status).toBe(401);
    const unknown = await app.api.post('/api/auth/login', { email: uniqueEmail(), password: TEST_PASSWORD });
    expect(unknown.status).toBe(401);
    expect(unknown.body.detail).toBe(wrong.body.detail);
  });

  it('me returns the signed-in user', async () => {
    const response = await app.api.get('/api/auth/me', { token: lead.token });
    expect(response.status).toBe(200);
    expect(response.body).toEqual(lead.user);
  });

  it('me without a token, with a forged token, alg none or an expired token answers 401', async () => {
    const claims = { club: lead.user.clubId, sub: lead.user.id };
    const forged = jwt.sign(claims, 'some-other-secret-that-is-long', { algorithm: 'HS256' });
    const none = jwt.sign(claims, '', { algorithm: 'none' });
    const [header, payload] = lead.token.split('.');
    const stripped = `${header}.${payload}.`;
    const noneHeader = Buffer.from(JSON.stringify({ alg: 'none', typ: 'JWT' })).toString('base64url');
    const handMadeNone = `${noneHeader}.${payload}.`;
    const hs512 = jwt.sign(claims, app.config.jwtSecret, { algorithm: 'HS512' });
    const expired = jwt.sign({ ...claims, exp: Math.floor(Date.now() / 1000) - 60 }, app.config.jwtSecret, {
      algorithm: 'HS256',
    });
    for (const token of [undefined, 'garbage', forged, none, stripped, handMadeNone, hs512, expired]) {
      const response = await app.api.get('/api/auth/me', { token });
      expect(response.status, `token ${token}`).toBe(401);
      expect(response.headers.get('content-type')).toMatch(/problem\+json/);
      expect(response.headers.get('www-authenticate')).toMatch(/^Bearer/);
    }
  });

  it('a token already accepted is still checked: a changed signature, its expiry, a removed member', async () => {
    const claims = { club: lead.user.clubId, sub: lead.user.id };
    // Expires a few seconds from now: long enough to be used first on a slow machine.
    const expiresAt = Math.floor(Date.now() / 1000) + 5;
    const soon = jwt.sign({ ...claims, exp: expiresAt }, app.config.jwtSecret, {
      algorithm: 'HS256',
    });
    expect((await app.api.get('/api/auth/me', { token: soon })).status).toBe(200);
    expect((await app.api.get('/api/auth/me', { token: soon })).status).toBe(200);
    const [header, payload, signature] = soon.split('.');
    const flipped = `${signature!.slice(0, -2)}${signature!.endsWith('AA') ? 'BB' : 'AA'}`;
    expect((await app.api.get('/api/auth/me', { token: `${header}.${payload}.${flipped}` })).status).toBe(
      401,
    );

    // A second member signs in, is accepted, then leaves the club: the same token stops working.
    const coach = await addMember(app, lead.user.clubId, 'coach');
    expect((await app.api.get('/api/auth/me', { token: coach.token })).status).toBe(200);
    await app.dataSource.query('DELETE FROM membership WHERE "userId" = $1', [coach.user.id]);
    expect((await app.api.get('/api/auth/me', { token: coach.token })).status).toBe(401);

    // Until the clock is past its expiry, however long the steps above took.
    await new Promise((resolve) => setTimeout(resolve, Math.max(0, expiresAt * 1000 - Date.now()) + 1_100));
    const late = await app.api.get('/api/auth/me', { token: soon });
    expect(late.status).toBe(401);
    expect(late.headers.get('content-type')).toMatch(/problem\+json/);
  });

  it('a token for a user that no longer exists answers 401', async () => {
    const ghost = jwt.sign({ club: lead.user.clubId }, app.config.jwtSecret, {
      algorithm: 'HS256',
      subject: '00000000-0000-4000-8000-000000000000',
    });
    expect((await app.api.get('/api/auth/me', { token: ghost })).status).toBe(401);
  });

  it('junk bodies for register and login never cause a 5xx', async () => {
    await fc.assert(
      fc.asyncProperty(
        fc.jsonValue(),
        fc.constantFrom('/api/auth/register', '/api/auth/login'),
        async (junk, path) => {
          const response = await app.api.post(path, junk);
          expect(response.status).toBeGreaterThanOrEqual(400);
          expect(response.status).toBeLessThan(500);
        },
      ),
      { numRuns: 60 },
    );
  });

  it('records with the right keys but junk values never cause a 5xx', async () => {
    await fc.assert(
      fc.asyncProperty(
        fc.record({
          clubName: fc.anything(),
          name: fc.anything(),
          email: fc.anything(),
          password: fc.anything(),
        }),
        async (junk) => {
          const response = await app.api.post('/api/auth/register', junk);
          expect(response.status).toBeLessThan(500);
        },
      ),
      { numRuns: 40 },
    );
  });
});

describe('auth rate limit', () => {
  let app: TestApp;
  beforeAll(async () => {
    app = await startTestApp({ authRateLimit: { windowMs: 60_000, max: 3 } });
  });
  afterAll(() => app.close());

  it('answers 429 after too many sign-in attempts', async () => {
    const statuses: number[] = [];
    for (let i = 0; i < 5; i++) {
      statuses.push(
        (await app.api.post('/api/auth/login', { email: 'x@example.org', password: 'wrong' })).status,
      );
    }
    expect(statuses.slice(0, 3)).toEqual([401, 401, 401]);
    expect(statuses.slice(3)).toEqual([429, 429]);
  });
});

describe('auth rate limit behind a proxy (TRUST_PROXY)', () => {
  /** Login attempts from each forwarded client address in turn; the statuses per address. */
  async function attemptsPerClient(app: TestApp, clients: string[], each: number) {
    const statuses: Record<string, number[]> = {};
    for (let i = 0; i < each; i++) {
      for (const client of clients) {
        const response = await app.api.post(
          '/api/auth/login',
          { email: 'x@example.org', password: 'wrong' },
          { headers: { 'X-Forwarded-For': client } },
        );
        (statuses[client] ??= []).push(response.status);
      }
    }
    return statuses;
  }

  it('counts each client behind a trusted proxy on its own (the default trusts a proxy on this machine)', async () => {
    const app = await startTestApp({ authRateLimit: { windowMs: 60_000, max: 2 } });
    try {
      const statuses = await attemptsPerClient(app, ['203.0.113.7', '198.51.100.9'], 2);
      expect(statuses).toEqual({ '203.0.113.7': [401, 401], '198.51.100.9': [401, 401] });
    } finally {
      await app.close();
    }
  });

  it('ignores X-Forwarded-For from a proxy it does not trust, so those clients share one count', async () => {
    const app = await startTestApp({
      authRateLimit: { windowMs: 60_000, max: 2 },
      trustProxy: trustProxyFromEnv('10.0.0.0/8'),
    });
    try {
      const statuses = await attemptsPerClient(app, ['203.0.113.7', '198.51.100.9'], 2);
      expect(statuses).toEqual({ '203.0.113.7': [401, 429], '198.51.100.9': [401, 429] });
    } finally {
      await app.close();
    }
  });

  it('reads TRUST_PROXY as a hop count or as addresses', () => {
    expect(trustProxyFromEnv(undefined)).toBe('loopback');
    expect(trustProxyFromEnv(' ')).toBe('loopback');
    expect(trustProxyFromEnv('1')).toBe(1);
    expect(trustProxyFromEnv('10.0.0.0/8, loopback')).toBe('10.0.0.0/8, loopback');
  });
});
