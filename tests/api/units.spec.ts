/**
 * Units: the club's setting (GET/PUT /api/club/units: everyone reads, the head of coaching changes,
 * bad values refused naming the field) and each person's own choice through PATCH /api/auth/me
 * (null follows the club), carried in the signed-in context (/api/auth/me, sign-in).
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { UserDto } from '../../shared/types/api';
import type { Units } from '../../shared/units';
import { createPlan, createSquad } from './fixtures/plan-helpers';
import {
  clubWithStaff,
  startTestApp,
  TEST_PASSWORD,
  type ClubCast,
  type TestApp,
} from '../support/api-test-app';

describe('units: the club setting and a person’s own choice', () => {
  let app: TestApp;
  let club: ClubCast;
  let other: ClubCast;
  beforeAll(async () => {
    app = await startTestApp();
    club = await clubWithStaff(app, 'Yardley Rovers');
    other = await clubWithStaff(app, 'Metreton Town');
  });
  afterAll(() => app.close());

  const me = async (token: string): Promise<UserDto> => {
    const response = await app.api.get<UserDto>('/api/auth/me', { token });
    expect(response.status, response.text).toBe(200);
    return response.body;
  };
  const clubUnits = async (token: string): Promise<Units> => {
    const response = await app.api.get<Units>('/api/club/units', { token });
    expect(response.status, response.text).toBe(200);
    return response.body;
  };

  it('a new club reads metres and °C, and everyone in it is told so on signing in', async () => {
    expect(club.lead.user.units).toEqual({ distance: 'metres', temperature: 'celsius' });
    expect(club.coach.user.clubUnits).toEqual({ distance: 'metres', temperature: 'celsius' });
    expect(club.assistant.user.ownUnits).toEqual({ distance: null, temperature: null });
    expect(await clubUnits(club.assistant.token)).toEqual({ distance: 'metres', temperature: 'celsius' });
  });

  it('the head of coaching changes the club to yards and °F; every member reads them at once', async () => {
    const response = await app.api.put<Units>(
      '/api/club/units',
      { distance: 'yards', temperature: 'fahrenheit' },
      { token: club.lead.token },
    );
    expect(response.status, response.text).toBe(200);
    expect(response.body).toEqual({ distance: 'yards', temperature: 'fahrenheit' });
    expect((await me(club.coach.token)).units).toEqual({ distance: 'yards', temperature: 'fahrenheit' });
    const signIn = await app.api.post<{ user: UserDto }>('/api/auth/login', {
      email: club.assistant.user.email,
      password: TEST_PASSWORD,
    });
    expect(signIn.status, signIn.text).toBe(200);
    expect(signIn.body.user.units).toEqual({ distance: 'yards', temperature: 'fahrenheit' });
    // Another club is untouched.
    expect(await clubUnits(other.lead.token)).toEqual({ distance: 'metres', temperature: 'celsius' });
    expect((await me(other.coach.token)).units).toEqual({ distance: 'metres', temperature: 'celsius' });
  });

  it('changes one unit and leaves the other', async () => {
    const response = await app.api.put<Units>(
      '/api/club/units',
      { temperature: 'celsius' },
      { token: club.lead.token },
    );
    expect(response.status, response.text).toBe(200);
    expect(response.body).toEqual({ distance: 'yards', temperature: 'celsius' });
  });

  it.each([
    ['coach', 'coach'],
    ['assistant', 'assistant'],
  ] as const)('a %s gets 403 in words and the setting stays', async (_, who) => {
    const before = await clubUnits(club.lead.token);
    const response = await app.api.put('/api/club/units', { distance: 'metres' }, { token: club[who].token });
    expect(response.status, response.text).toBe(403);
    expect(response.headers.get('content-type')).toMatch(/application\/problem\+json/);
    expect(response.body.detail).toMatch(/head of coaching/);
    expect(response.body.detail).not.toMatch(/\blead\b/);
    expect(await clubUnits(club.lead.token)).toEqual(before);
  });

  it.each([
    ['feet', { distance: 'feet' }, [{ field: 'distance', message: 'must be metres or yards' }]],
    [
      'kelvin',
      { temperature: 'kelvin' },
      [{ field: 'temperature', message: 'must be Celsius or Fahrenheit' }],
    ],
    ['empty body', {}, [{ field: '(body)', message: 'say which unit to change' }]],
    ['null', { distance: null }, [{ field: 'distance', message: 'must be metres or yards' }]],
    [
      'unknown field',
      { distance: 'yards', speed: 'mph' },
      [{ field: 'speed', message: 'is not a known field' }],
    ],
  ])('refuses %s with 400 naming the field in words, and keeps the setting', async (_, body, errors) => {
    const before = await clubUnits(club.lead.token);
    const response = await app.api.put('/api/club/units', body, { token: club.lead.token });
    expect(response.status, response.text).toBe(400);
    expect(response.headers.get('content-type')).toMatch(/application\/problem\+json/);
    expect(response.body.errors).toEqual(errors);
    expect(await clubUnits(club.lead.token)).toEqual(before);
  });

  it('signed out: 401', async () => {
    expect((await app.api.get('/api/club/units')).status).toBe(401);
    expect((await app.api.put('/api/club/units', { distance: 'yards' })).status).toBe(401);
  });

  it('a person chooses their own units; null follows the club again; others are untouched', async () => {
    await app.api.put(
      '/api/club/units',
      { distance: 'yards', temperature: 'fahrenheit' },
      { token: club.lead.token },
    );
    const own = await app.api.patch<UserDto>(
      '/api/auth/me',
      { distanceUnit: 'metres', temperatureUnit: 'celsius' },
      { token: club.coach.token },
    );
    expect(own.status, own.text).toBe(200);
    expect(own.body.units).toEqual({ distance: 'metres', temperature: 'celsius' });
    expect(own.body.ownUnits).toEqual({ distance: 'metres', temperature: 'celsius' });
    expect(own.body.clubUnits).toEqual({ distance: 'yards', temperature: 'fahrenheit' });
    expect((await me(club.coach.token)).units).toEqual({ distance: 'metres', temperature: 'celsius' });
    // The club's setting and the other members did not move.
    expect(await clubUnits(club.lead.token)).toEqual({ distance: 'yards', temperature: 'fahrenheit' });
    expect((await me(club.assistant.token)).units).toEqual({ distance: 'yards', temperature: 'fahrenheit' });

    // One back to the club's; the other stays the person's own.
    const back = await app.api.patch<UserDto>(
      '/api/auth/me',
      { distanceUnit: null },
      { token: club.coach.token },
    );
    expect(back.status, back.text).toBe(200);
    expect(back.body.ownUnits).toEqual({ distance: null, temperature: 'celsius' });
    expect((await me(club.coach.token)).units).toEqual({ distance: 'yards', temperature: 'celsius' });
    // The name was not touched by a units-only change.
    expect((await me(club.coach.token)).name).toBe(club.coach.user.name);
  });

  it.each([
    ['distanceUnit', 'miles', 'must be metres or yards, or empty to follow the club'],
    ['temperatureUnit', 'F', 'must be Celsius or Fahrenheit, or empty to follow the club'],
  ])(
    'refuses an own %s of %j with 400 naming the field, and keeps the choice',
    async (field, value, message) => {
      const before = await me(club.assistant.token);
      const response = await app.api.patch(
        '/api/auth/me',
        { [field]: value },
        { token: club.assistant.token },
      );
      expect(response.status, response.text).toBe(400);
      expect(response.headers.get('content-type')).toMatch(/application\/problem\+json/);
      expect(response.body.errors).toEqual([{ field, message }]);
      expect((await me(club.assistant.token)).ownUnits).toEqual(before.ownUnits);
    },
  );

  it('a card printed by someone reading yards says yd and prints no metres', async () => {
    await app.api.patch(
      '/api/auth/me',
      { distanceUnit: 'yards', temperatureUnit: 'fahrenheit' },
      { token: club.coach.token },
    );
    const squad = await createSquad(app, club.coach.token, 12, 'U10 Larks');
    const plan = await createPlan(app, club.coach.token, squad, { kickOff: '10:30' });
    const text = async (token: string) => {
      const response = await fetch(`${app.http.url}/api/plans/${plan.id}/pdf`, {
        headers: { authorization: `Bearer ${token}` },
      });
      expect(response.status).toBe(200);
      const dir = mkdtempSync(join(tmpdir(), 'conewise-units-'));
      try {
        const file = join(dir, 'card.pdf');
        writeFileSync(file, Buffer.from(await response.arrayBuffer()));
        return execFileSync('pdftotext', ['-raw', file, '-'], { encoding: 'utf8' }).replace(/\s+/g, ' ');
      } finally {
        rmSync(dir, { recursive: true, force: true });
      }
    };
    const yards = await text(club.coach.token);
    expect(yards).toMatch(/space \d+ × \d+ yd/);
    expect(yards).toMatch(/\d+ yd/);
    // No dimension in metres anywhere: neither "12 m", "12 × 20 m" nor "m²".
    expect(yards).not.toMatch(/\d(\.\d)? ?m\b/);
    expect(yards).not.toMatch(/m²/);
    // The same plan printed by someone reading metres says metres (the plan is the same).
    await app.api.patch('/api/auth/me', { distanceUnit: 'metres' }, { token: club.lead.token });
    const metres = await text(club.lead.token);
    expect(metres).toMatch(/space \d+(\.\d+)? × \d+(\.\d+)? m\b/);
    expect(metres).not.toMatch(/\d yd\b/);
  });
});
