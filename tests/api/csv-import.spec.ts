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

  const commit = (body: object, team = teamId, token = club.coach.token) =>
    app.api.post(`/api/teams/${team}/players/import/commit`, body, { token });
  const names = async (team = teamId) =>
    (await app.api.get(`/api/teams/${team}/players`, { token: club.coach.token })).body.map(
      (p: { displayName: string }) => p.displayName,
    );
  type Row = { row: number; displayName: string; goalkeeper: boolean; note?: string; clash?: boolean };
  const sendable = (rows: Row[]) =>
    rows.map(({ row, displayName, goalkeeper }) => ({ row, displayName, goalkeeper }));

  it('previews lines with errors in sentences at the file’s own line numbers, then commits the good ones', async () => {
    const csv = [
      'Name,Goalkeeper',
      'Maya Okafor,no',
      'Théo Lambert,yes',
      '',
      ',no',
      'Sam 2014,no',
      'Rosa,maybe',
      ',',
      'Ifeoma,',
    ].join('\r\n');
    const response = await preview(upload(csv));
    expect(response.status).toBe(200);
    expect(response.body.rows).toEqual([
      { row: 2, displayName: 'Maya O.', goalkeeper: false },
      { row: 3, displayName: 'Théo L.', goalkeeper: true },
      { row: 9, displayName: 'Ifeoma', goalkeeper: false },
    ]);
    // Line 4 is blank and line 8 an empty spreadsheet row: skipped without a word.
    expect(response.body.errors).toEqual([
      { row: 5, field: 'name', message: 'Line 5 has no name.' },
      {
        row: 6,
        field: 'name',
        message: 'Line 6: “Sam 2014” is not just a name. Leave out numbers, e-mail addresses and < >.',
      },
      {
        row: 7,
        field: 'goalkeeper',
        message: 'Line 7: Goalkeeper says “maybe”. Write yes or no, or leave it empty.',
      },
    ]);
    expect(response.body.importId).toEqual(expect.any(String));

    // Nothing is stored by a preview.
    expect(await names()).toEqual(['Ben T.']);

    const done = await commit({ importId: response.body.importId, rows: response.body.rows });
    expect(done.status).toBe(201);
    expect(done.body.map((p: { displayName: string }) => p.displayName)).toEqual([
      'Maya O.',
      'Théo L.',
      'Ifeoma',
    ]);
    expect(await names()).toEqual(['Ben T.', 'Ifeoma', 'Maya O.', 'Théo L.']);
  });

  it('reads a Spanish club list: “Nombre” and “Apellidos” make the name, “Portero” with sí or no', async () => {
    const csv = ['Nombre;Apellidos;Portero', 'Lucía;Ferrer;Sí', 'Mateo;Ruiz;no', 'Inés;Marín;quizá'].join(
      '\n',
    );
    const response = await preview(upload(csv), club.coach.token, teamId);
    expect(response.status, response.text).toBe(200);
    expect(response.body.rows.map((r: Row) => [r.displayName, r.goalkeeper])).toEqual([
      ['Lucía F.', true],
      ['Mateo R.', false],
    ]);
    expect(response.body.errors.map((e: { row: number; field: string }) => [e.row, e.field])).toEqual([
      [4, 'goalkeeper'],
    ]);
  });

  it('refuses a commit whose lines differ from the preview', async () => {
    const response = await preview(upload('Name\nNia K.\nOwen P.\n'));
    expect(response.body.rows).toHaveLength(2);
    const tampered = [...response.body.rows, { row: 9, displayName: 'Sneaky S.', goalkeeper: false }];
    const refused = await commit({ importId: response.body.importId, rows: tampered });
    expect(refused.status).toBe(400);
    expect(refused.body.detail).toBe('These are not the lines the preview read. Choose the file again.');
    const keeper = response.body.rows.map((r: Row) => ({ ...r, goalkeeper: !r.goalkeeper }));
    expect((await commit({ importId: response.body.importId, rows: keeper })).status).toBe(400);
  });

  it('reads a semicolon file with a BOM, a “sep=;” line, a Goalkeeper heading with a hint and “Family, First” names', async () => {
    const text = '\uFEFFsep=;\r\nName;Goalkeeper (yes/no)\r\nKai W.;yes\r\nMendes, Luz;\r\n';
    const response = await preview(upload(text));
    expect(response.status).toBe(200);
    expect(response.body.errors).toEqual([]);
    expect(response.body.rows).toEqual([
      { row: 3, displayName: 'Kai W.', goalkeeper: true },
      { row: 4, displayName: 'Luz M.', goalkeeper: false },
    ]);
    // A semicolon header is never a player, with or without the mark; the old heading still works.
    const plain = await preview(upload('\uFEFFdisplayName;goalkeeper\nOla N.;no\n'));
    expect(plain.body.rows).toEqual([{ row: 2, displayName: 'Ola N.', goalkeeper: false }]);
    const split = await preview(upload('First name;Last name\nOla;Nordmann\n'));
    expect(split.body.rows).toEqual([{ row: 2, displayName: 'Ola N.', goalkeeper: false }]);
  });

  it('keeps UTF-8 names whole: accents, other scripts and emoji are never cut', async () => {
    const csv = 'Name\nKai Müller 🦊\nŁucja Śliwa\nΖωή Παππά\nАня Иванова\nNoa 👨‍👩‍👧 Émond\n';
    const response = await preview(upload(csv));
    expect(response.body.rows.map((r: Row) => r.displayName)).toEqual([
      'Kai M. 🦊',
      'Łucja Ś.',
      'Ζωή Π.',
      'Аня И.',
      'Noa 👨‍👩‍👧 É.',
    ]);
    const team = (await createTeam(app, club.coach.token)).id;
    const again = await preview(upload(csv), club.coach.token, team);
    expect((await commit({ importId: again.body.importId, rows: again.body.rows }, team)).status).toBe(201);
    const stored: string[] = await names(team);
    expect(stored).toContain('Kai M. 🦊');
    expect(stored.join('')).not.toContain('\uFFFD');
  });

  it('resolves a clash with a second letter, or leaves the choice to the coach', async () => {
    const team = (await createTeam(app, club.coach.token)).id;
    await app.api.post(`/api/teams/${team}/players`, { displayName: 'Kai M.' }, { token: club.coach.token });
    const csv = 'Name;Goalkeeper\nKai Müller 🦊;no\nKai Mason;yes\nKai Mason;no\nKai M.;no\n';
    const response = await preview(upload(csv), club.coach.token, team);
    const rows: Row[] = response.body.rows;
    expect(rows.map((r) => [r.row, r.displayName, r.clash ?? false])).toEqual([
      [2, 'Kai Mü. 🦊', false],
      [3, 'Kai Ma.', false],
      [4, 'Kai M.', true],
      [5, 'Kai M.', true],
    ]);
    expect(rows[0]!.note).toBe(
      'Kai M. 🦊 is already on the team, so this player is “Kai Mü. 🦊”. Leave the line out if it is the same child.',
    );
    expect(rows[2]!.note).toBe(
      'Line 3 has the same name. Type a name the team can tell apart, or leave the line out.',
    );

    // Sent as proposed, the taken names are refused line by line and nothing is added.
    const refused = await commit({ importId: response.body.importId, rows: sendable(rows) }, team);
    expect(refused.status).toBe(400);
    expect(refused.body.errors.map((e: { row: number }) => e.row)).toEqual([4, 5]);
    expect(refused.body.errors[0].message).toMatch(/^Line 4: there is already a Kai M\. /);
    expect(await names(team)).toEqual(['Kai M.']);

    // The coach types a name for line 4 and leaves line 5 (the child already on the team) out.
    const chosen = sendable(rows).map((r) =>
      r.row === 4 ? { ...r, displayName: 'Kai Mason (blue)' } : r.row === 5 ? { ...r, skip: true } : r,
    );
    const done = await commit({ importId: response.body.importId, rows: chosen }, team);
    expect(done.status).toBe(201);
    expect(await names(team)).toEqual(['Kai M.', 'Kai Ma.', 'Kai Mason (blue)', 'Kai Mü. 🦊']);
  });

  it('adds at most 60 players from one file and says which lines were left out', async () => {
    const team = (await createTeam(app, club.coach.token)).id;
    const letters = 'ABCDEFGHIJKLMNOPQRSTUVWXYZ';
    const kids = Array.from(
      { length: 63 },
      (_, i) => `Kid${letters[i % 26]}${letters[Math.floor(i / 26)]} Q`,
    );
    const response = await preview(upload(['Name', ...kids].join('\n')), club.coach.token, team);
    expect(response.body.rows).toHaveLength(60);
    expect(response.body.errors).toEqual([
      { row: 62, field: 'file', message: 'Lines 62 to 64 were left out: one file adds at most 60 players.' },
    ]);
  });

  it('a file without a Name heading or with a broken quote says what to fix, at the right line', async () => {
    const headless = await preview(upload('Kai W.;gk\nLuz M.;\n'));
    expect(headless.status).toBe(400);
    expect(headless.body.detail).toBe(
      "The first line must name the columns: “Name”, and “Goalkeeper” if you have one. This file's first line says “Kai W., gk”.",
    );
    const quote = await preview(upload('Name\n\nAda K.\n"Ola N.\nZed Q.\n'));
    expect(quote.status).toBe(400);
    expect(quote.body.detail).toBe(
      'Line 4 opens a quotation mark (") that is never closed. Remove it or add the closing one.',
    );
    expect(quote.body.errors).toEqual([{ field: 'file', message: quote.body.detail }]);
    expect(JSON.stringify(quote.body)).not.toMatch(/CSV_|Quote Not Closed/);
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
    expect((await preview(upload('Name\n"unclosed,quote\n'))).status).toBe(400);
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
