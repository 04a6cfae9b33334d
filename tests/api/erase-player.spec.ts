import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { SessionPlanDto } from '../../shared/types/api';
import { CLEARED_BODY } from '../../server/services/mail-queue';
import {
  clubWithStaff,
  startTestApp,
  uniqueEmail,
  type ClubCast,
  type TestApp,
} from '../support/api-test-app';
import { createPlan, createSquad, type Squad } from './fixtures/plan-helpers';

const scratch = mkdtempSync(join(tmpdir(), 'conewise-erase-'));
const helperAddress = uniqueEmail('parent.helper');

/** The card's text as poppler's pdftotext reads it, on one line. */
function pdfText(pdf: Buffer): string {
  const file = join(scratch, 'card.pdf');
  writeFileSync(file, pdf);
  return execFileSync('pdftotext', ['-raw', file, '-'], { encoding: 'utf8' }).replace(/\s+/g, ' ');
}

/** Every table of the database, each row read as text: where a name could still hide. */
async function tablesHolding(app: TestApp, words: string[]): Promise<string[]> {
  const tables: { name: string }[] = await app.dataSource.query(
    `SELECT table_name AS name FROM information_schema.tables
      WHERE table_schema = current_schema() AND table_type = 'BASE TABLE' ORDER BY table_name`,
  );
  expect(tables.length).toBeGreaterThan(10);
  const found: string[] = [];
  for (const { name } of tables) {
    const rows: { row: string }[] = await app.dataSource.query(`SELECT t::text AS row FROM "${name}" t`);
    for (const { row } of rows) {
      for (const word of words)
        if (row.toLowerCase().includes(word.toLowerCase())) found.push(`${name}: ${word}`);
    }
  }
  return [...new Set(found)];
}

async function addPlayer(app: TestApp, token: string, teamId: string, displayName: string, key?: string) {
  const response = await app.api.post(
    `/api/teams/${teamId}/players`,
    { displayName },
    {
      token,
      headers: key ? { 'Idempotency-Key': key } : {},
    },
  );
  expect(response.status, response.text).toBe(201);
  return response.body.id as string;
}

