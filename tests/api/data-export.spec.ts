import { parse } from 'csv-parse/sync';
import JSZip from 'jszip';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { SessionPlanDto } from '../../shared/types/api';
import {
  clubWithStaff,
  createTeam,
  startTestApp,
  type ClubCast,
  type TestApp,
} from '../support/api-test-app';
import { createPlan, createSquad, type Squad } from './fixtures/plan-helpers';

/** The export as the browser gets it: status, headers and the ZIP's bytes. */
async function download(app: TestApp, path: string, token: string) {
  const response = await fetch(app.http.url + path, { headers: { authorization: `Bearer ${token}` } });
  return {
    status: response.status,
    headers: response.headers,
    bytes: Buffer.from(await response.arrayBuffer()),
  };
}

/** Every file of the ZIP as text. */
async function unzip(bytes: Buffer): Promise<Map<string, string>> {
  const zip = await JSZip.loadAsync(bytes);
  const files = new Map<string, string>();
  for (const name of Object.keys(zip.files)) files.set(name, await zip.file(name)!.async('string'));
  return files;
}

/** A CSV file's rows as objects keyed by its header. */
function rows(text: string): Record<string, string>[] {
  return parse(text, { bom: true, columns: true });
}

describe('downloading the club’s and a team’s data', () => {
  let app: TestApp;
  let club: ClubCast;
  let other: ClubCast;
  let squad: Squad;
  let otherTeamId: string;
  let theirTeamId: string;
  let plan: SessionPlanDto;

  beforeAll(async () => {
    app = await startTestApp();
    club = await clubWithStaff(app, 'Ållerton Export FC');
    other = await clubWithStaff(app, 'Other Export Club');
    const token = club.coach.token;
    squad = await createSquad(app, token, 6, 'U10 Herons');
    const named = await app.api.post(
      `/api/teams/${squad.teamId}/players`,
      { displayName: 'Perpetua W.' },
      { token },
    );
    expect(named.status, named.text).toBe(201);
    squad.playerIds.push(named.body.id);
    // A team the coach does not staff, with a child of its own.
    otherTeamId = (await createTeam(app, club.lead.token, { name: 'U12 Swifts' })).id;
    const swift = await app.api.post(
      `/api/teams/${otherTeamId}/players`,
      { displayName: 'Swithin K.' },
      { token: club.lead.token },
    );
    expect(swift.status, swift.text).toBe(201);
    // Another club's team and child.
    theirTeamId = (await createTeam(app, other.lead.token, { name: 'U10 Rivals' })).id;
    const theirs = await app.api.post(
      `/api/teams/${theirTeamId}/players`,
      { displayName: 'Barnaby Z.' },
      { token: other.lead.token },
    );
    expect(theirs.status, theirs.text).toBe(201);

    plan = (await createPlan(app, token, squad, { date: '2026-12-05' })) as SessionPlanDto;
    const attendance = await app.api.put(
      `/api/plans/${plan.id}/attendance`,
      { playerIds: [named.body.id] },
      { token },
    );
    expect(attendance.status, attendance.text).toBeLessThan(300);
    const phaseIndex = plan.plan.phases.findIndex((p) => p.stations.length > 0);
    const feedback = await app.api.post(
      `/api/plans/${plan.id}/feedback`,
      {
        stationId: plan.plan.phases[phaseIndex]!.stations[0]!.id,
        phaseIndex,
        verdict: 'too-easy',
        note: 'Needed a smaller area',
      },
      { token },
    );
    expect(feedback.status, feedback.text).toBe(201);
    const draft = await app.api.post(
      '/api/rule-sets',
      { name: 'Ållerton rules' },
      { token: club.lead.token },
    );
    expect(draft.status, draft.text).toBe(201);
    const published = await app.api.post(`/api/rule-sets/${draft.body.id}/publish`, undefined, {
      token: club.lead.token,
    });
    expect(published.status, published.text).toBe(200);
  }, 120_000);

  afterAll(() => app?.close());

  it('gives the head of coaching one ZIP of everything the club holds, described in its README', async () => {
    const answer = await download(app, '/api/club/export', club.lead.token);
    expect(answer.status, answer.bytes.toString()).toBe(200);
    expect(answer.headers.get('content-type')).toBe('application/zip');
    expect(answer.headers.get('content-disposition')).toMatch(
      /^attachment; filename="conewise-allerton-export-fc-\d{4}-\d{2}-\d{2}\.zip"$/,
    );
    const files = await unzip(answer.bytes);
    const expected = [
      'teams.csv',
      'players.csv',
      'attendance.csv',
      'feedback.csv',
      'members.csv',
      'plans.json',
      'rule-sets.json',
      'rule-set-history.json',
    ];
    expect([...files.keys()].sort()).toEqual(['README.txt', ...expected].sort());
    const readme = files.get('README.txt')!;
    for (const name of expected) expect(readme, name).toContain(name);
    expect(readme).toContain('Ållerton Export FC');
    expect(readme).toMatch(/Made on \d{4}-\d{2}-\d{2}T/);

    const players = rows(files.get('players.csv')!);
    const listed = async (teamId: string) =>
      (await app.api.get(`/api/teams/${teamId}/players`, { token: club.lead.token })).body.map(
        (p: { displayName: string }) => p.displayName,
      ) as string[];
    const ours = [...(await listed(squad.teamId)), ...(await listed(otherTeamId))];
    expect(ours).toHaveLength(squad.playerIds.length + 1);
    expect(players.map((p) => p['Name']).sort()).toEqual(ours.sort());
    expect(files.get('players.csv')).not.toContain('Barnaby Z.');
    expect(
      rows(files.get('teams.csv')!)
        .map((t) => t['Team'])
        .sort(),
    ).toEqual(['U10 Herons', 'U12 Swifts']);
    expect(rows(files.get('attendance.csv')!)).toEqual([
      expect.objectContaining({ 'Plan id': plan.id, 'Session day': '2026-12-05', Name: 'Perpetua W.' }),
    ]);
    expect(rows(files.get('feedback.csv')!)).toEqual([
      expect.objectContaining({
        // The activity as the plan names it, not an id.
        Activity: plan.plan.phases.find((p) => p.stations.length > 0)!.stations[0]!.title,
        Verdict: 'Too easy',
        Note: 'Needed a smaller area',
        'Judged by': 'Cora Coach',
      }),
    ]);
    expect(files.get('members.csv')!.split('\r\n')[0]).toBe('\uFEFFMember id,Name,E-mail,Role,Joined');
    expect(
      rows(files.get('members.csv')!)
        .map((m) => [m['Name'], m['Role']])
        .sort(),
    ).toEqual(
      [
        ['Asa Assistant', 'Assistant'],
        ['Cora Coach', 'Coach'],
        ['Lena Lead', 'Head of coaching'],
      ].sort(),
    );
    const plans = JSON.parse(files.get('plans.json')!) as { id: string; plan: unknown }[];
    expect(plans.map((p) => p.id)).toEqual([plan.id]);
    expect(plans[0]!.plan).toEqual(plan.plan);
    const ruleSets = JSON.parse(files.get('rule-sets.json')!) as { name: string; status: string }[];
    expect(ruleSets).toEqual([expect.objectContaining({ name: 'Ållerton rules', status: 'published' })]);
    const history = JSON.parse(files.get('rule-set-history.json')!) as { action: string }[];
    expect(history.map((h) => h.action)).toEqual(['create', 'publish']);
  });

  it('holds no password hash or sign-in secret anywhere in the ZIP', async () => {
    const files = await unzip((await download(app, '/api/club/export', club.lead.token)).bytes);
    const team = await unzip(
      (await download(app, `/api/teams/${squad.teamId}/export`, club.coach.token)).bytes,
    );
    const secrets: string[] = [club.lead.token, club.coach.token, club.assistant.token];
    const hashes: { secret: string }[] = await app.dataSource.query(
      `SELECT "passwordHash" AS secret FROM app_user
        UNION ALL SELECT "tokenHash" FROM email_verification
        UNION ALL SELECT "tokenHash" FROM invitation`,
    );
    secrets.push(...hashes.map((h) => h.secret));
    expect(secrets.length).toBeGreaterThanOrEqual(9);
    for (const [name, text] of [...files, ...team]) {
      for (const secret of secrets) expect(text.includes(secret), `${name} holds a secret`).toBe(false);
      expect(text).not.toMatch(/\$2[aby]\$\d{2}\$/);
    }
  });

  it('gives a coach their own team’s part and nothing of the club’s other team', async () => {
    const answer = await download(app, `/api/teams/${squad.teamId}/export`, club.coach.token);
    expect(answer.status, answer.bytes.toString()).toBe(200);
    expect(answer.headers.get('content-disposition')).toMatch(
      /^attachment; filename="conewise-allerton-export-fc-u10-herons-\d{4}-\d{2}-\d{2}\.zip"$/,
    );
    const files = await unzip(answer.bytes);
    expect([...files.keys()].sort()).toEqual(
      [
        'README.txt',
        'attendance.csv',
        'feedback.csv',
        'members.csv',
        'plans.json',
        'players.csv',
        'teams.csv',
      ].sort(),
    );
    const players = rows(files.get('players.csv')!).map((p) => p['Name']);
    expect(players).toContain('Perpetua W.');
    expect(players).toHaveLength(squad.playerIds.length);
    expect(rows(files.get('players.csv')!).every((p) => p['Team'] === 'U10 Herons')).toBe(true);
    for (const text of files.values()) {
      expect(text).not.toContain('Swithin K.');
      expect(text).not.toContain('U12 Swifts');
      expect(text).not.toContain('Barnaby Z.');
    }
    // Only the team's staff: the coach who made it; not the head of coaching or the assistant.
    expect(rows(files.get('members.csv')!).map((m) => m['Name'])).toEqual(['Cora Coach']);
    expect(files.get('README.txt')).toContain('U10 Herons');

    const byLead = await download(app, `/api/teams/${otherTeamId}/export`, club.lead.token);
    expect(byLead.status).toBe(200);
    expect(rows((await unzip(byLead.bytes)).get('players.csv')!).map((p) => p['Name'])).toEqual([
      'Swithin K.',
    ]);
  });

  it('refuses coaches and assistants the whole club (403), a coach another team (403), an assistant any team (403)', async () => {
    for (const token of [club.coach.token, club.assistant.token]) {
      const refused = await download(app, '/api/club/export', token);
      expect(refused.status).toBe(403);
      expect(JSON.parse(refused.bytes.toString()).detail).toBe(
        'Only the head of coaching can download everything the club holds.',
      );
    }
    expect((await download(app, `/api/teams/${otherTeamId}/export`, club.coach.token)).status).toBe(403);
    const assistant = await download(app, `/api/teams/${squad.teamId}/export`, club.assistant.token);
    expect(assistant.status).toBe(403);
    expect(JSON.parse(assistant.bytes.toString()).detail).toBe(
      'Only the head of coaching and the team’s coaches can download its data.',
    );
    const anonymous = await fetch(`${app.http.url}/api/club/export`);
    expect(anonymous.status).toBe(401);
  });

  it('answers 404 for another club’s team, to its head of coaching and coaches alike', async () => {
    for (const token of [club.lead.token, club.coach.token]) {
      const answer = await download(app, `/api/teams/${theirTeamId}/export`, token);
      expect(answer.status).toBe(404);
      expect(answer.bytes.toString()).not.toContain('Barnaby');
    }
    // Not an id at all: a clear 400 that names it, as every route with an id answers.
    expect((await download(app, '/api/teams/not-a-team/export', club.lead.token)).status).toBe(400);
    // And the other club's own export holds none of this club.
    const theirs = await unzip((await download(app, '/api/club/export', other.lead.token)).bytes);
    expect(rows(theirs.get('players.csv')!).map((p) => p['Name'])).toEqual(['Barnaby Z.']);
    for (const text of theirs.values()) expect(text).not.toContain('Perpetua');
  });
});
