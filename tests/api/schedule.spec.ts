import { Writable } from 'node:stream';
import { pino } from 'pino';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { startHttpServer } from '../../server/http-server';
import { createDataSource } from '../../server/data-source';
import { todayIn, zonedMoment } from '../../server/services/local-time';
import type { SessionPlanDto } from '../../shared/types/api';
import { addDays, type ScheduledSessionDto, type TeamCalendarDto } from '../../shared/types/schedule';
import {
  addMember,
  clubWithStaff,
  startTestApp,
  testConfig,
  type ClubCast,
  type SignedIn,
  type TestApp,
} from '../support/api-test-app';
import { createSquad, planRequest, SQUAD_NAMES, type Squad } from './fixtures/plan-helpers';

/** The lines of an iCalendar text with folded lines joined again (RFC 5545, 3.1). */
function icsLines(text: string): string[] {
  return text
    .replace(/\r\n[ \t]/g, '')
    .split('\r\n')
    .filter(Boolean);
}

/** Each VEVENT's properties by name (the part before ':' and any ';' parameters). */
function icsEvents(text: string): { name: string; params: string; value: string }[][] {
  const events: { name: string; params: string; value: string }[][] = [];
  let current: { name: string; params: string; value: string }[] | null = null;
  for (const line of icsLines(text)) {
    if (line === 'BEGIN:VEVENT') current = [];
    else if (line === 'END:VEVENT') {
      events.push(current!);
      current = null;
    } else if (current) {
      const colon = line.indexOf(':');
      const [name, ...params] = line.slice(0, colon).split(';');
      current.push({ name: name!, params: params.join(';'), value: line.slice(colon + 1) });
    }
  }
  return events;
}

/** The last Sunday of March of a year: the day British clocks go forward. */
function lastSundayOfMarch(year: number): string {
  const day = new Date(Date.UTC(year, 2, 31));
  day.setUTCDate(31 - day.getUTCDay());
  return day.toISOString().slice(0, 10);
}

