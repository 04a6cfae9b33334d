import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { defaultRuleSet, generatePlan, listActivities } from '../../engine';
import type { SessionPlanDto, TeamDto } from '../../shared/types/api';
import type { PlanRequest } from '../../shared/types/plan-request';
import type { RuleSetDocument } from '../../shared/types/plan-rules';
import { addMember, clubWithStaff, startTestApp, type ClubCast, type TestApp } from '../support/api-test-app';
import { createPlan, createSquad, planRequest, SQUAD_NAMES, type Squad } from './fixtures/plan-helpers';

const activityIdsOf = (plan: SessionPlanDto) =>
  plan.plan.phases.flatMap((phase) => phase.stations.map((station) => station.activityId));

/** The request as the server completes it for a squad made by createSquad (names, its one keeper). */
function serverRequest(squad: Squad, over: Partial<PlanRequest> = {}): PlanRequest {
  return {
    ...planRequest(squad.playerIds, over),
    players: squad.playerIds.map((id, i) => ({ id, name: SQUAD_NAMES[i]!, goalkeeper: i === 0 })),
  };
}

describe('/api/teams/:id/pinned-activities', () => {
  let app: TestApp;
  let home: ClubCast;
  let away: ClubCast;
  let squad: Squad;
  let pinned: string;

  beforeAll(async () => {
    app = await startTestApp();
    home = await clubWithStaff(app, 'Larkfield Colts');
    away = await clubWithStaff(app, 'Stonebridge Athletic');
    squad = await createSquad(app, home.coach.token, 12, 'U10 Plovers');
    await app.dataSource.query('INSERT INTO team_coach ("teamId", "userId") VALUES ($1, $2)', [
      squad.teamId,
      home.assistant.user.id,
    ]);
    // An activity the plan would not choose by itself but takes when pinned (the engine decides).
    const control = await generatePlan(serverRequest(squad));
    const used = new Set(control.phases.flatMap((p) => p.stations.map((s) => s.activityId)));
    for (const option of listActivities(defaultRuleSet, serverRequest(squad))) {
      if (!option.allowed || used.has(option.id)) continue;
      const withPin = await generatePlan(serverRequest(squad, { pinnedActivityIds: [option.id] }));
      if (withPin.phases.some((p) => p.stations.some((s) => s.activityId === option.id))) {
        pinned = option.id;
        break;
      }
    }
    expect(pinned, 'an activity the engine can honour as a pin').toBeDefined();
  });
  afterAll(() => app.close());

  const put = (token: string, activityIds: unknown, teamId = squad.teamId) =>
    app.api.put(`/api/teams/${teamId}/pinned-activities`, { activityIds }, { token });

  it('lets the lead and the team’s coach pin, and shows the pins on the team', async () => {
    const byLead = await put(home.lead.token, [pinned]);
    expect(byLead.status, byLead.text).toBe(200);
    expect(byLead.body).toEqual({ activityIds: [pinned] });
    const byCoach = await put(home.coach.token, [pinned, pinned]);
    expect(byCoach.status).toBe(200);
    expect(byCoach.body).toEqual({ activityIds: [pinned] });
    const team = (await app.api.get(`/api/teams/${squad.teamId}`, { token: home.coach.token }))
      .body as TeamDto;
    expect(team.pinnedActivityIds).toEqual([pinned]);
    const listed = (await app.api.get('/api/teams', { token: home.lead.token })).body as TeamDto[];
    expect(listed.find((t) => t.id === squad.teamId)?.pinnedActivityIds).toEqual([pinned]);
  });

  it('refuses an assistant and a coach of another team (403), and another club (404)', async () => {
    const otherCoach = await addMember(app, home.lead.user.clubId, 'coach', 'Odile Other');
    expect((await put(home.assistant.token, [pinned])).status).toBe(403);
    expect((await put(otherCoach.token, [pinned])).status).toBe(403);
    const foreign = await put(away.lead.token, [pinned]);
    expect(foreign.status).toBe(404);
    expect(foreign.headers.get('content-type')).toContain('application/problem+json');
    const team = (await app.api.get(`/api/teams/${squad.teamId}`, { token: home.lead.token }))
      .body as TeamDto;
    expect(team.pinnedActivityIds).toEqual([pinned]);
  });

  it('names the bad field in a coach’s words: unknown activities, odd ids, too many, none given', async () => {
    const unknown = await put(home.coach.token, [pinned, 'moonwalk-relay']);
    expect(unknown.status).toBe(400);
    expect(unknown.body.errors).toEqual([
      { field: 'activityIds/1', message: '“moonwalk-relay” is not an activity in the club’s rules' },
    ]);
    const odd = await put(home.coach.token, ['Keep Ball!']);
    expect(odd.status).toBe(400);
    expect(odd.body.errors[0].field).toBe('activityIds/0');
    expect(odd.body.errors[0].message).toMatch(/not an activity's id/);
    expect(odd.body.errors[0].message).not.toMatch(/pattern/);
    const many = await put(
      home.coach.token,
      Array.from({ length: 9 }, (_, i) => `activity-${i}`),
    );
    expect(many.status).toBe(400);
    expect(many.body.errors).toEqual([
      { field: 'activityIds', message: 'can hold at most 8 activities: take one off before pinning another' },
    ]);
    const none = await app.api.put(
      `/api/teams/${squad.teamId}/pinned-activities`,
      {},
      { token: home.coach.token },
    );
    expect(none.status).toBe(400);
    expect(none.body.errors[0].field).toBe('activityIds');
    const team = (await app.api.get(`/api/teams/${squad.teamId}`, { token: home.lead.token }))
      .body as TeamDto;
    expect(team.pinnedActivityIds).toEqual([pinned]);
  });

  it('puts the pins into the next plan, which uses them, and then takes them off the team', async () => {
    const plan = (await createPlan(app, home.coach.token, squad)) as SessionPlanDto;
    expect(plan.request.pinnedActivityIds).toEqual([pinned]);
    expect(activityIdsOf(plan)).toContain(pinned);
    expect(plan.plan.trace.some((t) => t.ruleId === 'engine.pinned')).toBe(true);
    const team = (await app.api.get(`/api/teams/${squad.teamId}`, { token: home.coach.token }))
      .body as TeamDto;
    expect(team.pinnedActivityIds).toEqual([]);
    const after = (await createPlan(app, home.coach.token, squad, { date: '2026-12-12' })) as SessionPlanDto;
    expect(after.request.pinnedActivityIds).toBeUndefined();
  });

  it('leaves the team’s pins alone when the plan request brings its own', async () => {
    expect((await put(home.coach.token, [pinned])).status).toBe(200);
    const plan = (await createPlan(app, home.coach.token, squad, {
      request: { pinnedActivityIds: [] },
    })) as SessionPlanDto;
    expect(plan.request.pinnedActivityIds).toEqual([]);
    const team = (await app.api.get(`/api/teams/${squad.teamId}`, { token: home.coach.token }))
      .body as TeamDto;
    expect(team.pinnedActivityIds).toEqual([pinned]);
    expect((await put(home.coach.token, [])).body).toEqual({ activityIds: [] });
  });

  it('checks ids against the club’s published rules once it has some', async () => {
    const draft = (
      await app.api.post('/api/rule-sets', { name: 'Larkfield rules' }, { token: home.lead.token })
    ).body as { id: string; revision: number; body: RuleSetDocument };
    const body = structuredClone(draft.body);
    const template = body.parameters.activities.find((a) => a.id === pinned)!;
    body.parameters.activities.push({
      ...template,
      id: 'larkfield-gate-dash',
      title: 'Larkfield gate dash',
      origin: 'club',
    });
    const saved = await app.api.put(
      `/api/rule-sets/${draft.id}`,
      { body },
      { token: home.lead.token, headers: { 'If-Match': String(draft.revision) } },
    );
    expect(saved.status, saved.text).toBe(200);
    // Not published yet: the club still plans with the default rules.
    expect((await put(home.coach.token, ['larkfield-gate-dash'])).status).toBe(400);
    const published = await app.api.post(`/api/rule-sets/${draft.id}/publish`, undefined, {
      token: home.lead.token,
    });
    expect(published.status, published.text).toBe(200);
    expect((await put(home.coach.token, ['larkfield-gate-dash'])).body).toEqual({
      activityIds: ['larkfield-gate-dash'],
    });
    // Another club's rules do not have it.
    const awaySquad = await createSquad(app, away.coach.token, 6, 'U10 Wagtails');
    const elsewhere = await put(away.coach.token, ['larkfield-gate-dash'], awaySquad.teamId);
    expect(elsewhere.status).toBe(400);
    expect(elsewhere.body.errors[0].field).toBe('activityIds/0');
  });
});