describe('erasing a player from Conewise', () => {
  let app: TestApp;
  let club: ClubCast;
  let squad: Squad;
  let zephyrine: string;
  let ignatius: string;
  let octavia: string;
  let withThem: SessionPlanDto;
  let withoutThem: SessionPlanDto;

  beforeAll(async () => {
    app = await startTestApp();
    club = await clubWithStaff(app, 'Erase Club');
    squad = await createSquad(app, club.coach.token, 6, 'U10 Herons');
    const token = club.coach.token;
    // Added with an Idempotency-Key, so a saved reply holds the name too.
    zephyrine = await addPlayer(app, token, squad.teamId, 'Zephyrine Quillfeather', 'add-zephyrine');
    ignatius = await addPlayer(app, token, squad.teamId, 'Ignatius Marrowby');
    octavia = await addPlayer(app, token, squad.teamId, 'Octavia Brightwater');
    const everyone = { ...squad, playerIds: [...squad.playerIds, zephyrine, ignatius, octavia] };
    withThem = (await createPlan(app, token, everyone, { date: '2026-12-05' })) as SessionPlanDto;
    await createPlan(app, token, everyone, {
      date: '2026-12-12',
      request: { kind: 'training', minutes: 60 },
    });
    withoutThem = (await createPlan(
      app,
      token,
      { ...squad, playerIds: [...squad.playerIds, octavia] },
      { date: '2026-12-19' },
    )) as SessionPlanDto;

    const attendance = await app.api.put(
      `/api/plans/${withThem.id}/attendance`,
      { playerIds: [zephyrine, ignatius, octavia] },
      { token },
    );
    expect(attendance.status, attendance.text).toBeLessThan(300);
    const station = withThem.plan.phases.find((p) => p.stations.length)!.stations[0]!;
    const phaseIndex = withThem.plan.phases.findIndex((p) => p.stations.includes(station));
    const feedback = await app.api.post(
      `/api/plans/${withThem.id}/feedback`,
      {
        stationId: station.id,
        phaseIndex,
        verdict: 'right',
        note: 'Zephyrine Q. and Octavia B. kept the ball well; Zephyrine Quillfeather tired late',
      },
      { token },
    );
    expect(feedback.status, feedback.text).toBe(201);
    // Two unsent e-mails with the card: one of a plan she was in, one of a plan she was not.
    // (To an address of this test's own: the database is shared with the other API test files.)
    for (const plan of [withThem, withoutThem]) {
      const shared = await app.api.post(
        `/api/plans/${plan.id}/share`,
        {
          recipients: [helperAddress],
          message: plan === withThem ? 'Zephyrine Q. in goal' : 'Bring water',
        },
        { token },
      );
      expect(shared.status, shared.text).toBe(202);
    }
    // The scan finds the name wherever it was written before the erasure.
    expect(await tablesHolding(app, ['Zephyrine Quillfeather', 'Zephyrine Q.'])).toEqual(
      expect.arrayContaining([
        'player: Zephyrine Quillfeather',
        'session_plan: Zephyrine Quillfeather',
        'feedback: Zephyrine Q.',
        'idempotency_record: Zephyrine Quillfeather',
        'outbox_message: Zephyrine Q.',
      ]),
    );
  }, 120_000);

  afterAll(async () => {
    await app?.close();
    rmSync(scratch, { recursive: true, force: true });
  });

  it('refuses assistants (403) and another club (404), and keeps the player', async () => {
    expect((await app.api.delete(`/api/players/${zephyrine}`, { token: club.assistant.token })).status).toBe(
      403,
    );
    const other = await clubWithStaff(app, 'Other Club');
    expect((await app.api.delete(`/api/players/${zephyrine}`, { token: other.lead.token })).status).toBe(404);
    expect((await app.api.delete(`/api/players/${zephyrine}`, { token: other.coach.token })).status).toBe(
      404,
    );
    const list = await app.api.get(`/api/teams/${squad.teamId}/players?includeInactive=true`, {
      token: club.coach.token,
    });
    expect(list.body.map((p: { id: string }) => p.id)).toContain(zephyrine);
  });

  it('the team’s coach erases her: her name is nowhere in the database, the plans or a new card', async () => {
    const erased = await app.api.delete(`/api/players/${zephyrine}`, { token: club.coach.token });
    expect(erased.status, erased.text).toBe(204);

    expect(await tablesHolding(app, ['Zephyrine Quillfeather', 'Zephyrine Q.', 'Quillfeather'])).toEqual([]);
    expect(await app.dataSource.query('SELECT 1 FROM player WHERE id = $1', [zephyrine])).toHaveLength(0);
    expect(
      await app.dataSource.query('SELECT 1 FROM attendance WHERE "playerId" = $1', [zephyrine]),
    ).toHaveLength(0);

    const plan = (await app.api.get(`/api/plans/${withThem.id}`, { token: club.coach.token }))
      .body as SessionPlanDto;
    const entry = plan.plan.request.players.find((p) => p.id === zephyrine);
    expect(entry?.name).toBe('Former player 1');
    const note: { note: string }[] = await app.dataSource.query(
      'SELECT note FROM feedback WHERE "planId" = $1',
      [withThem.id],
    );
    expect(note[0]!.note).toBe(
      'Former player 1 and Octavia B. kept the ball well; Former player 1 tired late',
    );

    const card = await fetch(`${app.http.url}/api/plans/${withThem.id}/pdf`, {
      headers: { authorization: `Bearer ${club.coach.token}` },
    });
    expect(card.status).toBe(200);
    const text = pdfText(Buffer.from(await card.arrayBuffer()));
    expect(text).not.toMatch(/Zephyrine|Quillfeather/);
    expect(text).toContain('Former player 1');
    expect(text).toContain('Ignatius Marrowby');

    // The unsent e-mail of her plan is withdrawn; the other one still goes, card and all.
    const mail: { status: string; textBody: string; cards: number }[] = await app.dataSource.query(
      `SELECT status, "textBody", jsonb_array_length(attachments) AS cards FROM outbox_message
        WHERE kind = 'plan-share' AND recipients @> $1::jsonb ORDER BY "createdAt"`,
      [JSON.stringify([helperAddress])],
    );
    expect(mail).toEqual([
      { status: 'failed', textBody: CLEARED_BODY, cards: 0 },
      { status: 'pending', textBody: expect.stringContaining('Bring water'), cards: 1 },
    ]);
  });

  it('leaves the other players as they were', async () => {
    const list = await app.api.get(`/api/teams/${squad.teamId}/players?includeInactive=true`, {
      token: club.coach.token,
    });
    const names = list.body.map((p: { displayName: string }) => p.displayName);
    expect(names).toHaveLength(8);
    expect(names).toEqual(expect.arrayContaining(['Ignatius Marrowby', 'Octavia Brightwater']));
    const plan = (await app.api.get(`/api/plans/${withThem.id}`, { token: club.coach.token }))
      .body as SessionPlanDto;
    expect(plan.plan.request.players.find((p) => p.id === octavia)?.name).toBe('Octavia Brightwater');
    const came: { playerId: string }[] = await app.dataSource.query(
      'SELECT "playerId" FROM attendance WHERE "planId" = $1 ORDER BY "playerId"',
      [withThem.id],
    );
    expect(came.map((r) => r.playerId).sort()).toEqual([ignatius, octavia].sort());
  });

  it('the head of coaching erases a second child, who gets a label of their own', async () => {
    const erased = await app.api.delete(`/api/players/${ignatius}`, { token: club.lead.token });
    expect(erased.status, erased.text).toBe(204);
    expect(await tablesHolding(app, ['Ignatius Marrowby', 'Ignatius M.', 'Marrowby'])).toEqual([]);
    const plan = (await app.api.get(`/api/plans/${withThem.id}`, { token: club.coach.token }))
      .body as SessionPlanDto;
    const labels = Object.fromEntries(plan.plan.request.players.map((p) => [p.id, p.name]));
    expect(labels[zephyrine]).toBe('Former player 1');
    expect(labels[ignatius]).toBe('Former player 2');
    expect((await app.api.delete(`/api/players/${ignatius}`, { token: club.lead.token })).status).toBe(404);
  });
});
