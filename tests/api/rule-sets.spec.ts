import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { RuleSetDto, SessionPlanDto } from '../../shared/types/api';
import type { RuleSetDocument } from '../../shared/types/plan-rules';
import type { RuleSetChangeDto } from '../../shared/types/rule-set-api';
import { clubWithStaff, startTestApp, type ClubCast, type TestApp } from '../support/api-test-app';
import { createPlan, createSquad, type Squad } from './fixtures/plan-helpers';

/** Attackers per defender in each keep-ball station of a plan. */
const keepBallShapes = (plan: SessionPlanDto) =>
  plan.plan.phases
    .flatMap((p) => p.stations)
    .filter((s) => s.activityKind === 'keep-ball')
    .map((s) => `${s.roles.attackers?.length ?? 0}v${s.roles.defenders?.length ?? 0}`);

describe('/api/rule-sets', () => {
  let app: TestApp;
  let club: ClubCast;
  let rival: ClubCast;
  let squad: Squad;
  let oldPlan: SessionPlanDto;
  let draft: RuleSetDto;

  beforeAll(async () => {
    app = await startTestApp();
    club = await clubWithStaff(app, 'Fernhill Colts');
    rival = await clubWithStaff(app, 'Quarry End Athletic');
    squad = await createSquad(app, club.coach.token, 16, 'U10 Larks');
    oldPlan = await createPlan(app, club.coach.token, squad);
  });
  afterAll(() => app.close());

  it('shows the engine default as the published rules of a club that has none', async () => {
    const response = await app.api.get('/api/rule-sets/published', { token: club.assistant.token });
    expect(response.status).toBe(200);
    expect(response.body).toMatchObject({ id: 'default', status: 'published' });
    expect(oldPlan.ruleSetId).toBe('default');
  });

  it('lets only the lead start a draft', async () => {
    expect((await app.api.post('/api/rule-sets', {}, { token: club.coach.token })).status).toBe(403);
    expect((await app.api.post('/api/rule-sets', {}, { token: club.assistant.token })).status).toBe(403);
    const response = await app.api.post(
      '/api/rule-sets',
      { name: 'Fernhill rules 2027' },
      { token: club.lead.token },
    );
    expect(response.status).toBe(201);
    draft = response.body;
    expect(draft).toMatchObject({ status: 'draft', name: 'Fernhill rules 2027', authorName: 'Lena Lead' });
    expect((draft.body as RuleSetDocument).parameters.keepBall.intermediate.formats[0]).toEqual({
      attackers: 4,
      defenders: 1,
    });
    const list = await app.api.get('/api/rule-sets', { token: club.coach.token });
    expect(list.body.map((r: RuleSetDto) => r.id)).toContain(draft.id);
  });

  it('needs If-Match, validates the body with JSON pointers, and 409s the second of two saves', async () => {
    const body = structuredClone(draft.body) as RuleSetDocument;
    body.parameters.keepBall.intermediate.formats = [{ attackers: 3, defenders: 1 }];
    const noPrecondition = await app.api.put(
      `/api/rule-sets/${draft.id}`,
      { body },
      { token: club.lead.token },
    );
    expect(noPrecondition.status).toBe(428);

    const invalid = structuredClone(body) as unknown as {
      parameters: { timing: { minPhaseMinutes: unknown } };
    };
    invalid.parameters.timing.minPhaseMinutes = 'three';
    const bad = await app.api.put(
      `/api/rule-sets/${draft.id}`,
      { body: invalid },
      {
        token: club.lead.token,
        headers: { 'If-Match': `"${draft.revision}"` },
      },
    );
    expect(bad.status).toBe(400);
    expect(bad.body.errors.map((e: { field: string }) => e.field)).toContain(
      'body/parameters/timing/minPhaseMinutes',
    );

    // Two leads save on top of the same revision at once: exactly one wins.
    const secondLead = structuredClone(body);
    secondLead.parameters.touchTarget.minPerPlayer = 55;
    const [a, b] = await Promise.all([
      app.api.put(
        `/api/rule-sets/${draft.id}`,
        { body },
        { token: club.lead.token, headers: { 'If-Match': String(draft.revision) } },
      ),
      app.api.put(
        `/api/rule-sets/${draft.id}`,
        { body: secondLead },
        { token: club.lead.token, headers: { 'If-Match': String(draft.revision) } },
      ),
    ]);
    expect([a.status, b.status].sort()).toEqual([200, 409]);
    const [won, lost] = a.status === 200 ? [a, b] : [b, a];
    expect(lost.body.currentRevision).toBe(won.body.revision);
    expect(lost.body.current.revision).toBe(won.body.revision);
    expect(lost.headers.get('content-type')).toContain('application/problem+json');

    // The loser reloads and re-applies on the current revision; the edit of the winner is kept.
    const reapplied = structuredClone(lost.body.current.body) as RuleSetDocument;
    reapplied.parameters.keepBall.intermediate.formats = [{ attackers: 3, defenders: 1 }];
    reapplied.parameters.touchTarget.minPerPlayer = 55;
    const retry = await app.api.put(
      `/api/rule-sets/${draft.id}`,
      { body: reapplied },
      {
        token: club.lead.token,
        headers: { 'If-Match': String(lost.body.currentRevision) },
      },
    );
    expect(retry.status, retry.text).toBe(200);
    draft = retry.body;
    expect((draft.body as RuleSetDocument).parameters.keepBall.intermediate.formats).toEqual([
      { attackers: 3, defenders: 1 },
    ]);
  });

  it('publishes (lead only): new plans use it, old plans keep the version they were made with', async () => {
    expect(
      (await app.api.post(`/api/rule-sets/${draft.id}/publish`, undefined, { token: club.coach.token }))
        .status,
    ).toBe(403);
    const published = await app.api.post(`/api/rule-sets/${draft.id}/publish`, undefined, {
      token: club.lead.token,
    });
    expect(published.status, published.text).toBe(200);
    expect(published.body).toMatchObject({ id: draft.id, status: 'published' });
    const next = await createPlan(app, club.coach.token, squad, { date: '2026-12-19' });
    expect(next.ruleSetId).toBe(draft.id);
    expect(next.ruleSetVersion).toBe(published.body.version);
    expect(keepBallShapes(next).length).toBeGreaterThan(0);
    expect(keepBallShapes(next).every((s) => s === '3v1')).toBe(true);
    const old = await app.api.get(`/api/plans/${oldPlan.id}`, { token: club.coach.token });
    expect(old.body.ruleSetId).toBe('default');
    expect(keepBallShapes(old.body)).toEqual(keepBallShapes(oldPlan));
    const edit = await app.api.put(
      `/api/rule-sets/${draft.id}`,
      { name: 'late change' },
      {
        token: club.lead.token,
        headers: { 'If-Match': String(published.body.revision) },
      },
    );
    expect(edit.status).toBe(409);
  });

  it('keeps a history of what each save changed, and rolls back', async () => {
    const history = (await app.api.get('/api/rule-sets/history', { token: club.coach.token }))
      .body as RuleSetChangeDto[];
    expect(history.map((h) => h.action)).toEqual(['publish', 'update', 'update', 'create']);
    // The two saves (the winner's, then the loser's re-applied one) together touched both edits.
    expect([...history[1].changedPaths, ...history[2].changedPaths]).toEqual(
      expect.arrayContaining([
        '/parameters/keepBall/intermediate/formats/0/attackers',
        '/parameters/touchTarget/minPerPlayer',
      ]),
    );
    expect(history.every((h) => h.authorName === 'Lena Lead')).toBe(true);

    // Each save keeps what it changed, before and after; together the two saves changed both places.
    const saved = [...(history[1].changes ?? []), ...(history[2].changes ?? [])];
    expect(saved).toEqual(
      expect.arrayContaining([
        {
          path: '/parameters/keepBall/intermediate/formats/0/attackers',
          change: 'changed',
          before: 4,
          after: 3,
        },
        {
          path: '/parameters/touchTarget/minPerPlayer',
          change: 'changed',
          before: expect.any(Number),
          after: 55,
        },
      ]),
    );

    const rollback = await app.api.post(
      '/api/rule-sets/rollback',
      { to: 'default' },
      { token: club.lead.token },
    );
    expect(rollback.status, rollback.text).toBe(201);
    expect(rollback.body.status).toBe('published');
    // Without the team's history (which steers the next plan to other activities), the same
    // request under the rolled-back rules sets keep-ball up as the first plan did.
    const after = await createPlan(app, club.coach.token, squad, {
      date: '2026-12-26',
      request: { recentActivityIds: [] },
    });
    expect(after.ruleSetId).toBe(rollback.body.id);
    expect(keepBallShapes(after)).toEqual(keepBallShapes(oldPlan));
    const versions = (await app.api.get('/api/rule-sets', { token: club.lead.token })).body as RuleSetDto[];
    expect(versions.find((v) => v.id === draft.id)?.status).toBe('archived');
  });

  it('answers 404 for another club’s rule sets', async () => {
    const token = rival.lead.token;
    const calls = [
      app.api.get(`/api/rule-sets/${draft.id}`, { token }),
      app.api.put(`/api/rule-sets/${draft.id}`, { name: 'x' }, { token, headers: { 'If-Match': '1' } }),
      app.api.post(`/api/rule-sets/${draft.id}/publish`, undefined, { token }),
      app.api.get(`/api/rule-sets/history?ruleSetId=${draft.id}`, { token }),
      app.api.post('/api/rule-sets', { from: draft.id }, { token }),
      app.api.post('/api/rule-sets/rollback', { to: draft.id }, { token }),
    ];
    for (const response of await Promise.all(calls)) expect(response.status, response.text).toBe(404);
    const theirs = await app.api.get('/api/rule-sets', { token });
    expect(theirs.body).toEqual([]);
  });

  it('400s malformed rule-set requests', async () => {
    const token = club.lead.token;
    expect((await app.api.post('/api/rule-sets', { from: 'yesterday' }, { token })).status).toBe(400);
    expect((await app.api.post('/api/rule-sets', { name: 7 }, { token })).status).toBe(400);
    const junk = await app.api.call('POST', '/api/rule-sets', {
      rawBody: '{"name":',
      token,
      headers: { 'content-type': 'application/json' },
    });
    expect(junk.status).toBe(400);
  });

  it('gives a saved body back with its keys in the order the lead wrote them', async () => {
    const fresh = (await app.api.post('/api/rule-sets', { name: 'Key order' }, { token: club.lead.token }))
      .body as RuleSetDto;
    const current = fresh.body as RuleSetDocument;
    const reordered = Object.fromEntries(Object.entries(current.parameters).reverse());
    const body = { rules: current.rules, parameters: reordered, ...{ name: current.name, id: current.id } };
    const saved = await app.api.put(
      `/api/rule-sets/${fresh.id}`,
      { body: { ...body, version: current.version } },
      { token: club.lead.token, headers: { 'If-Match': String(fresh.revision) } },
    );
    expect(saved.status, saved.text).toBe(200);
    const read = await app.api.get(`/api/rule-sets/${fresh.id}`, { token: club.lead.token });
    const readBody = read.body.body as RuleSetDocument;
    expect(Object.keys(readBody.parameters)).toEqual(Object.keys(reordered));
    expect(Object.keys(readBody).slice(0, 2)).toEqual(['rules', 'parameters']);
  });
});
