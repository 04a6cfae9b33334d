import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { SessionPlanDto } from '../../shared/types/api';
import type { PlanChangeDto, TeamInsightDto } from '../../shared/types/plan-api';
import { clubWithStaff, startTestApp, type ClubCast, type TestApp } from '../support/api-test-app';
import { createPlan, createSquad, type Squad } from './fixtures/plan-helpers';

/** The first keep-ball station (a goalkeepers' station may come first in its phase). */
const keepBallOf = (plan: SessionPlanDto) => {
  const phaseIndex = plan.plan.phases.findIndex((p) =>
    p.stations.some((s) => s.activityKind === 'keep-ball'),
  );
  if (phaseIndex < 0) throw new Error('the plan has no keep-ball station');
  return {
    phaseIndex,
    station: plan.plan.phases[phaseIndex]!.stations.find((s) => s.activityKind === 'keep-ball')!,
  };
};

describe('attendance, feedback, pitch-side changes and team insight', () => {
  let app: TestApp;
  let club: ClubCast;
  let squad: Squad;
  let plan: SessionPlanDto;

  beforeAll(async () => {
    app = await startTestApp();
    club = await clubWithStaff(app, 'Orchard Vale Youth');
    squad = await createSquad(app, club.coach.token, 15, 'U10 Swifts');
    // The assistant helps this team.
    await app.dataSource.query('INSERT INTO team_coach ("teamId", "userId") VALUES ($1, $2)', [
      squad.teamId,
      club.assistant.user.id,
    ]);
    plan = await createPlan(app, club.coach.token, { ...squad, playerIds: squad.playerIds.slice(0, 13) });
  });
  afterAll(() => app.close());

  it('records who came (an assistant may) and refuses strangers', async () => {
    const came = squad.playerIds.slice(0, 12);
    const put = await app.api.put(
      `/api/plans/${plan.id}/attendance`,
      { playerIds: came },
      { token: club.assistant.token },
    );
    expect(put.status, put.text).toBe(200);
    const get = await app.api.get(`/api/plans/${plan.id}/attendance`, { token: club.coach.token });
    expect(get.body).toEqual({
      planId: plan.id,
      playerIds: came,
      players: came.map((playerId) => ({ playerId })),
      recorded: true,
    });
    const bad = await app.api.put(
      `/api/plans/${plan.id}/attendance`,
      { playerIds: [came[0], '00000000-0000-4000-8000-000000000000'] },
      { token: club.coach.token },
    );
    expect(bad.status).toBe(400);
    expect(bad.body.errors).toEqual([{ field: 'playerIds/1', message: 'is not a player of this team' }]);
  });

  it('stores feedback once per clientId, so an offline replay lands once', async () => {
    const { phaseIndex, station } = keepBallOf(plan);
    expect(station, 'the warm-up has a keep-ball phase').toBeDefined();
    const body = {
      stationId: station.id,
      phaseIndex,
      verdict: 'too-easy',
      note: 'defenders never close',
      clientId: 'offline-1',
    };
    const first = await app.api.post(`/api/plans/${plan.id}/feedback`, body, { token: club.assistant.token });
    const replay = await app.api.post(`/api/plans/${plan.id}/feedback`, body, {
      token: club.assistant.token,
    });
    expect(first.status).toBe(201);
    expect(replay.status).toBe(200);
    expect(replay.body.id).toBe(first.body.id);
    const list = await app.api.get(`/api/plans/${plan.id}/feedback`, { token: club.coach.token });
    expect(list.body.filter((f: { clientId?: string }) => f.clientId === 'offline-1')).toHaveLength(1);
    const wrong = await app.api.post(
      `/api/plans/${plan.id}/feedback`,
      { stationId: 'nope', phaseIndex, verdict: 'right' },
      { token: club.coach.token },
    );
    expect(wrong.status).toBe(400);
    expect(wrong.body.errors[0].field).toBe('stationId');
  });

  it('feeds the team’s recent feedback into the next plan', async () => {
    const { station } = keepBallOf(plan);
    const group = station.playerIds.length + station.coachJoins;
    const next = await createPlan(
      app,
      club.coach.token,
      { ...squad, playerIds: squad.playerIds.slice(0, 13) },
      // The verdict steers the activity it was given on: pin it so the next plan plays it again.
      { date: '2026-12-12', request: { pinnedActivityIds: [station.activityId] } },
    );
    expect(next.request.recentFeedback?.[0]).toEqual({
      activityKind: 'keep-ball',
      activityId: station.activityId,
      verdict: 'too-easy',
      areaWidth: station.area.width,
      areaLength: station.area.length,
      groupSize: group,
    });
    expect(
      next.plan.trace.some(
        (t: { ruleId: string; effect?: string }) =>
          t.ruleId === 'engine.feedback-start' && /keep-ball/i.test(t.effect ?? ''),
      ),
    ).toBe(true);
    // Too easy in keep-ball means less room per player next time (or the same at the club's
    // minimum); the side scales with the square root of the group, so compare side / √group,
    // allowing half a metre for rounding to whole metres.
    const after = next.plan.phases
      .flatMap((p: SessionPlanDto['plan']['phases'][number]) => p.stations)
      .find((s: { activityId: string }) => s.activityId === station.activityId);
    const afterGroup = after.playerIds.length + after.coachJoins;
    expect(after.area.width / Math.sqrt(afterGroup)).toBeLessThanOrEqual(
      (station.area.width + 0.5) / Math.sqrt(group),
    );
  });

  it('re-plans a late arrival, reports who moved, and ignores a replay', async () => {
    const late = squad.playerIds[13];
    const body = { add: [{ id: late }], fromMinute: 5 };
    const first = await app.api.post(`/api/plans/${plan.id}/replan`, body, { token: club.assistant.token });
    expect(first.status, first.text).toBe(200);
    const change = first.body as PlanChangeDto;
    expect(change.plan.playerCount).toBe(14);
    expect(change.moves.some((m) => m.playerId === late && m.fromStationId === null)).toBe(true);
    const lastPhase = change.plan.plan.phases.at(-1)!;
    expect(lastPhase.stations.flatMap((s) => s.playerIds)).toContain(late);
    const replay = await app.api.post(`/api/plans/${plan.id}/replan`, body, { token: club.assistant.token });
    expect(replay.body.moves).toEqual([]);
    expect(replay.body.plan.version).toBe(change.plan.version);
    const stranger = await app.api.post(
      `/api/plans/${plan.id}/replan`,
      { add: ['00000000-0000-4000-8000-000000000000'], fromMinute: 5 },
      { token: club.coach.token },
    );
    expect(stranger.status).toBe(400);
    expect(stranger.body.errors[0].field).toBe('add/0');
  });

  it('steps a station harder on "too easy" and stores the verdict once', async () => {
    const current = (await app.api.get(`/api/plans/${plan.id}`, { token: club.coach.token }))
      .body as SessionPlanDto;
    const { phaseIndex, station } = keepBallOf(current);
    const body = { phaseIndex, stationId: station.id, verdict: 'too-easy', clientId: 'tap-77' };
    const first = await app.api.post(`/api/plans/${plan.id}/progression`, body, {
      token: club.assistant.token,
    });
    expect(first.status, first.text).toBe(200);
    const changed = (first.body as PlanChangeDto).plan.plan.phases[phaseIndex].stations.find(
      (s) => s.id === station.id,
    )!;
    expect(changed.area.width).toBeLessThanOrEqual(station.area.width);
    expect(first.body.feedback).toMatchObject({
      clientId: 'tap-77',
      verdict: 'too-easy',
      stationId: station.id,
    });
    const replay = await app.api.post(`/api/plans/${plan.id}/progression`, body, {
      token: club.assistant.token,
    });
    expect(replay.body.feedback.id).toBe(first.body.feedback.id);
    expect(replay.body.plan.version).toBe(first.body.plan.version);
    const all = await app.api.get(`/api/plans/${plan.id}/feedback`, { token: club.coach.token });
    expect(all.body.filter((f: { clientId?: string }) => f.clientId === 'tap-77')).toHaveLength(1);
  });

  it('reports attendance over time and estimated touches per player', async () => {
    const response = await app.api.get(`/api/teams/${squad.teamId}/insight`, { token: club.coach.token });
    expect(response.status).toBe(200);
    const insight = response.body as TeamInsightDto;
    expect(insight.sessions.length).toBe(2);
    const [first, second] = insight.sessions;
    expect(first).toMatchObject({ planId: plan.id, recorded: true, present: 12 });
    expect(second).toMatchObject({ recorded: false, present: 13 });
    const absent = insight.players.find((p) => p.playerId === squad.playerIds[14])!;
    expect(absent).toMatchObject({ sessionsAttended: 0, totalTouches: 0 });
    const regular = insight.players.find((p) => p.playerId === squad.playerIds[1])!;
    expect(regular.sessionsAttended).toBe(2);
    expect(regular.totalTouches).toBe(first.touches[squad.playerIds[1]] + second.touches[squad.playerIds[1]]);
    expect(regular.totalTouches).toBeGreaterThan(0);
  });
});
