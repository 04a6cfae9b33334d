import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  clubWithStaff,
  createTeam,
  startTestApp,
  type ClubCast,
  type TestApp,
} from '../support/api-test-app';

function upload(content: Buffer | string, filename = 'squad.csv'): FormData {
  const form = new FormData();
  const bytes = typeof content === 'string' ? Buffer.from(content, 'utf8') : content;
  form.append('file', new Blob([new Uint8Array(bytes)], { type: 'text/csv' }), filename);
  return form;
}

describe('CSV roster import', () => {
  let app: TestApp;
  let club: ClubCast;
  let other: ClubCast;
  let teamId: string;
  beforeAll(async () => {
    app = await startTestApp();
    club = await clubWithStaff(app, 'CSV Club');
    other = await clubWithStaff(app, 'CSV Rival');
    teamId = (await createTeam(app, club.coach.token)).id;
    await app.api.post(
      `/api/teams/${teamId}/players`,
      { displayName: 'Ben T.' },
      { token: club.coach.token },
    );
  });
  afterAll(() => app.close());

  const preview = (body: FormData, token = club.coach.token, team = teamId) =>
    app.api.call('POST', `/api/teams/${team}/players/import`, { token, rawBody: body });

  it('previews rows with per-row errors, shortens full names, then commits the good rows', async () => {
    const csv = [
      'name,goalkeeper',
      'Maya Okafor,no',
      'Théo Lambert,yes',
      ',no',
      'Sam 2014,no',
      'Ben T.,no',
      'Rosa,maybe',
      'Maya O.,no',
      'Ifeoma,',
    ].join('\r\n');
    const response = await preview(upload(csv));
    expect(response.status).toBe(200);
    expect(response.body.rows).toEqual([
      { row: 2, displayName: 'Maya O.', goalkeeper: false },
      { row: 3, displayName: 'Théo L.', goalkeeper: true },
      { row: 9, displayName: 'Ifeoma', goalkeeper: false },
    ]);
    const errors = response.body.errors.map((e: { row: number; field: string }) => `${e.row}:${e.field}`);
    expect(errors).toEqual([
      '4:displayName',
      '5:displayName',
      '6:displayName',
      '7:goalkeeper',
      '8:displayName',
    ]);
    expect(response.body.importId).toEqual(expect.any(String));

    // Nothing is stored by a preview.
    expect(
      (await app.api.get(`/api/teams/${teamId}/players`, { token: club.coach.token })).body,
    ).toHaveLength(1);

    const commit = await app.api.post(
      `/api/teams/${teamId}/players/import/commit`,
      { importId: response.body.importId, rows: response.body.rows },
      { token: club.coach.token },
    );
    expect(commit.status).toBe(201);
    expect(commit.body.map((p: { displayName: string }) => p.displayName)).toEqual([
      'Maya O.',
      'Théo L.',
      'Ifeoma',
    ]);
    const names = (await app.api.get(`/api/teams/${teamId}/players`, { token: club.coach.token })).body.map(
      (p: { displayName: string }) => p.displayName,
    );
    expect(names).toEqual(['Ben T.', 'Ifeoma', 'Maya O.', 'Théo L.']);
  });

  it('refuses a commit whose rows differ from the preview', async () => {
    const response = await preview(upload('Nia K.\nOwen P.\n'));
    expect(response.body.rows).toHaveLength(2);
    const tampered = [...response.body.rows, { row: 9, displayName: 'Sneaky S.', goalkeeper: false }];
    const commit = await app.api.post(
      `/api/teams/${teamId}/players/import/commit`,
      { importId: response.body.importId, rows: tampered },
      { token: club.coach.token },
    );
    expect(commit.status).toBe(400);
    expect(commit.body.errors[0].field).toBe('importId');
  });

  it('reads semicolon-separated files with a BOM and no header', async () => {
    const response = await preview(upload('\uFEFFKai W.;gk\nLuz M.;\n'));
    expect(response.status).toBe(200);
    expect(response.body.rows).toEqual([
      { row: 1, displayName: 'Kai W.', goalkeeper: true },
      { row: 2, displayName: 'Luz M.', goalkeeper: false },
    ]);
  });

  it('a file that is not UTF-8 answers 400 naming the encoding', async () => {
    const latin1 = Buffer.from('name\nJosé Núñez\n', 'latin1');
    const response = await preview(upload(latin1));
    expect(response.status).toBe(400);
    expect(response.body.errors[0].field).toBe('file');
    expect(response.body.detail).toMatch(/UTF-8/);
    const utf16 = Buffer.concat([Buffer.from([0xff, 0xfe]), Buffer.from('name\nAda\n', 'utf16le')]);
    const second = await preview(upload(utf16));
    expect(second.status).toBe(400);
    expect(second.body.detail).toMatch(/UTF-16/);
  });

  it('a file over 1 MB answers 413', async () => {
    const big = 'name\n' + 'Avery Q.\n'.repeat(Math.ceil((1024 * 1024) / 9) + 10);
    const response = await preview(upload(big));
    expect(response.status).toBe(413);
    expect(response.headers.get('content-type')).toMatch(/problem\+json/);
  });

  it('a missing file, an empty file or a broken CSV answers 400', async () => {
    const none = await app.api.call('POST', `/api/teams/${teamId}/players/import`, {
      token: club.coach.token,
      rawBody: new FormData(),
    });
    expect(none.status).toBe(400);
    expect(none.body.errors[0].field).toBe('file');
    expect((await preview(upload(''))).status).toBe(400);
    expect((await preview(upload('name\n"unclosed,quote\n'))).status).toBe(400);
  });

  it('assistants get 403 and another club’s team 404', async () => {
    expect((await preview(upload('Ada K.\n'), club.assistant.token)).status).toBe(403);
    const theirs = (await createTeam(app, other.lead.token)).id;
    expect((await preview(upload('Ada K.\n'), club.lead.token, theirs)).status).toBe(404);
    const commit = await app.api.post(
      `/api/teams/${theirs}/players/import/commit`,
      { importId: 'x'.repeat(20), rows: [{ row: 1, displayName: 'Ada K.', goalkeeper: false }] },
      { token: club.lead.token },
    );
    expect(commit.status).toBe(404);
  });
});
