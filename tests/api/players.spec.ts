import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  clubWithStaff,
  createTeam,
  startTestApp,
  type ClubCast,
  type TestApp,
} from '../support/api-test-app';

describe('players and kit bags', () => {
  let app: TestApp;
  let club: ClubCast;
  let other: ClubCast;
  let teamId: string;
  let theirTeamId: string;
  let theirPlayerId: string;
  beforeAll(async () => {
    app = await startTestApp();
    club = await clubWithStaff(app, 'Players Club');
    other = await clubWithStaff(app, 'Other Players Club');
    teamId = (await createTeam(app, club.coach.token, { coachIds: [club.assistant.user.id] })).id;
    theirTeamId = (await createTeam(app, other.lead.token)).id;
    theirPlayerId = (
      await app.api.post(
        `/api/teams/${theirTeamId}/players`,
        { displayName: 'Zed Q.' },
        { token: other.lead.token },
      )
    ).body.id;
  });
  afterAll(() => app.close());

  it('adds (201 with id), lists, updates and removes players', async () => {
    const created = await app.api.post(
      `/api/teams/${teamId}/players`,
      { displayName: ' Maya O. ', goalkeeper: true },
      { token: club.coach.token },
    );
    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({
      id: expect.any(String),
      teamId,
      displayName: 'Maya O.',
      goalkeeper: true,
      active: true,
    });
    await app.api.post(
      `/api/teams/${teamId}/players`,
      { displayName: 'Leo B.' },
      { token: club.coach.token },
    );
    const list = await app.api.get(`/api/teams/${teamId}/players`, { token: club.assistant.token });
    expect(list.body.map((p: { displayName: string }) => p.displayName)).toEqual(['Leo B.', 'Maya O.']);
    const team = await app.api.get(`/api/teams/${teamId}`, { token: club.coach.token });
    expect(team.body.playerCount).toBe(2);
    const teams = await app.api.get('/api/teams', { token: club.coach.token });
    expect(teams.body.find((t: { id: string }) => t.id === teamId).playerCount).toBe(2);

    const patched = await app.api.patch(
      `/api/players/${created.body.id}`,
      { active: false },
      { token: club.coach.token },
    );
    expect(patched.body.active).toBe(false);
    const active = await app.api.get(`/api/teams/${teamId}/players`, { token: club.coach.token });
    expect(active.body).toHaveLength(1);
    const all = await app.api.get(`/api/teams/${teamId}/players?includeInactive=true`, {
      token: club.coach.token,
    });
    expect(all.body).toHaveLength(2);

    expect(
      (await app.api.delete(`/api/players/${created.body.id}`, { token: club.coach.token })).status,
    ).toBe(204);
    const after = await app.api.get(`/api/teams/${teamId}/players?includeInactive=true`, {
      token: club.coach.token,
    });
    expect(after.body).toHaveLength(1);
  });

  it('refuses names with digits or e-mail addresses (no contact details for children)', async () => {
    for (const displayName of ['Sam 2014', 'sam@example.org', '', '   ', 'x'.repeat(41)]) {
      const response = await app.api.post(
        `/api/teams/${teamId}/players`,
        { displayName },
        { token: club.coach.token },
      );
      expect(response.status, displayName).toBe(400);
      expect(response.body.errors[0].field).toBe('displayName');
    }
    const extra = await app.api.post(
      `/api/teams/${teamId}/players`,
      { displayName: 'Ok N.', birthDate: '2016-01-01' },
      { token: club.coach.token },
    );
    expect(extra.status).toBe(400);
    expect(extra.body.errors[0].field).toBe('birthDate');
  });

  it('refuses a second player of the same name, by the rule the CSV import uses (409 in words)', async () => {
    const team = (await createTeam(app, club.coach.token)).id;
    const add = (displayName: string) =>
      app.api.post(`/api/teams/${team}/players`, { displayName }, { token: club.coach.token });
    expect((await add('Kai M. 🦊')).status).toBe(201);
    for (const twin of ['Kai M.', 'kai m', ' Kai  M. ']) {
      const response = await add(twin);
      expect(response.status, twin).toBe(409);
      expect(response.body.detail).toMatch(
        /^There is already a player called .+ on this team\. Add another letter/,
      );
    }
    const other = await add('Kai Mü.');
    expect(other.status).toBe(201);
    // Renaming onto a taken name is refused too; keeping one's own name is not a clash.
    expect(
      (
        await app.api.patch(
          `/api/players/${other.body.id}`,
          { displayName: 'KAI M.' },
          { token: club.coach.token },
        )
      ).status,
    ).toBe(409);
    expect(
      (
        await app.api.patch(
          `/api/players/${other.body.id}`,
          { displayName: 'Kai Mü.', goalkeeper: true },
          {
            token: club.coach.token,
          },
        )
      ).status,
    ).toBe(200);
    const list = await app.api.get(`/api/teams/${team}/players`, { token: club.coach.token });
    expect(list.body.map((p: { displayName: string }) => p.displayName)).toEqual(['Kai M. 🦊', 'Kai Mü.']);
  });

  it('assistants read players but cannot change them (403)', async () => {
    const player = (
      await app.api.post(
        `/api/teams/${teamId}/players`,
        { displayName: 'Ana P.' },
        { token: club.coach.token },
      )
    ).body;
    const token = club.assistant.token;
    expect(
      (await app.api.post(`/api/teams/${teamId}/players`, { displayName: 'No P.' }, { token })).status,
    ).toBe(403);
    expect((await app.api.patch(`/api/players/${player.id}`, { goalkeeper: true }, { token })).status).toBe(
      403,
    );
    expect((await app.api.delete(`/api/players/${player.id}`, { token })).status).toBe(403);
    expect(
      (await app.api.put(`/api/teams/${teamId}/kit`, { balls: 1, cones: 1, bibs: 1, goals: 1 }, { token }))
        .status,
    ).toBe(403);
  });

  it('another club’s team and players answer 404 on every route', async () => {
    const token = club.lead.token;
    expect((await app.api.get(`/api/teams/${theirTeamId}/players`, { token })).status).toBe(404);
    expect(
      (await app.api.post(`/api/teams/${theirTeamId}/players`, { displayName: 'Spy X.' }, { token })).status,
    ).toBe(404);
    expect(
      (await app.api.patch(`/api/players/${theirPlayerId}`, { displayName: 'Moved M.' }, { token })).status,
    ).toBe(404);
    expect((await app.api.delete(`/api/players/${theirPlayerId}`, { token })).status).toBe(404);
    expect((await app.api.get(`/api/teams/${theirTeamId}/kit`, { token })).status).toBe(404);
    expect(
      (
        await app.api.put(
          `/api/teams/${theirTeamId}/kit`,
          { balls: 1, cones: 1, bibs: 1, goals: 1 },
          { token },
        )
      ).status,
    ).toBe(404);
    const theirs = await app.api.get(`/api/teams/${theirTeamId}/players`, { token: other.lead.token });
    expect(theirs.body.map((p: { displayName: string }) => p.displayName)).toEqual(['Zed Q.']);
  });

  it('kit bag: put then get', async () => {
    const put = await app.api.put(
      `/api/teams/${teamId}/kit`,
      { balls: 12, cones: 40, bibs: 10, goals: 2 },
      { token: club.coach.token },
    );
    expect(put.status).toBe(200);
    expect(put.body).toEqual({ balls: 12, cones: 40, bibs: 10, goals: 2 });
    const get = await app.api.get(`/api/teams/${teamId}/kit`, { token: club.assistant.token });
    expect(get.body).toEqual({ balls: 12, cones: 40, bibs: 10, goals: 2 });
    const bad = await app.api.put(
      `/api/teams/${teamId}/kit`,
      { balls: -1, cones: 'many', bibs: 1.5 },
      { token: club.coach.token },
    );
    expect(bad.status).toBe(400);
    expect(bad.body.errors.map((e: { field: string }) => e.field)).toEqual(
      expect.arrayContaining(['balls', 'cones', 'bibs', 'goals']),
    );
  });

  it('bad ids answer 400 and junk bodies never cause a 5xx', async () => {
    expect(
      (await app.api.patch('/api/players/123', { active: true }, { token: club.coach.token })).status,
    ).toBe(400);
    await fc.assert(
      fc.asyncProperty(fc.jsonValue(), async (junk) => {
        const token = club.coach.token;
        expect((await app.api.post(`/api/teams/${teamId}/players`, junk, { token })).status).toBeLessThan(
          500,
        );
        expect((await app.api.put(`/api/teams/${teamId}/kit`, junk, { token })).status).toBeLessThan(500);
      }),
      { numRuns: 50 },
    );
  });
});
