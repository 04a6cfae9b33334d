import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { SessionPlanDto } from '../../shared/types/api';
import type { ApiResponse } from '../support/api-client';
import {
  clubWithStaff,
  createTeam,
  startTestApp,
  uniqueEmail,
  type ClubCast,
  type TestApp,
} from '../support/api-test-app';
import { createPlan, createSquad, planRequest, type Squad } from './fixtures/plan-helpers';

function upload(content: string): FormData {
  const form = new FormData();
  form.append('file', new Blob([Buffer.from(content, 'utf8')], { type: 'text/csv' }), 'squad.csv');
  return form;
}

describe('Idempotency-Key on creates', () => {
  let app: TestApp;
  let club: ClubCast;
  let other: ClubCast;
  let squad: Squad;
  let plan: SessionPlanDto;

  beforeAll(async () => {
    app = await startTestApp();
    club = await clubWithStaff(app, 'Quarry Lane Colts');
    other = await clubWithStaff(app, 'Fernhill Athletic');
    squad = await createSquad(app, club.coach.token, 8, 'U10 Larks');
    plan = await createPlan(app, club.coach.token, squad);
  });
  afterAll(() => app.close());

  const count = async (sql: string, params: unknown[]) =>
    ((await app.dataSource.query(sql, params)) as { n: number }[])[0]!.n;
  const post = (path: string, body: unknown, key?: string, token = club.coach.token) =>
    app.api.post(path, body, { token, headers: key === undefined ? {} : { 'Idempotency-Key': key } });

  /** Sends the same request twice with one key: the second repeats the first and creates nothing. */
  async function expectReplayed(first: ApiResponse, again: ApiResponse, status: number) {
    expect(first.status).toBe(status);
    expect(first.headers.get('idempotent-replayed')).toBeNull();
    expect(again.status).toBe(status);
    expect(again.headers.get('idempotent-replayed')).toBe('true');
    expect(again.text).toBe(first.text);
    expect(again.headers.get('content-type')).toMatch(/json/);
  }

  const teamBody = (name: string) => ({
    name,
    ageGroup: 'U9',
    level: 'beginner',
    usualSpace: { width: 30, length: 40 },
  });
  const teamsNamed = (name: string) =>
    count('SELECT count(*)::int AS n FROM team WHERE "clubId" = $1 AND name = $2', [
      club.lead.user.clubId,
      name,
    ]);

  it('a team: the same key twice makes one team, and the replay carries the first answer', async () => {
    const key = randomUUID();
    const first = await post('/api/teams', teamBody('U9 Moths'), key);
    const again = await post('/api/teams', teamBody('U9 Moths'), key);
    await expectReplayed(first, again, 201);
    expect(await teamsNamed('U9 Moths')).toBe(1);
  });

  it('without the header a create behaves as before: two requests, two teams', async () => {
    expect((await post('/api/teams', teamBody('U9 Gnats'))).status).toBe(201);
    expect((await post('/api/teams', teamBody('U9 Gnats'))).status).toBe(201);
    expect(await teamsNamed('U9 Gnats')).toBe(2);
  });

  it('a player: one row for a replayed key, and a replay with another body is refused with 422', async () => {
    const path = `/api/teams/${squad.teamId}/players`;
    const key = randomUUID();
    const named = (name: string) =>
      count('SELECT count(*)::int AS n FROM player WHERE "teamId" = $1 AND "displayName" = $2', [
        squad.teamId,
        name,
      ]);
    const first = await post(path, { displayName: 'Wren D.' }, key);
    const again = await post(path, { displayName: 'Wren D.' }, key);
    await expectReplayed(first, again, 201);
    expect(await named('Wren D.')).toBe(1);

    const changed = await post(path, { displayName: 'Wren E.' }, key);
    expect(changed.status).toBe(422);
    expect(changed.headers.get('content-type')).toMatch(/application\/problem\+json/);
    expect(changed.body.detail).toMatch(/already used for a different request/);
    expect(changed.body.errors).toEqual([{ field: 'Idempotency-Key', message: expect.any(String) }]);
    expect(await named('Wren E.')).toBe(0);
  });

  it('a plan: the replay repeats status, body, Location and ETag, and one plan is stored', async () => {
    const key = randomUUID();
    const body = {
      teamId: squad.teamId,
      date: '2026-12-12',
      kickOff: '09:15',
      request: planRequest(squad.playerIds),
    };
    const plansOn = () =>
      count('SELECT count(*)::int AS n FROM session_plan WHERE "teamId" = $1 AND date = $2', [
        squad.teamId,
        '2026-12-12',
      ]);
    const first = await post('/api/plans', body, key);
    const again = await post('/api/plans', body, key);
    await expectReplayed(first, again, 201);
    expect(again.headers.get('location')).toBe(`/api/plans/${first.body.id}`);
    expect(again.headers.get('etag')).toBe(first.headers.get('etag'));
    expect(await plansOn()).toBe(1);
    // Without the key the same body makes a second plan, as before.
    expect((await post('/api/plans', body)).status).toBe(201);
    expect(await plansOn()).toBe(2);
  });

  it('a share: a replayed key queues the e-mails once', async () => {
    const key = randomUUID();
    const recipients = [uniqueEmail('helper'), uniqueEmail('parent')];
    const path = `/api/plans/${plan.id}/share`;
    const first = await post(path, { recipients }, key);
    const again = await post(path, { recipients }, key);
    await expectReplayed(first, again, 202);
    expect(first.body.queued).toBe(2);
    const queued = await count(
      `SELECT count(*)::int AS n FROM outbox_message WHERE kind = 'plan-share' AND recipients ?| $1`,
      [recipients],
    );
    expect(queued).toBe(2);
  });

  it('an invitation: one invitation and one e-mail for a replayed key', async () => {
    const key = randomUUID();
    const email = uniqueEmail('invitee');
    const first = await post('/api/invitations', { email, role: 'assistant' }, key, club.lead.token);
    const again = await post('/api/invitations', { email, role: 'assistant' }, key, club.lead.token);
    await expectReplayed(first, again, 201);
    expect(await count('SELECT count(*)::int AS n FROM invitation WHERE email = $1', [email])).toBe(1);
    expect(await count(`SELECT count(*)::int AS n FROM outbox_message WHERE recipients ? $1`, [email])).toBe(
      1,
    );
  });

  it('a roster import: committing the same preview twice with one key adds the players once', async () => {
    const teamId = (await createTeam(app, club.coach.token, { name: 'U11 Voles' })).id;
    const preview = await app.api.call('POST', `/api/teams/${teamId}/players/import`, {
      token: club.coach.token,
      rawBody: upload('name\nPip R.\nSol T.\n'),
    });
    expect(preview.status).toBe(200);
    const body = { importId: preview.body.importId, rows: preview.body.rows };
    const key = randomUUID();
    const path = `/api/teams/${teamId}/players/import/commit`;
    const first = await post(path, body, key);
    const again = await post(path, body, key);
    await expectReplayed(first, again, 201);
    expect(await count('SELECT count(*)::int AS n FROM player WHERE "teamId" = $1', [teamId])).toBe(2);
  });

  it('keys are per member and per route: the same key elsewhere is a new request', async () => {
    const key = randomUUID();
    expect((await post('/api/teams', teamBody('U8 Newts'), key)).status).toBe(201);
    const byLead = await post('/api/teams', teamBody('U8 Newts'), key, club.lead.token);
    expect(byLead.status).toBe(201);
    expect(byLead.headers.get('idempotent-replayed')).toBeNull();
    const player = await post(`/api/teams/${squad.teamId}/players`, { displayName: 'Ash N.' }, key);
    expect(player.status).toBe(201);
    expect(player.headers.get('idempotent-replayed')).toBeNull();
    expect(await teamsNamed('U8 Newts')).toBe(2);
  });

  it('a header that is not a usable key answers 400 naming the header, and nothing is created', async () => {
    for (const bad of ['short', 'x'.repeat(129), 'has spaces in it', 'café-au-lait-key']) {
      const response = await post('/api/teams', teamBody('U9 Bad Keys'), bad);
      expect(response.status).toBe(400);
      expect(response.headers.get('content-type')).toMatch(/application\/problem\+json/);
      expect(response.body.errors).toEqual([{ field: 'Idempotency-Key', message: expect.any(String) }]);
    }
    expect(await teamsNamed('U9 Bad Keys')).toBe(0);
  });

  it('a refused first request keeps nothing, so the same key works once the request is fixed', async () => {
    const key = randomUUID();
    const theirs = (await createTeam(app, other.lead.token)).id;
    const refused = await post(`/api/teams/${theirs}/players`, { displayName: 'Kit O.' }, key);
    expect(refused.status).toBe(404);
    expect(await count('SELECT count(*)::int AS n FROM idempotency_record WHERE key = $1', [key])).toBe(0);
    const invalid = await post(`/api/teams/${squad.teamId}/players`, { displayName: '' }, key);
    expect(invalid.status).toBe(400);
    const fixed = await post(`/api/teams/${squad.teamId}/players`, { displayName: 'Kit O.' }, key);
    expect(fixed.status).toBe(201);
    expect(fixed.headers.get('idempotent-replayed')).toBeNull();
  });

  it('two copies sent at the same moment make one team; the other copy replays or is told to wait', async () => {
    const key = randomUUID();
    const responses = await Promise.all([
      post('/api/teams', teamBody('U12 Twins'), key),
      post('/api/teams', teamBody('U12 Twins'), key),
      post('/api/teams', teamBody('U12 Twins'), key),
    ]);
    const statuses = responses.map((r) => r.status);
    expect(statuses).toContain(201);
    for (const response of responses) {
      expect([201, 409]).toContain(response.status);
      if (response.status === 409) {
        expect(response.headers.get('retry-after')).toBe('1');
        expect(response.body.type).toBe('/problems/request-in-progress');
      }
    }
    expect(await teamsNamed('U12 Twins')).toBe(1);
    const later = await post('/api/teams', teamBody('U12 Twins'), key);
    expect(later.status).toBe(201);
    expect(later.headers.get('idempotent-replayed')).toBe('true');
  });

  it('a copy that arrives while the first is running gets 409; one left running for minutes is taken over', async () => {
    const key = randomUUID();
    const route = 'POST /api/teams';
    // A first request still running, as another instance would leave it mid-way.
    await app.dataSource.query(
      `INSERT INTO idempotency_record ("userId", route, key, "requestHash", "expiresAt")
       VALUES ($1, $2, $3, 'x', now() + interval '1 day')`,
      [club.coach.user.id, route, key],
    );
    const waiting = await post('/api/teams', teamBody('U13 Owls'), key);
    expect(waiting.status).toBe(409);
    expect(waiting.body.detail).toMatch(/still being processed/);
    expect(await teamsNamed('U13 Owls')).toBe(0);
    // That instance died: after a minute the key is free again.
    await app.dataSource.query(
      `UPDATE idempotency_record SET "createdAt" = now() - interval '2 minutes' WHERE key = $1`,
      [key],
    );
    expect((await post('/api/teams', teamBody('U13 Owls'), key)).status).toBe(201);
    expect(await teamsNamed('U13 Owls')).toBe(1);
  });

  it('a client that gave up before the answer gets the first answer when it sends the plan again', async () => {
    const key = randomUUID();
    const body = {
      teamId: squad.teamId,
      date: '2026-12-19',
      request: planRequest(squad.playerIds, { seed: 'gave-up' }),
    };
    const recordOf = async () =>
      (
        (await app.dataSource.query('SELECT status FROM idempotency_record WHERE key = $1', [key])) as {
          status: number | null;
        }[]
      )[0];
    // The team row locked, so the plan's INSERT waits: the client leaves while the plan is being made.
    const lock = app.dataSource.createQueryRunner();
    await lock.connect();
    await lock.startTransaction();
    try {
      await lock.query('SELECT 1 FROM team WHERE id = $1 FOR UPDATE', [squad.teamId]);
      const leaving = new AbortController();
      const first = fetch(`${app.http.url}/api/plans`, {
        method: 'POST',
        headers: {
          'content-type': 'application/json',
          authorization: `Bearer ${club.coach.token}`,
          'idempotency-key': key,
        },
        body: JSON.stringify(body),
        signal: leaving.signal,
      }).catch(() => null);
      await expect.poll(recordOf, { timeout: 10_000, interval: 20 }).toEqual({ status: null });
      leaving.abort();
      await first;
      // Long enough for the server to see the client go; the key must stay taken meanwhile.
      await new Promise((resolve) => setTimeout(resolve, 300));
      expect(await recordOf()).toEqual({ status: null });
    } finally {
      await lock.commitTransaction();
      await lock.release();
    }
    await expect.poll(recordOf, { timeout: 10_000, interval: 20 }).toEqual({ status: 201 });
    const again = await post('/api/plans', body, key);
    expect(again.status).toBe(201);
    expect(again.headers.get('idempotent-replayed')).toBe('true');
    const stored = await count(
      'SELECT count(*)::int AS n FROM session_plan WHERE "teamId" = $1 AND date = $2',
      [squad.teamId, '2026-12-19'],
    );
    expect(stored).toBe(1);
  });

  it('records expire after a day: an expired key makes a new row, and expired records are purged', async () => {
    const key = randomUUID();
    expect((await post('/api/teams', teamBody('U14 Elk'), key)).status).toBe(201);
    const [kept] = await app.dataSource.query(
      `SELECT extract(epoch FROM "expiresAt" - "createdAt")::int AS seconds FROM idempotency_record WHERE key = $1`,
      [key],
    );
    expect(kept.seconds).toBe(24 * 60 * 60);
    await app.dataSource.query(
      `UPDATE idempotency_record SET "expiresAt" = now() - interval '1 second' WHERE key = $1`,
      [key],
    );
    const stale = randomUUID();
    await app.dataSource.query(
      `INSERT INTO idempotency_record ("userId", route, key, "requestHash", status, body, "expiresAt")
       VALUES ($1, 'POST /api/teams', $2, 'x', 201, '{}', now() - interval '1 hour')`,
      [club.lead.user.id, stale],
    );
    const again = await post('/api/teams', teamBody('U14 Elk'), key);
    expect(again.status).toBe(201);
    expect(again.headers.get('idempotent-replayed')).toBeNull();
    expect(await teamsNamed('U14 Elk')).toBe(2);
    expect(await count('SELECT count(*)::int AS n FROM idempotency_record WHERE key = $1', [stale])).toBe(0);
  });
});

