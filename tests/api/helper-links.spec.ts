import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { pino } from 'pino';
import type { CreatedHelperLinkDto, HelperViewDto } from '../../shared/types/helper-view';
import type { SessionPlanDto } from '../../shared/types/api';
import { createDataSource } from '../../server/data-source';
import { HelperLink } from '../../server/entities/helper-link';
import { OutboxMessage } from '../../server/entities/outbox-message';
import { startHttpServer } from '../../server/http-server';
import { OutboxWorker } from '../../server/mail/outbox-worker';
import { startFakeSmtp } from '../../server/mail/fake-smtp';
import { mailSettingsFromEnv } from '../../server/mail/mail-settings';
import { hashLinkToken } from '../../server/services/link-token';
import { ApiClient } from '../support/api-client';
import {
  addMember,
  clubWithStaff,
  registerClub,
  startTestApp,
  testConfig,
  type ClubCast,
  type SignedIn,
  type TestApp,
} from '../support/api-test-app';
import { createPlan, createSquad, SQUAD_NAMES, type Squad } from './fixtures/plan-helpers';

/** The token from a helper link's address: everything after the #. */
function tokenOf(url: string): string {
  const hash = new URL(url).hash;
  expect(hash.length).toBeGreaterThan(40);
  return hash.slice(1);
}

function view(app: TestApp, token: string) {
  return app.api.get<HelperViewDto & { detail?: string }>('/api/helper-view', {
    headers: { 'Helper-Token': token },
  });
}

/** Attaches a member to a team as its staff (the team_coach row the staff screens write). */
async function attach(app: TestApp, teamId: string, member: SignedIn): Promise<void> {
  await app.dataSource.query('INSERT INTO team_coach ("teamId", "userId") VALUES ($1, $2)', [
    teamId,
    member.user.id,
  ]);
}

