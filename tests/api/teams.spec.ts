import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  addMember,
  clubWithStaff,
  createTeam,
  startTestApp,
  type ClubCast,
  type TestApp,
} from '../support/api-test-app';

describe('teams', () => {
  let app: TestApp;
  let club: ClubCast;
  let other: ClubCast;
  beforeAll(async () => {
    app = await startTestApp();
    club = await clubWithStaff(app, 'Teams Club');
    other = await clubWithStaff(app, 'Rival Club');
  });
  afterAll(() => app.close());

  it('a coach creates a team (201 with id), is attached to it, and it has an empty kit bag', async () => {
    const response = await app.api.post(
      '/api/teams',
      { name: 'U10 Swifts', ageGroup: 'U10', level: 'intermediate', usualSpace: { width: 35, length: 45 } },
      { token: club.coach.token },
    );
    expect(response.status).toBe(201);
    expect(response.body).toMatchObject({
      id: expect.stringMatching(/^[0-9a-f-]{36}$/),
      name: 'U10 Swifts',
      ageGroup: 'U10',
      level: 'intermediate',
      usualSpace: { width: 35, length: 45 },
      coachIds: [club.coach.user.id],
      playerCount: 0,
    });
    const kit = await app.api.get(`/api/teams/${response.body.id}/kit`, { token: club.coach.token });
    expect(kit.body).toEqual({ balls: 0, cones: 0, bibs: 0, goals: 0 });
  });

  it('lists, reads, updates and deletes', async () => {
    const team = await createTeam(app, club.lead.token, { name: 'U7 Wrens', ageGroup: 'U7' });
    const list = await app.api.get('/api/teams', { token: club.coach.token });
    expect(list.status).toBe(200);
    expect(list.body.map((t: { id: string }) => t.id)).toContain(team.id);
    const read = await app.api.get(`/api/teams/${team.id}`, { token: club.lead.token });
    expect(read.body.name).toBe('U7 Wrens');
    // The list's one-query form and the single read agree field by field.
    expect(list.body.find((t: { id: string }) => t.id === team.id)).toEqual(read.body);
    const patched = await app.api.patch(
      `/api/teams/${team.id}`,
      { level: 'advanced', coachIds: [club.coach.user.id, club.assistant.user.id] },
      { token: club.lead.token },
    );
    expect(patched.status).toBe(200);
    expect(patched.body.level).toBe('advanced');
    expect([...patched.body.coachIds].sort()).toEqual([club.coach.user.id, club.assistant.user.id].sort());
    const deleted = await app.api.delete(`/api/teams/${team.id}`, { token: club.lead.token });
    expect(deleted.status).toBe(204);
    expect((await app.api.get(`/api/teams/${team.id}`, { token: club.lead.token })).status).toBe(404);
  });

  it('roles: assistants cannot create or change teams; coaches only change their own', async () => {
    const leadsTeam = await createTeam(app, club.lead.token, { name: 'U14 Hawks', ageGroup: 'U14' });
    const create = await app.api.post(
      '/api/teams',
      { name: 'X', ageGroup: 'U9', level: 'beginner', usualSpace: { width: 20, length: 20 } },
      { token: club.assistant.token },
    );
    expect(create.status).toBe(403);
    expect(
      (await app.api.patch(`/api/teams/${leadsTeam.id}`, { name: 'Mine' }, { token: club.coach.token }))
        .status,
    ).toBe(403);
    expect((await app.api.delete(`/api/teams/${leadsTeam.id}`, { token: club.coach.token })).status).toBe(
      403,
    );
    expect(
      (await app.api.patch(`/api/teams/${leadsTeam.id}`, { name: 'Mine' }, { token: club.assistant.token }))
        .status,
    ).toBe(403);
  });

  it('assistants see only the teams they help with', async () => {
    const helped = await createTeam(app, club.lead.token, {
      name: 'Helped',
      coachIds: [club.assistant.user.id],
    });
    const notHelped = await createTeam(app, club.lead.token, { name: 'Not helped' });
    const list = await app.api.get('/api/teams', { token: club.assistant.token });
    const ids = list.body.map((t: { id: string }) => t.id);
    expect(ids).toContain(helped.id);
    expect(ids).not.toContain(notHelped.id);
    expect((await app.api.get(`/api/teams/${notHelped.id}`, { token: club.assistant.token })).status).toBe(
      403,
    );
  });

  it('another club’s team answers 404 on every route, and never appears in the list', async () => {
    const theirs = await createTeam(app, other.lead.token, { name: 'Their U9' });
    const token = club.lead.token;
    expect((await app.api.get(`/api/teams/${theirs.id}`, { token })).status).toBe(404);
    expect((await app.api.patch(`/api/teams/${theirs.id}`, { name: 'Taken' }, { token })).status).toBe(404);
    expect((await app.api.delete(`/api/teams/${theirs.id}`, { token })).status).toBe(404);
    const list = await app.api.get('/api/teams', { token });
    expect(list.body.map((t: { id: string }) => t.id)).not.toContain(theirs.id);
    const still = await app.api.get(`/api/teams/${theirs.id}`, { token: other.lead.token });
    expect(still.body.name).toBe('Their U9');
  });

  it('coachIds must be members of this club', async () => {
    const response = await app.api.post(
      '/api/teams',
      {
        name: 'Poach',
        ageGroup: 'U9',
        level: 'beginner',
        usualSpace: { width: 20, length: 20 },
        coachIds: [other.coach.user.id],
      },
      { token: club.lead.token },
    );
    expect(response.status).toBe(400);
    expect(response.body.errors[0].field).toBe('coachIds');
  });

  it('bad ids and bodies answer 400 naming the field', async () => {
    const token = club.lead.token;
    const badId = await app.api.get('/api/teams/not-a-uuid', { token });
    expect(badId.status).toBe(400);
    expect(badId.body.errors[0].field).toBe('id');
    const bad = await app.api.post(
      '/api/teams',
      { name: 'ok', ageGroup: 'U99', level: 'pro', usualSpace: { width: -1 } },
      { token },
    );
    expect(bad.status).toBe(400);
    const fields = bad.body.errors.map((e: { field: string }) => e.field);
    expect(fields).toEqual(
      expect.arrayContaining(['ageGroup', 'level', 'usualSpace/width', 'usualSpace/length']),
    );
  });

  it('requires sign-in', async () => {
    expect((await app.api.get('/api/teams')).status).toBe(401);
    expect((await app.api.post('/api/teams', {})).status).toBe(401);
  });

  it('junk bodies never cause a 5xx', async () => {
    const team = await createTeam(app, club.lead.token);
    await fc.assert(
      fc.asyncProperty(
        fc.oneof(
          fc.jsonValue(),
          fc.record({ name: fc.anything(), ageGroup: fc.anything(), usualSpace: fc.anything() }),
        ),
        async (junk) => {
          const created = await app.api.post('/api/teams', junk, { token: club.lead.token });
          expect(created.status).toBeLessThan(500);
          const patched = await app.api.patch(`/api/teams/${team.id}`, junk, { token: club.lead.token });
          expect(patched.status).toBeLessThan(500);
        },
      ),
      { numRuns: 50 },
    );
  });

  it('a new coach added later can be attached by the lead', async () => {
    const late = await addMember(app, club.lead.user.clubId, 'coach', 'Late Coach');
    const team = await createTeam(app, club.lead.token, { coachIds: [late.user.id] });
    const patched = await app.api.patch(
      `/api/teams/${team.id}`,
      { name: 'Renamed by coach' },
      { token: late.token },
    );
    expect(patched.status).toBe(200);
  });
});
