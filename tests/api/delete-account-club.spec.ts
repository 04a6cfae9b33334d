/**
 * Deleting an account and deleting a club, against the real PostgreSQL: rows are counted per
 * table (every table information_schema lists) before and after, and every table is scanned for
 * the ids of what was deleted.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { SessionPlanDto } from '../../shared/types/api';
import {
  addMember,
  clubWithStaff,
  registerClub,
  startTestApp,
  TEST_PASSWORD,
  uniqueEmail,
  type ClubCast,
  type SignedIn,
  type TestApp,
} from '../support/api-test-app';
import { createPlan, createSquad } from './fixtures/plan-helpers';

interface Filled {
  cast: ClubCast;
  clubId: string;
  teamId: string;
  plan: SessionPlanDto;
}

describe('deleting an account and deleting a club', () => {
  let app: TestApp;
  beforeAll(async () => {
    app = await startTestApp();
  });
  afterAll(() => app?.close());

  async function tables(): Promise<string[]> {
    const rows = (await app.dataSource.query(
      `SELECT table_name AS name FROM information_schema.tables
        WHERE table_schema = 'public' AND table_type = 'BASE TABLE' AND table_name <> 'migrations'
        ORDER BY table_name`,
    )) as { name: string }[];
    return rows.map((row) => row.name);
  }

  /** For each table, how many of its rows mention any of the ids (anywhere in the row, JSON too). */
  async function rowsMentioning(ids: string[]): Promise<Record<string, number>> {
    const counts: Record<string, number> = {};
    for (const table of await tables()) {
      const [{ n }] = (await app.dataSource.query(
        `SELECT count(*)::int AS n FROM "${table}" t WHERE EXISTS (SELECT 1 FROM unnest($1::text[]) id WHERE t::text LIKE '%' || id || '%')`,
        [ids],
      )) as { n: number }[];
      if (n > 0) counts[table] = n;
    }
    return counts;
  }

  /** Every id that belongs to the club: itself, its members, and every row with its clubId. */
  async function idsOfClub(clubId: string): Promise<string[]> {
    const ids = new Set<string>([clubId]);
    const users = (await app.dataSource.query(`SELECT "userId" AS id FROM membership WHERE "clubId" = $1`, [
      clubId,
    ])) as { id: string }[];
    for (const user of users) ids.add(user.id);
    const withClub = (await app.dataSource.query(
      `SELECT c.table_name AS name FROM information_schema.columns c
         JOIN information_schema.columns i ON i.table_name = c.table_name AND i.table_schema = c.table_schema
        WHERE c.table_schema = 'public' AND c.column_name = 'clubId' AND i.column_name = 'id'`,
    )) as { name: string }[];
    for (const { name } of withClub) {
      const rows = (await app.dataSource.query(`SELECT id::text AS id FROM "${name}" WHERE "clubId" = $1`, [
        clubId,
      ])) as { id: string }[];
      for (const row of rows) ids.add(row.id);
    }
    return [...ids];
  }

  /** A club with a team, players, a plan, a register, feedback, a helper link, rules, mail… */
  async function filledClub(name: string): Promise<Filled> {
    const cast = await clubWithStaff(app, name);
    const clubId = cast.lead.user.clubId;
    const squad = await createSquad(app, cast.coach.token, 8, `${name} U10`);
    const plan = (await createPlan(app, cast.coach.token, squad, {
      date: '2027-02-10',
      kickOff: '17:00',
    })) as SessionPlanDto;
    const ok = (status: number, text: string) => expect(status, text).toBeLessThan(300);
    let r = await app.api.put(
      `/api/plans/${plan.id}/attendance`,
      { playerIds: squad.playerIds.slice(0, 5) },
      { token: cast.coach.token },
    );
    ok(r.status, r.text);
    const station = plan.plan.phases[0]!.stations[0]!;
    r = await app.api.post(
      `/api/plans/${plan.id}/feedback`,
      { stationId: station.id, phaseIndex: 0, verdict: 'right' },
      { token: cast.coach.token },
    );
    ok(r.status, r.text);
    r = await app.api.post(`/api/plans/${plan.id}/helper-links`, undefined, { token: cast.coach.token });
    ok(r.status, r.text);
    r = await app.api.put(
      `/api/teams/${squad.teamId}/kit`,
      { balls: 10, cones: 20, bibs: 10, goals: 2 },
      { token: cast.coach.token },
    );
    ok(r.status, r.text);
    r = await app.api.post(
      `/api/teams/${squad.teamId}/schedule`,
      { date: '2027-03-03', startTime: '18:00', kind: 'training', minutes: 60 },
      { token: cast.coach.token },
    );
    ok(r.status, r.text);
    r = await app.api.post(`/api/teams/${squad.teamId}/calendar`, undefined, { token: cast.coach.token });
    ok(r.status, r.text);
    r = await app.api.post('/api/rule-sets', {}, { token: cast.lead.token });
    ok(r.status, r.text);
    r = await app.api.post(
      '/api/invitations',
      { email: uniqueEmail('guest'), role: 'assistant' },
      { token: cast.lead.token },
    );
    ok(r.status, r.text);
    // What is only a member's: a password reset (and its e-mail) and a failed sign-in.
    r = await app.api.post('/api/auth/password-reset', { email: cast.assistant.user.email });
    ok(r.status, r.text);
    r = await app.api.post('/api/auth/login', {
      email: cast.coach.user.email,
      password: 'not-the-password-1',
    });
    expect(r.status).toBe(401);
    return { cast, clubId, teamId: squad.teamId, plan };
  }

  async function countsOf(clubId: string): Promise<Record<string, number>> {
    return rowsMentioning(await idsOfClub(clubId));
  }

  it('deleting the club removes every row of it from every table and leaves another club as it was', async () => {
    const doomed = await filledClub('Doomed Dolphins');
    const other = await filledClub('Staying Swifts');
    const doomedIds = await idsOfClub(doomed.clubId);
    const emails = [doomed.cast.lead, doomed.cast.coach, doomed.cast.assistant].map((m) => m.user.email);
    const before = await rowsMentioning(doomedIds);
    // The club's rows are spread over many tables before (the scan finds them).
    for (const table of [
      'club',
      'app_user',
      'membership',
      'team',
      'team_coach',
      'player',
      'session_plan',
      'attendance',
      'feedback',
      'helper_link',
      'kit_bag',
      'scheduled_session',
      'team_calendar',
      'rule_set',
      'rule_set_change',
      'invitation',
      'outbox_message',
      'password_reset',
      'email_verification',
    ]) {
      expect(before[table], `${table} holds the club's rows before`).toBeGreaterThan(0);
    }
    const otherBefore = await countsOf(other.clubId);
    const throttled = async () =>
      (
        (await app.dataSource.query(`SELECT count(*)::int AS n FROM sign_in_throttle WHERE email = ANY($1)`, [
          emails,
        ])) as { n: number }[]
      )[0]!.n;
    expect(await throttled()).toBe(1);

    // A coach may not; a name typed wrong is refused by field, and nothing goes.
    const coach = await app.api.delete('/api/club', {
      token: doomed.cast.coach.token,
      body: { clubName: 'Doomed Dolphins' },
    });
    expect(coach.status).toBe(403);
    const wrong = await app.api.delete('/api/club', {
      token: doomed.cast.lead.token,
      body: { clubName: 'doomed dolphins' },
    });
    expect(wrong.status).toBe(400);
    expect(wrong.body.errors).toEqual([
      { field: 'clubName', message: 'does not match the club’s name, Doomed Dolphins' },
    ]);
    const missing = await app.api.delete('/api/club', { token: doomed.cast.lead.token, body: {} });
    expect(missing.status).toBe(400);
    expect(missing.body.errors.map((e: { field: string }) => e.field)).toEqual(['clubName']);
    expect(await rowsMentioning(doomedIds)).toEqual(before);

    const done = await app.api.delete('/api/club', {
      token: doomed.cast.lead.token,
      body: { clubName: 'Doomed Dolphins' },
    });
    expect(done.status, done.text).toBe(204);

    expect(await rowsMentioning(doomedIds)).toEqual({});
    expect(await throttled()).toBe(0);
    expect(await countsOf(other.clubId)).toEqual(otherBefore);
    // Its members' tokens stop working, and they cannot sign in.
    for (const member of [doomed.cast.lead, doomed.cast.coach]) {
      expect((await app.api.get('/api/auth/me', { token: member.token })).status).toBe(401);
      const login = await app.api.post('/api/auth/login', {
        email: member.user.email,
        password: TEST_PASSWORD,
      });
      expect(login.status).toBe(401);
    }
    // The other club carries on.
    const stays = await app.api.get(`/api/plans/${other.plan.id}`, { token: other.cast.coach.token });
    expect(stays.status).toBe(200);
  });

  it('a member deletes their account: what was theirs goes, what they made stays under “Former member”', async () => {
    const filled = await filledClub('Account Albatrosses');
    const second: SignedIn = await addMember(app, filled.clubId, 'lead', 'Lou Leaving');
    const draft = await app.api.post('/api/rule-sets', { name: 'Lou’s rules' }, { token: second.token });
    expect(draft.status, draft.text).toBe(201);
    const plansBefore = (
      (await app.dataSource.query(`SELECT count(*)::int AS n FROM session_plan WHERE "clubId" = $1`, [
        filled.clubId,
      ])) as { n: number }[]
    )[0]!.n;

    const wrong = await app.api.delete('/api/auth/me', {
      token: second.token,
      body: { password: 'nope-nope-1' },
    });
    expect(wrong.status).toBe(400);
    expect(wrong.body.errors).toEqual([{ field: 'password', message: 'is not right' }]);
    expect((await app.api.get('/api/auth/me', { token: second.token })).status).toBe(200);

    const gone = await app.api.delete('/api/auth/me', {
      token: second.token,
      body: { password: TEST_PASSWORD },
    });
    expect(gone.status, gone.text).toBe(204);
    expect((await app.api.get('/api/auth/me', { token: second.token })).status).toBe(401);
    // No row anywhere keeps their id, e-mail address or name.
    expect(await rowsMentioning([second.user.id, second.user.email, 'Lou Leaving'])).toEqual({});
    // (This sign-in attempt counts towards the address's throttle, like any unknown address's.)
    const login = await app.api.post('/api/auth/login', {
      email: second.user.email,
      password: TEST_PASSWORD,
    });
    expect(login.status).toBe(401);
    // The club keeps their rule set and its history, under a neutral name.
    const history = await app.api.get('/api/rule-sets/history', { token: filled.cast.lead.token });
    const theirs = history.body.filter((entry: { ruleSetId: string }) => entry.ruleSetId === draft.body.id);
    expect(theirs.length).toBeGreaterThan(0);
    for (const entry of theirs) expect(entry.authorName).toBe('Former member');
    const ruleSet = await app.api.get(`/api/rule-sets/${draft.body.id}`, { token: filled.cast.lead.token });
    expect(ruleSet.body.authorName).toBe('Former member');

    // The coach who made the plans and the helper link leaves too: the plans stay.
    const coachGone = await app.api.delete('/api/auth/me', {
      token: filled.cast.coach.token,
      body: { password: TEST_PASSWORD },
    });
    expect(coachGone.status, coachGone.text).toBe(204);
    expect(await rowsMentioning([filled.cast.coach.user.id, filled.cast.coach.user.email])).toEqual({});
    const plansAfter = (
      (await app.dataSource.query(`SELECT count(*)::int AS n FROM session_plan WHERE "clubId" = $1`, [
        filled.clubId,
      ])) as { n: number }[]
    )[0]!.n;
    expect(plansAfter).toBe(plansBefore);
    const links = await app.api.get(`/api/plans/${filled.plan.id}/helper-links`, {
      token: filled.cast.lead.token,
    });
    expect(links.status).toBe(200);
    expect(links.body.map((link: { createdByName: string }) => link.createdByName)).toEqual([
      'Former member',
    ]);
  });

  it('the last head of coaching must hand over first; once another is made head of coaching, they can go', async () => {
    const lead = await registerClub(app, 'Handover Herons');
    const coach = await addMember(app, lead.user.clubId, 'coach', 'Cal Coach');
    const refused = await app.api.delete('/api/auth/me', {
      token: lead.token,
      body: { password: TEST_PASSWORD },
    });
    expect(refused.status).toBe(409);
    expect(refused.body.detail).toContain('Handover Herons needs at least one head of coaching');
    expect((await app.api.get('/api/auth/me', { token: lead.token })).status).toBe(200);

    const promoted = await app.api.patch(
      `/api/members/${coach.user.id}`,
      { role: 'lead' },
      { token: lead.token },
    );
    expect(promoted.status).toBe(200);
    const gone = await app.api.delete('/api/auth/me', {
      token: lead.token,
      body: { password: TEST_PASSWORD },
    });
    expect(gone.status, gone.text).toBe(204);
    const members = await app.api.get('/api/members', { token: coach.token });
    expect(members.body.map((m: { name: string }) => m.name)).toEqual(['Cal Coach']);
  });

  it('a member the head of coaching removes is erased the same way', async () => {
    const cast = await clubWithStaff(app, 'Removal Ravens');
    const squad = await createSquad(app, cast.coach.token, 6, 'Ravens U9');
    await createPlan(app, cast.coach.token, squad, { date: '2027-02-11', kickOff: '17:00' });
    const removed = await app.api.delete(`/api/members/${cast.coach.user.id}`, { token: cast.lead.token });
    expect(removed.status).toBe(204);
    expect(await rowsMentioning([cast.coach.user.id, cast.coach.user.email])).toEqual({});
  });
});