describe('helper links', () => {
  let app: TestApp;
  let club: ClubCast;
  let squad: Squad;
  let plan: SessionPlanDto;

  beforeAll(async () => {
    // The club plays in Berlin: a link ends at local midnight, 23:00 UTC in winter, 22:00 in summer.
    app = await startTestApp({ locale: 'en-GB' });
    club = await clubWithStaff(app, 'Lindenhof Larks');
    await app.dataSource.query('UPDATE club SET "timeZone" = $1 WHERE id = $2', [
      'Europe/Berlin',
      club.lead.user.clubId,
    ]);
    squad = await createSquad(app, club.coach.token, 12, 'U10 Larks');
    plan = await createPlan(app, club.coach.token, squad, { date: '2027-01-12', kickOff: '18:00' });
  });
  afterAll(async () => {
    await app?.close();
  });

  it('the team’s coach, its assistant and the lead each make a link; the link carries its token after #', async () => {
    await attach(app, squad.teamId, club.assistant);
    for (const member of [club.coach, club.assistant, club.lead]) {
      const made = await app.api.post<CreatedHelperLinkDto>(`/api/plans/${plan.id}/helper-links`, undefined, {
        token: member.token,
      });
      expect(made.status, made.text).toBe(201);
      expect(made.body.url).toMatch(/^http:\/\/conewise\.test\/helper#[A-Za-z0-9_-]{43}$/);
      expect(made.body.createdByName).toBe(member.user.name);
      expect(made.headers.get('cache-control')).toBe('no-store');
      // Only the hash is stored.
      const row = await app.dataSource.getRepository(HelperLink).findOneByOrFail({ id: made.body.id });
      expect(row.tokenHash).toBe(hashLinkToken(tokenOf(made.body.url)));
      expect(row.tokenHash).not.toContain(tokenOf(made.body.url));
    }
    const listed = await app.api.get(`/api/plans/${plan.id}/helper-links`, { token: club.coach.token });
    expect(listed.status).toBe(200);
    expect(listed.body.length).toBeGreaterThanOrEqual(3);
    expect(JSON.stringify(listed.body)).not.toMatch(/helper#|token/i);
  });

  it('refuses an assistant of another team, a coach of another club, and anyone not signed in', async () => {
    const otherAssistant = await addMember(app, club.lead.user.clubId, 'assistant', 'Oli Otherteam');
    const otherTeam = await createSquad(app, club.coach.token, 4, 'U8 Sparrows');
    await attach(app, otherTeam.teamId, otherAssistant);
    const refused = await app.api.post(`/api/plans/${plan.id}/helper-links`, undefined, {
      token: otherAssistant.token,
    });
    expect(refused.status).toBe(403);
    expect(refused.headers.get('content-type')).toContain('application/problem+json');
    expect(refused.body.detail).toMatch(/coaches and assistants/);
    expect(
      (await app.api.get(`/api/plans/${plan.id}/helper-links`, { token: otherAssistant.token })).status,
    ).toBe(403);

    const otherClub = await registerClub(app, 'Far Meadow Juniors');
    const stranger = await app.api.post(`/api/plans/${plan.id}/helper-links`, undefined, {
      token: otherClub.token,
    });
    expect(stranger.status).toBe(404);
    expect(JSON.stringify(stranger.body)).not.toContain('Larks');

    expect((await app.api.post(`/api/plans/${plan.id}/helper-links`)).status).toBe(401);
  });

  it('shows the plan with first names only, no player ids, no stored names or initials, and no caching or indexing', async () => {
    const made = await app.api.post<CreatedHelperLinkDto>(`/api/plans/${plan.id}/helper-links`, undefined, {
      token: club.coach.token,
    });
    const seen = await view(app, tokenOf(made.body.url));
    expect(seen.status, seen.text).toBe(200);
    expect(seen.headers.get('cache-control')).toBe('no-store');
    expect(seen.headers.get('referrer-policy')).toBe('no-referrer');
    expect(seen.headers.get('x-robots-tag')).toMatch(/noindex/);

    const json = seen.text;
    const stored = SQUAD_NAMES.slice(0, 12);
    for (const [i, name] of stored.entries()) {
      const [first, initial] = name.split(' ') as [string, string];
      expect(json).not.toContain(name);
      // The initial is nowhere, neither after the first name nor on its own as a word.
      expect(json).not.toMatch(new RegExp(`\\b${first}\\s+${initial[0]}\\b`));
      expect(json).not.toMatch(new RegExp(`"${initial.replace('.', '\\.')}"`));
      expect(json).not.toContain(squad.playerIds[i]!);
      expect(Object.values(seen.body.names)).toContain(first);
    }
    for (const value of Object.values(seen.body.names)) expect(value).toMatch(/^\S+$/);
    // Every player placed in a group has a name; the view keeps the stations, areas and coaching points.
    const stations = seen.body.phases.flatMap((p) => p.stations);
    expect(stations.length).toBeGreaterThan(0);
    for (const station of stations) {
      expect(station.area.width).toBeGreaterThan(0);
      expect(station.coachingPoints.length).toBeGreaterThan(0);
      for (const id of station.playerIds) expect(seen.body.names[id]).toBeTruthy();
    }
    expect(seen.body.cautions.length).toBeGreaterThan(0);
    expect(seen.body.teamName).toBe('U10 Larks');
    expect(json).not.toMatch(/"request"|"trace"|"touches"|"ruleSet"|Lindenhof|@example\.org/);
  });

  it('numbers a repeated first name: two players called Sam become “Sam” and “Sam 2”', async () => {
    const team = await createSquad(app, club.coach.token, 6, 'U10 Twins');
    const sams: string[] = [];
    for (const displayName of ['Sam K.', 'Sam L.']) {
      const added = await app.api.post(
        `/api/teams/${team.teamId}/players`,
        { displayName },
        {
          token: club.coach.token,
        },
      );
      expect(added.status, added.text).toBe(201);
      sams.push(added.body.id);
    }
    const withSams = await createPlan(
      app,
      club.coach.token,
      { ...team, playerIds: [...team.playerIds, ...sams] },
      { date: '2027-01-12' },
    );
    const made = await app.api.post<CreatedHelperLinkDto>(
      `/api/plans/${withSams.id}/helper-links`,
      undefined,
      {
        token: club.coach.token,
      },
    );
    const seen = await view(app, tokenOf(made.body.url));
    const names = Object.values(seen.body.names);
    expect(names.filter((n) => n.startsWith('Sam')).sort()).toEqual(['Sam', 'Sam 2']);
    expect(seen.text).not.toMatch(/Sam [KL]\b/);
  });

  it('ends at the end of the day after the session in the club’s time zone, or 48 hours on without a date', async () => {
    const winter = await app.api.post(`/api/plans/${plan.id}/helper-links`, undefined, {
      token: club.coach.token,
    });
    // Session Tuesday 12 January 2027; the link works through Wednesday 13 January, Berlin time (UTC+1).
    expect(winter.body.expiresAt).toBe('2027-01-13T23:00:00.000Z');

    const summerPlan = await createPlan(app, club.coach.token, squad, { date: '2027-07-06' });
    const summer = await app.api.post(`/api/plans/${summerPlan.id}/helper-links`, undefined, {
      token: club.coach.token,
    });
    // Summer time (UTC+2): midnight at the end of Wednesday 7 July is 22:00 UTC.
    expect(summer.body.expiresAt).toBe('2027-07-07T22:00:00.000Z');

    const undated = await app.api.post(
      '/api/plans',
      {
        teamId: squad.teamId,
        request: (await app.api.get(`/api/plans/${plan.id}`, { token: club.coach.token })).body.plan.request,
      },
      { token: club.coach.token },
    );
    expect(undated.status, undated.text).toBe(201);
    expect(undated.body.date).toBeNull();
    const before = Date.now();
    const noDate = await app.api.post(`/api/plans/${undated.body.id}/helper-links`, undefined, {
      token: club.coach.token,
    });
    const after = Date.now();
    const ends = Date.parse(noDate.body.expiresAt);
    expect(ends).toBeGreaterThanOrEqual(before - 1000 + 48 * 3600_000);
    expect(ends).toBeLessThanOrEqual(after + 1000 + 48 * 3600_000);

    const pastPlan = await createPlan(app, club.coach.token, squad, { date: '2026-01-06' });
    const past = await app.api.post(`/api/plans/${pastPlan.id}/helper-links`, undefined, {
      token: club.coach.token,
    });
    expect(past.status).toBe(409);
    expect(past.body.detail).toMatch(/more than a day ago/);
  });

  it('refuses a revoked link and an expired one in plain words, and drops them from the list', async () => {
    const made = await app.api.post<CreatedHelperLinkDto>(`/api/plans/${plan.id}/helper-links`, undefined, {
      token: club.coach.token,
    });
    const token = tokenOf(made.body.url);
    expect((await view(app, token)).status).toBe(200);

    const revoked = await app.api.delete(`/api/plans/${plan.id}/helper-links/${made.body.id}`, {
      token: club.assistant.token,
    });
    expect(revoked.status).toBe(204);
    const gone = await view(app, token);
    expect(gone.status).toBe(410);
    expect(gone.headers.get('content-type')).toContain('application/problem+json');
    expect(gone.body.detail).toBe(
      'The coach has stopped this link. Ask them for a new one if you are still helping.',
    );
    const listed = await app.api.get(`/api/plans/${plan.id}/helper-links`, { token: club.coach.token });
    expect(listed.body.map((l: { id: string }) => l.id)).not.toContain(made.body.id);

    const old = await app.api.post<CreatedHelperLinkDto>(`/api/plans/${plan.id}/helper-links`, undefined, {
      token: club.coach.token,
    });
    await app.dataSource
      .getRepository(HelperLink)
      .update({ id: old.body.id }, { expiresAt: new Date('2026-11-11T23:00:00.000Z') });
    const ended = await view(app, tokenOf(old.body.url));
    expect(ended.status).toBe(410);
    expect(ended.body.detail).toBe(
      'This link stopped working at the end of Wednesday 11 November. Ask the coach for a new one if you need it.',
    );

    const unknown = await view(app, 'x'.repeat(43));
    expect(unknown.status).toBe(404);
    expect(unknown.body.detail).toMatch(/not known/);
    expect((await app.api.get('/api/helper-view')).status).toBe(404);

    const otherClub = await registerClub(app, 'Far Meadow Juniors II');
    expect(
      (await app.api.delete(`/api/plans/${plan.id}/helper-links/${old.body.id}`, { token: otherClub.token }))
        .status,
    ).toBe(404);
    expect(
      (await app.api.delete(`/api/plans/${plan.id}/helper-links/not-a-link`, { token: club.coach.token }))
        .status,
    ).toBe(404);
  });

  it('the share e-mail carries the helper link, the coach as Reply-To and the date in words', async () => {
    const smtp = await startFakeSmtp({ port: 0 });
    const worker = new OutboxWorker({
      dataSource: app.dataSource,
      mail: mailSettingsFromEnv({
        host: '127.0.0.1',
        port: smtp.port,
        from: 'Lindenhof Larks <plans@larks.invalid>',
      }),
      baseDelayMs: 20,
      maxDelayMs: 50,
    });
    try {
      const shared = await app.api.post(
        `/api/plans/${plan.id}/share`,
        { recipients: ['pat.parent@example.org', 'robin.parent@example.org'] },
        { token: club.coach.token },
      );
      expect(shared.status, shared.text).toBe(202);
      expect(shared.body.queued).toBe(2);

      const rows = await app.dataSource.getRepository(OutboxMessage).findByIds(shared.body.messageIds);
      expect(rows).toHaveLength(2);
      for (const row of rows) {
        expect(row.replyTo).toEqual({ name: 'Cora Coach', address: club.coach.user.email });
        expect(row.subject).toBe('U10 Larks: match warm-up on Tuesday 12 January, 18:00');
        expect(row.textBody).toContain('on Tuesday 12 January, 18:00');
        expect(row.textBody).toContain('It stops working at the end of Wednesday 13 January');
        expect(row.textBody).toMatch(/first names only/);
        expect(row.textBody).not.toMatch(/2027-01-12/);
      }
      const url = /http:\/\/conewise\.test\/helper#\S+/.exec(rows[0]!.textBody)?.[0];
      expect(url).toBeTruthy();
      // One link for the share, shown to both, and it opens the plan.
      expect(rows[1]!.textBody).toContain(url!);
      expect((await view(app, tokenOf(url!))).status).toBe(200);
      const link = await app.dataSource
        .getRepository(HelperLink)
        .findOneByOrFail({ tokenHash: hashLinkToken(tokenOf(url!)) });
      expect(link.emailedTo).toBe(2);

      await worker.drainOnce();
      const mail = await smtp.waitFor((m) => m.to.includes('pat.parent@example.org'));
      expect(mail.from).toBe('plans@larks.invalid');
      expect(mail.replyTo).toBe(`"Cora Coach" <${club.coach.user.email}>`);
      expect(mail.text).toContain(url!);
    } finally {
      await worker.stop();
      await smtp.stop();
    }
  });

  it('shares a plan from long ago without a link, still by e-mail', async () => {
    const pastPlan = await createPlan(app, club.coach.token, squad, { date: '2026-01-06' });
    const shared = await app.api.post(
      `/api/plans/${pastPlan.id}/share`,
      { recipients: ['pat.parent@example.org'] },
      { token: club.coach.token },
    );
    expect(shared.status).toBe(202);
    expect(shared.body.queued).toBe(1);
    const [row] = await app.dataSource.getRepository(OutboxMessage).findByIds(shared.body.messageIds);
    expect(row!.textBody).not.toContain('/helper#');
    expect(row!.subject).toBe('U10 Larks: match warm-up on Tuesday 6 January, 10:30');
  });

  it('a helper reads the units of the coach who made the link, else the club’s; the plan stays metric', async () => {
    const clubId = club.lead.user.clubId;
    const setClub = (distance: string, temperature: string) =>
      app.api.put('/api/club/units', { distance, temperature }, { token: club.lead.token });
    const maker = await addMember(app, clubId, 'coach', 'Mina Maker');
    await attach(app, squad.teamId, maker);
    try {
      expect((await setClub('yards', 'celsius')).status).toBe(200);
      const made = await app.api.post<CreatedHelperLinkDto>(`/api/plans/${plan.id}/helper-links`, undefined, {
        token: maker.token,
      });
      expect(made.status, made.text).toBe(201);
      const token = tokenOf(made.body.url);

      // The maker follows the club: yards and °C.
      let seen = await view(app, token);
      expect(seen.status, seen.text).toBe(200);
      expect(seen.body.units).toEqual({ distance: 'yards', temperature: 'celsius' });
      // The plan is metric as stored: the same areas in metres as the coach's own plan.
      expect(seen.body.phases.map((p) => p.stations.map((s) => s.area))).toEqual(
        plan.plan.phases.map((p) => p.stations.map((s) => s.area)),
      );

      // The maker's own choice wins, as on their own screens.
      const own = await app.api.patch(
        '/api/auth/me',
        { distanceUnit: 'metres', temperatureUnit: 'fahrenheit' },
        { token: maker.token },
      );
      expect(own.status, own.text).toBe(200);
      seen = await view(app, token);
      expect(seen.body.units).toEqual({ distance: 'metres', temperature: 'fahrenheit' });

      // Once the maker has left the club, the link reads in the club's setting.
      const removed = await app.api.delete(`/api/members/${maker.user.id}`, { token: club.lead.token });
      expect(removed.status, removed.text).toBeLessThan(300);
      seen = await view(app, token);
      expect(seen.status, seen.text).toBe(200);
      expect(seen.body.units).toEqual({ distance: 'yards', temperature: 'celsius' });
    } finally {
      await setClub('metres', 'celsius');
    }
  });
});

describe('helper view and the request log', () => {
  it('logs the path only: the token never reaches a log line', async () => {
    const lines: string[] = [];
    const logger = pino({ level: 'info' }, { write: (line: string) => void lines.push(line) });
    const dataSource = createDataSource({ url: inject('databaseUrl'), poolSize: 2 });
    await dataSource.initialize();
    const http = await startHttpServer({
      dataSource,
      config: testConfig({ logLevel: 'info' }),
      port: 0,
      logger,
    });
    const app = { api: new ApiClient(http.url), dataSource } as unknown as TestApp;
    try {
      const club = await clubWithStaff(app, 'Quiet Log Rovers');
      const squad = await createSquad(app, club.coach.token, 8, 'U10 Quiet');
      const plan = await createPlan(app, club.coach.token, squad, { date: '2027-01-12' });
      const made = await app.api.post(`/api/plans/${plan.id}/helper-links`, undefined, {
        token: club.coach.token,
      });
      const token = tokenOf(made.body.url);
      expect((await view(app, token)).status).toBe(200);
      // pino-http writes its line when the response finishes; wait for it rather than for a time.
      for (let i = 0; i < 200 && !lines.some((l) => l.includes('/api/helper-view')); i++) {
        await new Promise((resolve) => setImmediate(resolve));
      }
      const logged = lines.find((l) => l.includes('/api/helper-view'));
      expect(logged).toBeTruthy();
      expect(JSON.parse(logged!).req.url).toBe('/api/helper-view');
      expect(lines.join('\n')).not.toContain(token);
    } finally {
      await http.close();
      await dataSource.destroy();
    }
  });

  it('limits tries per address like the other public routes', async () => {
    const app = await startTestApp({ authRateLimit: { windowMs: 60_000, max: 3 } });
    try {
      const statuses: number[] = [];
      for (let i = 0; i < 4; i++) statuses.push((await view(app, 'y'.repeat(43))).status);
      expect(statuses).toEqual([404, 404, 404, 429]);
      const limited = await view(app, 'y'.repeat(43));
      expect(limited.body.detail).toMatch(/Too many tries/);
    } finally {
      await app.close();
    }
  });
});
