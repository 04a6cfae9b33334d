/** The register: who came, how late, how early they left; who may take it; insight counts them. */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AttendanceDto, SessionPlanDto } from '../../shared/types/api';
import type { TeamInsightDto } from '../../shared/types/plan-api';
import {
  addMember,
  clubWithStaff,
  startTestApp,
  type ClubCast,
  type SignedIn,
  type TestApp,
} from '../support/api-test-app';
import { BACKFILL_FEEDBACK_ACTIVITY } from '../../server/migrations/1764635000000-register-and-station-feedback';
import { createPlan, createSquad, type Squad } from './fixtures/plan-helpers';

describe('the register', () => {
  let app: TestApp;
  let club: ClubCast;
  let otherCoach: SignedIn;
  let squad: Squad;
  let plan: SessionPlanDto;
  let away: ClubCast;

  beforeAll(async () => {
    app = await startTestApp();
    club = await clubWithStaff(app, 'Brackenhurst Juniors');
    away = await clubWithStaff(app, 'Saltmarsh Rovers');
    otherCoach = await addMember(app, club.lead.user.clubId, 'coach', 'Odo Otherteam');
    squad = await createSquad(app, club.coach.token, 10, 'U10 Larks');
    await createSquad(app, otherCoach.token, 3, 'U10 Wrens');
    await app.dataSource.query('INSERT INTO team_coach ("teamId", "userId") VALUES ($1, $2)', [
      squad.teamId,
      club.assistant.user.id,
    ]);
    plan = await createPlan(app, club.coach.token, squad);
  });
  afterAll(() => app.close());

  const register = (token: string, body: unknown) =>
    app.api.put(`/api/plans/${plan.id}/attendance`, body, { token });

  it('lets the team’s assistant take it with a late arrival and an early leaver, both present', async () => {
    const [late, early, ...rest] = squad.playerIds;
    const players = [
      { playerId: late, lateMinutes: 10 },
      { playerId: early, leftEarlyMinutes: 15 },
      ...rest.slice(0, 6).map((playerId) => ({ playerId })),
    ];
    const put = await register(club.assistant.token, { players });
    expect(put.status, put.text).toBe(200);
    const get = await app.api.get(`/api/plans/${plan.id}/attendance`, { token: club.coach.token });
    const body = get.body as AttendanceDto;
    expect(body.recorded).toBe(true);
    expect(body.playerIds).toHaveLength(8);
    expect(body.players).toEqual(expect.arrayContaining(players));
    expect(body.playerIds).toEqual(expect.arrayContaining([late, early]));
  });

  it('still takes an older client’s list of ids (everyone on time)', async () => {
    const ids = squad.playerIds.slice(0, 9);
    const put = await register(club.coach.token, { playerIds: ids });
    expect(put.status, put.text).toBe(200);
    const get = (await app.api.get(`/api/plans/${plan.id}/attendance`, { token: club.lead.token }))
      .body as AttendanceDto;
    const byId = (a: { playerId: string }, b: { playerId: string }) => a.playerId.localeCompare(b.playerId);
    expect([...get.players].sort(byId)).toEqual(ids.map((playerId) => ({ playerId })).sort(byId));
  });

  it('refuses a coach of another team (403), an assistant of none (403) and another club (404)', async () => {
    const before = (await app.api.get(`/api/plans/${plan.id}/attendance`, { token: club.coach.token })).body;
    const body = { players: [{ playerId: squad.playerIds[0] }] };
    const strangerCoach = await register(otherCoach.token, body);
    expect(strangerCoach.status).toBe(403);
    expect(strangerCoach.headers.get('content-type')).toContain('application/problem+json');
    const looseAssistant = await addMember(app, club.lead.user.clubId, 'assistant', 'Una Unattached');
    expect((await register(looseAssistant.token, body)).status).toBe(403);
    expect((await register(away.lead.token, body)).status).toBe(404);
    expect((await app.api.get(`/api/plans/${plan.id}/attendance`, { token: away.coach.token })).status).toBe(
      404,
    );
    const after = (await app.api.get(`/api/plans/${plan.id}/attendance`, { token: club.coach.token })).body;
    expect(after).toEqual(before);
  });

  it('lets only the team’s own staff change a session: another team’s coach may not judge a station or re-plan', async () => {
    const station = plan.plan.phases.find((p) => p.stations.length > 0)!;
    const phaseIndex = plan.plan.phases.indexOf(station);
    const stationId = station.stations[0]!.id;
    const verdict = { stationId, phaseIndex, verdict: 'too-easy' };
    const leaver = { fromMinute: 5, remove: [plan.request.players[0]!.id] };
    for (const [path, body] of [
      ['feedback', verdict],
      ['progression', verdict],
      ['replan', leaver],
    ] as const) {
      const refused = await app.api.post(`/api/plans/${plan.id}/${path}`, body, { token: otherCoach.token });
      expect(refused.status, `${path}: ${refused.text}`).toBe(403);
      expect(refused.body.detail).toMatch(/team’s own coaches and assistants/);
    }
    const feedbackRows = (await app.dataSource.query(
      'SELECT count(*)::int AS n FROM feedback WHERE "planId" = $1',
      [plan.id],
    )) as { n: number }[];
    expect(feedbackRows[0]!.n).toBe(0);
    // The team's assistant may.
    const byAssistant = await app.api.post(`/api/plans/${plan.id}/feedback`, verdict, {
      token: club.assistant.token,
    });
    expect(byAssistant.status, byAssistant.text).toBeLessThan(300);
  });

  it('names a bad minute, a player twice or two forms at once, and keeps the saved register', async () => {
    const before = (await app.api.get(`/api/plans/${plan.id}/attendance`, { token: club.coach.token })).body;
    const [a, b] = squad.playerIds;
    const badMinutes = await register(club.coach.token, {
      players: [
        { playerId: a, lateMinutes: 0 },
        { playerId: b, leftEarlyMinutes: 'ten' },
      ],
    });
    expect(badMinutes.status).toBe(400);
    expect(badMinutes.body.errors).toEqual([
      { field: 'players/0/lateMinutes', message: 'minutes late must be at least 1' },
      { field: 'players/1/leftEarlyMinutes', message: 'minutes left early must be a whole number' },
    ]);
    const tooLong = await register(club.coach.token, {
      players: [{ playerId: a, lateMinutes: 15, leftEarlyMinutes: 15 }],
    });
    expect(tooLong.status).toBe(400);
    expect(tooLong.body.errors).toEqual([
      { field: 'players/0/leftEarlyMinutes', message: 'leaves no time in the 25-minute session' },
    ]);
    const twice = await register(club.coach.token, { players: [{ playerId: a }, { playerId: a }] });
    expect(twice.status).toBe(400);
    expect(twice.body.errors).toEqual([{ field: 'players/1/playerId', message: 'is on the register twice' }]);
    const both = await register(club.coach.token, { players: [], playerIds: [] });
    expect(both.status).toBe(400);
    const after = (await app.api.get(`/api/plans/${plan.id}/attendance`, { token: club.coach.token })).body;
    expect(after).toEqual(before);
  });

  it('counts late arrivals and early leavers as present in the team insight', async () => {
    const [late, early, ...rest] = squad.playerIds;
    await register(club.coach.token, {
      players: [
        { playerId: late, lateMinutes: 5 },
        { playerId: early, leftEarlyMinutes: 8 },
        ...rest.slice(0, 4).map((playerId) => ({ playerId })),
      ],
    });
    const insight = (await app.api.get(`/api/teams/${squad.teamId}/insight`, { token: club.coach.token }))
      .body as TeamInsightDto;
    const session = insight.sessions.find((s) => s.planId === plan.id)!;
    expect(session).toMatchObject({ recorded: true, present: 6, cameLate: 1, leftEarly: 1 });
    for (const id of [late, early]) {
      expect(insight.players.find((p) => p.playerId === id)!.sessionsAttended).toBe(1);
      expect(session.touches[id]).toBeGreaterThan(0);
    }
    expect(insight.players.find((p) => p.playerId === rest[5])!.sessionsAttended).toBe(0);
  });

  it('without a register, counts pitch-side’s early leaver and late arrival as present', async () => {
    const second = await createPlan(
      app,
      club.coach.token,
      { ...squad, playerIds: squad.playerIds.slice(0, 8) },
      { date: '2026-12-09' },
    );
    const leaver = squad.playerIds[3];
    const arrival = squad.playerIds[9];
    const gone = await app.api.post(
      `/api/plans/${second.id}/replan`,
      { fromMinute: 12, remove: [leaver] },
      { token: club.assistant.token },
    );
    expect(gone.status, gone.text).toBe(200);
    const came = await app.api.post(
      `/api/plans/${second.id}/replan`,
      { fromMinute: 4, add: [arrival] },
      { token: club.coach.token },
    );
    expect(came.status, came.text).toBe(200);
    const insight = (await app.api.get(`/api/teams/${squad.teamId}/insight`, { token: club.lead.token }))
      .body as TeamInsightDto;
    const session = insight.sessions.find((s) => s.planId === second.id)!;
    expect(session).toMatchObject({ recorded: false, present: 9, cameLate: 1, leftEarly: 1 });
    expect(insight.players.find((p) => p.playerId === leaver)!.sessionsAttended).toBe(2);

    // Marked present without being in the plan: came, but no touch estimate, so no made-up zero.
    const extra = squad.playerIds[8];
    const put = await app.api.put(
      `/api/plans/${second.id}/attendance`,
      { players: [...squad.playerIds.slice(0, 8), extra].map((playerId) => ({ playerId })) },
      { token: club.coach.token },
    );
    expect(put.status, put.text).toBe(200);
    const after = (await app.api.get(`/api/teams/${squad.teamId}/insight`, { token: club.lead.token }))
      .body as TeamInsightDto;
    const recorded = after.sessions.find((s) => s.planId === second.id)!;
    expect(recorded.touches[extra]).toBeUndefined();
    const first = after.sessions.find((s) => s.planId === plan.id)!;
    const row = after.players.find((p) => p.playerId === extra)!;
    expect(row.sessionsAttended).toBe(1 + (first.touches[extra] !== undefined ? 1 : 0));
    expect(row.averageTouches).toBe(first.touches[extra] ?? 0);
  });

  it('gives feedback from before activities were kept the activity of its station (the migration)', async () => {
    const phaseIndex = plan.plan.phases.findIndex((p) => p.stations.length > 0);
    const station = plan.plan.phases[phaseIndex]!.stations.at(-1)!;
    const given = await app.api.post(
      `/api/plans/${plan.id}/feedback`,
      { stationId: station.id, phaseIndex, verdict: 'too-hard' },
      { token: club.assistant.token },
    );
    expect(given.status, given.text).toBe(201);
    const id = given.body.id as string;
    const activityOf = async () =>
      (
        (await app.dataSource.query('SELECT "activityId" FROM feedback WHERE id = $1', [id])) as {
          activityId: string | null;
        }[]
      )[0]!.activityId;
    expect(await activityOf()).toBe(station.activityId);
    await app.dataSource.query('UPDATE feedback SET "activityId" = NULL WHERE id = $1', [id]);
    await app.dataSource.query(BACKFILL_FEEDBACK_ACTIVITY);
    expect(await activityOf()).toBe(station.activityId);
  });
});