describe('a team’s schedule and its calendar feed', () => {
  let app: TestApp;
  let home: ClubCast;
  let away: ClubCast;
  let squad: Squad;
  let otherCoach: SignedIn;
  let helper: SignedIn;
  const today = todayIn('Europe/London');

  beforeAll(async () => {
    app = await startTestApp();
    home = await clubWithStaff(app, 'Larkfield Colts');
    away = await clubWithStaff(app, 'Stonebridge Athletic');
    squad = await createSquad(app, home.coach.token, 10, 'Falcons');
    await app.dataSource.query('INSERT INTO team_coach ("teamId", "userId") VALUES ($1, $2)', [
      squad.teamId,
      home.assistant.user.id,
    ]);
    otherCoach = await addMember(app, home.lead.user.clubId, 'coach', 'Odile Other');
    helper = await addMember(app, home.lead.user.clubId, 'assistant', 'Hal Helper');
  });
  afterAll(() => app.close());

  const schedule = (teamId = squad.teamId) => `/api/teams/${teamId}/schedule`;
  const session = (over: Record<string, unknown> = {}) => ({
    date: addDays(today, 2),
    startTime: '18:00',
    kind: 'training',
    minutes: 60,
    place: 'Meadow Lane, pitch 2',
    ...over,
  });

  it('lets the lead, the team’s coach and its assistant add, change and delete sessions', async () => {
    for (const member of [home.lead, home.coach, home.assistant]) {
      const created = await app.api.post(schedule(), session(), { token: member.token });
      expect(created.status, created.text).toBe(201);
      const dto = created.body as ScheduledSessionDto;
      expect(dto).toMatchObject({
        teamId: squad.teamId,
        teamName: 'Falcons',
        date: addDays(today, 2),
        startTime: '18:00',
        kind: 'training',
        minutes: 60,
        place: 'Meadow Lane, pitch 2',
        timeZone: 'Europe/London',
        planId: null,
      });
      const changed = await app.api.patch(
        `${schedule()}/${dto.id}`,
        { kind: 'match', startTime: '10:30', minutes: 20 },
        { token: member.token },
      );
      expect(changed.status, changed.text).toBe(200);
      expect(changed.body).toMatchObject({ kind: 'match', startTime: '10:30', minutes: 20, date: dto.date });
      const deleted = await app.api.delete(`${schedule()}/${dto.id}`, { token: member.token });
      expect(deleted.status).toBe(204);
      const listed = (await app.api.get(`${schedule()}?days=7`, { token: member.token }))
        .body as ScheduledSessionDto[];
      expect(listed.map((s) => s.id)).not.toContain(dto.id);
    }
  });

  it('lets other members of the club read but not change it; an assistant of another team reads nothing', async () => {
    const kept = (await app.api.post(schedule(), session(), { token: home.coach.token }))
      .body as ScheduledSessionDto;
    const read = await app.api.get(schedule(), { token: otherCoach.token });
    expect(read.status).toBe(200);
    expect((read.body as ScheduledSessionDto[]).map((s) => s.id)).toContain(kept.id);
    expect((await app.api.post(schedule(), session(), { token: otherCoach.token })).status).toBe(403);
    const patch = await app.api.patch(
      `${schedule()}/${kept.id}`,
      { minutes: 90 },
      { token: otherCoach.token },
    );
    expect(patch.status).toBe(403);
    expect(patch.headers.get('content-type')).toContain('application/problem+json');
    expect((await app.api.delete(`${schedule()}/${kept.id}`, { token: otherCoach.token })).status).toBe(403);
    expect((await app.api.get(schedule(), { token: helper.token })).status).toBe(403);
    expect((await app.api.post(schedule(), session(), { token: helper.token })).status).toBe(403);
    const still = (await app.api.get(`/api/scheduled-sessions/${kept.id}`, { token: home.lead.token }))
      .body as ScheduledSessionDto;
    expect(still.minutes).toBe(60);
    await app.api.delete(`${schedule()}/${kept.id}`, { token: home.coach.token });
  });

  it('answers 404 to another club for the team, the session and the plan link', async () => {
    const kept = (await app.api.post(schedule(), session(), { token: home.coach.token }))
      .body as ScheduledSessionDto;
    const token = away.lead.token;
    for (const response of [
      await app.api.get(schedule(), { token }),
      await app.api.post(schedule(), session(), { token }),
      await app.api.post(`${schedule()}/weekly`, session({ until: addDays(today, 30) }), { token }),
      await app.api.patch(`${schedule()}/${kept.id}`, { minutes: 30 }, { token }),
      await app.api.delete(`${schedule()}/${kept.id}`, { token }),
      await app.api.get(`/api/scheduled-sessions/${kept.id}`, { token }),
      await app.api.get(`/api/teams/${squad.teamId}/calendar`, { token }),
      await app.api.post(`/api/teams/${squad.teamId}/calendar`, {}, { token }),
    ]) {
      expect(response.status, response.text).toBe(404);
      expect(response.text).not.toContain('Meadow');
    }
    const theirs = await createSquad(app, away.lead.token, 6, 'Stonebridge Owls');
    const foreignSession = (await app.api.post(schedule(theirs.teamId), session(), { token }))
      .body as ScheduledSessionDto;
    const plan = await app.api.post(
      '/api/plans',
      { teamId: squad.teamId, scheduledSessionId: foreignSession.id, request: planRequest(squad.playerIds) },
      { token: home.coach.token },
    );
    expect(plan.status, plan.text).toBe(400);
    expect(plan.body.errors).toEqual([
      { field: 'scheduledSessionId', message: 'is not a session on this team’s schedule' },
    ]);
    const upcoming = (await app.api.get('/api/scheduled-sessions?days=7', { token }))
      .body as ScheduledSessionDto[];
    expect(upcoming.map((s) => s.teamId)).toEqual([theirs.teamId]);
    await app.api.delete(`${schedule()}/${kept.id}`, { token: home.coach.token });
  });

  it('names each bad field in a coach’s words and saves nothing', async () => {
    const before = (await app.api.get(`${schedule()}?days=366`, { token: home.coach.token })).body.length;
    const bad = await app.api.post(
      schedule(),
      { date: '2026-02-30', startTime: '25:00', kind: 'party', minutes: 0 },
      { token: home.coach.token },
    );
    expect(bad.status).toBe(400);
    expect(bad.body.errors).toEqual(
      expect.arrayContaining([
        { field: 'date', message: 'must be a date' },
        { field: 'startTime', message: 'must be a time such as 18:30' },
        { field: 'kind', message: 'must be training or match' },
        { field: 'minutes', message: 'must be at least 5 minutes' },
      ]),
    );
    const tooLong = await app.api.post(schedule(), session({ place: 'x'.repeat(121) }), {
      token: home.coach.token,
    });
    expect(tooLong.body.errors).toEqual([{ field: 'place', message: 'must be at most 120 characters' }]);
    expect((await app.api.get(`${schedule()}?days=366`, { token: home.coach.token })).body.length).toBe(
      before,
    );
  });

  it('adds a term of weekly nights in one go, up to 40, and refuses an end before the start', async () => {
    const first = addDays(today, 1);
    const ten = await app.api.post(
      `${schedule()}/weekly`,
      session({ date: first, until: addDays(first, 9 * 7 + 3) }),
      {
        token: home.assistant.token,
      },
    );
    expect(ten.status, ten.text).toBe(201);
    const added = ten.body as ScheduledSessionDto[];
    expect(added.map((s) => s.date)).toEqual(Array.from({ length: 10 }, (_, i) => addDays(first, 7 * i)));
    expect(new Set(added.map((s) => s.startTime))).toEqual(new Set(['18:00']));

    const forty = addDays(first, 39 * 7);
    const tooMany = await app.api.post(
      `${schedule()}/weekly`,
      session({ date: first, until: addDays(forty, 7) }),
      { token: home.coach.token },
    );
    expect(tooMany.status).toBe(400);
    expect(tooMany.body.errors).toEqual([
      { field: 'until', message: `must be within 40 weeks of the first day (last possible: ${forty})` },
    ]);
    const backwards = await app.api.post(
      `${schedule()}/weekly`,
      session({ date: first, until: addDays(first, -1) }),
      { token: home.coach.token },
    );
    expect(backwards.body.errors).toEqual([{ field: 'until', message: 'must be on or after the first day' }]);
    const listed = (await app.api.get(`${schedule()}?days=366&from=${first}`, { token: home.coach.token }))
      .body as ScheduledSessionDto[];
    expect(listed).toHaveLength(10);
    for (const s of added) await app.api.delete(`${schedule()}/${s.id}`, { token: home.coach.token });
  });

  it('lists the caller’s week in time order and links a plan made from a session; deleting the session keeps the plan', async () => {
    const team2 = await createSquad(app, home.coach.token, 4, 'U12 Swifts');
    const late = (
      await app.api.post(schedule(), session({ date: addDays(today, 3), startTime: '19:00' }), {
        token: home.coach.token,
      })
    ).body as ScheduledSessionDto;
    const early = (
      await app.api.post(
        schedule(team2.teamId),
        session({ date: addDays(today, 3), startTime: '09:15', kind: 'match', minutes: 25 }),
        { token: home.coach.token },
      )
    ).body as ScheduledSessionDto;
    const beyond = (
      await app.api.post(schedule(), session({ date: addDays(today, 8) }), {
        token: home.coach.token,
      })
    ).body as ScheduledSessionDto;

    const week = (await app.api.get('/api/scheduled-sessions?days=7', { token: home.coach.token }))
      .body as ScheduledSessionDto[];
    expect(week.map((s) => s.id)).toEqual([early.id, late.id]);
    expect(week[0]).toMatchObject({ teamName: 'U12 Swifts', kind: 'match', startTime: '09:15' });
    const leads = (await app.api.get('/api/scheduled-sessions?days=7', { token: home.lead.token }))
      .body as ScheduledSessionDto[];
    expect(leads.map((s) => s.id)).toEqual([early.id, late.id]);
    const others = (await app.api.get('/api/scheduled-sessions?days=7', { token: otherCoach.token }))
      .body as ScheduledSessionDto[];
    expect(others).toEqual([]);

    const made = await app.api.post(
      '/api/plans',
      {
        teamId: squad.teamId,
        scheduledSessionId: late.id,
        date: late.date,
        kickOff: late.startTime,
        request: planRequest(squad.playerIds, { kind: 'training', minutes: 60 }),
      },
      { token: home.coach.token },
    );
    expect(made.status, made.text).toBe(201);
    const plan = made.body as SessionPlanDto;
    const linked = (await app.api.get('/api/scheduled-sessions?days=7', { token: home.assistant.token }))
      .body as ScheduledSessionDto[];
    expect(linked.find((s) => s.id === late.id)?.planId).toBe(plan.id);
    expect(
      (await app.api.get(`/api/scheduled-sessions/${late.id}`, { token: home.assistant.token })).body.planId,
    ).toBe(plan.id);

    expect((await app.api.delete(`${schedule()}/${late.id}`, { token: home.coach.token })).status).toBe(204);
    const kept = await app.api.get(`/api/plans/${plan.id}`, { token: home.coach.token });
    expect(kept.status).toBe(200);
    const [row] = await app.dataSource.query('SELECT "scheduledSessionId" FROM session_plan WHERE id = $1', [
      plan.id,
    ]);
    expect(row.scheduledSessionId).toBeNull();
    await app.api.delete(`${schedule(team2.teamId)}/${early.id}`, { token: home.coach.token });
    await app.api.delete(`${schedule()}/${beyond.id}`, { token: home.coach.token });
  });

  it('serves a calendar per team behind a secret address: local times with their zone across a clock change, no player names, renewable and revocable', async () => {
    const year = Number(today.slice(0, 4)) + 1;
    const change = lastSundayOfMarch(year);
    const weekly = (
      await app.api.post(
        `${schedule()}/weekly`,
        session({ date: addDays(change, -6), until: addDays(change, 8) }),
        { token: home.coach.token },
      )
    ).body as ScheduledSessionDto[];
    expect(weekly).toHaveLength(3);
    const match = (
      await app.api.post(
        schedule(),
        session({ date: addDays(today, 4), kind: 'match', startTime: '10:30', minutes: 20, place: '' }),
        { token: home.coach.token },
      )
    ).body as ScheduledSessionDto;

    const calendar = `/api/teams/${squad.teamId}/calendar`;
    expect((await app.api.get(calendar, { token: otherCoach.token })).body).toEqual({ path: null });
    expect((await app.api.post(calendar, {}, { token: otherCoach.token })).status).toBe(403);
    const on = await app.api.post(calendar, {}, { token: home.assistant.token });
    expect(on.status, on.text).toBe(201);
    const path = (on.body as TeamCalendarDto).path!;
    expect(path).toMatch(/^\/api\/calendar\/[A-Za-z0-9_-]{43}\.ics$/);
    expect((await app.api.get(calendar, { token: otherCoach.token })).body).toEqual({ path });

    const feed = await app.api.get(path);
    expect(feed.status).toBe(200);
    expect(feed.headers.get('content-type')).toContain('text/calendar');
    const lines = icsLines(feed.text);
    expect(lines[0]).toBe('BEGIN:VCALENDAR');
    expect(lines.at(-1)).toBe('END:VCALENDAR');
    const events = icsEvents(feed.text);
    expect(events).toHaveLength(4);
    const prop = (event: (typeof events)[number], name: string) => event.find((p) => p.name === name);
    const byUid = new Map(events.map((e) => [prop(e, 'UID')!.value, e]));
    // Every weekly night at 18:00 British local time, before and after the clocks go forward.
    for (const s of weekly) {
      const event = byUid.get(`${s.id}@conewise`)!;
      expect(prop(event, 'DTSTART')).toEqual({
        name: 'DTSTART',
        params: 'TZID=Europe/London',
        value: `${s.date.replace(/-/g, '')}T180000`,
      });
      expect(prop(event, 'DTEND')!.value).toBe(`${s.date.replace(/-/g, '')}T190000`);
      expect(prop(event, 'SUMMARY')!.value).toBe('U10 Falcons: training');
      expect(prop(event, 'LOCATION')!.value).toBe('Meadow Lane\\, pitch 2');
      expect(prop(event, 'URL')!.value).toBe(`http://conewise.test/teams/${squad.teamId}`);
    }
    expect(zonedMoment(weekly[0]!.date, '18:00', 'Europe/London').toISOString()).toMatch(/T18:00:00/);
    expect(zonedMoment(weekly[1]!.date, '18:00', 'Europe/London').toISOString()).toMatch(/T17:00:00/);
    // A match: from its warm-up to kick-off.
    const matchEvent = byUid.get(`${match.id}@conewise`)!;
    expect(prop(matchEvent, 'DTSTART')!.value).toBe(`${match.date.replace(/-/g, '')}T101000`);
    expect(prop(matchEvent, 'DTEND')!.value).toBe(`${match.date.replace(/-/g, '')}T103000`);
    expect(prop(matchEvent, 'SUMMARY')!.value).toBe('U10 Falcons: match (kick-off 10:30)');
    for (const name of SQUAD_NAMES.slice(0, 10)) expect(feed.text).not.toContain(name);

    const renewed = (await app.api.post(calendar, {}, { token: home.coach.token })).body as TeamCalendarDto;
    expect(renewed.path).not.toBe(path);
    expect((await app.api.get(path)).status).toBe(404);
    expect((await app.api.get(renewed.path!)).status).toBe(200);
    expect((await app.api.delete(calendar, { token: home.lead.token })).status).toBe(204);
    expect((await app.api.get(renewed.path!)).status).toBe(404);
    expect((await app.api.get(calendar, { token: home.coach.token })).body).toEqual({ path: null });
    expect((await app.api.get('/api/calendar/not-a-token.ics')).status).toBe(400);
    for (const s of [...weekly, match])
      await app.api.delete(`${schedule()}/${s.id}`, { token: home.coach.token });
  });

  it('a double tap on "Add weekly" (one Idempotency-Key) adds the term once', async () => {
    const own = await createSquad(app, home.coach.token, 8, 'U11 Kestrels');
    const first = addDays(today, 1);
    const body = session({ date: first, until: addDays(first, 3 * 7), place: 'Top pitch' });
    const headers = { 'Idempotency-Key': `weekly-${first}` };
    const weekly = `${schedule(own.teamId)}/weekly`;
    const once = await app.api.post(weekly, body, { token: home.coach.token, headers });
    const again = await app.api.post(weekly, body, { token: home.coach.token, headers });
    expect(once.status, once.text).toBe(201);
    expect(again.status).toBe(201);
    expect(again.headers.get('idempotent-replayed')).toBe('true');
    expect(again.text).toBe(once.text);
    const rows = (await app.dataSource.query(
      'SELECT count(*)::int AS n FROM scheduled_session WHERE "teamId" = $1',
      [own.teamId],
    )) as { n: number }[];
    expect(rows[0]!.n).toBe(4);
  });
});

