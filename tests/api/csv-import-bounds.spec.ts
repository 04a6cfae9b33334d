/**
 * A roster preview stays small and quick whatever the upload holds: it reads at most
 * MAX_PREVIEW_LINES lines under the heading, lists at most MAX_PREVIEW_ERRORS problems (the rest
 * in one summary line), adds at most MAX_IMPORT_ROWS players and quotes long cells shortened.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CSV_UPLOAD_LIMIT_BYTES } from '../../server/routes/players';
import { MAX_IMPORT_ROWS, MAX_PREVIEW_ERRORS, MAX_PREVIEW_LINES } from '../../server/services/csv-roster';
import {
  clubWithStaff,
  createTeam,
  startTestApp,
  type ClubCast,
  type TestApp,
} from '../support/api-test-app';

/** Answers stay far below this whatever the file (listed problems and rows are bounded). */
const SMALL_ANSWER_BYTES = 20_000;

function upload(text: string): FormData {
  const form = new FormData();
  form.append('file', new Blob([text], { type: 'text/csv' }), 'squad.csv');
  return form;
}

/** A CSV of `line(i)` lines under `heading`, as close to (and under) the upload limit as they fit. */
function nearlyOneMegabyte(heading: string, line: (i: number) => string): string {
  const parts = [heading];
  let bytes = Buffer.byteLength(heading) + 1;
  for (let i = 0; ; i++) {
    const next = line(i);
    const size = Buffer.byteLength(next) + 1;
    if (bytes + size > CSV_UPLOAD_LIMIT_BYTES - 1024) break;
    parts.push(next);
    bytes += size;
  }
  return parts.join('\n');
}

/** Letters only (names may not hold digits): 0 → "a", 25 → "z", 26 → "ab", … */
function letters(i: number): string {
  let out = '';
  do {
    out += String.fromCharCode(97 + (i % 26));
    i = Math.floor(i / 26);
  } while (i > 0);
  return out;
}

describe('CSV roster preview bounds', () => {
  let app: TestApp;
  let club: ClubCast;
  beforeAll(async () => {
    app = await startTestApp();
    club = await clubWithStaff(app, 'Bounded CSV Club');
  });
  afterAll(() => app.close());

  const preview = async (text: string) => {
    const team = await createTeam(app, club.coach.token);
    return app.api.call('POST', `/api/teams/${team.id}/players/import`, {
      token: club.coach.token,
      rawBody: upload(text),
    });
  };

  it('a file of nearly 1 MB where every line is wrong lists 50 problems, sums up the rest and says where reading stopped', async () => {
    const text = nearlyOneMegabyte('Name,Goalkeeper', (i) => `Player ${i},yes`);
    expect(Buffer.byteLength(text)).toBeGreaterThan(0.9 * CSV_UPLOAD_LIMIT_BYTES);
    const response = await preview(text);
    expect(response.status, response.text).toBe(200);
    expect(Buffer.byteLength(response.text)).toBeLessThan(SMALL_ANSWER_BYTES);
    expect(response.body.rows).toEqual([]);

    const errors = response.body.errors as { row: number; field: string; message: string }[];
    const listed = errors.filter((e) => e.field === 'name');
    expect(listed).toHaveLength(MAX_PREVIEW_ERRORS);
    // The file's own line numbers: the heading is line 1.
    expect(listed[0]).toEqual({
      row: 2,
      field: 'name',
      message: 'Line 2: “Player 0” is not just a name. Leave out numbers, e-mail addresses and < >.',
    });
    expect(listed.at(-1)!.row).toBe(MAX_PREVIEW_ERRORS + 1);
    const firstUnlisted = MAX_PREVIEW_ERRORS + 2;
    const stoppedAt = MAX_PREVIEW_LINES + 2;
    expect(errors.slice(MAX_PREVIEW_ERRORS)).toEqual([
      {
        row: firstUnlisted,
        field: 'file',
        message: `${MAX_PREVIEW_LINES - MAX_PREVIEW_ERRORS} more lines, from line ${firstUnlisted} on, cannot be used either. Fix the lines above and choose the file again to see why.`,
      },
      {
        row: stoppedAt,
        field: 'file',
        message: `Reading stopped at line ${stoppedAt}: a preview reads at most ${MAX_PREVIEW_LINES} lines under the heading. Put the rest in another file.`,
      },
    ]);
  });

  it(`a file of nearly 1 MB of good names offers ${MAX_IMPORT_ROWS} players and reads no further than line ${MAX_PREVIEW_LINES + 1}`, async () => {
    const text = nearlyOneMegabyte('Name', (i) => `Kid ${letters(i)}`);
    const response = await preview(text);
    expect(response.status, response.text).toBe(200);
    expect(Buffer.byteLength(response.text)).toBeLessThan(SMALL_ANSWER_BYTES);
    expect(response.body.rows).toHaveLength(MAX_IMPORT_ROWS);
    expect(response.body.rows.at(-1).row).toBe(MAX_IMPORT_ROWS + 1);
    expect(response.body.errors.map((e: { message: string }) => e.message)).toEqual([
      `Lines ${MAX_IMPORT_ROWS + 2} to ${MAX_PREVIEW_LINES + 1} were left out: one file adds at most ${MAX_IMPORT_ROWS} players.`,
      `Reading stopped at line ${MAX_PREVIEW_LINES + 2}: a preview reads at most ${MAX_PREVIEW_LINES} lines under the heading. Put the rest in another file.`,
    ]);
  });

  it('long cells are quoted back shortened, and a name cell of 450 kB is refused unread', async () => {
    const digits = `Ada ${'7'.repeat(150)}`;
    const keeper = 'perhaps'.repeat(40_000);
    const huge = 'Cy '.repeat(150_000);
    const response = await preview(`Name,Goalkeeper\n${digits},no\nBea Q.,${keeper}\n${huge},no\n`);
    expect(response.status, response.text).toBe(200);
    expect(Buffer.byteLength(response.text)).toBeLessThan(SMALL_ANSWER_BYTES);
    expect(response.body.errors).toEqual([
      {
        row: 2,
        field: 'name',
        message: `Line 2: “Ada ${'7'.repeat(36)}…” is not just a name. Leave out numbers, e-mail addresses and < >.`,
      },
      {
        row: 3,
        field: 'goalkeeper',
        message: `Line 3: Goalkeeper says “${keeper.slice(0, 40)}…”. Write yes or no, or leave it empty.`,
      },
      { row: 4, field: 'name', message: 'Line 4: the name is longer than 40 letters even when shortened.' },
    ]);
  });

  it('a file just within the caps is listed in full, with no summary lines', async () => {
    const lines = Array.from({ length: MAX_PREVIEW_LINES }, (_, i) =>
      i < MAX_PREVIEW_ERRORS ? `Wrong ${i}` : `Kid ${letters(i)}`,
    );
    const response = await preview(['Name', ...lines].join('\n'));
    expect(response.status, response.text).toBe(200);
    const fields = response.body.errors.map((e: { field: string }) => e.field);
    expect(fields.filter((f: string) => f === 'name')).toHaveLength(MAX_PREVIEW_ERRORS);
    // Only the players over the per-file limit are summed up; nothing says reading stopped.
    expect(response.body.errors.at(-1).message).toBe(
      `Lines ${MAX_PREVIEW_ERRORS + MAX_IMPORT_ROWS + 2} to ${MAX_PREVIEW_LINES + 1} were left out: one file adds at most ${MAX_IMPORT_ROWS} players.`,
    );
    expect(response.body.errors).toHaveLength(MAX_PREVIEW_ERRORS + 1);
  });
});