describe('DELETE /api/plans/:id', () => {
  let app: TestApp;
  let club: ClubCast;
  let other: ClubCast;
  let squad: Squad;

  beforeAll(async () => {
    app = await startTestApp();
    club = await clubWithStaff(app, 'Brook Meadow Youth');
    other = await clubWithStaff(app, 'Saltmarsh Town');
    squad = await createSquad(app, club.coach.token, 8, 'U10 Otters');
    // The assistant helps with this team; a second coach does not coach it.
    const patched = await app.api.patch(
      `/api/teams/${squad.teamId}`,
      { coachIds: [club.coach.user.id, club.assistant.user.id] },
      { token: club.lead.token },
    );
    expect(patched.status).toBe(200);
  });
  afterAll(() => app.close());

  const rows = async (table: string, planId: string) =>
    (
      (await app.dataSource.query(`SELECT count(*)::int AS n FROM ${table} WHERE "planId" = $1`, [
        planId,
      ])) as {
        n: number;
      }[]
    )[0]!.n;

  it('the team’s coach deletes a plan with its attendance and station feedback', async () => {
    const plan = (await createPlan(app, club.coach.token, squad)) as SessionPlanDto;
    const token = club.coach.token;
    const attendance = await app.api.put(
      `/api/plans/${plan.id}/attendance`,
      { playerIds: squad.playerIds.slice(0, 3) },
      { token },
    );
    expect(attendance.status).toBeLessThan(300);
    const station = plan.plan.phases.find((p) => p.stations.length)!.stations[0]!;
    const feedback = await app.api.post(
      `/api/plans/${plan.id}/feedback`,
      { stationId: station.id, phaseIndex: 0, verdict: 'right' },
      { token },
    );
    expect(feedback.status).toBeLessThan(300);
    expect(await rows('attendance', plan.id)).toBe(3);
    expect(await rows('feedback', plan.id)).toBe(1);

    const deleted = await app.api.delete(`/api/plans/${plan.id}`, { token });
    expect(deleted.status).toBe(204);
    expect((await app.api.get(`/api/plans/${plan.id}`, { token })).status).toBe(404);
    expect(await rows('attendance', plan.id)).toBe(0);
    expect(await rows('feedback', plan.id)).toBe(0);
    // The players stay on the team.
    const players = await app.api.get(`/api/teams/${squad.teamId}/players`, { token });
    expect(players.body).toHaveLength(8);
  });

  it('the lead deletes any team’s plan; a second delete answers 404', async () => {
    const plan = await createPlan(app, club.coach.token, squad);
    expect((await app.api.delete(`/api/plans/${plan.id}`, { token: club.lead.token })).status).toBe(204);
    expect((await app.api.delete(`/api/plans/${plan.id}`, { token: club.lead.token })).status).toBe(404);
  });

  it('assistants and coaches of other teams get 403, another club 404, and the plan stays', async () => {
    const plan = await createPlan(app, club.coach.token, squad);
    const assistant = await app.api.delete(`/api/plans/${plan.id}`, { token: club.assistant.token });
    expect(assistant.status).toBe(403);
    expect(assistant.headers.get('content-type')).toMatch(/application\/problem\+json/);
    const leadsTeam = await createSquad(app, club.lead.token, 4, 'U12 Stoats');
    const leadsPlan = await createPlan(app, club.lead.token, leadsTeam);
    expect((await app.api.delete(`/api/plans/${leadsPlan.id}`, { token: club.coach.token })).status).toBe(
      403,
    );
    expect((await app.api.delete(`/api/plans/${plan.id}`, { token: other.lead.token })).status).toBe(404);
    expect((await app.api.delete('/api/plans/not-a-plan', { token: club.lead.token })).status).toBe(400);
    for (const id of [plan.id, leadsPlan.id])
      expect((await app.api.get(`/api/plans/${id}`, { token: club.lead.token })).status).toBe(200);
  });
});