describe('the request log', () => {
  it('shows a calendar feed’s path without its secret', async () => {
    const lines: string[] = [];
    const sink = new Writable({
      write(chunk, _encoding, done) {
        lines.push(String(chunk));
        done();
      },
    });
    const dataSource = createDataSource({ url: inject('databaseUrl'), poolSize: 2 });
    await dataSource.initialize();
    const http = await startHttpServer({
      dataSource,
      config: testConfig({ logLevel: 'info' }),
      port: 0,
      logger: pino({ level: 'info' }, sink),
    });
    try {
      const secret = 'A'.repeat(43);
      const response = await fetch(`${http.url}/api/calendar/${secret}.ics`);
      expect(response.status).toBe(404);
      await response.text();
      await http.close();
      const logged = lines.join('');
      expect(logged).toContain('/api/calendar/[secret]');
      expect(logged).not.toContain(secret);
    } finally {
      await http.close().catch(() => undefined);
      await dataSource.destroy();
    }
  });
});

describe('the public calendar route', () => {
  it('answers too many requests from one address with a 429 problem in plain words', async () => {
    const limited = await startTestApp({ authRateLimit: { windowMs: 60_000, max: 2 } });
    try {
      const path = `/api/calendar/${'B'.repeat(43)}.ics`;
      expect((await limited.api.get(path)).status).toBe(404);
      expect((await limited.api.get(path)).status).toBe(404);
      const third = await limited.api.get(path);
      expect(third.status).toBe(429);
      expect(third.headers.get('content-type')).toContain('application/problem+json');
      expect(third.body.detail).toBe('Too many calendar requests from here. Wait a few minutes.');
    } finally {
      await limited.close();
    }
  });
});
