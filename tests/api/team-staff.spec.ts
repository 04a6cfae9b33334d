import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  addMember,
  clubWithStaff,
  createTeam,
  startTestApp,
  type ClubCast,
  type TestApp,
} from '../support/api-test-app';

describe('team staff', () => {
  let app: TestApp;
  let club: ClubCast;
  let other: ClubCast;
  beforeAll(async () => {
    app = await startTestApp();
    club = await clubWithStaff(app, 'Staff Club');
    other = await clubWithStaff(app, 'Staff Rival');
  });
  afterAll(() => app.close());

  const staffPath = (teamId: string, userId: string) => `/api/teams/${teamId}/staff/${userId}`;
  const staffOf = async (teamId: string): Promise<string[]> =>
    (await app.api.get(`/api/teams/${teamId}`, { token: club.lead.token })).body.coachIds;

  it('the lead puts a coach and an assistant on a team and takes them off; twice is no change', async () => {
    const team = await createTeam(app, club.lead.token, { name: 'U8 Larks' });
    const token = club.lead.token;
    const added = await app.api.put(staffPath(team.id, club.coach.user.id), undefined, { token });
    expect(added.status).toBe(200);
    expect(added.body.coachIds).toEqual([club.coach.user.id]);
    await app.api.put(staffPath(team.id, club.assistant.user.id), undefined, { token });
    const again = await app.api.put(staffPath(team.id, club.assistant.user.id), undefined, { token });
    expect(again.status).toBe(200);
    expect([...again.body.coachIds].sort()).toEqual([club.coach.user.id, club.assistant.user.id].sort());

    // Attached, the assistant sees the team and its plans list at once.
    const seen = await app.api.get('/api/teams', { token: club.assistant.token });
    expect(seen.body.map((t: { id: string }) => t.id)).toContain(team.id);

    const removed = await app.api.delete(staffPath(team.id, club.assistant.user.id), { token });
    expect(removed.status).toBe(200);
    expect(removed.body.coachIds).toEqual([club.coach.user.id]);
    expect((await app.api.get(`/api/teams/${team.id}`, { token: club.assistant.token })).status).toBe(403);
  });

  it('a coach of the team adds and removes assistants, but not coaches, and not themselves', async () => {
    const helper = await addMember(app, club.lead.user.clubId, 'assistant', 'Hal Helper');
    const otherCoach = await addMember(app, club.lead.user.clubId, 'coach', 'Odo Othercoach');
    const team = await createTeam(app, club.coach.token, { name: 'U10 Otters' });
    const token = club.coach.token;
    expect((await app.api.put(staffPath(team.id, helper.user.id), undefined, { token })).status).toBe(200);
    expect(await staffOf(team.id)).toContain(helper.user.id);
    expect((await app.api.delete(staffPath(team.id, helper.user.id), { token })).status).toBe(200);
    expect(await staffOf(team.id)).not.toContain(helper.user.id);

    const coach = await app.api.put(staffPath(team.id, otherCoach.user.id), undefined, { token });
    expect(coach.status).toBe(403);
    expect(coach.body.detail).toContain('Ask the head of coaching');
    const self = await app.api.delete(staffPath(team.id, club.coach.user.id), { token });
    expect(self.status).toBe(403);
    expect(self.body.detail).toContain('cannot take yourself off');
    // The same rule through PATCH coachIds.
    const patched = await app.api.patch(`/api/teams/${team.id}`, { coachIds: [] }, { token });
    expect(patched.status).toBe(403);
    expect(await staffOf(team.id)).toEqual([club.coach.user.id]);
  });

  it('an assistant, or a coach of another team, is refused staff changes', async () => {
    const team = await createTeam(app, club.lead.token, {
      name: 'U12 Gulls',
      coachIds: [club.assistant.user.id],
    });
    const helper = await addMember(app, club.lead.user.clubId, 'assistant', 'Ida Inviteless');
    for (const token of [club.assistant.token, club.coach.token]) {
      expect((await app.api.put(staffPath(team.id, helper.user.id), undefined, { token })).status).toBe(403);
      expect((await app.api.delete(staffPath(team.id, club.assistant.user.id), { token })).status).toBe(403);
    }
    const refused = await app.api.patch(
      `/api/teams/${team.id}`,
      { coachIds: [club.assistant.user.id, helper.user.id] },
      { token: club.assistant.token },
    );
    expect(refused.status).toBe(403);
    expect(await staffOf(team.id)).toEqual([club.assistant.user.id]);
  });

  it('another club’s team or member answers 404, and nothing changes', async () => {
    const mine = await createTeam(app, club.lead.token, { name: 'U9 Rooks' });
    const theirs = await createTeam(app, other.lead.token, { name: 'U9 Theirs' });
    const token = club.lead.token;
    expect((await app.api.put(staffPath(mine.id, other.coach.user.id), undefined, { token })).status).toBe(
      404,
    );
    expect((await app.api.put(staffPath(theirs.id, club.coach.user.id), undefined, { token })).status).toBe(
      404,
    );
    expect((await app.api.delete(staffPath(theirs.id, other.coach.user.id), { token })).status).toBe(404);
    expect(await staffOf(mine.id)).toEqual([]);
    const patched = await app.api.patch(
      `/api/teams/${mine.id}`,
      { coachIds: [other.coach.user.id] },
      { token },
    );
    expect(patched.status).toBe(400);
    expect(patched.body.errors[0]).toMatchObject({ field: 'coachIds' });
    expect(patched.body.errors[0].message).not.toMatch(/[0-9a-f]{8}-/);
  });

  it('a refused staff change in PATCH saves none of the team’s other changes', async () => {
    const team = await createTeam(app, club.lead.token, { name: 'U11 Terns' });
    const response = await app.api.patch(
      `/api/teams/${team.id}`,
      { name: 'U11 Terns renamed', coachIds: [other.assistant.user.id] },
      { token: club.lead.token },
    );
    expect(response.status).toBe(400);
    const read = await app.api.get(`/api/teams/${team.id}`, { token: club.lead.token });
    expect(read.body.name).toBe('U11 Terns');
  });

  it('a team and its staff are written together: a failing staff insert leaves no team behind', async () => {
    const before = await app.api.get('/api/teams', { token: club.lead.token });
    // The member is known when checked, gone when the staff is written: the foreign key refuses
    // the insert, so the transaction must take the team back out.
    const ghost = await addMember(app, club.lead.user.clubId, 'coach', 'Gus Gone');
    await app.dataSource.query(
      `CREATE OR REPLACE FUNCTION cw_test_drop_user() RETURNS trigger AS $$
       BEGIN DELETE FROM app_user WHERE id = '${ghost.user.id}'; RETURN NEW; END $$ LANGUAGE plpgsql`,
    );
    await app.dataSource.query(
      'CREATE TRIGGER cw_test_drop_user AFTER INSERT ON team FOR EACH ROW EXECUTE FUNCTION cw_test_drop_user()',
    );
    try {
      const response = await app.api.post(
        '/api/teams',
        {
          name: 'U13 Half-made',
          ageGroup: 'U13',
          level: 'beginner',
          usualSpace: { width: 30, length: 40 },
          coachIds: [ghost.user.id],
        },
        { token: club.lead.token },
      );
      expect(response.status).toBeGreaterThanOrEqual(400);
    } finally {
      await app.dataSource.query('DROP TRIGGER cw_test_drop_user ON team');
      await app.dataSource.query('DROP FUNCTION cw_test_drop_user()');
    }
    const after = await app.api.get('/api/teams', { token: club.lead.token });
    expect(after.body.map((t: { name: string }) => t.name)).not.toContain('U13 Half-made');
    expect(after.body.length).toBe(before.body.length);
  });

  it('bad ids in the path answer 400 naming the field', async () => {
    const team = await createTeam(app, club.lead.token);
    const response = await app.api.put(`/api/teams/${team.id}/staff/nobody`, undefined, {
      token: club.lead.token,
    });
    expect(response.status).toBe(400);
    expect(response.body.errors[0].field).toBe('userId');
  });
});
