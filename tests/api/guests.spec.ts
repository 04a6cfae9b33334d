/**
 * Today's guests (the plan wizard's "Add a guest"): one request adds them all to the team's list
 * as not active, or adds none when one name is taken; a repeated request adds nothing twice.
 */
import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { PlayerDto } from '../../shared/types/api';
import {
  clubWithStaff,
  createTeam,
  startTestApp,
  type ClubCast,
  type TestApp,
} from '../support/api-test-app';

describe("today's guests", () => {
  let app: TestApp;
  let club: ClubCast;
  let other: ClubCast;
  let teamId: string;

  beforeAll(async () => {
    app = await startTestApp();
    club = await clubWithStaff(app, 'Guests Club');
    other = await clubWithStaff(app, 'Other Guests Club');
    teamId = (await createTeam(app, club.coach.token, { coachIds: [club.assistant.user.id] })).id;
    await app.api.post(
      `/api/teams/${teamId}/players`,
      { displayName: 'Nell P.' },
      { token: club.coach.token },
    );
  });
  afterAll(() => app.close());

  const everyone = async () =>
    (
      await app.api.get<PlayerDto[]>(`/api/teams/${teamId}/players?includeInactive=true`, {
        token: club.coach.token,
      })
    ).body;

  it('adds every guest as not active, in the order sent', async () => {
    const added = await app.api.post<PlayerDto[]>(
      `/api/teams/${teamId}/guests`,
      { guests: [{ displayName: ' Ola T. ' }, { displayName: 'Raf K.', goalkeeper: true }] },
      { token: club.coach.token },
    );
    expect(added.status, added.text).toBe(201);
    expect(added.body.map((p) => [p.displayName, p.goalkeeper, p.active])).toEqual([
      ['Ola T.', false, false],
      ['Raf K.', true, false],
    ]);
    const active = (
      await app.api.get<PlayerDto[]>(`/api/teams/${teamId}/players`, { token: club.coach.token })
    ).body;
    expect(active.map((p) => p.displayName)).toEqual(['Nell P.']);
  });

  it('adds none of them when one name is taken on the team, or twice in the list', async () => {
    const before = (await everyone()).length;
    for (const guests of [
      [{ displayName: 'Ivy D.' }, { displayName: 'Nell P.' }],
      [{ displayName: 'Ivy D.' }, { displayName: 'ivy d.' }],
    ]) {
      const refused = await app.api.post(
        `/api/teams/${teamId}/guests`,
        { guests },
        { token: club.coach.token },
      );
      expect(refused.status, refused.text).toBe(409);
      expect(refused.body.detail ?? refused.body.title).toMatch(/already a player called/i);
    }
    expect((await everyone()).length).toBe(before);
    expect((await everyone()).map((p) => p.displayName)).not.toContain('Ivy D.');
  });

  it('answers a repeated request with the first answer and adds nothing more', async () => {
    const key = randomUUID();
    const send = () =>
      app.api.post<PlayerDto[]>(
        `/api/teams/${teamId}/guests`,
        { guests: [{ displayName: 'Uma W.' }] },
        { token: club.coach.token, headers: { 'idempotency-key': key } },
      );
    const first = await send();
    const again = await send();
    expect(first.status).toBe(201);
    expect(again.body.map((p) => p.id)).toEqual(first.body.map((p) => p.id));
    expect((await everyone()).filter((p) => p.displayName === 'Uma W.')).toHaveLength(1);
  });

  it('names a bad field, and keeps out an assistant and another club', async () => {
    const bad = await app.api.post(
      `/api/teams/${teamId}/guests`,
      { guests: [{ displayName: '' }] },
      { token: club.coach.token },
    );
    expect(bad.status).toBe(400);
    expect(bad.body.errors.map((e: { field: string }) => e.field)).toContain('guests/0/displayName');
    const body = { guests: [{ displayName: 'Kit B.' }] };
    expect(
      (await app.api.post(`/api/teams/${teamId}/guests`, body, { token: club.assistant.token })).status,
    ).toBe(403);
    expect(
      (await app.api.post(`/api/teams/${teamId}/guests`, body, { token: other.lead.token })).status,
    ).toBe(404);
    expect((await everyone()).map((p) => p.displayName)).not.toContain('Kit B.');
  });
});
