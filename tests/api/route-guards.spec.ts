/**
 * Every signed-in route of the platform refuses a missing token, a forged one and `alg: none`
 * with a 401 problem before touching any data.
 */
import jwt from 'jsonwebtoken';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { registerClub, startTestApp, type SignedIn, type TestApp } from '../support/api-test-app';

const SOME_ID = '3f2c7a1e-9b4d-4c8e-a1f0-5d6b7c8e9f01';

const ROUTES: [method: string, path: string][] = [
  ['GET', '/api/auth/me'],
  ['GET', '/api/teams'],
  ['POST', '/api/teams'],
  ['GET', `/api/teams/${SOME_ID}`],
  ['PATCH', `/api/teams/${SOME_ID}`],
  ['DELETE', `/api/teams/${SOME_ID}`],
  ['GET', `/api/teams/${SOME_ID}/players`],
  ['POST', `/api/teams/${SOME_ID}/players`],
  ['POST', `/api/teams/${SOME_ID}/players/import`],
  ['POST', `/api/teams/${SOME_ID}/players/import/commit`],
  ['POST', `/api/teams/${SOME_ID}/guests`],
  ['PATCH', `/api/players/${SOME_ID}`],
  ['DELETE', `/api/players/${SOME_ID}`],
  ['GET', `/api/teams/${SOME_ID}/kit`],
  ['PUT', `/api/teams/${SOME_ID}/kit`],
  ['PUT', `/api/teams/${SOME_ID}/staff/${SOME_ID}`],
  ['DELETE', `/api/teams/${SOME_ID}/staff/${SOME_ID}`],
  ['GET', '/api/members'],
  ['PATCH', `/api/members/${SOME_ID}`],
  ['DELETE', `/api/members/${SOME_ID}`],
  ['GET', '/api/invitations'],
  ['POST', '/api/invitations'],
  ['DELETE', `/api/invitations/${SOME_ID}`],
  ['GET', `/api/teams/${SOME_ID}/schedule`],
  ['POST', `/api/teams/${SOME_ID}/schedule`],
  ['POST', `/api/teams/${SOME_ID}/schedule/weekly`],
  ['PATCH', `/api/teams/${SOME_ID}/schedule/${SOME_ID}`],
  ['DELETE', `/api/teams/${SOME_ID}/schedule/${SOME_ID}`],
  ['GET', '/api/scheduled-sessions'],
  ['GET', `/api/scheduled-sessions/${SOME_ID}`],
  ['GET', `/api/teams/${SOME_ID}/calendar`],
  ['POST', `/api/teams/${SOME_ID}/calendar`],
  ['DELETE', `/api/teams/${SOME_ID}/calendar`],
];

describe('signed-in routes refuse callers without a valid token', () => {
  let app: TestApp;
  let lead: SignedIn;
  beforeAll(async () => {
    app = await startTestApp();
    lead = await registerClub(app, 'Guard Club');
  });
  afterAll(() => app.close());

  it.each(ROUTES)('%s %s', async (method, path) => {
    const claims = { club: lead.user.clubId, sub: lead.user.id };
    const tokens = {
      missing: undefined,
      forged: jwt.sign(claims, 'a-secret-the-server-never-had', { algorithm: 'HS256' }),
      algNone: jwt.sign(claims, '', { algorithm: 'none' }),
    };
    for (const [label, token] of Object.entries(tokens)) {
      const response = await app.api.call(method, path, {
        token,
        body: method === 'GET' || method === 'DELETE' ? undefined : {},
      });
      expect(response.status, label).toBe(401);
      expect(response.headers.get('content-type'), label).toMatch(/^application\/problem\+json/);
    }
    // The real token gets past the guard (whatever the route then says about the body or id).
    const real = await app.api.call(method, path, {
      token: lead.token,
      body: method === 'GET' || method === 'DELETE' ? undefined : {},
    });
    expect(real.status).not.toBe(401);
    expect(real.status).toBeLessThan(500);
  });
});
