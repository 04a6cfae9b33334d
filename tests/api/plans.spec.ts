import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { SessionPlanDto } from '../../shared/types/api';
import { clubWithStaff, startTestApp, type ClubCast, type TestApp } from '../support/api-test-app';
import { createPlan, createSquad, planRequest, type Squad } from './fixtures/plan-helpers';

describe('/api/plans', () => {
  let app: TestApp;
  let home: ClubCast;
  let away: ClubCast;
  let squad: Squad;
  let awaySquad: Squad;
  let plan: SessionPlanDto;

  beforeAll(async () => {
    app = await startTestApp();
    home = await clubWithStaff(app, 'Harbour Lane Juniors');
    away = await clubWithStaff(app, 'Millbrook Rovers');
    squad = await createSquad(app, home.coach.token, 14, 'U10 Kestrels');
    awaySquad = await createSquad(app, away.coach.token, 8, 'U10 Herons');
    plan = await createPlan(app, home.coach.token, squad);
  });
  afterAll(() => app.close());

  it('generates a draft with the engine default when the club has published no rules', async () => {
    expect(plan).toMatchObject({
      teamId: squad.teamId,
      teamName: 'U10 Kestrels',
      status: 'draft',
      date: '2026-12-05',
    });
    expect(plan.kickOff).toBe('10:30');
    expect(plan.playerCount).toBe(14);
    expect(plan.ruleSetId).toBe(plan.plan.ruleSet.id);
    expect(plan.plan.phases.length).toBeGreaterThan(0);
    // Every present player is in a station of every phase but a drinks break, which has none;
    // names come from the roster.
    for (const phase of plan.plan.phases) {
      const ids = phase.stations.flatMap((s) => s.playerIds).sort();
      expect(ids).toEqual(phase.activityKind === 'break' ? [] : [...squad.playerIds].sort());
    }
    expect(plan.request.players.map((p) => p.name)).toContain('Ada B.');
  });

  it('reads a plan back, lists it and filters by team and dates', async () => {
    const read = await app.api.get(`/api/plans/${plan.id}`, { token: home.assistant.token });
    // An assistant not attached to the team does not see it.
    expect(read.status).toBe(403);
    const byLead = await app.api.get(`/api/plans/${plan.id}`, { token: home.lead.token });
    expect(byLead.status).toBe(200);
    expect(byLead.body.plan).toEqual(plan.plan);
    const list = await app.api.get(`/api/plans?teamId=${squad.teamId}&from=2026-12-01&to=2026-12-31`, {
      token: home.coach.token,
    });
    expect(list.status).toBe(200);
    expect(list.body.items.map((p: { id: string }) => p.id)).toContain(plan.id);
    expect(list.body).toMatchObject({ page: 1, pageSize: 20 });
    const outside = await app.api.get(`/api/plans?teamId=${squad.teamId}&from=2027-01-01`, {
      token: home.coach.token,
    });
    expect(outside.body.items).toEqual([]);
    const otherClub = await app.api.get('/api/plans', { token: away.lead.token });
    expect(otherClub.body.items.map((p: { id: string }) => p.id)).not.toContain(plan.id);
  });

  it('answers 404 for another club’s plan or team on every plan route', async () => {
    const token = away.lead.token;
    const id = plan.id;
    const calls = [
      app.api.get(`/api/plans/${id}`, { token }),
      app.api.patch(`/api/plans/${id}`, { status: 'final' }, { token }),
      app.api.get(`/api/plans/${id}/pdf`, { token }),
      app.api.post(`/api/plans/${id}/share`, { recipients: ['x@example.org'] }, { token }),
      app.api.get(`/api/plans/${id}/attendance`, { token }),
      app.api.put(`/api/plans/${id}/attendance`, { playerIds: [] }, { token }),
      app.api.get(`/api/plans/${id}/feedback`, { token }),
      app.api.post(
        `/api/plans/${id}/feedback`,
        { stationId: 's', phaseIndex: 0, verdict: 'right' },
        { token },
      ),
      app.api.post(`/api/plans/${id}/replan`, { fromMinute: 5, remove: [squad.playerIds[0]] }, { token }),
      app.api.post(
        `/api/plans/${id}/progression`,
        { stationId: 's', phaseIndex: 0, verdict: 'too-easy' },
        { token },
      ),
      app.api.get(`/api/plans?teamId=${squad.teamId}`, { token }),
      app.api.get(`/api/teams/${squad.teamId}/insight`, { token }),
      app.api.post('/api/plans', { teamId: squad.teamId, request: planRequest(squad.playerIds) }, { token }),
    ];
    for (const response of await Promise.all(calls)) {
      expect(response.status, response.text).toBe(404);
      expect(response.headers.get('content-type')).toContain('application/problem+json');
    }
  });

  it('refuses players of another team with 400 naming the field', async () => {
    const response = await app.api.post(
      '/api/plans',
      {
        teamId: squad.teamId,
        request: planRequest([...squad.playerIds.slice(0, 5), awaySquad.playerIds[0]]),
      },
      { token: home.coach.token },
    );
    expect(response.status).toBe(400);
    expect(response.body.errors).toEqual([
      { field: 'request/players/5/id', message: 'is not a player of this team' },
    ]);
  });

  it('names bad fields of the request, never a 5xx', async () => {
    const response = await app.api.post(
      '/api/plans',
      {
        teamId: squad.teamId,
        request: { ...planRequest(squad.playerIds), minutes: 'soon', ageGroup: 'U99' },
      },
      { token: home.coach.token },
    );
    expect(response.status).toBe(400);
    const fields = response.body.errors.map((e: { field: string }) => e.field);
    expect(fields).toEqual(expect.arrayContaining(['request/minutes', 'request/ageGroup']));
  });

  it('lets only leads and coaches create and edit plans', async () => {
    const create = await app.api.post(
      '/api/plans',
      { teamId: squad.teamId, request: planRequest(squad.playerIds) },
      { token: home.assistant.token },
    );
    expect(create.status).toBe(403);
    const patch = await app.api.patch(
      `/api/plans/${plan.id}`,
      { status: 'final' },
      { token: home.assistant.token },
    );
    expect(patch.status).toBe(403);
  });

  it('applies an edit, re-checks it and guards the version with If-Match', async () => {
    const current = (await app.api.get(`/api/plans/${plan.id}`, { token: home.coach.token }))
      .body as SessionPlanDto;
    const phaseIndex = current.plan.phases.findIndex((p) => p.stations.length > 1);
    const phase = current.plan.phases[phaseIndex];
    const edit = { type: 'resize-area', stationId: phase.stations[0].id, phaseIndex, step: 'larger' };
    const stale = await app.api.patch(
      `/api/plans/${plan.id}`,
      { edit },
      {
        token: home.coach.token,
        headers: { 'If-Match': String(current.version + 5) },
      },
    );
    expect(stale.status).toBe(409);
    expect(stale.body.currentVersion).toBe(current.version);

    const ok = await app.api.patch(
      `/api/plans/${plan.id}`,
      { edit },
      {
        token: home.coach.token,
        headers: { 'If-Match': String(current.version) },
      },
    );
    expect(ok.status, ok.text).toBe(200);
    expect(ok.body.version).toBe(current.version + 1);
    const before = phase.stations[0].area.width;
    const after = ok.body.plan.phases[phaseIndex].stations.find(
      (s: { id: string }) => s.id === phase.stations[0].id,
    );
    expect(after.area.width).toBeGreaterThanOrEqual(before);
    expect(ok.body.plan.trace.some((t: { ruleId: string }) => t.ruleId === 'edit.resize-area')).toBe(true);
  });

  it('answers 422 listing the violations when an edited plan breaks the rules', async () => {
    const current = (await app.api.get(`/api/plans/${plan.id}`, { token: home.coach.token }))
      .body as SessionPlanDto;
    // Drop one player from the first phase: a fresh plan never leaves anyone out.
    const broken = structuredClone(current.plan);
    broken.phases[0].stations[0].playerIds = broken.phases[0].stations[0].playerIds.slice(1);
    const response = await app.api.patch(
      `/api/plans/${plan.id}`,
      { plan: broken },
      { token: home.coach.token },
    );
    expect(response.status, response.text).toBe(422);
    expect(response.body.violations.length).toBeGreaterThan(0);
    // Said in words for the coach (the codes stay in `violations`), no field named after a code.
    expect(response.body.detail).toContain(response.body.violations[0].message);
    expect(response.body.detail).not.toMatch(/plan\/|[a-z]+-[a-z]+-[a-z]+:/);
    expect(response.body.errors ?? []).toEqual([]);
    const unchanged = await app.api.get(`/api/plans/${plan.id}`, { token: home.coach.token });
    expect(unchanged.body.version).toBe(current.version);
  });

  it('400s an edit that names a station the plan does not have', async () => {
    const response = await app.api.patch(
      `/api/plans/${plan.id}`,
      { edit: { type: 'resize-area', stationId: 'no-such-station', phaseIndex: 0, step: 'smaller' } },
      { token: home.coach.token },
    );
    expect(response.status).toBe(400);
    // Said in words, without the engine's ids.
    expect(response.body.detail).toMatch(/Reload the plan/);
    expect(response.text).not.toContain('no-such-station');
  });

  it('never answers 5xx to junk bodies', async () => {
    await fc.assert(
      fc.asyncProperty(
        fc.jsonValue(),
        fc.constantFrom('/api/plans', `/api/plans/${plan.id}`),
        async (junk, path) => {
          const method = path === '/api/plans' ? 'POST' : 'PATCH';
          const response = await app.api.call(method, path, { body: junk, token: home.coach.token });
          expect(response.status).toBeGreaterThanOrEqual(400);
          expect(response.status).toBeLessThan(500);
        },
      ),
      { numRuns: 60 },
    );
    await fc.assert(
      fc.asyncProperty(
        fc.record({
          teamId: fc.constant(squad.teamId),
          request: fc.record(
            { players: fc.array(fc.anything()), minutes: fc.anything() },
            { requiredKeys: [] },
          ),
        }),
        async (body) => {
          const response = await app.api.post('/api/plans', body, { token: home.coach.token });
          expect(response.status).toBe(400);
        },
      ),
      { numRuns: 40 },
    );
  });
});
